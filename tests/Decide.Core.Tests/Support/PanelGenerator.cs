using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Scales;

namespace Decide.Core.Tests.Support;

/// <summary>
/// Builds random valid evaluations of every shape the file format allows, from a seed: 2–6 alternatives; 1–6
/// scored criteria (linguistic benefit, numeric benefit and cost, linguistic cost on a scale above 0) and sometimes
/// a pass/fail gate that some alternatives fail; criteria in up to two groups; 1–5 assessors with unequal weights,
/// some assigned to only some of the linguistic criteria; importance weighting on a built-in scale, on a scale
/// whose terms lie above 0, or on a custom scale reaching 10 (weights far above 1), or pairwise weighting
/// (Buckley) by some or all assessors; declined cells with reasons; moderated cells; either aggregation rule
/// where it is allowed; either ideal points; either source of acceptability weights.
/// </summary>
/// <remarks>
/// <see cref="EvaluationGenerator"/> stays the simpler generator some properties compare with a crisp reference;
/// this one is for properties every valid evaluation must have, such as dominance.
/// </remarks>
public static class PanelGenerator
{
    /// <summary>A rating scale whose terms all lie above 0 (geometric aggregation and linguistic cost allowed).</summary>
    public static LinguisticScale PositiveRating { get; } = LinguisticScale.Create("positive-rating-5", 0, 10,
    [
        new("R1", "Weak", new Tfn(1, 2, 3.5)),
        new("R2", "Limited", new Tfn(2, 3.5, 5)),
        new("R3", "Adequate", new Tfn(3.5, 5, 7)),
        new("R4", "Strong", new Tfn(5, 7, 9)),
        new("R5", "Excellent", new Tfn(7, 9, 10)),
    ]);

    /// <summary>An importance scale whose terms all lie above 0.</summary>
    public static LinguisticScale PositiveImportance { get; } = LinguisticScale.Create("positive-importance-4", 0, 1,
    [
        new("I1", "Minor", new Tfn(0.1, 0.2, 0.4)),
        new("I2", "Moderate", new Tfn(0.2, 0.4, 0.6)),
        new("I3", "Major", new Tfn(0.4, 0.6, 0.9)),
        new("I4", "Critical", new Tfn(0.6, 0.9, 1)),
    ]);

    /// <summary>An importance scale on [0, 10]: every weight's upper value exceeds 1 before it is bounded.</summary>
    public static LinguisticScale WideImportance { get; } = LinguisticScale.Create("wide-importance-5", 0, 10,
    [
        new("W1", "Slight", new Tfn(0, 1, 3)),
        new("W2", "Some", new Tfn(1, 3, 5)),
        new("W3", "Clear", new Tfn(3, 5, 7)),
        new("W4", "Great", new Tfn(5, 7, 9)),
        new("W5", "Overriding", new Tfn(8, 9.5, 10)),
    ]);

