using Decide.Data.Entities;
using Decide.Web.Features.Accounts;
using Decide.Web.Infrastructure;
using Microsoft.AspNetCore.Authentication;
using Microsoft.AspNetCore.Authentication.BearerToken;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.AspNetCore.Identity;
using Microsoft.Extensions.Options;

namespace Decide.Web.Api;

/// <summary>Sign-in (cookie or bearer token), token refresh, the caller's account, and account management.</summary>
public static class AccountEndpoints
{
    /// <summary>The refresh request body.</summary>
    public sealed record RefreshRequest(string RefreshToken);

    public static RouteGroupBuilder MapAccountEndpoints(this RouteGroupBuilder api)
    {
        var auth = api.MapGroup("/auth").WithTags("Sign-in");
        auth.MapPost("/login", Login).AllowAnonymous().WithSignInLimits()
            .WithSummary("Sign in. Returns a bearer token (tokenType, accessToken, expiresIn, refreshToken), or sets a cookie with ?useCookies=true.");
        auth.MapPost("/refresh", Refresh).AllowAnonymous().WithSignInLimits().WithSummary("Exchange a refresh token for a new access token.");
        auth.MapPost("/logout", (Delegate)Logout).RequireAuthorization().WithSummary("Sign out (cookie).");

        var accounts = api.MapGroup("/accounts").WithTags("Accounts").RequireAuthorization();
        accounts.MapGet("/me", Me).WithSummary("The signed-in account.");
        accounts.MapGet("/", List).WithSummary("Every account (administrator).");
        accounts.MapPost("/", Create).WithSummary("Create a local account (administrator).");
        return api;
    }

    private static Task<IResult> Login(SignInRequest request, bool? useCookies, AccountService accounts, CancellationToken ct) =>
        accounts.SignInAsync(request, useCookies == true, ct);

    private static async Task<IResult> Refresh(
        RefreshRequest request, IOptionsMonitor<BearerTokenOptions> options, TimeProvider clock,
        UserManager<DecideUser> users, SignInManager<DecideUser> signIn)
    {
        var protector = options.Get(IdentityConstants.BearerScheme).RefreshTokenProtector;
        var ticket = string.IsNullOrEmpty(request.RefreshToken) ? null : protector.Unprotect(request.RefreshToken);
        if (ticket?.Properties.ExpiresUtc is not { } expires || clock.GetUtcNow() >= expires
            || await signIn.ValidateSecurityStampAsync(ticket.Principal) is not { } user)
        {
            return TypedResults.Problem(statusCode: StatusCodes.Status401Unauthorized, title: "Refresh failed",
                detail: "The refresh token is invalid or has expired; sign in again.");
        }

        var principal = await signIn.CreateUserPrincipalAsync(user);
        return TypedResults.SignIn(principal, authenticationScheme: IdentityConstants.BearerScheme);
    }

    private static async Task<NoContent> Logout(HttpContext context)
    {
        await context.SignOutAsync(IdentityConstants.ApplicationScheme);
        return TypedResults.NoContent();
    }

    private static async Task<Ok<AccountView>> Me(AccountService accounts) => TypedResults.Ok(await accounts.MeAsync());

    private static async Task<Ok<IReadOnlyList<AccountView>>> List(AccountService accounts, CancellationToken ct) =>
        TypedResults.Ok(await accounts.ListAsync(ct));

    private static async Task<Created<AccountView>> Create(CreateAccountRequest request, AccountService accounts, CancellationToken ct)
    {
        var created = await accounts.CreateAsync(request, ct);
        return TypedResults.Created($"/api/accounts/{created.Id}", created);
    }
}
