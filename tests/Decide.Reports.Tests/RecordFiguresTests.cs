using System.Globalization;
using Decide.Core.Analysis;

namespace Decide.Reports.Tests;

public sealed class RecordFiguresTests
{
    private static readonly PdfText Text = PdfText.Of(SampleRecords.SignedBusStop);

    [Fact]
    public void Every_ranked_alternative_is_printed_with_the_engines_closeness_and_distances_to_four_decimals()
    {
        var content = SampleRecords.BusStop;
        // An independent run of the engine on the same evaluation: the record must print these numbers.
        var engine = DecisionEngine.Analyse(content.Evaluation);
        var names = content.Evaluation.Alternatives.ToDictionary(a => a.Id, a => a.Name);
        Assert.NotEmpty(engine.Ranking);
        foreach (var r in engine.Ranking)
        {
            var row = PdfText.Squeeze(r.Rank.ToString(CultureInfo.InvariantCulture) + names[r.Alternative]
                + r.Closeness.ToString("F4", CultureInfo.InvariantCulture)
                + r.DPlus.ToString("F4", CultureInfo.InvariantCulture)
                + r.DMinus.ToString("F4", CultureInfo.InvariantCulture));
            Assert.Contains(row, Text.Squeezed);
        }
    }

    [Fact]
    public void The_ranking_table_lists_the_alternatives_in_the_engines_order()
    {
        var content = SampleRecords.BusStop;
        var engine = DecisionEngine.Analyse(content.Evaluation);
        var names = content.Evaluation.Alternatives.ToDictionary(a => a.Id, a => a.Name);
        var text = Text.Squeezed;
        var table = text.IndexOf(PdfText.Squeeze("Rank Alternative Closeness CC"), StringComparison.Ordinal);
        Assert.True(table >= 0, "the ranking table header is printed");
        var positions = engine.Ranking.Select(r => text.IndexOf(PdfText.Squeeze(names[r.Alternative] + r.Closeness.ToString("F4", CultureInfo.InvariantCulture)), table, StringComparison.Ordinal)).ToArray();
        Assert.All(positions, p => Assert.True(p > table));
        Assert.Equal(positions.Order().ToArray(), positions);
    }

    [Fact]
    public void The_summary_names_the_recommended_alternative_and_its_margin_over_the_next()
    {
        var ranking = SampleRecords.BusStop.Analysis.Ranking;
        var names = SampleRecords.BusStop.Evaluation.Alternatives.ToDictionary(a => a.Id, a => a.Name);
        var summary = PdfText.Squeeze(Text.Pages[1]);
        Assert.Contains(PdfText.Squeeze("Highest-ranked alternative: " + names[ranking[0].Alternative]), summary);
        Assert.Contains(PdfText.Squeeze("a margin of " + (ranking[0].Closeness - ranking[1].Closeness).ToString("F4", CultureInfo.InvariantCulture)), summary);
        Assert.Contains(PdfText.Squeeze(SampleRecords.BusStop.Robustness.Summary[0]), summary);
    }

    [Fact]
    public void Every_criterion_weight_share_is_printed_as_the_engine_computed_it()
    {
        var content = SampleRecords.BusStop;
        var criteria = content.Evaluation.Criteria.ToDictionary(c => c.Id, c => c.Name);
        foreach (var w in content.Analysis.Weights)
        {
            Assert.Contains(PdfText.Squeeze(RecordText.Tfn(w.Fuzzy) + (w.Crisp * 100).ToString("F1", CultureInfo.InvariantCulture) + "%"), Text.Squeezed);
            Assert.Contains(PdfText.Squeeze(criteria[w.Criterion]), Text.Squeezed);
        }
    }

    [Fact]
    public void Every_page_carries_its_number_the_reference_and_the_fingerprint()
    {
        var content = SampleRecords.BusStop;
        var count = Text.Pages.Count;
        Assert.True(count > 10, $"the demo record should run to many pages; got {count}");
        for (var i = 0; i < count; i++)
        {
            var page = PdfText.Squeeze(Text.Pages[i]);
            Assert.Contains($"Page{i + 1}of{count}", page);
            Assert.Contains(content.Identity.Reference, page);
            Assert.Contains(content.Fingerprint, page);
        }
    }

    [Fact]
    public void The_cover_and_the_sign_off_page_carry_the_cautions()
    {
        var caution = PdfText.Squeeze(RecordText.Cautions[0]);
        var law = PdfText.Squeeze(RecordText.Cautions[1]);
        Assert.Contains(caution, PdfText.Squeeze(Text.Pages[0]));
        Assert.Contains(law, PdfText.Squeeze(Text.Pages[0]));
        var signOff = Text.Pages.Select(PdfText.Squeeze).Single(p => p.StartsWith("9Sign-off", StringComparison.Ordinal));
        Assert.Contains(caution, signOff);
        Assert.Contains(law, signOff);
        Assert.Contains(PdfText.Squeeze(SampleRecords.BusStop.Approvals[0].Statement), signOff);
    }

    [Fact]
    public void The_self_signed_note_is_printed()
    {
        Assert.Contains(PdfText.Squeeze("proves the file is unchanged since signing, not who signed it"), Text.Squeezed);
    }

    [Fact]
    public void Every_rationale_of_every_assessor_is_in_the_appendix()
    {
        var ratings = SampleRecords.BusStop.Evaluation.Ratings;
        Assert.NotEmpty(ratings);
        foreach (var rating in ratings)
        {
            Assert.Contains(PdfText.Squeeze(rating.Rationale ?? rating.Declined!), Text.Squeezed);
        }
    }

    [Fact]
    public void No_letter_is_drawn_outside_the_page()
    {
        Assert.All(Text.Bounds, b =>
        {
            Assert.True(b.MaxRight <= b.Width - 40, $"a letter ends at {b.MaxRight:F1} on a page {b.Width:F1} wide");
            Assert.True(b.MinLeft >= 40, $"a letter starts at {b.MinLeft:F1}");
        });
    }
}
