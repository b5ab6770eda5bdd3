using System.Text.Json;
using Decide.Core;
using Decide.Core.Model;
using Decide.Core.Scales;
using Decide.Interchange;
using Decide.Web.Components.Shared;
using Decide.Data.Entities;
using Decide.Web.Features.Evaluations;
using Microsoft.AspNetCore.Components;

namespace Decide.Web.Components.Pages.Evaluations;

/// <summary>One evaluation: where it stands, who sits on the panel, the bids, the plan's criteria and scales.</summary>
public partial class EvaluationOverview
{
    private EvaluationDetail? _detail;
    private ProblemText? _problem;
    private Evaluation? _plan;
    private ProblemText? _planProblem;
    private Dictionary<string, string> _descriptions = new(StringComparer.Ordinal);

    [Parameter]
    public Guid Id { get; set; }

    [Inject]
    private EvaluationService Evaluations { get; set; } = default!;

    [Inject]
    private ILogger<EvaluationOverview> Log { get; set; } = default!;

    /// <summary>One stage on the way to sign-off, with the date it began.</summary>
    private sealed record StageStep(EvaluationStage Stage, DateTimeOffset? Began, string State);

    protected override async Task OnParametersSetAsync()
    {
        (_detail, _problem) = await Attempt.RunAsync(() => Evaluations.GetAsync(Id), Log, "reading an evaluation");
        _plan = null;
        _planProblem = null;
        if (_detail?.Plan is { } plan)
        {
            try
            {
                _plan = EvaluationFileReader.ReadPlan(plan.GetRawText()).Evaluation;
                _descriptions = Descriptions(plan);
            }
            catch (InvalidEvaluationException e)
            {
                _planProblem = ProblemText.From(e)! with
                {
                    Title = "The plan is not complete yet",
                    Detail = "The facilitator completes the plan during setup; until then these parts are missing or wrong.",
                };
            }
        }
    }

    private IReadOnlyList<StageStep> Steps()
    {
        var d = _detail!.Dates;
        var began = new DateTimeOffset?[] { d.CreatedAt, d.PlanLockedAt, d.ScoringOpenedAt, d.ModerationStartedAt, d.SignedOffAt };
        var current = _detail.Summary.Stage;
        var superseded = current == EvaluationStage.Superseded;

        // A superseded revision shows how far it got before it was replaced.
        var reached = superseded ? Array.FindLastIndex(began, b => b is not null) : TradeWords.Path.ToList().IndexOf(current);
        return TradeWords.Path.Select((stage, i) => new StageStep(stage, began[i],
            i < reached || (i == reached && superseded) ? "done" : i == reached ? "current" : "upcoming")).ToArray();
    }

    /// <summary>The plan's criteria under their groups, in plan order; criteria without a group come last.</summary>
    private IEnumerable<(string? Group, IReadOnlyList<Criterion> Criteria)> Grouped()
    {
        var plan = _plan!;
        foreach (var group in plan.Groups)
        {
            var members = plan.Criteria.Where(c => c.Group == group.Id).ToArray();
            if (members.Length > 0)
            {
                yield return (group.Name, members);
            }
        }

        var loose = plan.Criteria.Where(c => c.Group is null || plan.Groups.All(g => g.Id != c.Group)).ToArray();
        if (loose.Length > 0)
        {
            yield return (plan.Groups.Count > 0 ? "Not in a group" : null, loose);
        }
    }

    /// <summary>The scales a reader of this plan needs: ratings always; importance or pairwise as the weighting uses.</summary>
    private IEnumerable<(string Title, LinguisticScale Scale)> Scales()
    {
        var plan = _plan!;
        yield return ("Rating scale (bids are rated in these terms)", plan.RatingScale);
        if (plan.Weighting == WeightingMethod.Points)
        {
            yield break;
        }

        yield return plan.Weighting == WeightingMethod.Importance
            ? ("Importance scale (criteria are weighted in these terms)", plan.ImportanceScale)
            : ("Pairwise scale (criteria are compared in these terms)", plan.PairwiseScale);
    }

    private static Dictionary<string, string> Descriptions(JsonElement plan)
    {
        var result = new Dictionary<string, string>(StringComparer.Ordinal);
        if (plan.TryGetProperty("criteria", out var criteria) && criteria.ValueKind == JsonValueKind.Array)
        {
            foreach (var c in criteria.EnumerateArray())
            {
                if (c.TryGetProperty("id", out var id) && id.ValueKind == JsonValueKind.String
                    && c.TryGetProperty("description", out var text) && text.ValueKind == JsonValueKind.String)
                {
                    result[id.GetString()!] = text.GetString()!;
                }
            }
        }

        return result;
    }
}
