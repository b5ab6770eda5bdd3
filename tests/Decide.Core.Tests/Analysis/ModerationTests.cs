using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Scales;
using Decide.Core.Tests.Published;

namespace Decide.Core.Tests.Analysis;

public sealed class ModerationTests
{
    [Fact]
    public void A_moderated_term_replaces_the_aggregate_of_its_cell_and_nothing_else()
    {
        var original = Chen2000WorkedExample.Build();
        var moderated = original with { Moderated = [new ModeratedRating("A1", "C5", "G", "panel agreed the references show steady self-confidence", ["D1", "D2"])] };
        var before = DecisionEngine.Analyse(original).Matrix;
        var after = DecisionEngine.Analyse(moderated).Matrix;

        var cell = after.Single(c => c.Alternative == "A1" && c.Criterion == "C5");
        Assert.Equal(BuiltInScales.ChenRating7[5].Value, cell.Aggregated); // G = (7, 9, 10)
        Assert.Equal("G", cell.Moderated);
        Assert.Equal(3, cell.Raters); // the individual ratings are kept
        Assert.All(after.Where(c => c != cell), c => Assert.Equal(before.Single(b => b.Alternative == c.Alternative && b.Criterion == c.Criterion).Aggregated, c.Aggregated));
    }

    [Fact]
    public void A_cell_everyone_declined_can_be_ranked_once_the_panel_has_moderated_it()
    {
        var evaluation = Chen2000WorkedExample.Build();
        evaluation = evaluation with
        {
            Ratings = evaluation.Ratings.Select(r => r.Alternative == "A3" && r.Criterion == "C1" ? r with { Term = null, Declined = "recused" } : r).ToArray(),
        };
        Assert.Throws<InvalidEvaluationException>(() => DecisionEngine.Analyse(evaluation));
        var agreed = evaluation with { Moderated = [new ModeratedRating("A3", "C1", "G", "consensus from the interview notes")] };
        Assert.Equal(3, DecisionEngine.Analyse(agreed).Ranking.Count);
    }

    [Theory]
    [InlineData("AX", "C1", "G", "why", "$.moderation.AX", "unknown alternative")]
    [InlineData("A1", "C9", "G", "why", "$.moderation.A1.C9", "unknown criterion")]
    [InlineData("A1", "C1", "XG", "why", "$.moderation.A1.C1.term", "unknown term")]
    [InlineData("A1", "C1", "G", " ", "$.moderation.A1.C1.reason", "needs the reason")]
    public void Bad_moderation_is_reported_by_place(string alternative, string criterion, string term, string reason, string path, string words)
    {
        var evaluation = Chen2000WorkedExample.Build() with { Moderated = [new ModeratedRating(alternative, criterion, term, reason)] };
        var error = Assert.Single(EvaluationValidator.Validate(evaluation));
        Assert.Equal(path, error.Path);
        Assert.Contains(words, error.Reason);
    }

    [Fact]
    public void A_cell_moderated_twice_is_refused()
    {
        var evaluation = Chen2000WorkedExample.Build() with
        {
            Moderated = [new ModeratedRating("A1", "C1", "G", "first"), new ModeratedRating("A1", "C1", "F", "second")],
        };
        Assert.Contains(EvaluationValidator.Validate(evaluation), e => e.Path == "$.moderation.A1.C1" && e.Reason.Contains("twice", StringComparison.Ordinal));
    }
}
