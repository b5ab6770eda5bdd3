using System.Net;
using System.Net.Http.Headers;
using Decide.Web.Tests.Support;
using Microsoft.AspNetCore.Mvc.Testing;

namespace Decide.Web.Tests.Security;

/// <summary>
/// With <c>Security:RequireHttps=false</c> (as the usual test fixture sets it) plain HTTP is served as it is, no HSTS
/// is sent, and cookies are Secure only when the request came over HTTPS.
/// </summary>
public sealed class HttpsSwitchedOffTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task Plain_http_is_served_without_redirect_or_hsts_and_its_cookies_are_not_marked_secure()
    {
        var response = await Browser(new Uri("http://decide.example")).GetAsync("/signin");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.False(response.Headers.Contains("Strict-Transport-Security"));
        var cookie = Assert.Single(response.Headers.GetValues("Set-Cookie"));
        Assert.DoesNotContain("secure", cookie.Split(';', StringSplitOptions.TrimEntries).Select(a => a.ToLowerInvariant()));
    }

    [Fact]
    public async Task Over_https_the_same_cookie_is_marked_secure()
    {
        var response = await Browser(new Uri("https://decide.example")).GetAsync("/signin");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var cookie = Assert.Single(response.Headers.GetValues("Set-Cookie"));
        Assert.Contains("secure", cookie.Split(';', StringSplitOptions.TrimEntries).Select(a => a.ToLowerInvariant()));
    }

    private HttpClient Browser(Uri site)
    {
        var client = factory.CreateClient(new WebApplicationFactoryClientOptions { BaseAddress = site, AllowAutoRedirect = false });
        client.DefaultRequestHeaders.Accept.Add(new MediaTypeWithQualityHeaderValue("text/html"));
        return client;
    }
}
