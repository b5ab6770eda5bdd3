namespace Decide.Web.Components.Pages.Inputs;

/// <summary>The kinds of <see cref="GridCommand"/>.</summary>
public enum GridCommandKind
{
    None,
    Moved,
    SetTerm,
    OpenEditor,
}
