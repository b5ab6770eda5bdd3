namespace Decide.Reports.Layout;

/// <summary>A column of a report table: header text, share of the table width, alignment.</summary>
internal sealed record TableColumn(string Header, double Share, CellAlign Align = CellAlign.Left);
