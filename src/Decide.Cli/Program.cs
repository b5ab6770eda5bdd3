using System.CommandLine;

namespace Decide.Cli;

/// <summary>The <c>decide</c> command line: the command tree, and how a run turns into an exit code.</summary>
public static class Program
{
    /// <summary>Entry point.</summary>
    public static int Main(string[] args) => Run(args, Console.Out, Console.Error);

    /// <summary>
    /// Parses and runs a command line, writing results to <paramref name="stdout"/> and problems to
    /// <paramref name="stderr"/>. Returns an <see cref="ExitCodes"/> value.
    /// </summary>
    public static int Run(string[] args, TextWriter stdout, TextWriter stderr)
    {
        var parseResult = BuildCommandTree(stdout, stderr).Parse(args);
        if (parseResult.Errors.Count > 0)
        {
            foreach (var error in parseResult.Errors)
            {
                stderr.WriteLine(error.Message);
            }

            stderr.WriteLine("Run 'decide --help' for usage.");
            return ExitCodes.InvalidInput;
        }

        return parseResult.Invoke(new InvocationConfiguration
        {
            Output = stdout,
            Error = stderr,
            EnableDefaultExceptionHandler = false, // each command reports its own failures (CommandGuard)
        });
    }

    /// <summary>The commands <c>decide</c> knows.</summary>
    public static RootCommand BuildCommandTree(TextWriter stdout, TextWriter stderr)
    {
        var root = new RootCommand("Decide: fuzzy multi-criteria evaluation for procurement panels.");
        root.Subcommands.Add(new AnalyseCommand(stdout, stderr).Command);
        root.Subcommands.Add(new ReportCommand(stdout, stderr).Command);
        root.Subcommands.Add(new VerifyCommand(stdout, stderr).Command);
        root.Subcommands.Add(new MethodologyCommand(stdout, stderr).Command);
        return root;
    }
}
