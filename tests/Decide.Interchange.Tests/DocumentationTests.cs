using System.Text.Json.Nodes;
using System.Text.RegularExpressions;

namespace Decide.Interchange.Tests;

/// <summary>docs/evaluation-format.md stays in step with the example file and the schemas.</summary>
public sealed partial class DocumentationTests
{
    private static string Document => File.ReadAllText(RepositoryFiles.PathOf("docs", "evaluation-format.md"));

    [Fact]
    public void The_annotated_example_is_the_minimal_example_file()
    {
        var section = Document[Document.IndexOf("## Annotated example", StringComparison.Ordinal)..];
        var block = JsonBlock().Match(section);

        Assert.True(block.Success, "no JSON block under \"Annotated example\"");
        Assert.True(JsonNode.DeepEquals(JsonNode.Parse(block.Groups[1].Value), JsonNode.Parse(Files.MinimalText)),
            "the example in the document differs from docs/examples/minimal.json");
    }

    [Theory]
    [InlineData("decide-evaluation-1.schema.json")]
    [InlineData("decide-results-1.schema.json")]
    public void Every_top_level_member_of_a_schema_is_documented(string schema)
    {
        var members = JsonNode.Parse(File.ReadAllText(RepositoryFiles.PathOf("docs", "schema", schema)))!["properties"]!.AsObject();

        Assert.All(members.Select(m => m.Key), name => Assert.Contains($"`{name}`", Document));
    }

    [Theory]
    [InlineData("sensitivity")]
    [InlineData("agreement")]
    public void Every_member_of_a_robustness_section_is_documented_under_its_heading(string section)
    {
        var schema = JsonNode.Parse(File.ReadAllText(RepositoryFiles.PathOf("docs", "schema", "decide-results-1.schema.json")))!;
        var members = schema["properties"]![section]!["properties"]!.AsObject().Select(m => m.Key).ToArray();
        var start = Document.IndexOf($"### `{section}`", StringComparison.Ordinal);
        Assert.True(start >= 0, $"no heading for {section}");
        var end = Document.IndexOf("\n#", start + 1, StringComparison.Ordinal);
        var text = Document[start..(end < 0 ? Document.Length : end)];

        Assert.NotEmpty(members);
        Assert.All(members, name => Assert.Contains($"| `{name}` |", text));
    }

    [Fact]
    public void The_documented_moderation_reads_when_added_to_the_minimal_example()
    {
        var section = Document[Document.IndexOf("### `moderation`", StringComparison.Ordinal)..];
        var block = JsonBlock().Match(section);
        Assert.True(block.Success, "no JSON block under \"moderation\"");
        var moderation = JsonNode.Parse("{" + block.Groups[1].Value + "}")!["moderation"]!.ToJsonString();

        var file = EvaluationFileReader.Read(Files.Minimal().Set("moderation", moderation).ToJsonString());

        Assert.Single(file.Evaluation.Moderated);
    }

    [GeneratedRegex("```json\\n(.*?)\\n```", RegexOptions.Singleline)]
    private static partial Regex JsonBlock();
}
