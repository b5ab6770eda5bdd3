namespace Decide.Core.Robustness;

/// <summary>
/// The smallest change of one criterion's weight that reverses one pair of alternatives, in two measures: the share
/// the criterion must reach (Decide's, what panels publish) and the critical change δ of Triantaphyllou &amp;
/// Sánchez (1997), the change of that criterion's weight alone before all weights are renormalised.
/// </summary>
/// <param name="Criterion">Criterion id.</param>
/// <param name="Leader">The alternative ahead in the base ranking.</param>
/// <param name="Challenger">The alternative behind it.</param>
/// <param name="Current">The criterion's current share ŵₖ, in [0, 1].</param>
/// <param name="Weight">
/// The share t* ∈ [0, 1] nearest to ŵₖ at which the pair reverses (the others keep their proportions); null when no
/// share in [0, 1] reverses it.
/// </param>
/// <param name="Absolute">|t* − ŵₖ|, in [0, 1]; null when no share in [0, 1] reverses the pair.</param>
/// <param name="Relative">|t* − ŵₖ| / ŵₖ × 100 (percent of the current share); null when no share reverses the pair.</param>
/// <param name="Delta">
/// Triantaphyllou &amp; Sánchez's critical change δ (signed): the weight becomes wₖ − δ, the other weights stay,
/// then all are renormalised to sum 1; a positive δ lowers the criterion's weight. δ = (ŵₖ − t)/(1 − t) for a
/// reversal at share t; the one smallest in size among the reversals with wₖ − δ ≥ 0 (δ ≤ ŵₖ, the paper's condition),
/// which is every reversal below a share of 1. Null when there is none.
/// </param>
/// <param name="DeltaRelative">δ / ŵₖ × 100 (signed percent of the current weight); null with <paramref name="Delta"/>.</param>
/// <param name="DeltaShare">
/// The share t at which the reversal chosen by <paramref name="Delta"/> happens; usually <paramref name="Weight"/>,
/// but it can be another reversal point (|δ| weighs a rise and a fall of the share differently). Null with
/// <paramref name="Delta"/>.
/// </param>
public sealed record CriticalChange(
    string Criterion,
    string Leader,
    string Challenger,
    double Current,
    double? Weight,
    double? Absolute,
    double? Relative,
    double? Delta,
    double? DeltaRelative,
    double? DeltaShare)
{
    /// <summary>The words used when no change reverses the pair.</summary>
    public const string NoReversal = "no change in [0,1] reverses this pair";

    /// <summary>The words used when only the whole weight (a share of 100%) reverses the pair, which no finite δ reaches.</summary>
    public const string NoFeasibleDelta = "reverses only when this criterion takes the whole weight";

    /// <summary>True when some share in [0, 1] reverses the pair.</summary>
    public bool Reverses => Absolute is not null;
}

/// <summary>The most critical criterion under one definition: one reversal point, in both measures.</summary>
/// <param name="Criterion">Criterion id.</param>
/// <param name="Leader">The alternative ahead in the base ranking.</param>
/// <param name="Challenger">The alternative that overtakes it.</param>
/// <param name="Current">The criterion's current share ŵₖ.</param>
/// <param name="Absolute">|t* − ŵₖ|: the change of share, in [0, 1].</param>
/// <param name="Relative">|t* − ŵₖ| / ŵₖ × 100.</param>
/// <param name="Weight">The share t* at which the reversal happens.</param>
/// <param name="Delta">
/// Triantaphyllou &amp; Sánchez's δ = (ŵₖ − t*)/(1 − t*) for this reversal (signed; positive lowers the weight);
/// null when it lies outside [ŵₖ − 1, ŵₖ] (the weight alone would have to exceed 1).
/// </param>
/// <param name="DeltaRelative">δ / ŵₖ × 100 (signed); null with <paramref name="Delta"/>.</param>
public sealed record MostCriticalCriterion(
    string Criterion, string Leader, string Challenger, double Current, double Absolute, double Relative, double Weight,
    double? Delta, double? DeltaRelative);

/// <summary>Critical changes for every criterion and pair, and the most critical criteria.</summary>
/// <param name="Changes">Per criterion and ordered pair of the base ranking.</param>
/// <param name="TopAbsolute">
/// Most critical criterion for the top rank as Triantaphyllou &amp; Sánchez (1997) define it, by the absolute
/// critical change: the smallest |δ| over pairs led by the first-ranked alternative; null when no feasible change
/// reverses such a pair.
/// </param>
/// <param name="TopRelative">The same by the relative change |δ'| = |δ| / ŵₖ × 100 (the paper's percent-top, PT, criterion).</param>
/// <param name="AnyAbsolute">Most critical criterion for any rank, by |δ| over every pair.</param>
/// <param name="AnyRelative">The same by |δ'| (the paper's percent-any, PA, criterion).</param>
/// <param name="TopShare">
/// For the top rank, the smallest change of share |t* − ŵₖ|: the share a criterion must reach for a challenger to
/// overtake the leader. This is what the screens and the plain-words summary show, because shares are what panels
/// publish.
/// </param>
/// <param name="AnyShare">The smallest change of share that reverses any pair.</param>
public sealed record CriticalChangesResult(
    IReadOnlyList<CriticalChange> Changes,
    MostCriticalCriterion? TopAbsolute,
    MostCriticalCriterion? TopRelative,
    MostCriticalCriterion? AnyAbsolute,
    MostCriticalCriterion? AnyRelative,
    MostCriticalCriterion? TopShare,
    MostCriticalCriterion? AnyShare);
