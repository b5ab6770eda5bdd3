using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Design;

namespace Decide.Data.Sqlite;

/// <summary>Lets <c>dotnet ef migrations add</c> build the context without starting the web host.</summary>
public sealed class DesignTimeFactory : IDesignTimeDbContextFactory<DecideDbContext>
{
    public DecideDbContext CreateDbContext(string[] args) =>
        new(new DbContextOptionsBuilder<DecideDbContext>()
            .UseSqlite("Data Source=design-time.db", x => x.MigrationsAssembly(typeof(DesignTimeFactory).Assembly.GetName().Name))
            .Options);
}
