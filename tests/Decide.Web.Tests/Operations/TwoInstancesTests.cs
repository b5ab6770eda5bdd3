using System.Collections.Concurrent;
using System.Net;
using System.Net.Http.Headers;
using System.Net.Http.Json;
using System.Text.Json;
using Decide.Data.Entities;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.Operations;

/// <summary>
/// Two instances of the service on loopback ports sharing one PostgreSQL database, as behind the proxy in
/// deploy/compose.yaml: what one issues the other honours, what one stores the other reads, and concurrent saves
/// through both are neither lost nor duplicated.
/// </summary>
public sealed class TwoInstancesTests : IDisposable
{
    private readonly string _database = "decide_two_" + Guid.NewGuid().ToString("N");
    private readonly DecideWebFactory? _first;
    private readonly DecideWebFactory? _second;

    public TwoInstancesTests()
    {
        if (DecideWebFactory.PostgresServer is null)
        {
            return;
        }

        _first = DecideWebFactory.SharingDatabase(_database, first: true);
        _second = DecideWebFactory.SharingDatabase(_database, first: false);
    }

    [PostgresFact]
    public async Task A_sign_in_and_a_rating_made_through_one_instance_are_honoured_and_read_through_the_other()
    {
        var scenario = await new ScenarioBuilder(_first!).BuildAsync(EvaluationStage.Scoring);
        await scenario.ConfirmNamesAsync(scenario.Ashby);
        var (alternative, criterion) = (ScenarioPlan.Bidders[0].Code, ScenarioPlan.Quality);

        // The bearer token issued by the first instance, presented to the second.
        using var onSecond = _second!.CreateClient();
        onSecond.DefaultRequestHeaders.Authorization = scenario.Ashby.DefaultRequestHeaders.Authorization;
        var me = await ApiAssert.OkAsync(await onSecond.GetAsync("/api/accounts/me"));
        Assert.Equal(scenario.Emails[ScenarioBuilder.Ashby], me.GetProperty("email").GetString());

        const string rationale = "Method statement section 3 sets out a daily quality check with photographs.";
        await ApiAssert.OkAsync(await scenario.Ashby.PutJsonAsync(scenario.Url($"/my/ratings/{alternative}/{criterion}"),
            new { term = await FirstTermAsync(scenario.Ashby, scenario), rationale }));
        var sheet = await ApiAssert.OkAsync(await onSecond.GetAsync(scenario.Url("/my/sheet")));
        var cell = sheet.GetProperty("cells").EnumerateArray()
            .Single(c => c.GetProperty("alternative").GetString() == alternative && c.GetProperty("criterion").GetString() == criterion);
        Assert.Equal(rationale, cell.GetProperty("rationale").GetString());
    }

    [PostgresFact]
    public async Task Fifty_assessors_saving_at_once_through_both_instances_lose_and_duplicate_nothing()
    {
        var scenario = await new ScenarioBuilder(_first!).BuildAsync(EvaluationStage.Scoring);
        await scenario.ConfirmNamesAsync(scenario.Ashby);
        await scenario.ConfirmNamesAsync(scenario.Brook);
        var token = new Dictionary<string, AuthenticationHeaderValue>
        {
            [ScenarioBuilder.Ashby] = scenario.Ashby.DefaultRequestHeaders.Authorization!,
            [ScenarioBuilder.Brook] = scenario.Brook.DefaultRequestHeaders.Authorization!,
        };
        var term = await FirstTermAsync(scenario.Ashby, scenario);
        var cells = token.Keys
            .SelectMany(a => Scenario.CriteriaOf(a).SelectMany(c => ScenarioPlan.Bidders.Select(b => (Assessor: a, Alternative: b.Code, Criterion: c))))
            .ToArray();

        // 2 × 25 simulated sessions; each saves one cell (several sessions share a cell, as two browser tabs would),
        // re-reading after a conflict as a client must. Every acknowledged save returns the cell's new version.
        var acknowledged = new ConcurrentBag<(string Cell, long Version, string Rationale)>();
        var sessions = Enumerable.Range(0, 50).Select(async i =>
        {
            var instance = i % 2 == 0 ? _first! : _second!;
            var (assessor, alternative, criterion) = cells[i % cells.Length];
            using var client = instance.CreateClient();
            client.DefaultRequestHeaders.Authorization = token[assessor];
            var url = scenario.Url($"/my/ratings/{alternative}/{criterion}");
            var rationale = $"Session {i:D2}: the method statement covers this criterion in section {i % 7 + 1}.";
            for (var attempt = 0; attempt < 20; attempt++)
            {
                var version = await CellVersionAsync(client, scenario, alternative, criterion);
                var response = await client.PutJsonAsync(url, new { term, rationale, version });
                if (response.StatusCode == HttpStatusCode.OK)
                {
                    var saved = await response.Content.ReadFromJsonAsync<JsonElement>();
                    acknowledged.Add(($"{assessor}/{alternative}/{criterion}", saved.GetProperty("version").GetInt64(), rationale));
                    return;
                }

                Assert.True(response.StatusCode == HttpStatusCode.Conflict, $"session {i}: {(int)response.StatusCode} {await response.Content.ReadAsStringAsync()}");
            }

            Assert.Fail($"session {i} never saved");
        });
        await Task.WhenAll(sessions);

        Assert.Equal(50, acknowledged.Count);
        foreach (var group in acknowledged.GroupBy(a => a.Cell))
        {
            // No two acknowledged saves of a cell share a version, and the cell holds the one acknowledged last.
            var versions = group.Select(g => g.Version).ToArray();
            Assert.Equal(versions.Length, versions.Distinct().Count());
            var parts = group.Key.Split('/');
            using var reader = _second!.CreateClient();
            reader.DefaultRequestHeaders.Authorization = token[parts[0]];
            var stored = await CellAsync(reader, scenario, parts[1], parts[2]);
            var latest = group.MaxBy(g => g.Version);
            Assert.Equal(latest.Version, stored.GetProperty("version").GetInt64());
            Assert.Equal(latest.Rationale, stored.GetProperty("rationale").GetString());
        }

        // One audit entry per acknowledged save, and the chain written by both instances verifies.
        var saves = await scenario.AuditEntriesAsync("rating.saved");
        Assert.Equal(50, saves.Count);
        var verification = await ApiAssert.OkAsync(await scenario.Facilitator.GetAsync(scenario.Url("/audit/verification")));
        Assert.True(verification.GetProperty("valid").GetBoolean(), verification.GetRawText());
    }

    private static async Task<string> FirstTermAsync(HttpClient client, Scenario scenario) =>
        (await ApiAssert.OkAsync(await client.GetAsync(scenario.Url("/my/sheet")))).GetProperty("scale")[0].GetProperty("code").GetString()!;

    private static async Task<JsonElement> CellAsync(HttpClient client, Scenario scenario, string alternative, string criterion)
    {
        var sheet = await ApiAssert.OkAsync(await client.GetAsync(scenario.Url("/my/sheet")));
        return sheet.GetProperty("cells").EnumerateArray()
            .Single(c => c.GetProperty("alternative").GetString() == alternative && c.GetProperty("criterion").GetString() == criterion);
    }

    private static async Task<long?> CellVersionAsync(HttpClient client, Scenario scenario, string alternative, string criterion)
    {
        var cell = await CellAsync(client, scenario, alternative, criterion);
        return cell.GetProperty("version").ValueKind == JsonValueKind.Number ? cell.GetProperty("version").GetInt64() : null;
    }

    public void Dispose()
    {
        _second?.Dispose();
        _first?.Dispose();
    }
}
