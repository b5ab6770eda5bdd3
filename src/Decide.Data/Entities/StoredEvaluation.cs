namespace Decide.Data.Entities;

/// <summary>
/// One evaluation (one revision of it). The plan — scales, criteria with descriptors, groups, weighting method and
/// options — is held as a <c>decide-evaluation/1</c> document without panel, bids or inputs (<see cref="PlanJson"/>);
/// it is edited as a whole during setup and frozen, with its SHA-256, when the plan is locked.
/// </summary>
public sealed class StoredEvaluation : IVersioned
{
    public Guid Id { get; set; }

    /// <summary>The buyer's reference ("KVTA-2026-017").</summary>
    public string Reference { get; set; } = "";

    public string Title { get; set; } = "";

    public string? Organisation { get; set; }

    /// <summary>Where the evaluation is; it moves only by the methods below, as <see cref="StageRules"/> allow.</summary>
    public EvaluationStage Stage { get; private set; }

    /// <summary>1 for the first revision; a new revision copies the plan and links back.</summary>
    public int Revision { get; set; } = 1;

    public Guid? PreviousRevisionId { get; set; }

    public string? RevisionReason { get; set; }

    public Guid? SupersededById { get; private set; }

    /// <summary>The plan as a decide-evaluation/1 document (no panel, alternatives or inputs).</summary>
    public string PlanJson { get; set; } = "{}";

    /// <summary>SHA-256 (hex) of <see cref="PlanJson"/> when the plan was locked.</summary>
    public string? PlanHash { get; private set; }

    /// <summary>Shortest rationale accepted with a rating, in characters.</summary>
    public int MinRationaleLength { get; set; } = 20;

    /// <summary>Whether quality assessors may see numeric (price) criteria.</summary>
    public bool PricesVisibleToAssessors { get; set; }

    /// <summary>How many approvers must approve before sign-off (1 or 2).</summary>
    public int RequiredApprovals { get; set; } = 1;

    public DateTimeOffset CreatedAt { get; set; }

    public string CreatedBy { get; set; } = "";

    public DateTimeOffset? PlanLockedAt { get; private set; }

    public DateTimeOffset? ScoringOpenedAt { get; private set; }

    public DateTimeOffset? ModerationStartedAt { get; private set; }

    public DateTimeOffset? SignedOffAt { get; private set; }

    /// <summary>
    /// True when the locked plan's award runs in two stages: prices stay sealed (not entered, not shown, not
    /// exported) until quality moderation is closed and prices are opened. Fixed when the plan is locked.
    /// </summary>
    public bool TwoStage { get; private set; }

    /// <summary>SHA-256 of the methodology's text version made from the plan when it was locked (the method published with the tender).</summary>
    public string? MethodologyHash { get; private set; }

    /// <summary>True when the plan makes the evaluation a round (each reviewer reads only the applications assigned to them).</summary>
    public bool IsRound { get; set; }

    /// <summary>True when the locked plan publishes a points award (fixed when the plan is locked).</summary>
    public bool PointsAward { get; private set; }

    /// <summary>When prices were opened (two stages); ratings and moderated values are final from then on.</summary>
    public DateTimeOffset? PricesOpenedAt { get; private set; }

    /// <summary>Who opened the prices (a user id, or the import that brought them).</summary>
    public string? PricesOpenedBy { get; private set; }

    /// <summary>True while a two-stage evaluation's prices are sealed.</summary>
    public bool PricesSealed => TwoStage && PricesOpenedAt is null;

    /// <summary>True once a two-stage evaluation's prices are open: quality (ratings, moderation) is then closed.</summary>
    public bool QualityClosed => TwoStage && PricesOpenedAt is not null;

    /// <summary>When the facilitator asked the approvers to sign off; approvals are accepted only after that.</summary>
    public DateTimeOffset? SignOffRequestedAt { get; set; }

    /// <summary>The facilitator who asked (user id).</summary>
    public string? SignOffRequestedBy { get; set; }

    /// <summary>What the facilitator told the approvers when asking (the recommendation in their words).</summary>
    public string? SignOffRequestNote { get; set; }

    /// <summary>A legal hold stops any retention-based disposal.</summary>
    public bool LegalHold { get; set; }

    public string? LegalHoldReason { get; set; }

