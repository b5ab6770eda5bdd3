using System.Globalization;
using Decide.Reports.Layout;
using PdfSharp.Drawing;

namespace Decide.Reports;

internal sealed partial class RecordWriter
{
    private static string Signed(double value, int decimals) =>
        (value >= 0 ? "+" : "−") + RecordText.Number(Math.Abs(value), decimals);

    private void Robustness()
    {
        _flow.Section("6 Robustness");
        var robustness = _content.Robustness;
        var sensitivity = robustness.Sensitivity;
        _flow.Paragraph("These checks show how far the ranking depends on the weights, the individual assessors, the set of bids and the method. They are diagnostic: nothing here changes the ranking or re-weights anyone.");
        _flow.Bullets(robustness.Summary);

        var ranking = _content.Analysis.Ranking;
        var colours = ranking.Select((r, i) => (r.Alternative, i)).ToDictionary(p => p.Alternative, p => p.i, StringComparer.Ordinal);
        if (sensitivity.Sweeps.Count > 0 && ranking.Count > 1)
        {
            _flow.Heading("Weight sweeps", keepWith: 220);
            _flow.Paragraph("Closeness of each alternative as one criterion's share of the weight runs from 0% to 100% (the others keep their proportions). Dashed line: the current share. Rings: where two lines cross and the order changes. All lines fall towards the right because the other criteria's weights shrink towards 0 there, and a criterion of weight 0 leaves every bid as far from the ideal on it as it can be; only the order of the lines ranks.", _style.Cell, _style.MutedBrush);
            var legendArea = new XRect(_flow.Left, _flow.Y, _flow.Width, 40);
            _flow.Y += ChartPainter.Legend(_flow.Gfx, legendArea, ranking.Select(r => (_names.Alternative(r.Alternative), colours[r.Alternative])).ToArray(), _style) + 4;
            const double chartHeight = 150;
            foreach (var pair in sensitivity.Sweeps.Chunk(2))
            {
                var row = _flow.Reserve(chartHeight);
                var half = (row.Width - 16) / 2;
                for (var i = 0; i < pair.Length; i++)
                {
                    var sweep = pair[i];
                    var title = $"{_names.Criterion(sweep.Criterion)} (now {RecordText.Percent(sweep.Current)})";
                    ChartPainter.Sweep(_flow.Gfx, new XRect(row.X + (i * (half + 16)), row.Y, half, chartHeight - 6), sweep, title, colours, _style);
                }
            }

            var reversals = sensitivity.Sweeps.SelectMany(s => s.Reversals.Select(r => (s.Criterion, r))).ToArray();
            if (reversals.Length > 0)
            {
                _flow.Heading("Reversal points");
                _flow.Table(
                    [new("Criterion", 3), new("At share", 1.2, CellAlign.Right), new("Rises above", 2.5), new("Falls below", 2.5), new("Confirmed", 1.2)],
                    reversals.Select(p => (IReadOnlyList<string>)
                    [
                        _names.Criterion(p.Criterion), RecordText.Percent(p.r.Weight), _names.Alternative(p.r.Above), _names.Alternative(p.r.Below),
                        p.r.Confirmed ? "yes" : "between samples",
                    ]));
            }
        }

        var criticalChanges = sensitivity.CriticalChanges;
        var critical = criticalChanges.Changes.Where(c => c.Reverses).OrderBy(c => c.Absolute).ToArray();
        _flow.Heading("Critical changes of weight");
        if (critical.Length == 0)
        {
            _flow.Paragraph("No change of a single criterion's share between 0% and 100% reverses any pair of alternatives.");
        }
        else
        {
            _flow.Paragraph("The smallest change of one criterion's weight that puts the challenger ahead of the leader, in two measures. Change of share: the share the criterion must reach, the others keeping their proportions; this is the figure panels publish, and the one the screens show. Change of weight alone (Triantaphyllou and Sánchez 1997): the criterion's weight alone is changed, the others are left as they are, and then all are rescaled to 100%; the smallest such change that leaves the weight at 0 or more. Both describe the same reversals: a weight w changed by d gives the share (w + d)/(1 + d). Smallest change of share first.", _style.Cell, _style.MutedBrush);
            _flow.Table(
                [new("Criterion", 2.3), new("Leader", 1.9), new("Challenger", 1.9), new("Share now", 1.05, CellAlign.Right), new("Reverses at", 1.25, CellAlign.Right),
                 new("Share change (points)", 1.1, CellAlign.Right), new("Share change (% of share)", 1.1, CellAlign.Right),
                 new("Weight alone (points)", 1.2, CellAlign.Right), new("Weight alone (% of weight)", 1.1, CellAlign.Right)],
                critical.Select(c => (IReadOnlyList<string>)
                [
                    _names.Criterion(c.Criterion), _names.Alternative(c.Leader), _names.Alternative(c.Challenger), RecordText.Percent(c.Current),
                    RecordText.Percent(c.Weight!.Value), Signed((c.Weight.Value - c.Current) * 100, 1), Signed((c.Weight.Value - c.Current) / c.Current * 100, 0) + "%",
                    c.Delta is { } d ? Signed(-d * 100, 1) + (c.DeltaShare != c.Weight ? $" (at {RecordText.Percent(c.DeltaShare!.Value)})" : "") : "only with the whole weight",
                    c.DeltaRelative is { } r ? Signed(-r, 0) + "%" : "—",
                ]));

            _flow.Heading("Most critical criteria");
            _flow.Table(
                [new("Smallest", 4), new("Criterion", 2.4), new("Reversal", 3.6), new("Share now → at reversal", 2, CellAlign.Right), new("Weight alone (points, % of weight)", 2.2, CellAlign.Right)],
                new (string Title, Decide.Core.Robustness.MostCriticalCriterion? Most)[]
                {
                    ("first place: change of share", criticalChanges.TopShare),
                    ("first place: weight alone", criticalChanges.TopAbsolute),
                    ("first place: weight alone, % of it", criticalChanges.TopRelative),
                    ("any place: change of share", criticalChanges.AnyShare),
                    ("any place: weight alone", criticalChanges.AnyAbsolute),
                    ("any place: weight alone, % of it", criticalChanges.AnyRelative),
                }.Select(x => (IReadOnlyList<string>)(x.Most is not { } m
                    ? [x.Title, "none", x.Title.EndsWith("share", StringComparison.Ordinal) ? "no single change of weight reverses such a pair" : "no change of this weight alone reverses such a pair", "", ""]
                    :
                    [
                        x.Title, _names.Criterion(m.Criterion), $"{_names.Alternative(m.Challenger)} overtakes {_names.Alternative(m.Leader)}",
                        $"{RecordText.Percent(m.Current)} → {RecordText.Percent(m.Weight)}",
                        m.Delta is { } d ? $"{Signed(-d * 100, 1)} ({Signed(-m.DeltaRelative!.Value, 0)}%)" : "only with the whole weight",
                    ])));
        }

        var acceptability = sensitivity.Acceptability;
        _flow.Heading("Rank acceptability");
        if (acceptability.Draws == 0 || acceptability.Alternatives.Count == 0)
        {
            _flow.Paragraph("Not computed for this record.");
        }
        else
        {
            _flow.Paragraph($"Share of {acceptability.Draws.ToString("N0", CultureInfo.InvariantCulture)} random draws (seed {acceptability.Seed.ToString(CultureInfo.InvariantCulture)}) in which each alternative takes each rank; weights drawn {(acceptability.Weights == Decide.Core.Model.AcceptabilityWeights.Uniform ? "uniformly from all weightings" : "within the panel's fuzzy weights")} and ratings within the panel's triangles.", _style.Cell, _style.MutedBrush);
            var ranks = acceptability.Alternatives.Max(a => a.Ranks.Count);
            var byRanking = acceptability.Alternatives.OrderBy(a => colours.GetValueOrDefault(a.Alternative, int.MaxValue)).ToArray();
            _flow.Table(
                [new("Alternative", 3), .. Enumerable.Range(1, ranks).Select(r => new TableColumn($"Rank {r}", 1, CellAlign.Right)), new("First: 95% interval", 1.8, CellAlign.Right), new("Overall", 1.1, CellAlign.Right)],
                byRanking.Select(a => (IReadOnlyList<string>)
                [
                    _names.Alternative(a.Alternative),
                    .. Enumerable.Range(0, ranks).Select(r => r < a.Ranks.Count ? RecordText.Percent(a.Ranks[r]) : ""),
                    $"{RecordText.Percent(a.Intervals[0].Low)}–{RecordText.Percent(a.Intervals[0].High)}",
                    RecordText.Percent(a.Holistic),
                ]));
            _flow.Paragraph(ranks > 1
                ? $"Overall: the holistic acceptability of SMAA-2 (Lahdelma & Salminen 2001), each rank's share counted in full for first place down to nothing for last (rank r counts (n − r)/(n − 1))."
                : "Overall: the share of first place.", _style.Cell, _style.MutedBrush);
            if (acceptability.CentralWeights.Count > 0)
            {
                _flow.Paragraph("Central weights: the average weights of the draws each alternative wins, and its confidence factor, how often it still ranks first at exactly those weights when only the ratings vary (Lahdelma & Salminen 2001).", _style.Cell, _style.MutedBrush);
                _flow.Table(
                    [new("Alternative", 2.6), new("Confidence at its central weights", 1.6, CellAlign.Right), new("Central weights", 7)],
                    acceptability.CentralWeights.OrderBy(c => colours.GetValueOrDefault(c.Alternative, int.MaxValue)).Select(c => (IReadOnlyList<string>)
                    [
                        _names.Alternative(c.Alternative),
                        RecordText.Percent(c.Confidence),
                        string.Join(", ", c.Criteria.Zip(c.Weights, (criterion, w) => $"{_names.Criterion(criterion)} {RecordText.Percent(w)}")),
                    ]));
            }
        }

        _flow.Heading("Without each assessor (leave-one-out)");
        if (sensitivity.LeaveOneOut.Count == 0)
        {
            _flow.Paragraph("Not applicable: the panel has a single assessor.");
        }
        else
        {
            _flow.Table(
                [new("Without", 2.4), new("First place", 2.4), new("Winner changes", 1.3), new("Ranking", 6)],
                sensitivity.LeaveOneOut.Select(l => (IReadOnlyList<string>)
                [
                    _names.Assessor(l.Assessor),
                    l.Winner is null ? "—" : _names.Alternative(l.Winner),
                    l.Problem is not null ? "no ranking" : l.WinnerChanged ? "YES" : "no",
                    l.Problem ?? string.Join(" > ", l.Ranking.Select(_names.Alternative)),
                ]));
        }

        _flow.Heading("Without each alternative (withdrawal or late disqualification)");
        if (sensitivity.WithoutAlternative.Count == 0)
        {
            _flow.Paragraph("Not applicable: fewer than three alternatives are ranked.");
        }
        else
        {
            _flow.Table(
                [new("Removed", 2.4), new("Order of the others", 6), new("Pairs that reverse", 3.6)],
                sensitivity.WithoutAlternative.Select(w => (IReadOnlyList<string>)
                [
                    _names.Alternative(w.Alternative),
                    string.Join(" > ", w.Ranking.Select(_names.Alternative)),
                    w.Reversals.Count == 0 ? "none" : string.Join("; ", w.Reversals.Select(r => $"{_names.Alternative(r.NowAhead)} now ahead of {_names.Alternative(r.WasAhead)}")),
                ]));
        }

        if (sensitivity.Methods.Count > 0)
        {
            _flow.Heading("Other methods");
            _flow.Table(
                [new("Method", 4), new("Ranking", 6), new("Kendall τ", 1, CellAlign.Right), new("Same winner", 1.2)],
                sensitivity.Methods.Select(m => (IReadOnlyList<string>)(m.Note is { } note
                    ? [m.Description, note, "—", "—"]
                    :
                    [
                        m.Description, string.Join(" > ", m.Ranking.Select(_names.Alternative)),
                        m.KendallTau is { } tau ? RecordText.Number(tau, 2) : "—", m.SameWinner ? "yes" : "NO",
                    ])));
        }

        var agreement = robustness.Agreement;
        _flow.Heading("Panel agreement");
        _flow.Paragraph(agreement.Concordance is { } w
            ? $"Kendall's W = {RecordText.Number(w.W, 3)} over {w.Rankings} assessors' orders of {w.Objects} alternatives (χ² = {RecordText.Number(w.ChiSquare, 2)}, {w.DegreesOfFreedom} degrees of freedom, p = {RecordText.Number(w.PValue, 3)}); 1 means every assessor's ratings put the alternatives in the same order."
            : "Kendall's W is not defined here (fewer than two assessors' complete orders, or every order tied).");
        if (agreement.OutsideConcordance is { Count: > 0 } outside)
        {
            _flow.Paragraph($"Left out of Kendall's W because they did not rate every alternative: {string.Join(", ", outside.Select(_names.Assessor))}. W compares complete orders; completing theirs with the panel's values would overstate the agreement.");
        }

        if (agreement.Reliability is { } reliability)
        {
            _flow.Bullets(new[] { reliability.Ordinal, reliability.Interval }.OfType<Decide.Core.Robustness.AlphaEstimate>().Select(a =>
                $"Krippendorff's alpha, {(a.Metric == Decide.Core.Robustness.AlphaMetric.Ordinal ? "on the order of the terms" : "on the centres of the terms' triangles")}: {RecordText.Number(a.Alpha, 3)} (95% bootstrap over cells {RecordText.Number(a.Low, 3)} to {RecordText.Number(a.High, 3)}; {a.Units} cells rated by two or more, {a.PairableValues} ratings). 1 is full agreement, 0 agreement no better than chance; valid when each assessor rates only some cells (Krippendorff 2011).").ToArray());
        }

        if (agreement.ForDiscussion.Count == 0)
        {
            _flow.Paragraph($"No cell's terms are more than {agreement.Tolerance} scale steps apart.");
        }
        else
        {
            _flow.Paragraph($"Cells whose terms are more than {agreement.Tolerance} scale steps apart (listed for discussion):", after: 2, keepWith: 50);
            _flow.Table(
                [new("Alternative", 2.4), new("Criterion", 3), new("Spread (steps)", 1.2, CellAlign.Right), new("Terms given", 5)],
                agreement.ForDiscussion.Select(c => (IReadOnlyList<string>)
                [
                    _names.Alternative(c.Alternative), _names.Criterion(c.Criterion), c.Spread.ToString(CultureInfo.InvariantCulture),
                    string.Join(", ", c.Terms.Select(t => $"{_names.Assessor(t.Assessor)} {t.Term}")),
                ]));
        }

        if (_content.Round is { } round)
        {
            Round(round);
        }
    }
}
