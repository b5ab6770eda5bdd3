using Decide.Core.Model;

namespace Decide.Interchange.Tests;

/// <summary>Compares two evaluation files by content (records inside lists and dictionaries compared by value).</summary>
internal static class ContentAssert
{
    public static void Same(EvaluationFile expected, EvaluationFile actual)
    {
        Same(expected.Evaluation, actual.Evaluation);
        var (m, n) = (expected.Metadata, actual.Metadata);
        Assert.Equal((m.Reference, m.Organisation, m.Description, m.Noun), (n.Reference, n.Organisation, n.Description, n.Noun));
        Assert.Equal(Sorted(m.CriterionDescriptions), Sorted(n.CriterionDescriptions));
    }

    public static void Same(Evaluation expected, Evaluation actual)
    {
        Assert.Equal(expected.Title, actual.Title);
        Assert.True(EvaluationFormat.SameContent(expected.RatingScale, actual.RatingScale), "rating scales differ");
        Assert.True(EvaluationFormat.SameContent(expected.ImportanceScale, actual.ImportanceScale), "importance scales differ");
        Assert.True(EvaluationFormat.SameContent(expected.PairwiseScale, actual.PairwiseScale), "pairwise scales differ");
        Assert.Equal(expected.Groups, actual.Groups);
        Assert.Equal(expected.Criteria.Select(Flat), actual.Criteria.Select(Flat));
        Assert.Equal(expected.Alternatives, actual.Alternatives);
        Assert.Equal(expected.Assessors.Select(Flat), actual.Assessors.Select(Flat));
        Assert.Equal(expected.Weighting, actual.Weighting);
        Assert.Equal(expected.Options, actual.Options);
        SameItems(expected.Importance, actual.Importance);
        SameItems(expected.Pairwise, actual.Pairwise);
        SameItems(expected.Ratings, actual.Ratings);
        SameItems(expected.Moderated.Select(Flat).ToArray(), actual.Moderated.Select(Flat).ToArray());
        SameItems(expected.Values, actual.Values);
        SameItems(expected.Gates, actual.Gates);
    }

    /// <summary>The same records, in any order (a file groups them by assessor or alternative).</summary>
    private static void SameItems<T>(IReadOnlyList<T> expected, IReadOnlyList<T> actual)
    {
        Assert.Equal(expected.Count, actual.Count);
        var remaining = actual.ToList();
        foreach (var item in expected)
        {
            Assert.True(remaining.Remove(item), $"missing after the round trip: {item}");
        }
    }

    private static string Flat(Criterion c) =>
        $"{c with { Descriptors = null }} descriptors: {string.Join("; ", Sorted(c.Descriptors))}";

    private static string Flat(Assessor a) =>
        $"{a with { Criteria = null }} criteria: {(a.Criteria is null ? "all" : string.Join(", ", a.Criteria))}";

    private static string Flat(ModeratedRating m) =>
        $"{m with { AgreedBy = null }} agreed by: {(m.AgreedBy is null ? "not recorded" : $"[{string.Join(", ", m.AgreedBy)}]")}";

    private static IEnumerable<string> Sorted(IReadOnlyDictionary<string, string>? map) =>
        (map ?? new Dictionary<string, string>()).Select(kv => $"{kv.Key}={kv.Value}").Order(StringComparer.Ordinal);
}
