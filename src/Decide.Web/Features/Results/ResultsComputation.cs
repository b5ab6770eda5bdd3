using System.Security.Cryptography;
using System.Text;
using Decide.Core;
using Decide.Core.Analysis;
using Decide.Core.Robustness;
using Decide.Interchange;

namespace Decide.Web.Features.Results;

/// <summary>A results document and the SHA-256 of its text (recorded in the audit trail).</summary>
public sealed record ResultsJson(string Json, string Sha256);

/// <summary>Runs the engine on a portable evaluation: the analysis, then robustness, as one results document.</summary>
public static class ResultsComputation
{
    /// <summary>The full results document (<c>decide-results/1</c>) with sensitivity, agreement and summary, and the points award when the plan publishes one.</summary>
    /// <exception cref="Decide.Core.InvalidEvaluationException">The evaluation cannot be analysed; every problem by JSON path.</exception>
    public static ResultsJson Run(EvaluationFile file, RobustnessOptions options)
    {
        var json = ResultsWriter.ToJson(ResultsWriter.CreateDocument(DecisionRun.Of(file.Evaluation, options), file.Evaluation));
        return new ResultsJson(json, Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(json))));
    }
}
