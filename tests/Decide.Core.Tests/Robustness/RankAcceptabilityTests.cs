using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Ranking;
using Decide.Core.Robustness;

namespace Decide.Core.Tests.Robustness;

/// <summary>
/// Rank acceptability, central weights, confidence factors and the holistic index (SMAA-2: Lahdelma &amp; Salminen
/// 2001, Operations Research 49(3):444–454) checked against answers known without the engine: closed forms on the
/// weight simplex, symmetry, dominance, and exact ties.
/// </summary>
/// <remarks>
/// The analytic cases rest on one reduction [derived]: with unit ideal points (Chen 2000) and crisp cells the
/// vertex distance (eq. 12) of crisp numbers is |x − y| and every weighted normalised value vⱼ = wⱼrⱼ lies in
/// [0, 1], so d⁺ = Σⱼ(1 − vⱼ) and d⁻ = Σⱼ vⱼ (eqs. 17–18) add up to m and the closeness (eq. 19) is
/// CC = Σⱼ wⱼrⱼ / m: a weighted sum of the normalised values (eq. 15). Which alternative leads in a draw is then
/// a question of which half-space of the weight simplex the draw falls in, and with uniform weights the
/// acceptability of a region is its share of the simplex (for m = 2: w₁ ~ U(0, 1); for m = 3: area ratios).
/// Monte Carlo figures are checked within four binomial standard errors, √(p(1 − p)/N), so a correct engine
/// fails about once in 16,000 checks, and any fixed seed reproduces.
/// </remarks>
public sealed class RankAcceptabilityTests
{
    private const int Draws = 20_000;

    [Fact]
    public void With_unit_ideal_points_and_crisp_cells_the_closeness_is_the_weighted_sum_of_normalised_values_over_m()
    {
        // [derived] A = (8, 200), B = (6, 100); criterion 1 benefit (r = x / 8), criterion 2 cost (r = 100 / x).
        // r_A = (1, 0.5), r_B = (0.75, 1); crisp weights (0.6, 0.9), deliberately not summing to 1 as fuzzy draws do not.
        // CC_A = (0.6·1 + 0.9·0.5) / 2 = 0.525; CC_B = (0.6·0.75 + 0.9·1) / 2 = 0.675.
        Tfn[] matrix = [Tfn.Crisp(8), Tfn.Crisp(200), Tfn.Crisp(6), Tfn.Crisp(100)];
        Tfn[] weights = [Tfn.Crisp(0.6), Tfn.Crisp(0.9)];
        var weighted = new Tfn[4];
        double[] dPlus = new double[2], dMinus = new double[2], closeness = new double[2];
        FuzzyTopsis.Evaluate(matrix, 2, [false, true], weights, IdealPoints.Unit, weighted, dPlus, dMinus, closeness);

        Assert.Equal(0.525, closeness[0], 12);
        Assert.Equal(0.675, closeness[1], 12);
        Assert.Equal(2, dPlus[0] + dMinus[0], 12); // d⁺ + d⁻ = m
        Assert.Equal(2, dPlus[1] + dMinus[1], 12);
        Assert.Equal((1 - 0.6) + (1 - 0.45), dPlus[0], 12); // d⁺ = Σ(1 − v)
        Assert.Equal(0.6 + 0.45, dMinus[0], 12); // d⁻ = Σ v
    }

    [Fact]
    public void Two_mirror_image_bids_under_uniform_weights_split_first_place_evenly()
    {
        // [derived] A = (10, 5), B = (5, 10): r_A = (1, 0.5), r_B = (0.5, 1), so A leads exactly when w₁ > ½.
        // Uniform weights on the 2-simplex make w₁ ~ U(0, 1): b_A¹ = b_B¹ = ½; A's central weight is
        // E[w₁ | w₁ > ½] = ¾, i.e. (0.75, 0.25), and B's (0.25, 0.75). At its central weights each bid leads for
        // certain (the ratings are crisp), so both confidence factors are 1. With n = 2 the linear meta-weights are
        // α = (1, 0), so each holistic index equals its first-rank share, ½.
        var prepared = Prepare([["10", "5"], ["5", "10"]]);
        var result = RankAcceptabilityAnalysis.Run(prepared, Draws, 2001, AcceptabilityWeights.Uniform);

        var a = Share(result, "A1");
        var b = Share(result, "A2");
        Within(0.5, a.Ranks[0], Binomial(0.5, Draws));
        Within(0.5, b.Ranks[0], Binomial(0.5, Draws));
        Within(0.5, a.Holistic, Binomial(0.5, Draws));
        Within(0.5, b.Holistic, Binomial(0.5, Draws));

        // w₁ given w₁ > ½ is U(½, 1): standard deviation (½)/√12, over the ≈ N/2 draws A wins.
        var spread = 4 * (0.5 / Math.Sqrt(12)) / Math.Sqrt(Draws / 2.0);
        var ca = Central(result, "A1");
        var cb = Central(result, "A2");
        Within(0.75, ca.Weights[0], spread);
        Within(0.25, ca.Weights[1], spread);
        Within(0.25, cb.Weights[0], spread);
        Within(0.75, cb.Weights[1], spread);
        Assert.Equal(1.0, ca.Confidence);
        Assert.Equal(1.0, cb.Confidence);
    }

