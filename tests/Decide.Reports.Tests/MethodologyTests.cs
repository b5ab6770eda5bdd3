using Decide.Core.Award;
using Decide.Interchange;
using Decide.Reports.Methodology;

namespace Decide.Reports.Tests;

/// <summary>
/// The methodology for the tender pack, made from the points sample's plan (samples/park-grounds-points.json). The
/// worked example is checked against the lowest-price ratio worked by hand from its definition
/// (S = Smax × Pmin / P; Stilger, Siderius &amp; van Raaij 2017): quality 60 × 0.80 = 48 plus 40 × 88,000 / 100,000 = 35.2
/// gives 83.2; 39 + 40 = 79; 54 + 40 × 88,000 / 125,000 = 82.16.
/// </summary>
public sealed class MethodologyTests
{
    private static MethodologyInput Input(Func<Core.Model.Evaluation, Core.Model.Evaluation>? edit = null)
    {
        var file = EvaluationFileReader.ReadFile(Path.Combine(SampleRecords.Root, "samples", "park-grounds-points.json"));
        var plan = file.PlanOnly().Evaluation;
        return new MethodologyInput(edit?.Invoke(plan) ?? plan,
            file.Metadata.Reference, file.Metadata.Organisation, file.Metadata.CriterionDescriptions ?? new Dictionary<string, string>());
    }

    [Fact]
    public void The_text_states_the_points_the_scale_the_formula_and_a_worked_example_a_bidder_can_redo()
    {
        var text = MethodologyDocument.Text(Input());
        Assert.Contains("Method statement and seasonal programme | Quality |", text, StringComparison.Ordinal);
        Assert.Contains("| 25 | 25 %", text, StringComparison.Ordinal);
        Assert.Contains("Total 100 points; groups: Quality 60.", text, StringComparison.Ordinal);
        Assert.Contains("Outstanding (10) | 10 | Meets the requirement fully and adds value", text, StringComparison.Ordinal);
        Assert.Contains("Lowest-price ratio: S = Smax × Pmin / P, with Smax = 40 points.", text, StringComparison.Ordinal);
        Assert.Contains("Example bid A | 48 | 100,000 | 35.2 | 83.2 | 1", text, StringComparison.Ordinal);
        Assert.Contains("Example bid B | 39 | 88,000 | 40 | 79 | 3", text, StringComparison.Ordinal);
        Assert.Contains("Example bid C | 54 | 125,000 | 28.16 | 82.16 | 2", text, StringComparison.Ordinal);
        Assert.Contains("at least 50 % of all quality points", text, StringComparison.Ordinal);
        Assert.Contains("Two stages: prices stay sealed", text, StringComparison.Ordinal);
        Assert.Contains("the higher quality points, then the lower price, then the earlier submission", text, StringComparison.Ordinal);
        Assert.Contains("does not replace, the panel's documented judgement", text, StringComparison.Ordinal);
    }

    [Fact]
    public void The_fingerprint_is_the_same_for_the_same_plan_and_changes_with_any_published_rule()
    {
        var fingerprint = MethodologyDocument.Fingerprint(Input());
        Assert.Matches("^[0-9a-f]{64}$", fingerprint);
        Assert.Equal(fingerprint, MethodologyDocument.Fingerprint(Input()));

        var otherFormula = MethodologyDocument.Fingerprint(Input(e => e with { Award = e.Award! with { Formula = PriceFormula.LinearFromLowest } }));
        var otherThreshold = MethodologyDocument.Fingerprint(Input(e => e with { Award = e.Award! with { MinimumQualityShare = 0.55 } }));
        Assert.NotEqual(fingerprint, otherFormula);
        Assert.NotEqual(fingerprint, otherThreshold);
    }

    [Fact]
    public void The_pdf_prints_the_same_content_and_carries_the_fingerprint_in_its_footer()
    {
        var input = Input();
        var pdf = PdfText.Of(MethodologyDocument.Pdf(input, SampleRecords.At));
        Assert.Contains(PdfText.Squeeze("Evaluation methodology: Grounds maintenance of six district parks"), pdf.Squeezed);
        Assert.Contains(PdfText.Squeeze("Example bid C 54 125,000 28.16 82.16 2"), pdf.Squeezed);
        Assert.Contains(MethodologyDocument.Fingerprint(input), pdf.Squeezed);
    }
}
