using System.Text.Json;
using Decide.Core.Robustness;

namespace Decide.Cli.Tests;

/// <summary><c>decide analyse</c> with its robustness checks: options, reproducibility, JSON sections and the table part.</summary>
public sealed class AnalyseRobustnessTests
{
    [Fact]
    public void The_same_draws_and_seed_give_identical_output_twice()
    {
        var first = CliRun.Of("analyse", RepositoryFiles.BusStopSample, "--draws", "500", "--seed", "3");
        var second = CliRun.Of("analyse", RepositoryFiles.BusStopSample, "--draws", "500", "--seed", "3");

        Assert.Equal(0, first.ExitCode);
        Assert.Equal(first.Stdout, second.Stdout);
    }

    [Fact]
    public void The_number_of_threads_does_not_change_the_output()
    {
        var one = CliRun.Of("analyse", RepositoryFiles.BusStopSample, "--draws", "600", "--seed", "8", "--threads", "1");
        var three = CliRun.Of("analyse", RepositoryFiles.BusStopSample, "--draws", "600", "--seed", "8", "--threads", "3");

        Assert.Equal(one.Stdout, three.Stdout);
    }

    [Fact]
    public void The_draws_and_seed_given_are_recorded_in_the_results()
    {
        var run = CliRun.Of("analyse", RepositoryFiles.BusStopSample, "--draws", "500", "--seed", "18446744073709551615");

        using var json = JsonDocument.Parse(run.Stdout);
        var sensitivity = json.RootElement.GetProperty("sensitivity");
        Assert.Equal(500, sensitivity.GetProperty("draws").GetInt32());
        Assert.Equal(ulong.MaxValue, sensitivity.GetProperty("seed").GetUInt64());
    }

    [Fact]
    public void By_default_robustness_runs_with_the_documented_draws_and_seed()
    {
        var run = CliRun.Of("analyse", RepositoryFiles.MinimalExample);

        using var json = JsonDocument.Parse(run.Stdout);
        var sensitivity = json.RootElement.GetProperty("sensitivity");
        Assert.Equal(RobustnessOptions.DefaultDraws, sensitivity.GetProperty("draws").GetInt32());
        Assert.Equal(RobustnessOptions.DefaultSeed, sensitivity.GetProperty("seed").GetUInt64());
        Assert.True(json.RootElement.TryGetProperty("agreement", out _));
        Assert.NotEqual(0, json.RootElement.GetProperty("summary").GetArrayLength());
    }

    [Fact]
    public void No_robustness_gives_the_ranking_only()
    {
        var run = CliRun.Of("analyse", RepositoryFiles.BusStopSample, "--no-robustness");

        Assert.Equal(0, run.ExitCode);
        using var json = JsonDocument.Parse(run.Stdout);
        Assert.True(json.RootElement.TryGetProperty("ranking", out _));
        Assert.False(json.RootElement.TryGetProperty("sensitivity", out _));
        Assert.False(json.RootElement.TryGetProperty("agreement", out _));
        Assert.False(json.RootElement.TryGetProperty("summary", out _));
    }

    [Fact]
    public void No_robustness_leaves_the_robustness_part_out_of_the_table()
    {
        var run = CliRun.Of("analyse", RepositoryFiles.BusStopSample, "--no-robustness", "--format", "table");

        Assert.Equal(0, run.ExitCode);
        Assert.DoesNotContain("Rank acceptability", run.Stdout);
        Assert.DoesNotContain("Robustness", run.Stdout);
        Assert.Equal(TableRenderer.Caution, run.Stdout.TrimEnd().Split('\n')[^1]);
    }

    [Fact]
    public void Zero_draws_skips_rank_acceptability_only()
    {
        var json = CliRun.Of("analyse", RepositoryFiles.BusStopSample, "--draws", "0");
        var table = CliRun.Of("analyse", RepositoryFiles.BusStopSample, "--draws", "0", "--format", "table");

        Assert.Equal(0, json.ExitCode);
        using var document = JsonDocument.Parse(json.Stdout);
        var sensitivity = document.RootElement.GetProperty("sensitivity");
        Assert.Equal(0, sensitivity.GetProperty("acceptability").GetArrayLength());
        Assert.NotEqual(0, sensitivity.GetProperty("sweeps").GetArrayLength());
        Assert.Contains("Rank acceptability: skipped", table.Stdout);
    }

    [Theory]
    [InlineData("--draws", "-1", "--draws must be a whole number, 0 or more")]
    [InlineData("--draws", "many", "--draws must be a whole number, 0 or more")]
    [InlineData("--draws", "2.5", "--draws must be a whole number, 0 or more")]
    [InlineData("--draws", "99999999999", "too large")]
    [InlineData("--seed", "-1", "--seed must be a whole number, 0 or more")]
    [InlineData("--seed", "18446744073709551616", "too large")]
    [InlineData("--threads", "0", "--threads must be a whole number, 1 or more")]
    public void A_bad_robustness_option_exits_2_with_a_clear_message(string option, string value, string message)
    {
        var run = CliRun.Of("analyse", RepositoryFiles.MinimalExample, option, value);

        Assert.Equal(2, run.ExitCode);
        Assert.Equal("", run.Stdout);
        Assert.Contains(message, run.Stderr);
        Assert.Contains($"got '{value}'", run.Stderr);
        Assert.DoesNotContain("   at ", run.Stderr); // no stack trace
    }

