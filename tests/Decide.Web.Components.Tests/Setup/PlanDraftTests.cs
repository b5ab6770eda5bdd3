using System.Text.Json;
using Decide.Core.Model;
using Decide.Interchange;
using Decide.Interchange.Plans;
using Decide.Web.Components.Pages.Setup;
using Decide.Web.Features.Evaluations;

namespace Decide.Web.Components.Tests.Setup;

/// <summary>The plan draft the setup steps edit: what it writes must be a plan the reader accepts, saying what was set.</summary>
public sealed class PlanDraftTests
{
    private static readonly EvaluationSettings Defaults = new(20, false, 1);

    [Fact]
    public void A_draft_built_step_by_step_writes_a_plan_the_reader_accepts_with_every_choice_made()
    {
        var draft = Starter();
        draft.Description = "Shelter lighting for five years.";
        draft.Noun = "Suppliers";
        var tech = draft.AddGroup();
        draft.NameGroup(tech, "Technical solution");
        var quality = draft.AddCriterion();
        draft.NameCriterion(quality, "Maintenance plan");
        quality.Group = tech.Id;
        quality.Description = "How faults are found and fixed.";
        quality.Descriptors["G"] = "Named crews and a four-hour fix.";
        quality.Descriptors["F"] = "  ";
        var price = draft.AddCriterion();
        draft.NameCriterion(price, "Five-year price");
        (price.Kind, price.Direction, price.Unit) = (CriterionKind.Numeric, Direction.Cost, "EUR");
        var gate = draft.AddCriterion();
        draft.NameCriterion(gate, "Safety certificate");
        gate.Kind = CriterionKind.Gate;
        draft.DivergenceTolerance = 1;
        draft.Ideal = IdealPoints.Extreme;

        var read = EvaluationFileReader.ReadPlan(draft.ToJson());

        var plan = read.Evaluation;
        Assert.Equal([(tech.Id, "Technical solution")], plan.Groups.Select(g => (g.Id, g.Name)));
        Assert.Equal([quality.Id, price.Id, gate.Id], plan.Criteria.Select(c => c.Id));
        Assert.Equal([CriterionKind.Linguistic, CriterionKind.Numeric, CriterionKind.Gate], plan.Criteria.Select(c => c.Kind));
        Assert.Equal(tech.Id, plan.Criteria[0].Group);
        Assert.Equal(Direction.Cost, plan.Criteria[1].Direction);
        Assert.Equal("EUR", plan.Criteria[1].Unit);

        // Blank descriptors are left out rather than saved empty.
        Assert.Equal(["G"], plan.Criteria[0].Descriptors!.Keys);
        Assert.Equal("How faults are found and fixed.", read.Metadata.DescriptionOf(quality.Id));
        Assert.Equal("suppliers", read.Metadata.Noun);
        Assert.Equal("Shelter lighting for five years.", read.Metadata.Description);
        Assert.Equal(1, plan.Options.DivergenceTolerance);
        Assert.Equal(IdealPoints.Extreme, plan.Options.Ideal);
    }

    /// <remarks>The stored descriptors are in scale order, the order the draft writes them in.</remarks>
    [Fact]
    public void A_stored_plan_read_into_a_draft_and_written_again_says_the_same()
    {
        var original = StoredPlan();
        var draft = PlanDraft.From(JsonDocument.Parse(original).RootElement, Defaults);

        var before = EvaluationFileReader.ReadPlan(original);
        var after = EvaluationFileReader.ReadPlan(draft.ToJson());

        Assert.Equal(EvaluationFileWriter.ToJson(before), EvaluationFileWriter.ToJson(after));
    }

    [Fact]
    public void Ids_come_from_names_unique_among_criteria_and_groups_and_never_the_reserved_panel()
    {
        var draft = Starter();
        var group = draft.AddGroup();
        draft.NameGroup(group, "Price");
        var first = draft.AddCriterion();
        draft.NameCriterion(first, "Price");
        var second = draft.AddCriterion();
        draft.NameCriterion(second, "Panel");
        var third = draft.AddCriterion();
        draft.NameCriterion(third, "  ");

        Assert.Equal("price", group.Id);
        Assert.Equal("price_2", first.Id);
        Assert.NotEqual("panel", second.Id);
        Assert.StartsWith("criterion", third.Id, StringComparison.Ordinal);
        Assert.Equal(4, new[] { group.Id, first.Id, second.Id, third.Id }.Distinct().Count());
    }

    [Fact]
    public void A_stored_criterion_keeps_its_id_when_renamed_because_weights_and_assignments_refer_to_it()
    {
        var draft = PlanDraft.From(JsonDocument.Parse(StoredPlan()).RootElement, Defaults);

        draft.NameCriterion(draft.Criteria[0], "Display legibility day and night");

        Assert.Equal("display", draft.Criteria[0].Id);
        Assert.Contains("\"name\": \"Display legibility day and night\"", draft.ToJson().Replace("\":\"", "\": \""), StringComparison.Ordinal);
    }

    [Fact]
    public void Changing_to_a_scale_without_some_terms_leaves_their_descriptors_out_of_the_plan()
    {
        var draft = PlanDraft.From(JsonDocument.Parse(StoredPlan()).RootElement, Defaults);
        draft.RatingScale = PlanScale.Named("rating-5");

        var plan = EvaluationFileReader.ReadPlan(draft.ToJson()).Evaluation;

        // rating-5 has VP, P, F, G, VG: the descriptors for MP and MG stay on the screen but are not saved.
        Assert.Equal(["F", "G"], plan.Criteria[0].Descriptors!.Keys.Order());
        Assert.Equal("MP and MG too", draft.Criteria[0].Descriptors["MP"]);
    }

    [Fact]
    public void Removing_a_group_keeps_its_criteria_outside_any_group()
    {
        var draft = PlanDraft.From(JsonDocument.Parse(StoredPlan()).RootElement, Defaults);

        draft.RemoveGroup(draft.Groups[0]);

        var plan = EvaluationFileReader.ReadPlan(draft.ToJson()).Evaluation;
        Assert.Empty(plan.Groups);
        Assert.All(plan.Criteria, c => Assert.Null(c.Group));
    }

    private static PlanDraft Starter() => PlanDraft.From(JsonDocument.Parse(
        """{"format":"decide-evaluation/1","title":"Shelter lighting","reference":"KV-1","ratingScale":"chen-rating-7","importanceScale":"chen-importance-7","criteria":[],"weighting":"importance"}""").RootElement, Defaults);

    private static string StoredPlan() => """
        {
          "format": "decide-evaluation/1",
          "title": "Shelter lighting",
          "reference": "KV-1",
          "organisation": "Kestrel Vale Transport Authority",
          "description": "Five years of shelter lighting.",
          "noun": "suppliers",
          "ratingScale": "chen-rating-7",
          "importanceScale": "importance-5",
          "groups": [{"id": "tech", "name": "Technical"}],
          "criteria": [
            {"id": "display", "name": "Display legibility", "kind": "linguistic", "direction": "benefit", "group": "tech",
             "description": "Legible at the stop.", "descriptors": {"MP": "MP and MG too", "F": "Meets the specification.", "MG": "Nearly.", "G": "Legible at 10 m."}},
            {"id": "price", "name": "Price", "kind": "numeric", "direction": "cost", "unit": "EUR"},
            {"id": "ingress", "name": "Ingress certificate", "kind": "gate"}
          ],
          "weighting": "pairwise",
          "pairwiseScale": "pairwise-9",
          "options": {"aggregation": "mean", "ideal": "extreme", "divergenceTolerance": 3, "acceptabilityWeights": "uniform"}
        }
        """;
}
