using Decide.Data;
using Microsoft.AspNetCore.Diagnostics.HealthChecks;
using Microsoft.AspNetCore.HttpOverrides;
using Microsoft.Extensions.Diagnostics.HealthChecks;

namespace Decide.Web.Infrastructure;

/// <summary>
/// What operators need from each instance: liveness and readiness probes, logs as JSON lines with the request id
/// (<c>Logging:Format=json</c>), and the client's scheme and address as the reverse proxy saw them.
/// </summary>
public static class OperationsSetup
{
    /// <summary>Liveness: the process answers. Used by the container's health check.</summary>
    public const string LivePath = "/health/live";

    /// <summary>Readiness: the process answers and its database does; the proxy sends traffic only then.</summary>
    public const string ReadyPath = "/health/ready";

    public static WebApplicationBuilder AddDecideOperations(this WebApplicationBuilder builder)
    {
        builder.Services.AddHealthChecks().AddDbContextCheck<DecideDbContext>("database", tags: ["ready"]);

        if (string.Equals(builder.Configuration["Logging:Format"], "json", StringComparison.OrdinalIgnoreCase))
        {
            // One JSON object per line; scopes carry RequestId, TraceId and SpanId for every entry of a request.
            builder.Logging.ClearProviders();
            builder.Logging.AddJsonConsole(o =>
            {
                o.IncludeScopes = true;
                o.UseUtcTimestamp = true;
                o.TimestampFormat = "yyyy-MM-ddTHH:mm:ss.fffZ ";
            });
            builder.Logging.Configure(o => o.ActivityTrackingOptions =
                ActivityTrackingOptions.TraceId | ActivityTrackingOptions.SpanId);
        }

        // Behind the reverse proxy: trust X-Forwarded-For/Proto from the proxies the deployment names
        // (Proxy:KnownNetworks, CIDR list); without it, forwarded headers are ignored.
        builder.Services.Configure<ForwardedHeadersOptions>(o =>
        {
            o.ForwardedHeaders = ForwardedHeaders.XForwardedFor | ForwardedHeaders.XForwardedProto;
            foreach (var network in builder.Configuration.GetSection("Proxy:KnownNetworks").Get<string[]>() ?? [])
            {
                o.KnownIPNetworks.Add(System.Net.IPNetwork.Parse(network));
            }
        });
        return builder;
    }

    public static WebApplication UseDecideForwardedHeaders(this WebApplication app)
    {
        app.UseForwardedHeaders();
        return app;
    }

    public static WebApplication MapDecideOperations(this WebApplication app)
    {
        app.MapHealthChecks(LivePath, new HealthCheckOptions { Predicate = _ => false }).AllowAnonymous();
        app.MapHealthChecks(ReadyPath, new HealthCheckOptions
        {
            Predicate = check => check.Tags.Contains("ready"),
            ResultStatusCodes =
            {
                [HealthStatus.Healthy] = StatusCodes.Status200OK,
                [HealthStatus.Degraded] = StatusCodes.Status200OK,
                [HealthStatus.Unhealthy] = StatusCodes.Status503ServiceUnavailable,
            },
        }).AllowAnonymous();
        return app;
    }
}
