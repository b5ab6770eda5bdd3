using System.Net.Http.Json;
using Decide.Web.Features.Accounts;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Data.Sqlite;
using Npgsql;

namespace Decide.Web.Tests.Support;

/// <summary>
/// Hosts the whole service in memory against a database of its own (migrated and seeded with the demo at start),
/// and signs demo users in. The database is a SQLite file, or, when the environment variable
/// <c>DECIDE_TEST_POSTGRES</c> holds a PostgreSQL connection string (the test script starts a throwaway cluster and
/// runs these tests a second time with it), a fresh PostgreSQL database dropped afterwards.
/// The in-memory server speaks plain HTTP, so HTTPS is not required here, and the sign-in limits are lifted (tests
/// sign in far more often than people do); <c>Security/SecuredWebFactory</c> keeps both as deployed.
/// </summary>
public class DecideWebFactory : WebApplicationFactory<Program>, IDecideHost
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

    /// <summary>The PostgreSQL server to test against, if any (connection string without a database).</summary>
    public static string? PostgresServer => Environment.GetEnvironmentVariable("DECIDE_TEST_POSTGRES") is { Length: > 0 } s ? s : null;

    private readonly string _postgresDatabase = "decide_test_" + Guid.NewGuid().ToString("N");
    private readonly bool _seedDemo = true;
    private readonly bool _dropsDatabase = true;

    /// <summary>A service of its own with its own database (the usual test fixture).</summary>
    public DecideWebFactory()
    {
    }

    /// <summary>
    /// One instance of several sharing the PostgreSQL database <paramref name="sharedDatabase"/>, served by Kestrel on
    /// a loopback port. Only the first instance seeds the demo; the owner drops the database.
    /// </summary>
    public static DecideWebFactory SharingDatabase(string sharedDatabase, bool first) => new(sharedDatabase, first);

    // Not public: a class fixture may have one public constructor only.
    private DecideWebFactory(string sharedDatabase, bool first)
    {
        _postgresDatabase = sharedDatabase;
        _seedDemo = first;
        _dropsDatabase = first;
        UseKestrel(o => o.Listen(System.Net.IPAddress.Loopback, 0));
        StartServer();
    }

    /// <summary>
    /// False (the usual fixture): HTTPS is not required and sign-in limits are lifted. True keeps the deployed
    /// defaults of section <c>Security</c>.
    /// </summary>
    protected virtual bool SecurityAsDeployed => false;

    /// <summary>
    /// A service of its own with its own database, served by Kestrel on a loopback port: the server's own limits
    /// (request body sizes) apply as in production, which the in-memory test server does not enforce.
    /// </summary>
    public static DecideWebFactory OnKestrel() => new(onKestrel: true);

    // Not public: a class fixture may have one public constructor only.
    private DecideWebFactory(bool onKestrel)
    {
        if (onKestrel)
        {
            UseKestrel(o => o.Listen(System.Net.IPAddress.Loopback, 0));
            StartServer();
        }
    }

    /// <summary>"Sqlite" or "Postgres": the provider these tests run against.</summary>
    public static string Provider => PostgresServer is null ? "Sqlite" : "Postgres";

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        Directory.CreateDirectory(_folder);
        builder.UseEnvironment("Testing");
        builder.UseSetting("Database:SeedDemo", _seedDemo ? "true" : "false");
        // Always a folder of its own: it also holds the service's self-signed record certificate, protected with
        // this database's keys, which another test database could not read.
        builder.UseSetting("Database:DataFolder", _folder);
        if (!SecurityAsDeployed)
        {
            builder.UseSetting("Security:RequireHttps", "false");
            builder.UseSetting("Security:SignIn:PerAccountPermits", "100000");
            builder.UseSetting("Security:SignIn:PerAddressPermits", "100000");
        }
        if (PostgresServer is { } server)
        {
            builder.UseSetting("Database:Provider", "Postgres");
            builder.UseSetting("ConnectionStrings:Decide", new NpgsqlConnectionStringBuilder(server) { Database = _postgresDatabase }.ConnectionString);
        }
    }

    /// <summary>A client signed in as <paramref name="email"/> with a bearer token.</summary>
    public Task<HttpClient> SignInAsync(string email, string password = DemoSeeder.DemoPassword) =>
        BearerSignIn.SignInAsync(CreateClient(), email, password);

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
        if (PostgresServer is { } server && _dropsDatabase)
        {
            DropPostgresDatabase(server);
        }

        try
        {
            Directory.Delete(_folder, recursive: true);
        }
        catch (IOException)
        {
            // A file still held open by the OS; the temp folder is cleaned later.
        }
    }

    /// <summary>Removes the database under the running service (the SQLite file, or the PostgreSQL database).</summary>
    public void TakeDatabaseAway()
    {
        if (PostgresServer is { } server)
        {
            DropPostgresDatabase(server);
            return;
        }

        SqliteConnection.ClearAllPools();
        File.Delete(Path.Combine(_folder, "decide.db"));
    }

    private void DropPostgresDatabase(string server)
    {
        NpgsqlConnection.ClearAllPools();
        using var connection = new NpgsqlConnection(new NpgsqlConnectionStringBuilder(server) { Database = "postgres" }.ConnectionString);
        connection.Open();
        using var drop = new NpgsqlCommand($"DROP DATABASE IF EXISTS \"{_postgresDatabase}\" WITH (FORCE)", connection);
        drop.ExecuteNonQuery();
    }

    private sealed record Summary(Guid Id);
}
