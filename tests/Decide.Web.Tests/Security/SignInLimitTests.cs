using System.Globalization;
using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using Decide.Web.Features.Accounts;
using Decide.Web.Infrastructure;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.Security;

/// <summary>
/// Sign-in attempts with the shipped limits (<see cref="SignInLimitOptions"/>): one address may try one account a
/// few times per window, then gets 429 with Retry-After (the form goes back to the screen, which says when to try
/// again); other accounts and other addresses go on; a load test signing in a hundred accounts from one address
/// passes. Each test stands for clients of its own (addresses from the documentation ranges of RFC 5737/3849).
/// </summary>
public sealed class SignInLimitTests(SecuredWebFactory factory) : IClassFixture<SecuredWebFactory>
{
    private static readonly SignInLimitOptions Shipped = new();

    [Fact]
    public async Task One_address_trying_one_account_too_often_is_refused_with_429_and_when_to_retry()
    {
        using var client = factory.Browser("203.0.113.1");
        const string account = "nobody-1@kestrel-vale.example";
        for (var attempt = 1; attempt <= Shipped.PerAccountPermits; attempt++)
        {
            var allowed = await LoginAsync(client, account, "Wrong-password-1");
            Assert.True(allowed.StatusCode == HttpStatusCode.Unauthorized, $"attempt {attempt}: {(int)allowed.StatusCode}");
        }

        var refused = await LoginAsync(client, account, "Wrong-password-1");
        var problem = await ApiAssert.ProblemAsync(refused, HttpStatusCode.TooManyRequests, "for this account from your address");
        var retryAfter = RetryAfterSeconds(refused);
        Assert.InRange(retryAfter, 1, Shipped.WindowSeconds);
        Assert.Contains($"Try again in {retryAfter} seconds", problem.GetProperty("detail").GetString(), StringComparison.Ordinal);
        Assert.Equal(retryAfter, problem.GetProperty("retryAfterSeconds").GetInt32());
        Assert.Equal("application/problem+json", refused.Content.Headers.ContentType!.MediaType);
    }

    [Fact]
    public async Task Once_refused_even_the_right_password_waits_while_other_accounts_and_other_addresses_go_on()
    {
        var account = DecideWebFactory.OtherAssessor;
        using var client = factory.Browser("203.0.113.2");
        for (var attempt = 1; attempt <= Shipped.PerAccountPermits; attempt++)
        {
            Assert.NotEqual(HttpStatusCode.TooManyRequests, (await LoginAsync(client, account, DemoSeeder.DemoPassword)).StatusCode);
        }

        await ApiAssert.ProblemAsync(await LoginAsync(client, account, DemoSeeder.DemoPassword), HttpStatusCode.TooManyRequests, "Try again in");

        // The same address signs in as someone else; the same account signs in from elsewhere.
        Assert.Equal(HttpStatusCode.OK, (await LoginAsync(client, DecideWebFactory.Observer, DemoSeeder.DemoPassword)).StatusCode);
        using var elsewhere = factory.Browser("203.0.113.3");
        Assert.Equal(HttpStatusCode.OK, (await LoginAsync(elsewhere, account, DemoSeeder.DemoPassword)).StatusCode);
    }

    [Fact]
    public async Task The_sign_in_form_goes_back_to_the_screen_which_says_how_long_to_wait()
    {
        using var browser = factory.Browser("203.0.113.4");
        const string account = "nobody-4@kestrel-vale.example";
        for (var attempt = 1; attempt <= Shipped.PerAccountPermits; attempt++)
        {
            var failed = await SignInFormClient.PostAsync(browser, account, "Wrong-password-4", "/evaluations");
            Assert.StartsWith("/signin?problem=failed", failed.Headers.Location!.OriginalString, StringComparison.Ordinal);
        }

        var refused = await SignInFormClient.PostAsync(browser, account, "Wrong-password-4", "/evaluations");
        Assert.Equal(HttpStatusCode.Redirect, refused.StatusCode);
        var retryAfter = RetryAfterSeconds(refused);
        Assert.Equal($"/signin?problem=throttled&retryAfter={retryAfter}&returnUrl=%2Fevaluations", refused.Headers.Location!.OriginalString);

        var screen = await browser.GetAsync(refused.Headers.Location);
        Assert.Equal(HttpStatusCode.OK, screen.StatusCode);
        var page = await screen.Content.ReadAsStringAsync();
        Assert.Contains("Too many sign-in attempts in a short time", page, StringComparison.Ordinal);
        Assert.Contains($"Wait {retryAfter} seconds and try again", page, StringComparison.Ordinal);
        Assert.Contains("value=\"/evaluations\"", page, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_load_test_signing_in_a_hundred_accounts_from_one_loopback_address_is_not_refused()
    {
        // The demo's nine accounts with the right password, and 91 further names (unknown here: the limits count
        // attempts, whether or not the account exists), all from loopback in one burst; then each token refreshed.
        string[] demo =
        [
            DecideWebFactory.Admin, DecideWebFactory.Facilitator, DecideWebFactory.Observer, DecideWebFactory.Approver,
            .. new[] { "ravelle", "fenwright", "abernathy", "ellingsby", "kilbane" }.Select(a => $"{a}@{DemoSeeder.Domain}"),
        ];
        var accounts = demo.Concat(Enumerable.Range(1, 100 - demo.Length).Select(i => $"load-{i:000}@{DemoSeeder.Domain}")).ToArray();
        Assert.Equal(100, accounts.Length);

        using var client = factory.Browser("127.0.0.1");
        var answers = new List<HttpResponseMessage>();
        foreach (var account in accounts)
        {
            answers.Add(await LoginAsync(client, account, DemoSeeder.DemoPassword));
        }

        Assert.DoesNotContain(answers, r => r.StatusCode == HttpStatusCode.TooManyRequests);
        Assert.All(answers.Take(demo.Length), r => Assert.Equal(HttpStatusCode.OK, r.StatusCode));
        Assert.All(answers.Skip(demo.Length), r => Assert.Equal(HttpStatusCode.Unauthorized, r.StatusCode));

        foreach (var answer in answers.Take(demo.Length))
        {
            var token = (await answer.Content.ReadFromJsonAsync<JsonElement>()).GetProperty("refreshToken").GetString();
            Assert.Equal(HttpStatusCode.OK, (await client.PostAsJsonAsync("/api/auth/refresh", new { refreshToken = token })).StatusCode);
        }
    }

    private static Task<HttpResponseMessage> LoginAsync(HttpClient client, string email, string password) =>
        client.PostAsJsonAsync("/api/auth/login", new { email, password });

    private static int RetryAfterSeconds(HttpResponseMessage response)
    {
        Assert.True(response.Headers.TryGetValues("Retry-After", out var values), "no Retry-After header");
        return int.Parse(Assert.Single(values!), CultureInfo.InvariantCulture);
    }
}
