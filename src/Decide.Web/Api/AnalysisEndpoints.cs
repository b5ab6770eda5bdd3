using Decide.Web.Features.Results;
using Microsoft.AspNetCore.Http.HttpResults;

namespace Decide.Web.Api;

/// <summary>Stateless analysis of a portable evaluation file.</summary>
public static class AnalysisEndpoints
{
    public static RouteGroupBuilder MapAnalysisEndpoints(this RouteGroupBuilder api)
    {
        api.MapPost("/analyses", Analyse).WithTags("Analysis").RequireAuthorization()
            .Accepts<object>("application/json")
            .Produces(StatusCodes.Status200OK, contentType: "application/json")
            .WithSummary("Analyse the decide-evaluation/1 file in the body and return its results with robustness; ?draws=0..100000&seed=S. Nothing is stored.");
        return api;
    }

    private static async Task<ContentHttpResult> Analyse(HttpRequest request, string? draws, string? seed, AnalysisService service, CancellationToken ct)
    {
        var options = RobustnessQuery.Parse(draws, seed);
        var results = await service.AnalyseAsync(request.Body, options, ct);
        return TypedResults.Text(results.Json, "application/json", System.Text.Encoding.UTF8);
    }
}
