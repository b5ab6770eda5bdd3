using Decide.Core.Consistency;
using Decide.Core.Tests.Support;

namespace Decide.Core.Tests.Consistency;

public sealed class IntransitiveTriadTests
{
    [Fact]
    public void A_over_b_over_c_over_a_is_reported_as_that_cycle()
    {
        // A over B (3), B over C (3), C over A (3, so A over C is 1/3).
        double[] a =
        [
            1, 3, 1.0 / 3,
            1.0 / 3, 1, 3,
            3, 1.0 / 3, 1,
        ];
        var report = PairwiseConsistency.Analyse(a, ["A", "B", "C"]);
        var triad = Assert.Single(report.IntransitiveTriads);
        Assert.Equal(["A", "B", "C"], triad);
    }

    [Fact]
    public void The_opposite_cycle_is_named_in_its_own_direction()
    {
        // B over A, C over B, A over C: the cycle A → C → B → A.
        double[] a =
        [
            1, 1.0 / 2, 2,
            2, 1, 1.0 / 2,
            1.0 / 2, 2, 1,
        ];
        var triad = Assert.Single(PairwiseConsistency.Analyse(a, ["A", "B", "C"]).IntransitiveTriads);
        Assert.Equal(["A", "C", "B"], triad);
    }

    [Fact]
    public void A_cycle_inside_a_larger_matrix_names_only_its_three_items()
    {
        // D dominates everything; B over C, C over E, E over B.
        var items = new[] { "B", "C", "D", "E" };
        var a = ReciprocalMatrices.Consistent([1, 1, 1, 1]);
        void Set(int i, int j, double v)
        {
            a[(i * 4) + j] = v;
            a[(j * 4) + i] = 1 / v;
        }

        Set(0, 1, 2); // B over C
        Set(1, 3, 2); // C over E
        Set(3, 0, 2); // E over B
        Set(2, 0, 5);
        Set(2, 1, 5);
        Set(2, 3, 5);
        var triad = Assert.Single(PairwiseConsistency.IntransitiveTriads(a, items));
        Assert.Equal(["B", "C", "E"], triad);
    }

    [Fact]
    public void A_transitive_matrix_reports_none()
    {
        // A over B over C, A over C, each by a different amount (not consistent, but transitive).
        double[] a =
        [
            1, 2, 9,
            1.0 / 2, 1, 2,
            1.0 / 9, 1.0 / 2, 1,
        ];
        Assert.Empty(PairwiseConsistency.Analyse(a, ["A", "B", "C"]).IntransitiveTriads);
    }

    [Fact]
    public void Equal_judgements_form_no_cycle()
    {
        Assert.Empty(PairwiseConsistency.IntransitiveTriads(ReciprocalMatrices.Consistent([1, 1, 1, 1, 1]), ReciprocalMatrices.Items(5)));
    }
}
