using System.Security.Cryptography;
using System.Text;
using System.Text.Json;
using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Model;

namespace Decide.Benchmarks;

/// <summary>
/// Fingerprints what the engine computes for the benchmark inputs, so an optimisation can show it changed nothing:
/// run <c>-- --digest</c> before and after, and the lines must match. Each line is the SHA-256 of a result
/// serialised to JSON (doubles in round-trip form), or of the validator's error list for a deliberately broken
/// evaluation.
/// </summary>
public static class ResultDigest
{
    /// <summary>Writes one line per input: its name and the digest of what the engine made of it.</summary>
    public static void Write(TextWriter output)
    {
        foreach (var size in new[] { PanelSize.Typical, PanelSize.Large })
        {
            foreach (var weighting in new[] { WeightingMethod.Importance, WeightingMethod.Pairwise })
            {
                var evaluation = SyntheticEvaluations.Create(size, weighting);
                // The geometric mean is refused on these (Chen) scales, whose lowest terms reach 0 (ADR 18).
                foreach (var options in new[] { new AnalysisOptions(), new AnalysisOptions(AggregationRule.Mean, IdealPoints.Extreme) })
                {
                    var result = DecisionEngine.Analyse(evaluation with { Options = options });
                    output.WriteLine($"{size.Name,-8} {weighting,-10} {options.Aggregation,-9} {options.Ideal,-7} analysis {Hash(result)}");
                }
            }

            foreach (var weighting in new[] { WeightingMethod.Importance, WeightingMethod.Pairwise })
            {
                var result = DecisionEngine.Analyse(Varied(SyntheticEvaluations.Create(size, weighting)));
                output.WriteLine($"{size.Name,-8} {weighting,-10} varied            analysis {Hash(result)}");
            }

            foreach (var weighting in new[] { WeightingMethod.Importance, WeightingMethod.Pairwise })
            {
                var errors = EvaluationValidator.Validate(Broken(SyntheticEvaluations.Create(size, weighting)));
                output.WriteLine($"{size.Name,-8} {weighting,-10} broken: {errors.Count,5} errors      {Hash(errors)}");
            }
        }
    }

    /// <summary>
    /// A valid evaluation that exercises what the plain synthetic one does not: declined cells, an assessor limited
    /// to some criteria, unequal assessor weights and a bid excluded by the gate.
    /// </summary>
    public static Evaluation Varied(Evaluation e)
    {
        var limited = e.Assessors[1].Id;
        var linguistic = e.Criteria.Where(c => c.Kind == CriterionKind.Linguistic).Select(c => c.Id).ToArray();
        var assigned = linguistic.Where((_, j) => j % 2 == 0).ToArray();
        var excluded = e.Alternatives[^1].Id;
        return e with
        {
            Assessors = e.Assessors.Select((a, k) => a.Id == limited ? a with { Criteria = assigned } : a with { Weight = 1 + (k % 3) }).ToArray(),
            Ratings = e.Ratings
                .Where(r => r.Assessor != limited || assigned.Contains(r.Criterion))
                .Select((r, i) => i % 13 == 5 ? r with { Term = null, Rationale = null, Declined = "conflict of interest" } : r)
                .ToArray(),
            Gates = e.Gates.Select(g => g.Alternative == excluded ? g with { Passed = false, Note = "missing certificate" } : g).ToArray(),
        };
    }

    /// <summary>
    /// The evaluation with a sample of every kind of mistake the validator looks for in ratings, values, gates and
    /// weights: missing, duplicated, unknown and misplaced entries, an assessor limited to some criteria, and ids
    /// used twice (an assessor with other assigned criteria, a criterion of another kind, an alternative).
    /// </summary>
    public static Evaluation Broken(Evaluation e)
    {
        var first = e.Assessors[0];
        var limited = e.Assessors.Count > 1 ? e.Assessors[1] : first;
        var linguistic = e.Criteria.Where(c => c.Kind == CriterionKind.Linguistic).Select(c => c.Id).ToArray();
        var numeric = e.Criteria.First(c => c.Kind == CriterionKind.Numeric).Id;
        var assessors = e.Assessors.Select(a => a == limited ? a with { Criteria = linguistic.Take(linguistic.Length / 2).Append("EXCL").ToArray() } : a)
            .Append(first with { Criteria = linguistic.Skip(1).Take(2).ToArray() })
            .ToArray();
        var ratings = e.Ratings.Where((_, i) => i % 17 != 3).ToList();
        ratings.Add(e.Ratings[0]);
        ratings.Add(new Rating("nobody", e.Alternatives[0].Id, linguistic[0], "G", "?"));
        ratings.Add(new Rating(first.Id, "B-none", linguistic[0], "G", "?"));
        ratings.Add(new Rating(first.Id, e.Alternatives[0].Id, numeric, "G", "?"));
        ratings.Add(new Rating(first.Id, e.Alternatives[0].Id, linguistic[0], "XX", "?") with { Alternative = e.Alternatives[^1].Id, Criterion = linguistic[^1] });
        ratings.Add(new Rating(first.Id, e.Alternatives[1].Id, linguistic[1], null, null, "  "));
        return e with
        {
            Assessors = assessors,
            Criteria = e.Criteria.Append(new Criterion(numeric, "Same id, other kind")).Append(new Criterion(linguistic[2], "Same id, numeric", CriterionKind.Numeric)).ToArray(),
            Alternatives = e.Alternatives.Append(e.Alternatives[1]).ToArray(),
            Ratings = ratings,
            Values = e.Values.Skip(1).Append(e.Values[2]).Append(new NumericValue(e.Alternatives[0].Id, numeric, -1)).ToArray(),
            Gates = e.Gates.Skip(1).Append(new GateResult(e.Alternatives[^1].Id, "EXCL", false)).ToArray(),
            Importance = e.Importance.Skip(2).Append(new ImportanceRating(first.Id, "EXCL", "H")).ToArray(),
            Pairwise = e.Pairwise.Skip(1)
                .Append(new PairwiseJudgement(first.Id, linguistic[0], linguistic[0], Tfn.One))
                .Append(e.Pairwise.Count > 2 ? e.Pairwise[2] : new PairwiseJudgement(first.Id, "x", "y", Tfn.One)).ToArray(),
        };
    }

    private static string Hash<T>(T value)
    {
        var json = JsonSerializer.SerializeToUtf8Bytes(value);
        return Convert.ToHexStringLower(SHA256.HashData(json))[..16];
    }
}
