using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;

namespace Decide.Data.Storage;

/// <summary>
/// Where the database is chosen: reads the <c>Database</c> section and the <c>Decide</c> connection string once at
/// start, refuses a setting it cannot use by name, and registers the context factory for the provider with its
/// migrations assembly. The provider's error codes (<see cref="StoreErrors"/>) and text limits
/// (<see cref="TextLimits"/>) live beside it; nothing outside this folder compares provider names.
/// </summary>
public static class DataSetup
{
    /// <summary>The connection string's name (<c>ConnectionStrings:Decide</c>).</summary>
    public const string ConnectionStringName = "Decide";

    /// <summary>Registers <see cref="DatabaseOptions"/> and <c>IDbContextFactory&lt;DecideDbContext&gt;</c>.</summary>
    /// <param name="services">The service collection.</param>
    /// <param name="configuration">The application's configuration.</param>
    /// <param name="contentRoot">The folder relative paths in the settings are taken from.</param>
    /// <exception cref="InvalidOperationException">A setting is missing or cannot be used; the message names it.</exception>
    public static IServiceCollection AddDecideData(this IServiceCollection services, IConfiguration configuration, string contentRoot)
    {
        var options = Read(configuration);
        services.AddSingleton(options);

        var connectionString = configuration.GetConnectionString(ConnectionStringName);
        switch (options.Provider)
        {
            case DatabaseProvider.Postgres:
                if (string.IsNullOrWhiteSpace(connectionString))
                {
                    throw new InvalidOperationException(
                        "Database:Provider is Postgres but ConnectionStrings:Decide is empty; set it (e.g. the environment variable ConnectionStrings__Decide).");
                }

                services.AddDbContextFactory<DecideDbContext>(db => db.UseNpgsql(
                    connectionString, pg => pg.MigrationsAssembly("Decide.Data.Postgres").EnableRetryOnFailure()));
                break;
            default:
                if (string.IsNullOrWhiteSpace(connectionString))
                {
                    var folder = Path.GetFullPath(options.DataFolder, contentRoot);
                    Directory.CreateDirectory(folder);
                    connectionString = $"Data Source={Path.Combine(folder, "decide.db")}";
                }

                services.AddDbContextFactory<DecideDbContext>(db => db.UseSqlite(
                    connectionString, sqlite => sqlite.MigrationsAssembly("Decide.Data.Sqlite")));
                break;
        }

        return services;
    }

    /// <summary>Applies pending migrations and sets the engine's own options (SQLite's write-ahead log).</summary>
    public static async Task MigrateAsync(IDbContextFactory<DecideDbContext> factory, CancellationToken ct = default)
    {
        await using var db = await factory.CreateDbContextAsync(ct);
        await db.Database.MigrateAsync(ct);
        if (db.Database.IsSqlite())
        {
            // Write-ahead log: readers (a panel reading its sheets) no longer wait for the writer, and a commit
            // appends to the log instead of rewriting pages through a rollback journal. The setting stays with
            // the file. Commits remain fully synchronous: an acknowledged save survives a crash or a power cut.
            await db.Database.ExecuteSqlRawAsync("PRAGMA journal_mode=WAL;", ct);
        }
    }

    private static DatabaseOptions Read(IConfiguration configuration) =>
        StartupSettings.Read<DatabaseOptions>(configuration, DatabaseOptions.Section, o => o.Problems(),
            "Database:Provider takes Sqlite or Postgres.");
}
