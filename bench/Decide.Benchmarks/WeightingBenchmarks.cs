using BenchmarkDotNet.Attributes;
using Decide.Core.Analysis;
using Decide.Core.Consistency;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Weighting;

namespace Decide.Benchmarks;

/// <summary>
/// Pairwise weighting of nine criteria by seven assessors: the whole derivation (seven individual 9 × 9 matrices,
/// the panel's geometric-mean matrix, Buckley weights and a consistency report for each of the eight), and its parts
/// on one matrix.
/// </summary>
[MemoryDiagnoser]
[MinColumn]
[MedianColumn]
public class WeightingBenchmarks
{
    /// <summary>Nine scored criteria plus the gate; four bids (they take no part in weighting).</summary>
    public static PanelSize Size { get; } = new("Weighting", 4, 10, 7);

    private Evaluation _evaluation = null!;
    private Criterion[] _scored = [];
    private FuzzyPairwiseMatrix[] _individual = [];
    private double[] _assessorWeights = [];
    private double[] _middles = [];

    /// <summary>Builds the judgements once and the seven individual matrices from them.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _evaluation = SyntheticEvaluations.Create(Size, WeightingMethod.Pairwise);
        _scored = _evaluation.Criteria.Where(c => c.Kind != CriterionKind.Gate).ToArray();
        var items = _scored.Select(c => c.Id).ToArray();
        var position = items.Select((id, i) => (id, i)).ToDictionary(x => x.id, x => x.i);
        _individual = _evaluation.Assessors.Select(a =>
        {
            var matrix = new FuzzyPairwiseMatrix(items);
            foreach (var j in _evaluation.Pairwise.Where(p => p.Assessor == a.Id))
            {
                matrix.Set(position[j.Row], position[j.Col], j.Value);
            }

            return matrix;
        }).ToArray();
        _assessorWeights = _evaluation.Assessors.Select(a => a.Weight).ToArray();
        _middles = _individual[0].Middles();
        if (items.Length != 9 || _individual.Length != 7)
        {
            throw new InvalidOperationException($"Expected 9 criteria and 7 assessors; got {items.Length} and {_individual.Length}.");
        }
    }

    /// <summary>Everything pairwise weighting does for the analysis: 8 matrices' weights and consistency.</summary>
    [Benchmark]
    public CriterionWeight[] Derive() => CriterionWeights.Derive(_evaluation, _scored).Weights;

    /// <summary>The panel's matrix: element-wise weighted geometric mean of the seven.</summary>
    [Benchmark]
    public FuzzyPairwiseMatrix PanelMatrix() => FuzzyPairwiseMatrix.GeometricMean(_individual, _assessorWeights);

    /// <summary>Buckley weights of one 9 × 9 matrix.</summary>
    [Benchmark]
    public Tfn[] BuckleyOfOne() => BuckleyWeights.Compute(_individual[0]);

    /// <summary>CR, GCI, worst judgements and triads of one 9 × 9 matrix.</summary>
    [Benchmark]
    public ConsistencyReport ConsistencyOfOne() => PairwiseConsistency.Analyse(_middles, _individual[0].Items);
}
