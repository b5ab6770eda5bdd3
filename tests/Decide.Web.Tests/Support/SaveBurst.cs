using System.Collections.Concurrent;
using System.Net;
using System.Net.Http.Headers;
using System.Net.Http.Json;
using System.Text.Json;
using Decide.Data.Entities;

namespace Decide.Web.Tests.Support;

/// <summary>
/// Many sessions saving ratings of one evaluation at once, spread over one or more instances of the service, then
/// the checks that nothing was lost or duplicated: every acknowledged save has a version of its own, each cell holds
/// the save acknowledged last, there is one audit entry per acknowledged save, and the chain verifies.
/// </summary>
public static class SaveBurst
{
    public static async Task RunAsync(IReadOnlyList<IDecideHost> instances, int sessions)
    {
        var scenario = await new ScenarioBuilder(instances[0]).BuildAsync(EvaluationStage.Scoring);
        await scenario.ConfirmNamesAsync(scenario.Ashby);
        await scenario.ConfirmNamesAsync(scenario.Brook);
        var token = new Dictionary<string, AuthenticationHeaderValue>
        {
            [ScenarioBuilder.Ashby] = scenario.Ashby.DefaultRequestHeaders.Authorization!,
            [ScenarioBuilder.Brook] = scenario.Brook.DefaultRequestHeaders.Authorization!,
        };
        var term = (await ApiAssert.OkAsync(await scenario.Ashby.GetAsync(scenario.Url("/my/sheet"))))
            .GetProperty("scale")[0].GetProperty("code").GetString()!;
        var cells = token.Keys
            .SelectMany(a => Scenario.CriteriaOf(a).SelectMany(c => ScenarioPlan.Bidders.Select(b => (Assessor: a, Alternative: b.Code, Criterion: c))))
            .ToArray();

        // Each session saves one cell (several sessions share a cell, as two browser tabs would), re-reading after a
        // conflict as a client must. Every acknowledged save returns the cell's new version.
        var acknowledged = new ConcurrentBag<(string Cell, long Version, string Rationale)>();
        var all = Enumerable.Range(0, sessions).Select(async i =>
        {
            var instance = instances[i % instances.Count];
            var (assessor, alternative, criterion) = cells[i % cells.Length];
            using var client = instance.CreateClient();
            client.DefaultRequestHeaders.Authorization = token[assessor];
            var url = scenario.Url($"/my/ratings/{alternative}/{criterion}");
            var rationale = $"Session {i:D3}: the method statement covers this criterion in section {i % 7 + 1}.";
            for (var attempt = 0; attempt < sessions; attempt++)
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
        await Task.WhenAll(all);

        Assert.Equal(sessions, acknowledged.Count);
        foreach (var group in acknowledged.GroupBy(a => a.Cell))
        {
            // No two acknowledged saves of a cell share a version, and the cell holds the one acknowledged last.
            var versions = group.Select(g => g.Version).ToArray();
            Assert.Equal(versions.Length, versions.Distinct().Count());
            var parts = group.Key.Split('/');
            using var reader = instances[^1].CreateClient();
            reader.DefaultRequestHeaders.Authorization = token[parts[0]];
            var stored = await CellAsync(reader, scenario, parts[1], parts[2]);
            var latest = group.MaxBy(g => g.Version);
            Assert.Equal(latest.Version, stored.GetProperty("version").GetInt64());
            Assert.Equal(latest.Rationale, stored.GetProperty("rationale").GetString());
        }

        // One audit entry per acknowledged save, and the chain written by every instance verifies.
        var saves = await scenario.AuditEntriesAsync("rating.saved");
        Assert.Equal(sessions, saves.Count);
        var verification = await ApiAssert.OkAsync(await scenario.Facilitator.GetAsync(scenario.Url("/audit/verification")));
        Assert.True(verification.GetProperty("valid").GetBoolean(), verification.GetRawText());
    }

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
}
