using Decide.Core.Robustness;
using Decide.Interchange;
using Decide.Web.Infrastructure;

namespace Decide.Web.Features.Results;

/// <summary>
/// Stateless analysis: any signed-in user sends a portable evaluation file and gets its results with robustness.
/// Nothing is stored, not even an audit entry: the file never leaves the request.
/// </summary>
public sealed class AnalysisService(CurrentUser user)
{
    /// <summary>Reads the whole body (at most <see cref="RequestLimits.MaxRequestBodyBytes"/>, whatever the server) and analyses it.</summary>
    /// <exception cref="Decide.Core.InvalidEvaluationException">The file is not valid; every problem by JSON path.</exception>
    public async Task<ResultsJson> AnalyseAsync(Stream body, RobustnessOptions options, CancellationToken ct = default)
    {
        _ = user.Id; // 401 for a caller who is not signed in
        using var buffer = new MemoryStream();
        var chunk = new byte[81920];
        int read;
        while ((read = await body.ReadAsync(chunk, ct)) > 0)
        {
            if (buffer.Length + read > RequestLimits.MaxRequestBodyBytes)
            {
                throw new DomainProblem(StatusCodes.Status413PayloadTooLarge, "File too large",
                    $"The evaluation file is larger than the limit of {RequestLimits.Describe(RequestLimits.MaxRequestBodyBytes)}.");
            }

            buffer.Write(chunk, 0, read);
        }

        if (buffer.Length == 0)
        {
            throw DomainProblem.Invalid("$", "send a decide-evaluation/1 file as the request body");
        }

        buffer.Position = 0;
        var file = EvaluationFileReader.Read(buffer);
        return ResultsComputation.Run(file, options);
    }
}
