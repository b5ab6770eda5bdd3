namespace Decide.Core.Robustness;

/// <summary>Settings of a robustness run that are not part of the plan.</summary>
/// <param name="Draws">Monte Carlo draws for rank acceptability (default 10,000); 0 skips rank acceptability.</param>
/// <param name="Seed">Seed of the draws; record it with the results.</param>
/// <param name="Threads">Maximum threads for the draws; the numbers do not depend on it.</param>
public sealed record RobustnessOptions(int Draws = RobustnessOptions.DefaultDraws, ulong Seed = RobustnessOptions.DefaultSeed, int Threads = 1)
{
    /// <summary>Default number of draws.</summary>
    public const int DefaultDraws = 10_000;

    /// <summary>Default seed.</summary>
    public const ulong DefaultSeed = 20001;
}

/// <summary>How the ranking responds to changes of weights, ratings, panel, bid set and method.</summary>
/// <param name="Sweeps">One-at-a-time weight sweeps.</param>
/// <param name="CriticalChanges">Smallest share changes that reverse each pair, and the most critical criteria.</param>
/// <param name="Acceptability">Rank acceptability from Monte Carlo draws.</param>
/// <param name="LeaveOneOut">Ranking without each assessor.</param>
/// <param name="WithoutAlternative">Ranking without each alternative.</param>
/// <param name="Methods">The ranking under other methods.</param>
public sealed record SensitivityResult(
    IReadOnlyList<WeightSweepResult> Sweeps,
    CriticalChangesResult CriticalChanges,
    AcceptabilityResult Acceptability,
    IReadOnlyList<LeaveOneOutResult> LeaveOneOut,
    IReadOnlyList<WithoutAlternativeResult> WithoutAlternative,
    IReadOnlyList<MethodComparison> Methods);

/// <summary>The whole robustness section: sensitivity, panel agreement and a plain-words summary.</summary>
/// <param name="Sensitivity">Sensitivity of the ranking.</param>
/// <param name="Agreement">How far the panel agrees (information for moderation).</param>
/// <param name="Summary">Sentences for the report and the screens, generated from the numbers.</param>
public sealed record RobustnessResult(SensitivityResult Sensitivity, PanelAgreementResult Agreement, IReadOnlyList<string> Summary);
