using System.Text;
using Decide.Core;
using Decide.Core.Analysis;
using Decide.Fuzzing;

namespace Decide.Interchange.Tests;

/// <summary>
/// Fuzzing the reader with hostile files (valid samples mutated, random bytes): it answers every one either with an
/// evaluation or with its own <see cref="InvalidEvaluationException"/> listing problems by JSON path, and what it
/// accepts can be analysed and written back, as its documentation promises. Cases and seed: DEVELOPERS.md.
/// </summary>
public sealed class HostileFileTests
{
    [HostileProperty(ciCases: 300)]
    public void Reading_bytes_gives_an_evaluation_or_a_validation_error_and_nothing_else(HostileCase hostile)
    {
        var body = hostile.Render(SeedDocuments.All);

        var outcome = Outcome.Of(() => EvaluationFileReader.Read(body.Bytes));

        outcome.AssertReadOrRefused(body);
    }

    [HostileProperty(ciCases: 300)]
    public void Reading_text_and_reading_a_plan_give_an_evaluation_or_a_validation_error_and_nothing_else(HostileCase hostile)
    {
        var body = hostile.Render(SeedDocuments.All);
        var text = Encoding.UTF8.GetString(body.Bytes);

        Outcome.Of(() => EvaluationFileReader.Read(text)).AssertReadOrRefused(body);
        var plan = Outcome.Of(() => EvaluationFileReader.ReadPlan(text));
        Assert.True(plan.Unexpected is null, $"ReadPlan threw {plan.Unexpected} for {body}\n{body.Excerpt()}");
    }

    // Found by the properties above (shrunk): the JSON parser accepts bytes inside quotes that are not UTF-8, and
    // escapes of half a surrogate pair, and only decoding the text fails (InvalidOperationException, not a refusal).

    [Fact]
    public void A_string_of_bytes_that_are_not_utf8_is_refused_at_its_path()
    {
        var bytes = Replace(Files.Minimal(), file => file["ratings"]!["E2"] = Placeholder, [(byte)'"', (byte)'a', 0xC3, 0x28, (byte)'b', (byte)'"']);

        var refusal = Assert.Throws<InvalidEvaluationException>(() => EvaluationFileReader.Read(bytes));

        var error = Assert.Single(refusal.Errors);
        Assert.Equal("$.ratings.E2", error.Path);
        Assert.Contains("not UTF-8", error.Reason, StringComparison.Ordinal);
    }

    [Fact]
    public void An_escape_of_half_a_surrogate_pair_is_refused_at_its_path()
    {
        var bytes = Replace(Files.Minimal(), file => file["alternatives"]![1]!["name"] = Placeholder, "\"Birch \\ud800 Co-op\""u8.ToArray());

        var refusal = Assert.Throws<InvalidEvaluationException>(() => EvaluationFileReader.Read(bytes));

        var error = Assert.Single(refusal.Errors);
        Assert.Equal("$.alternatives[1].name", error.Path);
        Assert.Contains("half a surrogate pair", error.Reason, StringComparison.Ordinal);
    }

    [Fact]
    public void A_member_name_that_cannot_be_decoded_is_refused_naming_its_object()
    {
        var bytes = Replace(Files.Minimal(), file => file["importance"]!["E1"] = Placeholder, [.. "{\"qu"u8, 0xFF, .. "ality\":\"VH\"}"u8]);

        var refusal = Assert.Throws<InvalidEvaluationException>(() => EvaluationFileReader.Read(bytes));

        var error = Assert.Single(refusal.Errors);
        Assert.Equal("$.importance.E1", error.Path);
        Assert.Contains("name of member 1", error.Reason, StringComparison.Ordinal);
        Assert.Contains("not UTF-8", error.Reason, StringComparison.Ordinal);
    }

    private const string Placeholder = "PLACEHOLDER-FOR-RAW-BYTES";

    /// <summary>The file after <paramref name="edit"/> put <see cref="Placeholder"/> somewhere, with that string replaced by <paramref name="raw"/> bytes.</summary>
    private static byte[] Replace(System.Text.Json.Nodes.JsonObject file, Action<System.Text.Json.Nodes.JsonObject> edit, byte[] raw)
    {
        edit(file);
        var text = Encoding.UTF8.GetBytes(file.ToJsonString());
        var marker = Encoding.UTF8.GetBytes($"\"{Placeholder}\"");
        var at = text.AsSpan().IndexOf(marker);
        return [.. text[..at], .. raw, .. text[(at + marker.Length)..]];
    }

    /// <summary>What a read ended with.</summary>
    private sealed record Outcome(EvaluationFile? File, InvalidEvaluationException? Refusal, Exception? Unexpected)
    {
        public static Outcome Of(Func<EvaluationFile> read)
        {
            try
            {
                return new Outcome(read(), null, null);
            }
            catch (InvalidEvaluationException e)
            {
                return new Outcome(null, e, null);
            }
            catch (Exception e)
            {
                return new Outcome(null, null, e);
            }
        }

        public void AssertReadOrRefused(HostileBody body)
        {
            Assert.True(Unexpected is null, $"the reader threw {Unexpected} for {body}\n{body.Excerpt()}");
            if (Refusal is not null)
            {
                Assert.NotEmpty(Refusal.Errors);
                Assert.All(Refusal.Errors, e =>
                {
                    Assert.StartsWith("$", e.Path, StringComparison.Ordinal);
                    Assert.False(string.IsNullOrWhiteSpace(e.Reason), $"an error at {e.Path} without a reason");
                });
                return;
            }

            // "A file that reads without error can be analysed" (EvaluationFileReader's remarks), and written back.
            var file = File!;
            var result = DecisionEngine.Analyse(file.Evaluation);
            Assert.NotEmpty(ResultsWriter.ToJson(result, file.Evaluation));
            var again = EvaluationFileReader.Read(EvaluationFileWriter.ToJson(file));
            Assert.Equal(file.Evaluation.Criteria.Count, again.Evaluation.Criteria.Count);
        }
    }
}
