using Decide.Data;
using Decide.Data.Entities;
using Microsoft.AspNetCore.Authentication;
using Microsoft.AspNetCore.Identity;

namespace Decide.Web.Infrastructure;

/// <summary>
/// Local accounts with ASP.NET Core Identity: password rules and lockout; cookies for the browser and bearer
/// tokens for scripts (one policy scheme picks by the Authorization header).
/// </summary>
public static class IdentitySetup
{
    /// <summary>The global role that may create accounts and evaluations.</summary>
    public const string AdministratorRole = "Administrator";

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
            o.Cookie.SecurePolicy = CookieSecurePolicy.SameAsRequest;
            o.ExpireTimeSpan = TimeSpan.FromHours(8);
            o.SlidingExpiration = true;

            // An API caller gets a status code, never a redirect to a sign-in page.
            o.Events.OnRedirectToLogin = context => Deny(context, StatusCodes.Status401Unauthorized);
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
            .AddEntityFrameworkStores<DecideDbContext>()
            .AddSignInManager()
            .AddDefaultTokenProviders();

        builder.Services.AddAuthorization();
        return builder;
    }

    private static Task Deny(RedirectContext<Microsoft.AspNetCore.Authentication.Cookies.CookieAuthenticationOptions> context, int status)
    {
        context.Response.StatusCode = status;
        return Task.CompletedTask;
    }
}
