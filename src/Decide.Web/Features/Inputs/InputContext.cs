using Decide.Data.Entities;
using Decide.Interchange;
using Decide.Web.Features.Evaluations;
using Decide.Web.Infrastructure;

namespace Decide.Web.Features.Inputs;

/// <summary>
/// An evaluation as an input screen needs it: the caller's membership, their assessor and price-evaluator seats
/// (tracked, so they can be changed), and the plan. Guards the declaration rules.
/// </summary>
public sealed class InputContext(Membership membership, IReadOnlyList<PanelMember> seats)
{
    private EvaluationFile? _plan;

    public Membership Membership { get; } = membership;

    public StoredEvaluation Evaluation => Membership.Evaluation;

    public Guid Id => Evaluation.Id;

    /// <summary>The caller's assessor and price-evaluator seats (a person may hold both).</summary>
    public IReadOnlyList<PanelMember> Seats { get; } = seats;

    public PanelMember? AssessorSeat => Seats.FirstOrDefault(s => s.Role == PanelRole.Assessor);

    public PanelMember? PriceSeat => Seats.FirstOrDefault(s => s.Role == PanelRole.PriceEvaluator);

    /// <summary>The caller's code on the panel (the same on both seats).</summary>
    public string? Code => AssessorSeat?.AssessorCode ?? PriceSeat?.AssessorCode;

    /// <summary>The locked or draft plan, parsed once.</summary>
    public EvaluationFile Plan => _plan ??= EvaluationComposer.ReadPlan(Evaluation);

    public bool DeclarationSigned => Seats.Count > 0 && Seats.All(s => s.DeclarationSignedAt is not null);

    public bool NamesConfirmed => Seats.Count > 0 && Seats.All(s => s.NamesConfirmedAt is not null);

    /// <summary>
    /// Refuses an assessor or price evaluator who has not accepted the declaration. Everyone else passes (their
    /// roles are checked separately).
    /// </summary>
    public void RequireDeclaration()
    {
        if (Seats.Count > 0 && !DeclarationSigned)
        {
            throw DomainProblem.Forbidden(
                $"Sign the declaration first: as {Roles()} in evaluation {Evaluation.Reference} you accept the conflict-of-interest "
                + $"and confidentiality declaration (GET /api/declaration, then POST /api/evaluations/{Id}/declaration) before anything else of it is shown to you.");
        }
    }

    /// <summary>
    /// Refuses an assessor or price evaluator who has not confirmed the declaration against the bidders' names: the
    /// names, bids and their inputs stay hidden until then.
    /// </summary>
    public void RequireNamesConfirmed()
    {
        RequireDeclaration();
        if (Seats.Count > 0 && !NamesConfirmed)
        {
            throw DomainProblem.Forbidden(
                "The bidders' names and the rating sheet stay hidden until you confirm your declaration against the bidders' names "
                + $"and declare any conflict of interest (GET /api/evaluations/{Id}/declaration, then POST /api/evaluations/{Id}/declaration/names).");
        }
    }

    /// <summary>The caller's assessor seat, or 403.</summary>
    public PanelMember RequireAssessor()
    {
        Membership.Require(PanelRole.Assessor);
        return AssessorSeat!;
    }

    private string Roles() => string.Join(" and ", Seats.Select(s => s.Role == PanelRole.Assessor ? "an assessor" : "a price evaluator").Distinct());
}
