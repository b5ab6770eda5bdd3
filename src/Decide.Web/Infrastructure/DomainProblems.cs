namespace Decide.Web.Infrastructure;

/// <summary>
/// A request the service refuses for a reason the user can act on. Turned into RFC 9457 problem details by
/// <see cref="ProblemHandler"/>; nothing has been saved when it is thrown.
/// </summary>
public class DomainProblem(int status, string title, string detail, IReadOnlyDictionary<string, string[]>? errors = null)
    : Exception(detail)
{
    public int Status { get; } = status;

    public string Title { get; } = title;

    public string Detail { get; } = detail;

    /// <summary>Field (JSON path or parameter) → reasons.</summary>
    public IReadOnlyDictionary<string, string[]>? Errors { get; } = errors;

    /// <summary>Extra members for the problem document (for example the current state after a conflict).</summary>
    public IDictionary<string, object?> Extensions { get; } = new Dictionary<string, object?>();

    public static DomainProblem NotFound(string what) =>
        new(StatusCodes.Status404NotFound, "Not found", $"{what} does not exist or is not visible to you.");

    public static DomainProblem Forbidden(string why) =>
        new(StatusCodes.Status403Forbidden, "Not allowed", why);

    /// <summary>A rule of the evaluation's stage refuses the change (for example the plan is locked).</summary>
    public static DomainProblem Stage(string why) =>
        new(StatusCodes.Status409Conflict, "Not allowed at this stage", why);

    /// <summary>Someone else changed the item first; <paramref name="current"/> is what is stored now.</summary>
    public static DomainProblem Concurrency(string what, object? current)
    {
        var problem = new DomainProblem(StatusCodes.Status409Conflict, "Changed by someone else",
            $"{what} was changed by someone else since you read it; nothing was saved. The current state is included: re-apply your change to it.");
        problem.Extensions["current"] = current;
        return problem;
    }

    /// <summary>Input that breaks a rule; <paramref name="field"/> names the place.</summary>
    public static DomainProblem Invalid(string field, string reason) =>
        new(StatusCodes.Status400BadRequest, "Invalid input", $"{field}: {reason}", new Dictionary<string, string[]> { [field] = [reason] });

    /// <summary>Several invalid inputs at once.</summary>
    public static DomainProblem Invalid(IReadOnlyDictionary<string, string[]> errors) =>
        new(StatusCodes.Status400BadRequest, "Invalid input",
            $"{errors.Count} problem(s); the first: {errors.First().Key}: {errors.First().Value[0]}", errors);
}
