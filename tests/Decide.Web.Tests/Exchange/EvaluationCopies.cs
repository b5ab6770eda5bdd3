using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using System.Text.Json.Nodes;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Web.Features.Accounts;
using Decide.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;

namespace Decide.Web.Tests.Exchange;

/// <summary>
/// Evaluations of a test's own, made as users make them: the demo is exported by its facilitator and imported by
/// the administrator (optionally edited first), then set up and moved through the stages through the API. Copies
/// are run by a facilitator of their own, so that the demo stays the demo facilitator's only evaluation.
/// </summary>
public static class EvaluationCopies
{
    public const string CopyFacilitator = "copydesk@" + DemoSeeder.Domain;

    /// <summary>The demo evaluation as its facilitator exports it.</summary>
    public static async Task<JsonObject> ExportDemoAsync(DecideWebFactory factory)
    {
        var id = await factory.DemoEvaluationAsync();
        using var client = await factory.SignInAsync(DecideWebFactory.Facilitator);
        var response = await client.GetAsync($"/api/evaluations/{id}/export");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        return JsonNode.Parse(await response.Content.ReadAsStringAsync())!.AsObject();
    }

    /// <summary>Each assessor code of a file mapped to the demo account of the same name.</summary>
    public static Dictionary<string, string> DemoAccounts(JsonObject file) =>
        file["assessors"]!.AsArray().Select(a => (string)a!["id"]!).ToDictionary(code => code, code => $"{code}@{DemoSeeder.Domain}");

    /// <summary>Imports <paramref name="file"/> as the administrator with the copy facilitator; returns the new id.</summary>
    public static async Task<Guid> ImportAsync(DecideWebFactory factory, JsonObject file)
    {
        await EnsureAccountAsync(factory, CopyFacilitator, "Copy Desk (facilitator of test copies)");
        using var admin = await factory.SignInAsync(DecideWebFactory.Admin);
        var response = await admin.PostAsJsonAsync("/api/evaluations/import",
            new { file, facilitatorEmail = CopyFacilitator, accounts = DemoAccounts(file) });
        Assert.Equal(HttpStatusCode.Created, response.StatusCode);
        return (await response.Content.ReadFromJsonAsync<JsonElement>()).GetProperty("id").GetGuid();
    }

    /// <summary>A copy of the demo at stage Setup, after <paramref name="edit"/> changed the exported file.</summary>
    public static async Task<Guid> ImportDemoCopyAsync(DecideWebFactory factory, Action<JsonObject>? edit = null)
    {
        var file = await ExportDemoAsync(factory);
        edit?.Invoke(file);
        return await ImportAsync(factory, file);
    }

    /// <summary>
    /// Setup: the number of approvals needed, and the panel (the file's assessors, kilbane also as price evaluator,
    /// the observer and <paramref name="approvers"/>).
    /// </summary>
    public static async Task SetUpAsync(DecideWebFactory factory, Guid id, int requiredApprovals, IReadOnlyList<string> approvers)
    {
        using var client = await factory.SignInAsync(CopyFacilitator);
        var detail = await client.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}");
        var plan = detail.GetProperty("plan");
        var settings = new { minRationaleLength = 20, pricesVisibleToAssessors = false, requiredApprovals };
        await OkAsync(await client.PutAsJsonAsync($"/api/evaluations/{id}/plan", new { plan, settings, version = Version(detail) }));

