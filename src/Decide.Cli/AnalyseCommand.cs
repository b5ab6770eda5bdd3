using System.CommandLine;
using System.CommandLine.Parsing;
using System.Globalization;
using System.Numerics;
using Decide.Core;
using Decide.Core.Analysis;
using Decide.Core.Robustness;
using Decide.Interchange;

namespace Decide.Cli;

/// <summary>
/// <c>decide analyse FILE [--format json|table] [--draws N] [--seed S] [--threads T] [--no-robustness]</c>: reads an
/// evaluation file, analyses it, runs the robustness checks and prints the results.
/// </summary>
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

    private readonly Option<int> _draws = new("--draws")
    {
        Description = "Monte Carlo draws for rank acceptability; 0 skips it.",
        DefaultValueFactory = _ => RobustnessOptions.DefaultDraws,
        CustomParser = OptionParsers.WholeNumber(0, "0 skips rank acceptability"),
        HelpName = "N",
    };

    private readonly Option<ulong> _seed = new("--seed")
    {
        Description = "Seed of the draws (a whole number, 0 or more); the same seed gives the same results.",
        DefaultValueFactory = _ => RobustnessOptions.DefaultSeed,
        CustomParser = OptionParsers.WholeNumber(0UL, null),
        HelpName = "S",
    };

    private readonly Option<int> _threads = new("--threads")
    {
        Description = "Threads for the draws (1 or more; default: the number of processors). The results do not depend on it.",
        DefaultValueFactory = _ => Environment.ProcessorCount,
        CustomParser = OptionParsers.WholeNumber(1, null),
        HelpName = "T",
    };

    private readonly Option<bool> _noRobustness = new("--no-robustness")
    {
        Description = "Skip the robustness checks (sensitivity, panel agreement, summary): the ranking only.",
    };

    /// <summary>Creates the command, writing results to <paramref name="stdout"/> and problems to <paramref name="stderr"/>.</summary>
    public AnalyseCommand(TextWriter stdout, TextWriter stderr)
    {
        _stdout = stdout;
        _stderr = stderr;
        Command = new Command("analyse", "Analyse an evaluation file: weights, consistency, the fuzzy TOPSIS ranking and its robustness.");
        Command.Aliases.Add("analyze");
        Command.Arguments.Add(_file);
        Command.Options.Add(_format);
        Command.Options.Add(_draws);
        Command.Options.Add(_seed);
        Command.Options.Add(_threads);
        Command.Options.Add(_noRobustness);
        Command.SetAction(parseResult => Execute(
            parseResult.GetValue(_file)!,
            parseResult.GetValue(_format) == "table" ? AnalyseOutput.Table : AnalyseOutput.Json,
            parseResult.GetValue(_noRobustness)
                ? null
                : new RobustnessOptions(parseResult.GetValue(_draws), parseResult.GetValue(_seed), parseResult.GetValue(_threads))));
    }

    /// <summary>The command to add to the tree.</summary>
    public Command Command { get; }

    /// <summary>Reads, analyses and prints; returns an <see cref="ExitCodes"/> value.</summary>
    /// <param name="file">The evaluation file.</param>
    /// <param name="output">JSON or table.</param>
    /// <param name="robustness">Settings of the robustness checks; null skips them.</param>
    public int Execute(string file, AnalyseOutput output, RobustnessOptions? robustness) => CommandGuard.Run(_stderr, () =>
    {
        var input = CommandGuard.ReadEvaluation(file);
        var run = DecisionRun.Of(input.Evaluation, robustness);
        var (_, result, checks) = run;
        if (output == AnalyseOutput.Table)
        {
            TableRenderer.Render(input, run, _stdout);
        }
        else
        {
            _stdout.Write(ResultsWriter.ToJson(ResultsWriter.CreateDocument(run, input.Evaluation)));
        }

        return ExitCodes.Success;
    });
}
