using Decide.Data;
using Decide.Data.Storage;
using Decide.Web.Features.Accounts;
using Microsoft.AspNetCore.DataProtection;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Infrastructure;

/// <summary>
/// Registers the database (chosen in Decide.Data, <see cref="DataSetup"/>), the keys that protect cookies, and prepares
/// the database at start (migrations, then the demo seed).
/// </summary>
public static class StorageSetup
{
    public static WebApplicationBuilder AddDecideStorage(this WebApplicationBuilder builder)
    {
        builder.Services.AddSingleton(TimeProvider.System);
        builder.Services.AddDecideData(builder.Configuration, builder.Environment.ContentRootPath);

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
        await DataSetup.MigrateAsync(app.Services.GetRequiredService<IDbContextFactory<DecideDbContext>>());
        if (app.Services.GetRequiredService<DatabaseOptions>().SeedDemo)
        {
            using var scope = app.Services.CreateScope();
            await scope.ServiceProvider.GetRequiredService<DemoSeeder>().SeedIfEmptyAsync();
        }
    }
}
