using Decide.Web.Features.Evaluations;
using Decide.Web.Features.Exchange;
using Microsoft.AspNetCore.Http.HttpResults;

namespace Decide.Web.Api;

/// <summary>Export and import of the portable evaluation file; spreadsheet extracts.</summary>
public static class ExchangeEndpoints
{
    public static RouteGroupBuilder MapExchangeEndpoints(this RouteGroupBuilder api)
    {
        var group = api.MapGroup("/evaluations").WithTags("Exchange").RequireAuthorization();
        group.MapGet("/{id:guid}/export", Export)
            .WithSummary("The whole evaluation as a decide-evaluation/1 file to download (facilitator, observer, approver).");
        group.MapGet("/{id:guid}/export/ratings.csv", RatingsCsv)
            .WithSummary("Every rating with rationale, declined reason and moderated value, as spreadsheet-safe CSV (facilitator, observer, approver).");
        group.MapGet("/{id:guid}/export/results.csv", ResultsCsv)
            .WithSummary("The ranking (rank, bidder, closeness, d+, d−) as spreadsheet-safe CSV (panel, from moderation on).");
        group.MapGet("/{id:guid}/export/award.csv", AwardCsv)
            .WithSummary("The points award per bid and criterion (score, points), price, price points, total, rank, exclusions and flags, as spreadsheet-safe CSV (panel, from moderation on).");
        group.MapGet("/{id:guid}/methodology.pdf", MethodologyPdf)
            .WithSummary("The evaluation methodology for the tender pack, made from the plan, as a PDF (anyone on the panel; a draft before the plan is locked).");
        group.MapGet("/{id:guid}/methodology.txt", MethodologyText)
            .WithSummary("The evaluation methodology as plain text; its SHA-256 is the fingerprint stored when the plan is locked and printed in the record.");
        group.MapGet("/{id:guid}/export/ratings.xlsx", RatingsXlsx)
            .WithSummary("Every rating with its rationale, declined reason and moderated value, as an .xlsx workbook (facilitator, observer, approver).");
        group.MapGet("/{id:guid}/export/results.xlsx", ResultsXlsx)
            .WithSummary("The ranking and, in a round, the bands and the funding line, as an .xlsx workbook (panel, from moderation on).");
        group.MapGet("/{id:guid}/export/assignment.xlsx", AssignmentXlsx)
            .WithSummary("Who reads which application in a round, as an .xlsx workbook (facilitator, observer, approver).");
        group.MapPost("/import", Import)
            .WithSummary("Store a decide-evaluation/1 file as a new evaluation at stage Setup, naming the facilitator and each assessor's account (administrator).");
        return api;
    }

    private static async Task<FileContentHttpResult> Export(Guid id, ExchangeService service, CancellationToken ct) =>
        Download(await service.ExportAsync(id, ct));

    private static async Task<FileContentHttpResult> RatingsCsv(Guid id, ExchangeService service, CancellationToken ct) =>
        Download(await service.RatingsCsvAsync(id, ct));

    private static async Task<FileContentHttpResult> ResultsCsv(Guid id, ExchangeService service, CancellationToken ct) =>
        Download(await service.ResultsCsvAsync(id, ct));

    private static async Task<FileContentHttpResult> AwardCsv(Guid id, ExchangeService service, CancellationToken ct) =>
        Download(await service.AwardCsvAsync(id, ct));

    private static async Task<FileContentHttpResult> RatingsXlsx(Guid id, ExchangeService service, CancellationToken ct) =>
        Download(await service.RatingsXlsxAsync(id, ct));

    private static async Task<FileContentHttpResult> ResultsXlsx(Guid id, ExchangeService service, CancellationToken ct) =>
        Download(await service.ResultsXlsxAsync(id, ct));

    private static async Task<FileContentHttpResult> AssignmentXlsx(Guid id, ExchangeService service, CancellationToken ct) =>
        Download(await service.AssignmentXlsxAsync(id, ct));

    private static async Task<FileContentHttpResult> MethodologyPdf(Guid id, ExchangeService service, CancellationToken ct) =>
        Download(await service.MethodologyAsync(id, pdf: true, ct));

    private static async Task<FileContentHttpResult> MethodologyText(Guid id, ExchangeService service, CancellationToken ct) =>
        Download(await service.MethodologyAsync(id, pdf: false, ct));

    private static async Task<Created<EvaluationSummary>> Import(ImportRequest request, ExchangeService service, CancellationToken ct)
    {
        var created = await service.ImportAsync(request, ct);
        return TypedResults.Created($"/api/evaluations/{created.Id}", created);
    }

    private static FileContentHttpResult Download(DownloadFile file) =>
        TypedResults.File(file.Content, file.ContentType, file.FileName);
}
