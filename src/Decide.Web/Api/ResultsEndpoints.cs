using Decide.Web.Features.Results;
using Microsoft.AspNetCore.Http.HttpResults;

namespace Decide.Web.Api;

/// <summary>The evaluation's results with robustness.</summary>
public static class ResultsEndpoints
{
    public static RouteGroupBuilder MapResultsEndpoints(this RouteGroupBuilder api)
    {
        var group = api.MapGroup("/evaluations/{id:guid}").WithTags("Results").RequireAuthorization();
        group.MapGet("/results", Results)
            .Produces(StatusCodes.Status200OK, contentType: "application/json")
            .WithSummary("The results document (decide-results/1) with sensitivity, agreement and summary; ?draws=0..100000&seed=S (panel, from moderation on).");
        return api;
    }

    private static async Task<ContentHttpResult> Results(Guid id, string? draws, string? seed, ResultsService service, CancellationToken ct)
    {
        var options = RobustnessQuery.Parse(draws, seed);
        var results = await service.GetAsync(id, options, ct);
        return TypedResults.Text(results.Json, "application/json", System.Text.Encoding.UTF8);
    }
}
