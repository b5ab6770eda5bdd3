using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Scales;

namespace Decide.Core.Tests.Robustness;

/// <summary>Small evaluations for the robustness tests.</summary>
internal static class RobustnessFixtures
{
    /// <summary>A crisp rating scale 0…10 whose terms are the crisp numbers 0, 1, …, 10 (codes "0"…"10").</summary>
    public static LinguisticScale CrispRating { get; } = LinguisticScale.Create("crisp-0-10", 0, 10,
        Enumerable.Range(0, 11).Select(i => new LinguisticTerm(i.ToString(System.Globalization.CultureInfo.InvariantCulture), $"score {i}", Tfn.Crisp(i))).ToArray());

    /// <summary>A crisp importance scale 0.1 … 1.0 (codes "1"…"10").</summary>
    public static LinguisticScale CrispImportance { get; } = LinguisticScale.Create("crisp-importance", 0, 1,
        Enumerable.Range(1, 10).Select(i => new LinguisticTerm(i.ToString(System.Globalization.CultureInfo.InvariantCulture), $"importance {i}", Tfn.Crisp(i / 10.0))).ToArray());

    /// <summary>
    /// An evaluation where every assessor gives the same rating: scores[alternative][criterion] on the given scale,
    /// importance[criterion] codes, <paramref name="assessors"/> identical assessors.
    /// </summary>
    public static Evaluation Uniform(
        string[][] scores, string[] importance, int assessors = 3, LinguisticScale? rating = null, LinguisticScale? importanceScale = null,
        IdealPoints ideal = IdealPoints.Unit)
    {
        var n = scores.Length;
        var m = importance.Length;
        var panel = Enumerable.Range(1, assessors).Select(k => new Assessor($"E{k}", $"Assessor {k}")).ToArray();
        return new Evaluation
        {
            Title = "robustness fixture",
            RatingScale = rating ?? BuiltInScales.ChenRating7,
            ImportanceScale = importanceScale ?? BuiltInScales.ChenImportance7,
            Criteria = Enumerable.Range(1, m).Select(j => new Criterion($"C{j}", $"Criterion {j}")).ToArray(),
            Alternatives = Enumerable.Range(1, n).Select(i => new Alternative($"A{i}", $"Alternative {i}")).ToArray(),
            Assessors = panel,
            Importance = [.. from a in panel from j in Enumerable.Range(0, m) select new ImportanceRating(a.Id, $"C{j + 1}", importance[j])],
            Ratings = [.. from a in panel from i in Enumerable.Range(0, n) from j in Enumerable.Range(0, m)
                select new Rating(a.Id, $"A{i + 1}", $"C{j + 1}", scores[i][j], "fixture")],
            Options = new AnalysisOptions(AggregationRule.Mean, ideal),
        };
    }

    /// <summary>A trade-off: A1 strong on C1, A2 strong on C2, A3 middling; C3 a tie-breaker.</summary>
    public static Evaluation TradeOff() => Uniform(
        [["VG", "P", "F"], ["P", "VG", "MG"], ["MG", "MG", "F"], ["F", "F", "MP"]],
        ["VH", "H", "M"]);
}
