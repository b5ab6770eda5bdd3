using Decide.Core.Analysis;
using Decide.Core.Model;

namespace Decide.Core.Tests.Published;

/// <summary>
/// Chen's (2000) worked example analysed with extreme ideal points (per criterion, the largest upper and smallest
/// lower weighted value) instead of the paper's (1, 1, 1) and (0, 0, 0). The paper does not use these points, so
/// nothing here is published: the expectation is derived — the ranking A2 &gt; A3 &gt; A1 should not depend on that
/// choice for this example, while the closeness values themselves do.
/// </summary>
public sealed class Chen2000ExtremeIdealPoints
{
    [Fact]
    public void Extreme_ideal_points_keep_the_papers_ranking_order()
    {
        var result = DecisionEngine.Analyse(Chen2000WorkedExample.Build(IdealPoints.Extreme));
        Assert.Equal(IdealPoints.Extreme, result.Options.Ideal);
        Assert.Equal(["A2", "A3", "A1"], result.Ranking.Select(r => r.Alternative));
        Assert.Equal([1, 2, 3], result.Ranking.Select(r => r.Rank));
    }

    [Fact]
    public void Extreme_ideal_points_measure_from_closer_references_than_the_unit_points()
    {
        var unit = DecisionEngine.Analyse(Chen2000WorkedExample.Build(IdealPoints.Unit)).Ranking.ToDictionary(r => r.Alternative);
        var extreme = DecisionEngine.Analyse(Chen2000WorkedExample.Build(IdealPoints.Extreme)).Ranking;

        // The extreme points lie inside [0, 1], nearer every weighted rating than (1, 1, 1) and (0, 0, 0) are.
        Assert.All(extreme, r =>
        {
            Assert.True(r.DPlus < unit[r.Alternative].DPlus, $"{r.Alternative}: d⁺ {r.DPlus} vs {unit[r.Alternative].DPlus}");
            Assert.True(r.DMinus < unit[r.Alternative].DMinus, $"{r.Alternative}: d⁻ {r.DMinus} vs {unit[r.Alternative].DMinus}");
            Assert.InRange(r.Closeness, 0, 1);
        });
    }
}
