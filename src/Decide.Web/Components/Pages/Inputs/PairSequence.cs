using Decide.Web.Features.Inputs;

namespace Decide.Web.Components.Pages.Inputs;

/// <summary>
/// Every pair to compare, one after the other: matrix by matrix (the top level, then each group), within a matrix
/// in the order of its items. Also reads a pair's judgement from either orientation it was stored in.
/// </summary>
public sealed class PairSequence
{
    public PairSequence(IReadOnlyList<MatrixFeedback> matrices)
    {
        var pairs = new List<ComparedPair>();
        foreach (var m in matrices)
        {
            for (var i = 0; i < m.Items.Count; i++)
            {
                for (var k = i + 1; k < m.Items.Count; k++)
                {
                    pairs.Add(new ComparedPair(m.Group, m.Items[i], m.Items[k]));
                }
            }
        }

        Pairs = pairs;
    }

    public IReadOnlyList<ComparedPair> Pairs { get; }

    /// <summary>The position of the pair of <paramref name="a"/> and <paramref name="b"/> (either order), or −1.</summary>
    public int IndexOf(string a, string b) =>
        Pairs.ToList().FindIndex(p => (p.First == a && p.Second == b) || (p.First == b && p.Second == a));

    /// <summary>How many times as important <paramref name="row"/> is as <paramref name="col"/> (the middle value), from the entry for the pair in either orientation; null when not judged.</summary>
    public static double? Middle(IEnumerable<PairwiseEntry> entries, IReadOnlyList<ScaleTermView> scale, string row, string col)
    {
        foreach (var e in entries)
        {
            var value = e.Term is { } term ? scale.FirstOrDefault(t => t.Code == term)?.Tfn[1] : e.Tfn?[1];
            if (value is not { } m || m <= 0)
            {
                continue;
            }

            if (e.Row == row && e.Col == col)
            {
                return m;
            }

            if (e.Row == col && e.Col == row)
            {
                return 1 / m;
            }
        }

        return null;
    }

    /// <summary>The scale term whose middle value is <paramref name="middle"/>, if any.</summary>
    public static ScaleTermView? TermFor(IReadOnlyList<ScaleTermView> scale, double? middle) =>
        middle is { } m ? scale.FirstOrDefault(t => Math.Abs(Math.Log(t.Tfn[1]) - Math.Log(m)) < 1e-9) : null;
}
