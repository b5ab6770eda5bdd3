using System.Net;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;
using Decide.Data;
using Decide.Web.Tests.Exchange;
using Decide.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;

namespace Decide.Web.Tests.Results;

public sealed class AnalysisTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task Any_signed_in_user_gets_results_with_robustness_and_nothing_is_stored()
    {
        var file = (await EvaluationCopies.ExportDemoAsync(factory)).ToJsonString();
        using var client = await factory.SignInAsync(DecideWebFactory.Assessor);
        var before = await CountRowsAsync();

        var response = await client.PostAsync("/api/analyses?draws=200&seed=3", Json(file));
        var body = await response.Content.ReadAsStringAsync();
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("application/json", response.Content.Headers.ContentType?.MediaType);
        var results = JsonDocument.Parse(body).RootElement;
        Assert.NotEmpty(results.GetProperty("ranking").EnumerateArray());
        Assert.Equal(200, results.GetProperty("sensitivity").GetProperty("draws").GetInt32());
        Assert.Equal(JsonValueKind.Object, results.GetProperty("agreement").ValueKind);

        Assert.Equal(before, await CountRowsAsync());
    }

    [Fact]
    public async Task The_stateless_analysis_agrees_with_the_stored_evaluations_results()
    {
        var id = await factory.DemoEvaluationAsync();
        var file = (await EvaluationCopies.ExportDemoAsync(factory)).ToJsonString();
        using var client = await factory.SignInAsync(DecideWebFactory.Facilitator);
        var stateless = await (await client.PostAsync("/api/analyses?draws=100&seed=9", Json(file))).Content.ReadAsStringAsync();
        var stored = await (await client.GetAsync($"/api/evaluations/{id}/results?draws=100&seed=9")).Content.ReadAsStringAsync();
        Assert.Equal(stored, stateless);
    }

    [Fact]
    public async Task A_file_with_an_unknown_term_is_a_400_naming_the_path_and_nothing_is_stored()
    {
        var file = await EvaluationCopies.ExportDemoAsync(factory);
        file["ratings"]!["abernathy"]!["tessaline"]!["power"]!["term"] = "EXCELLENT";
        using var client = await factory.SignInAsync(DecideWebFactory.Observer);
        var before = await CountRowsAsync();

        var problem = await EvaluationCopies.ProblemAsync(await client.PostAsync("/api/analyses", Json(file.ToJsonString())), HttpStatusCode.BadRequest);
        var errors = problem.GetProperty("errors");
        var (path, reasons) = errors.EnumerateObject().Select(p => (p.Name, p.Value)).Single();
        Assert.Equal("$.ratings.abernathy.tessaline.power", path);
        Assert.Contains("EXCELLENT", reasons[0].GetString());
        Assert.Equal(before, await CountRowsAsync());
    }

    [Fact]
    public async Task Malformed_json_is_a_400_at_the_root_path_with_line_and_column()
    {
        using var client = await factory.SignInAsync(DecideWebFactory.Observer);
        var problem = await EvaluationCopies.ProblemAsync(
            await client.PostAsync("/api/analyses", Json("{\"format\": \"decide-evaluation/1\",\n \"title\": ")), HttpStatusCode.BadRequest);
        var reason = problem.GetProperty("errors").GetProperty("$")[0].GetString();
        Assert.Contains("not valid JSON at line 2", reason);
    }

    [Fact]
    public async Task An_empty_body_and_anonymous_callers_are_refused()
    {
        using var client = await factory.SignInAsync(DecideWebFactory.Observer);
        var empty = await EvaluationCopies.ProblemAsync(await client.PostAsync("/api/analyses", Json("")), HttpStatusCode.BadRequest);
        Assert.Contains("request body", empty.GetProperty("detail").GetString());

        using var anonymous = factory.CreateClient();
        Assert.Equal(HttpStatusCode.Unauthorized, (await anonymous.PostAsync("/api/analyses", Json("{}"))).StatusCode);
    }

    private static StringContent Json(string text) => new(text, Encoding.UTF8, "application/json");

    /// <summary>Rows in every table the service writes to.</summary>
    private async Task<string> CountRowsAsync()
    {
        var contexts = factory.Services.GetRequiredService<IDbContextFactory<DecideDbContext>>();
        await using var db = await contexts.CreateDbContextAsync();
        var counts = new[]
        {
            await db.Evaluations.CountAsync(), await db.PanelMembers.CountAsync(), await db.Alternatives.CountAsync(),
            await db.Conflicts.CountAsync(), await db.WeightJudgements.CountAsync(), await db.Ratings.CountAsync(),
            await db.NumericValues.CountAsync(), await db.GateResults.CountAsync(), await db.Moderation.CountAsync(),
            await db.Approvals.CountAsync(), await db.Audit.CountAsync(), await db.Users.CountAsync(),
        };
        return string.Join(",", counts);
    }
}
