namespace Decide.Web.Components.Pages.Inputs;

/// <summary>What a key pressed in the rating grid asks for.</summary>
/// <param name="Kind">Nothing, the focus moved, a term was typed, or the rationale editor is wanted.</param>
/// <param name="Term">The term's code for <see cref="GridCommandKind.SetTerm"/>.</param>
public sealed record GridCommand(GridCommandKind Kind, string? Term = null)
{
    public static GridCommand None { get; } = new(GridCommandKind.None);

    public static GridCommand Moved { get; } = new(GridCommandKind.Moved);

    public static GridCommand OpenEditor { get; } = new(GridCommandKind.OpenEditor);

    public static GridCommand SetTerm(string code) => new(GridCommandKind.SetTerm, code);
}
