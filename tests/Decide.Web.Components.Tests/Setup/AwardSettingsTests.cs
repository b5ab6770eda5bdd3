using System.Text.Json;
using Decide.Core.Award;
using Decide.Core.Model;
using Decide.Interchange;
using Decide.Web.Components.Pages.Setup;
using Decide.Web.Components.Tests.Support;
using Decide.Web.Features.Evaluations;

namespace Decide.Web.Components.Tests.Setup;

/// <summary>The published points and the award method as the facilitator sets them in the setup screens, without importing a file.</summary>
public sealed class AwardSettingsTests : MudComponentTest
{
    private static string SamplePlan => File.ReadAllText(Path.Combine(Repository.Root, "samples", "park-grounds-points.json"));

    [Fact]
    public void A_stored_points_plan_reads_into_the_draft_and_writes_back_with_the_same_points_and_award()
    {
        var stored = EvaluationFileReader.Read(SamplePlan);
        var plan = EvaluationImporter.PlanJson(stored);
        var draft = PlanDraft.From(JsonDocument.Parse(plan).RootElement, new EvaluationSettings(20, false, 1));

        Assert.Equal(WeightingMethod.Points, draft.Weighting);
        Assert.Equal(25, draft.Criteria.Single(c => c.Id == "method").Points);
        Assert.Equal("4", draft.Criteria.Single(c => c.Id == "method").MinimumTerm);
        Assert.Equal(60, draft.Groups.Single().Points);
        Assert.True(draft.Award.Enabled);
        Assert.Equal(50, draft.Award.MinimumQualityPercent!.Value, 9);

        var again = EvaluationFileReader.ReadPlan(draft.ToJson()).Evaluation;
        Assert.Equal(stored.Evaluation.Points!.Criteria, again.Points!.Criteria);
        Assert.Equal(stored.Evaluation.Award!.Formula, again.Award!.Formula);
        Assert.Equal(stored.Evaluation.Award.MinimumTerms, again.Award.MinimumTerms);
        Assert.Equal(stored.Evaluation.Award.TwoStage, again.Award.TwoStage);
    }

    [Fact]
    public void Choosing_a_relative_formula_warns_and_the_points_typed_in_reach_the_plan()
    {
        var draft = PlanDraft.From(JsonDocument.Parse("""
            {"format":"decide-evaluation/1","title":"T","ratingScale":"points-0-5","criteria":[
              {"id":"quality","name":"Quality"},{"id":"price","name":"Price","kind":"numeric","direction":"cost"}],"weighting":"points"}
            """).RootElement, new EvaluationSettings(0, false, 1));
        draft.Award.Enabled = true;
        draft.Award.PriceCriterion = "price";
        var cut = Render<AwardSettings>(p => p.Add(x => x.Draft, draft));
        Assert.NotEmpty(cut.FindAll("[data-testid=relative-warning]"));

        var fields = cut.FindAll("input");
        fields.Single(f => Label(f) == "Quality").Change("70");
        fields.Single(f => Label(f) == "Price").Change("30");
        cut.Render();
        Assert.Contains("add up to 100 of 100", cut.Find("[data-testid=points-sum]").TextContent, StringComparison.Ordinal);

        var plan = EvaluationFileReader.ReadPlan(draft.ToJson()).Evaluation;
        Assert.Equal([70.0, 30.0], plan.Points!.Criteria.Select(c => c.Points));
        Assert.Equal(PriceFormula.LowestPriceRatio, plan.Award!.Formula);
    }

    private static string? Label(AngleSharp.Dom.IElement input) =>
        input.Closest(".mud-input-control")?.QuerySelector("label")?.TextContent.Trim();
}
