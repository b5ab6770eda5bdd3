namespace Decide.Core.Consistency;

/// <summary>
/// Saaty's random consistency index RI(n): the mean consistency index of random reciprocal matrices of order n.
/// </summary>
/// <remarks>
/// Values for n = 3…10 from Saaty (1980), The Analytic Hierarchy Process, McGraw-Hill, as widely reproduced
/// [recalled, not re-read; docs/methods.md §5]. RI(1) = RI(2) = 0: matrices of order 1 and 2 are consistent by
/// definition. There is no value above n = 10: the figures that circulate for larger orders have no source Decide
/// can name, so the validator refuses a matrix of more than 10 items and asks for the criteria to be grouped.
/// </remarks>
public static class RandomIndex
{
    /// <summary>Name recorded with every consistency ratio, so the record says which table was used.</summary>
    public const string TableName = "Saaty (1980), n = 3–10";

    /// <summary>Largest matrix order the table covers, and so the most items one pairwise matrix may compare.</summary>
    public const int MaxOrder = 10;

    private static readonly double[] Values = [0, 0, 0, 0.58, 0.90, 1.12, 1.24, 1.32, 1.41, 1.45, 1.49];

    /// <summary>RI(n) for 1 ≤ n ≤ 10 (Saaty 1980 [recalled]).</summary>
    /// <exception cref="ArgumentOutOfRangeException">n outside 1…10.</exception>
    public static double For(int n) => n is >= 1 and <= MaxOrder
        ? Values[n]
        : throw new ArgumentOutOfRangeException(nameof(n), n, $"The random index table covers matrices of order 1 to {MaxOrder}.");

    /// <summary>
    /// The largest acceptable consistency ratio: 0.05 for n = 3, 0.08 for n = 4, 0.10 otherwise
    /// (Saaty 1994, Fundamentals of Decision Making and Priority Theory; recalled).
    /// </summary>
    public static double Threshold(int n) => n switch
    {
        3 => 0.05,
        4 => 0.08,
        _ => 0.10,
    };

    /// <summary>
    /// The largest acceptable geometric consistency index: 0.31 for n = 3, 0.35 for n = 4, 0.37 above
    /// (Aguarón &amp; Moreno-Jiménez 2003, EJOR 147:137–145; recalled).
    /// </summary>
    public static double GciThreshold(int n) => n switch
    {
        3 => 0.31,
        4 => 0.35,
        _ => 0.37,
    };
}
