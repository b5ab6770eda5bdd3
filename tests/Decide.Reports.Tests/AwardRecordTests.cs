using Decide.Interchange;

namespace Decide.Reports.Tests;

/// <summary>
/// The record of the points sample (samples/park-grounds-points.json) prints the published method and the table a
/// bidder can recompute, read back with PdfPig. The figures were worked with a calculator from the
/// sample's ratings (see samples/README.md): Cobble Hill quality 49.50, price points 40 × 298,000 / 436,200 = 27.33,
/// total 76.83.
/// </summary>
public sealed class AwardRecordTests
{
    private static readonly Lazy<PdfText> Text = new(() =>
    {
        var file = EvaluationFileReader.ReadFile(Path.Combine(SampleRecords.Root, "samples", "park-grounds-points.json"));
        return PdfText.Of(EvaluationRecordDocument.Render(SampleRecords.Build(file, draws: 500)));
    });

    [Fact]
    public void The_record_states_the_published_method_with_the_formula_its_source_and_the_relative_warning()
    {
        var text = Text.Value.Squeezed;
        Assert.Contains(PdfText.Squeeze("The award by the published points (binding)"), text);
        Assert.Contains(PdfText.Squeeze("S = Smax × Pmin / P, with Smax = 40.00 points"), text);
        Assert.Contains(PdfText.Squeeze("Stilger, Siderius & van Raaij (2017)"), text);
        Assert.Contains(PdfText.Squeeze("This price formula is relative"), text);
        Assert.Contains(PdfText.Squeeze("Two stages: prices stay sealed"), text);
    }

    [Fact]
    public void The_record_prints_each_bids_totals_and_points_per_criterion_and_the_reviewed_low_price()
    {
        var text = Text.Value.Squeezed;
        Assert.Contains(PdfText.Squeeze("Cobble Hill Horticulture 49.50 436,200 27.33 76.83 1"), text);
        Assert.Contains(PdfText.Squeeze("Fernbrook Landscapes 21.83 not opened"), text);
        Assert.Contains(PdfText.Squeeze("The award by points goes to Cobble Hill Horticulture."), text);
        Assert.Contains(PdfText.Squeeze("5, 8, 7 → moderated 7 7.00 7.00"), text);
        Assert.Contains(PdfText.Squeeze("accepted: the bid stays in the award"), text);
        Assert.Contains(PdfText.Squeeze("Robustness of the award"), text);
    }
}
