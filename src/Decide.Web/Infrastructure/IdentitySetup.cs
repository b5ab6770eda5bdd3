using Decide.Data;
using Decide.Data.Entities;
using Microsoft.AspNetCore.Authentication;
using Microsoft.AspNetCore.Identity;

namespace Decide.Web.Infrastructure;

/// <summary>
/// Local accounts with ASP.NET Core Identity: password rules and lockout; cookies for the browser and bearer
/// tokens for scripts (one policy scheme picks by the Authorization header). An API caller without a valid sign-in
/// gets 401/403; a person opening a screen is sent to the sign-in page.
/// </summary>
public static class IdentitySetup
{
    /// <summary>The global role that may create accounts and evaluations.</summary>
    public const string AdministratorRole = "Administrator";

    /// <summary>The sign-in screen (statically rendered, see Components/Pages/Account).</summary>
    public const string SignInPath = "/signin";

    private const string Smart = "Decide";

    public static WebApplicationBuilder AddDecideIdentity(this WebApplicationBuilder builder)
    {
        builder.Services
            .AddAuthentication(Smart)
            .AddPolicyScheme(Smart, "Cookie or bearer token", o => o.ForwardDefaultSelector = context =>
                context.Request.Headers.Authorization.ToString().StartsWith("Bearer ", StringComparison.OrdinalIgnoreCase)
                    ? IdentityConstants.BearerScheme
                    : IdentityConstants.ApplicationScheme)
            .AddBearerToken(IdentityConstants.BearerScheme, o => o.BearerTokenExpiration = TimeSpan.FromHours(1))
            .AddIdentityCookies();

        builder.Services.ConfigureApplicationCookie(o =>
        {
            o.Cookie.Name = "decide.auth";
            o.Cookie.HttpOnly = true;
            o.Cookie.SameSite = SameSiteMode.Strict;
            // Secure: set for every cookie in SecuritySetup (always where HTTPS is required).
            o.ExpireTimeSpan = TimeSpan.FromHours(8);
            o.SlidingExpiration = true;

            // An API caller gets a status code, never a redirect to a sign-in page; a screen sends the person to sign in.
            o.LoginPath = SignInPath;
            o.Events.OnRedirectToLogin = context => IsScreen(context.Request)
                ? Redirect(context)
                : Deny(context, StatusCodes.Status401Unauthorized);
            o.Events.OnRedirectToAccessDenied = context => Deny(context, StatusCodes.Status403Forbidden);
        });

        builder.Services
            .AddIdentityCore<DecideUser>(o =>
            {
                o.User.RequireUniqueEmail = true;
                o.Password.RequiredLength = 12;
                o.Password.RequireDigit = true;
                o.Password.RequireLowercase = true;
                o.Password.RequireUppercase = true;
                o.Password.RequireNonAlphanumeric = false;
                o.Lockout.AllowedForNewUsers = true;
                o.Lockout.MaxFailedAccessAttempts = 5;
                o.Lockout.DefaultLockoutTimeSpan = TimeSpan.FromMinutes(15);
                o.SignIn.RequireConfirmedAccount = false;
            })
            .AddRoles<IdentityRole>()
            .AddClaimsPrincipalFactory<DisplayNameClaims>()
            .AddEntityFrameworkStores<DecideDbContext>()
            .AddSignInManager()
            .AddDefaultTokenProviders();

        builder.Services.AddAuthorization();
        return builder;
    }

    /// <summary>
    /// True for a browser opening a screen: a GET outside the API and the OpenAPI document that accepts HTML. Anything
    /// else (scripts, fetches, the API) keeps plain status codes.
    /// </summary>
    private static bool IsScreen(HttpRequest request) =>
        HttpMethods.IsGet(request.Method)
        && !request.Path.StartsWithSegments("/api")
        && !request.Path.StartsWithSegments("/openapi")
        && request.Headers.Accept.ToString().Contains("text/html", StringComparison.OrdinalIgnoreCase);

    private static Task Redirect(RedirectContext<Microsoft.AspNetCore.Authentication.Cookies.CookieAuthenticationOptions> context)
    {
        context.Response.Redirect(context.RedirectUri);
        return Task.CompletedTask;
    }

    private static Task Deny(RedirectContext<Microsoft.AspNetCore.Authentication.Cookies.CookieAuthenticationOptions> context, int status)
    {
        context.Response.StatusCode = status;
        return Task.CompletedTask;
    }
}
