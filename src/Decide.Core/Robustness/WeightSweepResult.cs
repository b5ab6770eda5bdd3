namespace Decide.Core.Robustness;

/// <summary>How one criterion's share was swept from 0 to 1 and where the order of alternatives changes.</summary>
/// <param name="Criterion">Criterion id.</param>
/// <param name="Current">The criterion's current crisp share ŵₖ.</param>
/// <param name="Samples">The shares t at which closeness is sampled for charts (0, 0.05, …, 1).</param>
/// <param name="Series">Each alternative's closeness at those shares.</param>
/// <param name="Reversals">Every share at which two alternatives swap order, ascending.</param>
/// <param name="Note">Why the criterion could not be swept, when it could not (its share is 0 or it is the only criterion).</param>
public sealed record WeightSweepResult(
    string Criterion,
    double Current,
    IReadOnlyList<double> Samples,
    IReadOnlyList<SweepSeries> Series,
    IReadOnlyList<SweepReversal> Reversals,
    string? Note = null);

/// <summary>One alternative's closeness along a sweep.</summary>
public sealed record SweepSeries(string Alternative, IReadOnlyList<double> Closeness);

/// <summary>A share at which two alternatives swap order.</summary>
/// <param name="Weight">The share t* of the swept criterion (root of the closeness difference, to 1e-10).</param>
/// <param name="Below">The alternative ahead just below t*.</param>
/// <param name="Above">The alternative ahead just above t*.</param>
/// <param name="Confirmed">
/// True when recomputation at t* ± 10⁻⁶ shows the two in opposite orders (always expected; false would mark a
/// touching point rather than a crossing).
/// </param>
public sealed record SweepReversal(double Weight, string Below, string Above, bool Confirmed);
