using Decide.Web.Features.Award;
using Microsoft.AspNetCore.Http.HttpResults;

namespace Decide.Web.Api;

/// <summary>The published points award: the table a bidder can recompute and the reviews of abnormally low prices.</summary>
public static class AwardEndpoints
{
    public static RouteGroupBuilder MapAwardEndpoints(this RouteGroupBuilder api)
    {
        var group = api.MapGroup("/evaluations/{id:guid}").WithTags("Award").RequireAuthorization();
        group.MapGet("/award", Get)
            .WithSummary("The points award: per bid and criterion the panel's score and points, price points, total and rank; the quality stage alone while prices are sealed (panel, from moderation on).");
        group.MapPut("/low-price-reviews/{bid}", Review)
            .WithSummary("Record the review of a price flagged as abnormally low: asked, answer, decision with reasons (facilitator).");
        return api;
    }

    private static async Task<Ok<AwardView>> Get(Guid id, AwardService service, CancellationToken ct) =>
        TypedResults.Ok(await service.GetAsync(id, ct));

    private static async Task<Ok<AwardView>> Review(Guid id, string bid, LowPriceReviewRequest request, AwardService service, CancellationToken ct) =>
        TypedResults.Ok(await service.ReviewAsync(id, bid, request, ct));
}
