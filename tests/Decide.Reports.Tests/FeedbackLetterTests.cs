using Decide.Reports.Feedback;

namespace Decide.Reports.Tests;

public sealed class FeedbackLetterTests
{
    [Fact]
    public void A_losing_suppliers_letter_names_it_and_the_winner_and_no_other_supplier()
    {
        var file = SampleRecords.BusStopFile();
        var content = SampleRecords.BusStop;
        var winner = content.Analysis.Ranking[0].Alternative;
        var recipient = content.Analysis.Ranking[^1].Alternative;
        var others = file.Evaluation.Alternatives.Where(a => a.Id != winner && a.Id != recipient).ToArray();
        // A rationale on the recipient's bid that names another supplier: the letter must not repeat that name.
        var other = others[0];
        var rating = file.Evaluation.Ratings.First(r => r.Alternative == recipient && r.Term is not null);
        var evaluation = SampleRecords.WithRationale(file.Evaluation, rating.Assessor, recipient, rating.Criterion, $"Weaker than {other.Name} on this point.");
        var letterContent = SampleRecords.Build(file with { Evaluation = evaluation }, draws: 0);

        var text = PdfText.Of(SupplierFeedbackLetter.Render(letterContent, recipient)).Squeezed;

        var names = file.Evaluation.Alternatives.ToDictionary(a => a.Id, a => a.Name);
        Assert.Contains(PdfText.Squeeze(names[recipient]), text);
        Assert.Contains(PdfText.Squeeze(names[winner]), text);
        Assert.Contains(PdfText.Squeeze("Weaker than " + SupplierFeedbackLetter.OtherBidder), text);
        Assert.All(others, o =>
        {
            Assert.DoesNotContain(PdfText.Squeeze(o.Name), text, StringComparison.OrdinalIgnoreCase);
            Assert.DoesNotContain(o.Id, text, StringComparison.OrdinalIgnoreCase);
        });
    }

    [Fact]
    public void The_letter_carries_the_recipients_and_the_winners_rationales_and_not_the_others()
    {
        var content = SampleRecords.BusStop;
        var winner = content.Analysis.Ranking[0].Alternative;
        var recipient = content.Analysis.Ranking[1].Alternative;

        var text = PdfText.Of(SupplierFeedbackLetter.Render(content, recipient)).Squeezed;

        var ratings = content.Evaluation.Ratings.Where(r => r.Rationale is { Length: > 30 }).ToArray();
        Assert.Contains(ratings, r => r.Alternative == recipient);
        foreach (var r in ratings)
        {
            var rationale = PdfText.Squeeze(r.Rationale!);
            var printed = text.Contains(rationale, StringComparison.Ordinal);
            Assert.True(printed == (r.Alternative == recipient || r.Alternative == winner) || r.Rationale!.Contains(SupplierFeedbackLetter.OtherBidder, StringComparison.Ordinal),
                $"rationale on {r.Alternative} printed: {printed}");
        }
    }

    [Fact]
    public void An_excluded_suppliers_letter_gives_the_gate_it_failed_and_no_scores()
    {
        var content = SampleRecords.BusStop;
        var excluded = Assert.Single(content.Analysis.Excluded);
        var note = content.Evaluation.Gates.Single(g => g.Alternative == excluded.Alternative && !g.Passed).Note!;

        var text = PdfText.Of(SupplierFeedbackLetter.Render(content, excluded.Alternative)).Squeezed;

        Assert.Contains(PdfText.Squeeze("did not meet a pass/fail requirement"), text);
        Assert.Contains(PdfText.Squeeze(note), text);
        Assert.DoesNotContain("Scoresbycriterion", text);
        Assert.All(content.Evaluation.Alternatives.Where(a => a.Id != excluded.Alternative), a => Assert.DoesNotContain(PdfText.Squeeze(a.Name), text));
    }

    [Fact]
    public void An_unknown_supplier_is_refused_with_the_known_ids()
    {
        var ex = Assert.Throws<ArgumentException>(() => SupplierFeedbackLetter.Render(SampleRecords.BusStop, "nobody"));

        Assert.Contains("'nobody' is not an alternative", ex.Message);
    }

    [Fact]
    public void Under_a_points_award_the_letter_shows_the_bidders_and_the_winners_points_per_criterion_as_published()
    {
        // samples/park-grounds-points.json, worked with a calculator: Brackenridge method (8 + 8 + 9) / 3 = 8.33 → 20.83 of
        // 25; Cobble Hill (the winner) 8.67 → 21.67; totals 75.44 and 76.83.
        var file = Interchange.EvaluationFileReader.ReadFile(Path.Combine(SampleRecords.Root, "samples", "park-grounds-points.json"));
        var content = SampleRecords.Build(file, draws: 0);

        var text = PdfText.Of(SupplierFeedbackLetter.Render(content, "brackenridge")).Squeezed;

        Assert.Contains(PdfText.Squeeze("Method statement and seasonal programme (25) 8.33 → 20.83 points 8.67 → 21.67 points"), text);
        Assert.Contains(PdfText.Squeeze("Total 75.44 76.83"), text);
        Assert.Contains(PdfText.Squeeze("Cobble Hill Horticulture"), text);
        Assert.Contains(PdfText.Squeeze("Very good (8)"), text);
        Assert.DoesNotContain(PdfText.Squeeze("Quickcut"), text, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain(PdfText.Squeeze("Aldergate"), text, StringComparison.OrdinalIgnoreCase);
    }

    [Fact]
    public void A_bid_excluded_by_a_threshold_is_told_which_and_shown_its_quality_points()
    {
        var file = Interchange.EvaluationFileReader.ReadFile(Path.Combine(SampleRecords.Root, "samples", "park-grounds-points.json"));
        var text = PdfText.Of(SupplierFeedbackLetter.Render(SampleRecords.Build(file, draws: 0), "fernbrook")).Squeezed;

        Assert.Contains(PdfText.Squeeze("took no part in the award: below a criterion's minimum"), text);
        Assert.Contains(PdfText.Squeeze("Quality points 21.83"), text);
    }
}
