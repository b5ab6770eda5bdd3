using System.Globalization;

namespace Decide.Core.Fuzzy;

/// <summary>
/// A triangular fuzzy number ã = (l, m, u): membership rises linearly from 0 at <see cref="Lower"/> to 1 at
/// <see cref="Middle"/> and falls back to 0 at <see cref="Upper"/>. Immutable; every instance satisfies
/// l ≤ m ≤ u with all three finite.
/// </summary>
/// <remarks>
/// Arithmetic follows the definitions in Chen (2000), Fuzzy Sets and Systems 114:1–9, §2, which are the ones
/// fuzzy TOPSIS is defined with: addition is exact, the product of two non-negative TFNs is the usual
/// vertex-wise approximation, and division by a positive TFN multiplies by its reciprocal (1/u, 1/m, 1/l).
/// See docs/methods.md §1.
/// </remarks>
public readonly record struct Tfn
{
    /// <summary>Creates (l, m, u).</summary>
    /// <exception cref="ArgumentException">A value is NaN or infinite, or the values are out of order.</exception>
    public Tfn(double lower, double middle, double upper)
    {
        if (!double.IsFinite(lower) || !double.IsFinite(middle) || !double.IsFinite(upper))
        {
            throw new ArgumentException(
                $"A triangular fuzzy number needs three finite values; got ({Format(lower)}, {Format(middle)}, {Format(upper)}).");
        }

        if (lower > middle || middle > upper)
        {
            throw new ArgumentException(
                $"A triangular fuzzy number needs lower ≤ middle ≤ upper; got ({Format(lower)}, {Format(middle)}, {Format(upper)}).");
        }

        Lower = lower;
        Middle = middle;
        Upper = upper;
    }

    /// <summary>l: the smallest value with positive membership.</summary>
    public double Lower { get; }

    /// <summary>m: the value with membership 1.</summary>
    public double Middle { get; }

    /// <summary>u: the largest value with positive membership.</summary>
    public double Upper { get; }

    /// <summary>The crisp number x as the degenerate TFN (x, x, x).</summary>
    public static Tfn Crisp(double value) => new(value, value, value);

    /// <summary>(0, 0, 0).</summary>
    public static Tfn Zero => default;

    /// <summary>(1, 1, 1).</summary>
    public static Tfn One => new(1, 1, 1);

    /// <summary>True when l = m = u.</summary>
    public bool IsCrisp => Lower == Middle && Middle == Upper;

    /// <summary>Exact sum (l₁+l₂, m₁+m₂, u₁+u₂).</summary>
    public static Tfn operator +(Tfn a, Tfn b) => Unchecked(a.Lower + b.Lower, a.Middle + b.Middle, a.Upper + b.Upper);

    /// <summary>Scalar multiple (kl, km, ku) for k ≥ 0.</summary>
    /// <exception cref="ArgumentOutOfRangeException">k is negative or not finite.</exception>
    public static Tfn operator *(double k, Tfn a)
    {
        if (!(k >= 0) || !double.IsFinite(k))
        {
            throw new ArgumentOutOfRangeException(nameof(k), k, "A TFN can only be scaled by a finite, non-negative number.");
        }

        return Unchecked(k * a.Lower, k * a.Middle, k * a.Upper);
    }

    /// <summary>Scalar multiple (kl, km, ku) for k ≥ 0.</summary>
    public static Tfn operator *(Tfn a, double k) => k * a;

    /// <summary>
    /// Approximate product (l₁l₂, m₁m₂, u₁u₂) of two non-negative TFNs: the vertex-wise approximation of the
    /// α-cut product (Chen 2000, eq. 7).
    /// </summary>
    /// <exception cref="ArgumentOutOfRangeException">Either operand has a negative lower value.</exception>
    public static Tfn operator *(Tfn a, Tfn b)
    {
        if (a.Lower < 0 || b.Lower < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(b), "The approximate product is defined for non-negative TFNs only.");
        }

        return Unchecked(a.Lower * b.Lower, a.Middle * b.Middle, a.Upper * b.Upper);
    }

    /// <summary>Approximate quotient ã ⊗ b̃⁻¹ = (l₁/u₂, m₁/m₂, u₁/l₂) of a non-negative TFN by a positive one.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The divisor's lower value is not above 0, or the dividend is negative.</exception>
    public static Tfn operator /(Tfn a, Tfn b) => a * b.Reciprocal();

    /// <summary>Reciprocal (1/u, 1/m, 1/l) of a positive TFN.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The lower value is not above 0.</exception>
    public Tfn Reciprocal()
    {
        if (!(Lower > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(Lower), Lower, "Only a TFN whose lower value is above 0 has a reciprocal.");
        }

        return Unchecked(1 / Upper, 1 / Middle, 1 / Lower);
    }

    /// <summary>Centre of gravity (l + m + u) / 3.</summary>
    public double Centroid => (Lower + Middle + Upper) / 3;

    /// <summary>Graded mean integration representation (l + 4m + u) / 6 (Chen &amp; Hsieh 1999).</summary>
    public double GradedMean => (Lower + (4 * Middle) + Upper) / 6;

    /// <summary>
    /// Vertex distance d(ã, b̃) = √(((l₁−l₂)² + (m₁−m₂)² + (u₁−u₂)²) / 3) (Chen 2000, eq. 12). For crisp numbers it
    /// is |x − y|.
    /// </summary>
    public static double Distance(Tfn a, Tfn b)
    {
        double dl = a.Lower - b.Lower, dm = a.Middle - b.Middle, du = a.Upper - b.Upper;
        return Math.Sqrt(((dl * dl) + (dm * dm) + (du * du)) / 3);
    }

    /// <summary>
    /// The α-cut [l + α(m − l), u − α(u − m)]: the closed interval of values whose membership is at least α; at
    /// α = 1 exactly [m, m], at α = 0 exactly [l, u].
    /// </summary>
    /// <param name="alpha">α in [0, 1].</param>
    /// <exception cref="ArgumentOutOfRangeException">α is outside [0, 1].</exception>
    public (double Low, double High) AlphaCut(double alpha)
    {
        if (!(alpha >= 0 && alpha <= 1))
        {
            throw new ArgumentOutOfRangeException(nameof(alpha), alpha, "α must lie in [0, 1].");
        }

        // Written as convex combinations and clamped so that α = 0 gives exactly [l, u] and α = 1 exactly [m, m];
        // the form l + α(m − l) can land an ulp beside m at α = 1 and leave the peak outside its own 1-cut.
        return (Math.Clamp(((1 - alpha) * Lower) + (alpha * Middle), Lower, Middle),
            Math.Clamp(((1 - alpha) * Upper) + (alpha * Middle), Middle, Upper));
    }

    /// <summary>Membership of x: 1 at m, falling linearly to 0 at l and u, 0 outside.</summary>
    public double Membership(double x)
    {
        if (x < Lower || x > Upper)
        {
            return 0;
        }

        if (x == Middle)
        {
            return 1;
        }

        return x < Middle ? (x - Lower) / (Middle - Lower) : (Upper - x) / (Upper - Middle);
    }

    /// <summary>The three values as an array [l, m, u] (for serialisation).</summary>
    public double[] ToArray() => [Lower, Middle, Upper];

    /// <summary>Formats as "(l, m, u)" with invariant culture.</summary>
    public override string ToString() =>
        string.Create(CultureInfo.InvariantCulture, $"({Format(Lower)}, {Format(Middle)}, {Format(Upper)})");

    /// <summary>
    /// Builds a TFN from values the caller has already shown to be finite and ordered (results of exact
    /// arithmetic on valid TFNs). Used in the engine's inner loops, where re-validating would cost time; it still
    /// checks in debug builds.
    /// </summary>
    internal static Tfn Unchecked(double lower, double middle, double upper)
    {
        System.Diagnostics.Debug.Assert(lower <= middle && middle <= upper, "Unchecked TFN out of order");
        return new Tfn(lower, middle, upper, trusted: true);
    }

#pragma warning disable IDE0060 // the marker parameter selects this constructor
    private Tfn(double lower, double middle, double upper, bool trusted)
#pragma warning restore IDE0060
    {
        Lower = lower;
        Middle = middle;
        Upper = upper;
    }

    private static string Format(double x) => x.ToString("G6", CultureInfo.InvariantCulture);
}
