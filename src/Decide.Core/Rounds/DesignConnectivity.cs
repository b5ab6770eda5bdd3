using Decide.Core.Model;

namespace Decide.Core.Rounds;

/// <summary>
/// Whether every application of an incomplete design can be compared with every other through shared reviewers:
/// two applications are linked when one reviewer reads both, and the design is connected when the links join all
/// of them. In a disconnected design each part is scored by a different set of people, so a difference between
/// parts may be a difference between reviewers (one group marks harder) and nothing in the data can tell which.
/// </summary>
public static class DesignConnectivity
{
    /// <summary>
    /// The parts of the design: sets of applications joined by shared reviewers, largest first (ties in the order of
    /// their first application in <paramref name="alternatives"/>); each part lists its applications in that order.
    /// One part means the design is connected. An application nobody reads is a part on its own.
    /// </summary>
    /// <param name="alternatives">The applications, in the order they are shown.</param>
    /// <param name="assigned">Who reads what; ids not among <paramref name="alternatives"/> are ignored.</param>
    public static IReadOnlyList<IReadOnlyList<string>> Parts(IReadOnlyList<string> alternatives, IEnumerable<ReviewAssignment> assigned)
    {
        ArgumentNullException.ThrowIfNull(alternatives);
        ArgumentNullException.ThrowIfNull(assigned);
        var index = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var id in alternatives)
        {
            index.TryAdd(id, index.Count);
        }

        var parent = new int[index.Count];
        for (var i = 0; i < parent.Length; i++)
        {
            parent[i] = i;
        }

        foreach (var reviewer in assigned)
        {
            var first = -1;
            foreach (var id in reviewer.Alternatives)
            {
                if (!index.TryGetValue(id, out var i))
                {
                    continue;
                }

                if (first < 0)
                {
                    first = i;
                }
                else
                {
                    Union(parent, first, i);
                }
            }
        }

        var parts = new Dictionary<int, List<string>>();
        var order = new List<int>();
        foreach (var (id, i) in index)
        {
            var root = Find(parent, i);
            if (!parts.TryGetValue(root, out var part))
            {
                parts[root] = part = [];
                order.Add(root);
            }

            part.Add(id);
        }

        return order.Select((root, position) => (part: parts[root], position))
            .OrderByDescending(x => x.part.Count)
            .ThenBy(x => x.position)
            .Select(x => (IReadOnlyList<string>)x.part)
            .ToArray();
    }

    private static int Find(int[] parent, int i)
    {
        while (parent[i] != i)
        {
            parent[i] = parent[parent[i]];
            i = parent[i];
        }

        return i;
    }

    private static void Union(int[] parent, int a, int b)
    {
        int ra = Find(parent, a), rb = Find(parent, b);
        if (ra != rb)
        {
            // The smaller root joins the larger so that the part is named after its earliest application.
            parent[Math.Max(ra, rb)] = Math.Min(ra, rb);
        }
    }
}
