using Decide.Core.Model;

namespace Decide.Web.Components.Pages.Results;

/// <summary>Names for the ids the engine reports: bids, criteria and assessors; an unknown id stays as it is.</summary>
public sealed class ResultNames
{
    private readonly Dictionary<string, string> _alternatives;
    private readonly Dictionary<string, string> _criteria;
    private readonly Dictionary<string, string> _assessors;

    public ResultNames(IEnumerable<Alternative> alternatives, IEnumerable<Criterion> criteria, IEnumerable<Assessor> assessors)
    {
        _alternatives = alternatives.ToDictionary(a => a.Id, a => a.Name, StringComparer.Ordinal);
        _criteria = criteria.ToDictionary(c => c.Id, c => c.Name, StringComparer.Ordinal);
        _assessors = assessors.ToDictionary(a => a.Id, a => a.Name, StringComparer.Ordinal);
    }

    /// <summary>The names of the bids, criteria and assessors of <paramref name="evaluation"/>.</summary>
    public static ResultNames Of(Evaluation evaluation) => new(evaluation.Alternatives, evaluation.Criteria, evaluation.Assessors);

    public string Alternative(string id) => _alternatives.GetValueOrDefault(id, id);

    public string Criterion(string id) => _criteria.GetValueOrDefault(id, id);

    public string Assessor(string id) => _assessors.GetValueOrDefault(id, id);
}
