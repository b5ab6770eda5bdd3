using System.Globalization;
using Decide.Core.Award;
using Decide.Reports.Layout;

namespace Decide.Reports;

internal sealed partial class RecordWriter
{
    /// <summary>
    /// The published points award as applied: the method in the words of the methodology, the table a bidder can
    /// recompute (totals, then every bid's score and points per criterion with the panel's terms), exclusions, the
    /// reviews of abnormally low prices and the award's robustness.
    /// </summary>
    private void Award(AwardReport award)
    {
        var f = award.Formula;
        _flow.Heading($"The award by the published points ({(award.Method.Binding == BindingResult.Points ? "binding" : "supporting analysis")})");
        _flow.Bullets(
        [
            AwardText.Binding(award.Method.Binding),
            AwardText.PanelScore(award.Method.PanelScore),
            AwardText.QualityPoints(award.ScaleMaximum),
            $"Price: {f.Name}, {f.Equation}, with Smax = {Points(award.PricePoints)} points. {f.Properties} Source: {f.Source}",
            AwardText.Thresholds(award.Method, Evaluation),
            AwardText.TieBreaks(award.Method.AppliedTieBreaks),
            AwardText.AbnormallyLow(award.Method.AbnormallyLow),
            AwardText.Stages(award.Method.TwoStage),
        ]);
        if (f.Relative)
        {
            _flow.Caution("This price formula is relative", [AwardText.RelativeWarning]);
        }

        _flow.Paragraph("Totals, in the order the bids were received:", _style.BodyBold, after: 2, keepWith: 60);
        _flow.Table(
            [new("Bid", 3.4), new("Quality", 1.3, CellAlign.Right), new("Price", 1.7, CellAlign.Right), new(f.GivesPoints ? "Price pts" : "Figure", 1.4, CellAlign.Right),
             new("Total", 1.3, CellAlign.Right), new("Rank", 0.9, CellAlign.Right), new("Notes", 4)],
            award.Lines.Select(line =>
            {
                var b = line.Award;
                return (IReadOnlyList<string>)
                [
                    _names.Alternative(b.Id),
                    Points(b.QualityPoints),
                    b.Price is { } price ? RecordText.Measured(price) : award.Method.TwoStage ? "not opened" : "",
                    (f.GivesPoints ? b.PricePoints : b.Figure) is { } score ? Points(score) : "–",
                    b.Total is { } total ? Points(total) : "–",
                    b.Rank is { } rank ? rank.ToString(CultureInfo.InvariantCulture) : "–",
                    string.Join("; ", new[]
                    {
                        b.Excluded is { } why ? $"excluded: {AwardText.Exclusion(why)} ({b.ExclusionDetail})" : null,
                        b.AbnormallyLowFlag is { } flag ? $"price flagged: {flag}" : null,
                        b.DecidedBy is { } rule ? $"placed above the next bid by {AwardText.Name(rule)}" : null,
                    }.Where(s => s is not null)),
                ];
            }));
        if (award.Winner is { } winner)
        {
            _flow.Paragraph($"The award by points goes to {_names.Alternative(winner)}.", _style.BodyBold);
        }
        else if (award.AwaitingDecision.Count > 0)
        {
            _flow.Paragraph($"No award yet: the decision on the abnormally low price of {string.Join(", ", award.AwaitingDecision.Select(_names.Alternative))} is not recorded.", _style.BodyBold);
        }

        _flow.Paragraph($"Every bid's points per criterion, as a bidder can recompute them: score ÷ {Points(award.ScaleMaximum)} × the criterion's points. \"Terms\" are the assessors' own; a moderated score is the term the panel agreed.", after: 2, keepWith: 60);
        var criteria = award.QualityCriteria;
        _flow.Table(
            [new("Bid", 3), new("Criterion (points)", 3.6), new("Terms", 2.2), new("Score", 1.2, CellAlign.Right), new("Points", 1.2, CellAlign.Right)],
            award.Lines.SelectMany(line => line.Cells.Select((c, j) => (IReadOnlyList<string>)
            [
                _names.Alternative(line.Alternative),
                $"{_names.Criterion(c.Criterion)} ({Points(award.CriterionPoints[j])})",
                c.Source == PanelScoreSource.Moderated ? $"{string.Join(", ", c.Terms)} → moderated {c.Term}" : string.Join(", ", c.Terms),
                Points(c.Score),
                Points(line.Award.CriterionPoints[j]),
            ])));

        var reviews = award.Lines.Where(l => l.Award.AbnormallyLowFlag is not null || l.Review is not null).ToArray();
        if (reviews.Length > 0)
        {
            _flow.Heading("Abnormally low prices", keepWith: 80);
            foreach (var line in reviews)
            {
                var r = line.Review;
                _flow.Facts(
                [
                    ("Bid", _names.Alternative(line.Alternative)),
                    ("Why flagged", line.Award.AbnormallyLowFlag ?? "(not flagged by the rule now)"),
                    ("Explanation asked", r?.Asked ?? "(not asked yet)"),
                    ("Answer", r?.Answer ?? "(none recorded)"),
                    ("Decision", r?.Decision is { } d ? (d == LowPriceDecision.Accepted ? "accepted: the bid stays in the award" : "rejected: the bid is excluded") : "(not decided)"),
                    ("Reasons", r?.Reasons ?? ""),
                ]);
            }
        }

        if (_content.AwardAgreement is { } agreement)
        {
            _flow.Paragraph(agreement.ClosenessWinner is null || agreement.PointsWinner is null
                ? "The points award and the closeness ranking cannot be compared yet."
                : $"The closeness ranking below puts {(agreement.SameWinner ? "the same bid" : _names.Alternative(agreement.ClosenessWinner))} first; Kendall's τ-b between the two orders is {(agreement.KendallTau is { } tau ? RecordText.Number(tau, 2) : "not defined")} over {agreement.Compared} bids.");
        }

        if (_content.AwardRobustness is { } checks)
        {
            AwardRobustness(checks);
        }
    }

