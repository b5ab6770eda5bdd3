using System.Globalization;
using Decide.Core.Robustness;
using Decide.Core.Rounds;
using Decide.Interchange;

namespace Decide.Cli;

/// <summary>
/// Prints what a round adds: the funding line down the ranking, the bands the draws cannot put in order, the
/// applications whose funding a check changes, what leaving each reviewer out does, and Krippendorff's alpha.
/// </summary>
internal static class RoundRenderer
{
    public static void Render(EvaluationFile file, RoundReport round, PanelAgreementResult? agreement, TextWriter output)
    {
        var e = file.Evaluation;
        var names = e.Alternatives.GroupBy(a => a.Id).ToDictionary(g => g.Key, g => g.First().Name);
        string Name(string id) => names.GetValueOrDefault(id, id);

        output.WriteLine();
        output.WriteLine(e.Reviews is { } design
            ? $"Round: {e.Alternatives.Count} applications, {design.ReviewersPerApplication} reviewers each, at most {design.MaxLoad} per reviewer"
            : "Round");
        if (round.Funding is { } funding)
        {
            var unit = funding.Plan.Currency is { } c ? $" {c}" : "";
            output.WriteLine($"  Funding line: budget {Money(funding.Plan.Budget)}{unit}, {RoundText.FundingRule(funding.Plan.Rule)}; {funding.Funded.Count()} funded, {Money(funding.Spent)}{unit} spent.");
            if (funding.TiedAcrossTheLine.Count > 0)
            {
                output.WriteLine($"  The line falls inside a tie: {string.Join(", ", funding.TiedAcrossTheLine.Select(Name))} have the same score; the panel must break it.");
            }
        }

        var table = new TextTable("Place", "Id", "Name", "Band", "Ranks (95%)", "Requested", "Funded").AlignRight(0, 3, 5);
        foreach (var row in round.Rows())
        {
            table.Add(
                row.Place.ToString(CultureInfo.InvariantCulture),
                row.Alternative,
                Name(row.Alternative),
                row.Band?.ToString(CultureInfo.InvariantCulture) ?? "–",
                row.Interval is { } interval ? RoundText.Places(interval) : "–",
                row.Funding is { } decision ? Money(decision.Requested) : "–",
                row.Funding is { } funded ? RoundText.Decision(funded) : "–");
        }

        table.Write(output, "  ");
        if (round.Bands.Count > 0)
        {
            output.WriteLine("  Band: applications whose 95% rank intervals overlap the first of the band's; the draws cannot put them in order.");
        }

        foreach (var flip in round.Flips)
        {
            output.WriteLine($"  {Name(flip.Alternative)} is {(flip.FundedNow ? "funded" : "not funded")}, but {string.Join("; and ", flip.Because)}.");
        }

        foreach (var effect in round.Reviewers.Where(x => x.LargestMove is not null && x.From != x.To))
        {
            var who = e.Assessors.FirstOrDefault(a => a.Id == effect.Assessor)?.Name ?? effect.Assessor;
            output.WriteLine($"  Without {who} (who rated {effect.Read}), {Name(effect.LargestMove!)} moves from place {effect.From} to {effect.To}.");
        }

        if (round.Calibrated is { } calibrated)
        {
            output.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"  Calibrated beside the raw ranking (each reviewer's terms moved to the panel's mean {calibrated.PanelMean:0.00} and spread {calibrated.PanelSpread:0.00} on the scale): first {Name(calibrated.Order.FirstOrDefault() ?? "-")}, tau-b with the raw order {(calibrated.KendallTau is { } tau ? tau.ToString("0.000", CultureInfo.InvariantCulture) : "undefined")}{(calibrated.FundingChanges.Count > 0 ? $"; funding would differ for {string.Join(", ", calibrated.FundingChanges.Select(Name))}" : "")}. The raw ranking stays the panel's result."));
        }

        if (agreement?.Reliability is { } reliability)
        {
            foreach (var alpha in new[] { reliability.Ordinal, reliability.Interval }.OfType<AlphaEstimate>())
            {
                output.WriteLine(string.Create(CultureInfo.InvariantCulture,
                    $"  Krippendorff's alpha ({alpha.Metric.ToString().ToLowerInvariant()}): {alpha.Alpha:0.000} (95% bootstrap {alpha.Low:0.000} to {alpha.High:0.000}; {alpha.Units} cells rated by two or more)."));
            }
        }

        if (agreement?.OutsideConcordance is { Count: > 0 } outside)
        {
            output.WriteLine($"  Kendall's W leaves out {outside.Count} {(outside.Count == 1 ? "assessor" : "assessors")} who did not rate every application: W needs complete rankings.");
        }
    }

    private static string Money(double amount) => amount.ToString("#,0.##", CultureInfo.InvariantCulture);
}
