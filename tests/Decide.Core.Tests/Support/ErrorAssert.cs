using Decide.Core.Analysis;
using Decide.Core.Model;

namespace Decide.Core.Tests.Support;

/// <summary>Assertions on the errors the engine reports for bad input.</summary>
public static class ErrorAssert
{
    /// <summary>
    /// Analyses <paramref name="evaluation"/>, expects it to be refused, and returns the reported errors.
    /// </summary>
    public static IReadOnlyList<EvaluationError> Refused(Evaluation evaluation)
    {
        var exception = Assert.Throws<InvalidEvaluationException>(() => DecisionEngine.Analyse(evaluation));
        Assert.NotEmpty(exception.Errors);
        return exception.Errors;
    }

    /// <summary>
    /// Asserts that exactly one error has <paramref name="path"/> and that its reason contains each fragment
    /// (ordinal comparison).
    /// </summary>
    public static EvaluationError HasError(IReadOnlyList<EvaluationError> errors, string path, params string[] fragments)
    {
        var atPath = errors.Where(e => e.Path == path).ToArray();
        Assert.True(atPath.Length == 1,
            $"Expected one error at {path}; got {atPath.Length}. All errors:\n{string.Join("\n", errors)}");
        foreach (var fragment in fragments)
        {
            Assert.Contains(fragment, atPath[0].Reason, StringComparison.Ordinal);
        }

        return atPath[0];
    }
}
