using Decide.Web.Features.SignOff;
using Microsoft.AspNetCore.Http.HttpResults;

namespace Decide.Web.Api;

/// <summary>Approvals and sign-off.</summary>
public static class SignOffEndpoints
{
    public static RouteGroupBuilder MapSignOffEndpoints(this RouteGroupBuilder api)
    {
        var group = api.MapGroup("/evaluations/{id:guid}/approvals").WithTags("Sign-off").RequireAuthorization();
        group.MapGet("/", List).WithSummary("Approvals so far and whether the evaluation is signed off (facilitator, observer, approver).");
        group.MapPost("/request", Request)
            .WithSummary("Ask the approvers to sign off, with a note (facilitator, moderation, every sheet submitted).");
        group.MapPost("/", Approve)
            .WithSummary("Approve with your password and a statement (approver, moderation); the last required approval signs the evaluation off.");
        return api;
    }

    private static async Task<Ok<SignOffState>> List(Guid id, SignOffService service, CancellationToken ct) =>
        TypedResults.Ok(await service.GetAsync(id, ct));

    private static async Task<Ok<SignOffState>> Request(Guid id, SignOffRequest request, SignOffService service, CancellationToken ct) =>
        TypedResults.Ok(await service.RequestAsync(id, request, ct));

    private static async Task<Ok<SignOffState>> Approve(Guid id, ApprovalRequest request, SignOffService service, CancellationToken ct) =>
        TypedResults.Ok(await service.ApproveAsync(id, request, ct));
}
