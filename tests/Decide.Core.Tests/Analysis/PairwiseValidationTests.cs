using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Tests.Support;
using static Decide.Core.Tests.Support.ErrorAssert;
using static Decide.Core.Tests.Support.SampleEvaluation;

namespace Decide.Core.Tests.Analysis;

/// <summary>Problems with pairwise comparisons.</summary>
public sealed class PairwiseValidationTests
{
    private static readonly Evaluation Sample = WithPairwise();

    [Fact]
    public void A_pair_given_twice()
    {
        var errors = Refused(Sample with { Pairwise = [.. Sample.Pairwise, Judgement("D1", "QUALITY", "STAFF", "4")] });
        HasError(errors, "$.pairwise.D1[3]", "the pair QUALITY–STAFF is already judged at index 0", "give each pair once");
    }

    [Fact]
    public void A_pair_given_twice_in_reversed_order()
    {
        var errors = Refused(Sample with { Pairwise = [.. Sample.Pairwise, Judgement("D1", "STAFF", "QUALITY", "1/3")] });
        HasError(errors, "$.pairwise.D1[3]", "the pair STAFF–QUALITY is already judged at index 0");
    }

    [Fact]
    public void An_incomplete_matrix_names_the_missing_pair()
    {
        var pairwise = Sample.Pairwise.Where(p => !(p.Assessor == "D2" && p.Row == "STAFF")).ToArray();
        var errors = Refused(Sample with { Pairwise = pairwise });
        HasError(errors, "$.pairwise.D2", "assessor \"D2\" has not compared STAFF–PRICE", "every pair must be judged once");
    }

    [Fact]
    public void Criteria_compared_across_groups()
    {
        var sample = WithGroupedPairwise();
        var errors = Refused(sample with { Pairwise = [.. sample.Pairwise, Judgement("D1", "QUALITY", "PRICE", "2")] });
        HasError(errors, "$.pairwise.D1[2]", "\"QUALITY\" and \"PRICE\" are not in the same group");
    }

    [Fact]
    public void A_criterion_compared_with_itself()
    {
        var errors = Refused(Sample with { Pairwise = [.. Sample.Pairwise, Judgement("D1", "STAFF", "STAFF", "1")] });
        HasError(errors, "$.pairwise.D1[3]", "compared with itself");
    }

    [Fact]
    public void A_judgement_that_reaches_zero()
    {
        var pairwise = Sample.Pairwise.Select((p, i) => i == 0 ? p with { Value = new Tfn(0, 1, 2), Term = null } : p).ToArray();
        var errors = Refused(Sample with { Pairwise = pairwise });
        HasError(errors, "$.pairwise.D1[0].tfn", "must be above 0");
    }

    [Fact]
    public void A_gate_compared()
    {
        var errors = Refused(Sample with { Pairwise = [.. Sample.Pairwise, Judgement("D1", "INSURED", "PRICE", "2")] });
        HasError(errors, "$.pairwise.D1[3].row", "\"INSURED\" is a pass/fail gate");
    }

    [Fact]
    public void Pairwise_weighting_without_judgements()
    {
        var errors = Refused(Sample with { Pairwise = [] });
        HasError(errors, "$.pairwise", "nobody has compared the criteria");
    }
}
