namespace Decide.Reports.Layout;

/// <summary>A run of text elements (in logical order) that all go one direction.</summary>
internal sealed record BidiRun(IReadOnlyList<string> Elements, bool RightToLeft)
{
    public string Text => string.Concat(Elements);
}
