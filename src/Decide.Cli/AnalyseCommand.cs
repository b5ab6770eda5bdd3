using System.CommandLine;
using Decide.Core.Analysis;
using Decide.Interchange;

namespace Decide.Cli;

/// <summary><c>decide analyse FILE [--format json|table]</c>: reads an evaluation file, analyses it and prints the results.</summary>
public sealed class AnalyseCommand
{
    private readonly TextWriter _stdout;
    private readonly TextWriter _stderr;

    private readonly Argument<string> _file = new("file")
    {
        Description = "The evaluation file (decide-evaluation/1).",
    };

    private readonly Option<string> _format = new Option<string>("--format")
    {
        Description = "json prints the results document (decide-results/1); table prints a summary for people.",
        DefaultValueFactory = _ => "json",
        HelpName = "json|table",
    }.AcceptOnlyFromAmong("json", "table");

    /// <summary>Creates the command, writing results to <paramref name="stdout"/> and problems to <paramref name="stderr"/>.</summary>
    public AnalyseCommand(TextWriter stdout, TextWriter stderr)
    {
        _stdout = stdout;
        _stderr = stderr;
        Command = new Command("analyse", "Analyse an evaluation file: weights, consistency and the fuzzy TOPSIS ranking.");
        Command.Aliases.Add("analyze");
        Command.Arguments.Add(_file);
        Command.Options.Add(_format);
        Command.SetAction(parseResult => Execute(
            parseResult.GetValue(_file)!,
            parseResult.GetValue(_format) == "table" ? AnalyseOutput.Table : AnalyseOutput.Json));
    }

    /// <summary>The command to add to the tree.</summary>
    public Command Command { get; }

    /// <summary>Reads, analyses and prints; returns an <see cref="ExitCodes"/> value.</summary>
    public int Execute(string file, AnalyseOutput output) => CommandGuard.Run(_stderr, () =>
    {
        var input = CommandGuard.ReadEvaluation(file);
        var result = DecisionEngine.Analyze(input.Evaluation);
        if (output == AnalyseOutput.Table)
        {
            TableRenderer.Render(input, result, _stdout);
        }
        else
        {
            _stdout.Write(ResultsWriter.ToJson(result, input.Evaluation));
        }

        return ExitCodes.Success;
    });
}