    [Theory]
    [InlineData(AcceptabilityWeights.Fuzzy)]
    [InlineData(AcceptabilityWeights.Uniform)]
    public void Two_identical_crisp_bids_share_every_draw_exactly(AcceptabilityWeights mode)
    {
        // [derived] Identical crisp bids have identical closeness in every draw: a tie of two at positions 1 and 2,
        // which gives each ½ at each position. (Ranking ties by input order would give A1 all of rank 1.) With
        // k tied for first each wins 1/k of every draw at its central weights too, and the holistic index with
        // α = (1, 0) is ½. Every tally is a multiple of ½, so the shares are exact.
        var prepared = Prepare([["6", "4"], ["6", "4"]]);
        var result = RankAcceptabilityAnalysis.Run(prepared, 3000, 17, mode);
        foreach (var id in new[] { "A1", "A2" })
        {
            Assert.Equal([0.5, 0.5], Share(result, id).Ranks);
            Assert.Equal(0.5, Share(result, id).Holistic);
            Assert.Equal(0.5, Central(result, id).Confidence);
        }

        if (mode == AcceptabilityWeights.Fuzzy)
        {
            // Crisp importance 0.8 and 0.5: every draw has the shares (0.8, 0.5) / 1.3, and so do both central vectors.
            Assert.All(result.CentralWeights, c =>
            {
                Assert.Equal(0.8 / 1.3, c.Weights[0], 12);
                Assert.Equal(0.5 / 1.3, c.Weights[1], 12);
            });
        }
    }

    [Fact]
    public void A_three_way_tie_gives_each_a_third_of_every_position_and_a_tie_for_first_leaves_last_place_alone()
    {
        // [derived] Three identical bids: each 1/3 at positions 1, 2, 3. Two identical leaders over a dominated
        // third bid: the leaders ½ each at positions 1 and 2, the third all of position 3.
        var three = RankAcceptabilityAnalysis.Run(Prepare([["6", "4"], ["6", "4"], ["6", "4"]]), 1000, 5, AcceptabilityWeights.Uniform);
        Assert.All(three.Alternatives, a => Assert.All(a.Ranks, share => Assert.Equal(1.0 / 3, share, 12)));

        var pair = RankAcceptabilityAnalysis.Run(Prepare([["6", "4"], ["2", "1"], ["6", "4"]]), 1000, 5, AcceptabilityWeights.Uniform);
        Assert.Equal([0.5, 0.5, 0.0], Share(pair, "A1").Ranks);
        Assert.Equal([0.0, 0.0, 1.0], Share(pair, "A2").Ranks);
        Assert.Equal([0.5, 0.5, 0.0], Share(pair, "A3").Ranks);
        Assert.DoesNotContain(pair.CentralWeights, c => c.Alternative == "A2");
    }

