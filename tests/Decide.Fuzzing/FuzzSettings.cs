using System.Globalization;

namespace Decide.Fuzzing;

/// <summary>
/// How many cases a fuzzing property runs and from which seed, from the environment:
/// <c>DECIDE_FUZZ_CASES</c> (a whole number; unset: each property's own CI count, a few hundred at most) and
/// <c>DECIDE_FUZZ_SEED</c> (unset: a fixed seed, so that a CI failure reproduces; <c>random</c>: a new seed each run;
/// otherwise FsCheck's replay text, such as <c>(123,457)</c>, printed with every failure).
/// </summary>
public static class FuzzSettings
{
    /// <summary>The seed of CI runs.</summary>
    public const string FixedReplay = "(20261201,20261207)";

    public static int Cases(int ciCases) =>
        int.TryParse(Environment.GetEnvironmentVariable("DECIDE_FUZZ_CASES"), NumberStyles.None, CultureInfo.InvariantCulture, out var n) && n > 0
            ? n
            : ciCases;

    public static string? Replay => Environment.GetEnvironmentVariable("DECIDE_FUZZ_SEED") switch
    {
        null or "" => FixedReplay,
        "random" => null,
        var given => given,
    };
}
