namespace Decide.Web.Components.Shared;

/// <summary>Runs a service call for a screen and turns a refusal into a <see cref="ProblemText"/> to show.</summary>
public static class Attempt
{
    /// <summary>The result, or the problem to show (unexpected failures are logged and shown without internals).</summary>
    public static async Task<(T? Value, ProblemText? Problem)> RunAsync<T>(Func<Task<T>> work, ILogger log, string what)
    {
        try
        {
            return (await work(), null);
        }
        catch (Exception e) when (ProblemText.From(e) is { } problem)
        {
            return (default, problem);
        }
        catch (Exception e) when (e is not OperationCanceledException)
        {
            log.LogError(e, "Failed while {What}", what);
            return (default, ProblemText.Unexpected);
        }
    }
}
