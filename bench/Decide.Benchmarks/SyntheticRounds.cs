using Decide.Core.Model;
using Decide.Core.Scales;

namespace Decide.Benchmarks;

/// <summary>
/// A grant round of a given size from a fixed seed: applications × reviewers, k reviewers per application in a
/// rotating design (application i read by reviewers (i·k + p) mod r, shifted every round of the panel so pairs vary),
/// linguistic criteria on Chen's seven-term scale, importance weighting, every assigned cell rated and no other.
/// </summary>
public static class SyntheticRounds
{
    public static Evaluation Create(int applications, int reviewers, int k, int criteria, int seed = 20261204)
    {
        var random = new Random(seed);
        var terms = BuiltInScales.ChenRating7.Terms.Select(t => t.Code).ToArray();
        var importance = BuiltInScales.ChenImportance7.Terms.Select(t => t.Code).ToArray();
        var crits = Enumerable.Range(1, criteria).Select(j => new Criterion($"C{j}", $"Criterion {j}")).ToArray();
        var apps = Enumerable.Range(1, applications).Select(i => new Alternative($"A{i}", $"Application {i}", Requested: 5_000 + random.Next(20_000))).ToArray();
        var panel = Enumerable.Range(1, reviewers).Select(x => new Assessor($"R{x}", $"Reviewer {x}")).ToArray();
        var reads = panel.ToDictionary(p => p.Id, _ => new List<string>());
        for (var i = 0; i < applications; i++)
        {
            var shift = i / reviewers;
            for (var p = 0; p < k; p++)
            {
                reads[panel[((i * k) + p + shift) % reviewers].Id].Add(apps[i].Id);
            }
        }

        var quality = apps.ToDictionary(a => a.Id, _ => random.Next(1, 6));
        var ratings = new List<Rating>();
        foreach (var (reviewer, list) in reads)
        {
            foreach (var app in list)
            {
                foreach (var c in crits)
                {
                    var step = Math.Clamp(quality[app] + random.Next(-1, 2), 0, terms.Length - 1);
                    ratings.Add(new Rating(reviewer, app, c.Id, terms[step], "From the application's section on this criterion."));
                }
            }
        }

        var maxLoad = reads.Values.Max(l => l.Count);
        return new Evaluation
        {
            Title = $"Synthetic round {applications}×{reviewers}×{k}×{criteria}",
            Criteria = crits,
            Alternatives = apps,
            Assessors = panel,
            Importance = panel.SelectMany(p => crits.Select(c => new ImportanceRating(p.Id, c.Id, importance[random.Next(3, 7)]))).ToArray(),
            Ratings = ratings,
            Reviews = new ReviewDesign(k, maxLoad, panel.Select(p => new ReviewAssignment(p.Id, reads[p.Id])).ToArray()),
            Funding = new FundingPlan(applications * 6_000),
        };
    }
}
