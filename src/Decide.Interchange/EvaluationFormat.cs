using Decide.Core.Scales;

namespace Decide.Interchange;

/// <summary>Names and defaults of the portable evaluation file and the results document (docs/evaluation-format.md).</summary>
public static class EvaluationFormat
{
    /// <summary>The <c>format</c> value of an evaluation file this version reads and writes.</summary>
    public const string Evaluation = "decide-evaluation/1";

    /// <summary>The <c>format</c> value of a results document this version writes.</summary>
    public const string Results = "decide-results/1";

    /// <summary>Members names starting with this prefix are extensions: allowed anywhere a fixed set of members is, and ignored.</summary>
    public const string ExtensionPrefix = "x-";

    /// <summary>
    /// Top-level members of a results document that may also appear in an evaluation file (a file that carries its
    /// results); they are allowed and ignored on read.
    /// </summary>
    public static IReadOnlyList<string> ResultMembers { get; } =
        ["ranking", "excluded", "weights", "consistency", "matrix", "sensitivity", "agreement", "summary", "engine", "method", "pointsAward", "round"];

    /// <summary>Range of a custom rating scale that gives none: [0, 10].</summary>
    public static (double Minimum, double Maximum) DefaultRatingRange => (0, 10);

    /// <summary>Range of a custom importance scale that gives none: [0, 1].</summary>
    public static (double Minimum, double Maximum) DefaultImportanceRange => (0, 1);

    /// <summary>Range of a custom pairwise scale that gives none: [1/9, 9].</summary>
    public static (double Minimum, double Maximum) DefaultPairwiseRange => (1.0 / 9, 9);

    /// <summary>True when <paramref name="scale"/> is, term for term, the built-in scale of the same name.</summary>
    public static bool IsBuiltIn(LinguisticScale scale)
    {
        ArgumentNullException.ThrowIfNull(scale);
        return BuiltInScales.ByName.TryGetValue(scale.Name, out var builtIn) && SameContent(scale, builtIn);
    }

    /// <summary>True when two scales have the same name, range and terms (codes, labels, values, descriptors).</summary>
    public static bool SameContent(LinguisticScale a, LinguisticScale b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        return ReferenceEquals(a, b)
            || (a.Name == b.Name && a.Minimum == b.Minimum && a.Maximum == b.Maximum && a.Terms.SequenceEqual(b.Terms));
    }
}
