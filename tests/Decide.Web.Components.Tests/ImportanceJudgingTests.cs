using Decide.Core.Scales;
using Decide.Web.Components.Pages.Inputs;
using Decide.Web.Components.Tests.Support;
using Decide.Web.Features.Inputs;

namespace Decide.Web.Components.Tests;

public sealed class ImportanceJudgingTests : MudComponentTest
{
    private static readonly ScaleTermView[] Scale =
        BuiltInScales.ChenImportance7.Terms.Select(t => new ScaleTermView(t.Code, t.Label, t.Value.ToArray())).ToArray();

    private static readonly WeightNodeView[] Nodes =
    [
        new("service", "Service delivery", "group", null), new("quality", "Quality", "criterion", null),
        new("staffing", "Staffing", "criterion", "service"),
    ];

    [Fact]
    public void Choosing_a_term_saves_every_term_given_with_the_version_read()
    {
        var requests = new List<WeightsRequest>();
        var view = new WeightsView("ashby", "importance", Nodes, Scale, new Dictionary<string, string> { ["service"] = "H" }, [],
            new WeightsFeedback(false, ["quality", "staffing"], [], []), null, true, 4);
        var cut = Render<ImportanceJudging>(p => p
            .Add(x => x.Weights, view)
            .Add(x => x.Save, r =>
            {
                requests.Add(r);
                return Task.FromResult(WeightsSaveResult.Ok(view with { Version = 5 }));
            }));

        // A group's criteria come right after it.
        Assert.Equal(["service", "staffing", "quality"], cut.FindAll("fieldset[data-node]").Select(f => f.GetAttribute("data-node")));

        cut.Find("fieldset[data-node=quality] input[value=VH]").Change(true);

        var request = Assert.Single(requests);
        Assert.Equal(4, request.Version);
        Assert.Null(request.Pairwise);
        Assert.Equal(new Dictionary<string, string?> { ["service"] = "H", ["quality"] = "VH" }, request.Importance);
        Assert.Equal("All changes saved.", cut.Find("[data-testid=save-state]").TextContent);
    }

    [Fact]
    public void A_refused_save_says_why_in_the_live_region()
    {
        var view = new WeightsView("ashby", "importance", Nodes, Scale, new Dictionary<string, string>(), [],
            new WeightsFeedback(false, ["service", "quality", "staffing"], [], []), null, true, 1);
        var refusal = new Decide.Web.Components.Shared.ProblemText("Not allowed at this stage", "The plan is locked.", new Dictionary<string, string[]>());
        var cut = Render<ImportanceJudging>(p => p
            .Add(x => x.Weights, view)
            .Add(x => x.Save, _ => Task.FromResult(WeightsSaveResult.Refused(refusal))));

        cut.Find("fieldset[data-node=service] input[value=M]").Change(true);

        var state = cut.Find("[data-testid=save-state]");
        Assert.Equal("Not saved: The plan is locked.", state.TextContent);
        Assert.Equal("polite", state.GetAttribute("aria-live"));
    }
}
