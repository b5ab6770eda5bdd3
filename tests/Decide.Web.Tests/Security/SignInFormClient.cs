using System.Text.RegularExpressions;

namespace Decide.Web.Tests.Security;

/// <summary>What a browser does with the sign-in form: opens it (for the antiforgery token and cookie) and sends it.</summary>
public static partial class SignInFormClient
{
    /// <summary>The antiforgery token in a page's form.</summary>
    public static string TokenIn(string page)
    {
        var token = AntiforgeryField().Match(page).Groups[1].Value;
        Assert.False(string.IsNullOrEmpty(token), "the page's form carries an antiforgery token");
        return token;
    }

    /// <summary>Opens the sign-in form and posts it with <paramref name="email"/> and <paramref name="password"/>.</summary>
    public static async Task<HttpResponseMessage> PostAsync(HttpClient browser, string email, string password, string returnUrl = "/")
    {
        var token = TokenIn(await browser.GetStringAsync("/signin"));
        using var form = new FormUrlEncodedContent(new Dictionary<string, string>
        {
            ["__RequestVerificationToken"] = token, ["Email"] = email, ["Password"] = password, ["ReturnUrl"] = returnUrl,
        });
        return await browser.PostAsync("/account/signin", form);
    }

    [GeneratedRegex("name=\"__RequestVerificationToken\" value=\"([^\"]+)\"")]
    private static partial Regex AntiforgeryField();
}
