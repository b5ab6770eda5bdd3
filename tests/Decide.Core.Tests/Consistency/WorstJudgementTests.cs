using Decide.Core.Consistency;
using Decide.Core.Tests.Support;

namespace Decide.Core.Tests.Consistency;

public sealed class WorstJudgementTests
{
    [Fact]
    public void One_perturbed_judgement_of_a_consistent_matrix_is_reported_first()
    {
        // w = (0.4, 0.3, 0.2, 0.1), so A over C is 2; the assessor wrote 8 instead (CR ≈ 0.092 > 0.08).
        var a = ReciprocalMatrices.Consistent([0.4, 0.3, 0.2, 0.1]);
        a[2] = 8;
        a[8] = 1.0 / 8;
        var report = PairwiseConsistency.Analyse(a, ReciprocalMatrices.Items(4));

        Assert.False(report.Acceptable);
        Assert.InRange(report.WorstJudgements.Count, 1, 3);
        var worst = report.WorstJudgements[0];
        Assert.Equal(("A", "C", 8.0), (worst.Row, worst.Col, worst.Given));
        Assert.Equal(Math.Abs(Math.Log(8 / worst.Consistent)), worst.Deviation, 1e-12);

        // Every other judgement still says A over C is 0.4/0.2 = 2: the indirect paths A→B→C and A→D→C give exactly
        // that, so the value offered to the assessor is the original one [derived].
        Assert.Equal(2.0, worst.Consistent, 1e-12);
        Assert.True(report.WorstJudgements.Skip(1).All(j => j.Deviation < worst.Deviation));
    }

    [Fact]
    public void In_a_larger_matrix_the_implied_value_is_the_original_too()
    {
        // Order 8, w ∝ (8, 7, …, 1): A over C is 8/6; written as 36 instead (27 times too strong).
        var a = ReciprocalMatrices.Consistent([8, 7, 6, 5, 4, 3, 2, 1]);
        a[2] = 36;
        a[16] = 1.0 / 36;
        var report = PairwiseConsistency.Analyse(a, ReciprocalMatrices.Items(8));

        Assert.False(report.Acceptable && report.GciAcceptable);
        var worst = report.WorstJudgements[0];
        Assert.Equal(("A", "C"), (worst.Row, worst.Col));

        // The six indirect paths A→k→C are untouched and all say 8/6 [derived].
        Assert.Equal(8.0 / 6, worst.Consistent, 1e-12);
    }

    [Fact]
    public void An_acceptable_matrix_lists_no_worst_judgements()
    {
        var a = ReciprocalMatrices.Consistent([0.4, 0.3, 0.2, 0.1]);
        a[2] = 2.5;
        a[8] = 1 / 2.5;
        var report = PairwiseConsistency.Analyse(a, ReciprocalMatrices.Items(4));
        Assert.True(report.Acceptable && report.GciAcceptable);
        Assert.Empty(report.WorstJudgements);
    }

    [Fact]
    public void Worst_judgements_can_be_asked_for_directly_and_are_capped()
    {
        var a = ReciprocalMatrices.RandomSaaty(6, new Random(6));
        var report = PairwiseConsistency.Analyse(a, ReciprocalMatrices.Items(6));
        var all = PairwiseConsistency.WorstJudgements(a, ReciprocalMatrices.Items(6), 100);
        Assert.Equal(15, all.Count); // every pair i < j once
        Assert.Equal(all.OrderByDescending(j => j.Deviation).Select(j => (j.Row, j.Col)), all.Select(j => (j.Row, j.Col)));
        Assert.Equal(2, PairwiseConsistency.WorstJudgements(a, ReciprocalMatrices.Items(6), 2).Count);
    }
}
