using Decide.Core.Award;

namespace Decide.Core.Tests.Award;

/// <summary>Published crisp weights: the example (quality 60 = technical 30 + service 20 + risk 10; price 40) and the mistakes a plan can make.</summary>
public sealed class PublishedWeightsTests
{
    private static PublishedWeights Example(double service = 20, double price = 40, double total = 100) => new(
        total,
        new Dictionary<string, double> { ["quality"] = 60 },
        [new("technical", 30, "quality"), new("service", service, "quality"), new("risk", 10, "quality"), new("price", price)]);

    [Fact]
    public void Consistent_points_validate_and_give_each_criterion_its_share_of_the_total()
    {
        var weights = Example();
        Assert.Empty(weights.Validate());
        Close.All([0.3, 0.2, 0.1, 0.4], weights.Shares());
    }

    [Fact]
    public void A_group_whose_criteria_do_not_add_up_is_refused_at_the_group_with_the_sum_shown()
    {
        var errors = Example(service: 25).Validate();
        var error = Assert.Single(errors);
        Assert.Equal("$.publishedWeights.groups.quality", error.Path);
        Assert.Contains("add up to 65", error.Reason);
    }

    [Fact]
    public void A_top_level_that_misses_the_stated_total_is_refused_at_the_total()
    {
        var error = Assert.Single(Example(price: 30).Validate());
        Assert.Equal("$.publishedWeights.total", error.Path);
        Assert.Contains("90", error.Reason);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(-5)]
    [InlineData(double.NaN)]
    public void A_criterion_without_positive_points_is_refused_by_its_place(double points)
    {
        var errors = Example(service: points).Validate();
        Assert.Contains(errors, e => e.Path == "$.publishedWeights.criteria.service");
    }

    [Fact]
    public void A_criterion_in_a_group_without_points_and_a_group_without_criteria_are_both_named()
    {
        var unknown = new PublishedWeights(100, new Dictionary<string, double>(), [new("a", 100, "ghost")]).Validate();
        Assert.Contains(unknown, e => e.Path == "$.publishedWeights.criteria.a" && e.Reason.Contains("ghost"));

        var empty = new PublishedWeights(100, new Dictionary<string, double> { ["idle"] = 10 }, [new("a", 90)]).Validate();
        Assert.Contains(empty, e => e.Path == "$.publishedWeights.groups.idle");
    }
}
