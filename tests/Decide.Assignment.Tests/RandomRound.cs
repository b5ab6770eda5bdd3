using Decide.Core.Robustness;

namespace Decide.Assignment.Tests;

/// <summary>
/// A random round for which a feasible connected design is known to exist: a sliding-window witness (application a
/// read by reviewers a, a + 1, …, a + k − 1, modulo the panel) joins every application to the next through k − 1
/// shared reviewers; conflicts are then drawn only among the pairs the witness does not use, and the load cap is at
/// least the witness's largest load.
/// </summary>
public sealed record RandomRound(int Seed, AssignmentRequest Request)
{
    public static RandomRound Generate(int seed)
    {
        var random = new SeededRandom((ulong)seed, 77);
        int Next(int lo, int hi) => lo + (int)(random.NextDouble() * (hi - lo + 1));
        var k = Next(2, 4);
        var reviewers = Next(k + 1, 14);
        var applications = Next(2, 40);
        var topics = new[] { "soil", "water", "heritage", "youth" };
        var witness = new HashSet<(int Reviewer, int Application)>();
        var load = new int[reviewers];
        for (var a = 0; a < applications; a++)
        {
            for (var p = 0; p < k; p++)
            {
                var x = (a + p) % reviewers;
                witness.Add((x, a));
                load[x]++;
            }
        }

        var conflicts = new HashSet<(string, string)>();
        for (var x = 0; x < reviewers; x++)
        {
            for (var a = 0; a < applications; a++)
            {
                if (!witness.Contains((x, a)) && random.NextDouble() < 0.15)
                {
                    conflicts.Add(($"R{x}", $"A{a}"));
                }
            }
        }

        var request = new AssignmentRequest(
            Enumerable.Range(0, applications).Select(a => new Application($"A{a}", $"Application {a}", random.NextDouble() < 0.7 ? topics[Next(0, 3)] : null)).ToArray(),
            Enumerable.Range(0, reviewers).Select(x => new Reviewer($"R{x}", $"Reviewer {x}", topics.Where(_ => random.NextDouble() < 0.4).ToArray())).ToArray(),
            k,
            load.Max() + Next(0, 3),
            conflicts,
            (ulong)seed);
        return new RandomRound(seed, request);
    }

    public override string ToString() =>
        $"seed {Seed}: {Request.Applications.Count} applications, {Request.Reviewers.Count} reviewers, k = {Request.ReviewersPerApplication}, cap {Request.MaxLoad}, {Request.Conflicts.Count} conflicts";
}
