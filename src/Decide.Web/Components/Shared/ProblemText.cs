using Decide.Core;
using Decide.Data.Storage;
using Decide.Web.Infrastructure;

namespace Decide.Web.Components.Shared;

/// <summary>A refusal or an engine error as a message a person can act on; never a stack trace.</summary>
/// <param name="Title">What went wrong, in a few words.</param>
/// <param name="Detail">Why, and what to do.</param>
/// <param name="Errors">Place → reasons, when the input had several problems.</param>
public sealed record ProblemText(string Title, string Detail, IReadOnlyDictionary<string, string[]> Errors)
{
    /// <summary>The message for an exception a service threw, or null when the exception is not one for people.</summary>
    public static ProblemText? From(Exception exception) => exception switch
    {
        DomainProblem p => new ProblemText(p.Title, p.Detail, p.Errors ?? new Dictionary<string, string[]>()),
        TextTooLongException t => new ProblemText("Text too long", t.Message, t.Errors),
        InvalidEvaluationException e => new ProblemText("The evaluation has problems",
            $"{e.Errors.Count} problem(s) must be fixed before the engine can analyse it.",
            e.Errors.GroupBy(x => x.Path).ToDictionary(g => g.Key, g => g.Select(x => x.Reason).ToArray())),
        _ => null,
    };

    /// <summary>For anything else: the work was not done; the details went to the log.</summary>
    public static ProblemText Unexpected { get; } = new("Something went wrong",
        "The server could not complete this; nothing was saved. The error has been logged: try again, and tell your administrator if it happens again.",
        new Dictionary<string, string[]>());

    /// <summary>One line: the detail followed by every error.</summary>
    public string OneLine => Errors.Count == 0
        ? Detail
        : $"{Detail} {string.Join(" ", Errors.Select(e => $"{e.Key}: {string.Join("; ", e.Value)}."))}";

    /// <summary>The reasons given for one field, or null.</summary>
    public string? For(string field) => Errors.TryGetValue(field, out var reasons) ? string.Join("; ", reasons) : null;
}
