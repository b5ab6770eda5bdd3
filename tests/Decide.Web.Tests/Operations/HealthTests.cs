using System.Net;
using Microsoft.Extensions.DependencyInjection;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.Operations;

/// <summary>The probes a proxy or orchestrator uses: they answer without signing in, and readiness checks the database.</summary>
public sealed class HealthTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task Liveness_answers_without_signing_in()
    {
        using var client = factory.CreateClient();
        var response = await client.GetAsync("/health/live");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("Healthy", await response.Content.ReadAsStringAsync());
    }

    [Fact]
    public async Task Readiness_answers_healthy_when_the_database_answers()
    {
        using var client = factory.CreateClient();
        var response = await client.GetAsync("/health/ready");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("Healthy", await response.Content.ReadAsStringAsync());
    }

    [Fact]
    public async Task The_data_protection_keys_are_kept_in_the_database()
    {
        // Signing in issues a cookie-protection key; it must land in the shared table, not on one machine's disk.
        using var client = await factory.SignInAsync(DecideWebFactory.Facilitator);
        using var scope = factory.Services.CreateScope();
        var db = scope.ServiceProvider.GetRequiredService<Decide.Data.DecideDbContext>();
        Assert.NotEmpty(db.DataProtectionKeys.ToList());
    }
}

/// <summary>Readiness when the database goes away under a running instance: 503, so the proxy stops sending traffic.</summary>
public sealed class UnreachableDatabaseHealthTests : IDisposable
{
    private readonly DecideWebFactory _factory = new();

    [Fact]
    public async Task Readiness_reports_unavailable_when_the_database_does_not_answer()
    {
        using var client = _factory.CreateClient();
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/health/ready")).StatusCode);

        _factory.TakeDatabaseAway();
        var response = await client.GetAsync("/health/ready");
        Assert.Equal(HttpStatusCode.ServiceUnavailable, response.StatusCode);
        Assert.Equal("Unhealthy", await response.Content.ReadAsStringAsync());
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/health/live")).StatusCode);
    }

    public void Dispose() => _factory.Dispose();
}
