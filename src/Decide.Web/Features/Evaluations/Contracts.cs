using System.Text.Json;
using Decide.Data.Entities;

namespace Decide.Web.Features.Evaluations;

/// <summary>Create an evaluation (administrator) and name its facilitator.</summary>
public sealed record CreateEvaluationRequest(string Reference, string Title, string? Organisation, string FacilitatorEmail);

/// <summary>A line of the evaluations list.</summary>
public sealed record EvaluationSummary(
    Guid Id, string Reference, string Title, string? Organisation, EvaluationStage Stage, int Revision,
    IReadOnlyList<PanelRole> MyRoles, long Version, bool PointsAward = false, bool PricesSealed = false, bool Round = false);

/// <summary>One evaluation as the caller may see it.</summary>
public sealed record EvaluationDetail(
    EvaluationSummary Summary,
    EvaluationSettings Settings,
    JsonElement? Plan,
    string? PlanHash,
    IReadOnlyList<PanelSeat> Panel,
    IReadOnlyList<BidView>? Bids,
    StageDates Dates,
    Guid? PreviousRevisionId,
    string? RevisionReason,
    Guid? SupersededById,
    bool LegalHold,
    string? MethodologyHash = null,
    DateTimeOffset? PricesOpenedAt = null);

/// <summary>Plan settings that are not part of the portable file.</summary>
public sealed record EvaluationSettings(int MinRationaleLength, bool PricesVisibleToAssessors, int RequiredApprovals);

/// <summary>When each stage began.</summary>
public sealed record StageDates(
    DateTimeOffset CreatedAt, DateTimeOffset? PlanLockedAt, DateTimeOffset? ScoringOpenedAt,
    DateTimeOffset? ModerationStartedAt, DateTimeOffset? SignedOffAt);

/// <summary>A seat on the panel as shown to others.</summary>
public sealed record PanelSeat(string UserId, string DisplayName, PanelRole Role, string? AssessorCode, double Weight,
    IReadOnlyList<string>? Criteria, bool DeclarationSigned, bool Submitted);

/// <summary>
/// A bid: the bidder's code on this evaluation and the bidder's name (the engine and the file call it an
/// alternative); in a round, also the amount an application requests and its field.
/// </summary>
public sealed record BidView(string Code, string Name, double? Requested = null, string? Topic = null);

/// <summary>Replace the plan (setup only). <paramref name="Plan"/> is a decide-evaluation/1 document without panel, bids or inputs.</summary>
public sealed record UpdatePlanRequest(JsonElement Plan, EvaluationSettings? Settings, long Version);

/// <summary>Replace the panel's assessors, price evaluators, observers and approvers (setup only). Facilitators stay.</summary>
public sealed record UpdatePanelRequest(IReadOnlyList<SeatRequest> Seats, long Version);

/// <summary>One seat: the account by e-mail, the role, and for assessors their code, weight, assigned criteria and (in a round) the fields they know.</summary>
public sealed record SeatRequest(string Email, PanelRole Role, string? AssessorCode, double? Weight, IReadOnlyList<string>? Criteria, IReadOnlyList<string>? Topics = null);

/// <summary>Replace the list of bids (setup or plan locked).</summary>
public sealed record UpdateBidsRequest(IReadOnlyList<BidView> Bids, long Version);

/// <summary>A stage change; <paramref name="Version"/> guards against acting on a stale view.</summary>
public sealed record TransitionRequest(long Version);

/// <summary>Open a new revision with the reason it is needed.</summary>
public sealed record RevisionRequest(string Reason);

/// <summary>Set or lift a legal hold (administrator).</summary>
public sealed record LegalHoldRequest(bool Hold, string Reason);

/// <summary>The outcome of a stage change, with anything the facilitator should know.</summary>
public sealed record TransitionResult(EvaluationSummary Evaluation, IReadOnlyList<string> Warnings);

/// <summary>The facilitator's view for setting up: the seats as they are edited, and whether the plan can be locked now.</summary>
/// <param name="Seats">Every seat but the facilitators', with the account's e-mail address.</param>
/// <param name="Readiness">At setup, what stops the lock and what to know before it; null at every other stage.</param>
public sealed record SetupView(IReadOnlyList<SeatRequest> Seats, LockReadiness? Readiness);

/// <summary>What stops the plan from being locked (<paramref name="Blocking"/>), and what the facilitator should know (<paramref name="Warnings"/>).</summary>
public sealed record LockReadiness(IReadOnlyList<string> Blocking, IReadOnlyList<string> Warnings);

/// <summary>
/// A list of bids or applications uploaded as a spreadsheet (.xlsx) or CSV file, base64-encoded; with
/// <paramref name="Preview"/> it is only read and shown, otherwise it replaces the list (as <see cref="UpdateBidsRequest"/>).
/// </summary>
public sealed record ImportBidsRequest(string FileName, string Content, bool Preview, long Version);

/// <summary>What an uploaded list holds and whether it was stored.</summary>
public sealed record ImportBidsView(IReadOnlyList<BidView> Bids, bool Stored, EvaluationSummary? Evaluation);
