using Decide.Core.Analysis;
using Decide.Core.Robustness;

namespace Decide.Core.Tests.Robustness;

/// <summary>
/// Weight sweeps, checked against closed forms where the answer is fixed independently of the code.
/// </summary>
/// <remarks>
/// The closed form: with crisp ratings, crisp weights no larger than 1 and the unit ideal points (1,1,1) and (0,0,0),
/// every weighted value v lies in [0, 1], so the vertex distance (Chen 2000, eq. 12) of a crisp v from 1 is 1 − v
/// and from 0 is v. Then d⁺ + d⁻ = m and CCᵢ = Σⱼ wⱼrᵢⱼ / m (eqs. 17–19): closeness is the weighted sum of the
/// normalised values divided by the number of criteria. With two criteria whose weights sum to 1, sweeping C1's
/// share to t gives w = (t, 1 − t), so CCᵢ(t) = (t·rᵢ₁ + (1 − t)·rᵢ₂)/2 and two alternatives swap where their lines
/// cross: t* = b/(a + b), with a the first's lead on C1 and b the second's lead on C2 (normalised). Every swept
/// weight stays within [0, 1], so rescaling a weight vector whose largest upper value exceeds 1 would not touch it;
/// and as CC is linear in the weights here, such a rescaling could not move t* anyway.
/// </remarks>
public sealed class WeightSweepTests
{
    // Crisp scores 0–10: A1 = (9, 3), A2 = (4, 8), A3 = (7, 6); crisp importance 0.4 and 0.6 (sum 1).
    // Normalised by the column maxima 9 and 8 (eq. 15): A1 = (1, 3/8), A2 = (4/9, 1), A3 = (7/9, 3/4).
    private static readonly double[][] Normalised = [[1, 3.0 / 8], [4.0 / 9, 1], [7.0 / 9, 3.0 / 4]];

    private static PreparedEvaluation CrispTwoCriteria() => DecisionEngine.Prepare(RobustnessFixtures.Uniform(
        [["9", "3"], ["4", "8"], ["7", "6"]], ["4", "6"],
        rating: RobustnessFixtures.CrispRating, importanceScale: RobustnessFixtures.CrispImportance));

    private static double ClosedFormCloseness(int alternative, double t) =>
        ((t * Normalised[alternative][0]) + ((1 - t) * Normalised[alternative][1])) / 2;

    [Fact]
    public void Crisp_two_criterion_reversals_are_at_the_closed_form_shares()
    {
        var sweep = WeightSweeps.Sweep(CrispTwoCriteria(), 0);

        // By hand: A2 and A3 cross at (1/4)/(1/3 + 1/4) = 3/7; A1 and A2 at (5/8)/(5/9 + 5/8) = 9/17; A1 and A3 at
        // (3/8)/(2/9 + 3/8) = 27/43. Below each, the alternative stronger on C2 leads.
        Assert.Equal(0.4, sweep.Current, 12);
        Assert.Collection(sweep.Reversals,
            r => AssertReversal(r, 3.0 / 7, "A2", "A3"),
            r => AssertReversal(r, 9.0 / 17, "A2", "A1"),
            r => AssertReversal(r, 27.0 / 43, "A3", "A1"));
    }

    [Fact]
    public void Sweeping_the_other_criterion_mirrors_the_reversal_shares()
    {
        // C2's share s is 1 − t, so the same crossings appear at 1 − t* in reverse order, leaders swapped.
        var sweep = WeightSweeps.Sweep(CrispTwoCriteria(), 1);
        Assert.Equal(0.6, sweep.Current, 12);
        Assert.Collection(sweep.Reversals,
            r => AssertReversal(r, 1 - (27.0 / 43), "A1", "A3"),
            r => AssertReversal(r, 1 - (9.0 / 17), "A1", "A2"),
            r => AssertReversal(r, 1 - (3.0 / 7), "A3", "A2"));
    }

