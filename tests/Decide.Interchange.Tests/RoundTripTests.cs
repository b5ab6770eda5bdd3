using System.Text;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Scales;
using FsCheck;
using FsCheck.Xunit;

namespace Decide.Interchange.Tests;

public sealed class RoundTripTests
{
    [Fact]
    public void The_minimal_example_reads_back_the_same_after_writing()
    {
        var original = EvaluationFileReader.ReadFile(RepositoryFiles.MinimalExample);

        var again = EvaluationFileReader.Read(EvaluationFileWriter.ToJson(original));

        ContentAssert.Same(original, again);
        Assert.Equal(original.Evaluation.Ratings, again.Evaluation.Ratings); // a file's own order is kept exactly
    }

    [Fact]
    public void A_pairwise_evaluation_with_groups_custom_scales_and_metadata_reads_back_the_same()
    {
        var original = EvaluationFileReader.Read(Files.PairwiseText);

        var again = EvaluationFileReader.Read(EvaluationFileWriter.ToJson(original));

        ContentAssert.Same(original, again);
        Assert.Equal(original.Evaluation.Pairwise, again.Evaluation.Pairwise);
    }

    [Fact]
    public void Writing_what_was_read_gives_the_same_text_again()
    {
        var first = EvaluationFileWriter.ToJson(EvaluationFileReader.Read(Files.PairwiseText));

        var second = EvaluationFileWriter.ToJson(EvaluationFileReader.Read(first));

        Assert.Equal(first, second);
    }

    [Fact]
    public void A_model_built_in_code_round_trips_in_content_whatever_the_order_of_its_lists()
    {
        // Ratings listed criterion by criterion, as a program might build them; the file groups them by assessor.
        var evaluation = new Evaluation
        {
            Title = "Built in code",
            Criteria = [new Criterion("C1", "First"), new Criterion("C2", "Second", Direction: Direction.Benefit)],
            Alternatives = [new Alternative("A1", "One"), new Alternative("A2", "Two")],
            Assessors = [new Assessor("D1", "Dee one", 0.5), new Assessor("D2", "Dee two")],
            Importance = [.. from c in new[] { "C1", "C2" } from d in new[] { "D1", "D2" } select new ImportanceRating(d, c, "MH")],
            Ratings = [.. from c in new[] { "C1", "C2" } from a in new[] { "A1", "A2" } from d in new[] { "D1", "D2" }
                select new Rating(d, a, c, a == "A1" ? "G" : "F", c == "C2" ? "See notes, \"p. 4\"" : null)],
            Options = new AnalysisOptions(AggregationRule.Mean, IdealPoints.Extreme, DivergenceTolerance: 3),
        };

        var again = EvaluationFileReader.Read(EvaluationFileWriter.ToJson(evaluation));

        ContentAssert.Same(evaluation, again.Evaluation);
        Assert.Equal(EvaluationMetadata.None.Noun, again.Metadata.Noun);
    }

    [Fact]
    public void Built_in_scales_are_written_by_name_and_custom_ones_in_full()
    {
        var json = EvaluationFileWriter.ToJson(EvaluationFileReader.Read(Files.PairwiseText));

        Assert.Contains("\"importanceScale\": \"importance-5\"", json);
        Assert.Contains("\"pairwiseScale\": \"pairwise-9\"", json);
        Assert.Contains("\"name\": \"house-rating-4\"", json);
        Assert.Contains("\"format\": \"decide-evaluation/1\"", json);
    }

    [Fact]
    public void A_judgement_whose_code_no_longer_matches_its_value_is_written_as_its_value()
    {
        var file = EvaluationFileReader.Read(Files.PairwiseText);
        var changed = file.Evaluation.Pairwise.ToArray();
        changed[0] = changed[0] with { Value = new Tfn(1, 1.5, 2) }; // still carries the code "3"
        var evaluation = file.Evaluation with { Pairwise = changed };

        var again = EvaluationFileReader.Read(EvaluationFileWriter.ToJson(file with { Evaluation = evaluation }));

        Assert.Equal(new Tfn(1, 1.5, 2), again.Evaluation.Pairwise[0].Value);
        Assert.Null(again.Evaluation.Pairwise[0].Term);
    }

    [Theory]
    [InlineData(0.30000000000000004)]
    [InlineData(1.0 / 3)]
    [InlineData(1e-7)]
    [InlineData(123456789.123456789)]
    [InlineData(double.Epsilon)]
    public void Numbers_read_back_to_the_same_double(double price)
    {
        var file = EvaluationFileReader.ReadFile(RepositoryFiles.MinimalExample);
        var values = file.Evaluation.Values.Select(v => v.Alternative == "B3" ? v with { Value = price } : v).ToArray();
        var evaluation = file.Evaluation with { Values = values };

        var again = EvaluationFileReader.Read(EvaluationFileWriter.ToJson(file with { Evaluation = evaluation }));

        Assert.Equal(BitConverter.DoubleToInt64Bits(price), BitConverter.DoubleToInt64Bits(again.Evaluation.Values.Single(v => v.Alternative == "B3").Value));
    }

    [Fact]
    public void A_custom_scale_equal_to_a_built_in_one_is_written_by_name()
    {
        var copy = LinguisticScale.Create("rating-5", 0, 10, BuiltInScales.Rating5.Terms);
        var file = EvaluationFileReader.ReadFile(RepositoryFiles.MinimalExample);

        var json = EvaluationFileWriter.ToJson(file with { Evaluation = file.Evaluation with { RatingScale = copy } });

        Assert.Contains("\"ratingScale\": \"rating-5\"", json);
    }

    [Property(MaxTest = 200)]
    public bool Any_text_in_names_rationales_and_metadata_survives_the_round_trip(NonNull<string> generated)
    {
        var text = generated.Get;
        if (!IsWellFormedUtf16(text))
        {
            return true; // not representable in UTF-8 JSON at all
        }

        var file = EvaluationFileReader.ReadFile(RepositoryFiles.MinimalExample);
        var e = file.Evaluation with
        {
            Alternatives = file.Evaluation.Alternatives.Select(a => a with { Name = "x" + text }).ToArray(),
            Ratings = file.Evaluation.Ratings.Select(r => r.Term is null ? r : r with { Rationale = text }).ToArray(),
        };
        var metadata = file.Metadata with { Description = text, Noun = text };

        var again = EvaluationFileReader.Read(EvaluationFileWriter.ToJson(new EvaluationFile(e, metadata)));

        return again.Evaluation.Alternatives.All(a => a.Name == "x" + text)
            && again.Evaluation.Ratings.Where(r => r.Term is not null).All(r => r.Rationale == text)
            && again.Metadata.Description == text && again.Metadata.Noun == text;
    }

    private static bool IsWellFormedUtf16(string text)
    {
        try
        {
            _ = new UTF8Encoding(false, throwOnInvalidBytes: true).GetByteCount(text);
            return true;
        }
        catch (ArgumentException)
        {
            return false;
        }
    }
}
