using Decide.Core.Consistency;
using Decide.Core.Tests.Support;

namespace Decide.Core.Tests.Consistency;

public sealed class RandomIndexTests
{
    [Theory]
    // Saaty (1980), The Analytic Hierarchy Process, McGraw-Hill [recalled; widely reproduced];
    // the table prints two decimals and is compared exactly.
    [InlineData(3, 0.58)]
    [InlineData(4, 0.90)]
    [InlineData(5, 1.12)]
    [InlineData(6, 1.24)]
    [InlineData(7, 1.32)]
    [InlineData(8, 1.41)]
    [InlineData(9, 1.45)]
    [InlineData(10, 1.49)]
    public void Holds_saatys_random_index(int n, double ri)
    {
        Assert.Equal(ri, RandomIndex.For(n));
    }

    [Fact]
    public void Orders_one_and_two_have_no_random_inconsistency()
    {
        Assert.Equal(0, RandomIndex.For(1));
        Assert.Equal(0, RandomIndex.For(2));
    }

    [Theory]
    [InlineData(0)]
    [InlineData(11)]
    [InlineData(15)]
    public void Orders_outside_the_table_are_refused(int n)
    {
        // No sourced value above n = 10, so none is offered (the validator refuses larger matrices).
        Assert.Equal(10, RandomIndex.MaxOrder);
        Assert.Throws<ArgumentOutOfRangeException>(() => RandomIndex.For(n));
    }

    [Fact]
    public void A_matrix_of_eleven_items_gets_no_consistency_ratio()
    {
        Assert.Throws<ArgumentOutOfRangeException>(
            () => PairwiseConsistency.Analyse(ReciprocalMatrices.RandomSaaty(11, new Random(11)), ReciprocalMatrices.Items(11)));
    }

    [Theory]
    // Saaty (1994), Fundamentals of Decision Making and Priority Theory [recalled].
    [InlineData(3, 0.05)]
    [InlineData(4, 0.08)]
    [InlineData(5, 0.10)]
    [InlineData(9, 0.10)]
    public void Acceptable_ratio_is_stricter_for_small_matrices(int n, double threshold)
    {
        Assert.Equal(threshold, RandomIndex.Threshold(n));
    }

    [Theory]
    // Aguarón & Moreno-Jiménez (2003), EJOR 147:137–145 [recalled].
    [InlineData(3, 0.31)]
    [InlineData(4, 0.35)]
    [InlineData(5, 0.37)]
    [InlineData(12, 0.37)]
    public void Acceptable_gci_depends_on_the_order(int n, double threshold)
    {
        Assert.Equal(threshold, RandomIndex.GciThreshold(n));
    }

    [Fact]
    public void Every_report_records_the_table_and_thresholds_used()
    {
        var report = PairwiseConsistency.Analyse(ReciprocalMatrices.RandomSaaty(5, new Random(5)), ReciprocalMatrices.Items(5));
        Assert.Equal(RandomIndex.TableName, report.RandomIndexTable);
        Assert.Equal("Saaty (1980), n = 3–10", report.RandomIndexTable);
        Assert.Equal(1.12, report.RandomIndex);
        Assert.Equal(0.10, report.Threshold);
        Assert.Equal(0.37, report.GciThreshold);
    }
}