    [Fact]
    public void Crisp_two_criterion_samples_are_the_weighted_sum_over_two()
    {
        var sweep = WeightSweeps.Sweep(CrispTwoCriteria(), 0);
        Assert.Equal(Enumerable.Range(0, 21).Select(s => s / 20.0), sweep.Samples);
        Assert.Equal(["A1", "A2", "A3"], sweep.Series.Select(s => s.Alternative));
        for (var i = 0; i < 3; i++)
        {
            for (var s = 0; s < sweep.Samples.Count; s++)
            {
                Assert.Equal(ClosedFormCloseness(i, sweep.Samples[s]), sweep.Series[i].Closeness[s], 12);
            }
        }
    }

    [Fact]
    public void The_current_share_reproduces_the_base_closeness()
    {
        // At t = ŵₖ every weight is multiplied by 1: the sweep must give the analysis' own closeness.
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var baseResult = prepared.Analyse();
        for (var k = 0; k < prepared.Criteria.Count; k++)
        {
            var cc = new WeightSweeps.Sweeper(prepared, k).Closeness(prepared.Weights[k].Crisp).ToArray();
            for (var i = 0; i < cc.Length; i++)
            {
                var expected = baseResult.Ranking.Single(r => r.Alternative == prepared.Alternatives[i].Id).Closeness;
                Assert.Equal(expected, cc[i], 12);
            }
        }
    }

    [Fact]
    public void The_crisp_base_closeness_is_the_weighted_sum_over_two()
    {
        // The closed form at the plan's own weights (0.4, 0.6), through the whole analysis.
        var result = CrispTwoCriteria().Analyse();
        for (var i = 0; i < 3; i++)
        {
            Assert.Equal(ClosedFormCloseness(i, 0.4), result.Ranking.Single(r => r.Alternative == $"A{i + 1}").Closeness, 12);
        }
    }

    [Fact]
    public void A_fuzzy_trade_off_has_reversals_and_each_is_a_crossing_on_both_sides()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var sweeps = WeightSweeps.Run(prepared);
        var reversals = sweeps.SelectMany((s, k) => s.Reversals.Select(r => (k, r))).ToArray();
        Assert.NotEmpty(reversals);
        foreach (var (k, r) in reversals)
        {
            Assert.True(r.Confirmed);
            var sweeper = new WeightSweeps.Sweeper(prepared, k);
            var below = sweeper.Closeness(r.Weight - 1e-5).ToArray();
            var above = sweeper.Closeness(r.Weight + 1e-5).ToArray();
            int a = Index(prepared, r.Below), b = Index(prepared, r.Above);
            Assert.True(below[a] > below[b], $"{r.Below} should lead {r.Above} just below {r.Weight}");
            Assert.True(above[b] > above[a], $"{r.Above} should lead {r.Below} just above {r.Weight}");
        }
    }

    [Fact]
    public void At_the_ends_of_a_sweep_only_the_swept_criterion_or_only_the_others_count()
    {
        // TradeOff: A1 is very good on C1 and best there; A2 is very good on C2 and best on C2 and C3. At t = 1
        // only C1 carries weight, at t = 0 only C2 and C3 do, so the specialists must win there.
        var sweep = WeightSweeps.Sweep(DecisionEngine.Prepare(RobustnessFixtures.TradeOff()), 0);
        Assert.Equal("A1", Leader(sweep, sweep.Samples.Count - 1));
        Assert.Equal("A2", Leader(sweep, 0));
        Assert.Contains(sweep.Reversals, r => (r.Below, r.Above) == ("A2", "A1"));
    }

    [Fact]
    public void A_single_criterion_cannot_be_swept_and_says_why()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.Uniform([["G"], ["F"]], ["H"]));
        var sweep = WeightSweeps.Sweep(prepared, 0);
        Assert.Empty(sweep.Reversals);
        Assert.Empty(sweep.Series);
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
                Assert.Equal("A1", Leader(sweep, s));
            }
        }
    }

    private static void AssertReversal(SweepReversal r, double share, string below, string above)
    {
        Assert.Equal(share, r.Weight, 1e-9); // bisection narrows to 1e-10
        Assert.Equal((below, above), (r.Below, r.Above));
        Assert.True(r.Confirmed);
    }

    private static string Leader(WeightSweepResult sweep, int sample) =>
        sweep.Series.MaxBy(s => s.Closeness[sample])!.Alternative;

    private static int Index(PreparedEvaluation p, string id) =>
        p.Alternatives.Select((a, i) => (a, i)).Single(x => x.a.Id == id).i;
}
