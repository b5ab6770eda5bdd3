namespace Decide.Core.Tests.Support;

/// <summary>A vector of positive weights (not normalised) for generating consistent pairwise matrices.</summary>
public sealed record PositiveWeights(double[] Values)
{
    /// <summary>The weights divided by their sum.</summary>
    public double[] Normalised => Values.Select(v => v / Values.Sum()).ToArray();

    /// <inheritdoc />
    public override string ToString() => $"[{string.Join(", ", Values)}]";
}
