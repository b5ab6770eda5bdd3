using Decide.Core.Model;
using Decide.Core.Tests.Support;
using static Decide.Core.Tests.Support.ErrorAssert;

namespace Decide.Core.Tests.Analysis;

/// <summary>Problems with ratings, values and gate results.</summary>
public sealed class InputValidationTests
{
    private static readonly Evaluation Sample = SampleEvaluation.WithImportance();

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(double.NegativeInfinity)]
    public void A_numeric_value_that_is_not_a_number(double value)
    {
        var errors = Refused(Sample with { Values = WithPrice("S1", value) });
        HasError(errors, "$.values.S1.PRICE", "must be a finite number");
    }

    [Theory]
    [InlineData(0, "got 0")]
    [InlineData(-250, "got -250")]
    public void A_cost_value_that_is_not_above_zero(double value, string shown)
    {
        var errors = Refused(Sample with { Values = WithPrice("S2", value) });
        HasError(errors, "$.values.S2.PRICE", "cost criterion \"PRICE\" needs values above 0", shown);
    }

    [Fact]
    public void A_negative_benefit_value()
    {
        var criteria = Sample.Criteria.Select(c => c.Id == "PRICE" ? c with { Direction = Direction.Benefit } : c).ToArray();
        var errors = Refused(Sample with { Criteria = criteria, Values = WithPrice("S3", -1) });
        HasError(errors, "$.values.S3.PRICE", "must not be negative");
    }

    [Fact]
    public void A_missing_value()
    {
        var errors = Refused(Sample with { Values = Sample.Values.Where(v => v.Alternative != "S3").ToArray() });
        HasError(errors, "$.values.S3.PRICE", "no value for alternative \"S3\"");
    }

    [Fact]
    public void A_cell_everyone_declined_names_who_and_why()
    {
        var ratings = Sample.Ratings
            .Select(r => r.Alternative == "S1" && r.Criterion == "QUALITY"
                ? r with { Term = null, Declined = r.Assessor == "D1" ? "recused" : "outside expertise" }
                : r)
            .ToArray();
        var errors = Refused(Sample with { Ratings = ratings });
        HasError(errors, "$.ratings.*.S1.QUALITY",
            "nobody rated alternative \"S1\" on criterion \"QUALITY\"", "declined by D1: recused; D2: outside expertise", "none is imputed");
    }

    [Fact]
    public void A_declined_cell_without_a_reason()
    {
        var ratings = Sample.Ratings
            .Select(r => r.Assessor == "D1" && r.Alternative == "S2" && r.Criterion == "STAFF" ? r with { Term = null, Declined = " " } : r)
            .ToArray();
        var errors = Refused(Sample with { Ratings = ratings });
        HasError(errors, "$.ratings.D1.S2.STAFF", "needs a reason");
    }

    [Fact]
    public void A_rating_that_is_neither_given_nor_declined()
    {
        var ratings = Sample.Ratings.Where(r => !(r.Assessor == "D2" && r.Alternative == "S3" && r.Criterion == "STAFF")).ToArray();
        var errors = Refused(Sample with { Ratings = ratings });
        HasError(errors, "$.ratings.D2.S3.STAFF", "has neither rated alternative \"S3\" on criterion \"STAFF\" nor declined it");
    }

    [Fact]
    public void A_cell_rated_twice()
    {
        var errors = Refused(Sample with { Ratings = [.. Sample.Ratings, new Rating("D2", "S3", "STAFF", "G")] });
        HasError(errors, "$.ratings.D2.S3.STAFF", "rated twice");
    }

    [Fact]
    public void A_rating_of_a_numeric_criterion()
    {
        var errors = Refused(Sample with { Ratings = [.. Sample.Ratings, new Rating("D1", "S1", "PRICE", "G")] });
        HasError(errors, "$.ratings.D1.S1.PRICE", "\"PRICE\" is numeric", "under $.values");
    }

    [Fact]
    public void A_rating_of_a_gate()
    {
        var errors = Refused(Sample with { Ratings = [.. Sample.Ratings, new Rating("D1", "S1", "INSURED", "G")] });
        HasError(errors, "$.ratings.D1.S1.INSURED", "pass/fail gate", "under $.gates");
    }

    [Fact]
    public void A_gate_result_missing_for_an_alternative()
    {
        var errors = Refused(Sample with { Gates = Sample.Gates.Where(g => g.Alternative != "S2").ToArray() });
        HasError(errors, "$.gates.S2.INSURED", "no pass/fail result for alternative \"S2\"", "never assumed passed");
    }

    [Fact]
    public void An_excluded_alternative_needs_no_ratings()
    {
        // S3 fails the gate, so its missing ratings and price are not asked for.
        var evaluation = Sample with
        {
            Gates = [new GateResult("S1", "INSURED", true), new GateResult("S2", "INSURED", true), new GateResult("S3", "INSURED", false)],
            Ratings = Sample.Ratings.Where(r => r.Alternative != "S3").ToArray(),
            Values = Sample.Values.Where(v => v.Alternative != "S3").ToArray(),
        };
        Assert.Empty(Core.Analysis.EvaluationValidator.Validate(evaluation));
    }

    private static NumericValue[] WithPrice(string alternative, double value) =>
        Sample.Values.Select(v => v.Alternative == alternative ? v with { Value = value } : v).ToArray();
}
