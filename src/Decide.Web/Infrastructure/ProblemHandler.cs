using Decide.Core;
using Decide.Data.Storage;
using Microsoft.AspNetCore.Diagnostics;
using Microsoft.AspNetCore.Mvc;

namespace Decide.Web.Infrastructure;

/// <summary>
/// Turns refused requests into RFC 9457 problem details: <see cref="DomainProblem"/> with its status, the engine's
/// <see cref="InvalidEvaluationException"/> as 400 with every error by JSON path, malformed request bodies as 400,
/// a text longer than its column as 400 naming it (<see cref="TextTooLongException"/>), a body over its size limit as
/// 413 naming the limit (<see cref="RequestLimits"/>), and anything unexpected as a
/// 500 without internals.
/// </summary>
public sealed class ProblemHandler(IProblemDetailsService problems, ILogger<ProblemHandler> logger) : IExceptionHandler
{
    public async ValueTask<bool> TryHandleAsync(HttpContext context, Exception exception, CancellationToken cancellationToken)
    {
        var problem = RequestLimits.IsOverLimit(exception) ? Build(StatusCodes.Status413PayloadTooLarge, "Request too large",
                $"The request body is larger than the limit of {RequestLimits.Describe(BodyLimit(context))} for this address; nothing was read or saved.", null, null)
            : exception switch
        {
            DomainProblem p => Build(p.Status, p.Title, p.Detail, p.Errors, p.Extensions),
            TextTooLongException t => Build(StatusCodes.Status400BadRequest, "Text too long", t.Message, t.Errors, null),
            InvalidEvaluationException e => Build(StatusCodes.Status400BadRequest, "Invalid evaluation",
                $"{e.Errors.Count} problem(s); the first: {e.Errors[0]}",
                e.Errors.GroupBy(x => x.Path).ToDictionary(g => g.Key, g => g.Select(x => x.Reason).ToArray()), null),
            BadHttpRequestException b => Build(b.StatusCode, "Bad request", Plain(b), null, null),
            _ => null,
        };

        if (problem is null)
        {
            logger.LogError(exception, "Unhandled exception for {Method} {Path}", context.Request.Method, context.Request.Path);
            problem = Build(StatusCodes.Status500InternalServerError, "Unexpected error",
                "The server could not complete the request; nothing was saved. The error has been logged.", null, null);
        }

        context.Response.StatusCode = problem.Status ?? 500;
        return await problems.TryWriteAsync(new ProblemDetailsContext { HttpContext = context, ProblemDetails = problem, Exception = exception });
    }

    private static ProblemDetails Build(int status, string title, string detail, IReadOnlyDictionary<string, string[]>? errors, IDictionary<string, object?>? extensions)
    {
        var problem = errors is null ? new ProblemDetails() : new ValidationProblemDetails(errors.ToDictionary(x => x.Key, x => x.Value));
        problem.Status = status;
        problem.Title = title;
        problem.Detail = detail;
        foreach (var (key, value) in extensions ?? new Dictionary<string, object?>())
        {
            problem.Extensions[key] = value;
        }

        return problem;
    }

    /// <summary>The body limit in force for this request (an endpoint may have its own, see <see cref="RequestLimits"/>).</summary>
    private static long BodyLimit(HttpContext context) =>
        context.Features.Get<Microsoft.AspNetCore.Http.Features.IHttpMaxRequestBodySizeFeature>()?.MaxRequestBodySize ?? RequestLimits.MaxRequestBodyBytes;

    private static string Plain(BadHttpRequestException b) =>
        b.InnerException is System.Text.Json.JsonException json
            ? $"The request body is not valid JSON for this endpoint: {json.Message}"
            : b.Message;
}
