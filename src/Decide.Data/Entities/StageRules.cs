using static Decide.Data.Entities.EvaluationStage;

namespace Decide.Data.Entities;

/// <summary>Something a user may do only at some stages of an evaluation.</summary>
/// <param name="Action">The action in words, as the refusal sentence starts ("Cannot change the plan: …").</param>
/// <param name="Stages">The stages at which it is possible.</param>
public sealed record StageRule(string Action, params EvaluationStage[] Stages)
{
    /// <summary>True when the action is possible at <paramref name="stage"/>.</summary>
    public bool AllowsAt(EvaluationStage stage) => Array.IndexOf(Stages, stage) >= 0;

    /// <summary>The sentence that refuses the action at <paramref name="stage"/>, naming the evaluation and the stages that allow it.</summary>
    public string Refusal(string reference, EvaluationStage stage) =>
        $"Cannot {Action}: evaluation {reference} is at stage {stage}; this is possible only at {string.Join(" or ", Stages)}.";
}

/// <summary>
/// Every stage rule of an evaluation in one place: what each stage allows, and which stage each move starts from.
/// Stages only go forward (<see cref="EvaluationStage"/>); the moves themselves are the methods of
/// <see cref="StoredEvaluation"/> (<see cref="StoredEvaluation.LockPlan"/>, <see cref="StoredEvaluation.OpenScoring"/>,
/// <see cref="StoredEvaluation.StartModeration"/>, <see cref="StoredEvaluation.SignOff"/>,
/// <see cref="StoredEvaluation.SupersedeBy"/>), which refuse a move these rules do not allow.
/// </summary>
public static class StageRules
{
    // Moves between stages.

    /// <summary>Setup → plan locked.</summary>
    public static readonly StageRule LockPlan = new("lock the plan", Setup);

    /// <summary>Plan locked → scoring.</summary>
    public static readonly StageRule OpenScoring = new("open scoring", PlanLocked);

    /// <summary>Scoring → moderation.</summary>
    public static readonly StageRule StartModeration = new("start moderation", Scoring);

    /// <summary>Moderation → signed off, with the last approval.</summary>
    public static readonly StageRule SignOff = new("sign off", Moderation);

    /// <summary>Any locked stage → superseded, by a new revision in setup.</summary>
    public static readonly StageRule OpenRevision = new("open a new revision", PlanLocked, Scoring, Moderation, SignedOff);

    // Setup: the plan, the panel, the bids and the weights.

    /// <summary>The plan is edited only before it is locked.</summary>
    public static readonly StageRule ChangePlan = new("change the plan", Setup);

    /// <summary>The panel is frozen with the plan.</summary>
    public static readonly StageRule ChangePanel = new("change the panel", Setup);

    /// <summary>Late bids may still be registered after the plan is locked, until scoring opens.</summary>
    public static readonly StageRule ChangeBids = new("change the list of bids", Setup, PlanLocked);

    /// <summary>
    /// In a round, who reads which application is proposed and edited while the bids may still change and is frozen
    /// when scoring opens.
    /// </summary>
    public static readonly StageRule ChangeAssignment = new("change who reviews which application (it is frozen when scoring opens)", Setup, PlanLocked);

    /// <summary>
    /// In a round, reviewers confirm their declaration against the applicants' names and declare conflicts before
    /// scoring, so that the assignment can keep them off what they are conflicted with.
    /// </summary>
    public static readonly StageRule ConfirmDeclarationInRound = new("confirm the declaration against the applicants' names", PlanLocked, Scoring, Moderation);

    /// <summary>In a round, conflicts may be declared from the moment the applicants are known.</summary>
    public static readonly StageRule DeclareConflictInRound = new("declare a conflict of interest", PlanLocked, Scoring, Moderation);

    /// <summary>When the declaration is confirmed against the names: before scoring in a round, from scoring otherwise.</summary>
    public static StageRule ConfirmDeclarationFor(bool round) => round ? ConfirmDeclarationInRound : ConfirmDeclaration;

    /// <summary>When a conflict may be declared: before scoring in a round, from scoring otherwise.</summary>
    public static StageRule DeclareConflictFor(bool round) => round ? DeclareConflictInRound : DeclareConflict;

    /// <summary>Weight judgements are frozen with the plan.</summary>
    public static readonly StageRule ChangeWeights = new("change weight judgements (they are frozen with the plan)", Setup);

    /// <summary>Weight judgements are submitted before the plan is locked.</summary>
    public static readonly StageRule SubmitWeights = new("submit weight judgements", Setup);

    // Declarations.

