using System.Net.Http.Headers;
using System.Net.Http.Json;
using Decide.Web.Features.Accounts;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Data.Sqlite;

namespace Decide.Web.Tests.Support;

/// <summary>
/// Hosts the whole service in memory against a real SQLite file of its own (migrated and seeded with the demo at
/// start), and signs demo users in.
/// </summary>
public sealed class DecideWebFactory : WebApplicationFactory<Program>
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "decide-tests", Guid.NewGuid().ToString("N"));

    /// <summary>The demo domain's accounts by role.</summary>
    public const string Admin = "admin@decide.example";
    public const string Facilitator = "facilitator@" + DemoSeeder.Domain;
    public const string Observer = "probity@" + DemoSeeder.Domain;
    public const string Approver = "director@" + DemoSeeder.Domain;
    public const string Assessor = "ravelle@" + DemoSeeder.Domain;
    public const string OtherAssessor = "fenwright@" + DemoSeeder.Domain;
    public const string PriceEvaluator = "kilbane@" + DemoSeeder.Domain;

    public string DatabaseFile => Path.Combine(_folder, "decide.db");

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        Directory.CreateDirectory(_folder);
        builder.UseEnvironment("Testing");
        builder.UseSetting("Database:DataFolder", _folder);
        builder.UseSetting("Database:SeedDemo", "true");
    }

    /// <summary>A client signed in as <paramref name="email"/> with a bearer token.</summary>
    public async Task<HttpClient> SignInAsync(string email, string password = DemoSeeder.DemoPassword)
    {
        var client = CreateClient();
        var response = await client.PostAsJsonAsync("/api/auth/login", new { email, password });
        response.EnsureSuccessStatusCode();
        var token = await response.Content.ReadFromJsonAsync<TokenResponse>();
        client.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", token!.AccessToken);
        return client;
    }

    /// <summary>The demo evaluation's id.</summary>
    public async Task<Guid> DemoEvaluationAsync()
    {
        using var client = await SignInAsync(Facilitator);
        var list = await client.GetFromJsonAsync<List<Summary>>("/api/evaluations");
        return list!.Single().Id;
    }

    protected override void Dispose(bool disposing)
    {
        base.Dispose(disposing);
        SqliteConnection.ClearAllPools();
        try
        {
            Directory.Delete(_folder, recursive: true);
        }
        catch (IOException)
        {
            // A file still held open by the OS; the temp folder is cleaned later.
        }
    }

    private sealed record TokenResponse(string AccessToken);

    private sealed record Summary(Guid Id);
}
