using System.Text.Json;
using Decide.Assignment;
using Decide.Core;
using Decide.Core.Model;
using Decide.Core.Rounds;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Web.Features.Audit;
using Decide.Web.Features.Evaluations;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Rounds;

/// <summary>
/// Who reads which application in a round: Decide proposes an assignment that respects declared conflicts and the
/// load cap, balances loads, prefers reviewers who know the field and spreads reviewer pairs (ADR 24); the
/// facilitator edits it reviewer by reviewer until scoring opens, when it is frozen. Every change is audited. Shared
/// by the API and the screens.
/// </summary>
public sealed class AssignmentService(
    IDbContextFactory<DecideDbContext> factory,
    EvaluationAccess access,
    EvaluationComposer composer,
    CurrentUser user,
    AuditWriter audit,
    TimeProvider clock)
{
    /// <summary>The assignment: all of it for the facilitator, observer and approver; their own list for an assessor.</summary>
    public async Task<AssignmentView> GetAsync(Guid id, CancellationToken ct = default)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        var m = await access.LoadAsync(db, id, ct);
        m.Require(PanelRole.Facilitator, PanelRole.Observer, PanelRole.Approver, PanelRole.Assessor);
        return await ViewAsync(db, m, ct);
    }

    /// <summary>Proposes a new assignment, replacing the one stored (facilitator; until scoring opens).</summary>
    public Task<AssignmentView> ProposeAsync(Guid id, ProposeAssignmentRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator);
            m.RequireStage(StageRules.ChangeAssignment);
            var (design, round, conflicts) = await RoundAsync(db, m.Evaluation, ct);
            var proposal = Propose(design, round, conflicts, request.Seed ?? 1);

            var now = clock.GetUtcNow();
            var old = await db.ReviewAssignments.Where(r => r.EvaluationId == id).ToListAsync(ct);
            var before = old.Count == 0 ? null : $"{old.Count} reviews assigned";
            db.ReviewAssignments.RemoveRange(old);
            foreach (var reviewer in proposal.Design.Assigned)
            {
                foreach (var application in reviewer.Alternatives)
                {
                    db.ReviewAssignments.Add(new ReviewAssignmentEntry
                    {
                        EvaluationId = id, AssessorCode = reviewer.Assessor, AlternativeCode = application,
                        Source = "proposed", AssignedBy = user.Id, AssignedAt = now,
                    });
                }
            }

            audit.Record(db, id, new AuditEvent("assignment.proposed", $"evaluations/{id}/assignment", before,
                $"{proposal.Design.Assigned.Sum(r => r.Alternatives.Count)} reviews: {design.ReviewersPerApplication} per application, loads {proposal.LowestLoad}–{proposal.HighestLoad}, " +
                $"{proposal.TopicMatches} of {proposal.TopicReviews} by a reviewer who knows the field, at most {proposal.MostSharedByOnePair} applications shared by one pair, {proposal.Parts} part(s); seed {request.Seed ?? 1}"));
            await db.SaveChangesAsync(ct);
            return await ViewAsync(db, m, ct);
        }, ct);

    /// <summary>
    /// Sets the applications one reviewer reads (facilitator; until scoring opens). Refused, by position, for an
    /// unknown application, one listed twice or one the reviewer declared a conflict with; the design as a whole is
    /// checked when scoring opens and shown meanwhile.
    /// </summary>
    public Task<AssignmentView> SetAsync(Guid id, string reviewer, ReviewerApplicationsRequest request, CancellationToken ct = default) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            var m = await access.LoadAsync(db, id, ct);
            m.Require(PanelRole.Facilitator);
            m.RequireStage(StageRules.ChangeAssignment);
            var (_, round, conflicts) = await RoundAsync(db, m.Evaluation, ct);
            var panel = round.Assessors.FirstOrDefault(a => a.Id == reviewer) ?? throw DomainProblem.NotFound($"Reviewer \"{reviewer}\"");
            var names = round.Alternatives.ToDictionary(a => a.Id, a => a.Name, StringComparer.Ordinal);
            var wanted = request.Applications ?? [];
            var errors = new Dictionary<string, string[]>();
            var seen = new HashSet<string>(StringComparer.Ordinal);
            for (var i = 0; i < wanted.Count; i++)
            {
                var code = wanted[i]?.Trim() ?? "";
                if (!names.ContainsKey(code))
                {
                    errors[$"applications[{i}]"] = [$"unknown application \"{code}\""];
                }
                else if (!seen.Add(code))
                {
                    errors[$"applications[{i}]"] = [$"\"{names[code]}\" is listed twice"];
                }
                else if (conflicts.Contains((reviewer, code)))
                {
                    errors[$"applications[{i}]"] = [$"{panel.Name} declared a conflict of interest with \"{names[code]}\" and cannot review it"];
                }
            }

            if (errors.Count > 0)
            {
                throw DomainProblem.Invalid(errors);
            }

            var rows = await db.ReviewAssignments.Where(r => r.EvaluationId == id && r.AssessorCode == reviewer).ToListAsync(ct);
            var before = string.Join(", ", rows.Select(r => r.AlternativeCode).Order(StringComparer.Ordinal));
            db.ReviewAssignments.RemoveRange(rows.Where(r => !seen.Contains(r.AlternativeCode)));
            var now = clock.GetUtcNow();
            foreach (var code in seen.Where(c => rows.All(r => r.AlternativeCode != c)))
            {
                db.ReviewAssignments.Add(new ReviewAssignmentEntry
                {
                    EvaluationId = id, AssessorCode = reviewer, AlternativeCode = code, Source = "edited", AssignedBy = user.Id, AssignedAt = now,
                });
            }

            audit.Record(db, id, new AuditEvent("assignment.edited", $"evaluations/{id}/assignment/{reviewer}",
                before.Length == 0 ? "(none)" : before, seen.Count == 0 ? "(none)" : string.Join(", ", seen.Order(StringComparer.Ordinal))));
            await db.SaveChangesAsync(ct);
            return await ViewAsync(db, m, ct);
        }, ct);

    /// <summary>
    /// The problems that stop a round's assignment from being frozen (empty when it can be, or when the evaluation
    /// is not a round): what the engine's design checks say, in sentences.
    /// </summary>
    public async Task<IReadOnlyList<string>> ProblemsAsync(DecideDbContext db, StoredEvaluation e, CancellationToken ct)
    {
        var file = await composer.ComposeAsync(db, e, ct);
        if (file.Evaluation.Reviews is null)
        {
            return [];
        }

        return DesignChecks.Check(file.Evaluation with { Funding = null }, await ConflictsAsync(db, e.Id, ct)).Select(x => Sentence(x.Reason)).ToArray();
    }

    private static AssignmentProposal Propose(ReviewDesign design, Evaluation round, HashSet<(string, string)> conflicts, ulong seed)
    {
        var request = new AssignmentRequest(
            Applications(round),
            Reviewers(round),
            design.ReviewersPerApplication,
            design.MaxLoad,
            conflicts,
            seed);
        try
        {
            return ReviewerAssignment.Propose(request);
        }
        catch (AssignmentInfeasibleException e)
        {
            throw DomainProblem.Invalid(new Dictionary<string, string[]> { ["assignment"] = e.Reasons.ToArray() });
        }
    }

    private async Task<(ReviewDesign Design, Evaluation Round, HashSet<(string, string)> Conflicts)> RoundAsync(DecideDbContext db, StoredEvaluation e, CancellationToken ct)
    {
        var file = await composer.ComposeAsync(db, e, ct);
        if (file.Evaluation.Reviews is not { } design)
        {
            throw DomainProblem.Stage($"Evaluation {e.Reference} is not a round: its plan has every assessor rate every bid. Set reviewers per application in the plan to assign applications.");
        }

        return (design, file.Evaluation, await ConflictsAsync(db, e.Id, ct));
    }

    /// <summary>Declared conflicts as (assessor code, application code).</summary>
    internal static async Task<HashSet<(string, string)>> ConflictsAsync(DecideDbContext db, Guid id, CancellationToken ct)
    {
        var seats = await db.PanelMembers.AsNoTracking().Where(p => p.EvaluationId == id && p.Role == PanelRole.Assessor)
            .Select(p => new { p.UserId, p.AssessorCode }).ToListAsync(ct);
        var codeOf = seats.Where(s => s.AssessorCode is not null).ToDictionary(s => s.UserId, s => s.AssessorCode!);
        var conflicts = await db.Conflicts.AsNoTracking().Where(c => c.EvaluationId == id).Select(c => new { c.UserId, c.AlternativeCode }).ToListAsync(ct);
        return conflicts.Where(c => codeOf.ContainsKey(c.UserId)).Select(c => (codeOf[c.UserId], c.AlternativeCode)).ToHashSet();
    }

    private async Task<AssignmentView> ViewAsync(DecideDbContext db, Membership m, CancellationToken ct)
    {
        var e = m.Evaluation;
        var file = await composer.ComposeAsync(db, e, ct);
        var round = file.Evaluation;
        if (round.Reviews is not { } design)
        {
            throw DomainProblem.Stage($"Evaluation {e.Reference} is not a round: its plan has every assessor rate every bid.");
        }

        var conflicts = await ConflictsAsync(db, e.Id, ct);
        var frozen = !StageRules.ChangeAssignment.AllowsAt(e.Stage);
        var own = m.ReadsEverything ? null : m.Seat?.AssessorCode;
        var reviewers = round.Assessors
            .Where(a => own is null || a.Id == own)
            .Select(a => new ReviewerLoadView(a.Id, a.Name, a.Topics ?? [], design.ApplicationsOf(a.Id),
                conflicts.Where(c => c.Item1 == a.Id).Select(c => c.Item2).ToArray()))
            .ToArray();
        var applications = own is not null
            ? []
            : round.Alternatives.Select(a => new ApplicationReadersView(a.Id, a.Name, a.Topic, a.Requested, design.ReviewersOf(a.Id))).ToArray();
        var problems = own is not null || design.Assigned.Count == 0
            ? (IReadOnlyList<string>)(design.Assigned.Count == 0 && own is null ? ["Nothing is assigned yet: ask Decide for a proposal, then edit it."] : [])
            : DesignChecks.Check(round with { Funding = null }, conflicts).Select(x => Sentence(x.Reason)).ToArray();
        return new AssignmentView(EvaluationStore.Summarise(e, m.Roles), design.ReviewersPerApplication, design.MaxLoad, frozen,
            reviewers, applications, problems, own is null && design.Assigned.Count > 0 ? Figures(round, design) : null);
    }

    private static AssignmentFiguresView Figures(Evaluation round, ReviewDesign design)
    {
        var f = AssignmentFigures.Of(design, Applications(round), Reviewers(round));
        return new AssignmentFiguresView(f.LowestLoad, f.HighestLoad, f.TopicMatches, f.TopicReviews, f.MostSharedByOnePair, f.Parts);
    }

    private static Application[] Applications(Evaluation round) => round.Alternatives.Select(a => new Application(a.Id, a.Name, a.Topic)).ToArray();

    private static Reviewer[] Reviewers(Evaluation round) => round.Assessors.Select(a => new Reviewer(a.Id, a.Name, a.Topics)).ToArray();

    private static string Sentence(string reason) => reason.Length == 0 ? reason : char.ToUpperInvariant(reason[0]) + reason[1..] + (reason.EndsWith('.') ? "" : ".");
}