    /// <summary>The declaration of no conflict may be signed from setup until moderation.</summary>
    public static readonly StageRule SignDeclaration = new("sign the declaration", Setup, PlanLocked, Scoring, Moderation);

    /// <summary>The bidders' names are known from scoring on, so the declaration is confirmed against them then.</summary>
    public static readonly StageRule ConfirmDeclaration = new("confirm the declaration against the bidders' names", Scoring, Moderation);

    /// <summary>A conflict found once the names are known.</summary>
    public static readonly StageRule DeclareConflict = new("declare a conflict of interest", Scoring, Moderation);

    // Scoring.

    /// <summary>Gate (pass/fail) results are recorded once the plan is fixed, until moderation.</summary>
    public static readonly StageRule RecordGate = new("record a gate result", PlanLocked, Scoring);

    /// <summary>
    /// Numeric (price) values are entered while the panel scores; in a two-stage evaluation only after the prices
    /// were opened, at moderation (<see cref="ValuesRefusal"/>).
    /// </summary>
    public static readonly StageRule EnterValues = new("enter numeric values", Scoring);

    /// <summary>Why values cannot be entered now, or null when they can.</summary>
    public static string? ValuesRefusal(StoredEvaluation e)
    {
        if (e.TwoStage)
        {
            return e.PricesOpenedAt is null
                ? $"Cannot enter prices: evaluation {e.Reference} is evaluated in two stages and its prices stay sealed until quality moderation is closed and the facilitator opens them."
                : e.Stage == Moderation ? null : $"Cannot enter prices: evaluation {e.Reference} is at stage {e.Stage}; after opening, prices are entered at Moderation.";
        }

        return EnterValues.AllowsAt(e.Stage) ? null : EnterValues.Refusal(e.Reference, e.Stage);
    }

    /// <summary>Why quality (ratings, moderated values, reopened sheets) can no longer change, or null while it can.</summary>
    public static string? QualityClosedRefusal(StoredEvaluation e) => e.QualityClosed
        ? $"Cannot change the quality scores: evaluation {e.Reference} is evaluated in two stages and quality was closed when the prices were opened on {e.PricesOpenedAt:yyyy-MM-dd HH:mm} UTC."
        : null;

    /// <summary>
    /// Ratings are entered at scoring, or at moderation on a sheet the facilitator reopened; a sheet is editable
    /// only while not submitted.
    /// </summary>
    public static readonly StageRule Rate = new("change ratings", Scoring, Moderation);

    // Moderation and sign-off.

    /// <summary>A submitted sheet may be reopened for its assessor while scoring or moderating.</summary>
    public static readonly StageRule ReopenSheet = new("reopen a rating sheet", Scoring, Moderation);

    /// <summary>The panel's moderated value of a cell.</summary>
    public static readonly StageRule Moderate = new("record a moderated value", Moderation);

    /// <summary>Two stages: prices are opened once quality moderation is done, before sign-off is asked for.</summary>
    public static readonly StageRule OpenPrices = new("open the prices", Moderation);

    /// <summary>The record of a price flagged as abnormally low: asked, answered and decided once prices are known.</summary>
    public static readonly StageRule ReviewLowPrice = new("record the review of an abnormally low price", Scoring, Moderation);

    /// <summary>The facilitator asks the approvers once moderation is done.</summary>
    public static readonly StageRule AskSignOff = new("ask for sign-off", Moderation);

    /// <summary>Approvers approve after being asked, during moderation.</summary>
    public static readonly StageRule Approve = new("approve", Moderation);

    // After sign-off.

    /// <summary>The signed record exists only once the evaluation is signed off.</summary>
    public static readonly StageRule DownloadRecord = new("download the signed record", SignedOff);

    /// <summary>Feedback letters explain a decision that has been made.</summary>
    public static readonly StageRule WriteFeedback = new("write feedback letters", SignedOff);

    /// <summary>
    /// Whether results may be shown: from moderation on, or on a superseded revision that had reached moderation;
    /// never while assessors still rate independently.
    /// </summary>
    public static bool ResultsVisible(StoredEvaluation e) =>
        e.Stage is Moderation or SignedOff || (e.Stage == Superseded && e.ModerationStartedAt is not null);

    /// <summary>Whether prices may be shown: always in one stage; in two stages only once opened.</summary>
    public static bool PricesVisible(StoredEvaluation e) => !e.PricesSealed;
}

/// <summary>A move between stages that <see cref="StageRules"/> does not allow from the evaluation's stage.</summary>
public sealed class StageRefusedException(string message) : InvalidOperationException(message);
