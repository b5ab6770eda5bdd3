using System.Text.Json;
using Decide.Core.Model;
using Decide.Interchange;
using Decide.Web.Components.Pages.Setup;
using Decide.Web.Components.Tests.Support;
using Decide.Web.Features.Evaluations;

namespace Decide.Web.Components.Tests.Setup;

/// <summary>A round and its funding line as the facilitator sets them in the setup screens.</summary>
public sealed class RoundSettingsTests : MudComponentTest
{
    private static PlanDraft Draft() => PlanDraft.From(JsonDocument.Parse("""
        {"format":"decide-evaluation/1","title":"Fund","criteria":[{"id":"merit","name":"Merit"}]}
        """).RootElement, new EvaluationSettings(0, false, 1));

    [Fact]
    public void Choosing_a_round_asks_for_reviewers_per_application_and_the_load_and_they_reach_the_plan()
    {
        var draft = Draft();
        var cut = Render<MethodSettings>(p => p.Add(x => x.Draft, draft).Add(x => x.Noun, "applications"));
        Assert.DoesNotContain("Reviewers per application", cut.Markup, StringComparison.Ordinal);

        cut.FindAll("[data-testid=round-settings] input[type=radio]")[1].Click();
        cut.Render();
        Assert.Contains("Reviewers per application", cut.Markup, StringComparison.Ordinal);
        Assert.Contains("Each reviewer reads only the applications assigned to them", cut.Markup, StringComparison.Ordinal);

        draft.ReviewersPerApplication = 4;
        draft.MaxLoad = 12;
        draft.Budget = 80_000;
        draft.Currency = "EUR";
        var plan = EvaluationFileReader.ReadPlan(draft.ToJson()).Evaluation;
        Assert.Equal((4, 12), (plan.Reviews!.ReviewersPerApplication, plan.Reviews.MaxLoad));
        Assert.Empty(plan.Reviews.Assigned);
        Assert.Equal(new FundingPlan(80_000, FundingRule.StopAtFirstUnaffordable, "EUR"), plan.Funding);

        var back = PlanDraft.From(JsonDocument.Parse(draft.ToJson()).RootElement, new EvaluationSettings(0, false, 1));
        Assert.True(back.Round);
        Assert.Equal((4, 12, 80_000.0), (back.ReviewersPerApplication, back.MaxLoad, back.Budget!.Value));
    }

    [Fact]
    public void A_budget_of_zero_is_refused_by_its_place_when_the_plan_is_read()
    {
        var draft = Draft();
        draft.Budget = 0;
        var e = Assert.Throws<Decide.Core.InvalidEvaluationException>(() => EvaluationFileReader.ReadPlan(draft.ToJson()));
        Assert.Contains(e.Errors, x => x.Path == "$.funding.budget" && x.Reason.Contains("positive amount"));
    }
}
