using Decide.Core.Model;
using Decide.Core.Scales;

namespace Decide.Core.Tests.Support;

/// <summary>
/// A small, complete and valid tender evaluation (invented): three suppliers, two assessors, two linguistic
/// criteria, a price (numeric cost) and an insurance gate. Tests break one thing at a time with <c>with</c>.
/// </summary>
public static class SampleEvaluation
{
    /// <summary>The evaluation weighted by importance ratings.</summary>
    public static Evaluation WithImportance() => new()
    {
        Title = "Office cleaning 2027",
        Criteria =
        [
            new Criterion("QUALITY", "Quality plan"),
            new Criterion("STAFF", "Staff experience"),
            new Criterion("PRICE", "Annual price", CriterionKind.Numeric, Direction.Cost, Unit: "EUR"),
            new Criterion("INSURED", "Liability insurance", CriterionKind.Gate),
        ],
        Alternatives = [new Alternative("S1", "Supplier one"), new Alternative("S2", "Supplier two"), new Alternative("S3", "Supplier three")],
        Assessors = [new Assessor("D1", "First assessor"), new Assessor("D2", "Second assessor")],
        Importance =
        [
            new ImportanceRating("D1", "QUALITY", "VH"), new ImportanceRating("D1", "STAFF", "MH"), new ImportanceRating("D1", "PRICE", "H"),
            new ImportanceRating("D2", "QUALITY", "H"), new ImportanceRating("D2", "STAFF", "M"), new ImportanceRating("D2", "PRICE", "VH"),
        ],
        Ratings =
        [
            new Rating("D1", "S1", "QUALITY", "G"), new Rating("D1", "S2", "QUALITY", "F"), new Rating("D1", "S3", "QUALITY", "VG"),
            new Rating("D1", "S1", "STAFF", "MG"), new Rating("D1", "S2", "STAFF", "G"), new Rating("D1", "S3", "STAFF", "F"),
            new Rating("D2", "S1", "QUALITY", "MG"), new Rating("D2", "S2", "QUALITY", "F"), new Rating("D2", "S3", "QUALITY", "G"),
            new Rating("D2", "S1", "STAFF", "G"), new Rating("D2", "S2", "STAFF", "VG"), new Rating("D2", "S3", "STAFF", "MP"),
        ],
        Values = [new NumericValue("S1", "PRICE", 41_000), new NumericValue("S2", "PRICE", 38_500), new NumericValue("S3", "PRICE", 45_200)],
        Gates = [new GateResult("S1", "INSURED", true), new GateResult("S2", "INSURED", true), new GateResult("S3", "INSURED", true)],
    };

    /// <summary>The same evaluation weighted by D1's and D2's complete pairwise comparisons.</summary>
    public static Evaluation WithPairwise() => WithImportance() with
    {
        Weighting = WeightingMethod.Pairwise,
        Importance = [],
        Pairwise =
        [
            Judgement("D1", "QUALITY", "STAFF", "3"), Judgement("D1", "QUALITY", "PRICE", "2"), Judgement("D1", "STAFF", "PRICE", "1/2"),
            Judgement("D2", "QUALITY", "STAFF", "2"), Judgement("D2", "PRICE", "QUALITY", "1"), Judgement("D2", "STAFF", "PRICE", "1/3"),
        ],
    };

    /// <summary>
    /// QUALITY and STAFF in a group "TECH", compared within it; the group compared with PRICE at the top level.
    /// </summary>
    public static Evaluation WithGroupedPairwise() => WithImportance() with
    {
        Groups = [new CriterionGroup("TECH", "Technical")],
        Criteria =
        [
            new Criterion("QUALITY", "Quality plan", Group: "TECH"),
            new Criterion("STAFF", "Staff experience", Group: "TECH"),
            new Criterion("PRICE", "Annual price", CriterionKind.Numeric, Direction.Cost, Unit: "EUR"),
            new Criterion("INSURED", "Liability insurance", CriterionKind.Gate),
        ],
        Weighting = WeightingMethod.Pairwise,
        Importance = [],
        Pairwise = [Judgement("D1", "TECH", "PRICE", "3"), Judgement("D1", "QUALITY", "STAFF", "2")],
    };

    /// <summary>A judgement given by the code of a pairwise-9 term.</summary>
    public static PairwiseJudgement Judgement(string assessor, string row, string col, string code)
    {
        var scale = BuiltInScales.Pairwise9;
        Assert.True(scale.TryFind(code, out var step), $"pairwise-9 has no term {code}");
        return new PairwiseJudgement(assessor, row, col, scale[step].Value, code);
    }
}