        detail = await client.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}");
        var seats = new List<object>();
        foreach (var seat in detail.GetProperty("panel").EnumerateArray().Where(s => s.GetProperty("role").GetString() == "assessor"))
        {
            var code = seat.GetProperty("assessorCode").GetString()!;
            var criteria = seat.GetProperty("criteria");
            seats.Add(new
            {
                email = $"{code}@{DemoSeeder.Domain}", role = "assessor", assessorCode = code, weight = seat.GetProperty("weight").GetDouble(),
                criteria = criteria.ValueKind == JsonValueKind.Null ? null : criteria.EnumerateArray().Select(c => c.GetString()).ToArray(),
            });
        }

        seats.Add(new { email = DecideWebFactory.PriceEvaluator, role = "priceEvaluator", assessorCode = "kilbane" });
        seats.Add(new { email = DecideWebFactory.Observer, role = "observer" });
        seats.AddRange(approvers.Select(a => new { email = a, role = "approver" }));
        await OkAsync(await client.PutAsJsonAsync($"/api/evaluations/{id}/panel", new { seats, version = Version(detail) }));
    }

    /// <summary>Each assessor signs the declaration and submits the weights imported with the copy; then the plan is locked and scoring opened.</summary>
    public static async Task OpenScoringAsync(DecideWebFactory factory, Guid id)
    {
        await SignAndSubmitWeightsAsync(factory, id);
        using var client = await factory.SignInAsync(CopyFacilitator);
        await TransitionAsync(client, id, "lock-plan");
        await TransitionAsync(client, id, "open-scoring");
    }

    /// <summary>Each assessor signs the declaration and submits the weights imported with the copy.</summary>
    public static async Task SignAndSubmitWeightsAsync(DecideWebFactory factory, Guid id)
    {
        foreach (var code in await AssessorCodesAsync(factory, id))
        {
            using var assessor = await factory.SignInAsync($"{code}@{DemoSeeder.Domain}");
            var declaration = await assessor.GetFromJsonAsync<JsonElement>("/api/declaration");
            await OkAsync(await assessor.PostAsJsonAsync($"/api/evaluations/{id}/declaration",
                new { version = declaration.GetProperty("version").GetString(), accepted = true }));
            await OkAsync(await assessor.PostAsJsonAsync($"/api/evaluations/{id}/my/weights/submit", new { }));
        }
    }

    /// <summary>Each assessor confirms the declaration with the bidders' names and submits the sheet imported with the copy.</summary>
    public static async Task SubmitAllSheetsAsync(DecideWebFactory factory, Guid id)
    {
        foreach (var code in await AssessorCodesAsync(factory, id))
        {
            using var assessor = await factory.SignInAsync($"{code}@{DemoSeeder.Domain}");
            var mine = await assessor.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}/declaration");
            if (mine.TryGetProperty("namesConfirmedAt", out var confirmed) && confirmed.ValueKind == JsonValueKind.Null)
            {
                await OkAsync(await assessor.PostAsJsonAsync($"/api/evaluations/{id}/declaration/names", new { conflicts = Array.Empty<object>() }));
            }

            await OkAsync(await assessor.PostAsJsonAsync($"/api/evaluations/{id}/my/submit", new { }));
        }
    }

    /// <summary>Each assessor confirms the names and declines every cell of one bidder, through their rating sheet.</summary>
    public static async Task DeclineEverywhereAsync(DecideWebFactory factory, Guid id, string alternative, string reason)
    {
        foreach (var code in await AssessorCodesAsync(factory, id))
        {
            using var assessor = await factory.SignInAsync($"{code}@{DemoSeeder.Domain}");
            await OkAsync(await assessor.PostAsJsonAsync($"/api/evaluations/{id}/declaration/names", new { conflicts = Array.Empty<object>() }));
            var sheet = await assessor.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}/my/sheet");
            foreach (var cell in sheet.GetProperty("cells").EnumerateArray().Where(c => c.GetProperty("alternative").GetString() == alternative))
            {
                await OkAsync(await assessor.PutAsJsonAsync(
                    $"/api/evaluations/{id}/my/ratings/{alternative}/{cell.GetProperty("criterion").GetString()}", new { declined = reason }));
            }
        }
    }

    private static async Task<IReadOnlyList<string>> AssessorCodesAsync(DecideWebFactory factory, Guid id)
    {
        using var client = await factory.SignInAsync(CopyFacilitator);
        var detail = await client.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}");
        return detail.GetProperty("panel").EnumerateArray()
            .Where(s => s.GetProperty("role").GetString() == "assessor")
            .Select(s => s.GetProperty("assessorCode").GetString()!).ToArray();
    }

    /// <summary>Closes scoring and starts moderation.</summary>
    public static async Task StartModerationAsync(DecideWebFactory factory, Guid id)
    {
        using var client = await factory.SignInAsync(CopyFacilitator);
        await TransitionAsync(client, id, "start-moderation");
    }

    /// <summary>A copy of the demo at stage Moderation with every sheet submitted.</summary>
    public static async Task<Guid> CopyAtModerationAsync(DecideWebFactory factory, int requiredApprovals = 1, IReadOnlyList<string>? approvers = null)
    {
        var id = await ImportDemoCopyAsync(factory);
        await SetUpAsync(factory, id, requiredApprovals, approvers ?? [DecideWebFactory.Approver]);
        await OpenScoringAsync(factory, id);
        await SubmitAllSheetsAsync(factory, id);
        await StartModerationAsync(factory, id);
        return id;
    }

    /// <summary>A copy of the demo at stage Moderation whose facilitator has asked the approvers to sign off.</summary>
    public static async Task<Guid> CopyAwaitingSignOffAsync(DecideWebFactory factory, int requiredApprovals = 1, IReadOnlyList<string>? approvers = null)
    {
        var id = await CopyAtModerationAsync(factory, requiredApprovals, approvers);
        using var client = await factory.SignInAsync(CopyFacilitator);
        await OkAsync(await client.PostAsJsonAsync($"/api/evaluations/{id}/approvals/request",
            new { note = "The panel recommends the top-ranked supplier; moderation is complete." }));
        return id;
    }

    /// <summary>Creates an account unless it exists (administrator).</summary>
    public static async Task EnsureAccountAsync(DecideWebFactory factory, string email, string name)
    {
        using var admin = await factory.SignInAsync(DecideWebFactory.Admin);
        var accounts = await admin.GetFromJsonAsync<JsonElement>("/api/accounts");
        if (accounts.EnumerateArray().Any(a => a.GetProperty("email").GetString() == email))
        {
            return;
        }

        Assert.Equal(HttpStatusCode.Created, (await admin.PostAsJsonAsync("/api/accounts",
            new { email, displayName = name, password = DemoSeeder.DemoPassword })).StatusCode);
    }

    /// <summary>The evaluation's audit trail as the copy facilitator (or <paramref name="email"/>) reads it.</summary>
    public static async Task<JsonElement> AuditAsync(DecideWebFactory factory, Guid id, string email = CopyFacilitator)
    {
        using var client = await factory.SignInAsync(email);
        return await client.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}/audit");
    }

    /// <summary>The problem document of a refused request, after checking its status.</summary>
    public static async Task<JsonElement> ProblemAsync(HttpResponseMessage response, HttpStatusCode status)
    {
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == status, $"expected {(int)status}, got {(int)response.StatusCode}: {body}");
        return JsonDocument.Parse(body).RootElement.Clone();
    }

    private static async Task TransitionAsync(HttpClient client, Guid id, string action)
    {
        var detail = await client.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}");
        await OkAsync(await client.PostAsJsonAsync($"/api/evaluations/{id}/{action}", new { version = Version(detail) }));
    }

    private static long Version(JsonElement detail) => detail.GetProperty("summary").GetProperty("version").GetInt64();

    private static async Task OkAsync(HttpResponseMessage response) =>
        Assert.True(response.IsSuccessStatusCode, $"{response.RequestMessage?.RequestUri}: {(int)response.StatusCode} {await response.Content.ReadAsStringAsync()}");
}
