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

/// <summary>
/// The points award of a whole evaluation for the typical panel (8 bids × 12 criteria × 7 assessors: 10 rated quality
/// criteria on the 0–10 points scale, the price and a gate), as the service runs it: the analysis with the award
/// (<see cref="Core.DecisionRun.Of"/>), the award alone from the ratings (<see cref="AwardAnalysis.Compute(Core.Model.Evaluation)"/>),
/// and the award's robustness (without each bid and assessor, sweeps, 10,000 resampling draws).
/// </summary>
[MemoryDiagnoser]
[MinColumn]
[MedianColumn]
public class PointsModelBenchmarks
{
    private Core.Model.Evaluation _evaluation = null!;
    private AwardReport _award = null!;

    /// <summary>Builds the evaluation from a fixed seed.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _evaluation = PointsEvaluation(8, 10, 7, seed: 20261204);
        _award = AwardAnalysis.Compute(_evaluation);
    }

    /// <summary>Validation, fuzzy analysis and the award, as <c>DecisionRun.Of</c> does them.</summary>
    [Benchmark]
    public Core.DecisionRun AnalysisWithAward() => Core.DecisionRun.Of(_evaluation);

    /// <summary>The award alone, from the assessors' terms.</summary>
    [Benchmark]
    public AwardReport AwardFromRatings() => AwardAnalysis.Compute(_evaluation);

    /// <summary>The robustness of the award with 10,000 draws.</summary>
    [Benchmark]
    public AwardRobustnessResult AwardRobustnessChecks() => AwardRobustness.Run(_evaluation, _award, new Core.Robustness.RobustnessOptions());

    /// <summary>An invented points evaluation: quality 60 over <paramref name="quality"/> criteria, price 40 by the lowest-price ratio, a 50 % threshold.</summary>
    public static Core.Model.Evaluation PointsEvaluation(int bids, int quality, int assessors, int seed)
    {
        var random = new Random(seed);
        var scale = Core.Scales.BuiltInScales.Points10;
        var criteria = Enumerable.Range(0, quality).Select(j => new Core.Model.Criterion($"Q{j + 1}", $"Quality aspect {j + 1}"))
            .Append(new Core.Model.Criterion("PRICE", "Price", Core.Model.CriterionKind.Numeric, Core.Model.Direction.Cost, Unit: "EUR"))
            .Append(new Core.Model.Criterion("EXCL", "Exclusion grounds cleared", Core.Model.CriterionKind.Gate))
            .ToArray();
        var alternatives = Enumerable.Range(0, bids).Select(i => new Core.Model.Alternative($"B{i + 1}", $"Bid {i + 1}")).ToArray();
        var panel = Enumerable.Range(0, assessors).Select(a => new Core.Model.Assessor($"D{a + 1}", $"Assessor {a + 1}")).ToArray();
        var ratings = new List<Core.Model.Rating>();
        foreach (var b in alternatives)
        {
            var level = 3 + (5 * random.NextDouble());
            foreach (var c in criteria.Where(c => c.Kind == Core.Model.CriterionKind.Linguistic))
            {
                foreach (var a in panel)
                {
                    var step = Math.Clamp((int)Math.Round(level + random.NextDouble() * 2 - 1), 0, scale.Count - 1);
                    ratings.Add(new Core.Model.Rating(a.Id, b.Id, c.Id, scale[step].Code, "Reason given in the sheet."));
                }
            }
        }

        return new Core.Model.Evaluation
        {
            Title = "Synthetic points award",
            RatingScale = scale,
            Criteria = criteria,
            Alternatives = alternatives,
            Assessors = panel,
            Weighting = Core.Model.WeightingMethod.Points,
            Points = new PublishedWeights(100, new Dictionary<string, double>(),
                [.. criteria.Where(c => c.Kind == Core.Model.CriterionKind.Linguistic).Select(c => new PublishedCriterion(c.Id, 60.0 / quality)), new PublishedCriterion("PRICE", 40)]),
            Award = new AwardMethod("PRICE", PriceFormula.LowestPriceRatio, MinimumQualityShare: 0.5, AbnormallyLow: new AbnormallyLowRule(40)),
            Ratings = ratings,
            Values = alternatives.Select(b => new Core.Model.NumericValue(b.Id, "PRICE", 800_000 + random.Next(600_000))).ToArray(),
            Gates = alternatives.Select(b => new Core.Model.GateResult(b.Id, "EXCL", true)).ToArray(),
        };
    }
}
