using Decide.Core.Fuzzy;
using Decide.Core.Model;

namespace Decide.Core.Weighting;

/// <summary>One pairwise matrix of a plan: the top level (<see cref="Group"/> null) or one group's criteria.</summary>
/// <param name="Group">The group whose criteria are compared; null for the top level.</param>
/// <param name="Items">Row (and column) order: groups, then ungrouped criteria, at the top level; a group's criteria in plan order.</param>
public sealed record PairwiseLayout(string? Group, IReadOnlyList<string> Items);

/// <summary>
/// What a plan weighs and how: the weighted nodes (groups and scored criteria), the pairwise matrices they form, and
/// the value a judgement given by term or by numbers stands for. The validator, the weight derivation, the screens'
/// live feedback and the storage all read the structure from here, so it is defined once.
/// </summary>
public static class WeightStructure
{
    /// <summary>The reserved assessor id of the panel's aggregate (its consistency and weights).</summary>
    public const string PanelId = "panel";

    /// <summary>The criteria that carry weight (every criterion but a pass/fail gate), in plan order.</summary>
    public static IReadOnlyList<Criterion> Scored(Evaluation plan) =>
        plan.Criteria.Where(c => c.Kind != CriterionKind.Gate).ToArray();

    /// <summary>The weighted nodes, groups first, then the scored criteria, each once: what importance is given for.</summary>
    public static IReadOnlyList<string> Nodes(Evaluation plan) =>
        plan.Groups.Select(g => g.Id).Concat(Scored(plan).Select(c => c.Id)).Distinct(StringComparer.Ordinal).ToArray();

    /// <summary>Position of a node in <see cref="Nodes"/> order (groups, then criteria); <see cref="int.MaxValue"/> when unknown.</summary>
    public static int NodeOrder(Evaluation plan, string node)
    {
        for (var i = 0; i < plan.Groups.Count; i++)
        {
            if (plan.Groups[i].Id == node)
            {
                return i;
            }
        }

        for (var i = 0; i < plan.Criteria.Count; i++)
        {
            if (plan.Criteria[i].Id == node)
            {
                return plan.Groups.Count + i;
            }
        }

        return int.MaxValue;
    }

    /// <summary>
    /// The pairwise matrices: first the top level (groups and ungrouped scored criteria), then one per group (its
    /// scored criteria). A matrix of one item needs no judgement; its item gets (1, 1, 1).
    /// </summary>
    public static IReadOnlyList<PairwiseLayout> Matrices(Evaluation plan)
    {
        var scored = Scored(plan);
        var result = new List<PairwiseLayout>(plan.Groups.Count + 1)
        {
            new(null, plan.Groups.Select(g => g.Id).Concat(scored.Where(c => c.Group is null).Select(c => c.Id))
                .Distinct(StringComparer.Ordinal).ToArray()),
        };
        result.AddRange(plan.Groups.Select(g => new PairwiseLayout(g.Id, scored.Where(c => c.Group == g.Id).Select(c => c.Id).ToArray())));
        return result;
    }

    /// <summary>
    /// The fuzzy number a pairwise judgement stands for: the plan's pairwise-scale value of <paramref name="term"/>
    /// when it names one, otherwise the numbers given (a missing bound counts as 1, "equal").
    /// </summary>
    public static Tfn PairwiseValue(Evaluation plan, string? term, double? lower, double? middle, double? upper) =>
        term is not null && plan.PairwiseScale.TryFind(term, out var step)
            ? plan.PairwiseScale[step].Value
            : new Tfn(lower ?? 1, middle ?? 1, upper ?? 1);
}
