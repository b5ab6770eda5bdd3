using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using System.Text.Json.Nodes;
using Decide.Web.Tests.Exchange;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.Moderation;

public sealed class ScoringBoardTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task The_board_counts_each_assessors_cells_against_the_scored_bidders_and_assigned_criteria()
    {
        var id = await factory.DemoEvaluationAsync();
        var file = await EvaluationCopies.ExportDemoAsync(factory);
        using var client = await factory.SignInAsync(DecideWebFactory.Facilitator);
        var response = await client.GetAsync($"/api/evaluations/{id}/progress");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var text = await response.Content.ReadAsStringAsync();
        var board = JsonDocument.Parse(text).RootElement;

        var failed = file["gates"]!.AsObject()
            .Where(b => b.Value!.AsObject().Any(g => g.Value is JsonObject o ? !(bool)o["passed"]! : !(bool)g.Value!))
            .Select(b => b.Key).ToHashSet();
        var scored = file["alternatives"]!.AsArray().Select(a => (string)a!["id"]!).Where(a => !failed.Contains(a)).ToArray();
        var linguistic = file["criteria"]!.AsArray().Where(c => (string?)c!["kind"] == "linguistic").Select(c => (string)c!["id"]!).ToArray();
        var numeric = file["criteria"]!.AsArray().Count(c => (string?)c!["kind"] == "numeric");
        Assert.Equal(scored.Length, board.GetProperty("scoredBidders").GetInt32());

        var assessors = board.GetProperty("assessors").EnumerateArray().ToDictionary(a => a.GetProperty("assessorCode").GetString()!);
        foreach (var assessor in file["assessors"]!.AsArray())
        {
            var code = (string)assessor!["id"]!;
            var assigned = assessor["criteria"] is JsonArray list ? list.Count : linguistic.Length;
            var line = assessors[code];
            Assert.Equal(scored.Length * assigned, line.GetProperty("ratingsTotal").GetInt32());
            var given = file["ratings"]![code]!.AsObject().Where(b => scored.Contains(b.Key)).Sum(b => b.Value!.AsObject().Count);
            Assert.Equal(given, line.GetProperty("ratingsDone").GetInt32());
            Assert.Equal("2026-1", line.GetProperty("declarationVersion").GetString());
            Assert.Equal(JsonValueKind.String, line.GetProperty("submittedAt").ValueKind);
            Assert.Equal(JsonValueKind.Null, line.GetProperty("consistency").ValueKind); // importance weighting
        }

        var price = board.GetProperty("priceEvaluators").EnumerateArray().Single();
        Assert.Equal("kilbane", price.GetProperty("assessorCode").GetString());
        Assert.Equal(scored.Length * numeric, price.GetProperty("valuesTotal").GetInt32());
        Assert.Equal(scored.Length * numeric, price.GetProperty("valuesEntered").GetInt32());

        // Counts only: no term and no rationale of anyone's rating appears on the board.
        var rationale = (string)file["ratings"]!["ravelle"]!["orrinford"]!["display"]!["rationale"]!;
        Assert.DoesNotContain(rationale, text);
        Assert.DoesNotContain("\"term\"", text);
    }

    [Fact]
    public async Task Pairwise_weighting_shows_each_assessors_consistency_ratio_as_the_engine_computes_it()
    {
        var file = JsonNode.Parse(await File.ReadAllTextAsync(SamplePath("bus-stop-displays-pairwise.json")))!.AsObject();
        var id = await EvaluationCopies.ImportAsync(factory, file);
        using var client = await factory.SignInAsync(EvaluationCopies.CopyFacilitator);
        var board = await client.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}/progress");
        var results = JsonDocument.Parse(await (await client.PostAsync("/api/analyses?draws=0",
            new StringContent(file.ToJsonString(), System.Text.Encoding.UTF8, "application/json"))).Content.ReadAsStringAsync()).RootElement;

        var engine = results.GetProperty("consistency").EnumerateArray()
            .Where(c => c.GetProperty("assessor").GetString() != "panel" && c.GetProperty("n").GetInt32() > 1)
            .ToDictionary(c => (c.GetProperty("assessor").GetString(), c.TryGetProperty("group", out var g) ? g.GetString() : null));
        Assert.NotEmpty(engine);
        var shown = 0;
        foreach (var assessor in board.GetProperty("assessors").EnumerateArray())
        {
            var code = assessor.GetProperty("assessorCode").GetString();
            foreach (var matrix in assessor.GetProperty("consistency").EnumerateArray())
            {
                var key = (code, matrix.GetProperty("group").GetString());
                if (!engine.TryGetValue(key, out var expected))
                {
                    continue;
                }

                shown++;
                Assert.Equal(matrix.GetProperty("needed").GetInt32(), matrix.GetProperty("judgements").GetInt32());
                Assert.Equal(expected.GetProperty("cr").GetDouble(), matrix.GetProperty("ratio").GetDouble(), 12);
                Assert.Equal(!expected.GetProperty("acceptable").GetBoolean(), matrix.GetProperty("flagged").GetBoolean());
            }

            Assert.Equal(assessor.GetProperty("consistency").EnumerateArray().Any(m => m.GetProperty("flagged").GetBoolean()),
                assessor.GetProperty("inconsistentMatrices").GetBoolean());
        }

        Assert.Equal(engine.Count, shown);
    }

    [Fact]
    public async Task Assessors_and_approvers_may_not_see_the_scoring_board()
    {
        var id = await factory.DemoEvaluationAsync();
        foreach (var email in new[] { DecideWebFactory.Assessor, DecideWebFactory.Approver })
        {
            using var client = await factory.SignInAsync(email);
            var problem = await EvaluationCopies.ProblemAsync(await client.GetAsync($"/api/evaluations/{id}/progress"), HttpStatusCode.Forbidden);
            Assert.Contains("facilitator or observer", problem.GetProperty("detail").GetString());
        }
    }

    private static string SamplePath(string name)
    {
        for (var folder = new DirectoryInfo(AppContext.BaseDirectory); folder is not null; folder = folder.Parent)
        {
            var candidate = Path.Combine(folder.FullName, "samples", name);
            if (File.Exists(candidate))
            {
                return candidate;
            }
        }

        throw new FileNotFoundException($"samples/{name} not found above {AppContext.BaseDirectory}");
    }
}
