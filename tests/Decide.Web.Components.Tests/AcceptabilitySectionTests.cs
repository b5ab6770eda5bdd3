using Decide.Core.Model;
using Decide.Core.Robustness;
using Decide.Web.Components.Pages.Results;
using Decide.Web.Components.Tests.Support;

namespace Decide.Web.Components.Tests;

/// <summary>The rank acceptability section shows each bid's overall acceptability and its confidence at its own weights.</summary>
public sealed class AcceptabilitySectionTests : MudComponentTest
{
    [Fact]
    public void Each_bid_shows_its_overall_acceptability_and_how_often_it_is_still_first_at_its_central_weights()
    {
        // Figures as SMAA-2 defines them for two bids that split the draws 60/40: overall = 1·b¹ + 0·b² (linear
        // meta-weights), so 60% and 40%; the second bid's confidence at its own weights is 70% here.
        var acceptability = new AcceptabilityResult(1000, 7, AcceptabilityWeights.Uniform,
        [
            new RankAcceptability("north", [0.6, 0.4], [new(0.57, 0.63), new(0.37, 0.43)], 0.6),
            new RankAcceptability("south", [0.4, 0.6], [new(0.37, 0.43), new(0.57, 0.63)], 0.4),
        ],
        [
            new CentralWeightVector("north", ["quality", "price"], [0.7, 0.3], 1.0),
            new CentralWeightVector("south", ["quality", "price"], [0.3, 0.7], 0.7),
        ]);
        var names = ResultNames.Of(new Evaluation
        {
            Title = "t",
            Criteria = [new Criterion("quality", "Quality"), new Criterion("price", "Price", CriterionKind.Numeric, Direction.Cost)],
            Alternatives = [new Alternative("north", "Northgate Ltd"), new Alternative("south", "Southmere Ltd")],
            Assessors = [new Assessor("a", "A")],
        });

        var cut = Render<AcceptabilitySection>(p => p.Add(x => x.Acceptability, acceptability).Add(x => x.Order, ["north", "south"]).Add(x => x.Names, names));

        Assert.Equal(["60.0%", "40.0%"], cut.FindAll("[data-testid=holistic]").Select(c => c.TextContent.Replace(" ", "").Trim()));
        Assert.Equal(["100.0%", "70.0%"], cut.FindAll("[data-testid=confidence]").Select(c => c.TextContent.Replace(" ", "").Trim()));
        Assert.Contains("Still first at its own weights", cut.Markup, StringComparison.Ordinal);
    }
}
