using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using Decide.Web.Tests.Exchange;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.Results;

public sealed class ResultsTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task Results_carry_the_ranking_sensitivity_and_agreement_as_json_and_each_view_is_audited()
    {
        var id = await factory.DemoEvaluationAsync();
        using var client = await factory.SignInAsync(DecideWebFactory.Facilitator);
        var response = await client.GetAsync($"/api/evaluations/{id}/results?draws=300&seed=11");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("application/json", response.Content.Headers.ContentType?.MediaType);
        var results = JsonDocument.Parse(await response.Content.ReadAsStringAsync()).RootElement;
        Assert.Equal("decide-results/1", results.GetProperty("format").GetString());
        Assert.NotEmpty(results.GetProperty("ranking").EnumerateArray());
        var sensitivity = results.GetProperty("sensitivity");
        Assert.Equal(JsonValueKind.Object, sensitivity.ValueKind);
        Assert.Equal(300, sensitivity.GetProperty("draws").GetInt32());
        Assert.NotEmpty(sensitivity.GetProperty("acceptability").EnumerateArray());
        Assert.Equal(JsonValueKind.Object, results.GetProperty("agreement").ValueKind);
        Assert.NotEmpty(results.GetProperty("agreement").GetProperty("assessors").EnumerateArray());

        var audit = await EvaluationCopies.AuditAsync(factory, id, DecideWebFactory.Facilitator);
        var viewed = audit.EnumerateArray().Last(e => e.GetProperty("action").GetString() == "results.viewed");
        Assert.Contains("draws 300, seed 11", viewed.GetProperty("newValue").GetString());
    }

    [Fact]
    public async Task The_same_seed_gives_the_same_document_and_assessors_see_results_in_moderation()
    {
        var id = await factory.DemoEvaluationAsync();
        using var assessor = await factory.SignInAsync(DecideWebFactory.Assessor);
        var first = await (await assessor.GetAsync($"/api/evaluations/{id}/results?draws=200&seed=5")).Content.ReadAsStringAsync();
        var second = await (await assessor.GetAsync($"/api/evaluations/{id}/results?draws=200&seed=5")).Content.ReadAsStringAsync();
        Assert.StartsWith("{", first);
        Assert.Equal(first, second);
    }

    [Theory]
    [InlineData("draws=-1")]
    [InlineData("draws=100001")]
    [InlineData("draws=many")]
    [InlineData("seed=-3")]
    public async Task Out_of_range_draws_or_seed_are_a_400_naming_the_parameter(string query)
    {
        var id = await factory.DemoEvaluationAsync();
        using var client = await factory.SignInAsync(DecideWebFactory.Observer);
        var problem = await EvaluationCopies.ProblemAsync(await client.GetAsync($"/api/evaluations/{id}/results?{query}"), HttpStatusCode.BadRequest);
        var parameter = query.Split('=')[0];
        Assert.True(problem.GetProperty("errors").TryGetProperty(parameter, out var reasons), problem.ToString());
        Assert.Contains("whole number", reasons[0].GetString());
    }

    [Fact]
    public async Task Results_are_refused_before_moderation_to_the_facilitator_and_to_assessors()
    {
        var id = await EvaluationCopies.ImportDemoCopyAsync(factory);
        await EvaluationCopies.SetUpAsync(factory, id, 1, [DecideWebFactory.Approver]);
        await EvaluationCopies.OpenScoringAsync(factory, id);
        foreach (var email in new[] { EvaluationCopies.CopyFacilitator, DecideWebFactory.Assessor })
        {
            using var client = await factory.SignInAsync(email);
            var problem = await EvaluationCopies.ProblemAsync(await client.GetAsync($"/api/evaluations/{id}/results?draws=0"), HttpStatusCode.Conflict);
            Assert.Contains("stage Scoring", problem.GetProperty("detail").GetString());
        }
    }

    [Fact]
    public async Task Someone_outside_the_panel_gets_404_for_the_results()
    {
        var id = await factory.DemoEvaluationAsync();
        await EvaluationCopies.EnsureAccountAsync(factory, "outsider@kestrel-vale.example", "Out Sider");
        using var stranger = await factory.SignInAsync("outsider@kestrel-vale.example");
        await EvaluationCopies.ProblemAsync(await stranger.GetAsync($"/api/evaluations/{id}/results"), HttpStatusCode.NotFound);
    }

    [Fact]
    public async Task An_evaluation_that_cannot_be_analysed_gets_the_engines_errors_by_json_path()
    {
        // A bid registered after the plan was locked: every assessor declines it (outside what they were briefed on)
        // and nobody enters its price, so the engine refuses to rank rather than impute.
        var id = await EvaluationCopies.ImportDemoCopyAsync(factory);
        await EvaluationCopies.SetUpAsync(factory, id, 1, [DecideWebFactory.Approver]);
        await EvaluationCopies.SignAndSubmitWeightsAsync(factory, id);
        using var client = await factory.SignInAsync(EvaluationCopies.CopyFacilitator);
        var detail = await client.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}");
        var locked = await client.PostAsJsonAsync($"/api/evaluations/{id}/lock-plan", new { version = detail.GetProperty("summary").GetProperty("version").GetInt64() });
        Assert.Equal(HttpStatusCode.OK, locked.StatusCode);
        detail = await client.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}");
        var alternatives = detail.GetProperty("bids").EnumerateArray()
            .Select(a => new { code = a.GetProperty("code").GetString(), name = a.GetProperty("name").GetString() })
            .Append(new { code = (string?)"latecomer", name = (string?)"Latecomer Displays" }).ToArray();
        var put = await client.PutAsJsonAsync($"/api/evaluations/{id}/bids",
            new { bids = alternatives, version = detail.GetProperty("summary").GetProperty("version").GetInt64() });
        Assert.Equal(HttpStatusCode.OK, put.StatusCode);
        detail = await client.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}");
        var opened = await client.PostAsJsonAsync($"/api/evaluations/{id}/open-scoring", new { version = detail.GetProperty("summary").GetProperty("version").GetInt64() });
        Assert.Equal(HttpStatusCode.OK, opened.StatusCode);
        await EvaluationCopies.DeclineEverywhereAsync(factory, id, "latecomer", "not covered by the briefing; left to the panel");
        await EvaluationCopies.SubmitAllSheetsAsync(factory, id);
        await EvaluationCopies.StartModerationAsync(factory, id);

        var problem = await EvaluationCopies.ProblemAsync(await client.GetAsync($"/api/evaluations/{id}/results?draws=0"), HttpStatusCode.BadRequest);
        var paths = problem.GetProperty("errors").EnumerateObject().Select(p => p.Name).ToArray();
        Assert.Contains("$.ratings.*.latecomer.display", paths);
        Assert.Contains(paths, p => p.StartsWith("$.values", StringComparison.Ordinal) && p.Contains("latecomer"));
    }
}
