using System.Net;
using System.Net.Http.Headers;
using System.Net.Http.Json;
using System.Text.RegularExpressions;
using Decide.Data;
using Decide.Web.Features.Accounts;
using Decide.Web.Tests.Support;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;

namespace Decide.Web.Tests;

/// <summary>
/// The screens' side of signing in: a browser without a cookie is sent to the sign-in form, the form posts with
/// antiforgery and goes back where the person was going, and the API keeps answering with status codes.
/// </summary>
public sealed partial class SignInFormTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task A_browser_opening_a_screen_without_a_cookie_is_sent_to_the_sign_in_form()
    {
        using var browser = Browser();
        var response = await browser.GetAsync("/evaluations");
        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        Assert.Equal("/signin", response.Headers.Location!.AbsolutePath);
        Assert.Contains("ReturnUrl=%2Fevaluations", response.Headers.Location.Query, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_api_still_answers_401_and_never_redirects_even_to_a_caller_that_accepts_html()
    {
        using var browser = Browser();
        var response = await browser.GetAsync("/api/evaluations");
        Assert.Equal(HttpStatusCode.Unauthorized, response.StatusCode);
        Assert.Null(response.Headers.Location);
    }

    [Fact]
    public async Task The_form_signs_in_with_a_cookie_goes_back_and_records_the_sign_in()
    {
        using var browser = Browser();
        var response = await PostSignInAsync(browser, DecideWebFactory.Observer, DemoSeeder.DemoPassword, "/evaluations");

        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        Assert.Equal("/evaluations", response.Headers.Location!.OriginalString);
        var me = await browser.GetFromJsonAsync<Account>("/api/accounts/me");
        Assert.Equal(DecideWebFactory.Observer, me!.Email);
        var screen = await browser.GetAsync("/evaluations");
        Assert.Equal(HttpStatusCode.OK, screen.StatusCode);
        Assert.Contains("KVTA-2026-017", await screen.Content.ReadAsStringAsync(), StringComparison.Ordinal);

        await using var db = await factory.Services.GetRequiredService<IDbContextFactory<DecideDbContext>>().CreateDbContextAsync();
        Assert.True(await db.Audit.AnyAsync(a => a.Chain == AuditChain.SystemChain && a.Action == "signin.succeeded" && a.UserName == DecideWebFactory.Observer));
    }

    [Fact]
    public async Task A_wrong_password_returns_to_the_form_which_says_what_went_wrong()
    {
        using var browser = Browser();
        var response = await PostSignInAsync(browser, DecideWebFactory.Approver, "not-the-password", "/evaluations");

        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        Assert.StartsWith("/signin?problem=failed", response.Headers.Location!.OriginalString, StringComparison.Ordinal);
        var form = await (await browser.GetAsync(response.Headers.Location)).Content.ReadAsStringAsync();
        Assert.Contains("The e-mail address or the password is wrong", form, StringComparison.Ordinal);
        Assert.Equal(HttpStatusCode.Unauthorized, (await browser.GetAsync("/api/accounts/me")).StatusCode);
    }

    [Fact]
    public async Task After_five_failures_the_form_says_the_account_is_locked()
    {
        const string email = "lockout-check@kestrel-vale.example";
        using (var admin = await factory.SignInAsync(DecideWebFactory.Admin))
        {
            var created = await admin.PostAsJsonAsync("/api/accounts", new { email, displayName = "Lockout Check", password = "Lockout-check-2026" });
            Assert.Equal(HttpStatusCode.Created, created.StatusCode);
        }

        using var browser = Browser();
        HttpResponseMessage response = null!;
        for (var attempt = 0; attempt < 5; attempt++)
        {
            response = await PostSignInAsync(browser, email, "wrong-password", "/");
        }

        Assert.StartsWith("/signin?problem=locked", response.Headers.Location!.OriginalString, StringComparison.Ordinal);
        var form = await (await browser.GetAsync(response.Headers.Location)).Content.ReadAsStringAsync();
        Assert.Contains("This account is locked", form, StringComparison.Ordinal);

        // The right password does not get past the lock either.
        var right = await PostSignInAsync(browser, email, "Lockout-check-2026", "/");
        Assert.StartsWith("/signin?problem=locked", right.Headers.Location!.OriginalString, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("https://elsewhere.example/phish")]
    [InlineData("//elsewhere.example/phish")]
    public async Task A_return_address_on_another_site_is_not_followed(string returnUrl)
    {
        using var browser = Browser();
        var response = await PostSignInAsync(browser, DecideWebFactory.Facilitator, DemoSeeder.DemoPassword, returnUrl);
        Assert.Equal("/", response.Headers.Location!.OriginalString);
    }

    [Fact]
    public async Task A_form_post_without_the_antiforgery_token_is_refused()
    {
        using var browser = Browser();
        using var form = new FormUrlEncodedContent(new Dictionary<string, string>
        {
            ["Email"] = DecideWebFactory.Facilitator, ["Password"] = DemoSeeder.DemoPassword, ["ReturnUrl"] = "/",
        });
        var response = await browser.PostAsync("/account/signin", form);
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Equal(HttpStatusCode.Unauthorized, (await browser.GetAsync("/api/accounts/me")).StatusCode);
    }

    /// <summary>A client that behaves like a browser: keeps cookies, asks for HTML, does not follow redirects.</summary>
    private HttpClient Browser()
    {
        var client = factory.CreateClient(new WebApplicationFactoryClientOptions { AllowAutoRedirect = false, HandleCookies = true });
        client.DefaultRequestHeaders.Accept.Add(new MediaTypeWithQualityHeaderValue("text/html"));
        return client;
    }

    /// <summary>Opens the sign-in form (for its antiforgery token and cookie) and sends it.</summary>
    private static async Task<HttpResponseMessage> PostSignInAsync(HttpClient browser, string email, string password, string returnUrl)
    {
        var page = await browser.GetStringAsync("/signin");
        var token = AntiforgeryField().Match(page).Groups[1].Value;
        Assert.False(string.IsNullOrEmpty(token), "the sign-in form carries an antiforgery token");
        using var form = new FormUrlEncodedContent(new Dictionary<string, string>
        {
            ["__RequestVerificationToken"] = token, ["Email"] = email, ["Password"] = password, ["ReturnUrl"] = returnUrl,
        });
        return await browser.PostAsync("/account/signin", form);
    }

    [GeneratedRegex("name=\"__RequestVerificationToken\" value=\"([^\"]+)\"")]
    private static partial Regex AntiforgeryField();

    private sealed record Account(string Email);
}
