using Decide.Interchange;

namespace Decide.Reports.Tests;

/// <summary>
/// The record of the grant sample (samples/community-grants-round.json, invented) prints who read what, Krippendorff's
/// alpha, the bands and the funding line, read back with PdfPig. The line worked by hand down the engine's ranking:
/// 15,000 + 7,500 + 6,000 + 11,000 + 8,000 + 9,500 = 57,000 of 60,000; the seventh asks 10,000 of the 3,000 left, so
/// the funding stops at six.
/// </summary>
public sealed class RoundRecordTests
{
    private static readonly Lazy<PdfText> Text = new(() =>
    {
        var file = EvaluationFileReader.ReadFile(Path.Combine(SampleRecords.Root, "samples", "community-grants-round.json"));
        return PdfText.Of(EvaluationRecordDocument.Render(SampleRecords.Build(file, draws: 500)));
    });

    [Fact]
    public void The_record_says_who_read_what_and_that_nothing_was_made_up_for_the_others()
    {
        var text = Text.Value.Squeezed;
        Assert.Contains(PdfText.Squeeze("Who read what"), text);
        Assert.Contains(PdfText.Squeeze("no rating was expected, declined or made up for the others"), text);
        Assert.Contains(PdfText.Squeeze("Pia Lindgren 6 Old Station Orchard, Leyfield Pond Rescue, Kestrel Court Roof Beds"), text);
        Assert.Contains(PdfText.Squeeze("Every application is linked to every other through reviewers who read both"), text);
    }

    [Fact]
    public void The_record_prints_the_funding_line_the_bands_and_alpha()
    {
        var text = Text.Value.Squeezed;
        Assert.Contains(PdfText.Squeeze("Budget 60,000 GBP"), text);
        Assert.Contains(PdfText.Squeeze("6 funded for 57,000 GBP"), text);
        Assert.Contains(PdfText.Squeeze("12 Harwick Street Compost Hub"), text);
        Assert.Contains(PdfText.Squeeze("Krippendorff's alpha, on the order of the terms"), text);
        Assert.Contains(PdfText.Squeeze("Left out of Kendall's W because they did not rate every alternative"), text);
    }
}
