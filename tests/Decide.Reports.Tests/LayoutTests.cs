using Decide.Reports.Layout;
using Decide.Reports.Signing;

namespace Decide.Reports.Tests;

public sealed class LayoutTests
{
    [Fact]
    public void A_rationale_longer_than_a_page_is_printed_whole_and_stays_inside_the_margins()
    {
        var file = SampleRecords.BusStopFile();
        var rating = file.Evaluation.Ratings.First(r => r.Term is not null);
        // 700 distinct numbered words: far more than one page of a table cell holds.
        var words = Enumerable.Range(1, 700).Select(i => $"point{i}").ToArray();
        var evaluation = SampleRecords.WithRationale(file.Evaluation, rating.Assessor, rating.Alternative, rating.Criterion, string.Join(' ', words) + " " + new string('x', 400));
        var text = PdfText.Of(EvaluationRecordDocument.Render(SampleRecords.Build(file with { Evaluation = evaluation }, draws: 0)));

        var all = text.Squeezed;
        var at = 0;
        foreach (var word in words)
        {
            var found = all.IndexOf(word + (word == words[^1] ? "" : ""), at, StringComparison.Ordinal);
            Assert.True(found >= 0, $"{word} is printed, after the words before it");
            at = found + word.Length;
        }

        Assert.Contains(new string('x', 400), all);
        Assert.All(text.Bounds, b => Assert.True(b.MaxRight <= b.Width - 40, $"a letter ends at {b.MaxRight:F1}"));
    }

    [Fact]
    public void A_table_that_spans_pages_repeats_its_header_on_each()
    {
        var text = PdfText.Of(SampleRecords.SignedBusStop);
        // The appendix table of each assessor's ratings: every page that holds rationales starts its table with the header.
        var header = PdfText.Squeeze("Alternative Criterion Term Rationale");
        var rationale = SampleRecords.BusStop.Evaluation.Ratings.Where(r => r.Rationale is not null).ToArray();
        var pagesWithRationales = text.Pages.Select(PdfText.Squeeze)
            .Where(p => rationale.Any(r => p.Contains(PdfText.Squeeze(r.Rationale!)[..Math.Min(40, PdfText.Squeeze(r.Rationale!).Length)], StringComparison.Ordinal)))
            .ToArray();
        Assert.True(pagesWithRationales.Length >= 3, $"the appendix spans several pages; found {pagesWithRationales.Length}");
        Assert.All(pagesWithRationales, p => Assert.Contains(header, p));
    }

    [Fact]
    public void Right_to_left_runs_are_laid_out_from_the_right_and_keep_their_logical_order()
    {
        var runs = BidiText.VisualRuns("שלום world");

        // A paragraph that starts with Hebrew is right-to-left: the Latin run comes first from the left.
        Assert.Equal(["world", "שלום "], runs.Select(r => r.Text));
        Assert.Equal([false, true], runs.Select(r => r.RightToLeft));
    }

    [Fact]
    public void Left_to_right_text_with_an_embedded_hebrew_word_keeps_its_run_order()
    {
        var runs = BidiText.VisualRuns("Bid by שלום Ltd");

        Assert.Equal(["Bid by ", "שלום", " Ltd"], runs.Select(r => r.Text));
        Assert.Equal([false, true, false], runs.Select(r => r.RightToLeft));
    }

    [Fact]
    public void Text_without_right_to_left_letters_is_one_run()
    {
        Assert.False(BidiText.HasRightToLeft("<b>Acme</b> & Sons"));
        Assert.Single(BidiText.VisualRuns("<b>Acme</b> & Sons"));
    }
}
