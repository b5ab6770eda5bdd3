using Decide.Core.Model;

namespace Decide.Reports;

/// <summary>Looks up the names people read for the ids an evaluation uses.</summary>
public sealed class RecordNames
{
    private readonly Dictionary<string, string> _alternatives;
    private readonly Dictionary<string, string> _criteria;
    private readonly Dictionary<string, string> _groups;
    private readonly Dictionary<string, string> _assessors;

    /// <summary>Builds the lookups for <paramref name="evaluation"/>.</summary>
    public RecordNames(Evaluation evaluation)
    {
        ArgumentNullException.ThrowIfNull(evaluation);
        _alternatives = evaluation.Alternatives.ToDictionary(a => a.Id, a => a.Name, StringComparer.Ordinal);
        _criteria = evaluation.Criteria.ToDictionary(c => c.Id, c => c.Name, StringComparer.Ordinal);
        _groups = evaluation.Groups.ToDictionary(g => g.Id, g => g.Name, StringComparer.Ordinal);
        _assessors = evaluation.Assessors.ToDictionary(a => a.Id, a => a.Name, StringComparer.Ordinal);
    }

    /// <summary>An alternative's name (its id if unknown).</summary>
    public string Alternative(string id) => _alternatives.GetValueOrDefault(id, id);

    /// <summary>A criterion's name (its id if unknown).</summary>
    public string Criterion(string id) => _criteria.GetValueOrDefault(id, id);

    /// <summary>A group's or criterion's name (its id if unknown).</summary>
    public string Node(string id) => _groups.TryGetValue(id, out var group) ? group : Criterion(id);

    /// <summary>An assessor's name; <c>panel</c> reads "Panel (aggregate)".</summary>
    public string Assessor(string id) => id == "panel" ? "Panel (aggregate)" : _assessors.GetValueOrDefault(id, id);
}