    [Fact]
    public void Three_bids_on_three_criteria_take_the_shares_of_the_weight_simplex_their_regions_cover()
    {
        // [derived] A = (10, 0, 5), B = (0, 10, 5), C = (5, 5, 10): every column's best is 10, so r = x / 10 and, by
        // the reduction, the scores are A: w₁ + ½w₃, B: w₂ + ½w₃, C: ½w₁ + ½w₂ + w₃. With w₁ + w₂ + w₃ = 1:
        // A − C = w₁ − ½, B − C = w₂ − ½, A − B = w₁ − w₂. On the simplex, {w₁ > ½} is the corner triangle with
        // half the side, a quarter of the area; likewise {w₂ > ½}; C leads on the remaining half.
        //   A first (¼): then C (C − B = ½ − w₂ > 0), then B.   B first (¼): C, then A.
        //   C first (½): A before B iff w₁ > w₂, half of that region by symmetry.
        // So b_A = b_B = (¼, ¼, ½) and b_C = (½, ½, 0). Central weights: the corner triangle's centroid,
        // (1 + ½ + ½, 0 + ½ + 0, 0 + 0 + ½)/3 = (⅔, ⅙, ⅙) for A, (⅙, ⅔, ⅙) for B; C's from the simplex centroid
        // (⅓, ⅓, ⅓) = ¼·A's + ¼·B's + ½·C's, so (¼, ¼, ½). Each centroid lies inside its region (a region cut out by
        // half-spaces is convex) and the ratings are crisp, so every confidence factor is 1. Linear meta-weights for
        // n = 3 are (1, ½, 0): holistic A = B = ¼ + ⅛ = ⅜, C = ½ + ¼ = ¾.
        var prepared = Prepare([["10", "0", "5"], ["0", "10", "5"], ["5", "5", "10"]], ["5", "5", "5"]);
        var result = RankAcceptabilityAnalysis.Run(prepared, Draws, 1998, AcceptabilityWeights.Uniform);

        double[] ab = [0.25, 0.25, 0.5], c = [0.5, 0.5, 0];
        foreach (var (id, expected) in new[] { ("A1", ab), ("A2", ab), ("A3", c) })
        {
            var shares = Share(result, id);
            for (var r = 0; r < 3; r++)
            {
                Within(expected[r], shares.Ranks[r], Binomial(expected[r], Draws));
            }
        }

        // The holistic index is b¹ + ½b², so its error is at most the first share's plus half the second's.
        Within(0.375, Share(result, "A1").Holistic, Binomial(0.25, Draws) * 1.5);
        Within(0.375, Share(result, "A2").Holistic, Binomial(0.25, Draws) * 1.5);
        Within(0.75, Share(result, "A3").Holistic, Binomial(0.5, Draws) * 1.5);

        // Central weights: each coordinate ranges over at most [0, ½] or [½, 1] in A's and B's corner triangles, so
        // its standard deviation is at most ¼ (Popoviciu); in C's region w₁, w₂ ∈ [0, ½] and w₃ ∈ [0, 1] (at most ½).
        var corner = 4 * 0.25 / Math.Sqrt(Draws / 4.0);
        var middle = 4 * 0.5 / Math.Sqrt(Draws / 2.0);
        Close([2 / 3.0, 1 / 6.0, 1 / 6.0], Central(result, "A1").Weights, corner);
        Close([1 / 6.0, 2 / 3.0, 1 / 6.0], Central(result, "A2").Weights, corner);
        Close([0.25, 0.25, 0.5], Central(result, "A3").Weights, middle);
        Assert.All(result.CentralWeights, w => Assert.Equal(1.0, w.Confidence));
    }

    [Fact]
    public void The_holistic_index_is_the_meta_weighted_sum_of_the_rank_shares()
    {
        // Lahdelma & Salminen (2001): aᵢʰ = Σᵣ αʳ bᵢʳ with 1 = α¹ ≥ … ≥ αⁿ ≥ 0; Decide uses αʳ = (n − r)/(n − 1).
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var result = RankAcceptabilityAnalysis.Run(prepared, 3000, 42);
        Assert.Equal([1.0, 2 / 3.0, 1 / 3.0, 0.0], result.MetaWeights);
        foreach (var a in result.Alternatives)
        {
            Assert.Equal(a.Ranks[0] + (2 / 3.0 * a.Ranks[1]) + (1 / 3.0 * a.Ranks[2]), a.Holistic, 12);
        }

        Assert.Equal([1.0], RankAcceptabilityAnalysis.MetaWeights(1));
        Assert.Equal([1.0, 0.5, 0.0], RankAcceptabilityAnalysis.MetaWeights(3));
    }

