using System.Net;
using Decide.Web.Features.Accounts;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Hosting.Server;
using Microsoft.AspNetCore.Hosting.Server.Features;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Data.Sqlite;
using Microsoft.Extensions.DependencyInjection;

namespace Decide.Web.E2ETests.Support;

/// <summary>
/// The whole service on a real Kestrel port on the loopback address, against a SQLite file of its own migrated and
/// seeded with the demo, with the static web assets of the build output (MudBlazor's and the framework's files).
/// </summary>
public sealed class DecideServer : WebApplicationFactory<Program>
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "decide-e2e", Guid.NewGuid().ToString("N"));

    public const string Facilitator = "facilitator@" + DemoSeeder.Domain;
    public const string Observer = "probity@" + DemoSeeder.Domain;
    public const string Administrator = "admin@decide.example";
    public const string Password = DemoSeeder.DemoPassword;

    public DecideServer()
    {
        UseKestrel(o => o.Listen(IPAddress.Loopback, 0));
        StartServer();
        var addresses = Services.GetRequiredService<IServer>().Features.Get<IServerAddressesFeature>()?.Addresses;
        BaseUrl = addresses?.FirstOrDefault() ?? throw new InvalidOperationException("Kestrel reported no address.");
    }

    /// <summary>Where the service listens ("http://127.0.0.1:PORT").</summary>
    public string BaseUrl { get; }

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        Directory.CreateDirectory(_folder);
        builder.UseEnvironment("Testing");

        // Outside Development the build output does not map _content/* and _framework/* on its own.
        builder.UseStaticWebAssets();
        builder.UseSetting("Database:DataFolder", _folder);
        builder.UseSetting("Database:SeedDemo", "true");

        // Kestrel speaks plain HTTP on loopback here; the journeys sign in more often than the limits allow people.
        builder.UseSetting("Security:RequireHttps", "false");
        builder.UseSetting("Security:SignIn:PerAccountPermits", "100000");
        builder.UseSetting("Security:SignIn:PerAddressPermits", "100000");
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
            // A file still held open; the temp folder is cleaned later.
        }
    }
}
