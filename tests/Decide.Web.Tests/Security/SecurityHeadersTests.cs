using System.Net;
using System.Net.Http.Headers;
using System.Text.RegularExpressions;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.Security;

/// <summary>
/// Every kind of response carries the security headers, and the Content-Security-Policy allows what the screens
/// load and nothing from elsewhere.
/// </summary>
public sealed partial class SecurityHeadersTests(SecuredWebFactory factory) : IClassFixture<SecuredWebFactory>
{
    public static TheoryData<string, string, HttpStatusCode> Responses => new()
    {
        { "the sign-in screen", "/signin", HttpStatusCode.OK },
        { "a screen for someone not signed in", "/evaluations", HttpStatusCode.Redirect },
        { "the site's own stylesheet", "/css/decide.css", HttpStatusCode.OK },
        { "MudBlazor's script", "/_content/MudBlazor/MudBlazor.min.js", HttpStatusCode.OK },
        { "the framework's script", "/_framework/blazor.web.js", HttpStatusCode.OK },
        { "the API description", "/openapi/v1.json", HttpStatusCode.OK },
        { "an API refusal", "/api/evaluations", HttpStatusCode.Unauthorized },
        { "an unknown address", "/api/no-such-thing", HttpStatusCode.NotFound },
        { "the liveness probe", "/health/live", HttpStatusCode.OK },
    };

    [Theory]
    [MemberData(nameof(Responses))]
    public async Task Every_response_carries_the_security_headers(string what, string path, HttpStatusCode status)
    {
        using var browser = factory.Browser("198.51.100.10");
        browser.DefaultRequestHeaders.Accept.Add(new MediaTypeWithQualityHeaderValue("text/html"));
        var response = await browser.GetAsync(path);

        Assert.True(response.StatusCode == status, $"{what}: expected {(int)status}, got {(int)response.StatusCode}");
        AssertSecurityHeaders(response, what);
    }

    [Fact]
    public async Task An_api_answer_and_a_malformed_request_carry_the_headers_too()
    {
        using var client = await factory.SignInAsync(DecideWebFactory.Observer);
        var me = await client.GetAsync("/api/accounts/me");
        Assert.Equal(HttpStatusCode.OK, me.StatusCode);
        AssertSecurityHeaders(me, "an API answer");

        using var body = new StringContent("{\"email\": ", System.Text.Encoding.UTF8, "application/json");
        var malformed = await client.PostAsync("/api/auth/login", body);
        await ApiAssert.ProblemAsync(malformed, HttpStatusCode.BadRequest, "not valid JSON");
        AssertSecurityHeaders(malformed, "a malformed request");
    }

    [Fact]
    public async Task The_policy_forbids_inline_and_foreign_scripts_framing_plugins_and_foreign_form_targets()
    {
        using var browser = factory.Browser("198.51.100.11");
        var policy = Directives(await browser.GetAsync("/signin"));

        Assert.Equal(["'self'"], policy["default-src"]);
        Assert.Contains("'self'", policy["script-src"]);
        Assert.DoesNotContain("'unsafe-inline'", policy["script-src"]);
        Assert.DoesNotContain("'unsafe-eval'", policy["script-src"]);
        Assert.All(policy["script-src"], source => Assert.True(source == "'self'" || source.StartsWith("'nonce-", StringComparison.Ordinal), source));
        Assert.Equal(["'self'"], policy["connect-src"]);
        Assert.Equal(["'none'"], policy["object-src"]);
        Assert.Equal(["'self'"], policy["base-uri"]);
        Assert.Equal(["'self'"], policy["form-action"]);
        Assert.Equal(["'none'"], policy["frame-ancestors"]);

        // Nothing anywhere in the policy names another host or scheme-wide source (https:, http:, *).
        Assert.All(policy.Values.SelectMany(v => v), source => Assert.Matches("^('[a-z-]+'|'nonce-[A-Za-z0-9+/_=-]+'|data:)$", source));
    }

