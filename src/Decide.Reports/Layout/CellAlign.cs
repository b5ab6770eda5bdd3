namespace Decide.Reports.Layout;

/// <summary>Horizontal alignment of a table cell.</summary>
internal enum CellAlign
{
    Left,
    Right,
    Center,
}