    /// <summary>Earliest date the record may be disposed of (at least three years after award is common practice).</summary>
    public DateTimeOffset? RetainUntil { get; set; }

    /// <summary>Optimistic-concurrency token, incremented on every change.</summary>
    public long Version { get; set; }

    public List<PanelMember> Panel { get; set; } = [];

    public List<StoredAlternative> Alternatives { get; set; } = [];

    /// <summary>Setup → plan locked: the plan is frozen with its SHA-256.</summary>
    /// <exception cref="StageRefusedException">The evaluation is not at setup.</exception>
    /// <param name="at">When.</param>
    /// <param name="planHash">The locked plan's SHA-256.</param>
    /// <param name="pointsAward">True when the plan publishes a points award.</param>
    /// <param name="twoStage">True when the plan's award keeps prices sealed until quality is moderated.</param>
    /// <param name="methodologyHash">SHA-256 of the methodology made from the locked plan.</param>
    public void LockPlan(DateTimeOffset at, string planHash, bool pointsAward = false, bool twoStage = false, string? methodologyHash = null)
    {
        Move(StageRules.LockPlan, EvaluationStage.PlanLocked);
        PlanLockedAt = at;
        PlanHash = planHash;
        MethodologyHash = methodologyHash;
        PointsAward = pointsAward;
        TwoStage = pointsAward && twoStage;
    }

    /// <summary>
    /// Two stages: closes quality (no rating or moderated value changes from now on) and opens the prices for the
    /// bids that remain. Possible during moderation only, once.
    /// </summary>
    /// <exception cref="StageRefusedException">Not a two-stage evaluation, not at moderation, or prices already open.</exception>
    public void OpenPrices(DateTimeOffset at, string by)
    {
        if (!TwoStage)
        {
            throw new StageRefusedException($"Cannot open prices: evaluation {Reference} is evaluated in one stage; its prices were never sealed.");
        }

        if (PricesOpenedAt is { } opened)
        {
            throw new StageRefusedException($"Cannot open prices: the prices of evaluation {Reference} were opened on {opened:yyyy-MM-dd HH:mm} UTC.");
        }

        if (!StageRules.OpenPrices.AllowsAt(Stage))
        {
            throw new StageRefusedException(StageRules.OpenPrices.Refusal(Reference, Stage));
        }

        PricesOpenedAt = at;
        PricesOpenedBy = by;
    }

    /// <summary>
    /// An imported two-stage file that already holds prices: the file's quality stage was closed where it was made,
    /// so the prices count as opened by the import (recorded in the audit trail).
    /// </summary>
    public void MarkPricesOpenedByImport(DateTimeOffset at, string importedBy, bool twoStage)
    {
        PointsAward = true;
        TwoStage = twoStage;
        PricesOpenedAt = at;
        PricesOpenedBy = importedBy;
    }

    /// <summary>Plan locked → scoring.</summary>
    /// <exception cref="StageRefusedException">The plan is not locked, or scoring is already open.</exception>
    public void OpenScoring(DateTimeOffset at)
    {
        Move(StageRules.OpenScoring, EvaluationStage.Scoring);
        ScoringOpenedAt = at;
    }

    /// <summary>Scoring → moderation.</summary>
    /// <exception cref="StageRefusedException">The evaluation is not at scoring.</exception>
    public void StartModeration(DateTimeOffset at)
    {
        Move(StageRules.StartModeration, EvaluationStage.Moderation);
        ModerationStartedAt = at;
    }

    /// <summary>Moderation → signed off (read-only from then on).</summary>
    /// <exception cref="StageRefusedException">The evaluation is not at moderation.</exception>
    public void SignOff(DateTimeOffset at)
    {
        Move(StageRules.SignOff, EvaluationStage.SignedOff);
        SignedOffAt = at;
    }

    /// <summary>This revision is replaced by <paramref name="next"/> and kept, read-only, for the record.</summary>
    /// <exception cref="StageRefusedException">The evaluation is still at setup (edit it instead) or already superseded.</exception>
    public void SupersedeBy(Guid next)
    {
        Move(StageRules.OpenRevision, EvaluationStage.Superseded);
        SupersededById = next;
    }

    private void Move(StageRule rule, EvaluationStage to)
    {
        if (!rule.AllowsAt(Stage))
        {
            throw new StageRefusedException(rule.Refusal(Reference, Stage));
        }

        Stage = to;
    }
}