    /// <summary>Generates the evaluation for <paramref name="seed"/>; the same seed gives the same evaluation.</summary>
    public static Evaluation Generate(int seed)
    {
        var random = new Random(seed);
        int n = random.Next(2, 7), m = random.Next(1, 7), k = random.Next(1, 6);
        var positiveRating = random.Next(3) == 0;
        var rating = positiveRating ? PositiveRating : Pick(random, BuiltInScales.ChenRating7, BuiltInScales.Rating5);
        var weighting = random.Next(2) == 0 ? WeightingMethod.Importance : WeightingMethod.Pairwise;
        var importance = Pick(random, BuiltInScales.ChenImportance7, BuiltInScales.Importance5, PositiveImportance, WideImportance);

        var groups = random.Next(5) < 2
            ? Enumerable.Range(1, random.Next(1, 3)).Select(g => new CriterionGroup($"G{g}", $"Group {g}")).ToList()
            : [];
        var criteria = new List<Criterion>();
        for (var j = 0; j < m; j++)
        {
            var group = groups.Count > 0 && random.Next(3) > 0 ? groups[random.Next(groups.Count)].Id : null;
            var roll = random.Next(8);
            criteria.Add(roll switch
            {
                < 4 => new Criterion($"C{j + 1}", $"Criterion {j + 1}", Group: group),
                4 when positiveRating => new Criterion($"C{j + 1}", $"Criterion {j + 1}", Direction: Direction.Cost, Group: group),
                4 or 5 => new Criterion($"C{j + 1}", $"Criterion {j + 1}", CriterionKind.Numeric, Direction.Benefit, group),
                _ => new Criterion($"C{j + 1}", $"Criterion {j + 1}", CriterionKind.Numeric, Direction.Cost, group),
            });
        }

        groups.RemoveAll(g => !criteria.Any(c => c.Group == g.Id));
        var gate = random.Next(10) < 3 ? new Criterion("PASS", "Mandatory requirements", CriterionKind.Gate) : null;
        var linguistic = criteria.Where(c => c.Kind == CriterionKind.Linguistic).Select(c => c.Id).ToArray();

        var assessors = new Assessor[k];
        for (var a = 0; a < k; a++)
        {
            var weight = Math.Round(0.5 + (random.NextDouble() * 1.5), 2);
            IReadOnlyList<string>? assigned = null;
            if (linguistic.Length > 1 && random.Next(10) < 3)
            {
                assigned = linguistic.Where(_ => random.Next(2) == 0).ToArray();
                if (assigned.Count == 0)
                {
                    assigned = [linguistic[random.Next(linguistic.Length)]];
                }
            }

            assessors[a] = new Assessor($"D{a + 1}", $"Assessor {a + 1}", weight, assigned);
        }

        var alternatives = Enumerable.Range(1, n).Select(i => new Alternative($"S{i}", $"Supplier {i}")).ToArray();
        var gates = new List<GateResult>();
        if (gate is not null)
        {
            var failing = alternatives.Where(_ => random.Next(5) == 0).Take(n - 2).Select(a => a.Id).ToHashSet();
            gates.AddRange(alternatives.Select(a => new GateResult(a.Id, gate.Id, !failing.Contains(a.Id))));
        }

        var ratings = new List<Rating>();
        var values = new List<NumericValue>();
        var moderated = new List<ModeratedRating>();
        foreach (var alternative in alternatives)
        {
            foreach (var criterion in criteria)
            {
                if (criterion.Kind == CriterionKind.Numeric)
                {
                    // Coarse values so that ties between alternatives happen now and then.
                    values.Add(new NumericValue(alternative.Id, criterion.Id, random.Next(1, 21) * 50));
                    continue;
                }

                var raters = assessors.Where(a => a.Criteria is null || a.Criteria.Contains(criterion.Id)).ToArray();
                var cell = raters
                    .Select(a => random.NextDouble() < 0.1
                        ? new Rating(a.Id, alternative.Id, criterion.Id, null, Declined: "outside expertise")
                        : new Rating(a.Id, alternative.Id, criterion.Id, rating[random.Next(rating.Count)].Code))
                    .ToArray();
                if (cell.Length == 0)
                {
                    // Nobody is assigned this criterion: the first assessor takes it on.
                    assessors[0] = assessors[0] with { Criteria = [.. assessors[0].Criteria!, criterion.Id] };
                    cell = [new Rating(assessors[0].Id, alternative.Id, criterion.Id, rating[random.Next(rating.Count)].Code)];
                }

                if (cell.All(r => r.Term is null))
                {
                    cell[0] = cell[0] with { Term = rating[random.Next(rating.Count)].Code, Declined = null };
                }

                ratings.AddRange(cell);
                if (random.Next(10) == 0)
                {
                    moderated.Add(new ModeratedRating(alternative.Id, criterion.Id, rating[random.Next(rating.Count)].Code, "agreed at the moderation meeting"));
                }
            }
        }

        var nodes = groups.Select(g => g.Id).Concat(criteria.Select(c => c.Id)).ToArray();
        var importanceRatings = new List<ImportanceRating>();
        var pairwise = new List<PairwiseJudgement>();
        var matrices = new List<string[]>
        {
            groups.Select(g => g.Id).Concat(criteria.Where(c => c.Group is null).Select(c => c.Id)).ToArray(),
        };
        matrices.AddRange(groups.Select(g => criteria.Where(c => c.Group == g.Id).Select(c => c.Id).ToArray()));
        if (matrices.All(items => items.Length < 2))
        {
            weighting = WeightingMethod.Importance; // nothing to compare in pairs
        }

        if (weighting == WeightingMethod.Importance)
        {
            foreach (var assessor in assessors)
            {
                importanceRatings.AddRange(nodes.Select(node => new ImportanceRating(assessor.Id, node, importance[random.Next(importance.Count)].Code)));
            }
        }
        else
        {
            var scale = BuiltInScales.Pairwise9;
            var judges = assessors.Where(_ => random.Next(4) > 0).ToList();
            if (judges.Count == 0)
            {
                judges.Add(assessors[0]);
            }

            foreach (var judge in judges)
            {
                foreach (var items in matrices)
                {
                    for (var i = 0; i < items.Length; i++)
                    {
                        for (var j = i + 1; j < items.Length; j++)
                        {
                            var term = scale[random.Next(scale.Count)];
                            pairwise.Add(new PairwiseJudgement(judge.Id, items[i], items[j], term.Value, term.Code));
                        }
                    }
                }
            }
        }

        var scalesAbove0 = (!criteria.Any(c => c.Kind == CriterionKind.Linguistic) || positiveRating)
            && (weighting == WeightingMethod.Pairwise || importance == PositiveImportance);
        return new Evaluation
        {
            Title = $"Generated panel {seed}",
            RatingScale = rating,
            ImportanceScale = importance,
            Groups = groups,
            Criteria = gate is null ? criteria : [.. criteria, gate],
            Alternatives = alternatives,
            Assessors = assessors,
            Weighting = weighting,
            Importance = importanceRatings,
            Pairwise = pairwise,
            Ratings = ratings,
            Values = values,
            Gates = gates,
            Moderated = moderated,
            Options = new AnalysisOptions(
                scalesAbove0 && random.Next(2) == 0 ? AggregationRule.Geometric : AggregationRule.Mean,
                random.Next(2) == 0 ? IdealPoints.Unit : IdealPoints.Extreme,
                AcceptabilityWeights: random.Next(2) == 0 ? AcceptabilityWeights.Fuzzy : AcceptabilityWeights.Uniform),
        };
    }

    private static T Pick<T>(Random random, params T[] choices) => choices[random.Next(choices.Length)];
}
