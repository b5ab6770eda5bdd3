using Decide.Core.Model;

namespace Decide.Core.Rounds;

/// <summary>
/// The validator's checks of a round's design (who reviews what) and funding line, each problem by its place in
/// the portable file. The service runs them again when it freezes an assignment with the plan.
/// </summary>
public static class DesignChecks
{
    /// <summary>Where the design sits in the portable file.</summary>
    public const string Path = "$.reviews";

    /// <summary>Where the funding line sits in the portable file.</summary>
    public const string FundingPath = "$.funding";

    /// <summary>The problems of a round's plan alone: reviewers per application, the load cap and the budget.</summary>
    public static IReadOnlyList<EvaluationError> Plan(Evaluation e)
    {
        ArgumentNullException.ThrowIfNull(e);
        var errors = new List<EvaluationError>();
        if (e.Reviews is { } design)
        {
            if (design.ReviewersPerApplication < 1)
            {
                errors.Add(new($"{Path}.reviewersPerApplication", $"each application needs at least one reviewer; got {design.ReviewersPerApplication}"));
            }

            if (design.MaxLoad < 1)
            {
                errors.Add(new($"{Path}.maxLoad", $"the most applications one reviewer may read is 1 or more; got {design.MaxLoad}"));
            }
        }

        if (e.Funding is { } funding && (!(funding.Budget > 0) || double.IsInfinity(funding.Budget)))
        {
            errors.Add(new($"{FundingPath}.budget", $"the budget is a positive amount; got {funding.Budget}"));
        }

        return errors;
    }

    /// <summary>Every problem of <see cref="Evaluation.Reviews"/> and <see cref="Evaluation.Funding"/>; empty when both are sound or absent.</summary>
    /// <param name="e">The evaluation.</param>
    /// <param name="conflicts">Declared conflicts (reviewer, application) the assignment must avoid; may be empty.</param>
    public static IReadOnlyList<EvaluationError> Check(Evaluation e, IReadOnlySet<(string Assessor, string Alternative)>? conflicts = null)
    {
        ArgumentNullException.ThrowIfNull(e);
        var errors = new List<EvaluationError>();
        if (e.Reviews is { } design)
        {
            Design(e, design, conflicts, errors);
        }

        if (e.Funding is { } funding)
        {
            Funding(e, funding, errors);
        }

        return errors;
    }

    private static void Design(Evaluation e, ReviewDesign design, IReadOnlySet<(string, string)>? conflicts, List<EvaluationError> errors)
    {
        void Add(string at, string reason) => errors.Add(new EvaluationError(at, reason));
        var k = design.ReviewersPerApplication;
        if (k < 1)
        {
            Add($"{Path}.reviewersPerApplication", $"each application needs at least one reviewer; got {k}");
        }

        if (design.MaxLoad < 1)
        {
            Add($"{Path}.maxLoad", $"the most applications one reviewer may read is 1 or more; got {design.MaxLoad}");
        }

        var panel = e.Assessors.ToDictionary(a => a.Id, a => a, StringComparer.Ordinal);
        var applications = e.Alternatives.Select(a => a.Id).ToHashSet(StringComparer.Ordinal);
        var readers = e.Alternatives.ToDictionary(a => a.Id, _ => 0, StringComparer.Ordinal);
        var reviewersSeen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var reviewer in design.Assigned)
        {
            var at = JsonPath.Key($"{Path}.assigned", reviewer.Assessor);
            if (!panel.ContainsKey(reviewer.Assessor))
            {
                Add(at, $"unknown assessor \"{reviewer.Assessor}\"");
                continue;
            }

            if (!reviewersSeen.Add(reviewer.Assessor))
            {
                Add(at, $"assessor \"{reviewer.Assessor}\" is listed twice; give each reviewer one list");
                continue;
            }

            if (design.MaxLoad >= 1 && reviewer.Alternatives.Count > design.MaxLoad)
            {
                Add(at, $"{Name(panel[reviewer.Assessor])} is given {reviewer.Alternatives.Count} applications, more than the most one reviewer may read ({design.MaxLoad})");
            }

            var mine = new HashSet<string>(StringComparer.Ordinal);
            for (var i = 0; i < reviewer.Alternatives.Count; i++)
            {
                var id = reviewer.Alternatives[i];
                var place = JsonPath.Index(at, i);
                if (!applications.Contains(id))
                {
                    Add(place, $"unknown alternative \"{id}\"");
                }
                else if (!mine.Add(id))
                {
                    Add(place, $"application \"{e.AlternativeName(id)}\" is given to {Name(panel[reviewer.Assessor])} twice");
                }
                else if (conflicts?.Contains((reviewer.Assessor, id)) == true)
                {
                    Add(place, $"{Name(panel[reviewer.Assessor])} declared a conflict of interest with \"{e.AlternativeName(id)}\" and cannot review it");
                }
                else
                {
                    readers[id]++;
                }
            }
        }

        if (k >= 1)
        {
            var underRead = e.Alternatives.Where(a => readers[a.Id] < k).ToArray();
            if (underRead.Length > 0)
            {
                var missing = underRead.Sum(a => k - readers[a.Id]);
                Add($"{Path}.assigned",
                    $"{Count(underRead.Length, "application has", "applications have")} fewer than the {k} reviewers the plan asks for ({List(underRead.Select(a => $"{a.Name} {readers[a.Id]}").ToArray())}); {Count(missing, "more review is", "more reviews are")} needed");
            }
        }

        var parts = DesignConnectivity.Parts(e.Alternatives.Select(a => a.Id).ToArray(), design.Assigned.Where(r => panel.ContainsKey(r.Assessor)));
        if (parts.Count > 1 && e.Alternatives.Count > 1)
        {
            var described = parts.Take(3).Select(p => $"{{{List(p.Select(e.AlternativeName).ToArray())}}}").ToArray();
            Add($"{Path}.assigned",
                $"the design falls into {parts.Count} parts that share no reviewer, so scores in one part cannot be compared with scores in another: {string.Join(" and ", described)}{(parts.Count > 3 ? $" and {parts.Count - 3} more" : "")}; give at least one reviewer applications from each part");
        }
    }

    private static void Funding(Evaluation e, FundingPlan funding, List<EvaluationError> errors)
    {
        if (!(funding.Budget > 0) || double.IsInfinity(funding.Budget))
        {
            errors.Add(new($"{FundingPath}.budget", $"the budget is a positive amount; got {funding.Budget}"));
        }

        for (var i = 0; i < e.Alternatives.Count; i++)
        {
            var alternative = e.Alternatives[i];
            var at = $"$.alternatives[{i}].requested";
            if (alternative.Requested is not { } requested)
            {
                errors.Add(new(at, $"the round has a funding line, so \"{alternative.Name}\" needs the amount it requests"));
            }
            else if (!(requested > 0) || double.IsInfinity(requested))
            {
                errors.Add(new(at, $"the requested amount is a positive number; got {requested}"));
            }
        }
    }

    private static string Name(Assessor a) => string.IsNullOrWhiteSpace(a.Name) ? a.Id : a.Name;

    private static string Count(int n, string one, string many) => n == 1 ? $"1 {one}" : $"{n} {many}";

    private static string List(IReadOnlyCollection<string> items) =>
        items.Count <= 6 ? string.Join(", ", items) : $"{string.Join(", ", items.Take(6))} and {items.Count - 6} more";
}
