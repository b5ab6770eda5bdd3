using System.CommandLine;
using System.Text;
using Decide.Recordkeeping;
using Decide.Reports.Methodology;

namespace Decide.Cli;

/// <summary>
/// <c>decide methodology FILE -o OUT.pdf [--text OUT.txt]</c>: writes the evaluation methodology for the tender pack
/// from a plan (or a whole evaluation file, whose bids and inputs play no part), and prints its fingerprint.
/// </summary>
public sealed class MethodologyCommand
{
    private readonly TextWriter _stdout;
    private readonly TextWriter _stderr;
    private readonly TimeProvider _clock;

    private readonly Argument<string> _file = new("file") { Description = "The plan or evaluation file (decide-evaluation/1)." };

    private readonly Option<string> _output = new("--output", "-o")
    {
        Description = "Where to write the PDF.",
        Required = true,
        HelpName = "OUT.pdf",
    };

    private readonly Option<string?> _text = new("--text")
    {
        Description = "Where to write the plain-text version too (its SHA-256 is the fingerprint).",
        HelpName = "OUT.txt",
    };

    /// <summary>Creates the command.</summary>
    public MethodologyCommand(TextWriter stdout, TextWriter stderr, TimeProvider? clock = null)
    {
        _stdout = stdout;
        _stderr = stderr;
        _clock = clock ?? TimeProvider.System;
        Command = new Command("methodology", "Write the evaluation methodology for the tender pack (PDF, and plain text with --text) from a plan.");
        Command.Arguments.Add(_file);
        Command.Options.Add(_output);
        Command.Options.Add(_text);
        Command.SetAction(parse => Execute(parse.GetValue(_file)!, parse.GetValue(_output)!, parse.GetValue(_text)));
    }

    /// <summary>The command to add to the tree.</summary>
    public Command Command { get; }

    /// <summary>Reads the plan, writes the methodology; returns an <see cref="ExitCodes"/> value.</summary>
    public int Execute(string file, string output, string? text) => CommandGuard.Run(_stderr, () =>
    {
        var input = MethodologyInputs.From(CommandGuard.ReadPlan(file));
        Write(output, MethodologyDocument.Pdf(input, _clock.GetUtcNow()));
        if (text is not null)
        {
            Write(text, Encoding.UTF8.GetBytes(MethodologyDocument.Text(input)));
        }

        _stdout.WriteLine($"Wrote {output}{(text is null ? "" : $" and {text}")}.");
        _stdout.WriteLine($"Fingerprint (SHA-256 of the text version): {MethodologyDocument.Fingerprint(input)}");
        return ExitCodes.Success;
    });

    private static void Write(string path, byte[] content)
    {
        try
        {
            File.WriteAllBytes(path, content);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            throw new InputFileException(path, $"cannot be written: {ex.Message}");
        }
    }
}
