using BenchmarkDotNet.Attributes;
using Decide.Core.Award;

namespace Decide.Benchmarks;

/// <summary>
/// The points award (<see cref="PointsAward.Compute"/>: quality points, thresholds, abnormally low flags, the price
/// formula, totals and tie-breaks) for the typical panel's 8 bids × 12 criteria, and a large tender of 100 bids × 60
/// criteria, under a relative, an absolute and a figure-ranked price formula.
/// </summary>
[MemoryDiagnoser]
[MinColumn]
[MedianColumn]
public class AwardBenchmarks
{
    private AwardPlan _plan = null!;
    private AwardBid[] _bids = null!;

    /// <summary>Bids × criteria.</summary>
    [Params("8x12", "100x60")]
    public string Size { get; set; } = "8x12";

    /// <summary>The price formula.</summary>
    [Params(PriceFormula.LowestPriceRatio, PriceFormula.BudgetBased, PriceFormula.ValueForMoney)]
    public PriceFormula Formula { get; set; }

    /// <summary>Builds the plan and the bids from a fixed seed.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var (n, m) = Size == "8x12" ? (8, 12) : (100, 60);
        var random = new Random(20261204);
        _plan = new AwardPlan(
            Enumerable.Range(0, m).Select(_ => 60.0 / m).ToArray(), 10,
            new PriceRule(Formula, 40, Budget: 2_000_000, Floor: 500_000),
            MinimumQualityShare: 0.3, MinimumScores: Enumerable.Repeat<double?>(1, m).ToArray(),
            TieBreaks: [TieBreak.HigherQuality, TieBreak.LowerPrice, TieBreak.EarlierSubmission],
            AbnormallyLow: new AbnormallyLowRule(30));
        _bids = Enumerable.Range(0, n).Select(i => new AwardBid(
            $"bid{i}", Enumerable.Range(0, m).Select(_ => 2 + (random.NextDouble() * 8)).ToArray(), 800_000 + random.Next(1_000_000))).ToArray();
    }

    /// <summary>The whole award.</summary>
    [Benchmark]
    public AwardResult Award() => PointsAward.Compute(_plan, _bids);
}
