using Decide.Data;
using Decide.Web.Features.Audit;
using Microsoft.AspNetCore.Http.HttpResults;

namespace Decide.Web.Api;

/// <summary>The audit trail and its verification.</summary>
public static class AuditEndpoints
{
    public static RouteGroupBuilder MapAuditEndpoints(this RouteGroupBuilder api)
    {
        var group = api.MapGroup("/").WithTags("Audit").RequireAuthorization();
        group.MapGet("/evaluations/{id:guid}/audit", List).WithSummary("The evaluation's audit trail, oldest first.");
        group.MapGet("/evaluations/{id:guid}/audit/verification", Verify).WithSummary("Verify the evaluation's audit chain; names every edited, inserted or deleted entry.");
        group.MapGet("/audit/verification", VerifyAll).WithSummary("Verify every audit chain (administrator).");
        return api;
    }

    private static async Task<Ok<IReadOnlyList<AuditEntryView>>> List(Guid id, AuditService audit, CancellationToken ct) =>
        TypedResults.Ok(await audit.ListAsync(id, ct));

    private static async Task<Ok<AuditVerification>> Verify(Guid id, AuditService audit, CancellationToken ct) =>
        TypedResults.Ok(await audit.VerifyAsync(id, ct));

    private static async Task<Ok<AuditVerification>> VerifyAll(AuditService audit, CancellationToken ct) =>
        TypedResults.Ok(await audit.VerifyAllAsync(ct));
}
