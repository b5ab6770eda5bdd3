using Decide.Core.Fuzzy;
using FsCheck;
using FsCheck.Fluent;

namespace Decide.Core.Tests.Support;

/// <summary>FsCheck generators for the engine's inputs.</summary>
public static class DecideArbitraries
{
    /// <summary>Seeds of <see cref="EvaluationGenerator"/>; the seed is shown when a property fails.</summary>
    public static Arbitrary<GeneratedEvaluation> GeneratedEvaluation() =>
        Gen.Choose(0, int.MaxValue)
            .Select(seed => new GeneratedEvaluation(seed, EvaluationGenerator.Generate(seed)))
            .ToArbitrary();

    /// <summary>Seeds of <see cref="PanelGenerator"/>: evaluations of every shape the format allows.</summary>
    public static Arbitrary<AnyPanel> AnyPanel() =>
        Gen.Choose(0, int.MaxValue)
            .Select(seed => new AnyPanel(seed, PanelGenerator.Generate(seed)))
            .ToArbitrary();

    /// <summary>Seeds over the whole non-negative int range.</summary>
    public static Arbitrary<Seed> Seed() => Gen.Choose(0, int.MaxValue).Select(v => new Seed(v)).ToArbitrary();

    /// <summary>
    /// Valid TFNs with values in [−1000, 1000] on a grid of 0.001 (a quarter of them crisp), the range of values the
    /// engine meets in practice.
    /// </summary>
    public static Arbitrary<Tfn> Tfn()
    {
        var value = Gen.Choose(-1_000_000, 1_000_000).Select(i => i / 1000.0);
        var general = from a in value
                      from b in value
                      from c in value
                      let sorted = new[] { a, b, c }.Order().ToArray()
                      select new Tfn(sorted[0], sorted[1], sorted[2]);
        var crisp = value.Select(x => Core.Fuzzy.Tfn.Crisp(x));
        return Gen.Frequency((3, general), (1, crisp)).ToArbitrary();
    }

    /// <summary>Positive weight vectors of 2–8 items, each between 0.01 and 100.</summary>
    public static Arbitrary<PositiveWeights> PositiveWeights() =>
        Gen.Choose(2, 8)
            .SelectMany(n => Gen.ArrayOf(Gen.Choose(1, 10_000).Select(i => i / 100.0), n))
            .Select(w => new PositiveWeights(w))
            .ToArbitrary();
}
