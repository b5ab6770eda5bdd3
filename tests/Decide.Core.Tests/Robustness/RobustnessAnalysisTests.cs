using Decide.Core.Analysis;
using Decide.Core.Robustness;

namespace Decide.Core.Tests.Robustness;

public sealed class RobustnessAnalysisTests
{
    [Fact]
    public void Every_section_is_filled_for_a_real_panel()
    {
        var prepared = DecisionEngine.Prepare(Published.Chen2000WorkedExample.Build());
        var result = prepared.Analyse();
        var robustness = RobustnessAnalysis.Run(prepared, result, new RobustnessOptions(Draws: 2000, Seed: 9));
        Assert.Equal(5, robustness.Sensitivity.Sweeps.Count);
        Assert.Equal(3, robustness.Sensitivity.LeaveOneOut.Count);
        Assert.Equal(3, robustness.Sensitivity.WithoutAlternative.Count);
        Assert.Equal(3, robustness.Sensitivity.Methods.Count);
        Assert.Equal(2000, robustness.Sensitivity.Acceptability.Draws);
        Assert.NotNull(robustness.Agreement.Concordance);
        Assert.Contains(robustness.Summary, s => s.StartsWith("A2 ranks first", StringComparison.Ordinal));
    }

    [Fact]
    public void The_same_seed_reproduces_the_whole_section_and_the_summary()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var result = prepared.Analyse();
        var a = RobustnessAnalysis.Run(prepared, result, new RobustnessOptions(3000, 77, Threads: 1));
        var b = RobustnessAnalysis.Run(prepared, result, new RobustnessOptions(3000, 77, Threads: 2));
        Assert.Equal(a.Summary, b.Summary);
        Assert.Equal(a.Sensitivity.Acceptability.Alternatives.SelectMany(x => x.Ranks), b.Sensitivity.Acceptability.Alternatives.SelectMany(x => x.Ranks));
    }

    [Fact]
    public void The_summary_names_the_closest_challenge_with_the_critical_weight()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var result = prepared.Analyse();
        var robustness = RobustnessAnalysis.Run(prepared, result, new RobustnessOptions(1000, 1));
        var most = robustness.Sensitivity.CriticalChanges.TopShare!;
        var sentence = Assert.Single(robustness.Summary, s => s.StartsWith("The closest challenge", StringComparison.Ordinal));
        Assert.Contains($"Criterion {most.Criterion[1..]}", sentence);
        Assert.Contains($"{most.Weight * 100:0}%", sentence);
    }

    [Fact]
    public void A_unanimous_clear_winner_is_stable_under_every_check()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.Uniform(
            [["VG", "VG", "G"], ["MP", "F", "P"], ["F", "MP", "MP"]], ["H", "M", "VH"]));
        var result = prepared.Analyse();
        var robustness = RobustnessAnalysis.Run(prepared, result, new RobustnessOptions(2000, 4));
        Assert.Null(robustness.Sensitivity.CriticalChanges.TopShare);
        Assert.Equal(1.0, robustness.Sensitivity.Acceptability.Alternatives[0].Ranks[0]);
        Assert.All(robustness.Sensitivity.LeaveOneOut, l => Assert.False(l.WinnerChanged));
        Assert.Contains(robustness.Summary, s => s.StartsWith("No change of any single criterion", StringComparison.Ordinal));
        Assert.Contains(robustness.Summary, s => s.StartsWith("Removing any single assessor leaves", StringComparison.Ordinal));
    }

    [Fact]
    public void Zero_draws_skips_rank_acceptability_and_keeps_every_other_section()
    {
        var prepared = DecisionEngine.Prepare(RobustnessFixtures.TradeOff());
        var result = prepared.Analyse();
        var robustness = RobustnessAnalysis.Run(prepared, result, new RobustnessOptions(Draws: 0, Seed: 5));
        Assert.Equal(0, robustness.Sensitivity.Acceptability.Draws);
        Assert.Empty(robustness.Sensitivity.Acceptability.Alternatives);
        Assert.Empty(robustness.Sensitivity.Acceptability.CentralWeights);
        Assert.Equal(5UL, robustness.Sensitivity.Acceptability.Seed);
        Assert.NotEmpty(robustness.Sensitivity.Sweeps);
        Assert.NotEmpty(robustness.Sensitivity.Methods);
        Assert.DoesNotContain(robustness.Summary, s => s.Contains("draws", StringComparison.Ordinal));
    }
}
