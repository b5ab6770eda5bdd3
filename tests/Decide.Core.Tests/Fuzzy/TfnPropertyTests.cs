using Decide.Core.Fuzzy;
using Decide.Core.Tests.Support;
using FsCheck.Xunit;

namespace Decide.Core.Tests.Fuzzy;

/// <summary>Properties of the vertex distance and the α-cut over random TFNs.</summary>
[Properties(Arbitrary = [typeof(DecideArbitraries)])]
public sealed class TfnPropertyTests
{
    [Property]
    public bool Distance_to_itself_is_zero(Tfn a) => Tfn.Distance(a, a) == 0;

    [Property]
    public bool Distance_is_symmetric(Tfn a, Tfn b) => Tfn.Distance(a, b) == Tfn.Distance(b, a);

    [Property]
    public bool Distance_is_positive_between_different_tfns(Tfn a, Tfn b) => a == b || Tfn.Distance(a, b) > 0;

    [Property]
    public bool Distance_obeys_the_triangle_inequality(Tfn a, Tfn b, Tfn c) =>
        Tfn.Distance(a, c) <= Tfn.Distance(a, b) + Tfn.Distance(b, c) + 1e-9;

    [Property]
    public bool Distance_between_crisp_numbers_is_their_absolute_difference(Tfn a, Tfn b)
    {
        double x = a.Middle, y = b.Middle;
        return Math.Abs(Tfn.Distance(Tfn.Crisp(x), Tfn.Crisp(y)) - Math.Abs(x - y)) <= 1e-12 * Math.Max(1, Math.Abs(x - y));
    }

    [Property]
    public bool Alpha_cut_at_one_is_the_peak(Tfn a) => a.AlphaCut(1) == (a.Middle, a.Middle);

    [Property]
    public bool Alpha_cut_at_zero_is_the_support(Tfn a) => a.AlphaCut(0) == (a.Lower, a.Upper);

    [Property]
    public bool Alpha_cuts_are_nested(Tfn a)
    {
        var (low1, high1) = a.AlphaCut(0.3);
        var (low2, high2) = a.AlphaCut(0.7);
        return low1 <= low2 && low2 <= high2 && high2 <= high1;
    }
}
