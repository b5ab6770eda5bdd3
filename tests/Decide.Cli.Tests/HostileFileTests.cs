using System.Text.Json;
using Decide.Fuzzing;

namespace Decide.Cli.Tests;

/// <summary>
/// Fuzzing <c>decide analyse</c> in-process with hostile files (valid samples mutated, random bytes): it exits 0 with
/// results, or 2 with each problem on stderr as <c>PATH: reason</c>; never 1 (an internal error), never a stack
/// trace. Cases and seed: DEVELOPERS.md.
/// </summary>
public sealed class HostileFileTests : IDisposable
{
    /// <summary>Option sets that keep a case quick (few draws) while covering both outputs and skipping robustness.</summary>
    private static readonly string[][] Options =
    [
        ["--draws", "0"],
        ["--draws", "16", "--threads", "1"],
        ["--no-robustness"],
        ["--format", "table", "--draws", "8", "--seed", "7"],
        ["--format", "table", "--no-robustness"],
    ];

    private const int LargeFile = 512 * 1024;

    private readonly string _folder = Directory.CreateTempSubdirectory("decide-cli-fuzz-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    [HostileProperty(ciCases: 150)]
    public void Analyse_answers_a_hostile_file_with_results_or_its_problems_never_a_crash(HostileCase hostile)
    {
        var body = hostile.Render(SeedDocuments.All);
        var file = Path.Combine(_folder, "case.json");
        File.WriteAllBytes(file, body.Bytes);
        // Robustness on a file of hundreds of criteria takes minutes (docs/performance.md); large files are read and
        // ranked only, so that a run stays within its time.
        var options = body.Bytes.Length > LargeFile ? ["--no-robustness"] : Options[hostile.Document / SeedDocuments.All.Count % Options.Length];

        var run = CliRun.Of(["analyse", file, .. options]);

        var context = $"exit {run.ExitCode} for {body} with {string.Join(' ', options)}\nstderr: {Shorten(run.Stderr)}\nfile: {body.Excerpt()}";
        Assert.True(run.ExitCode is ExitCodes.Success or ExitCodes.InvalidInput, context);
        Assert.DoesNotContain("   at ", run.Stderr, StringComparison.Ordinal);
        Assert.DoesNotContain("internal error", run.Stderr, StringComparison.Ordinal);
        if (run.ExitCode == ExitCodes.Success)
        {
            Assert.Equal("", run.Stderr);
            Assert.False(string.IsNullOrWhiteSpace(run.Stdout), context);
            if (!options.Contains("table"))
            {
                using var results = JsonDocument.Parse(run.Stdout);
                Assert.Equal("decide-results/1", results.RootElement.GetProperty("format").GetString());
            }

            return;
        }

        Assert.Equal("", run.Stdout);
        Assert.NotEmpty(run.StderrLines);
        Assert.All(run.StderrLines, line => Assert.True(
            line.StartsWith('$') && line.Contains(": ", StringComparison.Ordinal) || line.StartsWith(file + ": ", StringComparison.Ordinal),
            $"not a PATH: reason line: {Shorten(line)}\n{context}"));
    }

    // Before the reader refused text it cannot decode, such a file ended in exit 1, "internal error: Cannot transcode
    // invalid UTF-8 JSON text to UTF-16 string" (shrunk from the reader's own property).
    [Fact]
    public void A_file_with_bytes_that_are_not_utf8_in_a_name_exits_2_naming_the_place()
    {
        var text = File.ReadAllBytes(RepositoryFiles.MinimalExample);
        var name = "\"Birch Cleaning Co-operative\""u8.ToArray();
        var at = text.AsSpan().IndexOf(name);
        var file = Path.Combine(_folder, "not-utf8.json");
        File.WriteAllBytes(file, [.. text[..at], .. "\"Birch "u8, 0xC3, 0x28, (byte)'"', .. text[(at + name.Length)..]]);

        var run = CliRun.Of("analyse", file, "--no-robustness");

        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        var line = Assert.Single(run.StderrLines);
        Assert.StartsWith("$.alternatives[1].name: ", line, StringComparison.Ordinal);
        Assert.Contains("not UTF-8", line, StringComparison.Ordinal);
    }

    private static string Shorten(string text) => Mutator.Escape(text.Length <= 600 ? text : text[..600] + "…");
}
