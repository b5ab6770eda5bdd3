using Decide.Core.Model;

namespace Decide.Core.Tests.Support;

/// <summary>
/// A random valid evaluation of any shape, with the seed that produced it: a failing property names the seed and
/// <c>PanelGenerator.Generate(seed)</c> reproduces the case exactly.
/// </summary>
public sealed record AnyPanel(int Seed, Evaluation Evaluation)
{
    /// <inheritdoc />
    public override string ToString() =>
        $"seed {Seed}: {Evaluation.Alternatives.Count} alternatives, "
        + $"criteria {string.Join(", ", Evaluation.Criteria.Select(c => $"{c.Id} {c.Kind} {c.Direction}{(c.Group is null ? "" : " in " + c.Group)}"))}, "
        + $"{Evaluation.Assessors.Count} assessors, {Evaluation.Weighting} weighting on {Evaluation.ImportanceScale.Name}, "
        + $"{Evaluation.RatingScale.Name}, {Evaluation.Gates.Count(g => !g.Passed)} failed gates, "
        + $"{Evaluation.Moderated.Count} moderated cells, {Evaluation.Options}";
}
