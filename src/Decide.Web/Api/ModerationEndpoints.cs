using Decide.Web.Features.Moderation;
using Microsoft.AspNetCore.Http.HttpResults;

namespace Decide.Web.Api;

/// <summary>The panel's progress, the moderation board, moderated values and reopened sheets.</summary>
public static class ModerationEndpoints
{
    public static RouteGroupBuilder MapModerationEndpoints(this RouteGroupBuilder api)
    {
        var group = api.MapGroup("/evaluations/{id:guid}").WithTags("Moderation").RequireAuthorization();
        group.MapGet("/progress", Progress)
            .WithSummary("The scoring board: declarations, weights, consistency, ratings done and submissions per seat; never the ratings (facilitator, observer).");
        group.MapGet("/moderation", Board)
            .WithSummary("Every cell with the assessors' ratings side by side, its spread and moderated values; flagged cells first (panel, from moderation on).");
        group.MapPut("/moderation/{bid}/{criterion}", Moderate)
            .WithSummary("Record the value the panel agreed for a cell, with the reason (a minute a bidder may read); the original ratings stay (facilitator, moderation).");
        group.MapPost("/sheets/{assessorCode}/reopen", Reopen)
            .WithSummary("Reopen an assessor's submitted rating sheet, with the reason (facilitator, scoring or moderation).");
        return api;
    }

    private static async Task<Ok<ScoringBoard>> Progress(Guid id, ScoringBoardService service, CancellationToken ct) =>
        TypedResults.Ok(await service.GetAsync(id, ct));

    private static async Task<Ok<ModerationBoard>> Board(Guid id, ModerationService service, CancellationToken ct) =>
        TypedResults.Ok(await service.GetAsync(id, ct));

    private static async Task<Ok<ModeratedValue>> Moderate(
        Guid id, string bid, string criterion, ModerateRequest request, ModerationService service, CancellationToken ct) =>
        TypedResults.Ok(await service.ModerateAsync(id, bid, criterion, request, ct));

    private static async Task<Ok<SheetState>> Reopen(Guid id, string assessorCode, ReopenSheetRequest request, ModerationService service, CancellationToken ct) =>
        TypedResults.Ok(await service.ReopenSheetAsync(id, assessorCode, request, ct));
}
