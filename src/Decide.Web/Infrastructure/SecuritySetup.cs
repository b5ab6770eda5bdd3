using Decide.Data.Storage;
using System.Net;
using System.Threading.RateLimiting;
using Microsoft.AspNetCore.Antiforgery;
using Microsoft.AspNetCore.Authentication.Cookies;

namespace Decide.Web.Infrastructure;

/// <summary>
/// What protects the service from hostile clients (ADR 16): security headers on every response, HTTPS with HSTS and
/// Secure cookies outside Development (<see cref="SecurityOptions.RequireHttps"/>), limits on sign-in attempts, and a
/// plain refusal of a form posted without its antiforgery token.
/// </summary>
public static class SecuritySetup
{
    /// <summary>The rate-limiting policy of the sign-in endpoints (per client address).</summary>
    public const string SignInPolicy = "sign-in";

    private const string FormNotVerified =
        "The form could not be verified: its anti-forgery token is missing, wrong or expired. Open the page again and send the form from there.";

    public static WebApplicationBuilder AddDecideSecurity(this WebApplicationBuilder builder)
    {
        var options = StartupSettings.Read<SecurityOptions>(builder.Configuration, SecurityOptions.Section, o => o.Problems());

        builder.Services.AddSingleton(options);

        // Cookies are Secure wherever HTTPS is required. Without it (Development, or the in-memory test host) they
        // are Secure when the request came over HTTPS, as the proxy's X-Forwarded-Proto tells.
        var secure = options.HttpsRequiredIn(builder.Environment) ? CookieSecurePolicy.Always : CookieSecurePolicy.SameAsRequest;
        builder.Services.PostConfigureAll<CookieAuthenticationOptions>(o => o.Cookie.SecurePolicy = secure);
        builder.Services.AddAntiforgery(o =>
        {
            o.Cookie.SecurePolicy = secure;
            o.Cookie.HttpOnly = true;
            o.Cookie.SameSite = SameSiteMode.Strict;
        });

        builder.Services.AddHsts(o => o.MaxAge = TimeSpan.FromDays(365));
        builder.Services.AddHttpsRedirection(o => o.HttpsPort = options.HttpsPort);

        builder.Services.AddSingleton<SignInAttempts>();
        builder.Services.AddRateLimiter(o =>
        {
            o.RejectionStatusCode = StatusCodes.Status429TooManyRequests;
            o.AddPolicy(SignInPolicy, context => RateLimitPartition.GetFixedWindowLimiter(SignInAttempts.AddressOf(context), _ =>
                new FixedWindowRateLimiterOptions { PermitLimit = options.SignIn.PerAddressPermits, Window = options.SignIn.Window, QueueLimit = 0 }));
            o.OnRejected = (rejected, _) => new ValueTask(rejected.HttpContext.RequestServices.GetRequiredService<SignInAttempts>()
                .RefuseAddressAsync(rejected.HttpContext, rejected.Lease));
        });
        return builder;
    }

    /// <summary>
    /// Security headers on every response (set as the response starts, so errors get them too), HTTPS redirection
    /// and HSTS when required (not for the health probes, which the container asks over plain HTTP), and the
    /// sign-in limits. Goes right after the forwarded headers, before anything that answers.
    /// </summary>
    public static WebApplication UseDecideSecurity(this WebApplication app)
    {
        app.Use((context, next) =>
        {
            context.Response.OnStarting(() =>
            {
                SecurityHeaders.Apply(context);
                return Task.CompletedTask;
            });
            return next(context);
        });

        if (app.Services.GetRequiredService<SecurityOptions>().HttpsRequiredIn(app.Environment))
        {
            app.UseWhen(context => !IsHealthProbe(context.Request), https =>
            {
                https.UseHsts();
                https.UseHttpsRedirection();
            });
        }

        app.UseRateLimiter();
        return app;
    }

    /// <summary>
    /// Antiforgery for form posts (after authentication: a token is bound to the signed-in person). A post whose token
    /// is missing or wrong is refused here with 400 and a sentence saying what to do — a page for a browser, a
    /// problem document otherwise — before any handler reads the form.
    /// </summary>
    public static WebApplication UseDecideAntiforgery(this WebApplication app)
    {
        app.UseAntiforgery();
        app.Use(async (context, next) =>
        {
            if (context.Features.Get<IAntiforgeryValidationFeature>() is { IsValid: false } failed)
            {
                if (RequestLimits.IsOverLimit(failed.Error))
                {
                    // Not a bad token: the form is over its size limit, which the problem handler words (413).
                    System.Runtime.ExceptionServices.ExceptionDispatchInfo.Throw(failed.Error!);
                }

                await RefuseFormAsync(context);
                return;
            }

            await next(context);
        });
        return app;
    }

    /// <summary>
    /// Marks a form post that carries no form fields of its own (so the framework would not ask for the token) as
    /// needing a valid antiforgery token.
    /// </summary>
    public static RouteHandlerBuilder RequireAntiforgeryToken(this RouteHandlerBuilder endpoint) =>
        endpoint.WithMetadata(new RequireAntiforgeryTokenAttribute());

    /// <summary>
    /// A sign-in endpoint: attempts count towards the per-address limit (rate limiter) and, where an account is named,
    /// the per-account limit (endpoint filter).
    /// </summary>
    public static RouteHandlerBuilder WithSignInLimits(this RouteHandlerBuilder endpoint, bool returnsToForm = false) =>
        endpoint.RequireRateLimiting(SignInPolicy)
            .WithMetadata(new SignInEndpoint(returnsToForm))
            .AddEndpointFilter((invocation, next) =>
                invocation.HttpContext.RequestServices.GetRequiredService<SignInAttempts>().FilterAsync(invocation, next));

    private static bool IsHealthProbe(HttpRequest request) =>
        request.Path.Equals(OperationsSetup.LivePath, StringComparison.OrdinalIgnoreCase)
        || request.Path.Equals(OperationsSetup.ReadyPath, StringComparison.OrdinalIgnoreCase);

    private static async Task RefuseFormAsync(HttpContext context)
    {
        context.Response.StatusCode = StatusCodes.Status400BadRequest;
        if (context.Request.Headers.Accept.ToString().Contains("text/html", StringComparison.OrdinalIgnoreCase))
        {
            context.Response.ContentType = "text/html; charset=utf-8";
            await context.Response.WriteAsync(
                "<!DOCTYPE html><html lang=\"en\"><head><meta charset=\"utf-8\"><title>Form not accepted · Decide</title></head>" +
                $"<body><main><h1>Form not accepted</h1><p>{WebUtility.HtmlEncode(FormNotVerified)}</p>" +
                "<p><a href=\"/\">Back to Decide</a></p></main></body></html>");
            return;
        }

        await TypedResults.Problem(statusCode: StatusCodes.Status400BadRequest, title: "Form not verified", detail: FormNotVerified)
            .ExecuteAsync(context);
    }
}
