using Decide.Web.Features.Accounts;
using Decide.Web.Infrastructure;
using Microsoft.AspNetCore.Authentication;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.Mvc;

namespace Decide.Web.Components.Account;

/// <summary>
/// The sign-in screen's form posts (both with antiforgery): sign in with the cookie and go back where the person was
/// going, or back to the sign-in screen saying what went wrong (sign-in attempts are limited, see SecuritySetup);
/// sign out.
/// </summary>
public static class SignInEndpoints
{
    /// <summary>The fields of the sign-in form.</summary>
    public sealed record SignInForm(string? Email, string? Password, string? ReturnUrl);

    public static IEndpointRouteBuilder MapSignInEndpoints(this IEndpointRouteBuilder app)
    {
        var account = app.MapGroup("/account").ExcludeFromDescription().WithMetadata(new RequestSizeLimitAttribute(RequestLimits.MaxFormBytes));
        account.MapPost("/signin", (Delegate)SignIn).AllowAnonymous().WithSignInLimits(returnsToForm: true)
            .WithSummary("Sign in from the sign-in screen; redirects to the return address, or back to the screen with the reason.");
        account.MapPost("/signout", (Delegate)SignOut).AllowAnonymous().RequireAntiforgeryToken()
            .WithSummary("Sign out from a screen; redirects to the sign-in screen.");
        return app;
    }

    private static async Task<RedirectHttpResult> SignIn([FromForm] SignInForm form, AccountService accounts, CancellationToken ct)
    {
        var back = LocalOrHome(form.ReturnUrl);
        var outcome = await accounts.PasswordSignInAsync(
            new SignInRequest(form.Email?.Trim() ?? "", form.Password ?? ""), IdentityConstants.ApplicationScheme, ct);
        if (outcome == SignInOutcome.Succeeded)
        {
            return TypedResults.LocalRedirect(back);
        }

        var problem = outcome == SignInOutcome.LockedOut ? "locked" : "failed";
        return TypedResults.LocalRedirect($"{IdentitySetup.SignInPath}?problem={problem}&returnUrl={Uri.EscapeDataString(back)}");
    }

    private static async Task<RedirectHttpResult> SignOut(HttpContext context)
    {
        await context.SignOutAsync(IdentityConstants.ApplicationScheme);
        return TypedResults.LocalRedirect($"{IdentitySetup.SignInPath}?signedOut=true");
    }

    /// <summary>Only addresses on this site are followed (an open redirect would help phishing).</summary>
    private static string LocalOrHome(string? url) =>
        !string.IsNullOrEmpty(url) && url.StartsWith('/') && !url.StartsWith("//", StringComparison.Ordinal) && !url.StartsWith("/\\", StringComparison.Ordinal)
            ? url
            : "/";
}
