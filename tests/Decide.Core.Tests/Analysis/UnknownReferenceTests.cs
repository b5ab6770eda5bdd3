using Decide.Core.Model;
using Decide.Core.Tests.Support;
using static Decide.Core.Tests.Support.ErrorAssert;

namespace Decide.Core.Tests.Analysis;

/// <summary>Ids and terms that refer to nothing are reported at the place they are used.</summary>
public sealed class UnknownReferenceTests
{
    private static readonly Evaluation Sample = SampleEvaluation.WithImportance();

    [Fact]
    public void Rating_by_an_unknown_assessor()
    {
        var errors = Refused(Sample with { Ratings = [.. Sample.Ratings, new Rating("D9", "S1", "QUALITY", "G")] });
        HasError(errors, "$.ratings.D9", "unknown assessor \"D9\"");
    }

    [Fact]
    public void Rating_of_an_unknown_alternative()
    {
        var errors = Refused(Sample with { Ratings = [.. Sample.Ratings, new Rating("D1", "S9", "QUALITY", "G")] });
        HasError(errors, "$.ratings.D1.S9", "unknown alternative \"S9\"");
    }

    [Fact]
    public void Rating_on_an_unknown_criterion()
    {
        var errors = Refused(Sample with { Ratings = [.. Sample.Ratings, new Rating("D1", "S1", "SPEED", "G")] });
        HasError(errors, "$.ratings.D1.S1.SPEED", "unknown criterion \"SPEED\"");
    }

    [Fact]
    public void Rating_with_an_unknown_term_lists_the_scale()
    {
        var errors = Refused(Sample with { Ratings = Replace(Sample.Ratings, "D1", "S1", "QUALITY", "Excellent") });
        HasError(errors, "$.ratings.D1.S1.QUALITY", "unknown term \"Excellent\"", "VP, P, MP, F, MG, G, VG");
    }

    [Fact]
    public void Importance_by_an_unknown_assessor()
    {
        var errors = Refused(Sample with { Importance = [.. Sample.Importance, new ImportanceRating("D9", "QUALITY", "H")] });
        HasError(errors, "$.importance.D9", "unknown assessor \"D9\"");
    }

    [Fact]
    public void Importance_of_an_unknown_criterion()
    {
        var errors = Refused(Sample with { Importance = [.. Sample.Importance, new ImportanceRating("D1", "SPEED", "H")] });
        HasError(errors, "$.importance.D1.SPEED", "unknown criterion or group \"SPEED\"");
    }

    [Fact]
    public void Importance_of_a_gate()
    {
        var errors = Refused(Sample with { Importance = [.. Sample.Importance, new ImportanceRating("D1", "INSURED", "H")] });
        HasError(errors, "$.importance.D1.INSURED", "pass/fail gate", "carries no weight");
    }

    [Fact]
    public void Importance_with_an_unknown_term_lists_the_scale()
    {
        var importance = Sample.Importance.Select(r => r.Assessor == "D2" && r.Node == "STAFF" ? r with { Term = "XH" } : r).ToArray();
        var errors = Refused(Sample with { Importance = importance });
        HasError(errors, "$.importance.D2.STAFF", "unknown term \"XH\"", "VL, L, ML, M, MH, H, VH");
    }

    [Fact]
    public void Pairwise_judgement_by_an_unknown_assessor()
    {
        var sample = SampleEvaluation.WithPairwise();
        var errors = Refused(sample with { Pairwise = [.. sample.Pairwise, SampleEvaluation.Judgement("D9", "QUALITY", "STAFF", "2")] });
        HasError(errors, "$.pairwise.D9", "unknown assessor \"D9\"");
    }

    [Fact]
    public void Pairwise_judgement_of_an_unknown_criterion()
    {
        var sample = SampleEvaluation.WithPairwise();
        var errors = Refused(sample with { Pairwise = [.. sample.Pairwise, SampleEvaluation.Judgement("D1", "QUALITY", "SPEED", "2")] });
        HasError(errors, "$.pairwise.D1[3].col", "unknown criterion or group \"SPEED\"");
    }

    [Fact]
    public void Value_for_an_unknown_alternative()
    {
        var errors = Refused(Sample with { Values = [.. Sample.Values, new NumericValue("S9", "PRICE", 10)] });
        HasError(errors, "$.values.S9", "unknown alternative \"S9\"");
    }

    [Fact]
    public void Value_for_an_unknown_criterion()
    {
        var errors = Refused(Sample with { Values = [.. Sample.Values, new NumericValue("S1", "COST", 10)] });
        HasError(errors, "$.values.S1.COST", "unknown criterion \"COST\"");
    }

    [Fact]
    public void Gate_result_for_an_unknown_alternative()
    {
        var errors = Refused(Sample with { Gates = [.. Sample.Gates, new GateResult("S9", "INSURED", true)] });
        HasError(errors, "$.gates.S9", "unknown alternative \"S9\"");
    }

    [Fact]
    public void Gate_result_for_an_unknown_gate()
    {
        var errors = Refused(Sample with { Gates = [.. Sample.Gates, new GateResult("S1", "INSURANCE", true)] });
        HasError(errors, "$.gates.S1.INSURANCE", "unknown criterion \"INSURANCE\"");
    }

    [Fact]
    public void Gate_result_for_a_scored_criterion()
    {
        var errors = Refused(Sample with { Gates = [.. Sample.Gates, new GateResult("S1", "PRICE", true)] });
        HasError(errors, "$.gates.S1.PRICE", "is numeric, not a gate");
    }

    internal static Rating[] Replace(IReadOnlyList<Rating> ratings, string assessor, string alternative, string criterion, string term) =>
        ratings.Select(r => r.Assessor == assessor && r.Alternative == alternative && r.Criterion == criterion ? r with { Term = term } : r)
            .ToArray();
}
