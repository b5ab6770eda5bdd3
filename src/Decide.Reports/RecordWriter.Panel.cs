using Decide.Reports.Layout;

namespace Decide.Reports;

internal sealed partial class RecordWriter
{
    private void Panel()
    {
        _flow.Section("4 Panel and consistency");
        _flow.Heading("Panel");
        if (_content.Panel.Count == 0)
        {
            _flow.Paragraph("No panel list was supplied with this record.");
        }
        else
        {
            _flow.Table(
                [new("Name", 2.4), new("Role", 1.8), new("Assessor", 1.3), new("Weight", 0.9, CellAlign.Right), new("Declaration signed", 1.8), new("Interests declared and measures taken", 4)],
                _content.Panel.Select(p => (IReadOnlyList<string>)
                [
                    p.Name,
                    p.Role,
                    p.AssessorCode ?? "—",
                    p.Weight is { } w ? RecordText.Number(w, 2) : "—",
                    p.DeclarationSignedAt is { } at ? RecordText.When(at) : "not recorded",
                    p.Conflicts ?? "not recorded",
                ]));
        }

        _flow.Heading("Consistency of pairwise judgements, per assessor");
        if (_content.Consistency.Count == 0)
        {
            _flow.Paragraph(Evaluation.Weighting == Decide.Core.Model.WeightingMethod.Points
                ? "Not applicable: the weights are the points published with the tender, not pairwise comparisons."
                : "Not applicable: the weights come from importance ratings, not pairwise comparisons.");
        }
        else
        {
            _flow.Table(
                [new("Assessor", 2.4), new("Matrix", 2), new("n", 0.6, CellAlign.Right), new("CR", 1, CellAlign.Right), new("CR limit", 1, CellAlign.Right), new("GCI", 1, CellAlign.Right), new("GCI limit", 1, CellAlign.Right), new("Result", 1.6)],
                _content.Consistency.Select(c => (IReadOnlyList<string>)
                [
                    _names.Assessor(c.Assessor), c.Matrix, c.Size.ToString(System.Globalization.CultureInfo.InvariantCulture),
                    RecordText.Number(c.Ratio, 3), RecordText.Number(c.Threshold, 2), RecordText.Number(c.Gci, 3), RecordText.Number(c.GciThreshold, 2),
                    c.Acceptable ? "acceptable" : "ABOVE LIMIT: revise",
                ]));
            var tables = _content.Consistency.Select(c => c.RandomIndexTable).Distinct().ToArray();
            _flow.Paragraph($"Random index table: {string.Join("; ", tables)}.", _style.Cell, _style.MutedBrush);
        }

        _flow.Heading("Each assessor against the panel");
        var agreement = _content.Robustness.Agreement;
        _flow.Paragraph("How each assessor's own ratings would rank the alternatives, compared with the panel's ranking (Kendall's τ; 1 is the same order), and the mean distance of their terms from the panel's aggregate. For discussion, not for re-weighting anyone.", _style.Cell, _style.MutedBrush);
        _flow.Table(
            [new("Assessor", 2.4), new("Cells rated", 1, CellAlign.Right), new("Mean distance from panel", 1.6, CellAlign.Right), new("τ with panel", 1.2, CellAlign.Right), new("Their own order", 5)],
            agreement.Assessors.Select(a => (IReadOnlyList<string>)
            [
                _names.Assessor(a.Assessor),
                a.CellsRated.ToString(System.Globalization.CultureInfo.InvariantCulture),
                RecordText.Number(a.MeanDistance, 3),
                a.TauWithPanel is { } tau ? RecordText.Number(tau, 2) : "—",
                string.Join(" > ", a.Ranking.Select(_names.Alternative)),
            ]));
    }
}
