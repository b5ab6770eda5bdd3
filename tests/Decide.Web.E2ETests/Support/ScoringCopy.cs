using System.Net.Http.Headers;
using System.Net.Http.Json;
using System.Text.Json;
using System.Text.Json.Nodes;
using Decide.Web.Features.Accounts;

namespace Decide.Web.E2ETests.Support;

/// <summary>
/// A copy of the demo at stage Scoring, made through the API as people would: the administrator imports the demo's
/// export with the demo facilitator, the facilitator sets the panel up, each assessor signs and submits their
/// weights, the plan is locked and scoring opened. The imported ratings are in; no sheet is submitted yet.
/// </summary>
public sealed class ScoringCopy(DecideServer server)
{
    /// <summary>The copy's own reference, so that the demo stays the only evaluation under its reference.</summary>
    public const string Reference = "KVTA-2026-017-S";

    private const string DemoReference = "KVTA-2026-017";

    public async Task<Guid> CreateAsync()
    {
        using var facilitator = await SignInAsync(DecideServer.Facilitator);
        var demo = (await facilitator.GetFromJsonAsync<JsonElement>("/api/evaluations")).EnumerateArray()
            .First(e => e.GetProperty("reference").GetString() == DemoReference).GetProperty("id").GetGuid();
        var file = JsonNode.Parse(await facilitator.GetStringAsync($"/api/evaluations/{demo}/export"))!.AsObject();
        file["reference"] = Reference;

        // Scoring comes before moderation: values the demo's panel may have moderated already are not carried over.
        file.Remove("moderation");
        var codes = file["assessors"]!.AsArray().Select(a => (string)a!["id"]!).ToArray();

        Guid id;
        using (var admin = await SignInAsync(DecideServer.Administrator))
        {
            var imported = await OkAsync(await admin.PostAsJsonAsync("/api/evaluations/import", new
            {
                file, facilitatorEmail = DecideServer.Facilitator, accounts = codes.ToDictionary(c => c, c => $"{c}@{DemoSeeder.Domain}"),
            }));
            id = imported.GetProperty("id").GetGuid();
        }

        var detail = await facilitator.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}");
        var seats = detail.GetProperty("panel").EnumerateArray().Where(s => s.GetProperty("role").GetString() == "assessor").Select(s => (object)new
        {
            email = $"{s.GetProperty("assessorCode").GetString()}@{DemoSeeder.Domain}", role = "assessor",
            assessorCode = s.GetProperty("assessorCode").GetString(), weight = s.GetProperty("weight").GetDouble(),
            criteria = s.GetProperty("criteria").ValueKind == JsonValueKind.Null ? null : s.GetProperty("criteria").EnumerateArray().Select(c => c.GetString()).ToArray(),
        }).Append(new { email = $"kilbane@{DemoSeeder.Domain}", role = "priceEvaluator", assessorCode = "kilbane" }).ToArray();
        await OkAsync(await facilitator.PutAsJsonAsync($"/api/evaluations/{id}/panel", new { seats, version = Version(detail) }));

        foreach (var code in codes)
        {
            using var assessor = await SignInAsync($"{code}@{DemoSeeder.Domain}");
            var declaration = await assessor.GetFromJsonAsync<JsonElement>("/api/declaration");
            await OkAsync(await assessor.PostAsJsonAsync($"/api/evaluations/{id}/declaration", new { version = declaration.GetProperty("version").GetString(), accepted = true }));
            await OkAsync(await assessor.PostAsJsonAsync($"/api/evaluations/{id}/my/weights/submit", new { }));
        }

        foreach (var action in new[] { "lock-plan", "open-scoring" })
        {
            detail = await facilitator.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}");
            await OkAsync(await facilitator.PostAsJsonAsync($"/api/evaluations/{id}/{action}", new { version = Version(detail) }));
        }

        return id;
    }

    /// <summary>Each assessor confirms the declaration against the bidders' names and submits the sheet.</summary>
    public async Task SubmitEverySheetAsync(Guid id)
    {
        using var facilitator = await SignInAsync(DecideServer.Facilitator);
        var detail = await facilitator.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}");
        foreach (var seat in detail.GetProperty("panel").EnumerateArray().Where(s => s.GetProperty("role").GetString() == "assessor"))
        {
            using var assessor = await SignInAsync($"{seat.GetProperty("assessorCode").GetString()}@{DemoSeeder.Domain}");
            await OkAsync(await assessor.PostAsJsonAsync($"/api/evaluations/{id}/declaration/names", new { conflicts = Array.Empty<object>() }));
            await OkAsync(await assessor.PostAsJsonAsync($"/api/evaluations/{id}/my/submit", new { }));
        }
    }

    /// <summary>The facilitator records a moderated value through the API (as another session would), replacing none.</summary>
    public async Task ModerateAsync(Guid id, string alternative, string criterion, string term, string reason, IReadOnlyList<string> agreedBy)
    {
        using var facilitator = await SignInAsync(DecideServer.Facilitator);
        await OkAsync(await facilitator.PutAsJsonAsync($"/api/evaluations/{id}/moderation/{alternative}/{criterion}",
            new { term, reason, agreedBy, replaces = (long?)null }));
    }

    private async Task<HttpClient> SignInAsync(string email)
    {
        var client = new HttpClient { BaseAddress = new Uri(server.BaseUrl) };
        var token = await OkAsync(await client.PostAsJsonAsync("/api/auth/login", new { email, password = DecideServer.Password }));
        client.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", token.GetProperty("accessToken").GetString());
        return client;
    }

    private static long Version(JsonElement detail) => detail.GetProperty("summary").GetProperty("version").GetInt64();

    private static async Task<JsonElement> OkAsync(HttpResponseMessage response)
    {
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.IsSuccessStatusCode, $"{response.RequestMessage?.RequestUri}: {(int)response.StatusCode} {body}");
        return body.Length == 0 ? default : JsonDocument.Parse(body).RootElement.Clone();
    }
}
