using System.Text.Json;
using Decide.Core;
using Decide.Core.Model;
using Decide.Interchange.Plans;

namespace Decide.Interchange.Tests;

/// <summary>
/// The plan while it is written: the lenient reader opens any stored plan for editing, the writer writes what the
/// strict reader accepts, and both take their words from the one table of format words.
/// </summary>
public sealed class PlanDocumentTests
{
    [Fact]
    public void Every_choice_has_one_word_and_the_word_reads_back_to_it()
    {
        static void Check<T>(IReadOnlyList<(string Name, T Value)> table, Func<T, string> of) where T : struct, Enum
        {
            Assert.Equal(Enum.GetValues<T>().Distinct().Order(), table.Select(x => x.Value).Order());
            Assert.Equal(table.Count, table.Select(x => x.Name).Distinct().Count());
            foreach (var value in Enum.GetValues<T>())
            {
                Assert.Equal(value, FormatWords.Parse(table, of(value), default));
            }
        }

        Check(FormatWords.Kinds, FormatWords.Of);
        Check(FormatWords.Directions, FormatWords.Of);
        Check(FormatWords.Weightings, FormatWords.Of);
        Check(FormatWords.Aggregations, FormatWords.Of);
        Check(FormatWords.Ideals, FormatWords.Of);
        Check(FormatWords.AcceptabilityWeightings, FormatWords.Of);
        Assert.Equal(Direction.Cost, FormatWords.Parse(FormatWords.Directions, "nonsense", Direction.Cost));
    }

    [Fact]
    public void A_plan_written_from_a_document_reads_strictly_to_the_same_choices()
    {
        var plan = new PlanDocument
        {
            Title = "  Shelter lighting  ",
            Reference = "KV-9",
            Noun = "Suppliers",
            Groups = [new CriterionGroup("tech", "Technical")],
            Criteria =
            [
                new PlanCriterion("display", "Display", Group: "tech", Description: "Legible at the stop.",
                    Descriptors: new Dictionary<string, string> { ["G"] = "Legible at 10 m.", ["VP"] = "Not legible.", ["F"] = "  " }),
                new PlanCriterion("price", "Price", CriterionKind.Numeric, Direction.Cost, Unit: "EUR"),
                new PlanCriterion("ingress", "Ingress certificate", CriterionKind.Gate),
            ],
            Weighting = WeightingMethod.Pairwise,
            Options = new AnalysisOptions(AggregationRule.Mean, IdealPoints.Extreme, 3, AcceptabilityWeights.Uniform),
        };

        var read = EvaluationFileReader.ReadPlan(PlanDocumentWriter.ToJson(plan));
        var e = read.Evaluation;
        Assert.Equal("Shelter lighting", e.Title);
        Assert.Equal("suppliers", read.Metadata.Noun);
        Assert.Equal(["display", "price", "ingress"], e.Criteria.Select(c => c.Id));
        Assert.Equal([CriterionKind.Linguistic, CriterionKind.Numeric, CriterionKind.Gate], e.Criteria.Select(c => c.Kind));
        Assert.Equal(Direction.Cost, e.Criteria[1].Direction);
        Assert.Equal(WeightingMethod.Pairwise, e.Weighting);
        Assert.Equal(plan.Options, e.Options);
        // Descriptors in the scale's order (VP before G), blank ones left out.
        Assert.Equal(["VP", "G"], e.Criteria[0].Descriptors!.Keys);

        // And the lenient reader gives the same document back.
        using var json = JsonDocument.Parse(PlanDocumentWriter.ToJson(plan));
        var again = PlanDocumentReader.Read(json.RootElement);
        Assert.Equal(PlanDocumentWriter.ToJson(plan), PlanDocumentWriter.ToJson(again));
    }

    [Fact]
    public void The_lenient_reader_opens_a_broken_plan_with_defaults_where_members_are_unreadable()
    {
        using var json = JsonDocument.Parse("""
            {"format":"decide-evaluation/1","title":7,"weighting":"sideways","ratingScale":[1],
             "criteria":[{"id":"a","name":"A","kind":"shape","direction":"cost"},"not a criterion"],
             "options":{"aggregation":"geometric","divergenceTolerance":"two"}}
            """);
        var plan = PlanDocumentReader.Read(json.RootElement);
        Assert.Equal("", plan.Title);
        Assert.Equal(WeightingMethod.Importance, plan.Weighting);
        Assert.Equal("chen-rating-7", plan.RatingScale.Name);
        var criterion = Assert.Single(plan.Criteria);
        Assert.Equal((CriterionKind.Linguistic, Direction.Cost), (criterion.Kind, criterion.Direction));
        Assert.Equal(AggregationRule.Geometric, plan.Options.Aggregation);
        Assert.Equal(2, plan.Options.DivergenceTolerance);
    }

    [Fact]
    public void A_starter_plan_has_the_title_and_no_criteria_and_the_strict_reader_asks_for_one()
    {
        var json = PlanDocumentWriter.ToJson(PlanDocument.Starter(" Fleet telematics ", " T-17 ", null));
        using var document = JsonDocument.Parse(json);
        Assert.Equal("Fleet telematics", document.RootElement.GetProperty("title").GetString());
        Assert.Equal("T-17", document.RootElement.GetProperty("reference").GetString());
        Assert.False(document.RootElement.TryGetProperty("organisation", out _));
        var errors = Assert.Throws<InvalidEvaluationException>(() => EvaluationFileReader.ReadPlan(json)).Errors;
        Assert.Contains(errors, e => e.Path == "$.criteria");
    }

    [Fact]
    public void A_custom_scale_is_read_on_its_own_with_its_members_rules_and_paths()
    {
        using var good = JsonDocument.Parse("""{"name":"house-4","range":[1,10],"terms":[{"code":"W","label":"Weak","tfn":[1,1,4]},{"code":"S","label":"Strong","tfn":[4,7,10]}]}""");
        var scale = EvaluationFileReader.ReadScale(good.RootElement, "ratingScale");
        Assert.Equal(["W", "S"], scale.Terms.Select(t => t.Code));
        Assert.Equal(new PlanScale("house-4", good.RootElement).Resolve("ratingScale")!.Terms, scale.Terms);

        using var bad = JsonDocument.Parse("""{"name":"house-4","terms":[{"code":"W","label":"Weak","tfn":[1,1,4]},{"code":"S","label":"Strong","tfn":[0.5,0.7,0.9]}]}""");
        var errors = Assert.Throws<InvalidEvaluationException>(() => EvaluationFileReader.ReadScale(bad.RootElement, "importanceScale")).Errors;
        Assert.Contains(errors, e => e.Path.StartsWith("$.importanceScale.terms[0]", StringComparison.Ordinal));
        Assert.Null(new PlanScale("house-4", bad.RootElement).Resolve("importanceScale"));
        Assert.Equal("chen-rating-7", PlanScale.Named("chen-rating-7").Resolve("ratingScale")!.Name);
    }
}
