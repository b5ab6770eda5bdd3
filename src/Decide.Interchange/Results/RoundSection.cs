namespace Decide.Interchange.Results;

/// <summary>
/// The <c>round</c> section: what a round with a review design or a funding line adds — the order it follows, the
/// funding line, the bands the draws cannot put in order, the applications whose funding a check changes and what
/// leaving each reviewer out does to the applications they read. Bands, flips and reviewers are empty until
/// robustness is run.
/// </summary>
/// <param name="Order">Application ids, best first (the points award when it binds, else closeness).</param>
/// <param name="Funding">The funding line, or null when the round sets no budget.</param>
/// <param name="Bands">Bands from the 95% rank intervals, best first.</param>
/// <param name="Flips">Applications whose funding decision a robustness check changes.</param>
/// <param name="Reviewers">Leave-one-reviewer-out on the applications each read.</param>
/// <param name="Calibrated">The ranking with reviewers' terms standardised, beside the raw one, when the plan asks for it.</param>
public sealed record RoundSection(
    IReadOnlyList<string> Order,
    FundingEntry? Funding,
    IReadOnlyList<BandEntry> Bands,
    IReadOnlyList<FundingFlipEntry> Flips,
    IReadOnlyList<ReviewerEffectEntry> Reviewers,
    CalibratedEntry? Calibrated = null);

/// <summary>The calibrated ranking: order, closeness, tau-b with the raw closeness, the habits it corrected and the funding changes.</summary>
public sealed record CalibratedEntry(
    IReadOnlyList<string> Order, IReadOnlyList<double> Closeness, double? KendallTau, double PanelMean, double PanelSpread,
    IReadOnlyList<ReviewerHabitEntry> Reviewers, IReadOnlyList<string> FundingChanges);

/// <summary>One reviewer's mean and spread of positions on the scale.</summary>
public sealed record ReviewerHabitEntry(string Assessor, int Rated, double Mean, double Spread);

/// <summary>The funding line: budget, rule, what is spent, and one decision per ranked application.</summary>
public sealed record FundingEntry(
    double Budget, string Rule, string? Currency, double Spent, int Line, IReadOnlyList<string> TiedAcrossTheLine, IReadOnlyList<FundingDecisionEntry> Decisions);

/// <summary>One application against the funding line.</summary>
public sealed record FundingDecisionEntry(string Alternative, int Position, double Requested, bool Funded, double RemainingAfter, bool PassedOver);

/// <summary>A band: its members in ranking order and the ranks their 95% intervals reach.</summary>
public sealed record BandEntry(int Band, IReadOnlyList<string> Alternatives, int Best, int Worst);

/// <summary>An application whose funding decision a check changes, and why.</summary>
public sealed record FundingFlipEntry(string Alternative, bool FundedNow, IReadOnlyList<string> Because);

/// <summary>What leaving one reviewer out does to the applications they read.</summary>
public sealed record ReviewerEffectEntry(string Assessor, int Read, string? LargestMove, int From, int To, string? Problem);

/// <summary>Krippendorff's alpha with its bootstrap interval.</summary>
public sealed record AlphaEntry(string Metric, double Alpha, double Low, double High, int Units, int PairableValues, int Draws);
