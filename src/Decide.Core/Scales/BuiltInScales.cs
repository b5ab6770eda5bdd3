using Decide.Core.Fuzzy;

namespace Decide.Core.Scales;

/// <summary>
/// The scales Decide ships, by name. A file may name one of these instead of listing terms.
/// </summary>
/// <remarks>
/// <list type="bullet">
/// <item><c>chen-rating-7</c> and <c>chen-importance-7</c>: the seven-term scales of Chen (2000), Fuzzy Sets and
/// Systems 114:1–9, Tables 1–2 (values recalled, reproduced in many later papers; see docs/methods.md §2).</item>
/// <item><c>rating-5</c> and <c>importance-5</c>: Decide's five-term variants, a uniform triangular partition of the
/// same ranges (0–10 and 0–1): each term peaks at a quarter-step and reaches its neighbours' peaks.</item>
/// <item><c>points-0-5</c> and <c>points-0-10</c>: scoring scales with points for a published points award, each
/// term with a general descriptor; the triangles are the uniform triangular partition of [0, 10] peaking at the
/// term's points scaled to 10 (for 0–5: peak = 2 × points, reaching the neighbours' peaks; for 0–10: peak = points).
/// Decide's own wording; the 0–5 and 0–10 ranges are common practice in public tenders.</item>
/// <item><c>pairwise-9</c>: the fuzzy pairwise-comparison scale 1̃ = (1,1,1), ñ = (n−1, n, n+1) for n = 2…8,
/// 9̃ = (9,9,9), and the reciprocals 1/ñ = (1/(n+1), 1/n, 1/(n−1)) (common practice; several variants exist).</item>
/// </list>
/// </remarks>
public static class BuiltInScales
{
    /// <summary>Chen (2000) seven-term performance-rating scale on [0, 10].</summary>
    public static LinguisticScale ChenRating7 { get; } = LinguisticScale.Create("chen-rating-7", 0, 10,
    [
        new("VP", "Very poor", new Tfn(0, 0, 1)),
        new("P", "Poor", new Tfn(0, 1, 3)),
        new("MP", "Medium poor", new Tfn(1, 3, 5)),
        new("F", "Fair", new Tfn(3, 5, 7)),
        new("MG", "Medium good", new Tfn(5, 7, 9)),
        new("G", "Good", new Tfn(7, 9, 10)),
        new("VG", "Very good", new Tfn(9, 10, 10)),
    ]);

    /// <summary>Chen (2000) seven-term importance scale on [0, 1].</summary>
    public static LinguisticScale ChenImportance7 { get; } = LinguisticScale.Create("chen-importance-7", 0, 1,
    [
        new("VL", "Very low", new Tfn(0, 0, 0.1)),
        new("L", "Low", new Tfn(0, 0.1, 0.3)),
        new("ML", "Medium low", new Tfn(0.1, 0.3, 0.5)),
        new("M", "Medium", new Tfn(0.3, 0.5, 0.7)),
        new("MH", "Medium high", new Tfn(0.5, 0.7, 0.9)),
        new("H", "High", new Tfn(0.7, 0.9, 1.0)),
        new("VH", "Very high", new Tfn(0.9, 1.0, 1.0)),
    ]);

    /// <summary>Five-term rating scale on [0, 10] (uniform triangular partition).</summary>
    public static LinguisticScale Rating5 { get; } = LinguisticScale.Create("rating-5", 0, 10,
    [
        new("VP", "Very poor", new Tfn(0, 0, 2.5)),
        new("P", "Poor", new Tfn(0, 2.5, 5)),
        new("F", "Fair", new Tfn(2.5, 5, 7.5)),
        new("G", "Good", new Tfn(5, 7.5, 10)),
        new("VG", "Very good", new Tfn(7.5, 10, 10)),
    ]);

    /// <summary>Five-term importance scale on [0, 1] (uniform triangular partition).</summary>
    public static LinguisticScale Importance5 { get; } = LinguisticScale.Create("importance-5", 0, 1,
    [
        new("VL", "Very low", new Tfn(0, 0, 0.25)),
        new("L", "Low", new Tfn(0, 0.25, 0.5)),
        new("M", "Medium", new Tfn(0.25, 0.5, 0.75)),
        new("H", "High", new Tfn(0.5, 0.75, 1)),
        new("VH", "Very high", new Tfn(0.75, 1, 1)),
    ]);

