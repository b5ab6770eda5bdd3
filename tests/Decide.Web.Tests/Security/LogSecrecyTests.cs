using System.Net;
using System.Net.Http.Json;
using Decide.Web.Features.Accounts;
using Decide.Web.Tests.Exchange;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.Security;

/// <summary>
/// Logs never carry a secret. Every entry the service writes at every level (message, template values, exception,
/// scopes) is captured while people sign in with wrong and right passwords (API and form), an account is created,
/// tokens are refreshed, an approver signs off with a password, and the record is signed with a configured
/// certificate; none of the passwords, tokens or the certificate's password appears.
/// </summary>
public sealed class LogSecrecyTests(ConfiguredCertificateFactory factory) : IClassFixture<ConfiguredCertificateFactory>
{
    [Fact]
    public async Task No_password_token_or_certificate_password_is_ever_logged()
    {
        var secrets = new List<string> { DemoSeeder.DemoPassword, factory.CertificatePassword };
        string Secret(string kind)
        {
            var secret = $"{kind}-{Guid.NewGuid():N}"[..24] + "Aa1";
            secrets.Add(secret);
            return secret;
        }

        using var client = factory.Browser("198.51.100.60");

        // The API: a wrong password, then the right one; both tokens refreshed.
        Assert.Equal(HttpStatusCode.Unauthorized, (await LoginAsync(client, DecideWebFactory.Facilitator, Secret("Wrong"))).StatusCode);
        var tokens = await ApiAssert.OkAsync(await LoginAsync(client, DecideWebFactory.Admin, DemoSeeder.DemoPassword));
        var access = tokens.GetProperty("accessToken").GetString()!;
        var refresh = tokens.GetProperty("refreshToken").GetString()!;
        secrets.AddRange([access, refresh]);
        var refreshed = await ApiAssert.OkAsync(await client.PostAsJsonAsync("/api/auth/refresh", new { refreshToken = refresh }));
        secrets.AddRange([refreshed.GetProperty("accessToken").GetString()!, refreshed.GetProperty("refreshToken").GetString()!]);

        // An account created with a password, which then signs in wrongly and rightly, through the form too.
        var newPassword = Secret("New");
        client.DefaultRequestHeaders.Authorization = new("Bearer", access);
        var created = await client.PostAsJsonAsync("/api/accounts", new { email = "secrecy@kestrel-vale.example", displayName = "Secrecy Check", password = newPassword });
        Assert.Equal(HttpStatusCode.Created, created.StatusCode);
        client.DefaultRequestHeaders.Authorization = null;
        Assert.Equal(HttpStatusCode.OK, (await LoginAsync(client, "secrecy@kestrel-vale.example", newPassword)).StatusCode);

        using var browser = factory.Browser("198.51.100.61");
        var wrong = await SignInFormClient.PostAsync(browser, "secrecy@kestrel-vale.example", Secret("FormWrong"));
        Assert.StartsWith("/signin?problem=failed", wrong.Headers.Location!.OriginalString, StringComparison.Ordinal);
        var right = await SignInFormClient.PostAsync(browser, "secrecy@kestrel-vale.example", newPassword);
        Assert.Equal("/", right.Headers.Location!.OriginalString);
        secrets.AddRange(CookieValues(right));

        // Sign-off with a wrong and the right password; the record is signed with the configured certificate.
        var id = await EvaluationCopies.CopyAwaitingSignOffAsync(factory);
        using var approver = await factory.SignInAsync(DecideWebFactory.Approver);
        const string Statement = "I approve the award recommendation to the top-ranked supplier on the moderated scores.";
        var refused = await approver.PostAsJsonAsync($"/api/evaluations/{id}/approvals", new { password = Secret("Approve"), statement = Statement });
        Assert.Equal(HttpStatusCode.Forbidden, refused.StatusCode);
        await ApiAssert.OkAsync(await approver.PostAsJsonAsync($"/api/evaluations/{id}/approvals", new { password = DemoSeeder.DemoPassword, statement = Statement }));
        var record = await approver.GetAsync($"/api/evaluations/{id}/record");
        Assert.Equal(HttpStatusCode.OK, record.StatusCode);
        Assert.Equal("application/pdf", record.Content.Headers.ContentType!.MediaType);

        var entries = factory.Logs.Entries;

        // The capture saw this run: the sign-in requests, Identity's verdicts and the certificate in use.
        Assert.Contains(entries, e => e.Contains("/api/auth/login", StringComparison.Ordinal));
        Assert.Contains(entries, e => e.Contains("/api/auth/refresh", StringComparison.Ordinal));
        Assert.Contains(entries, e => e.Contains("/account/signin", StringComparison.Ordinal));
        Assert.Contains(entries, e => e.Contains("Kestrel Vale Transit Authority (test)", StringComparison.Ordinal));

        foreach (var secret in secrets)
        {
            var leaks = entries.Where(e => e.Contains(secret, StringComparison.Ordinal)).ToArray();
            Assert.True(leaks.Length == 0, $"a secret ({secret[..4]}…) was logged in {leaks.Length} entries, the first: {leaks.FirstOrDefault()}");
        }
    }

    private static Task<HttpResponseMessage> LoginAsync(HttpClient client, string email, string password) =>
        client.PostAsJsonAsync("/api/auth/login", new { email, password });

    /// <summary>The values of the cookies a response sets (the sign-in cookie is as secret as a token).</summary>
    private static IEnumerable<string> CookieValues(HttpResponseMessage response) =>
        response.Headers.TryGetValues("Set-Cookie", out var cookies)
            ? cookies.Select(c => c.Split(';')[0]).Select(c => c[(c.IndexOf('=', StringComparison.Ordinal) + 1)..]).Where(v => v.Length > 0)
            : [];
}
