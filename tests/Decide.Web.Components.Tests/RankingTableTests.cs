using System.Globalization;
using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Web.Components.Pages.Results;
using Decide.Web.Components.Tests.Support;

namespace Decide.Web.Components.Tests;

public sealed class RankingTableTests : MudComponentTest
{
    private static readonly ResultNames Names = new(
        [new Alternative("north", "Northgate Signs"), new Alternative("east", "Eastbrook Media"), new Alternative("west", "Westfold Displays")],
        [], []);

    [Fact]
    public void Rows_follow_the_rank_whatever_order_the_ranking_arrives_in_and_show_each_closeness()
    {
        // Given out of order on purpose: the table must put rank 1 first.
        RankedAlternative[] ranking =
        [
            Ranked("west", 3, 0.2811, 5.9, 2.3),
            Ranked("north", 1, 0.3876, 5.1, 3.2),
            Ranked("east", 2, 0.3663, 5.2, 3.0),
        ];

        var cut = Render<RankingTable>(p => p.Add(x => x.Ranking, ranking).Add(x => x.Names, Names));

        var rows = cut.FindAll("tbody tr");
        Assert.Equal(["north", "east", "west"], rows.Select(r => r.GetAttribute("data-alternative")));
        var expected = ranking.OrderBy(r => r.Rank).ToArray();
        for (var i = 0; i < rows.Count; i++)
        {
            var cells = rows[i].QuerySelectorAll("td").Select(c => c.TextContent.Trim()).ToArray();
            Assert.Equal(expected[i].Rank.ToString(CultureInfo.InvariantCulture), cells[0]);
            Assert.Equal(Names.Alternative(expected[i].Alternative), cells[1]);
            Assert.Equal(expected[i].Closeness.ToString("F4", CultureInfo.InvariantCulture), cells[2]);
        }
    }

    [Fact]
    public void Bids_tied_on_rank_are_listed_by_closeness_within_the_tie()
    {
        RankedAlternative[] ranking = [Ranked("east", 1, 0.35000001, 5, 3), Ranked("north", 1, 0.35000002, 5, 3), Ranked("west", 3, 0.2, 6, 2)];

        var cut = Render<RankingTable>(p => p.Add(x => x.Ranking, ranking).Add(x => x.Names, Names));

        Assert.Equal(["north", "east", "west"], cut.FindAll("tbody tr").Select(r => r.GetAttribute("data-alternative")));
    }

    private static RankedAlternative Ranked(string id, int rank, double closeness, double dPlus, double dMinus) =>
        new(id, rank, closeness, dPlus, dMinus, []);
}
