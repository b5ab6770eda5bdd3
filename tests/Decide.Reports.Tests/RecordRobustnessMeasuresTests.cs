using System.Globalization;

namespace Decide.Reports.Tests;

/// <summary>The record prints both measures of a critical change and names the weighted total of the cross-check.</summary>
public sealed class RecordRobustnessMeasuresTests
{
    private static readonly PdfText Text = PdfText.Of(SampleRecords.SignedBusStop);

    [Fact]
    public void The_most_critical_criteria_are_printed_as_the_share_reached_and_as_the_change_of_the_weight_alone()
    {
        var critical = SampleRecords.BusStop.Robustness.Sensitivity.CriticalChanges;
        var any = critical.AnyAbsolute!;

        // The weight alone changes by −δ (Triantaphyllou & Sánchez: the weight becomes w − δ before renormalising).
        var weightAlone = $"{Signed(-any.Delta!.Value * 100, 1)} ({Signed(-any.DeltaRelative!.Value, 0)}%)";
        var share = $"{Percent(any.Current)} → {Percent(any.Weight)}";
        Assert.Contains(PdfText.Squeeze("any place: weight alone"), Text.Squeezed);
        Assert.Contains(PdfText.Squeeze(share + weightAlone), Text.Squeezed);
        if (critical.TopAbsolute is null)
        {
            Assert.Contains(PdfText.Squeeze("first place: weight alone none no change of this weight alone reverses such a pair"), Text.Squeezed);
        }
    }

    [Fact]
    public void The_method_cross_check_names_the_weighted_total_of_scores_on_the_rating_scale()
    {
        Assert.Contains(PdfText.Squeeze("weighted total of scores on the rating scale"), Text.Squeezed);
        Assert.DoesNotContain(PdfText.Squeeze("weighted sum"), Text.Squeezed);
    }

    [Fact]
    public void Rank_acceptability_prints_each_alternatives_overall_acceptability_and_confidence_at_its_central_weights()
    {
        var acceptability = SampleRecords.BusStop.Robustness.Sensitivity.Acceptability;
        Assert.Contains(PdfText.Squeeze("First: 95% interval Overall"), Text.Squeezed);
        Assert.Contains(PdfText.Squeeze("Confidence at its central weights"), Text.Squeezed);
        var top = acceptability.Alternatives.MaxBy(a => a.Ranks[0])!;
        var interval = $"{Percent(top.Intervals[0].Low)}–{Percent(top.Intervals[0].High)}";
        Assert.Contains(PdfText.Squeeze(interval + Percent(top.Holistic)), Text.Squeezed);
        var central = acceptability.CentralWeights.Single(c => c.Alternative == top.Alternative);
        Assert.Contains(PdfText.Squeeze(Percent(central.Confidence)), Text.Squeezed);
    }

    private static string Signed(double value, int decimals) =>
        (value >= 0 ? "+" : "−") + Math.Abs(value).ToString("F" + decimals, CultureInfo.InvariantCulture);

    private static string Percent(double share) => (share * 100).ToString("F1", CultureInfo.InvariantCulture) + "%";
}
