namespace Decide.Core;

/// <summary>
/// One reason why an evaluation cannot be analysed, with the place it concerns.
/// </summary>
/// <param name="Path">
/// Where the problem is, as a JSON path into the portable evaluation file (for example
/// <c>$.ratings.D2.S4.C3</c>); the engine's input model has the same shape as that file, so the path also
/// names the place in the model.
/// </param>
/// <param name="Reason">What is wrong and, where it helps, what would be accepted. One sentence, no jargon.</param>
public sealed record EvaluationError(string Path, string Reason)
{
    /// <inheritdoc />
    public override string ToString() => $"{Path}: {Reason}";
}

/// <summary>
/// Thrown when input cannot be analysed. Carries every problem found, not just the first, so that a user can
/// fix them all in one pass.
/// </summary>
public sealed class InvalidEvaluationException : Exception
{
    /// <summary>Creates the exception from one or more errors.</summary>
    public InvalidEvaluationException(IReadOnlyList<EvaluationError> errors)
        : base(Describe(errors)) => Errors = errors;

    /// <summary>Creates the exception from a single error.</summary>
    public InvalidEvaluationException(string path, string reason)
        : this([new EvaluationError(path, reason)])
    {
    }

    /// <summary>Every problem found, in document order where that is known.</summary>
    public IReadOnlyList<EvaluationError> Errors { get; }

    private static string Describe(IReadOnlyList<EvaluationError> errors) => errors.Count switch
    {
        0 => "The evaluation is invalid.",
        1 => errors[0].ToString(),
        _ => $"{errors.Count} problems, the first: {errors[0]}",
    };
}

/// <summary>Collects errors while a validator walks its input.</summary>
internal sealed class ErrorList
{
    private readonly List<EvaluationError> _errors = [];

    public int Count => _errors.Count;

    public void Add(string path, string reason) => _errors.Add(new EvaluationError(path, reason));

    public void AddRange(IEnumerable<EvaluationError> errors) => _errors.AddRange(errors);

    public void ThrowIfAny()
    {
        if (_errors.Count > 0)
        {
            throw new InvalidEvaluationException(_errors.ToArray());
        }
    }
}
