using Decide.Web.Features.Evaluations;
using Microsoft.AspNetCore.Http.HttpResults;

namespace Decide.Web.Api;

/// <summary>Evaluations: create, list, read, set up, and move through the lifecycle.</summary>
public static class EvaluationEndpoints
{
    public static RouteGroupBuilder MapEvaluationEndpoints(this RouteGroupBuilder api)
    {
        var group = api.MapGroup("/evaluations").WithTags("Evaluations").RequireAuthorization();
        group.MapGet("/", List).WithSummary("Evaluations the caller takes part in (all, for an administrator).");
        group.MapPost("/", Create).WithSummary("Create an evaluation and name its facilitator (administrator).");
        group.MapGet("/{id:guid}", Get).WithSummary("One evaluation as the caller may see it.");
        group.MapGet("/{id:guid}/setup", Setup).WithSummary("The seats with e-mail addresses and what stops the plan from being locked (facilitator).");
        group.MapPut("/{id:guid}/plan", UpdatePlan).WithSummary("Replace the plan (facilitator, setup only).");
        group.MapPut("/{id:guid}/panel", UpdatePanel).WithSummary("Replace the panel's seats (facilitator, setup only).");
        group.MapPut("/{id:guid}/bids", UpdateBids).WithSummary("Replace the list of bids (facilitator, before scoring).");
        group.MapPost("/{id:guid}/bids/import", ImportBids)
            .WithSummary("Read a list of bids or applications from a spreadsheet (.xlsx) or CSV file (base64): every problem by sheet, row and column; with preview nothing is stored, otherwise it replaces the list (facilitator, before scoring).");
        group.MapPost("/{id:guid}/lock-plan", LockPlan).WithSummary("Freeze the plan and the weights (facilitator).");
        group.MapPost("/{id:guid}/open-scoring", OpenScoring).WithSummary("Open scoring (facilitator).");
        group.MapPost("/{id:guid}/start-moderation", StartModeration).WithSummary("Close scoring and start moderation (facilitator).");
        group.MapPost("/{id:guid}/open-prices", OpenPrices).WithSummary("Two stages: close quality moderation and open the prices (facilitator, moderation).");
        group.MapPost("/{id:guid}/revisions", NewRevision).WithSummary("Open a new revision with a written reason (facilitator).");
        group.MapPut("/{id:guid}/legal-hold", LegalHold).WithSummary("Set or lift a legal hold (administrator).");
        return api;
    }

    private static async Task<Ok<ImportBidsView>> ImportBids(Guid id, ImportBidsRequest request, EvaluationService service, CancellationToken ct) =>
        TypedResults.Ok(await service.ImportBidsAsync(id, request, ct));

    private static async Task<Ok<IReadOnlyList<EvaluationSummary>>> List(EvaluationService service, CancellationToken ct) =>
        TypedResults.Ok(await service.ListAsync(ct));

    private static async Task<Created<EvaluationSummary>> Create(CreateEvaluationRequest request, EvaluationService service, CancellationToken ct)
    {
        var created = await service.CreateAsync(request, ct);
        return TypedResults.Created($"/api/evaluations/{created.Id}", created);
    }

    private static async Task<Ok<EvaluationDetail>> Get(Guid id, EvaluationService service, CancellationToken ct) =>
        TypedResults.Ok(await service.GetAsync(id, ct));

    private static async Task<Ok<SetupView>> Setup(Guid id, EvaluationService service, CancellationToken ct) =>
        TypedResults.Ok(await service.GetSetupAsync(id, ct));

    private static async Task<Ok<EvaluationSummary>> UpdatePlan(Guid id, UpdatePlanRequest request, EvaluationService service, CancellationToken ct) =>
        TypedResults.Ok(await service.UpdatePlanAsync(id, request, ct));

    private static async Task<Ok<EvaluationSummary>> UpdatePanel(Guid id, UpdatePanelRequest request, EvaluationService service, CancellationToken ct) =>
        TypedResults.Ok(await service.UpdatePanelAsync(id, request, ct));

    private static async Task<Ok<EvaluationSummary>> UpdateBids(Guid id, UpdateBidsRequest request, EvaluationService service, CancellationToken ct) =>
        TypedResults.Ok(await service.UpdateBidsAsync(id, request, ct));

    private static async Task<Ok<TransitionResult>> LockPlan(Guid id, TransitionRequest request, EvaluationLifecycleService service, CancellationToken ct) =>
        TypedResults.Ok(await service.LockPlanAsync(id, request, ct));

    private static async Task<Ok<TransitionResult>> OpenScoring(Guid id, TransitionRequest request, EvaluationLifecycleService service, CancellationToken ct) =>
        TypedResults.Ok(await service.OpenScoringAsync(id, request, ct));

    private static async Task<Ok<TransitionResult>> StartModeration(Guid id, TransitionRequest request, EvaluationLifecycleService service, CancellationToken ct) =>
        TypedResults.Ok(await service.StartModerationAsync(id, request, ct));

    private static async Task<Ok<TransitionResult>> OpenPrices(Guid id, TransitionRequest request, EvaluationLifecycleService service, CancellationToken ct) =>
        TypedResults.Ok(await service.OpenPricesAsync(id, request, ct));

    private static async Task<Created<EvaluationSummary>> NewRevision(Guid id, RevisionRequest request, EvaluationLifecycleService service, CancellationToken ct)
    {
        var next = await service.NewRevisionAsync(id, request, ct);
        return TypedResults.Created($"/api/evaluations/{next.Id}", next);
    }

    private static async Task<Ok<EvaluationSummary>> LegalHold(Guid id, LegalHoldRequest request, EvaluationLifecycleService service, CancellationToken ct) =>
        TypedResults.Ok(await service.SetLegalHoldAsync(id, request, ct));
}
