using System.Net;
using System.Net.Http.Json;
using Decide.Web.Features.Accounts;
using Decide.Web.Infrastructure;
using Decide.Web.Tests.Support;
using Microsoft.Extensions.Hosting;

namespace Decide.Web.Tests.Security;

/// <summary>
/// Outside Development: plain HTTP is sent to HTTPS (the health probes excepted, which the container asks over
/// plain HTTP), HTTPS answers carry HSTS, and every cookie is Secure, HTTP-only and same-site.
/// </summary>
public sealed class HttpsTests(SecuredWebFactory factory) : IClassFixture<SecuredWebFactory>
{
    private static readonly Uri PlainSite = new("http://decide.example");

    [Theory]
    [InlineData("GET", "/signin?returnUrl=%2Fevaluations")]
    [InlineData("GET", "/api/evaluations")]
    [InlineData("POST", "/api/auth/login")]
    public async Task Plain_http_is_redirected_to_the_same_address_over_https(string method, string path)
    {
        using var browser = factory.Browser("198.51.100.20", PlainSite);
        var response = await browser.SendAsync(new HttpRequestMessage(new HttpMethod(method), path));

        // 307 keeps the method and body of a POST.
        Assert.Equal(HttpStatusCode.TemporaryRedirect, response.StatusCode);
        Assert.Equal(new Uri(SecuredWebFactory.Site, path), response.Headers.Location);
        Assert.False(response.Headers.Contains("Set-Cookie"), "nothing is set over plain HTTP");
    }

    [Theory]
    [InlineData("/health/live")]
    [InlineData("/health/ready")]
    public async Task The_health_probes_answer_over_plain_http_without_redirect_or_hsts(string path)
    {
        using var probe = factory.Browser("127.0.0.1", new Uri("http://localhost:8080"));
        var response = await probe.GetAsync(path);
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.False(response.Headers.Contains("Strict-Transport-Security"));
    }

    [Fact]
    public async Task Https_answers_carry_hsts_for_a_year()
    {
        using var browser = factory.Browser("198.51.100.21");
        var response = await browser.GetAsync("/signin");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        // max-age in seconds: 365 days (common practice for HSTS once HTTPS works everywhere on the host).
        Assert.Equal("max-age=31536000", Assert.Single(response.Headers.GetValues("Strict-Transport-Security")));
    }

    [Fact]
    public async Task The_antiforgery_and_sign_in_cookies_are_secure_http_only_and_strictly_same_site()
    {
        using var browser = factory.Browser("198.51.100.22");
        var form = await browser.GetAsync("/signin");
        var antiforgery = Assert.Single(CookiesOf(form), c => c.StartsWith(".AspNetCore.Antiforgery.", StringComparison.Ordinal));
        AssertHardened(antiforgery);

        var signedIn = await SignInFormClient.PostAsync(browser, DecideWebFactory.Observer, DemoSeeder.DemoPassword);
        Assert.Equal(HttpStatusCode.Redirect, signedIn.StatusCode);
        var auth = Assert.Single(CookiesOf(signedIn), c => c.StartsWith("decide.auth=", StringComparison.Ordinal));
        AssertHardened(auth);

        var api = await browser.PostAsync("/api/auth/login?useCookies=true", JsonContent.Create(new { email = DecideWebFactory.Observer, password = DemoSeeder.DemoPassword }));
        Assert.Equal(HttpStatusCode.OK, api.StatusCode);
        AssertHardened(Assert.Single(CookiesOf(api), c => c.StartsWith("decide.auth=", StringComparison.Ordinal)));
    }

    [Theory]
    [InlineData(null, "Development", false)]
    [InlineData(null, "Production", true)]
    [InlineData(null, "Staging", true)]
    [InlineData(false, "Production", false)]
    [InlineData(true, "Development", true)]
    public void Https_is_required_outside_development_unless_configured_otherwise(bool? configured, string environment, bool required)
    {
        var options = new SecurityOptions { RequireHttps = configured };
        Assert.Equal(required, options.HttpsRequiredIn(new Environment(environment)));
    }

    private static void AssertHardened(string cookie)
    {
        var attributes = cookie.Split(';', StringSplitOptions.TrimEntries).Skip(1).Select(a => a.ToLowerInvariant()).ToArray();
        Assert.Contains("secure", attributes);
        Assert.Contains("httponly", attributes);
        Assert.Contains("samesite=strict", attributes);
    }

    private static IEnumerable<string> CookiesOf(HttpResponseMessage response) =>
        response.Headers.TryGetValues("Set-Cookie", out var cookies) ? cookies : [];

    private sealed class Environment(string name) : IHostEnvironment
    {
        public string EnvironmentName { get; set; } = name;

        public string ApplicationName { get; set; } = "Decide.Web";

        public string ContentRootPath { get; set; } = "";

        public Microsoft.Extensions.FileProviders.IFileProvider ContentRootFileProvider { get; set; } = null!;
    }
}
