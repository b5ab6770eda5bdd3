using BenchmarkDotNet.Attributes;
using Decide.Core;
using Decide.Core.Analysis;
using Decide.Core.Model;

namespace Decide.Benchmarks;

/// <summary>
/// The engine end to end (<see cref="DecisionEngine.Analyse"/>: validate, derive weights, aggregate, rank and build
/// the result) and the validator alone, on a typical and a large synthetic panel under both weighting methods.
/// </summary>
[MemoryDiagnoser]
[MinColumn]
[MedianColumn]
public class AnalysisBenchmarks
{
    private Evaluation _evaluation = null!;

    /// <summary>Panel size: Typical (8 × 12 × 7) or Large (100 × 60 × 30).</summary>
    [Params("Typical", "Large")]
    public string Panel { get; set; } = "Typical";

    /// <summary>Importance ratings or pairwise judgements.</summary>
    [Params(WeightingMethod.Importance, WeightingMethod.Pairwise)]
    public WeightingMethod Weighting { get; set; }

    /// <summary>Builds the evaluation once and checks that it is valid, so the benchmarks measure the happy path.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _evaluation = SyntheticEvaluations.Create(PanelSize.Named(Panel), Weighting);
        var errors = EvaluationValidator.Validate(_evaluation);
        if (errors.Count > 0)
        {
            throw new InvalidOperationException($"The synthetic evaluation is invalid: {errors[0]}");
        }
    }

    /// <summary>Validate, weigh, aggregate and rank.</summary>
    [Benchmark]
    public AnalysisResult Analyse() => DecisionEngine.Analyse(_evaluation);

    /// <summary>The validator alone.</summary>
    [Benchmark]
    public IReadOnlyList<EvaluationError> Validate() => EvaluationValidator.Validate(_evaluation);
}
