using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Ranking;
using Decide.Core.Robustness;

namespace Decide.Core.Tests.Robustness;

public sealed class WeightSweepTests
{
    /// <summary>Closeness with criterion k's share set to t, computed independently of the sweep code.</summary>
    private static double[] ClosenessAt(PreparedEvaluation p, int k, double t)
    {
        var current = p.Weights[k].Crisp;
        var weights = p.FuzzyWeights.Select((w, j) => (j == k ? t / current : (1 - t) / (1 - current)) * w).ToArray();
        int n = p.Alternatives.Count, m = p.Criteria.Count;
        var closeness = new double[n];
        FuzzyTopsis.Evaluate(p.Matrix, m, p.IsCost, weights, p.Source.Options.Ideal, new Tfn[n * m], new double[n], new double[n], closeness);
        return closeness;
    }

    [Fact]
    public void The_current_share_reproduces_the_base_closeness()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var baseResult = prepared.Analyze();
        for (var k = 0; k < prepared.Criteria.Count; k++)
        {
            var cc = ClosenessAt(prepared, k, prepared.Weights[k].Crisp);
            for (var i = 0; i < cc.Length; i++)
            {
                var expected = baseResult.Ranking.Single(r => r.Alternative == prepared.Alternatives[i].Id).Closeness;
                Assert.Equal(expected, cc[i], 12);
            }
        }
    }

    [Fact]
    public void A_trade_off_has_reversals_and_each_is_confirmed_on_both_sides()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var sweeps = WeightSweeps.Run(prepared);
        var reversals = sweeps.SelectMany((s, k) => s.Reversals.Select(r => (k, r))).ToArray();
        Assert.NotEmpty(reversals);
        foreach (var (k, r) in reversals)
        {
            Assert.True(r.Confirmed);
            var below = ClosenessAt(prepared, k, r.Weight - 1e-5);
            var above = ClosenessAt(prepared, k, r.Weight + 1e-5);
            int a = Index(prepared, r.Below), b = Index(prepared, r.Above);
            Assert.True(below[a] > below[b], $"{r.Below} should lead {r.Above} just below {r.Weight}");
            Assert.True(above[b] > above[a], $"{r.Above} should lead {r.Below} just above {r.Weight}");
        }
    }

    [Fact]
    public void Sweeping_C1_up_makes_the_C1_specialist_win_and_down_the_C2_specialist()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var atOne = ClosenessAt(prepared, 0, 1);
        var atZero = ClosenessAt(prepared, 0, 0);
        Assert.Equal(0, Array.IndexOf(atOne, atOne.Max()));  // A1 is very good on C1
        Assert.Equal(1, Array.IndexOf(atZero, atZero.Max())); // A2 is very good on C2
        var sweep = WeightSweeps.Sweep(prepared, 0);
        Assert.Contains(sweep.Reversals, r => (r.Below, r.Above) == ("A2", "A1"));
    }

    [Fact]
    public void Samples_run_from_zero_to_one_and_every_alternative_has_a_series()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var sweep = WeightSweeps.Sweep(prepared, 1);
        Assert.Equal(0, sweep.Samples[0]);
        Assert.Equal(1, sweep.Samples[^1]);
        Assert.Equal(prepared.Alternatives.Count, sweep.Series.Count);
        Assert.All(sweep.Series, s => Assert.Equal(sweep.Samples.Count, s.Closeness.Count));
        Assert.All(sweep.Series, s => Assert.All(s.Closeness, c => Assert.InRange(c, 0, 1)));
    }

    [Fact]
    public void A_single_criterion_cannot_be_swept_and_says_why()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.Uniform([["G"], ["F"]], ["H"]));
        var sweep = WeightSweeps.Sweep(prepared, 0);
        Assert.Empty(sweep.Reversals);
        Assert.Contains("only scored criterion", sweep.Note);
    }

    [Fact]
    public void A_dominant_alternative_leads_at_every_sample_of_every_sweep()
    {
        // A1 is strictly better than every other alternative on every criterion.
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.Uniform(
            [["VG", "VG", "G"], ["G", "MG", "F"], ["MG", "G", "MG"]], ["H", "M", "VH"]));
        foreach (var sweep in WeightSweeps.Run(prepared))
        {
            Assert.DoesNotContain(sweep.Reversals, r => r.Below == "A1" || r.Above == "A1");
            for (var s = 0; s < sweep.Samples.Count; s++)
            {
                var a1 = sweep.Series[0].Closeness[s];
                Assert.All(sweep.Series.Skip(1), other => Assert.True(a1 >= other.Closeness[s]));
            }
        }
    }

    private static int Index(PreparedEvaluation p, string id) =>
        p.Alternatives.Select((a, i) => (a, i)).Single(x => x.a.Id == id).i;
}
