namespace Decide.Core.Tests.Award;

/// <summary>Element-wise comparison of figures within a tolerance.</summary>
internal static class Close
{
    public static void All(IReadOnlyList<double> expected, IReadOnlyList<double> actual, double tolerance = 1e-9)
    {
        Assert.Equal(expected.Count, actual.Count);
        for (var i = 0; i < expected.Count; i++)
        {
            Assert.True(Math.Abs(expected[i] - actual[i]) <= tolerance, $"[{i}]: expected {expected[i]}, got {actual[i]}");
        }
    }
}
