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

    [Fact]
    public void Eleven_criteria_in_the_top_level_matrix_are_refused()
    {
        var errors = Refused(Compared(11, grouped: false));
        HasError(errors, "$.criteria", "the pairwise matrix of the top level compares 11 items",
            "published random index only up to 10", "split these criteria into groups of at most 10");
    }

    [Fact]
    public void Eleven_criteria_in_one_group_are_refused_naming_the_group()
    {
        var errors = Refused(Compared(11, grouped: true));
        HasError(errors, "$.groups.G", "the pairwise matrix of group \"Service\" compares 11 items", "split these criteria");
        Assert.DoesNotContain(errors, e => e.Path == "$.criteria");
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void Ten_criteria_in_one_matrix_are_accepted_and_use_RI_1_49(bool grouped)
    {
        // RI(10) = 1.49, Saaty (1980) [recalled]: the largest order with a published random index.
        var result = Decide.Core.Analysis.DecisionEngine.Analyse(Compared(10, grouped));
        var ten = result.Consistency.Where(c => c.Items.Count == 10).ToArray();
        Assert.NotEmpty(ten); // the assessor's matrix and the panel's
        Assert.All(ten, c => Assert.Equal(1.49, c.Report.RandomIndex));
    }

    /// <summary>
    /// A valid evaluation with <paramref name="n"/> linguistic criteria compared by one assessor (every judgement
    /// "1"): alone at the top level, or all in group G ("Service"), which is then compared with PRICE.
    /// </summary>
    private static Evaluation Compared(int n, bool grouped)
    {
        var ids = Enumerable.Range(1, n).Select(i => $"K{i}").ToArray();
        string[] alternatives = ["S1", "S2", "S3"];
        var top = grouped ? new[] { "G", "PRICE" } : ids;
        var judgements = new List<PairwiseJudgement>();
        foreach (var matrix in grouped ? new[] { ids, top } : [top])
        {
            for (var i = 0; i < matrix.Length; i++)
            {
                for (var j = i + 1; j < matrix.Length; j++)
                {
                    judgements.Add(Judgement("D1", matrix[i], matrix[j], "1"));
                }
            }
        }

        return Sample with
        {
            Groups = grouped ? [new CriterionGroup("G", "Service")] : [],
            Criteria =
            [
                .. ids.Select(id => new Criterion(id, id, Group: grouped ? "G" : null)),
                .. grouped ? [new Criterion("PRICE", "Annual price", CriterionKind.Numeric, Direction.Cost, Unit: "EUR")] : Array.Empty<Criterion>(),
            ],
            Values = grouped ? Sample.Values : [],
            Assessors = [new Assessor("D1", "First assessor")],
            Ratings = [.. from id in ids from a in alternatives select new Rating("D1", a, id, "G")],
            Gates = [],
            Pairwise = judgements,
        };
    }
}
