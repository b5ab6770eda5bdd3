namespace Decide.Core.Award;

/// <summary>
/// Crisp weights fixed in the plan and published with the tender: points (or percentages) per group and per
/// criterion, e.g. quality 60 = technical 30 + service 20 + risk 10, price 40, of 100.
/// </summary>
/// <param name="Total">The stated total (100 for percentages).</param>
/// <param name="Groups">Each group's points, by group id.</param>
/// <param name="Criteria">Each criterion's points and its group (null at the top level), in plan order.</param>
public sealed record PublishedWeights(double Total, IReadOnlyDictionary<string, double> Groups, IReadOnlyList<PublishedCriterion> Criteria)
{
    /// <summary>Where the published weights sit in the portable file.</summary>
    public const string Path = "$.publishedWeights";

    /// <summary>
    /// Every problem with the weights, by place: each value positive and finite, a group's criteria summing to the
    /// group's points, the top level (groups and ungrouped criteria) summing to the stated total, no group empty or
    /// unknown. Empty when the weights can be published.
    /// </summary>
    public IReadOnlyList<EvaluationError> Validate(double tolerance = 1e-9)
    {
        var errors = new List<EvaluationError>();
        if (!(Total > 0 && double.IsFinite(Total)))
        {
            errors.Add(new(JsonPath.Key(Path, "total"), "give the total the points add up to, a positive number (100 for percentages)"));
        }

        foreach (var (id, points) in Groups)
        {
            if (!(points > 0 && double.IsFinite(points)))
            {
                errors.Add(new(JsonPath.Keys(Path, "groups", id), "a group's points must be a positive number"));
            }
        }

        for (var i = 0; i < Criteria.Count; i++)
        {
            var c = Criteria[i];
            if (!(c.Points > 0 && double.IsFinite(c.Points)))
            {
                errors.Add(new(JsonPath.Keys(Path, "criteria", c.Id), "a criterion's points must be a positive number; leave a criterion out of the plan rather than give it 0"));
            }

            if (c.Group is { } g && !Groups.ContainsKey(g))
            {
                errors.Add(new(JsonPath.Keys(Path, "criteria", c.Id), $"the criterion is in group \"{g}\", which has no points"));
            }
        }

        if (errors.Count > 0)
        {
            return errors;
        }

        foreach (var (id, points) in Groups)
        {
            var members = Criteria.Where(c => c.Group == id).ToArray();
            if (members.Length == 0)
            {
                errors.Add(new(JsonPath.Keys(Path, "groups", id), "the group has points but no criterion"));
                continue;
            }

            var sum = members.Sum(c => c.Points);
            if (Math.Abs(sum - points) > tolerance * Math.Max(1, points))
            {
                errors.Add(new(JsonPath.Keys(Path, "groups", id),
                    $"the group has {points:0.###} points but its criteria add up to {sum:0.###} ({string.Join(" + ", members.Select(c => $"{c.Id} {c.Points:0.###}"))})"));
            }
        }

        var top = Groups.Values.Sum() + Criteria.Where(c => c.Group is null).Sum(c => c.Points);
        if (Math.Abs(top - Total) > tolerance * Math.Max(1, Total))
        {
            errors.Add(new(JsonPath.Key(Path, "total"),
                $"the groups and the criteria outside a group add up to {top:0.###}, not the stated total of {Total:0.###}"));
        }

        return errors;
    }

    /// <summary>Each criterion's share of the total (its points ÷ the total), in criterion order: the crisp weights the fuzzy analysis uses.</summary>
    public double[] Shares() => Criteria.Select(c => c.Points / Total).ToArray();

    /// <summary>The points of criterion <paramref name="id"/>, or null when it has none.</summary>
    public double? PointsOf(string id)
    {
        foreach (var c in Criteria)
        {
            if (c.Id == id)
            {
                return c.Points;
            }
        }

        return null;
    }
}

/// <summary>One criterion's published points.</summary>
/// <param name="Id">The criterion's id.</param>
/// <param name="Points">Its points (within its group's, when grouped).</param>
/// <param name="Group">Its group, or null at the top level.</param>
public sealed record PublishedCriterion(string Id, double Points, string? Group = null);
