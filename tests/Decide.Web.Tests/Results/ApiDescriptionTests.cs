using System.Net.Http.Json;
using System.Text.Json;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.Results;

public sealed class ApiDescriptionTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task The_openapi_document_describes_the_panels_endpoints_with_summaries()
    {
        using var client = factory.CreateClient();
        var document = await client.GetFromJsonAsync<JsonElement>("/openapi/v1.json");
        var paths = document.GetProperty("paths");
        var expected = new (string Path, string Method)[]
        {
            ("/api/evaluations/{id}/progress", "get"),
            ("/api/evaluations/{id}/moderation", "get"),
            ("/api/evaluations/{id}/moderation/{bid}/{criterion}", "put"),
            ("/api/evaluations/{id}/sheets/{assessorCode}/reopen", "post"),
            ("/api/evaluations/{id}/results", "get"),
            ("/api/evaluations/{id}/export", "get"),
            ("/api/evaluations/{id}/export/ratings.csv", "get"),
            ("/api/evaluations/{id}/export/results.csv", "get"),
            ("/api/evaluations/import", "post"),
            ("/api/analyses", "post"),
            ("/api/evaluations/{id}/approvals", "post"),
        };
        foreach (var (path, method) in expected)
        {
            Assert.True(paths.TryGetProperty(path, out var item), $"{path} is not described");
            Assert.False(string.IsNullOrWhiteSpace(item.GetProperty(method).GetProperty("summary").GetString()), $"{method} {path} has no summary");
        }
    }
}
