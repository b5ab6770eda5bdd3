using Decide.Data;
using Decide.Data.Entities;
using Decide.Data.Storage;
using Decide.Web.Features.Records;
using Decide.Web.Infrastructure;
using Microsoft.AspNetCore.Builder;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;

namespace Decide.Web.Tests.Operations;

/// <summary>
/// The storage set-up read once at start: a setting it cannot use stops the service with the setting named, and every
/// save, whatever its path, refuses text longer than its column before anything is written.
/// </summary>
public sealed class StorageSetupTests
{
    private static IConfiguration Settings(params (string Key, string Value)[] settings) =>
        new ConfigurationBuilder().AddInMemoryCollection(settings.Select(s => new KeyValuePair<string, string?>(s.Key, s.Value))).Build();

    [Fact]
    public void An_unknown_provider_stops_the_start_naming_the_setting_and_the_choices()
    {
        var e = Assert.Throws<InvalidOperationException>(() => new ServiceCollection().AddDecideData(Settings(("Database:Provider", "Mongo")), Path.GetTempPath()));
        Assert.Contains("Database:Provider", e.Message, StringComparison.Ordinal);
        Assert.Contains("Mongo", e.Message, StringComparison.Ordinal);
        Assert.Contains("Sqlite or Postgres", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Postgres_without_a_connection_string_stops_the_start_naming_it()
    {
        var e = Assert.Throws<InvalidOperationException>(() => new ServiceCollection().AddDecideData(Settings(("Database:Provider", "PostgreSQL")), Path.GetTempPath()));
        Assert.Contains("ConnectionStrings:Decide", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("sqlite", DatabaseProvider.Sqlite)]
    [InlineData("Postgres", DatabaseProvider.Postgres)]
    [InlineData("PostgreSQL", DatabaseProvider.Postgres)]
    public void The_provider_is_a_typed_choice_in_any_case(string setting, DatabaseProvider expected)
    {
        var services = new ServiceCollection().AddDecideData(
            Settings(("Database:Provider", setting), ("ConnectionStrings:Decide", "Host=127.0.0.1;Database=unused")), Path.GetTempPath());
        Assert.Equal(expected, services.BuildServiceProvider().GetRequiredService<DatabaseOptions>().Provider);
    }

    [Fact]
    public void A_signing_certificate_path_that_names_no_file_stops_the_start_naming_the_setting()
    {
        var missing = Path.Combine(Path.GetTempPath(), $"no-such-{Guid.NewGuid():N}.pfx");
        var e = Assert.Throws<InvalidOperationException>(() => SigningOptions.Read(Settings(("Signing:CertificatePath", missing)), Path.GetTempPath()));
        Assert.Contains("Signing:CertificatePath", e.Message, StringComparison.Ordinal);
        Assert.Contains(missing, e.Message, StringComparison.Ordinal);
        Assert.Null(SigningOptions.Read(Settings(), Path.GetTempPath()).CertificatePath);
    }

    [Theory]
    [InlineData("Security:HttpsPort", "not-a-port", "Security:HttpsPort")]
    [InlineData("Security:HttpsPort", "70000", "Security:HttpsPort must be a port number")]
    [InlineData("Security:SignIn:WindowSeconds", "0", "Security:SignIn:WindowSeconds must be at least 1")]
    public void A_security_setting_that_cannot_be_used_stops_the_start_naming_it(string key, string value, string expected)
    {
        var builder = WebApplication.CreateBuilder();
        builder.Configuration.AddInMemoryCollection([new KeyValuePair<string, string?>(key, value)]);
        var e = Assert.Throws<InvalidOperationException>(() => builder.AddDecideSecurity());
        Assert.Contains(expected, e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_database_setting_the_binder_cannot_convert_stops_the_start_naming_it()
    {
        var e = Assert.Throws<InvalidOperationException>(() => new ServiceCollection().AddDecideData(Settings(("Database:SeedDemo", "maybe")), Path.GetTempPath()));
        Assert.Contains("Database:SeedDemo", e.Message, StringComparison.Ordinal);
        Assert.Contains("maybe", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Any_save_refuses_text_longer_than_its_column_and_writes_nothing()
    {
        // SQLite does not enforce column lengths itself, so only the check can refuse here.
        await using var connection = new SqliteConnection("Data Source=:memory:");
        await connection.OpenAsync();
        var options = new DbContextOptionsBuilder<DecideDbContext>().UseSqlite(connection).Options;
        await using (var db = new DecideDbContext(options))
        {
            await db.Database.EnsureCreatedAsync();
            db.Evaluations.Add(new StoredEvaluation { Id = Guid.NewGuid(), Reference = "T-1", Title = new string('x', 301), CreatedBy = "test" });
            var e = await Assert.ThrowsAsync<TextTooLongException>(() => db.SaveChangesAsync());
            var (column, reasons) = Assert.Single(e.Errors);
            Assert.Equal("evaluations.Title", column);
            Assert.Contains("301 characters is longer than the 300 kept", reasons[0], StringComparison.Ordinal);
            Assert.Throws<TextTooLongException>(() => db.SaveChanges());
        }

        await using (var db = new DecideDbContext(options))
        {
            Assert.Equal(0, await db.Evaluations.CountAsync());
        }
    }
}
