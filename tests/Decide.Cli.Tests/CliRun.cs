namespace Decide.Cli.Tests;

/// <summary>One in-process run of <c>decide</c>: exit code and what it printed.</summary>
internal sealed record CliRun(int ExitCode, string Stdout, string Stderr)
{
    public static CliRun Of(params string[] args)
    {
        using var stdout = new StringWriter();
        using var stderr = new StringWriter();
        var code = Program.Run(args, stdout, stderr);
        return new CliRun(code, stdout.ToString(), stderr.ToString());
    }

    public string[] StderrLines => Stderr.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
}
