using AngleSharp.Dom;
using Decide.Core.Scales;
using Decide.Web.Components.Pages.Inputs;
using Decide.Web.Components.Tests.Support;
using Decide.Web.Features.Inputs;

namespace Decide.Web.Components.Tests;

public sealed class PairwiseJudgingTests : MudComponentTest
{
    private static readonly ScaleTermView[] Scale =
        BuiltInScales.Pairwise9.Terms.Select(t => new ScaleTermView(t.Code, t.Label, t.Value.ToArray())).ToArray();

    private static readonly WeightNodeView[] Nodes =
    [
        new("quality", "Quality", "criterion", null), new("price", "Price", "criterion", null), new("service", "Service", "group", null),
    ];

    private readonly List<WeightsRequest> _requests = [];

    [Fact]
    public void Choosing_a_judgement_saves_every_judgement_and_shows_the_consistency_ratio_of_the_feedback_returned()
    {
        var start = View([new("quality", "price", "3", null), new("price", "service", "3", null)], Incomplete());
        // The feedback the service returns once the last pair is judged (the component shows it, it does not compute it).
        var after = View([], Complete(ratio: 0.0123, acceptable: true, gci: 0.0456));
        var cut = RenderPairwise(start, _ => WeightsSaveResult.Ok(after));

        // The first pair not yet compared is put first.
        Assert.Contains("How much more important is Quality than Service?", cut.Find("[data-testid=pair-question]").TextContent);
        Assert.Contains("once every pair here is compared", cut.Find("[data-testid=consistency-ratio]").TextContent);

        cut.Find("input[type=radio][value='5']").Change(true);

        var request = Assert.Single(_requests);
        Assert.Equal(7, request.Version);
        Assert.Contains(new PairwiseEntry("quality", "service", "5", null), request.Pairwise!);
        Assert.Equal(3, request.Pairwise!.Count);
        var shown = cut.Find("[data-testid=consistency-ratio]").TextContent;
        Assert.Contains("0.012", shown);
        Assert.Contains("consistent enough", shown);
        Assert.Contains("0.046", cut.Find("[data-testid=consistency]").TextContent);
        Assert.Equal("All changes saved.", cut.Find("[data-testid=save-state]").TextContent);
    }

    [Fact]
    public void The_least_consistent_judgement_is_highlighted_with_its_suggested_term_and_use_suggested_applies_it()
    {
        var hint = new JudgementHint("service", "quality", 5, 1.0 / 9, "1/9");
        var view = View(
            [new("quality", "price", "3", null), new("price", "service", "3", null), new("quality", "service", "1/5", null)],
            Complete(ratio: 0.4, acceptable: false, gci: 1.2, hint));
        var cut = RenderPairwise(view, _ => WeightsSaveResult.Ok(view));

        var worst = cut.Find("td[data-row=service][data-col=quality]");
        Assert.Contains("decide-worst", worst.ClassName);
        Assert.Contains("→ 1/9", worst.TextContent);
        Assert.Contains("too inconsistent", cut.Find("[data-testid=consistency-ratio]").TextContent);
        Assert.Contains("1/9", cut.Find("[data-testid=worst-judgement]").TextContent);

        cut.FindAll("button").First(b => b.TextContent.Contains("Use suggested")).Click();

        var request = Assert.Single(_requests);
        var pair = request.Pairwise!.Where(e => e.Row is "quality" or "service" && e.Col is "quality" or "service").ToArray();
        Assert.Equal([new PairwiseEntry("service", "quality", "1/9", null)], pair);
        Assert.Contains(new PairwiseEntry("quality", "price", "3", null), request.Pairwise!);

        // The pair it changed is the one shown, read from the first item's side: quality is 9 times as important as service.
        Assert.Contains("How much more important is Quality than Service?", cut.Find("[data-testid=pair-question]").TextContent);
    }

    [Fact]
    public void A_circle_of_judgements_is_named_in_words()
    {
        var view = View([], Complete(ratio: 0.9, acceptable: false, gci: 2, triad: ["quality", "price", "service"]));
        var cut = RenderPairwise(view, _ => WeightsSaveResult.Ok(view));

        Assert.Equal("Your judgements go round in a circle: Quality over Price, and Price over Service, but Service over Quality.",
            cut.Find("[data-testid=triad]").TextContent.Trim());
    }

    [Fact]
    public void Read_only_judgements_offer_no_choice_and_no_suggestion_to_apply()
    {
        var hint = new JudgementHint("service", "quality", 5, 1.0 / 9, "1/9");
        var view = View([new("quality", "price", "3", null)], Complete(ratio: 0.4, acceptable: false, gci: 1.2, hint));
        var cut = RenderPairwise(view, _ => throw new InvalidOperationException("nothing may be saved"), readOnly: true);

        Assert.NotNull(cut.Find("fieldset[disabled]"));
        Assert.DoesNotContain(cut.FindAll("button"), b => b.TextContent.Contains("Use suggested"));
        Assert.Empty(cut.FindAll("[data-testid=save-state]"));
    }

    private IRenderedComponent<PairwiseJudging> RenderPairwise(WeightsView view, Func<WeightsRequest, WeightsSaveResult> answer, bool readOnly = false) =>
        Render<PairwiseJudging>(p => p
            .Add(x => x.Weights, view)
            .Add(x => x.ReadOnly, readOnly)
            .Add(x => x.Save, request =>
            {
                _requests.Add(request);
                return Task.FromResult(answer(request));
            }));

    private static WeightsView View(IReadOnlyList<PairwiseEntry> pairwise, MatrixFeedback matrix) =>
        new("ashby", "pairwise", Nodes, Scale, new Dictionary<string, string>(), pairwise,
            new WeightsFeedback(matrix.Complete, [], [matrix], []), null, true, 7);

    private static MatrixFeedback Incomplete() =>
        new(null, ["quality", "price", "service"], false, [["quality", "service"]], null, 0.05, null, null, 0.31, [], [], null);

    private static MatrixFeedback Complete(double ratio, bool acceptable, double gci, JudgementHint? hint = null, string[]? triad = null) =>
        new(null, ["quality", "price", "service"], true, [], ratio, 0.05, acceptable, gci, 0.31,
            hint is null ? [] : [hint], triad is null ? [] : [triad], null);
}
