using System.Text;
using System.Text.Json.Nodes;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Scales;

namespace Decide.Interchange.Tests;

public sealed class EvaluationFileReaderTests
{
    [Fact]
    public void The_minimal_example_reads_into_the_model_with_its_metadata()
    {
        var file = EvaluationFileReader.ReadFile(RepositoryFiles.MinimalExample);
        var e = file.Evaluation;

        Assert.Equal("Office cleaning contract 2027", e.Title);
        Assert.Equal(["quality", "price", "insurance"], e.Criteria.Select(c => c.Id));
        Assert.Equal([CriterionKind.Linguistic, CriterionKind.Numeric, CriterionKind.Gate], e.Criteria.Select(c => c.Kind));
        Assert.Equal(Direction.Cost, e.Criteria[1].Direction);
        Assert.Equal("EUR", e.Criteria[1].Unit);
        Assert.Equal(["B1", "B2", "B3"], e.Alternatives.Select(a => a.Id));
        Assert.Equal(["E1", "E2"], e.Assessors.Select(a => a.Id));
        Assert.Same(BuiltInScales.ChenRating7, e.RatingScale);
        Assert.Same(BuiltInScales.ChenImportance7, e.ImportanceScale);
        Assert.Equal("bids", file.Metadata.Noun);
        Assert.Equal("EX-2027-001", file.Metadata.Reference);
        Assert.Equal("Example Municipality", file.Metadata.Organisation);
        Assert.StartsWith("How convincingly", file.Metadata.DescriptionOf("quality"));
        Assert.Equal("Covers the sites, but supervision or auditing is vague.", e.Criteria[0].Descriptors!["F"]);
    }

    [Fact]
    public void Ratings_keep_file_order_rationale_and_declined_reason()
    {
        var e = EvaluationFileReader.ReadFile(RepositoryFiles.MinimalExample).Evaluation;

        Assert.Equal(
            [("E1", "B1"), ("E1", "B2"), ("E1", "B3"), ("E2", "B1"), ("E2", "B2"), ("E2", "B3")],
            e.Ratings.Select(r => (r.Assessor, r.Alternative)));
        Assert.Equal("G", e.Ratings[0].Term);
        Assert.StartsWith("Named supervisors", e.Ratings[0].Rationale);
        var declined = e.Ratings.Single(r => r is { Assessor: "E2", Alternative: "B2" });
        Assert.Null(declined.Term);
        Assert.StartsWith("Declared a conflict of interest", declined.Declined);
    }

    [Fact]
    public void Values_gates_importance_and_options_are_read()
    {
        var e = EvaluationFileReader.ReadFile(RepositoryFiles.MinimalExample).Evaluation;

        Assert.Equal(152500, e.Values.Single(v => v.Alternative == "B2").Value);
        var failed = e.Gates.Single(g => g.Alternative == "B3");
        Assert.False(failed.Passed);
        Assert.Equal("Certificate covers EUR 2 million only.", failed.Note);
        Assert.True(e.Gates.Single(g => g.Alternative == "B1").Passed);
        Assert.Contains(new ImportanceRating("E1", "quality", "VH"), e.Importance);
        Assert.Equal(WeightingMethod.Importance, e.Weighting);
        Assert.Equal(new AnalysisOptions(AggregationRule.Mean, IdealPoints.Unit), e.Options);
    }

    [Fact]
    public void Absent_members_take_the_documented_defaults()
    {
        var node = Files.Minimal();
        node.Remove("ratingScale");
        node.Remove("importanceScale");
        node.Remove("weighting");
        node.Remove("options");
        foreach (var criterion in node["criteria"]!.AsArray())
        {
            if ((string?)criterion!["id"] == "quality")
            {
                criterion.AsObject().Remove("kind");
                criterion.AsObject().Remove("direction");
            }
        }

        var e = EvaluationFileReader.Read(node.ToJsonString()).Evaluation;

        Assert.Same(BuiltInScales.ChenRating7, e.RatingScale);
        Assert.Same(BuiltInScales.ChenImportance7, e.ImportanceScale);
        Assert.Same(BuiltInScales.Pairwise9, e.PairwiseScale);
        Assert.Equal(WeightingMethod.Importance, e.Weighting);
        Assert.Equal(new AnalysisOptions(), e.Options);
        Assert.Equal((CriterionKind.Linguistic, Direction.Benefit), (e.Criteria[0].Kind, e.Criteria[0].Direction));
        Assert.All(e.Assessors, a => Assert.Equal(1, a.Weight));
    }

