using Decide.Data;
using Decide.Data.Entities;
using Decide.Web.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Evaluations;

/// <summary>An evaluation as seen by the current user: their roles in it.</summary>
public sealed record Membership(StoredEvaluation Evaluation, IReadOnlySet<PanelRole> Roles, bool IsAdministrator, PanelMember? Seat)
{
    public bool Has(PanelRole role) => Roles.Contains(role);

    /// <summary>True for roles that may read the whole file (facilitator, observer, approver).</summary>
    public bool ReadsEverything => Has(PanelRole.Facilitator) || Has(PanelRole.Observer) || Has(PanelRole.Approver);

    /// <summary>Refuses unless the user holds one of <paramref name="roles"/>.</summary>
    public void Require(params PanelRole[] roles)
    {
        if (!roles.Any(Roles.Contains))
        {
            throw DomainProblem.Forbidden($"This needs the role {string.Join(" or ", roles.Select(r => r.ToString().ToLowerInvariant()))} in evaluation {Evaluation.Reference}.");
        }
    }

    /// <summary>Refuses unless <paramref name="rule"/> allows its action at the evaluation's stage (<see cref="StageRules"/>).</summary>
    public void RequireStage(StageRule rule)
    {
        if (!rule.AllowsAt(Evaluation.Stage))
        {
            throw DomainProblem.Stage(rule.Refusal(Evaluation.Reference, Evaluation.Stage));
        }
    }

    /// <summary>Refuses once a two-stage evaluation's prices are open: quality (ratings, moderated values, reopened sheets) is then final.</summary>
    public void RequireQualityOpen()
    {
        if (StageRules.QualityClosedRefusal(Evaluation) is { } refusal)
        {
            throw DomainProblem.Stage(refusal);
        }
    }
}

/// <summary>Loads an evaluation with the current user's roles, hiding it from anyone who has none.</summary>
public sealed class EvaluationAccess(CurrentUser user)
{
    /// <summary>
    /// The evaluation and the user's roles. Administrators see every evaluation (to manage it) but hold no panel
    /// role unless given one. A user with no role gets 404, so that evaluations do not leak by id.
    /// </summary>
    public async Task<Membership> LoadAsync(DecideDbContext db, Guid id, CancellationToken ct = default)
    {
        var userId = user.Id;
        // Two queries rather than a join: a join repeats the evaluation's row, plan included, once per panel seat.
        var evaluation = await db.Evaluations.Include(e => e.Panel).AsSplitQuery().FirstOrDefaultAsync(e => e.Id == id, ct)
            ?? throw DomainProblem.NotFound($"Evaluation {id}");
        var seats = evaluation.Panel.Where(p => p.UserId == userId).ToArray();
        if (seats.Length == 0 && !user.IsAdministrator)
        {
            throw DomainProblem.NotFound($"Evaluation {id}");
        }

        return new Membership(evaluation, seats.Select(s => s.Role).ToHashSet(), user.IsAdministrator,
            seats.FirstOrDefault(s => s.Role == PanelRole.Assessor) ?? seats.FirstOrDefault(s => s.Role == PanelRole.PriceEvaluator));
    }
}
