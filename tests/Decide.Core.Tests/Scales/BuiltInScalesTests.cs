using Decide.Core.Fuzzy;
using Decide.Core.Scales;

namespace Decide.Core.Tests.Scales;

public sealed class BuiltInScalesTests
{
    [Theory]
    // Chen (2000), Fuzzy Sets and Systems 114:1–9, Table 2, rating scale [recalled]; exact values.
    [InlineData(0, "VP", "Very poor", 0, 0, 1)]
    [InlineData(1, "P", "Poor", 0, 1, 3)]
    [InlineData(2, "MP", "Medium poor", 1, 3, 5)]
    [InlineData(3, "F", "Fair", 3, 5, 7)]
    [InlineData(4, "MG", "Medium good", 5, 7, 9)]
    [InlineData(5, "G", "Good", 7, 9, 10)]
    [InlineData(6, "VG", "Very good", 9, 10, 10)]
    public void Chen_rating_scale_holds_the_papers_values(int step, string code, string label, double l, double m, double u)
    {
        AssertTerm(BuiltInScales.ChenRating7, step, code, label, new Tfn(l, m, u));
    }

    [Theory]
    // Chen (2000), Fuzzy Sets and Systems 114:1–9, Table 1, importance scale [recalled]; exact values.
    [InlineData(0, "VL", "Very low", 0, 0, 0.1)]
    [InlineData(1, "L", "Low", 0, 0.1, 0.3)]
    [InlineData(2, "ML", "Medium low", 0.1, 0.3, 0.5)]
    [InlineData(3, "M", "Medium", 0.3, 0.5, 0.7)]
    [InlineData(4, "MH", "Medium high", 0.5, 0.7, 0.9)]
    [InlineData(5, "H", "High", 0.7, 0.9, 1.0)]
    [InlineData(6, "VH", "Very high", 0.9, 1.0, 1.0)]
    public void Chen_importance_scale_holds_the_papers_values(int step, string code, string label, double l, double m, double u)
    {
        AssertTerm(BuiltInScales.ChenImportance7, step, code, label, new Tfn(l, m, u));
    }

    [Fact]
    public void Chen_scales_have_seven_terms_on_their_ranges()
    {
        Assert.Equal(7, BuiltInScales.ChenRating7.Count);
        Assert.Equal((0.0, 10.0), (BuiltInScales.ChenRating7.Minimum, BuiltInScales.ChenRating7.Maximum));
        Assert.Equal(7, BuiltInScales.ChenImportance7.Count);
        Assert.Equal((0.0, 1.0), (BuiltInScales.ChenImportance7.Minimum, BuiltInScales.ChenImportance7.Maximum));
    }

    [Theory]
    [InlineData("rating-5")]
    [InlineData("importance-5")]
    public void Five_term_variants_are_valid_uniform_partitions_of_the_same_range(string name)
    {
        var scale = BuiltInScales.ByName[name];
        Assert.Equal(5, scale.Count);

        // Valid by the same rules a custom scale must pass.
        var rebuilt = LinguisticScale.Create(scale.Name, scale.Minimum, scale.Maximum, scale.Terms);
        Assert.Equal(scale.CodeList, rebuilt.CodeList);

        var step = (scale.Maximum - scale.Minimum) / 4;
        for (var i = 0; i < scale.Count; i++)
        {
            var t = scale[i].Value;
            Assert.Equal(scale.Minimum + (i * step), t.Middle, 1e-12);
            Assert.Equal(Math.Max(scale.Minimum, t.Middle - step), t.Lower, 1e-12);
            Assert.Equal(Math.Min(scale.Maximum, t.Middle + step), t.Upper, 1e-12);
            Assert.False(string.IsNullOrWhiteSpace(scale[i].Label));
        }
    }

    [Fact]
    public void Pairwise_scale_has_seventeen_terms_from_one_ninth_to_nine()
    {
        var scale = BuiltInScales.Pairwise9;
        Assert.Equal(17, scale.Count);
        Assert.Equal(
            ["1/9", "1/8", "1/7", "1/6", "1/5", "1/4", "1/3", "1/2", "1", "2", "3", "4", "5", "6", "7", "8", "9"],
            scale.Terms.Select(t => t.Code));
        Assert.Equal(Tfn.One, scale[8].Value);
        Assert.Equal(Tfn.Crisp(9), scale[16].Value);
        Assert.Equal(new Tfn(2, 3, 4), scale[10].Value); // 3̃ = (2, 3, 4) (common practice)
    }

    [Theory]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(5)]
    [InlineData(8)]
    [InlineData(9)]
    public void Pairwise_reciprocal_terms_are_exactly_one_over_upper_middle_lower(int n)
    {
        var scale = BuiltInScales.Pairwise9;
        Assert.True(scale.TryFind($"{n}", out var direct));
        Assert.True(scale.TryFind($"1/{n}", out var inverse));
        var a = scale[direct].Value;
        var b = scale[inverse].Value;
        Assert.Equal(1 / a.Upper, b.Lower);
        Assert.Equal(1 / a.Middle, b.Middle);
        Assert.Equal(1 / a.Lower, b.Upper);
    }

    [Fact]
    public void Every_built_in_scale_is_listed_by_its_name()
    {
        Assert.Equal(
            ["chen-importance-7", "chen-rating-7", "importance-5", "pairwise-9", "points-0-10", "points-0-5", "rating-5"],
            BuiltInScales.ByName.Keys.Order(StringComparer.Ordinal));
        foreach (var (name, scale) in BuiltInScales.ByName)
        {
            Assert.Equal(name, scale.Name);
        }
    }

    [Theory]
    // The values docs/evaluation-format.md prints for the points scales (Decide's own construction, not a published table).
    [InlineData("points-0-5", 0, "0", "Unacceptable", 0, 0, 0, 2)]
    [InlineData("points-0-5", 3, "3", "Good", 3, 4, 6, 8)]
    [InlineData("points-0-5", 5, "5", "Excellent", 5, 8, 10, 10)]
    [InlineData("points-0-10", 0, "0", "None", 0, 0, 0, 1)]
    [InlineData("points-0-10", 6, "6", "Satisfactory", 6, 5, 6, 7)]
    [InlineData("points-0-10", 10, "10", "Outstanding", 10, 9, 10, 10)]
    public void Points_scales_hold_the_documented_points_and_triangles(string name, int step, string code, string label, double points, double l, double m, double u)
    {
        var scale = BuiltInScales.ByName[name];
        AssertTerm(scale, step, code, label, new Tfn(l, m, u));
        Assert.Equal(points, scale[step].Points);
        Assert.All(scale.Terms, t => Assert.False(string.IsNullOrWhiteSpace(t.Descriptor)));
    }

    private static void AssertTerm(LinguisticScale scale, int step, string code, string label, Tfn value)
    {
        Assert.Equal(code, scale[step].Code);
        Assert.Equal(label, scale[step].Label);
        Assert.Equal(value, scale[step].Value);
        Assert.True(scale.TryFind(code, out var found));
        Assert.Equal(step, found);
    }
}