    [Fact]
    public void Pairwise_judgements_given_by_code_take_the_scale_value_and_keep_the_code()
    {
        var e = EvaluationFileReader.Read(Files.PairwiseText).Evaluation;

        var byCode = e.Pairwise.First(j => j is { Assessor: "E1", Row: "tech", Col: "service" });
        Assert.Equal("3", byCode.Term);
        BuiltInScales.Pairwise9.TryFind("3", out var step);
        Assert.Equal(BuiltInScales.Pairwise9[step].Value, byCode.Value);

        var byTfn = e.Pairwise.First(j => j is { Assessor: "E1", Row: "tech", Col: "cost" });
        Assert.Null(byTfn.Term);
        Assert.Equal(new Tfn(1, 2, 3), byTfn.Value);
        Assert.Equal(14, e.Pairwise.Count);
    }

    [Fact]
    public void Assessor_weight_and_assigned_criteria_are_read()
    {
        var e = EvaluationFileReader.Read(Files.PairwiseText).Evaluation;

        Assert.Equal(2, e.Assessors[0].Weight);
        Assert.Null(e.Assessors[0].Criteria);
        Assert.Equal(["coverage", "security", "risk"], e.Assessors[1].Criteria!);
        Assert.Equal("tech", e.Criteria[0].Group);
        Assert.Equal([new CriterionGroup("tech", "Technical merit")], e.Groups);
    }

    [Fact]
    public void Extension_members_and_result_members_are_allowed_and_ignored()
    {
        var node = Files.Minimal()
            .Set("x-tool", """{"name": "exporter", "version": 3}""")
            .Set("ranking", """[{"alternative": "B1", "rank": 1}]""")
            .Set("engine", """{"name": "Decide"}""")
            .Set("sensitivity", "{}")
            .Set("criteria/0/x-colour", "\"blue\"");

        var read = EvaluationFileReader.Read(node.ToJsonString());

        Assert.Equal(3, read.Evaluation.Criteria.Count);
    }

    [Fact]
    public void Utf8_bytes_with_a_byte_order_mark_read_like_text()
    {
        byte[] bytes = [0xEF, 0xBB, 0xBF, .. Encoding.UTF8.GetBytes(Files.MinimalText)];

        var fromBytes = EvaluationFileReader.Read(bytes.AsMemory());
        var fromStream = EvaluationFileReader.Read(new MemoryStream(bytes));

        Assert.Equal("Office cleaning contract 2027", fromBytes.Evaluation.Title);
        Assert.Equal(fromBytes.Evaluation.Ratings, fromStream.Evaluation.Ratings);
    }

    [Fact]
    public void A_file_that_does_not_exist_is_an_io_error_not_an_evaluation_error()
    {
        var path = Path.Combine(Path.GetTempPath(), $"decide-missing-{Guid.NewGuid():N}.json");

        Assert.Throws<FileNotFoundException>(() => EvaluationFileReader.ReadFile(path));
    }

    [Fact]
    public void Keys_that_are_not_plain_identifiers_are_quoted_in_paths()
    {
        var node = Files.Minimal().Set("ratings/E1/B 1", """{"quality": "G"}""");

        var error = Files.ErrorsOf(node).At("$.ratings.E1['B 1']");

        Assert.Contains("unknown alternative \"B 1\"", error.Reason);
    }

    [Fact]
    public void A_criterion_description_is_kept_in_metadata_not_in_the_model()
    {
        var file = EvaluationFileReader.Read(Files.PairwiseText);

        Assert.Equal("Share of routes covered.", file.Metadata.DescriptionOf("coverage"));
        Assert.Null(file.Metadata.DescriptionOf("security"));
        Assert.Null(file.Metadata.DescriptionOf("nonexistent"));
    }

    [Fact]
    public void Reading_leaves_a_file_that_the_engine_can_analyse()
    {
        var file = EvaluationFileReader.Read(Files.PairwiseText);

        var result = Core.Analysis.DecisionEngine.Analyse(file.Evaluation);

        Assert.Equal(3, result.Ranking.Count);
        Assert.Equal(["E1", "E2", "panel"], result.Consistency.Select(c => c.Assessor).Distinct().Order());
    }
}
