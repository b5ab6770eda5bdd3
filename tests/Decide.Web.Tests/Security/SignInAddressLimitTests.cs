using System.Globalization;
using System.Net;
using System.Net.Http.Json;
using Decide.Web.Features.Accounts;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.Security;

/// <summary>
/// The per-address limit (configured down to <see cref="TightSignInLimitsFactory.PerAddressPermits"/> here): one
/// address spraying many accounts is cut off whatever the account, refreshes included, and other addresses go on.
/// </summary>
public sealed class SignInAddressLimitTests(TightSignInLimitsFactory factory) : IClassFixture<TightSignInLimitsFactory>
{
    [Fact]
    public async Task An_address_spraying_many_accounts_is_refused_after_the_configured_number_of_attempts()
    {
        using var sprayer = factory.Browser("192.0.2.1");
        for (var attempt = 1; attempt <= TightSignInLimitsFactory.PerAddressPermits; attempt++)
        {
            var allowed = await LoginAsync(sprayer, $"spray-{attempt}@kestrel-vale.example");
            Assert.True(allowed.StatusCode == HttpStatusCode.Unauthorized, $"attempt {attempt}: {(int)allowed.StatusCode}");
        }

        var refused = await LoginAsync(sprayer, "spray-next@kestrel-vale.example");
        var problem = await ApiAssert.ProblemAsync(refused, HttpStatusCode.TooManyRequests, "from your address");
        Assert.Contains($"at most {TightSignInLimitsFactory.PerAddressPermits} in", problem.GetProperty("detail").GetString(), StringComparison.Ordinal);
        var retryAfter = int.Parse(Assert.Single(refused.Headers.GetValues("Retry-After")), CultureInfo.InvariantCulture);
        Assert.Contains($"Try again in {retryAfter} seconds", problem.GetProperty("detail").GetString(), StringComparison.Ordinal);

        // A refresh from the same address counts as a sign-in attempt too.
        var refresh = await sprayer.PostAsJsonAsync("/api/auth/refresh", new { refreshToken = "not-a-token" });
        await ApiAssert.ProblemAsync(refresh, HttpStatusCode.TooManyRequests, "from your address");

        // The sign-in form from that address goes back to the screen with the wait.
        var form = await SignInFormClient.PostAsync(sprayer, DecideWebFactory.Observer, DemoSeeder.DemoPassword);
        Assert.Equal(HttpStatusCode.Redirect, form.StatusCode);
        Assert.StartsWith("/signin?problem=throttled&retryAfter=", form.Headers.Location!.OriginalString, StringComparison.Ordinal);

        using var neighbour = factory.Browser("192.0.2.2");
        Assert.Equal(HttpStatusCode.OK, (await neighbour.PostAsJsonAsync("/api/auth/login", new { email = DecideWebFactory.Observer, password = DemoSeeder.DemoPassword })).StatusCode);
    }

    [Fact]
    public async Task Addresses_in_one_ipv6_network_count_together()
    {
        // One /64 is what a single household or server is given; its addresses share one count.
        for (var attempt = 1; attempt <= TightSignInLimitsFactory.PerAddressPermits; attempt++)
        {
            using var client = factory.Browser($"2001:db8:1:1::{attempt:x}");
            Assert.Equal(HttpStatusCode.Unauthorized, (await LoginAsync(client, $"v6-{attempt}@kestrel-vale.example")).StatusCode);
        }

        using var sameNetwork = factory.Browser("2001:db8:1:1::ffff");
        await ApiAssert.ProblemAsync(await LoginAsync(sameNetwork, "v6-next@kestrel-vale.example"), HttpStatusCode.TooManyRequests, "from your address");
        using var otherNetwork = factory.Browser("2001:db8:1:2::1");
        Assert.Equal(HttpStatusCode.Unauthorized, (await LoginAsync(otherNetwork, "v6-next@kestrel-vale.example")).StatusCode);
    }

    private static Task<HttpResponseMessage> LoginAsync(HttpClient client, string email) =>
        client.PostAsJsonAsync("/api/auth/login", new { email, password = "Wrong-password-spray" });
}
