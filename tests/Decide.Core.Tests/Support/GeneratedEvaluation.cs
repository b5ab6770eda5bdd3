using Decide.Core.Model;

namespace Decide.Core.Tests.Support;

/// <summary>
/// A random valid evaluation together with the seed that produced it, so that a failing property names the seed
/// and <c>EvaluationGenerator.Generate(seed)</c> reproduces the case exactly.
/// </summary>
public sealed record GeneratedEvaluation(int Seed, Evaluation Evaluation)
{
    /// <inheritdoc />
    public override string ToString() =>
        $"seed {Seed}: {Evaluation.Alternatives.Count} alternatives, {Evaluation.Criteria.Count} criteria "
        + $"({string.Join(", ", Evaluation.Criteria.Select(c => $"{c.Id} {c.Kind} {c.Direction}"))}), "
        + $"{Evaluation.Assessors.Count} assessors, {Evaluation.RatingScale.Name}, {Evaluation.Options}";
}
