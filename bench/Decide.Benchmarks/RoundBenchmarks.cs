using BenchmarkDotNet.Attributes;
using Decide.Assignment;
using Decide.Core;
using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Robustness;

namespace Decide.Benchmarks;

/// <summary>
/// A grant round at the size the issue names: 500 applications × 60 reviewers × 3 per application × 8 criteria. The
/// proposal of an assignment (min-cost flow, pair spreading, joining), the analysis (validation, aggregation over the
/// assigned reviewers, fuzzy TOPSIS), Krippendorff's alpha with its bootstrap, and the full robustness run with
/// 10,000 draws (sweeps, critical changes, acceptability, leave-one-reviewer-out, method cross-check, the round's
/// bands and funding flips).
/// </summary>
[MemoryDiagnoser]
[MinColumn]
[MedianColumn]
public class RoundBenchmarks
{
    private Evaluation _round = null!;
    private PreparedEvaluation _prepared = null!;
    private AssignmentRequest _request = null!;

    [GlobalSetup]
    public void Setup()
    {
        _round = SyntheticRounds.Create(500, 60, 3, 8);
        _prepared = DecisionEngine.Prepare(_round);
        var random = new Random(7);
        var conflicts = new HashSet<(string, string)>();
        while (conflicts.Count < 300)
        {
            conflicts.Add(($"R{random.Next(1, 61)}", $"A{random.Next(1, 501)}"));
        }

        _request = new AssignmentRequest(
            _round.Alternatives.Select(a => new Application(a.Id, a.Name, $"field{random.Next(6)}")).ToArray(),
            _round.Assessors.Select(a => new Reviewer(a.Id, a.Name, [$"field{random.Next(6)}", $"field{random.Next(6)}"])).ToArray(),
            3, 30, conflicts);
    }

    /// <summary>Proposing the assignment: 1,500 reviews with 300 declared conflicts.</summary>
    [Benchmark]
    public AssignmentProposal Assign() => ReviewerAssignment.Propose(_request);

    /// <summary>Validate, prepare and rank.</summary>
    [Benchmark]
    public Decide.Core.Analysis.AnalysisResult Analyse() => DecisionEngine.Analyse(_round);

    /// <summary>Krippendorff's alpha, ordinal and interval, with 1,000 bootstrap resamples each.</summary>
    [Benchmark]
    public PanelReliability? Alpha() => PanelAgreement.Reliability(_prepared);

    /// <summary>The whole run the results screen and the record ask for: analysis and robustness with 10,000 draws, one thread.</summary>
    [Benchmark]
    public DecisionRun Robustness() => DecisionRun.Of(_round, new RobustnessOptions(10_000));

    /// <summary>The same on every processor, as the record and the command line run it (<c>Environment.ProcessorCount</c>).</summary>
    [Benchmark]
    public DecisionRun RobustnessAllProcessors() => DecisionRun.Of(_round, new RobustnessOptions(10_000, Threads: Environment.ProcessorCount));
}