    [Fact]
    public async Task Each_page_gets_a_fresh_nonce_and_only_the_import_map_is_inline_every_other_script_comes_from_this_site()
    {
        using var browser = factory.Browser("198.51.100.12");
        var first = await browser.GetAsync("/signin");
        var second = await browser.GetAsync("/signin");
        var nonce = NonceOf(first);
        Assert.NotEqual(nonce, NonceOf(second));

        var page = await first.Content.ReadAsStringAsync();
        var scripts = ScriptTag().Matches(page).Select(m => m.Value).ToArray();
        Assert.NotEmpty(scripts);
        foreach (var script in scripts)
        {
            var source = Attribute(script, "src");
            if (source is null)
            {
                Assert.Equal("importmap", Attribute(script, "type"));
                Assert.Equal(nonce, Attribute(script, "nonce"));
            }
            else
            {
                Assert.False(Uri.TryCreate(source, UriKind.Absolute, out _) || source.StartsWith("//", StringComparison.Ordinal),
                    $"script from another site: {source}");
            }
        }

        // Stylesheets and icons come from this site as well (the policy names no other).
        foreach (Match link in LinkHref().Matches(page))
        {
            Assert.False(Uri.TryCreate(link.Groups[1].Value, UriKind.Absolute, out _), $"link to another site: {link.Value}");
        }
    }

    [Fact]
    public async Task Responses_without_a_page_carry_the_policy_without_a_nonce()
    {
        using var browser = factory.Browser("198.51.100.13");
        var response = await browser.GetAsync("/api/evaluations");
        Assert.Equal(HttpStatusCode.Unauthorized, response.StatusCode);
        Assert.DoesNotContain(Directives(response)["script-src"], s => s.StartsWith("'nonce-", StringComparison.Ordinal));
    }

    private static void AssertSecurityHeaders(HttpResponseMessage response, string what)
    {
        Assert.True(response.Headers.TryGetValues("Content-Security-Policy", out var policy), $"{what}: no Content-Security-Policy");
        Assert.Contains("frame-ancestors 'none'", policy!.Single(), StringComparison.Ordinal);
        Assert.Equal("nosniff", Single(response, "X-Content-Type-Options", what));
        Assert.Equal("DENY", Single(response, "X-Frame-Options", what));
        Assert.Equal("no-referrer", Single(response, "Referrer-Policy", what));
        var permissions = Single(response, "Permissions-Policy", what);
        foreach (var feature in new[] { "camera=()", "microphone=()", "geolocation=()" })
        {
            Assert.Contains(feature, permissions, StringComparison.Ordinal);
        }
    }

    private static string Single(HttpResponseMessage response, string header, string what)
    {
        Assert.True(response.Headers.TryGetValues(header, out var values), $"{what}: no {header}");
        return Assert.Single(values!);
    }

    /// <summary>The policy's directives by name, each with its sources.</summary>
    private static Dictionary<string, string[]> Directives(HttpResponseMessage response) =>
        response.Headers.GetValues("Content-Security-Policy").Single()
            .Split(';', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)
            .Select(d => d.Split(' ', StringSplitOptions.RemoveEmptyEntries))
            .ToDictionary(d => d[0], d => d[1..]);

    private static string NonceOf(HttpResponseMessage response)
    {
        var nonce = Directives(response)["script-src"].Single(s => s.StartsWith("'nonce-", StringComparison.Ordinal));
        return nonce["'nonce-".Length..^1];
    }

    private static string? Attribute(string tag, string name)
    {
        var match = Regex.Match(tag, $"\\s{name}=\"([^\"]*)\"");
        return match.Success ? WebUtility.HtmlDecode(match.Groups[1].Value) : null;
    }

    [GeneratedRegex("<script\\b[^>]*>")]
    private static partial Regex ScriptTag();

    [GeneratedRegex("<link\\b[^>]*\\shref=\"([^\"]*)\"[^>]*>")]
    private static partial Regex LinkHref();
}
