using Decide.Web.Features.Rounds;
using Microsoft.AspNetCore.Http.HttpResults;

namespace Decide.Web.Api;

/// <summary>Rounds: who reviews which application, proposed by Decide and edited by the facilitator until scoring opens.</summary>
public static class RoundEndpoints
{
    public static RouteGroupBuilder MapRoundEndpoints(this RouteGroupBuilder api)
    {
        var group = api.MapGroup("/evaluations/{id:guid}/assignment").WithTags("Rounds").RequireAuthorization();
        group.MapGet("", Get)
            .WithSummary("Who reads which application, with loads, field matches, pairs and what stops it from being frozen (panel; an assessor sees their own list).");
        group.MapPost("/propose", Propose)
            .WithSummary("Propose an assignment that respects declared conflicts and the load cap, balances loads and spreads reviewer pairs; replaces the one stored (facilitator, until scoring opens).");
        group.MapPut("/{reviewer}", Set)
            .WithSummary("Set the applications one reviewer reads (facilitator, until scoring opens).");
        return api;
    }

    private static async Task<Ok<AssignmentView>> Get(Guid id, AssignmentService service, CancellationToken ct) =>
        TypedResults.Ok(await service.GetAsync(id, ct));

    private static async Task<Ok<AssignmentView>> Propose(Guid id, ProposeAssignmentRequest? request, AssignmentService service, CancellationToken ct) =>
        TypedResults.Ok(await service.ProposeAsync(id, request ?? new ProposeAssignmentRequest(null), ct));

    private static async Task<Ok<AssignmentView>> Set(Guid id, string reviewer, ReviewerApplicationsRequest request, AssignmentService service, CancellationToken ct) =>
        TypedResults.Ok(await service.SetAsync(id, reviewer, request, ct));
}
