using System.Globalization;
using Decide.Core.Award;
using Decide.Interchange;

namespace Decide.Cli;

/// <summary>
/// Prints the published points award as the table a bidder can recompute: per bid and criterion the panel's score
/// and the quality points, then the price, the price points or figure, the total and the rank; the method's
/// sentences, exclusions, flags and the agreement with the closeness ranking follow.
/// </summary>
internal static class AwardRenderer
{
    public static void Render(EvaluationFile file, AwardReport award, AwardAgreement agreement, AwardRobustnessResult? robustness, TextWriter output)
    {
        var e = file.Evaluation;
        var names = e.Alternatives.GroupBy(a => a.Id).ToDictionary(g => g.Key, g => g.First().Name);
        var criteria = e.Criteria.GroupBy(c => c.Id).ToDictionary(g => g.Key, g => g.First().Name);
        var formula = award.Formula;

        output.WriteLine();
        output.WriteLine(award.Method.Binding == BindingResult.Points ? "Award by published points (binding)" : "Award by published points (supporting analysis)");
        output.WriteLine($"  {AwardText.Binding(award.Method.Binding)}");
        output.WriteLine($"  {AwardText.PanelScore(award.Method.PanelScore)}");
        output.WriteLine($"  {AwardText.QualityPoints(award.ScaleMaximum)}");
        output.WriteLine($"  Price: {formula.Name}, {formula.Equation}, Smax = {F(award.PricePoints)} points. {formula.Properties}");
        output.WriteLine($"  Source: {formula.Source}");
        if (formula.Relative)
        {
            output.WriteLine($"  {AwardText.RelativeWarning}");
        }

        output.WriteLine($"  {AwardText.Thresholds(award.Method, e)}");
        output.WriteLine($"  {AwardText.TieBreaks(award.Method.AppliedTieBreaks)}");
        output.WriteLine();

        var headers = new List<string> { "Bid" };
        headers.AddRange(award.QualityCriteria.Select((id, j) => $"{id} ({F(award.CriterionPoints[j])})"));
        headers.AddRange(["Quality", "Price", formula.GivesPoints ? "Price pts" : "Figure", "Total", "Rank"]);
        var table = new TextTable([.. headers]).AlignRight([.. Enumerable.Range(1, headers.Count - 1)]);
        foreach (var line in award.Lines)
        {
            var b = line.Award;
            var row = new List<string> { b.Id };
            row.AddRange(line.Cells.Select((c, j) => $"{F(c.Score)}→{F2(b.CriterionPoints[j])}{(c.Source == PanelScoreSource.Moderated ? "*" : "")}"));
            row.Add(F2(b.QualityPoints));
            row.Add(b.Price is { } price ? price.ToString("#,0.##", CultureInfo.InvariantCulture) : award.Result.PricesSealed ? "sealed" : award.Method.TwoStage ? "not opened" : "–");
            row.Add(formula.GivesPoints ? (b.PricePoints is { } points ? F2(points) : "–") : (b.Figure is { } figure ? F2(figure) : "–"));
            row.Add(b.Total is { } total ? F2(total) : "–");
            row.Add(b.Rank is { } rank ? rank.ToString(CultureInfo.InvariantCulture) : "excl.");
            table.Add([.. row]);
        }

        table.Write(output, "  ");
        output.WriteLine($"  Cells: the panel's score on the 0–{F(award.ScaleMaximum)} scale → quality points; * = the score the panel agreed in moderation.");
        foreach (var (id, name) in award.QualityCriteria.Select(id => (id, criteria.GetValueOrDefault(id, id))))
        {
            output.WriteLine($"  {id}: {name}");
        }

        foreach (var b in award.Result.Bids.Where(b => b.Excluded is not null))
        {
            output.WriteLine($"  Excluded: {b.Id} {names.GetValueOrDefault(b.Id, b.Id)}: {AwardText.Exclusion(b.Excluded!.Value)} ({b.ExclusionDetail}).");
        }

        foreach (var line in award.Lines.Where(l => l.Award.AbnormallyLowFlag is not null))
        {
            var decision = line.Review?.Decision is { } d
                ? $"explanation {(d == LowPriceDecision.Accepted ? "accepted" : "rejected")}: {line.Review.Reasons?.TrimEnd('.')}"
                : "awaiting the facilitator's recorded decision";
            output.WriteLine($"  Abnormally low: {line.Alternative} {names.GetValueOrDefault(line.Alternative, line.Alternative)}: {line.Award.AbnormallyLowFlag}; {decision}.");
        }

        foreach (var b in award.Result.Bids.Where(b => b.DecidedBy is not null))
        {
            output.WriteLine($"  Tie: {b.Id} placed above the next bid by {AwardText.Name(b.DecidedBy!.Value)}.");
        }

        if (award.Result.UnresolvedTie)
        {
            output.WriteLine("  Bids are still tied after every tie-break; they share a rank and the panel must decide.");
        }

        if (award.Result.PricesSealed)
        {
            output.WriteLine("  Prices are sealed: quality points and thresholds are final; nothing is ranked until prices are opened.");
        }

        output.WriteLine(agreement.ClosenessWinner is null || agreement.PointsWinner is null
            ? "  Closeness ranking: no first place to compare yet."
            : $"  Closeness ranking: {(agreement.SameWinner ? "the same first place" : $"a different first place ({agreement.ClosenessWinner})")}; Kendall τ-b between the two orders {(agreement.KendallTau is { } tau ? F2(tau) : "not defined")} over {agreement.Compared} bids.");
        output.WriteLine($"  Winner under the binding result: {(agreement.Winner is { } winner ? $"{winner} {names.GetValueOrDefault(winner, winner)}" : "none yet")}.");
        if (robustness is not null)
        {
            RenderRobustness(robustness, output);
        }
    }

