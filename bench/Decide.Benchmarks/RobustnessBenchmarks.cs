using BenchmarkDotNet.Attributes;
using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Robustness;

namespace Decide.Benchmarks;

/// <summary>
/// Robustness: 10,000 rank-acceptability draws for 20 bids × 15 scored criteria on one and on two threads, and the
/// whole robustness section (sweeps, critical changes, 10,000 draws, leave-one-out, bid removal, method
/// cross-check, agreement, summary) for the typical panel.
/// </summary>
[MemoryDiagnoser]
[MinColumn]
[MedianColumn]
public class RobustnessBenchmarks
{
    private PreparedEvaluation _acceptability = null!;
    private PreparedEvaluation _typical = null!;
    private AnalysisResult _typicalResult = null!;

    /// <summary>Threads for the Monte Carlo draws.</summary>
    [Params(1, 2)]
    public int Threads { get; set; } = 1;

    [GlobalSetup]
    public void Setup()
    {
        _acceptability = DecisionEngine.Prepare(SyntheticEvaluations.Create(PanelSize.Acceptability, WeightingMethod.Importance));
        _typical = DecisionEngine.Prepare(SyntheticEvaluations.Create(PanelSize.Typical, WeightingMethod.Importance));
        _typicalResult = _typical.Analyse();
    }

    /// <summary>10,000 draws, 20 × 15.</summary>
    [Benchmark]
    public AcceptabilityResult Draws10k_20x15() => RankAcceptabilityAnalysis.Run(_acceptability, 10_000, 1, threads: Threads);

    /// <summary>The whole robustness section for 8 × 12 × 7 (10,000 draws).</summary>
    [Benchmark]
    public RobustnessResult WholeSection_Typical() => RobustnessAnalysis.Run(_typical, _typicalResult, new RobustnessOptions(10_000, 1, Threads));
}
