using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Scales;
using Decide.Core.Tests.Support;
using static Decide.Core.Tests.Support.ErrorAssert;

namespace Decide.Core.Tests.Analysis;

/// <summary>Problems with the plan itself: ids, panel, alternatives, criteria and scales.</summary>
public sealed class StructureValidationTests
{
    private static readonly Evaluation Sample = SampleEvaluation.WithImportance();

    [Fact]
    public void A_criterion_id_used_twice()
    {
        var errors = Refused(Sample with { Criteria = [.. Sample.Criteria, new Criterion("STAFF", "Staff again")] });
        HasError(errors, "$.criteria[4].id", "criterion id \"STAFF\" is used twice");
    }

    [Fact]
    public void An_alternative_id_used_twice()
    {
        var errors = Refused(Sample with { Alternatives = [.. Sample.Alternatives, new Alternative("S2", "Supplier two again")] });
        HasError(errors, "$.alternatives[3].id", "alternative id \"S2\" is used twice");
    }

    [Fact]
    public void An_assessor_id_used_twice()
    {
        var errors = Refused(Sample with { Assessors = [.. Sample.Assessors, new Assessor("D1", "Another D1")] });
        HasError(errors, "$.assessors[2].id", "assessor id \"D1\" is used twice");
    }

    [Fact]
    public void A_criterion_with_a_group_id()
    {
        var sample = SampleEvaluation.WithGroupedPairwise();
        var errors = Refused(sample with { Criteria = [.. sample.Criteria, new Criterion("TECH", "Technical")] });
        HasError(errors, "$.criteria[4].id", "also a group id");
    }

    [Fact]
    public void The_reserved_panel_id()
    {
        var errors = Refused(Sample with { Assessors = [.. Sample.Assessors, new Assessor("panel", "Panel")] });
        HasError(errors, "$.assessors[2].id", "reserved");
    }

    [Fact]
    public void No_assessors()
    {
        var errors = Refused(Sample with { Assessors = [] });
        HasError(errors, "$.assessors", "needs at least one assessor");
    }

    [Fact]
    public void No_alternatives()
    {
        var errors = Refused(Sample with { Alternatives = [] });
        HasError(errors, "$.alternatives", "needs at least one alternative");
    }

    [Fact]
    public void No_criteria()
    {
        var errors = Refused(Sample with { Criteria = [] });
        HasError(errors, "$.criteria", "needs at least one criterion");
    }

    [Fact]
    public void Only_gates()
    {
        var errors = Refused(Sample with { Criteria = [new Criterion("INSURED", "Liability insurance", CriterionKind.Gate)] });
        HasError(errors, "$.criteria", "every criterion is a pass/fail gate", "at least one criterion must be scored");
    }

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(0)]
    [InlineData(-1)]
    [InlineData(double.PositiveInfinity)]
    public void An_assessor_weight_that_is_not_a_positive_number(double weight)
    {
        var errors = Refused(Sample with { Assessors = [Sample.Assessors[0] with { Weight = weight }, Sample.Assessors[1]] });
        HasError(errors, "$.assessors[0].weight", "assessor \"D1\"", "must be a positive number");
    }

    [Fact]
    public void A_linguistic_cost_criterion_on_a_scale_that_starts_at_zero()
    {
        var criteria = Sample.Criteria.Select(c => c.Id == "QUALITY" ? c with { Direction = Direction.Cost } : c).ToArray();
        var errors = Refused(Sample with { Criteria = criteria });
        HasError(errors, "$.criteria[0].direction", "linguistic cost criterion \"QUALITY\"", "lower value above 0", "\"chen-rating-7\"");
    }

    [Fact]
    public void A_linguistic_cost_criterion_on_a_scale_above_zero_is_accepted()
    {
        // Chen's rating values shifted up by one: every lower value is at least 1.
        var shifted = LinguisticScale.Create("shifted", 1, 11, BuiltInScales.ChenRating7.Terms
            .Select(t => t with { Value = new Tfn(t.Value.Lower + 1, t.Value.Middle + 1, t.Value.Upper + 1) }).ToArray());
        var criteria = Sample.Criteria.Select(c => c.Id == "QUALITY" ? c with { Direction = Direction.Cost } : c).ToArray();
        Assert.Empty(Core.Analysis.EvaluationValidator.Validate(Sample with { Criteria = criteria, RatingScale = shifted }));
    }

    [Fact]
    public void A_criterion_in_an_undeclared_group()
    {
        var criteria = Sample.Criteria.Select(c => c.Id == "STAFF" ? c with { Group = "PEOPLE" } : c).ToArray();
        var errors = Refused(Sample with { Criteria = criteria });
        HasError(errors, "$.criteria[1].group", "unknown group \"PEOPLE\"");
    }

    [Fact]
    public void An_assessor_assigned_a_numeric_criterion()
    {
        var errors = Refused(Sample with { Assessors = [Sample.Assessors[0] with { Criteria = ["QUALITY", "PRICE"] }, Sample.Assessors[1]] });
        HasError(errors, "$.assessors[0].criteria[1]", "\"PRICE\" is numeric", "only linguistic criteria");
    }
}
