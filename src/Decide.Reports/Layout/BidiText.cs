using System.Globalization;

namespace Decide.Reports.Layout;

/// <summary>
/// A small subset of the Unicode bidirectional algorithm, enough to show names and rationales written in Hebrew or
/// Arabic the right way round inside left-to-right pages: strong characters decide a run's direction, neutral
/// characters (spaces, punctuation) between two runs of one direction join them, and a paragraph whose first strong
/// character is right-to-left lays its runs out from the right. No mirroring of brackets and no Arabic joining forms
/// (letters show in their isolated forms).
/// </summary>
internal static class BidiText
{
    /// <summary>Whether <paramref name="text"/> holds any right-to-left letter.</summary>
    public static bool HasRightToLeft(string text)
    {
        foreach (var c in text)
        {
            if (IsRightToLeft(c))
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>The text cut into runs of one direction, in the order they appear from left to right.</summary>
    public static IReadOnlyList<BidiRun> VisualRuns(string text)
    {
        var elements = new List<string>();
        var enumerator = StringInfo.GetTextElementEnumerator(text);
        while (enumerator.MoveNext())
        {
            elements.Add((string)enumerator.Current);
        }

        var kinds = elements.Select(e => Classify(e[0])).ToArray();
        var baseRtl = kinds.FirstOrDefault(k => k != Strength.Neutral) == Strength.RightToLeft;
        var resolved = new bool[kinds.Length];
        for (var i = 0; i < kinds.Length;)
        {
            if (kinds[i] != Strength.Neutral)
            {
                resolved[i] = kinds[i] == Strength.RightToLeft;
                i++;
                continue;
            }

            var end = i;
            while (end < kinds.Length && kinds[end] == Strength.Neutral)
            {
                end++;
            }

            var before = i == 0 ? baseRtl : resolved[i - 1];
            var after = end == kinds.Length ? baseRtl : kinds[end] == Strength.RightToLeft;
            var direction = before == after ? before : baseRtl;
            for (var k = i; k < end; k++)
            {
                resolved[k] = direction;
            }

            i = end;
        }

        var runs = new List<BidiRun>();
        for (var i = 0; i < elements.Count;)
        {
            var end = i;
            while (end < elements.Count && resolved[end] == resolved[i])
            {
                end++;
            }

            runs.Add(new BidiRun(elements.GetRange(i, end - i), resolved[i]));
            i = end;
        }

        if (baseRtl)
        {
            runs.Reverse();
        }

        return runs;
    }

    private static Strength Classify(char c) =>
        IsRightToLeft(c) ? Strength.RightToLeft
        : char.IsLetterOrDigit(c) ? Strength.LeftToRight
        : Strength.Neutral;

    private static bool IsRightToLeft(char c) =>
        c is (>= '\u0590' and <= '\u08FF') or (>= '\uFB1D' and <= '\uFDFF') or (>= '\uFE70' and <= '\uFEFF');

    private enum Strength
    {
        Neutral,
        LeftToRight,
        RightToLeft,
    }
}