    [Fact]
    public void A_bid_whose_every_triangle_lies_above_the_others_is_first_in_every_draw_with_confidence_1()
    {
        // Very good (9, 10, 10) against medium poor (1, 3, 5) and fair (3, 5, 7) on every criterion (Chen 2000's
        // seven-term scale): every drawn rating of A2 exceeds every drawn rating of the others, so under any positive
        // weights its normalised values and its closeness are higher (the closeness is increasing in each value).
        var evaluation = RobustnessFixtures.Uniform([["MP", "F", "MP"], ["VG", "VG", "VG"], ["F", "MP", "F"]], ["H", "M", "L"]);
        var prepared = DecisionEngine.Prepare(evaluation);
        foreach (var mode in new[] { AcceptabilityWeights.Fuzzy, AcceptabilityWeights.Uniform })
        {
            var result = RankAcceptabilityAnalysis.Run(prepared, 2000, 11, mode);
            Assert.Equal(1.0, Share(result, "A2").Ranks[0]);
            Assert.Equal(1.0, Share(result, "A2").Holistic);
            Assert.Equal(1.0, Central(result, "A2").Confidence);
            Assert.Equal("A2", Assert.Single(result.CentralWeights).Alternative);
        }
    }

    [Fact]
    public void Two_bids_with_the_same_fuzzy_ratings_each_win_half_the_draws_at_any_weights()
    {
        // [derived] The two bids' ratings are drawn independently from the same triangles, so at any fixed weights
        // the pair is exchangeable: each leads with probability ½ (a tie has probability 0). Hence both the
        // first-rank shares and the confidence factors (the weights fixed at a central vector) are ½.
        var evaluation = RobustnessFixtures.Uniform([["G", "F"], ["G", "F"]], ["H", "M"]);
        var result = RankAcceptabilityAnalysis.Run(DecisionEngine.Prepare(evaluation), Draws, 77, AcceptabilityWeights.Uniform);
        foreach (var id in new[] { "A1", "A2" })
        {
            Within(0.5, Share(result, id).Ranks[0], Binomial(0.5, Draws));
            Within(0.5, Central(result, id).Confidence, Binomial(0.5, Draws));
        }
    }

    [Fact]
    public void Shares_sum_to_one_over_ranks_and_over_alternatives_with_and_without_ties()
    {
        foreach (var prepared in new[]
        {
            DecisionEngine.Prepare(RobustnessFixtures.TradeOff()),
            Prepare([["6", "4"], ["6", "4"], ["6", "9"], ["2", "9"]]),
        })
        {
            var result = RankAcceptabilityAnalysis.Run(prepared, 3000, 42, AcceptabilityWeights.Uniform);
            var n = result.Alternatives.Count;
            Assert.All(result.Alternatives, a => Assert.Equal(1, a.Ranks.Sum(), 12));
            for (var r = 0; r < n; r++)
            {
                Assert.Equal(1, result.Alternatives.Sum(a => a.Ranks[r]), 12);
            }

            // Σᵢ aᵢʰ = Σᵣ αʳ Σᵢ bᵢʳ = Σᵣ αʳ = n/2 for the linear meta-weights.
            Assert.Equal(n / 2.0, result.Alternatives.Sum(a => a.Holistic), 12);
        }
    }

    [Fact]
    public void The_same_seed_gives_identical_numbers_on_one_and_on_several_threads()
    {
        foreach (var prepared in new[]
        {
            DecisionEngine.Prepare(RobustnessFixtures.TradeOff()),
            Prepare([["6", "4"], ["6", "4"], ["3", "9"]]),
        })
        {
            var one = RankAcceptabilityAnalysis.Run(prepared, 5000, 7, threads: 1);
            var four = RankAcceptabilityAnalysis.Run(prepared, 5000, 7, threads: 4);
            for (var i = 0; i < one.Alternatives.Count; i++)
            {
                Assert.Equal(one.Alternatives[i].Ranks, four.Alternatives[i].Ranks);
                Assert.Equal(one.Alternatives[i].Holistic, four.Alternatives[i].Holistic);
            }

            Assert.Equal(one.CentralWeights.Count, four.CentralWeights.Count);
            for (var i = 0; i < one.CentralWeights.Count; i++)
            {
                Assert.Equal(one.CentralWeights[i].Weights, four.CentralWeights[i].Weights);
                Assert.Equal(one.CentralWeights[i].Confidence, four.CentralWeights[i].Confidence);
            }
        }
    }

