using System.Net;
using System.Net.Http.Headers;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;
using Decide.Data;
using Decide.Fuzzing;
using Decide.Web.Features.Accounts;
using Decide.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;

namespace Decide.Web.Tests.Checks;

/// <summary>
/// Fuzzing the stateless analysis and the import with hostile bodies (valid evaluation files mutated, random bytes,
/// wrong content types): every answer is a success or a 4xx problem document with a detail or errors, never a 5xx;
/// a refused import stores nothing, an accepted one stores exactly one evaluation that exports again. The hand-picked
/// cases are in <see cref="HostileInputTests"/>; cases and seed: DEVELOPERS.md.
/// </summary>
public sealed class FuzzedInputTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    /// <summary>Query strings for the analysis: mostly quick valid ones, some the endpoint must refuse.</summary>
    private static readonly string[] AnalysisQueries =
        ["?draws=0", "?draws=3&seed=11", "?draws=0", "?draws=-1", "?draws=abc", "?draws=100001", "?draws=0&seed=18446744073709551616", "?draws=1e3"];

    /// <summary>Demo assessors' accounts, for files whose assessor codes have no account of the same name.</summary>
    private static readonly string[] DemoAssessors = ["ravelle", "fenwright", "abernathy", "ellingsby", "kilbane"];

    /// <summary>Each seed document inside the import request that would store it: the file, the facilitator, an account per assessor.</summary>
    private static readonly IReadOnlyList<byte[]> ImportRequests = [.. SeedDocuments.All.Select(ImportRequest)];

    private HttpClient? _admin;
    private HttpClient? _facilitator;
    private HttpClient? _assessor;

    [HostileProperty(ciCases: 150)]
    public async Task The_analysis_answers_a_hostile_body_with_results_or_a_problem_never_a_5xx(HostileCase hostile)
    {
        var body = hostile.Render(SeedDocuments.All);
        _assessor ??= await factory.SignInAsync(DecideWebFactory.Assessor);
        var query = AnalysisQueries[hostile.Document / SeedDocuments.All.Count % AnalysisQueries.Length];

        using var response = await _assessor.PostAsync("/api/analyses" + query, Content(body));

        var text = await AssertAnswerAsync(response, body, "POST /api/analyses" + query);
        if (response.IsSuccessStatusCode)
        {
            using var results = JsonDocument.Parse(text);
            Assert.Equal("decide-results/1", results.RootElement.GetProperty("format").GetString());
        }
    }

    [HostileProperty(ciCases: 150)]
    public async Task The_import_answers_a_hostile_body_with_an_evaluation_or_a_problem_and_stores_nothing_when_it_refuses(HostileCase hostile)
    {
        var body = hostile.Render(ImportRequests);
        _admin ??= await factory.SignInAsync(DecideWebFactory.Admin);
        var before = await CountEvaluationsAsync();

        using var response = await _admin.PostAsync("/api/evaluations/import", Content(body));

        var text = await AssertAnswerAsync(response, body, "POST /api/evaluations/import");
        var after = await CountEvaluationsAsync();
        if (!response.IsSuccessStatusCode)
        {
            Assert.True(before == after, $"a refused import changed the number of evaluations from {before} to {after}: {body}");
            return;
        }

        Assert.Equal(HttpStatusCode.Created, response.StatusCode);
        Assert.True(after == before + 1, $"an accepted import changed the number of evaluations from {before} to {after}: {body}");
        var id = JsonDocument.Parse(text).RootElement.GetProperty("id").GetGuid();
        _facilitator ??= await factory.SignInAsync(DecideWebFactory.Facilitator);
        using var export = await _facilitator.GetAsync($"/api/evaluations/{id}/export");
        Assert.True(export.StatusCode == HttpStatusCode.OK, $"the imported evaluation does not export ({(int)export.StatusCode}): {body}");
    }

    /// <summary>
    /// Asserts that the answer is a success or a 4xx problem document about the body (not about access) with a
    /// detail or errors; returns the body text.
    /// </summary>
    private static async Task<string> AssertAnswerAsync(HttpResponseMessage response, HostileBody body, string what)
    {
        var status = (int)response.StatusCode;
        var text = await response.Content.ReadAsStringAsync();
        var context = $"{what} answered {status} to {body}\nanswer: {Shorten(text)}\nbody: {body.Excerpt()}";
        Assert.True(status < 500, context);
        if (response.IsSuccessStatusCode)
        {
            return text;
        }

        Assert.True(status is >= 400 and < 500 and not 401 and not 403 and not 404, context);
        Assert.True(response.Content.Headers.ContentType?.MediaType == "application/problem+json", context);
        using var problem = JsonDocument.Parse(text);
        var root = problem.RootElement;
        var hasDetail = root.TryGetProperty("detail", out var detail) && !string.IsNullOrWhiteSpace(detail.GetString());
        var hasErrors = root.TryGetProperty("errors", out var errors) && errors.EnumerateObject().Any();
        Assert.True(hasDetail || hasErrors, context);
        return text;
    }

    private async Task<int> CountEvaluationsAsync()
    {
        await using var db = await factory.Services.GetRequiredService<IDbContextFactory<DecideDbContext>>().CreateDbContextAsync();
        return await db.Evaluations.CountAsync();
    }

    private static ByteArrayContent Content(HostileBody body)
    {
        var content = new ByteArrayContent(body.Bytes);
        content.Headers.ContentType = body.ContentType.Length == 0 ? null : MediaTypeHeaderValue.Parse(body.ContentType);
        return content;
    }

    private static byte[] ImportRequest(byte[] document)
    {
        var file = JsonNode.Parse(document)!;
        var codes = file["assessors"]!.AsArray().Select(a => (string)a!["id"]!).ToArray();
        var accounts = new JsonObject();
        for (var i = 0; i < codes.Length; i++)
        {
            var account = DemoAssessors.Contains(codes[i]) ? codes[i] : DemoAssessors[i % DemoAssessors.Length];
            accounts[codes[i]] = $"{account}@{DemoSeeder.Domain}";
        }

        var request = new JsonObject { ["file"] = file, ["facilitatorEmail"] = DecideWebFactory.Facilitator, ["accounts"] = accounts };
        return Encoding.UTF8.GetBytes(request.ToJsonString());
    }

    private static string Shorten(string text) => Mutator.Escape(text.Length <= 600 ? text : text[..600] + "…");
}
