using System.Collections.ObjectModel;
using System.Globalization;
using Decide.Core.Fuzzy;

namespace Decide.Core.Scales;

/// <summary>
/// An ordered list of linguistic terms, each standing for a triangular fuzzy number, from the least to the most
/// favourable (or important). Immutable and valid by construction.
/// </summary>
/// <remarks>
/// Rules a scale obeys (checked by <see cref="Create"/>): at least two terms; codes non-empty, without spaces and
/// unique ignoring case; labels non-empty; terms strictly increasing by middle value; every value within the
/// declared range. The position of a term (its step) is what panel-agreement measures count in.
/// </remarks>
public sealed class LinguisticScale
{
    private readonly Dictionary<string, int> _index;

    private LinguisticScale(string name, double minimum, double maximum, IReadOnlyList<LinguisticTerm> terms)
    {
        Name = name;
        Minimum = minimum;
        Maximum = maximum;
        Terms = new ReadOnlyCollection<LinguisticTerm>(terms.ToArray());
        _index = new Dictionary<string, int>(StringComparer.Ordinal);
        for (var i = 0; i < terms.Count; i++)
        {
            _index[terms[i].Code] = i;
        }
    }

    /// <summary>A name for the scale (a built-in name such as <c>chen-rating-7</c>, or the file's own).</summary>
    public string Name { get; }

    /// <summary>Lowest value any term may take.</summary>
    public double Minimum { get; }

    /// <summary>Highest value any term may take.</summary>
    public double Maximum { get; }

    /// <summary>The terms, least favourable first.</summary>
    public IReadOnlyList<LinguisticTerm> Terms { get; }

    /// <summary>Number of terms.</summary>
    public int Count => Terms.Count;

    /// <summary>The term at a step (0 = least favourable).</summary>
    public LinguisticTerm this[int step] => Terms[step];

    /// <summary>Finds a term's step by its exact code.</summary>
    public bool TryFind(string code, out int step) => _index.TryGetValue(code, out step);

    /// <summary>The codes in order, for messages: "VP, P, MP, F, MG, G, VG".</summary>
    public string CodeList => string.Join(", ", Terms.Select(t => t.Code));

    /// <summary>
    /// Validates and creates a scale. Every broken rule is reported, each naming the term (by its position in
    /// <paramref name="path"/><c>.terms[i]</c>) and the rule.
    /// </summary>
    /// <param name="name">Scale name.</param>
    /// <param name="minimum">Declared lower bound of the scale's range.</param>
    /// <param name="maximum">Declared upper bound, above the minimum.</param>
    /// <param name="terms">Terms, least favourable first.</param>
    /// <param name="path">Where the scale sits in the input, for error paths (for example <c>$.ratingScale</c>).</param>
    /// <exception cref="InvalidEvaluationException">The scale breaks one or more rules.</exception>
    public static LinguisticScale Create(
        string name, double minimum, double maximum, IReadOnlyList<LinguisticTerm> terms, string path = "$")
    {
        var errors = new ErrorList();
        if (!double.IsFinite(minimum) || !double.IsFinite(maximum) || !(minimum < maximum))
        {
            errors.Add($"{path}.range", $"the range must be two finite numbers, the first below the second; got [{F(minimum)}, {F(maximum)}]");
        }

        if (terms.Count < 2)
        {
            errors.Add($"{path}.terms", $"a scale needs at least two terms; got {terms.Count}");
        }

        var seen = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
        for (var i = 0; i < terms.Count; i++)
        {
            var term = terms[i];
            var at = $"{path}.terms[{i}]";
            if (string.IsNullOrWhiteSpace(term.Code) || term.Code.Any(char.IsWhiteSpace))
            {
                errors.Add($"{at}.code", $"a term's code must be non-empty and contain no spaces; got \"{term.Code}\"");
            }
            else if (seen.TryGetValue(term.Code, out var first))
            {
                errors.Add($"{at}.code", $"code \"{term.Code}\" is already used by term {first} (codes must be unique, ignoring case)");
            }
            else
            {
                seen[term.Code] = i;
            }

            if (string.IsNullOrWhiteSpace(term.Label))
            {
                errors.Add($"{at}.label", $"term \"{term.Code}\" needs a label");
            }

            if (term.Value.Lower < minimum || term.Value.Upper > maximum)
            {
                errors.Add($"{at}.tfn", $"term \"{term.Code}\" {term.Value} lies outside the scale's range [{F(minimum)}, {F(maximum)}]");
            }

            if (i > 0 && !(term.Value.Middle > terms[i - 1].Value.Middle))
            {
                errors.Add($"{at}.tfn", $"term \"{term.Code}\" must have a larger middle value than \"{terms[i - 1].Code}\" before it ({F(term.Value.Middle)} ≤ {F(terms[i - 1].Value.Middle)}); list terms from least to most favourable");
            }

            if (term.Points is { } points && !(points >= 0 && double.IsFinite(points)))
            {
                errors.Add($"{at}.points", $"term \"{term.Code}\" must score zero or more points; got {F(points)}");
            }
            else if (i > 0 && term.Points is { } here && terms[i - 1].Points is { } before && here < before)
            {
                errors.Add($"{at}.points", $"term \"{term.Code}\" scores fewer points than \"{terms[i - 1].Code}\" before it ({F(here)} < {F(before)}); points may not decrease from the least to the most favourable term");
            }
        }

        var scored = terms.Count(t => t.Points is not null);
        if (scored > 0 && scored < terms.Count)
        {
            var first = terms.Select((t, i) => (t, i)).First(x => x.t.Points is null);
            errors.Add($"{path}.terms[{first.i}].points", $"term \"{first.t.Code}\" has no points while other terms of the scale do; give every term its points, or none");
        }

        errors.ThrowIfAny();
        return new LinguisticScale(name, minimum, maximum, terms);
    }

    /// <inheritdoc />
    public override string ToString() => $"{Name} ({CodeList})";

    private static string F(double x) => x.ToString("G6", CultureInfo.InvariantCulture);
}
