using Decide.Core.Model;
using Decide.Reports.Layout;

namespace Decide.Reports;

internal sealed partial class RecordWriter
{
    private void Results()
    {
        _flow.Section(_content.Award is null ? "5 Decision matrix and ranking" : "5 Award and ranking");
        if (_content.Award is { } award)
        {
            Award(award);
        }

        var analysis = _content.Analysis;
        var scale = Evaluation.RatingScale;
        _flow.Heading("Aggregated decision matrix");
        _flow.Paragraph($"Each cell is the panel's aggregate triangle on the rating scale ({RecordText.Number(scale.Minimum, 0)}–{RecordText.Number(scale.Maximum, 0)}) or the measured value, then its normalised and weighted form ṽ used for the distances. \"Raters\" counts the assessors whose terms went in; declined cells and moderated terms are named.");
        var criteria = Evaluation.Criteria.ToDictionary(c => c.Id, StringComparer.Ordinal);
        _flow.Table(
            [new("Alternative", 2.2), new("Criterion", 2.6), new("Aggregate", 2.2), new("Weighted ṽ", 2.4), new("Raters", 1.1, CellAlign.Right), new("Notes", 3)],
            analysis.Matrix.Select(c => (IReadOnlyList<string>)
            [
                _names.Alternative(c.Alternative),
                _names.Criterion(c.Criterion),
                criteria.TryGetValue(c.Criterion, out var k) && k.Kind == CriterionKind.Numeric
                    ? RecordText.Measured(c.Aggregated.Middle) + (k.Unit is null ? "" : " " + k.Unit)
                    : RecordText.Tfn(c.Aggregated, 2),
                RecordText.Tfn(c.Weighted, 3),
                c.Raters.ToString(System.Globalization.CultureInfo.InvariantCulture),
                string.Join("; ", new[]
                {
                    c.Moderated is null ? null : $"moderated to {c.Moderated}",
                    c.Declined.Count == 0 ? null : "declined by " + string.Join(", ", c.Declined.Select(d => $"{_names.Assessor(d.Assessor)} ({d.Reason})")),
                }.Where(s => s is not null)),
            ]));

        _flow.Heading(_content.Award is null ? "Ranking" : $"Ranking by closeness ({(_content.Award.Method.Binding == Decide.Core.Award.BindingResult.Closeness ? "binding" : "supporting analysis")})", keepWith: 120);
        _flow.Table(
            [new("Rank", 0.7, CellAlign.Right), new("Alternative", 4), new("Closeness CC", 1.5, CellAlign.Right), new("d⁺ (from best)", 1.5, CellAlign.Right), new("d⁻ (from worst)", 1.5, CellAlign.Right)],
            RecordText.RankingRows(Evaluation, analysis),
            boldColumns: 0);
        if (analysis.Excluded.Count > 0)
        {
            _flow.Paragraph("Not ranked (failed a pass/fail gate, or excluded by the published award):", _style.BodyBold, after: 2, keepWith: 50);
            var notes = Evaluation.Gates.Where(g => !g.Passed).ToDictionary(g => (g.Alternative, g.Criterion), g => g.Note);
            _flow.Table(
                [new("Alternative", 3), new("Gate failed", 3), new("Reason recorded", 6)],
                analysis.Excluded.SelectMany(e => e.Gates.Count == 0
                    ? [(IReadOnlyList<string>)[_names.Alternative(e.Alternative), "(award rule)", e.Reason ?? ""]]
                    : e.Gates.Select(g => (IReadOnlyList<string>)
                        [_names.Alternative(e.Alternative), _names.Criterion(g), notes.GetValueOrDefault((e.Alternative, g)) ?? ""])));
        }

        if (analysis.Ranking.Count > 0)
        {
            _flow.Heading("Closeness coefficients", keepWith: 40);
            var items = analysis.Ranking.Select(r => (_names.Alternative(r.Alternative), r.Closeness, RecordText.Closeness(r.Closeness))).ToArray();
            var area = _flow.Reserve(Math.Max(60, (items.Length * 20) + 10));
            ChartPainter.Bars(_flow.Gfx, area, items, 1, _style);
            _flow.Paragraph("Bars run from 0 to 1; gridlines every 0.25.", _style.Small, _style.MutedBrush);
        }
    }
}