    /// <summary>Six-term scoring scale with points 0–5 and a descriptor per term, triangles on [0, 10].</summary>
    public static LinguisticScale Points5 { get; } = PointsScale("points-0-5",
    [
        ("Unacceptable", "No answer, or the answer does not address the requirement."),
        ("Poor", "Addresses the requirement only in part; major gaps or claims without evidence."),
        ("Fair", "Addresses the requirement with some gaps; the evidence is thin in places."),
        ("Good", "Meets the requirement with evidence; minor gaps only."),
        ("Very good", "Meets the requirement fully, with clear evidence and a credible approach."),
        ("Excellent", "Meets the requirement fully and with confidence; strong evidence and added value that matters to the contract."),
    ]);

    /// <summary>Eleven-term scoring scale with points 0–10 and a descriptor per term, triangles on [0, 10].</summary>
    public static LinguisticScale Points10 { get; } = PointsScale("points-0-10",
    [
        ("None", "No answer, or nothing in it addresses the requirement."),
        ("Very poor", "Touches the requirement but misunderstands it."),
        ("Poor", "Addresses a small part of the requirement; most of it is missing."),
        ("Weak", "Addresses parts of the requirement; major gaps remain."),
        ("Limited", "Addresses most of the requirement; several gaps or little evidence."),
        ("Acceptable", "Addresses the requirement with gaps that carry some risk to delivery."),
        ("Satisfactory", "Meets the requirement; some points lack evidence."),
        ("Good", "Meets the requirement with evidence; minor gaps only."),
        ("Very good", "Meets the requirement fully, with clear evidence."),
        ("Excellent", "Meets the requirement fully with strong evidence and a credible, well-planned approach."),
        ("Outstanding", "Meets the requirement fully and adds value that matters to the contract, with strong evidence throughout."),
    ]);

    /// <summary>Fuzzy pairwise-comparison scale: 1/9 … 1/2, 1 … 9 (17 terms, least to most in favour of the row).</summary>
    public static LinguisticScale Pairwise9 { get; } = CreatePairwise();

    /// <summary>Every built-in scale by name.</summary>
    public static IReadOnlyDictionary<string, LinguisticScale> ByName { get; } =
        new[] { ChenRating7, ChenImportance7, Rating5, Importance5, Points5, Points10, Pairwise9 }.ToDictionary(s => s.Name, StringComparer.Ordinal);

    /// <summary>
    /// A points scale whose term k (0 … n) scores k points and stands for the triangle peaking at 10k/n that reaches
    /// its neighbours' peaks: (10(k−1)/n, 10k/n, 10(k+1)/n), clipped to [0, 10]. The code is the points.
    /// </summary>
    private static LinguisticScale PointsScale(string name, (string Label, string Descriptor)[] terms)
    {
        var n = terms.Length - 1;
        var step = 10.0 / n;
        return LinguisticScale.Create(name, 0, 10, terms.Select((t, k) => new LinguisticTerm(
            k.ToString(System.Globalization.CultureInfo.InvariantCulture),
            t.Label,
            new Tfn(Math.Max(0, (k - 1) * step), k * step, Math.Min(10, (k + 1) * step)),
            t.Descriptor,
            k)).ToList());
    }

    private static LinguisticScale CreatePairwise()
    {
        static Tfn Judgement(int n) => n switch
        {
            1 => Tfn.One,
            9 => Tfn.Crisp(9),
            _ => new Tfn(n - 1, n, n + 1),
        };

        string[] words = ["", "Equal", "Equal to moderate", "Moderate", "Moderate to strong", "Strong",
            "Strong to very strong", "Very strong", "Very to extremely strong", "Extreme"];
        var terms = new List<LinguisticTerm>();
        for (var n = 9; n >= 2; n--)
        {
            terms.Add(new($"1/{n}", $"{words[n]} (column over row)", Judgement(n).Reciprocal()));
        }

        for (var n = 1; n <= 9; n++)
        {
            terms.Add(new($"{n}", n == 1 ? words[1] : $"{words[n]} (row over column)", Judgement(n)));
        }

        return LinguisticScale.Create("pairwise-9", 1.0 / 9, 9, terms);
    }
}
