using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Tests.Support;
using FsCheck.Xunit;

namespace Decide.Core.Tests.Properties;

/// <summary>
/// An alternative at least as good as another on every criterion, by each assessor's rating and by every numeric
/// value (with its direction), never ranks below it.
/// </summary>
[Properties(Arbitrary = [typeof(DecideArbitraries)])]
public sealed class DominancePropertyTests
{
    [Property]
    public void A_dominating_alternative_never_ranks_below_the_one_it_dominates(GeneratedEvaluation generated)
    {
        var random = new Random(generated.Seed);
        var alternatives = generated.Evaluation.Alternatives;
        var better = alternatives[random.Next(alternatives.Count)].Id;
        var worse = alternatives.Where(a => a.Id != better).ElementAt(random.Next(alternatives.Count - 1)).Id;
        var evaluation = Dominate(generated.Evaluation, better, worse, random);

        var ranking = DecisionEngine.Analyze(evaluation).Ranking;
        var b = ranking.Single(r => r.Alternative == better);
        var w = ranking.Single(r => r.Alternative == worse);
        Assert.True(b.Rank <= w.Rank, $"{better} (rank {b.Rank}, CC {b.Closeness}) dominates {worse} (rank {w.Rank}, CC {w.Closeness})");
    }

    /// <summary>
    /// Rewrites <paramref name="better"/>'s inputs so that it dominates <paramref name="worse"/>: wherever an assessor
    /// rated <paramref name="worse"/>, they rate <paramref name="better"/> the same or higher; where they declined it,
    /// they decline <paramref name="better"/> too (the same raters, so renormalisation treats both alike). Numeric values
    /// become the same or better in the criterion's direction. Everything else is left as generated.
    /// </summary>
    private static Evaluation Dominate(Evaluation e, string better, string worse, Random random)
    {
        var scale = e.RatingScale;
        var ofWorse = e.Ratings.Where(r => r.Alternative == worse).ToDictionary(r => (r.Assessor, r.Criterion));
        var ratings = e.Ratings.Select(r =>
        {
            if (r.Alternative != better)
            {
                return r;
            }

            var other = ofWorse[(r.Assessor, r.Criterion)];
            if (other.Term is null)
            {
                return r with { Term = null, Declined = other.Declined };
            }

            scale.TryFind(other.Term, out var floor);
            return r with { Term = scale[random.Next(floor, scale.Count)].Code, Declined = null };
        }).ToArray();

        var direction = e.Criteria.ToDictionary(c => c.Id, c => c.Direction);
        var worseValues = e.Values.Where(v => v.Alternative == worse).ToDictionary(v => v.Criterion, v => v.Value);
        var values = e.Values.Select(v =>
        {
            if (v.Alternative != better)
            {
                return v;
            }

            var other = worseValues[v.Criterion];
            var step = random.Next(3) * 50; // sometimes equal, sometimes better
            return v with { Value = direction[v.Criterion] == Direction.Benefit ? other + step : Math.Max(1, other - step) };
        }).ToArray();

        return e with { Ratings = ratings, Values = values };
    }
}
