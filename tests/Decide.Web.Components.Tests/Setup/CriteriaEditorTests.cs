using System.Text.Json;
using Decide.Interchange;
using Decide.Web.Components.Pages.Setup;
using Decide.Web.Components.Shared;
using Decide.Web.Components.Tests.Support;
using Decide.Web.Features.Evaluations;

namespace Decide.Web.Components.Tests.Setup;

public sealed class CriteriaEditorTests : MudComponentTest
{
    [Fact]
    public void With_no_criteria_it_says_what_to_do_and_adding_one_gives_a_card_with_a_field_per_rating_term()
    {
        var draft = Empty();
        var changed = 0;
        var cut = Render<CriteriaEditor>(p => p.Add(x => x.Draft, draft).Add(x => x.Changed, () => changed++));
        Assert.Contains("Add the first criterion", cut.Find("[data-testid=no-criteria]").TextContent, StringComparison.Ordinal);

        cut.FindAll("button").Single(b => b.TextContent.Contains("Add criterion", StringComparison.Ordinal)).Click();

        Assert.Single(draft.Criteria);
        Assert.Equal(1, changed);
        var card = cut.Find("[data-testid=criterion-0]");
        var labels = card.QuerySelectorAll("label").Select(l => l.TextContent.Trim()).ToArray();
        foreach (var term in draft.RatingTerms.Terms)
        {
            Assert.Contains($"{term.Label} ({term.Code})", labels);
        }
    }

    [Fact]
    public void Typing_a_name_and_a_descriptor_ends_up_in_the_plan_document()
    {
        var draft = Empty();
        var cut = Render<CriteriaEditor>(p => p.Add(x => x.Draft, draft));
        cut.FindAll("button").Single(b => b.TextContent.Contains("Add criterion", StringComparison.Ordinal)).Click();

        cut.Find("[data-testid=criterion-0] input").Input("Maintenance plan");
        var good = draft.RatingTerms.Terms.Single(t => t.Code == "G");
        var textareas = cut.FindAll("[data-testid=criterion-0] .decide-setup-descriptors textarea");
        textareas[draft.RatingTerms.Terms.ToList().IndexOf(good)].Change("Named crews and a four-hour fix.");

        var plan = EvaluationFileReader.ReadPlan(draft.ToJson()).Evaluation;
        Assert.Equal("Maintenance plan", plan.Criteria.Single().Name);
        Assert.Equal("maintenance_plan", plan.Criteria.Single().Id);
        Assert.Equal("Named crews and a four-hour fix.", plan.Criteria.Single().Descriptors!["G"]);
    }

    [Fact]
    public void A_refusal_for_one_criterion_is_shown_beside_that_criterion_and_not_the_others()
    {
        var draft = PlanDraft.From(JsonDocument.Parse("""
            {"format":"decide-evaluation/1","title":"T","criteria":[{"id":"a","name":"First"},{"id":"b","name":"Second"}]}
            """).RootElement, new EvaluationSettings(0, false, 1));
        var problem = new ProblemText("The evaluation has problems", "1 problem(s) must be fixed.",
            new Dictionary<string, string[]> { ["plan.criteria[1].name"] = ["criterion \"b\" needs a name"] });

        var cut = Render<CriteriaEditor>(p => p.Add(x => x.Draft, draft).Add(x => x.Problem, problem));

        Assert.Contains("needs a name", cut.Find("[data-testid=criterion-1]").TextContent, StringComparison.Ordinal);
        Assert.DoesNotContain("needs a name", cut.Find("[data-testid=criterion-0]").TextContent, StringComparison.Ordinal);
    }

    [Fact]
    public void Read_only_it_offers_no_buttons_to_add_or_remove()
    {
        var draft = PlanDraft.From(JsonDocument.Parse("""{"format":"decide-evaluation/1","title":"T","criteria":[{"id":"a","name":"First"}]}""").RootElement,
            new EvaluationSettings(0, false, 1));

        var cut = Render<CriteriaEditor>(p => p.Add(x => x.Draft, draft).Add(x => x.ReadOnly, true));

        Assert.DoesNotContain(cut.FindAll("button"), b => b.TextContent.Contains("Add", StringComparison.Ordinal) || b.TextContent.Contains("Remove", StringComparison.Ordinal));
    }

    private static PlanDraft Empty() => PlanDraft.From(JsonDocument.Parse("""{"format":"decide-evaluation/1","title":"T","criteria":[]}""").RootElement,
        new EvaluationSettings(0, false, 1));
}
