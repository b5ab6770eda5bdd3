using AngleSharp.Dom;
using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Robustness;
using Decide.Core.Scales;
using Decide.Data.Entities;
using Decide.Interchange;
using Decide.Web.Components.Pages.Inputs;
using Decide.Web.Components.Pages.Results;
using Decide.Web.Components.Shared;
using Decide.Web.Components.Tests.Support;
using Decide.Web.Features.Inputs;

namespace Decide.Web.Components.Tests;

/// <summary>
/// Names chosen by bidders, or typed by people, that are markup, script or spreadsheet formulas are shown as text on
/// the results and rating screens: the characters appear as written and no element is made from them.
/// </summary>
public sealed class HostileNamesTests : MudComponentTest
{
    /// <summary>Markup and script, and formula prefixes (OWASP "CSV Injection": =, +, -, @, tab, carriage return).</summary>
    private static readonly string[] Names =
    [
        "<script>alert(1)</script>", "<img src=x onerror=alert(1)>", "=HYPERLINK(\"http://example.invalid\",\"Click\")", "+cmd|' /C calc'!A0",
        "-2+3", "@SUM(1+1)", "\t=1+1 Tabbed Ltd", "\r=1+1 Returned Ltd", "\"><svg onload=alert(1)>",
    ];

    private static readonly Lazy<(Evaluation Evaluation, AnalysisResult Analysis, RobustnessResult Robustness)> Analysed = new(() =>
    {
        var e = EvaluationFileReader.ReadFile(SampleFile).Evaluation;
        e = e with
        {
            Alternatives = [.. e.Alternatives.Select((a, i) => a with { Name = Names[i % Names.Length] })],
            Criteria = [.. e.Criteria.Select((c, i) => c with { Name = Names[(i + 3) % Names.Length] })],
            Assessors = [.. e.Assessors.Select((a, i) => a with { Name = Names[(i + 5) % Names.Length] })],
        };
        var prepared = DecisionEngine.Prepare(e);
        var analysis = prepared.Analyse();
        return (e, analysis, RobustnessAnalysis.Run(prepared, analysis, new RobustnessOptions(200, 20261201, 1)));
    });

    [Fact]
    public void The_results_screens_sections_show_hostile_bid_criterion_and_assessor_names_as_text()
    {
        var (e, analysis, robustness) = Analysed.Value;
        var names = ResultNames.Of(e);
        var order = analysis.Ranking.Select(r => r.Alternative).ToArray();

        var texts = new List<string>();
        void Check<T>(IRenderedComponent<T> cut)
            where T : Microsoft.AspNetCore.Components.IComponent
        {
            AssertNoElementFromNames(cut.Nodes);
            texts.Add(string.Concat(cut.Nodes.Select(n => n.TextContent)));
        }

        Check(Render<RankingTable>(p => p.Add(x => x.Ranking, analysis.Ranking).Add(x => x.Names, names)));
        Check(Render<WeightsSection>(p => p.Add(x => x.Weights, analysis.Weights).Add(x => x.Names, names)));
        Check(Render<WhyLeads>(p => p.Add(x => x.Analysis, analysis).Add(x => x.Names, names)));
        Check(Render<AcceptabilitySection>(p => p.Add(x => x.Acceptability, robustness.Sensitivity.Acceptability).Add(x => x.Order, order).Add(x => x.Names, names)));
        Check(Render<CriticalChangesSection>(p => p.Add(x => x.Critical, robustness.Sensitivity.CriticalChanges).Add(x => x.Names, names)));
        Check(Render<PanelChecksSection>(p => p.Add(x => x.Sensitivity, robustness.Sensitivity).Add(x => x.Names, names)));
        Check(Render<AgreementSection>(p => p.Add(x => x.Agreement, robustness.Agreement).Add(x => x.Names, names)));
        var text = AsParsed(string.Concat(texts));

        // Every bid's name is on the ranking; the criteria's on the weights; at least one assessor's in the checks.
        Assert.All(e.Alternatives, a => Assert.Contains(AsParsed(a.Name), text, StringComparison.Ordinal));
        Assert.All(e.Criteria.Where(c => c.Kind != CriterionKind.Gate), c => Assert.Contains(AsParsed(c.Name), text, StringComparison.Ordinal));
        Assert.Contains(e.Assessors, a => text.Contains(AsParsed(a.Name), StringComparison.Ordinal));
    }

    [Fact]
    public void The_rating_screen_shows_hostile_bid_and_criterion_names_as_text()
    {
        SheetBidder[] bidders = [.. Names.Take(4).Select((name, i) => new SheetBidder($"b{i}", name, false, []))];
        SheetCriterion[] criteria = [.. Names.Skip(4).Take(3).Select((name, i) => new SheetCriterion($"c{i}", name, name, null, new Dictionary<string, string>()))];
        var cells = bidders.SelectMany(b => criteria.Select(c => new SheetCell(b.Code, c.Id, null, null, null, null, false, true))).ToArray();
        var scale = BuiltInScales.ChenRating7.Terms.Select(t => new ScaleTermView(t.Code, t.Label, t.Value.ToArray())).ToArray();
        var sheet = new RatingSheetView("ashby", EvaluationStage.Scoring, bidders, criteria, scale, cells, new SheetProgress(0, cells.Length), null, false, true, 20);

        var cut = Render<RatingGrid>(p => p.Add(x => x.Sheet, sheet)
            .Add(x => x.OnSave, (_, _) => Task.FromResult(CellSaveResult.Ok(cells[0])))
            .Add(x => x.OnSubmit, () => Task.FromResult<ProblemText?>(null)));

        AssertNoElementFromNames(cut.Nodes);
        var text = AsParsed(cut.Find("table").TextContent);
        Assert.All(bidders, b => Assert.Contains(AsParsed(b.Name), text, StringComparison.Ordinal));
        Assert.All(criteria, c => Assert.Contains(AsParsed(c.Name), text, StringComparison.Ordinal));
    }

    /// <summary>
    /// Text as the test's HTML parser gives it back: a carriage return becomes a line feed (HTML's input stream
    /// rules); a browser building the page from the circuit's updates keeps it.
    /// </summary>
    private static string AsParsed(string text) => text.Replace("\r\n", "\n", StringComparison.Ordinal).Replace('\r', '\n');

    /// <summary>No script or image element, and no element with an event-handler attribute, came from a name.</summary>
    private static void AssertNoElementFromNames(INodeList nodes)
    {
        foreach (var element in nodes.OfType<IElement>().SelectMany(n => n.DescendantsAndSelf().OfType<IElement>()))
        {
            Assert.False(element.LocalName is "script" or "img", $"a <{element.LocalName}> element: {element.OuterHtml}");
            Assert.DoesNotContain(element.Attributes, a => a.Name.StartsWith("on", StringComparison.OrdinalIgnoreCase));
        }
    }

    private static string SampleFile
    {
        get
        {
            for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
            {
                if (File.Exists(Path.Combine(dir.FullName, "Decide.sln")))
                {
                    return Path.Combine(dir.FullName, "samples", "bus-stop-displays-importance.json");
                }
            }

            throw new InvalidOperationException($"No folder above {AppContext.BaseDirectory} holds Decide.sln.");
        }
    }
}
