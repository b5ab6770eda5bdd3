using BenchmarkDotNet.Attributes;
using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Ranking;

namespace Decide.Benchmarks;

/// <summary>
/// The fuzzy TOPSIS kernel alone on buffers allocated once, as robustness analysis calls it: it must allocate
/// nothing (the Allocated column shows "-").
/// </summary>
[MemoryDiagnoser]
[MinColumn]
[MedianColumn]
public class KernelBenchmarks
{
    private Tfn[] _matrix = [];
    private bool[] _isCost = [];
    private Tfn[] _weights = [];
    private Tfn[] _weighted = [];
    private double[] _dPlus = [], _dMinus = [], _closeness = [], _plusBy = [], _minusBy = [];
    private int[] _ranks = [], _order = [];
    private int _criteria;

    /// <summary>Panel size: Typical (8 × 12 × 7) or Large (100 × 60 × 30).</summary>
    [Params("Typical", "Large")]
    public string Panel { get; set; } = "Typical";

    /// <summary>Unit (Chen) or extreme ideal points.</summary>
    [Params(IdealPoints.Unit, IdealPoints.Extreme)]
    public IdealPoints Ideal { get; set; }

    /// <summary>Prepares the aggregated matrix and weights once and allocates every output buffer.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var prepared = DecisionEngine.Prepare(SyntheticEvaluations.Create(PanelSize.Named(Panel), WeightingMethod.Importance));
        _matrix = prepared.Matrix;
        _isCost = prepared.IsCost;
        _weights = prepared.FuzzyWeights;
        _criteria = prepared.Criteria.Count;
        var n = prepared.Alternatives.Count;
        _weighted = new Tfn[_matrix.Length];
        _dPlus = new double[n];
        _dMinus = new double[n];
        _closeness = new double[n];
        _plusBy = new double[_matrix.Length];
        _minusBy = new double[_matrix.Length];
        _ranks = new int[n];
        _order = new int[n];
    }

    /// <summary>Normalise, weight, distances (with per-criterion terms) and closeness.</summary>
    [Benchmark]
    public double Evaluate()
    {
        FuzzyTopsis.Evaluate(_matrix, _criteria, _isCost, _weights, Ideal, _weighted, _dPlus, _dMinus, _closeness, _plusBy, _minusBy);
        return _closeness[0];
    }

    /// <summary>The kernel followed by the competition ranking.</summary>
    [Benchmark]
    public int EvaluateAndRank()
    {
        FuzzyTopsis.Evaluate(_matrix, _criteria, _isCost, _weights, Ideal, _weighted, _dPlus, _dMinus, _closeness, _plusBy, _minusBy);
        FuzzyTopsis.Rank(_closeness, _ranks, _order);
        return _order[0];
    }
}
