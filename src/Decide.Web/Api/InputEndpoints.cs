using Decide.Web.Features.Inputs;
using Microsoft.AspNetCore.Http.HttpResults;

namespace Decide.Web.Api;

/// <summary>
/// What assessors, the price evaluator and the facilitator enter: the declaration and conflicts of interest,
/// weight judgements, the rating sheet, numeric values and gate results.
/// </summary>
public static class InputEndpoints
{
    public static RouteGroupBuilder MapInputEndpoints(this RouteGroupBuilder api)
    {
        api.MapGet("/declaration", Declaration).WithTags("Declaration").RequireAuthorization()
            .WithSummary("The conflict-of-interest, confidentiality and independence declaration in force, with its version.");

        var group = api.MapGroup("/evaluations/{id:guid}").RequireAuthorization();
        var declaration = group.MapGroup("/").WithTags("Declaration");
        declaration.MapGet("/declaration", MyDeclaration)
            .WithSummary("The caller's declaration in this evaluation; once scoring is open, the bidders to confirm it against (assessor, price evaluator).");
        declaration.MapPost("/declaration", Sign).WithSummary("Accept the declaration in force (assessor, price evaluator).");
        declaration.MapPost("/declaration/names", ConfirmNames)
            .WithSummary("Confirm the declaration now that the bidders are known, declaring every conflict of interest; each recuses the caller from that bidder.");
        declaration.MapPost("/conflicts", DeclareConflict).WithSummary("Declare one more conflict of interest; recuses the caller from that bidder.");
        declaration.MapGet("/conflicts", Conflicts).WithSummary("Declared conflicts of interest (all for facilitator, observer, approver; one's own otherwise).");

        var weights = group.MapGroup("/my/weights").WithTags("Weights");
        weights.MapGet("/", MyWeights).WithSummary("The caller's weight judgements with live completeness and consistency feedback (assessor).");
        weights.MapPut("/", PutWeights).WithSummary("Replace the caller's weight judgements: importance terms or pairwise comparisons, as the plan weighs (assessor, setup).");
        weights.MapPost("/submit", SubmitWeights).WithSummary("Submit the caller's weight judgements; refused while incomplete, warns when inconsistent (assessor, setup).");

        var sheet = group.MapGroup("/my").WithTags("Rating sheet");
        sheet.MapGet("/sheet", Sheet).WithSummary("The caller's rating sheet: bids × assigned criteria, own cells only, progress (assessor).");
        sheet.MapPut("/ratings/{bid}/{criterion}", Rate).WithSummary("Rate one cell with a term and rationale, or decline it with a reason (assessor, scoring).");
        sheet.MapPost("/submit", SubmitSheet).WithSummary("Submit the rating sheet; refused, listing every missing cell, while incomplete (assessor).");

        var values = group.MapGroup("/values").WithTags("Numeric values");
        values.MapGet("/", Values).WithSummary("Values of the numeric criteria (price evaluator, facilitator, observer, approver; assessors only if prices are visible to them).");
        values.MapPut("/{bid}/{criterion}", PutValue).WithSummary("Enter one numeric value (price evaluator, scoring).");

        var gates = group.MapGroup("/gates").WithTags("Gates");
        gates.MapGet("/", Gates).WithSummary("Pass/fail results of the gate criteria.");
        gates.MapPut("/{bid}/{criterion}", PutGate).WithSummary("Record one gate result; a fail needs a note (facilitator, plan locked or scoring).");
        return api;
    }

    private static Ok<DeclarationView> Declaration() => TypedResults.Ok(DeclarationService.Current());

    private static async Task<Ok<MyDeclarationView>> MyDeclaration(Guid id, DeclarationService service, CancellationToken ct) =>
        TypedResults.Ok(await service.GetMineAsync(id, ct));

    private static async Task<Ok<MyDeclarationView>> Sign(Guid id, SignDeclarationRequest request, DeclarationService service, CancellationToken ct) =>
        TypedResults.Ok(await service.SignAsync(id, request, ct));

    private static async Task<Ok<MyDeclarationView>> ConfirmNames(Guid id, ConfirmNamesRequest request, DeclarationService service, CancellationToken ct) =>
        TypedResults.Ok(await service.ConfirmNamesAsync(id, request, ct));

    private static async Task<Ok<MyDeclarationView>> DeclareConflict(Guid id, ConflictRequest request, DeclarationService service, CancellationToken ct) =>
        TypedResults.Ok(await service.DeclareConflictAsync(id, request, ct));

    private static async Task<Ok<IReadOnlyList<ConflictView>>> Conflicts(Guid id, DeclarationService service, CancellationToken ct) =>
        TypedResults.Ok(await service.ListConflictsAsync(id, ct));

    private static async Task<Ok<WeightsView>> MyWeights(Guid id, WeightsService service, CancellationToken ct) =>
        TypedResults.Ok(await service.GetAsync(id, ct));

    private static async Task<Ok<WeightsView>> PutWeights(Guid id, WeightsRequest request, WeightsService service, CancellationToken ct) =>
        TypedResults.Ok(await service.PutAsync(id, request, ct));

    private static async Task<Ok<WeightsSubmitted>> SubmitWeights(Guid id, WeightsService service, CancellationToken ct) =>
        TypedResults.Ok(await service.SubmitAsync(id, ct));

    private static async Task<Ok<RatingSheetView>> Sheet(Guid id, RatingSheetService service, CancellationToken ct) =>
        TypedResults.Ok(await service.GetAsync(id, ct));

    private static async Task<Ok<SheetCell>> Rate(Guid id, string bid, string criterion, RatingRequest request, RatingSheetService service, CancellationToken ct) =>
        TypedResults.Ok(await service.SaveAsync(id, bid, criterion, request, ct));

    private static async Task<Ok<RatingSheetView>> SubmitSheet(Guid id, RatingSheetService service, CancellationToken ct) =>
        TypedResults.Ok(await service.SubmitAsync(id, ct));

    private static async Task<Ok<ValuesView>> Values(Guid id, NumericValueService service, CancellationToken ct) =>
        TypedResults.Ok(await service.GetAsync(id, ct));

    private static async Task<Ok<ValueCell>> PutValue(Guid id, string bid, string criterion, ValueRequest request, NumericValueService service, CancellationToken ct) =>
        TypedResults.Ok(await service.SaveAsync(id, bid, criterion, request, ct));

    private static async Task<Ok<GatesView>> Gates(Guid id, GateService service, CancellationToken ct) =>
        TypedResults.Ok(await service.GetAsync(id, ct));

    private static async Task<Ok<GateCell>> PutGate(Guid id, string bid, string criterion, GateRequest request, GateService service, CancellationToken ct) =>
        TypedResults.Ok(await service.SaveAsync(id, bid, criterion, request, ct));
}
