using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Design;

namespace Decide.Data.Postgres;

/// <summary>
/// Lets <c>dotnet ef migrations add</c> build the context without starting the web host. Generating a migration
/// needs no running server; the connection string is only a placeholder.
/// </summary>
public sealed class DesignTimeFactory : IDesignTimeDbContextFactory<DecideDbContext>
{
    public DecideDbContext CreateDbContext(string[] args) =>
        new(new DbContextOptionsBuilder<DecideDbContext>()
            .UseNpgsql("Host=127.0.0.1;Database=decide_design;Username=postgres", x => x.MigrationsAssembly(typeof(DesignTimeFactory).Assembly.GetName().Name))
            .Options);
}
