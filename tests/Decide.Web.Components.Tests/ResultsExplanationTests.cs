using System.Globalization;
using Decide.Core.Analysis;
using Decide.Core.Robustness;
using Decide.Interchange;
using Decide.Web.Components.Pages.Results;
using Decide.Web.Components.Tests.Support;

namespace Decide.Web.Components.Tests;

/// <summary>What the results screen says about why one bid leads another and about the method cross-check.</summary>
public sealed class ResultsExplanationTests : MudComponentTest
{
    private static readonly Lazy<(ResultNames Names, AnalysisResult Analysis, RobustnessResult Robustness)> Analysed = new(() =>
    {
        var e = EvaluationFileReader.ReadFile(Path.Combine(Root(), "samples", "bus-stop-displays-importance.json")).Evaluation;
        var prepared = DecisionEngine.Prepare(e);
        var analysis = prepared.Analyse();
        return (ResultNames.Of(e), analysis, RobustnessAnalysis.Run(prepared, analysis, new RobustnessOptions(0, 1, 1)));
    });

    [Fact]
    public void Why_one_bid_leads_shows_that_the_criteria_parts_add_up_to_the_difference_in_closeness()
    {
        var (names, analysis, _) = Analysed.Value;
        var cut = Render<WhyLeads>(p => p.Add(x => x.Analysis, analysis).Add(x => x.Names, names));

        // The first two of the ranking are compared by default; their difference, to four decimals, is shown twice:
        // as the sum of the parts and as the difference of the closeness values.
        var difference = (analysis.Ranking[0].Closeness - analysis.Ranking[1].Closeness).ToString("F4", CultureInfo.InvariantCulture);
        var total = cut.Find("[data-testid=why-leads-total]").TextContent;
        Assert.Contains($"Sum of the criteria's parts: +{difference}", total, StringComparison.Ordinal);
        Assert.Contains($"Difference in closeness: +{difference}", total, StringComparison.Ordinal);
        Assert.Contains("add up to it exactly", cut.Markup, StringComparison.Ordinal);
    }

    [Fact]
    public void A_cross_check_that_cannot_be_applied_says_why_instead_of_a_winner()
    {
        var (names, _, robustness) = Analysed.Value;
        var sensitivity = robustness.Sensitivity with
        {
            Methods =
            [
                new MethodComparison("aggregation:geometric", "geometric mean of the assessors' ratings", [], [], null, false,
                    "not applicable: the geometric mean is undefined for a term with a value of 0"),
                .. robustness.Sensitivity.Methods.Skip(1),
            ],
        };

        var cut = Render<PanelChecksSection>(p => p.Add(x => x.Sensitivity, sensitivity).Add(x => x.Names, names));

        var row = cut.FindAll("tr").Single(r => r.TextContent.Contains("Geometric mean of the assessors' ratings", StringComparison.Ordinal));
        Assert.Contains("Not applicable: the geometric mean is undefined for a term with a value of 0", row.TextContent, StringComparison.Ordinal);
        Assert.DoesNotContain(">no<", row.InnerHtml, StringComparison.Ordinal);
        Assert.Contains(cut.FindAll("td"), c => c.TextContent.StartsWith("Weighted total of scores on the rating scale", StringComparison.Ordinal));
    }

    private static string Root()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "Decide.sln")))
        {
            dir = dir.Parent;
        }

        return dir?.FullName ?? throw new InvalidOperationException("Decide.sln not found above the test directory.");
    }
}
