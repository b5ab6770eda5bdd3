using Decide.Data;
using Decide.Web.Features.Accounts;
using Microsoft.AspNetCore.DataProtection;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Infrastructure;

/// <summary>Database settings (section <c>Database</c>).</summary>
public sealed class DatabaseOptions
{
    public const string Section = "Database";

    /// <summary><c>Sqlite</c> (default: one file, one machine) or <c>Postgres</c> (a shared database for several instances).</summary>
    public string Provider { get; set; } = "Sqlite";

    /// <summary>True when <see cref="Provider"/> names PostgreSQL.</summary>
    public bool UsesPostgres => string.Equals(Provider, "Postgres", StringComparison.OrdinalIgnoreCase)
        || string.Equals(Provider, "PostgreSQL", StringComparison.OrdinalIgnoreCase);

    /// <summary>Folder for the SQLite file when no connection string is given; relative to the content root.</summary>
    public string DataFolder { get; set; } = "data";

    /// <summary>Seed the demo evaluation and demo accounts into an empty database.</summary>
    public bool SeedDemo { get; set; } = true;
}

/// <summary>Registers the database and prepares it at start (migrations, then the demo seed).</summary>
public static class StorageSetup
{
    public static WebApplicationBuilder AddDecideStorage(this WebApplicationBuilder builder)
    {
        var options = builder.Configuration.GetSection(DatabaseOptions.Section).Get<DatabaseOptions>() ?? new DatabaseOptions();
        builder.Services.AddSingleton(options);
        builder.Services.AddSingleton(TimeProvider.System);

        var connectionString = builder.Configuration.GetConnectionString("Decide");
        if (options.UsesPostgres)
        {
            if (string.IsNullOrWhiteSpace(connectionString))
            {
                throw new InvalidOperationException(
                    "Database:Provider is Postgres but ConnectionStrings:Decide is empty; set it (e.g. the environment variable ConnectionStrings__Decide).");
            }

            builder.Services.AddDbContextFactory<DecideDbContext>(db => db.UseNpgsql(
                connectionString, pg => pg.MigrationsAssembly("Decide.Data.Postgres").EnableRetryOnFailure()));
        }
        else if (string.Equals(options.Provider, "Sqlite", StringComparison.OrdinalIgnoreCase))
        {
            if (string.IsNullOrWhiteSpace(connectionString))
            {
                var folder = Path.GetFullPath(options.DataFolder, builder.Environment.ContentRootPath);
                Directory.CreateDirectory(folder);
                connectionString = $"Data Source={Path.Combine(folder, "decide.db")}";
            }

            builder.Services.AddDbContextFactory<DecideDbContext>(db => db.UseSqlite(
                connectionString, sqlite => sqlite.MigrationsAssembly("Decide.Data.Sqlite")));
        }
        else
        {
            throw new InvalidOperationException($"Database:Provider '{options.Provider}' is not supported; use Sqlite or Postgres.");
        }

        // The keys that protect cookies and antiforgery tokens live in the database, so that every instance of the
        // service accepts what any other issued, and a restart does not sign everyone out.
        builder.Services.AddDataProtection()
            .SetApplicationName("Decide")
            .PersistKeysToDbContext<DecideDbContext>();
        return builder;
    }

    /// <summary>Applies pending migrations and, on an empty database, seeds the demo.</summary>
    public static async Task PrepareDatabaseAsync(this WebApplication app)
    {
        var factory = app.Services.GetRequiredService<IDbContextFactory<DecideDbContext>>();
        await using (var db = await factory.CreateDbContextAsync())
        {
            await db.Database.MigrateAsync();
            if (db.Database.ProviderName == "Microsoft.EntityFrameworkCore.Sqlite")
            {
                // Write-ahead log: readers (a panel reading its sheets) no longer wait for the writer, and a commit
                // appends to the log instead of rewriting pages through a rollback journal. The setting stays with
                // the file. Commits remain fully synchronous: an acknowledged save survives a crash or a power cut.
                await db.Database.ExecuteSqlRawAsync("PRAGMA journal_mode=WAL;");
            }
        }

        if (app.Services.GetRequiredService<DatabaseOptions>().SeedDemo)
        {
            using var scope = app.Services.CreateScope();
            await scope.ServiceProvider.GetRequiredService<DemoSeeder>().SeedIfEmptyAsync();
        }
    }
}
