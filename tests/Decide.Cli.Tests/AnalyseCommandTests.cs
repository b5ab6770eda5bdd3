using System.Text.Json;
using System.Text.Json.Nodes;

namespace Decide.Cli.Tests;

public sealed class AnalyseCommandTests : IDisposable
{
    private readonly string _folder = Directory.CreateTempSubdirectory("decide-cli-tests-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    private string WriteFile(string name, string text)
    {
        var path = Path.Combine(_folder, name);
        File.WriteAllText(path, text);
        return path;
    }

    [Fact]
    public void Json_output_is_the_results_document_with_a_ranking()
    {
        var run = CliRun.Of("analyse", RepositoryFiles.MinimalExample);

        Assert.Equal(0, run.ExitCode);
        Assert.Equal("", run.Stderr);
        using var json = JsonDocument.Parse(run.Stdout);
        Assert.Equal("decide-results/1", json.RootElement.GetProperty("format").GetString());
        Assert.Equal(2, json.RootElement.GetProperty("ranking").GetArrayLength());
    }

    [Fact]
    public void Json_is_the_default_and_the_same_as_asking_for_it()
    {
        Assert.Equal(CliRun.Of("analyse", RepositoryFiles.MinimalExample).Stdout,
            CliRun.Of("analyse", RepositoryFiles.MinimalExample, "--format", "json").Stdout);
    }

    [Fact]
    public void Table_output_shows_the_ranking_and_the_excluded_alternative_with_its_gate()
    {
        var run = CliRun.Of("analyse", RepositoryFiles.MinimalExample, "--format", "table");

        Assert.Equal(0, run.ExitCode);
        var lines = run.Stdout.Split('\n').Select(l => l.TrimEnd()).ToArray();
        Assert.Equal("Office cleaning contract 2027", lines[0]);
        Assert.Contains(lines, l => l.StartsWith("Method:", StringComparison.Ordinal) && l.Contains("fuzzy TOPSIS", StringComparison.Ordinal));
        Assert.Contains("Ranking of bids", lines);
        var excluded = Assert.Single(lines, l => l.Contains("Cedar Property Care", StringComparison.Ordinal));
        Assert.Contains("B3", excluded);
        Assert.Contains("Public liability insurance of at least EUR 5 million (insurance)", excluded);
        Assert.Contains(lines, l => l.Contains("Alder Facility Services", StringComparison.Ordinal) && l.TrimStart().StartsWith('1'));
        Assert.Contains(TableRenderer.Caution, lines);
    }

    [Fact]
    public void Table_output_of_a_points_award_prints_the_table_a_bidder_can_recompute()
    {
        var run = CliRun.Of("analyse", RepositoryFiles.PointsSample, "--format", "table", "--no-robustness");

        Assert.Equal(0, run.ExitCode);
        var lines = run.Stdout.Split('\n').Select(l => l.TrimEnd()).ToArray();
        Assert.Contains("Award by published points (binding)", lines);
        Assert.Contains(lines, l => l.Contains("S = Smax × Pmin / P", StringComparison.Ordinal) && l.Contains("Smax = 40", StringComparison.Ordinal));

        // Cobble Hill, worked with a calculator from the sample: method (9+8+9)/3 = 8.667 → 8.667/10 × 25 = 21.67;
        // staffing 8.333 → 12.50; environment 8.333 → 8.33; social moderated 7 → 7.00; quality 49.50;
        // price 40 × 298,000 / 436,200 = 27.33; total 76.83; rank 1.
        var row = Assert.Single(lines, l => l.TrimStart().StartsWith("cobblehill ", StringComparison.Ordinal));
        Assert.Equal(["cobblehill", "8.67→21.67", "8.33→12.50", "8.33→8.33", "7→7.00*", "49.50", "436,200", "27.33", "76.83", "1"],
            row.Split(' ', StringSplitOptions.RemoveEmptyEntries));
        Assert.Contains(lines, l => l.Contains("Excluded: fernbrook", StringComparison.Ordinal) && l.Contains("below the minimum of 4", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.Contains("Abnormally low: quickcut", StringComparison.Ordinal) && l.Contains("explanation accepted", StringComparison.Ordinal));
        Assert.Contains("  Winner under the binding result: cobblehill Cobble Hill Horticulture.", lines);
    }

    [Fact]
    public void The_methodology_command_writes_the_pdf_and_the_text_whose_sha256_it_prints()
    {
        var folder = Directory.CreateTempSubdirectory("decide-methodology-");
        try
        {
            var (pdf, text) = (Path.Combine(folder.FullName, "m.pdf"), Path.Combine(folder.FullName, "m.txt"));
            var run = CliRun.Of("methodology", RepositoryFiles.PointsSample, "-o", pdf, "--text", text);

            Assert.Equal(0, run.ExitCode);
            Assert.StartsWith("%PDF-", File.ReadAllText(pdf)[..5], StringComparison.Ordinal);
            var sha = Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(File.ReadAllBytes(text)));
            Assert.Contains($"Fingerprint (SHA-256 of the text version): {sha}", run.Stdout, StringComparison.Ordinal);
        }
        finally
        {
            folder.Delete(recursive: true);
        }
    }

    [Fact]
    public void Table_rows_follow_the_ranking_in_the_json()
    {
        using var json = JsonDocument.Parse(CliRun.Of("analyse", RepositoryFiles.MinimalExample).Stdout);
        var table = CliRun.Of("analyse", RepositoryFiles.MinimalExample, "--format", "table").Stdout;

        var order = json.RootElement.GetProperty("ranking").EnumerateArray().Select(r => r.GetProperty("name").GetString()!).ToArray();
        var positions = order.Select(name => table.IndexOf(name, StringComparison.Ordinal)).ToArray();
        Assert.All(positions, p => Assert.True(p >= 0));
        Assert.Equal(positions.Order(), positions);
    }

    [Fact]
    public void Table_output_of_a_pairwise_evaluation_shows_consistency_and_inconsistent_judgements()
    {
        var path = WriteFile("pairwise.json", PairwiseWithInconsistentJudgements());

        var run = CliRun.Of("analyse", path, "--format", "table");

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("Consistency of the pairwise comparisons", run.Stdout);
        Assert.Contains("review CR", run.Stdout);
        Assert.Contains("intransitive: ", run.Stdout);
        Assert.Contains("judgements most out of line", run.Stdout);
    }

    [Fact]
    public void An_invalid_file_exits_2_with_every_error_on_its_own_line_by_path()
    {
        var node = JsonNode.Parse(File.ReadAllText(RepositoryFiles.MinimalExample))!.AsObject();
        node["titel"] = "typo";
        node["ratings"]!["E1"]!["B9"] = new JsonObject { ["quality"] = "G" };
        node["values"]!["B1"]!["price"] = "cheap";
        var path = WriteFile("invalid.json", node.ToJsonString());

        var run = CliRun.Of("analyse", path);

        Assert.Equal(2, run.ExitCode);
        Assert.Equal("", run.Stdout);
        Assert.All(run.StderrLines, line => Assert.StartsWith("$.", line));
        Assert.Contains(run.StderrLines, l => l.StartsWith("$.titel: ", StringComparison.Ordinal));
        Assert.Contains(run.StderrLines, l => l.StartsWith("$.ratings.E1.B9: ", StringComparison.Ordinal));
        Assert.Contains(run.StderrLines, l => l.StartsWith("$.values.B1.price: ", StringComparison.Ordinal));
    }

    [Fact]
    public void Malformed_json_exits_2_with_the_line_and_column()
    {
        var path = WriteFile("broken.json", "{\n  \"title\": \"x\",,\n}");

        var run = CliRun.Of("analyse", path, "--format", "table");

        Assert.Equal(2, run.ExitCode);
        var line = Assert.Single(run.StderrLines);
        Assert.StartsWith("$: not valid JSON at line 2, column", line);
    }

    [Fact]
    public void A_missing_file_exits_2_naming_the_file()
    {
        var path = Path.Combine(_folder, "does-not-exist.json");

        var run = CliRun.Of("analyse", path);

        Assert.Equal(2, run.ExitCode);
        Assert.Equal($"{path}: no such file", Assert.Single(run.StderrLines));
    }

    [Fact]
    public void A_folder_instead_of_a_file_exits_2_naming_it()
    {
        var run = CliRun.Of("analyse", _folder);

        Assert.Equal(2, run.ExitCode);
        Assert.StartsWith($"{_folder}: ", Assert.Single(run.StderrLines));
    }

    [Theory]
    [InlineData("analyse", "{0}", "--format", "xml")]
    [InlineData("analyse", "{0}", "--colour")]
    [InlineData("analyse")]
    [InlineData("summarise", "{0}")]
    [InlineData]
    public void A_bad_command_line_exits_2_with_the_parsers_message(params string[] args)
    {
        var run = CliRun.Of(args.Select(a => string.Format(System.Globalization.CultureInfo.InvariantCulture, a, RepositoryFiles.MinimalExample)).ToArray());

        Assert.Equal(2, run.ExitCode);
        Assert.NotEqual("", run.Stderr);
        Assert.Equal("", run.Stdout);
        Assert.DoesNotContain("   at ", run.Stderr); // no stack trace
    }

    [Fact]
    public void The_us_spelling_is_accepted_too()
    {
        Assert.Equal(0, CliRun.Of("analyze", RepositoryFiles.MinimalExample).ExitCode);
    }

    [Fact]
    public void Help_goes_to_stdout_and_exits_0()
    {
        var run = CliRun.Of("analyse", "--help");

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("--format", run.Stdout);
    }

    [Fact]
    public void An_unexpected_failure_is_one_internal_error_line_and_exit_1()
    {
        using var stderr = new StringWriter();

        var code = CommandGuard.Run(stderr, () => throw new InvalidOperationException("boom\nsecond line"));

        Assert.Equal(1, code);
        Assert.Equal("internal error: boom second line", stderr.ToString().TrimEnd());
    }

    private static string PairwiseWithInconsistentJudgements() => """
        {
          "format": "decide-evaluation/1",
          "title": "Pairwise, deliberately inconsistent",
          "criteria": [
            { "id": "a", "name": "Alpha" },
            { "id": "b", "name": "Beta" },
            { "id": "c", "name": "Gamma" }
          ],
          "alternatives": [ { "id": "X", "name": "Option X" }, { "id": "Y", "name": "Option Y" } ],
          "assessors": [ { "id": "E1", "name": "One" } ],
          "weighting": "pairwise",
          "pairwise": {
            "E1": [
              { "row": "a", "col": "b", "term": "5" },
              { "row": "b", "col": "c", "term": "5" },
              { "row": "c", "col": "a", "term": "5" }
            ]
          },
          "ratings": {
            "E1": {
              "X": { "a": "G", "b": "F", "c": "MG" },
              "Y": { "a": "F", "b": "G", "c": "MP" }
            }
          }
        }
        """;
}
