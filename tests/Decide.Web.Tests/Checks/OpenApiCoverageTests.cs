using System.Net.Http.Json;
using System.Text.Json;
using System.Text.RegularExpressions;
using Decide.Web.Tests.Support;
using Microsoft.AspNetCore.Http;
using Microsoft.AspNetCore.Routing;
using Microsoft.Extensions.DependencyInjection;

namespace Decide.Web.Tests.Checks;

/// <summary>The OpenAPI document is served without sign-in and describes every mapped /api endpoint with a summary.</summary>
public sealed partial class OpenApiCoverageTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task Every_mapped_api_endpoint_is_in_the_openapi_document_with_a_summary()
    {
        using var anonymous = factory.CreateClient();
        var paths = (await anonymous.GetFromJsonAsync<JsonElement>("/openapi/v1.json")).GetProperty("paths");

        var endpoints = factory.Services.GetRequiredService<EndpointDataSource>().Endpoints.OfType<RouteEndpoint>()
            .Where(e => e.RoutePattern.RawText?.StartsWith("/api", StringComparison.Ordinal) == true)
            .SelectMany(e => (e.Metadata.GetMetadata<HttpMethodMetadata>()?.HttpMethods ?? []).Select(m => (Method: m.ToLowerInvariant(), Path: Described(e.RoutePattern.RawText!))))
            .Distinct().ToArray();

        Assert.NotEmpty(endpoints);
        var missing = endpoints.Where(e => !paths.TryGetProperty(e.Path, out var item) || !item.TryGetProperty(e.Method, out var operation)
            || string.IsNullOrWhiteSpace(operation.TryGetProperty("summary", out var summary) ? summary.GetString() : null)).ToArray();
        Assert.True(missing.Length == 0, "Not described (or without a summary): " + string.Join(", ", missing.Select(m => $"{m.Method} {m.Path}")));
    }

    /// <summary>The route as OpenAPI writes it: constraints dropped ("{id:guid}" → "{id}"), no trailing slash.</summary>
    private static string Described(string route)
    {
        var path = Constraint().Replace(route, "{$1}");
        return path.Length > 1 ? path.TrimEnd('/') : path;
    }

    [GeneratedRegex(@"\{([A-Za-z]+):[^}]+\}")]
    private static partial Regex Constraint();
}