    private static void RenderRobustness(AwardRobustnessResult r, TextWriter output)
    {
        output.WriteLine();
        output.WriteLine("Robustness of the points award (diagnostic only: nothing here changes the award)");
        foreach (var w in r.WithoutBid)
        {
            output.WriteLine($"  Without {w.Without}: first place {w.Winner ?? "none"}; {Reversals(w)}");
        }

        foreach (var w in r.WithoutAssessor)
        {
            output.WriteLine($"  Without assessor {w.Without}: first place {w.Winner ?? "none"}{(w.WinnerChanged ? " (changed)" : "")}; {Reversals(w)}");
        }

        var sweeps = new TextTable("Criterion", "Published", "Lower reversal", "Upper reversal").AlignRight(1, 2, 3);
        foreach (var s in r.Sweeps)
        {
            sweeps.Add(s.Criterion, P(s.Published), s.Lower is { } lower ? $"{P(lower)} ({s.LowerWinner})" : "none", s.Upper is { } upper ? $"{P(upper)} ({s.UpperWinner})" : "none");
        }

        output.WriteLine("  Weight of each criterion swept, the others in proportion: the nearest shares at which another bid comes first");
        sweeps.Write(output, "  ");
        foreach (var c in r.CriticalChanges)
        {
            output.WriteLine($"  {c.Below} passes {c.Above} soonest when {c.Criterion} goes from {P(c.Published)} to {P(c.Share)} of all points");
        }
        if (r.Acceptability.Count > 0)
        {
            output.WriteLine($"  First place over {r.Draws} draws of the panel's scores from the assessors' own terms (seed {r.Seed}): "
                + string.Join(", ", r.Acceptability.OrderByDescending(a => a.First).Select(a => $"{a.Bid} {P(a.First)}")));
        }
    }

    private static string Reversals(AwardWithout w) => w.Reversed.Count == 0
        ? "the order of the others stands"
        : "reversed: " + string.Join("; ", w.Reversed.Select(p => $"{p.Above} and {p.Below}"));

    private static string P(double share) => share.ToString("0.0 %", CultureInfo.InvariantCulture);

    private static string F(double x) => x.ToString("0.##", CultureInfo.InvariantCulture);

    private static string F2(double x) => x.ToString("0.00", CultureInfo.InvariantCulture);
}
