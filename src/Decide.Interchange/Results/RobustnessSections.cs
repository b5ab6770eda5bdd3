using Decide.Core.Model;
using Decide.Core.Robustness;

namespace Decide.Interchange.Results;

/// <summary>Turns the engine's robustness results into the <c>sensitivity</c> and <c>agreement</c> sections.</summary>
internal static class RobustnessSections
{
    public static SensitivitySection Sensitivity(SensitivityResult s, Func<string, string> criterionName)
    {
        var acceptability = s.Acceptability;
        return new SensitivitySection(
            s.Sweeps.Select(w => new SweepEntry(
                w.Criterion, criterionName(w.Criterion), w.Current, w.Samples.ToArray(),
                w.Series.Select(x => new SweepSeriesEntry(x.Alternative, x.Closeness.ToArray())).ToArray(),
                w.Reversals.Select(r => new SweepReversalEntry(r.Weight, [r.Below, r.Above], r.Confirmed)).ToArray(),
                w.Note)).ToArray(),
            CriticalChanges(s.CriticalChanges),
            acceptability.Draws,
            acceptability.Seed,
            FormatWords.Of(acceptability.Weights),
            acceptability.Alternatives.Select(a => new AcceptabilityEntry(
                a.Alternative, a.Ranks.ToArray(),
                a.Intervals.Select(i => (IReadOnlyList<double>)[i.Low, i.High]).ToArray(), a.Holistic)).ToArray(),
            acceptability.CentralWeights.Select(c => new CentralWeightsEntry(
                c.Alternative, Map(c.Criteria, c.Weights), c.Confidence)).ToArray(),
            s.LeaveOneOut.Select(l => new LeaveOneOutEntry(l.Assessor, l.Winner, l.Ranking.ToArray(), l.WinnerChanged, l.Problem)).ToArray(),
            s.WithoutAlternative.Select(w => new WithoutAlternativeEntry(
                w.Alternative, w.Ranking.ToArray(),
                w.Reversals.Select(r => new OrderReversalEntry(r.WasAhead, r.NowAhead)).ToArray())).ToArray(),
            s.Methods.Select(m => new MethodComparisonEntry(
                m.Method, m.Description, m.Ranking.ToArray(), m.Scores.ToArray(), m.KendallTau, m.SameWinner, m.Note)).ToArray());
    }

    public static AgreementSection Agreement(PanelAgreementResult a)
    {
        var w = a.Concordance;
        return new AgreementSection(
            w?.W, w?.ChiSquare, w?.PValue, w?.DegreesOfFreedom, a.Tolerance,
            a.ForDiscussion.Select(c => new CellSpreadEntry(
                c.Alternative, c.Criterion, c.Spread, Map(c.Terms.Select(t => t.Assessor), c.Terms.Select(t => t.Term)))).ToArray(),
            a.Assessors.Select(x => new AssessorAgreementEntry(
                x.Assessor, x.Ranking.ToArray(),
                Map(x.Closeness.Select(c => c.Alternative), x.Closeness.Select(c => c.Closeness)),
                x.CellsRated, x.MeanDistance, x.TauWithPanel)).ToArray(),
            new[] { a.Reliability?.Ordinal, a.Reliability?.Interval }.OfType<AlphaEstimate>()
                .Select(x => new AlphaEntry(x.Metric.ToString().ToLowerInvariant(), x.Alpha, x.Low, x.High, x.Units, x.PairableValues, x.Draws)).ToArray(),
            a.OutsideConcordance?.ToArray() ?? []);
    }

    public static RoundSection Round(Decide.Core.Rounds.RoundReport r) => new(
        r.Order.ToArray(),
        r.Funding is { } f
            ? new FundingEntry(f.Plan.Budget, FormatWords.Of(f.Plan.Rule), f.Plan.Currency, f.Spent, f.Line, f.TiedAcrossTheLine.ToArray(),
                f.Decisions.Select(d => new FundingDecisionEntry(d.Alternative, d.Position, d.Requested, d.Funded, d.RemainingAfter, d.PassedOver)).ToArray())
            : null,
        r.Bands.Select(b => new BandEntry(b.Number, b.Alternatives.ToArray(), b.Best, b.Worst)).ToArray(),
        r.Flips.Select(x => new FundingFlipEntry(x.Alternative, x.FundedNow, x.Because.ToArray())).ToArray(),
        r.Reviewers.Select(x => new ReviewerEffectEntry(x.Assessor, x.Read, x.LargestMove, x.From, x.To, x.Problem)).ToArray(),
        r.Calibrated is { } c
            ? new CalibratedEntry(c.Order.ToArray(), c.Closeness.ToArray(), c.KendallTau, c.PanelMean, c.PanelSpread,
                c.Reviewers.Select(h => new ReviewerHabitEntry(h.Assessor, h.Rated, h.Mean, h.Spread)).ToArray(), c.FundingChanges.ToArray())
            : null);

    private static CriticalChangesEntry CriticalChanges(CriticalChangesResult c) => new(
        c.Changes.Select(x => new CriticalChangeEntry(
            x.Criterion, [x.Leader, x.Challenger], x.Current, x.Weight, x.Absolute, x.Relative, x.Delta, x.DeltaRelative, x.DeltaShare,
            x.Reverses, !x.Reverses ? CriticalChange.NoReversal : x.Delta is null ? CriticalChange.NoFeasibleDelta : null)).ToArray(),
        new MostCriticalEntry(Most(c.TopAbsolute), Most(c.TopRelative), Most(c.AnyAbsolute), Most(c.AnyRelative), Most(c.TopShare), Most(c.AnyShare)));

    private static MostCriticalCriterionEntry? Most(MostCriticalCriterion? m) => m is null
        ? null
        : new MostCriticalCriterionEntry(m.Criterion, [m.Leader, m.Challenger], m.Current, m.Weight, m.Absolute, m.Relative, m.Delta, m.DeltaRelative);

    /// <summary>Pairs keys with values, keeping their order (the first of a repeated key wins).</summary>
    private static Dictionary<string, T> Map<T>(IEnumerable<string> keys, IEnumerable<T> values)
    {
        var map = new Dictionary<string, T>(StringComparer.Ordinal);
        foreach (var (key, value) in keys.Zip(values))
        {
            map.TryAdd(key, value);
        }

        return map;
    }
}
