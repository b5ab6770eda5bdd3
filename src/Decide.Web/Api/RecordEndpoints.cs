using Decide.Web.Features.Records;
using Decide.Web.Infrastructure;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.AspNetCore.Mvc;

namespace Decide.Web.Api;

/// <summary>The signed evaluation record, feedback letters, and checking a record someone holds.</summary>
public static class RecordEndpoints
{
    private const string Pdf = "application/pdf";

    public static RouteGroupBuilder MapRecordEndpoints(this RouteGroupBuilder api)
    {
        var group = api.MapGroup("/").WithTags("Records").RequireAuthorization();
        group.MapGet("/evaluations/{id:guid}/records", List)
            .WithSummary("Documents archived for the evaluation: the signed record and feedback letters (facilitator, observer, approver).");
        group.MapGet("/evaluations/{id:guid}/record", Record)
            .WithSummary("The signed evaluation record as PDF, with the evaluation file embedded (facilitator, observer, approver; after sign-off).");
        group.MapGet("/evaluations/{id:guid}/feedback/{bid}", Feedback)
            .WithSummary("A feedback letter for one bidder as PDF: its scores and the winner's, with the panel's reasons, nothing about other bidders (facilitator; after sign-off).");
        group.MapPost("/records/verification", Verify)
            .WithMetadata(new RequestSizeLimitAttribute(RequestLimits.MaxRecordBytes))
            .WithSummary("Check a record: send the PDF as the body (Content-Type: application/pdf). Signature, unchanged since signing, embedded evaluation, re-analysis and archive match are answered separately.");
        return api;
    }

    private static async Task<Ok<IReadOnlyList<ArchivedRecordView>>> List(Guid id, RecordService records, CancellationToken ct) =>
        TypedResults.Ok(await records.ListAsync(id, ct));

    private static async Task<FileContentHttpResult> Record(Guid id, RecordService records, CancellationToken ct)
    {
        var file = await records.GetRecordAsync(id, ct);
        return TypedResults.File(file.Content, Pdf, file.FileName);
    }

    private static async Task<FileContentHttpResult> Feedback(Guid id, string bid, RecordService records, CancellationToken ct)
    {
        var file = await records.GetFeedbackAsync(id, bid, ct);
        return TypedResults.File(file.Content, Pdf, file.FileName);
    }

    private static async Task<Ok<RecordVerificationView>> Verify(HttpRequest request, RecordService records, CancellationToken ct)
    {
        if (request.ContentType?.StartsWith(Pdf, StringComparison.OrdinalIgnoreCase) != true)
        {
            throw DomainProblem.Invalid("body", "send the record itself as the body with Content-Type: application/pdf");
        }

        using var buffer = new MemoryStream();
        await request.Body.CopyToAsync(buffer, ct);
        return TypedResults.Ok(await records.VerifyAsync(buffer.ToArray(), ct));
    }
}
