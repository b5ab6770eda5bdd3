using Decide.Core.Model;
using Decide.Core.Scales;

namespace Decide.Core.Tests.Support;

/// <summary>
/// Builds random valid evaluations from a seed: 2–6 alternatives, 1–6 criteria mixing linguistic benefit and
/// numeric benefit/cost criteria, 1–5 assessors with random weights, random terms (with the odd declined cell,
/// never all of a cell), importance weighting, and a random choice of ideal points. The aggregation rule is random
/// where both are allowed: the geometric mean only on scales whose terms all lie above 0, so with the built-in scales
/// it is always the mean. <see cref="PanelGenerator"/> covers the other shapes of the format.
/// The same seed always gives the same evaluation.
/// </summary>
public static class EvaluationGenerator
{
    /// <summary>Generates the evaluation for <paramref name="seed"/>.</summary>
    /// <param name="seed">Seed of the pseudo-random sequence.</param>
    /// <param name="ratingScale">Rating scale to use; null picks one of the built-in rating scales.</param>
    /// <param name="importanceScale">Importance scale to use; null picks one of the built-in importance scales.</param>
    public static Evaluation Generate(int seed, LinguisticScale? ratingScale = null, LinguisticScale? importanceScale = null)
    {
        var random = new Random(seed);
        int n = random.Next(2, 7), m = random.Next(1, 7), k = random.Next(1, 6);
        var rating = ratingScale ?? Pick(random, BuiltInScales.ChenRating7, BuiltInScales.Rating5);
        var importance = importanceScale ?? Pick(random, BuiltInScales.ChenImportance7, BuiltInScales.Importance5);

        var alternatives = Enumerable.Range(1, n).Select(i => new Alternative($"S{i}", $"Supplier {i}")).ToArray();
        var criteria = new Criterion[m];
        for (var j = 0; j < m; j++)
        {
            criteria[j] = random.NextDouble() < 0.6
                ? new Criterion($"C{j + 1}", $"Criterion {j + 1}")
                : new Criterion($"C{j + 1}", $"Criterion {j + 1}", CriterionKind.Numeric,
                    random.Next(2) == 0 ? Direction.Benefit : Direction.Cost);
        }

        var assessors = Enumerable.Range(1, k)
            .Select(a => new Assessor($"D{a}", $"Assessor {a}", Math.Round(0.5 + (random.NextDouble() * 1.5), 2)))
            .ToArray();

        var importanceRatings = new List<ImportanceRating>();
        foreach (var assessor in assessors)
        {
            foreach (var criterion in criteria)
            {
                importanceRatings.Add(new ImportanceRating(assessor.Id, criterion.Id, importance[random.Next(importance.Count)].Code));
            }
        }

        var ratings = new List<Rating>();
        var values = new List<NumericValue>();
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

                var cell = assessors
                    .Select(a => random.NextDouble() < 0.1
                        ? new Rating(a.Id, alternative.Id, criterion.Id, null, Declined: "outside expertise")
                        : new Rating(a.Id, alternative.Id, criterion.Id, rating[random.Next(rating.Count)].Code))
                    .ToArray();
                if (cell.All(r => r.Term is null))
                {
                    cell[0] = cell[0] with { Term = rating[random.Next(rating.Count)].Code, Declined = null };
                }

                ratings.AddRange(cell);
            }
        }

        return new Evaluation
        {
            Title = $"Generated evaluation {seed}",
            RatingScale = rating,
            ImportanceScale = importance,
            Criteria = criteria,
            Alternatives = alternatives,
            Assessors = assessors,
            Importance = importanceRatings,
            Ratings = ratings,
            Values = values,
            Options = new AnalysisOptions(
                random.Next(2) == 0 || !AboveZero(rating) || !AboveZero(importance) ? AggregationRule.Mean : AggregationRule.Geometric,
                random.Next(2) == 0 ? IdealPoints.Unit : IdealPoints.Extreme),
        };
    }

    private static bool AboveZero(LinguisticScale scale) => scale.Terms.All(t => t.Value.Lower > 0);

    private static T Pick<T>(Random random, params T[] choices) => choices[random.Next(choices.Length)];
}
