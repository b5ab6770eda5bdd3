using Decide.Recordkeeping;
using System.CommandLine;
using Decide.Reports.Verification;

namespace Decide.Cli;

/// <summary>
/// <c>decide verify FILE.pdf</c>: checks a signed evaluation record and prints each check. Exit 0 only when every
/// check passes; otherwise <see cref="ExitCodes.VerificationFailed"/> with the failing checks named on stderr.
/// </summary>
public sealed class VerifyCommand
{
    private readonly TextWriter _stdout;
    private readonly TextWriter _stderr;

    private readonly Argument<string> _file = new("file") { Description = "The signed evaluation record (PDF)." };

    /// <summary>Creates the command.</summary>
    public VerifyCommand(TextWriter stdout, TextWriter stderr)
    {
        _stdout = stdout;
        _stderr = stderr;
        Command = new Command("verify", "Check a signed evaluation record: signature, unchanged since signing, embedded evaluation, and that it re-analyses to the printed figures.");
        Command.Arguments.Add(_file);
        Command.SetAction(parse => Execute(parse.GetValue(_file)!));
    }

    /// <summary>The command to add to the tree.</summary>
    public Command Command { get; }

    /// <summary>Verifies <paramref name="file"/>; returns an <see cref="ExitCodes"/> value.</summary>
    public int Execute(string file) => CommandGuard.Run(_stderr, () =>
    {
        byte[] pdf;
        try
        {
            pdf = File.ReadAllBytes(file);
        }
        catch (Exception ex) when (ex is FileNotFoundException or DirectoryNotFoundException)
        {
            throw new InputFileException(file, "no such file");
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            throw new InputFileException(file, Directory.Exists(file) ? "is a folder, not a file" : $"cannot be read: {ex.Message}");
        }

        var report = RecordVerifier.Verify(pdf, PrintedFigures.Check);
        foreach (var check in report.Checks)
        {
            _stdout.WriteLine($"{(check.Passed ? "PASS" : "FAIL")}  {check.Name}: {check.Detail}");
        }

        if (report.AllPassed)
        {
            return ExitCodes.Success;
        }

        _stderr.WriteLine($"{file}: verification failed: {string.Join("; ", report.Failed.Select(c => c.Name))}");
        return ExitCodes.VerificationFailed;
    });
}
