using Decide.Core.Fuzzy;
using Decide.Core.Model;

namespace Decide.Core.Aggregation;

/// <summary>
/// Combines several assessors' TFNs for one cell (or one weight) into the panel's TFN.
/// </summary>
/// <remarks>
/// Mean: x̃ = Σₖ ωₖ x̃ᵏ with ωₖ = assessor weights renormalised over those who rated the cell (Chen 2000, eqs. 13–14,
/// where all ωₖ = 1/K). Geometric: each component is Πₖ (xᵏ)^ωₖ. A declined or unassigned cell is simply absent
/// from the values passed in: the weights of those who did rate it are renormalised. Nothing is imputed.
/// </remarks>
public static class GroupAggregation
{
    /// <summary>
    /// Aggregates <paramref name="values"/> with the matching <paramref name="weights"/> (positive, any total).
    /// </summary>
    /// <exception cref="ArgumentException">No values, lengths differ, or a weight is not positive.</exception>
    public static Tfn Aggregate(ReadOnlySpan<Tfn> values, ReadOnlySpan<double> weights, AggregationRule rule)
    {
        if (values.Length == 0 || values.Length != weights.Length)
        {
            throw new ArgumentException("Aggregation needs at least one value and one weight per value.");
        }

        double total = 0;
        foreach (var w in weights)
        {
            if (!(w > 0) || !double.IsFinite(w))
            {
                throw new ArgumentException("Assessor weights must be positive and finite.", nameof(weights));
            }

            total += w;
        }

        return rule == AggregationRule.Mean ? Mean(values, weights, total) : Geometric(values, weights, total);
    }

    /// <summary>
    /// The scales the geometric mean would multiply values of in <paramref name="evaluation"/> — the rating scale when a
    /// criterion is linguistic, the importance scale under importance weighting — with their terms whose lower value is
    /// 0 or below. One rating of such a term sets the panel's value to 0 whatever the others said (a veto), so the
    /// validator refuses the geometric mean when this list is not empty, and the method cross-check says why.
    /// </summary>
    public static IReadOnlyList<(string Scale, IReadOnlyList<Scales.LinguisticTerm> Terms)> TermsAtZero(Evaluation evaluation)
    {
        var found = new List<(string, IReadOnlyList<Scales.LinguisticTerm>)>();
        void Check(string role, Scales.LinguisticScale scale)
        {
            var zero = scale.Terms.Where(t => t.Value.Lower <= 0).ToArray();
            if (zero.Length > 0)
            {
                found.Add((role, zero));
            }
        }

        if (evaluation.Criteria.Any(c => c.Kind == CriterionKind.Linguistic))
        {
            Check("rating scale", evaluation.RatingScale);
        }

        if (evaluation.Weighting == WeightingMethod.Importance)
        {
            Check("importance scale", evaluation.ImportanceScale);
        }

        return found;
    }

    private static Tfn Mean(ReadOnlySpan<Tfn> values, ReadOnlySpan<double> weights, double total)
    {
        double l = 0, m = 0, u = 0;
        for (var k = 0; k < values.Length; k++)
        {
            var w = weights[k] / total;
            l += w * values[k].Lower;
            m += w * values[k].Middle;
            u += w * values[k].Upper;
        }

        // Rounding can leave l a hair above m when every input is the same crisp value; restore the order.
        return Tfn.Unchecked(Math.Min(l, m), m, Math.Max(u, m));
    }

    private static Tfn Geometric(ReadOnlySpan<Tfn> values, ReadOnlySpan<double> weights, double total)
    {
        double l = 1, m = 1, u = 1;
        for (var k = 0; k < values.Length; k++)
        {
            var w = weights[k] / total;
            l *= Math.Pow(values[k].Lower, w);
            m *= Math.Pow(values[k].Middle, w);
            u *= Math.Pow(values[k].Upper, w);
        }

        return Tfn.Unchecked(Math.Min(l, m), m, Math.Max(u, m));
    }
}