    private void AwardRobustness(AwardRobustnessResult r)
    {
        _flow.Heading("Robustness of the award", keepWith: 100);
        _flow.Paragraph("Diagnostic only: nothing here changes the award.", _style.Cell, _style.MutedBrush);
        var rows = r.WithoutBid.Select(w => (IReadOnlyList<string>)[$"without bid {_names.Alternative(w.Without)}", w.Winner is null ? "none" : _names.Alternative(w.Winner), Reversals(w)])
            .Concat(r.WithoutAssessor.Select(w => (IReadOnlyList<string>)[$"without assessor {_names.Assessor(w.Without)}", w.Winner is null ? "none" : _names.Alternative(w.Winner), Reversals(w)]));
        _flow.Table([new("Recomputed", 4), new("First place", 3), new("Order of the others", 5)], rows);
        _flow.Paragraph("Each criterion's share of all points swept from 0% to 100% in steps of 1%, the others in proportion: the nearest shares at which another bid comes first.", after: 2, keepWith: 60);
        _flow.Table(
            [new("Criterion", 4), new("Published", 1.6, CellAlign.Right), new("Below", 3.2), new("Above", 3.2)],
            r.Sweeps.Select(s => (IReadOnlyList<string>)
            [
                _names.Criterion(s.Criterion), RecordText.Percent(s.Published),
                s.Lower is { } lower ? $"{RecordText.Percent(lower)}: {_names.Alternative(s.LowerWinner!)}" : "none",
                s.Upper is { } upper ? $"{RecordText.Percent(upper)}: {_names.Alternative(s.UpperWinner!)}" : "none",
            ]));
        if (r.CriticalChanges.Count > 0)
        {
            _flow.Paragraph("The smallest change of one criterion's share that reverses each pair of neighbours in the award's order:", after: 2, keepWith: 40);
            _flow.Table(
                [new("Pair", 5), new("Criterion", 4), new("Published", 1.6, CellAlign.Right), new("Reversed at", 1.8, CellAlign.Right)],
                r.CriticalChanges.Select(c => (IReadOnlyList<string>)
                    [$"{_names.Alternative(c.Above)} / {_names.Alternative(c.Below)}", _names.Criterion(c.Criterion), RecordText.Percent(c.Published), RecordText.Percent(c.Share)]));
        }

        if (r.Acceptability.Count > 0)
        {
            _flow.Paragraph($"First place when the panel's scores are drawn again from the assessors' own terms ({r.Draws} draws, seed {r.Seed}): "
                + string.Join("; ", r.Acceptability.OrderByDescending(a => a.First).Select(a => $"{_names.Alternative(a.Bid)} {RecordText.Percent(a.First)}")) + ".");
        }
    }

    private string Reversals(AwardWithout w) => w.Reversed.Count == 0
        ? "stands"
        : "reversed: " + string.Join("; ", w.Reversed.Select(p => $"{_names.Alternative(p.Above)} / {_names.Alternative(p.Below)}"));

    private static string Points(double value) => value.ToString("0.00", CultureInfo.InvariantCulture);
}