    [Fact]
    public void The_table_shows_the_summary_first_then_the_robustness_sections_and_the_caution_last()
    {
        var table = CliRun.Of("analyse", RepositoryFiles.BusStopSample, "--format", "table", "--draws", "2000", "--seed", "5");
        using var json = JsonDocument.Parse(CliRun.Of("analyse", RepositoryFiles.BusStopSample, "--draws", "2000", "--seed", "5").Stdout);

        Assert.Equal(0, table.ExitCode);
        var text = table.Stdout;
        var summary = json.RootElement.GetProperty("summary").EnumerateArray().Select(s => s.GetString()!).ToArray();
        Assert.NotEmpty(summary);
        Assert.All(summary, sentence => Assert.Contains(sentence, text));

        string[] headings =
        [
            "Robustness", "Rank acceptability (2,000 draws", "Most critical criteria", "Without each assessor",
            "Without each alternative", "Method cross-check", "Panel agreement", TableRenderer.Caution,
        ];
        var lines = text.Split('\n');
        var positions = headings.Select(h => Array.FindIndex(lines, l => l.StartsWith(h, StringComparison.Ordinal))).ToArray();
        Assert.All(positions.Zip(headings), p => Assert.True(p.First >= 0, $"no line starts with: {p.Second}"));
        Assert.Equal(positions.Order(), positions);
        var firstSentence = Array.FindIndex(lines, l => l.Contains(summary[0], StringComparison.Ordinal));
        Assert.InRange(firstSentence, positions[0] + 1, positions[1] - 1); // the summary opens the robustness part
        Assert.Equal(TableRenderer.Caution, text.TrimEnd().Split('\n')[^1]);
    }

    [Fact]
    public void The_acceptability_rows_carry_each_ranked_alternatives_share_of_first_place()
    {
        var run = CliRun.Of("analyse", RepositoryFiles.BusStopSample, "--format", "table", "--draws", "2000", "--seed", "5");
        using var json = JsonDocument.Parse(CliRun.Of("analyse", RepositoryFiles.BusStopSample, "--draws", "2000", "--seed", "5").Stdout);
        var lines = run.Stdout.Split('\n');
        var start = Array.FindIndex(lines, l => l.StartsWith("Rank acceptability", StringComparison.Ordinal));

        foreach (var entry in json.RootElement.GetProperty("sensitivity").GetProperty("acceptability").EnumerateArray())
        {
            var id = entry.GetProperty("alternative").GetString()!;
            var first = entry.GetProperty("ranks")[0].GetDouble();
            var row = lines.Skip(start + 2).First(l => l.StartsWith(id + " ", StringComparison.Ordinal));
            Assert.Contains((first * 100).ToString("0.0", System.Globalization.CultureInfo.InvariantCulture) + " %", row);
        }
    }

    [Fact]
    public void The_cells_for_discussion_show_each_assessors_term()
    {
        var run = CliRun.Of("analyse", RepositoryFiles.BusStopSample, "--format", "table", "--draws", "100");
        using var json = JsonDocument.Parse(CliRun.Of("analyse", RepositoryFiles.BusStopSample, "--draws", "100").Stdout);
        var cells = json.RootElement.GetProperty("agreement").GetProperty("cells").EnumerateArray().ToArray();

        Assert.NotEmpty(cells); // the sample has cells whose terms lie far apart
        var lines = run.Stdout.Split('\n');
        foreach (var cell in cells)
        {
            var alternative = cell.GetProperty("alternative").GetString()!;
            var criterion = cell.GetProperty("criterion").GetString()!;
            var row = Assert.Single(lines, l => l.Split(' ', StringSplitOptions.RemoveEmptyEntries) is [var a, var c, ..] && a == alternative && c == criterion);
            var words = row.Split(' ', StringSplitOptions.RemoveEmptyEntries);
            Assert.Equal(cell.GetProperty("spread").GetInt32().ToString(System.Globalization.CultureInfo.InvariantCulture), words[2]);
            Assert.Equal(cell.GetProperty("terms").EnumerateObject().Select(t => t.Value.GetString()!), words[3..].Where(w => w != "-"));
        }
    }

    [Fact]
    public void Help_lists_the_robustness_options()
    {
        var run = CliRun.Of("analyse", "--help");

        Assert.Equal(0, run.ExitCode);
        Assert.All(new[] { "--draws", "--seed", "--threads", "--no-robustness" }, o => Assert.Contains(o, run.Stdout));
    }
}