    [Fact]
    public void A_different_seed_gives_different_draws()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var a = RankAcceptabilityAnalysis.Run(prepared, 2000, 1);
        var b = RankAcceptabilityAnalysis.Run(prepared, 2000, 2);
        Assert.NotEqual(a.Alternatives.SelectMany(x => x.Ranks), b.Alternatives.SelectMany(x => x.Ranks));
        Assert.NotEqual(a.CentralWeights.Select(x => x.Confidence), b.CentralWeights.Select(x => x.Confidence));
    }

    [Fact]
    public void A_panel_with_no_spread_at_all_gives_full_acceptability_to_the_deterministic_order()
    {
        // Crisp ratings and crisp importance: every draw is the base case.
        var evaluation = RobustnessFixtures.Uniform([["7", "4"], ["5", "9"], ["3", "3"]], ["8", "5"],
            rating: RobustnessFixtures.CrispRating, importanceScale: RobustnessFixtures.CrispImportance);
        var prepared = DecisionEngine.Prepare(evaluation);
        var order = prepared.Analyse().Ranking.Select(r => r.Alternative).ToArray();
        var result = RankAcceptabilityAnalysis.Run(prepared, 1000, 3);
        for (var r = 0; r < order.Length; r++)
        {
            Assert.Equal(1.0, Share(result, order[r]).Ranks[r]);
        }

        Assert.Equal(1.0, Central(result, order[0]).Confidence);
    }

    [Fact]
    public void Central_weights_are_shares_and_exist_only_for_alternatives_that_ever_win()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var result = RankAcceptabilityAnalysis.Run(prepared, 4000, 5, AcceptabilityWeights.Uniform);
        foreach (var central in result.CentralWeights)
        {
            Assert.Equal(1, central.Weights.Sum(), 9);
            Assert.True(Share(result, central.Alternative).Ranks[0] > 0);
            Assert.InRange(central.Confidence, 0, 1);
        }

        // Under uniform weights the C1 specialist wins with C1-heavy weights, the C2 specialist with C2-heavy ones.
        var a1 = Central(result, "A1");
        var a2 = Central(result, "A2");
        Assert.True(a1.Weights[0] > a2.Weights[0]);
        Assert.True(a2.Weights[1] > a1.Weights[1]);
    }

    [Theory]
    [InlineData(0.5, 100, 0.4038, 0.5962)] // Wilson interval, z = 1.96: values derived from the formula (Wilson 1927)
    [InlineData(0.0, 50, 0.0, 0.0713)]
    public void Wilson_interval_matches_the_formula(double share, int n, double low, double high)
    {
        var interval = RankAcceptabilityAnalysis.Wilson(share, n);
        Assert.Equal(low, interval.Low, 3);
        Assert.Equal(high, interval.High, 3);
    }

    [Theory]
    [InlineData(0.0, 500)]
    [InlineData(0.0, 10_000)]
    [InlineData(1.0, 500)]
    [InlineData(1.0, 10_000)]
    public void Wilson_interval_of_a_share_of_0_or_1_starts_or_ends_exactly_there(double share, int n)
    {
        var interval = RankAcceptabilityAnalysis.Wilson(share, n);
        Assert.InRange(share, interval.Low, interval.High);
        Assert.Equal(share, share == 0 ? interval.Low : interval.High);
    }

    /// <summary>Crisp ratings 0…10 and crisp importance (codes "1"…"10" for 0.1…1.0), unit ideal points.</summary>
    private static PreparedEvaluation Prepare(string[][] scores, string[]? importance = null) =>
        DecisionEngine.Prepare(RobustnessFixtures.Uniform(scores, importance ?? ["8", "5"],
            rating: RobustnessFixtures.CrispRating, importanceScale: RobustnessFixtures.CrispImportance));

    private static RankAcceptability Share(AcceptabilityResult result, string id) => result.Alternatives.Single(a => a.Alternative == id);

    private static CentralWeightVector Central(AcceptabilityResult result, string id) => result.CentralWeights.Single(c => c.Alternative == id);

    /// <summary>Four binomial standard errors of a share p estimated from n draws (at least 1e-12 for p = 0 or 1).</summary>
    private static double Binomial(double p, int n) => Math.Max(4 * Math.Sqrt(p * (1 - p) / n), 1e-12);

    private static void Within(double expected, double actual, double tolerance) =>
        Assert.True(Math.Abs(actual - expected) <= tolerance, $"expected {expected} ± {tolerance}, got {actual}");

    private static void Close(double[] expected, IReadOnlyList<double> actual, double tolerance)
    {
        Assert.Equal(expected.Length, actual.Count);
        for (var j = 0; j < expected.Length; j++)
        {
            Within(expected[j], actual[j], tolerance);
        }
    }
}
