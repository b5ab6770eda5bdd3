using System.Text.Json.Serialization;
using Decide.Web.Api;
using Decide.Web.Features.Accounts;
using Decide.Web.Features.Audit;
using Decide.Web.Features.Evaluations;
using Decide.Web.Features.Inputs;
using Decide.Web.Features.Exchange;
using Decide.Web.Features.Moderation;
using Decide.Web.Features.Records;
using Decide.Web.Features.Award;
using Decide.Web.Features.Results;
using Decide.Web.Features.SignOff;
using Microsoft.AspNetCore.Http.Json;

namespace Decide.Web.Infrastructure;

/// <summary>HTTP plumbing shared by every endpoint: problem details, JSON, OpenAPI, limits, the pipeline.</summary>
public static class ApiSetup
{
    public static WebApplicationBuilder AddDecideApi(this WebApplicationBuilder builder)
    {
        builder.Services.AddSingleton(SigningOptions.Read(builder.Configuration, builder.Environment.ContentRootPath));
        // Refusals made by the framework (no token, wrong content type, body too large) carry no detail of their
        // own; give each a sentence so that every problem document says what to do.
        builder.Services.AddProblemDetails(o => o.CustomizeProblemDetails = c => c.ProblemDetails.Detail ??= c.ProblemDetails.Status switch
        {
            StatusCodes.Status401Unauthorized => "Sign in first: send the bearer token from POST /api/auth/login (Authorization: Bearer …).",
            StatusCodes.Status405MethodNotAllowed => "This address does not accept that HTTP method; see /openapi/v1.json.",
            StatusCodes.Status413PayloadTooLarge => $"The request body is larger than the limit of {RequestLimits.Describe(RequestLimits.MaxRequestBodyBytes)}.",
            StatusCodes.Status415UnsupportedMediaType => "The request body must be JSON: send it with Content-Type: application/json.",
            _ => null,
        });
        builder.Services.AddExceptionHandler<ProblemHandler>();
        builder.Services.AddOpenApi("v1");
        builder.Services.AddHttpContextAccessor();
        builder.Services.Configure<JsonOptions>(o =>
        {
            o.SerializerOptions.Converters.Add(new JsonStringEnumConverter(System.Text.Json.JsonNamingPolicy.CamelCase));
            o.SerializerOptions.MaxDepth = 32;
        });
        builder.WebHost.ConfigureKestrel(k => k.Limits.MaxRequestBodySize = RequestLimits.MaxRequestBodyBytes);

        // Malformed bodies reach the problem handler, which says what is wrong instead of a bare 400.
        builder.Services.Configure<RouteHandlerOptions>(o => o.ThrowOnBadRequest = true);
        return builder;
    }

    public static IServiceCollection AddDecideFeatures(this IServiceCollection services)
    {
        services.AddScoped<CurrentUser>();
        services.AddScoped<AuditWriter>();
        services.AddScoped<EvaluationAccess>();
        services.AddScoped<EvaluationService>();
        services.AddScoped<EvaluationLifecycleService>();
        services.AddScoped<PlanLockCheck>();
        services.AddScoped<AuditService>();
        services.AddScoped<EvaluationComposer>();
        services.AddScoped<AccountService>();
        services.AddScoped<DemoSeeder>();
        services.AddScoped<InputAccess>();
        services.AddScoped<DeclarationService>();
        services.AddScoped<WeightsService>();
        services.AddScoped<RatingSheetService>();
        services.AddScoped<NumericValueService>();
        services.AddScoped<GateService>();
        services.AddScoped<ScoringBoardService>();
        services.AddScoped<ModerationService>();
        services.AddScoped<ResultsService>();
        services.AddScoped<AwardService>();
        services.AddScoped<Features.Rounds.AssignmentService>();
        services.AddScoped<AnalysisService>();
        services.AddScoped<ExchangeService>();
        services.AddScoped<SignOffService>();
        services.AddScoped<RecordService>();
        services.AddSingleton<SigningCertificate>();
        return services;
    }

    public static WebApplication UseDecidePipeline(this WebApplication app)
    {
        app.UseExceptionHandler();
        app.UseStatusCodePages();
        app.UseUtf8RequestBodies();
        app.UseAuthentication();
        app.UseAuthorization();
        return app;
    }

    public static WebApplication MapDecideApi(this WebApplication app)
    {
        app.MapOpenApi("/openapi/{documentName}.json");
        var api = app.MapGroup("/api");
        api.MapAccountEndpoints();
        api.MapEvaluationEndpoints();
        api.MapAuditEndpoints();
        api.MapInputEndpoints();
        api.MapModerationEndpoints();
        api.MapResultsEndpoints();
        api.MapAwardEndpoints();
        api.MapRoundEndpoints();
        api.MapExchangeEndpoints();
        api.MapAnalysisEndpoints();
        api.MapSignOffEndpoints();
        api.MapRecordEndpoints();
        return app;
    }
}
