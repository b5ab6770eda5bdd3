using Decide.Data.Entities;
using Decide.Interchange;
using Decide.Web.Components.Shared;
using Decide.Web.Features.Evaluations;
using Decide.Web.Features.Moderation;
using Decide.Web.Infrastructure;
using Microsoft.AspNetCore.Components;

namespace Decide.Web.Components.Pages.Panel;

/// <summary>
/// Moderation: each cell with every assessor's term and rationale side by side, flagged cells first, filters, and
/// the facilitator's form to record the value the panel agrees; a value recorded by someone else meanwhile is shown
/// instead of being overwritten.
/// </summary>
public partial class ModerationPage
{
    private EvaluationDetail? _detail;
    private ModerationBoard? _board;
    private ProblemText? _problem;
    private string? _notice;
    private ModerationFilter _filter = new();
    private IReadOnlyList<TermChoice> _terms = [];
    private IReadOnlyDictionary<string, string> _names = new Dictionary<string, string>();
    private readonly HashSet<string> _open = new(StringComparer.Ordinal);

    private Guid? _shownId;

    [Parameter]
    public Guid Id { get; set; }

    [Inject]
    private EvaluationService Evaluations { get; set; } = default!;

    [Inject]
    private ModerationService Moderation { get; set; } = default!;

    [Inject]
    private ILogger<ModerationPage> Log { get; set; } = default!;

    private bool CanModerate => ReadOnlyReason is null;

    /// <summary>Why the person may look but not record, or null when they may record.</summary>
    private string? ReadOnlyReason => _detail is null
        ? null
        : !_detail.Summary.MyRoles.Contains(PanelRole.Facilitator)
            ? "Only the facilitator records moderated values; you can compare the ratings."
            : _detail.Summary.Stage != EvaluationStage.Moderation
                ? $"Moderated values are recorded during moderation; this evaluation is at stage {TradeWords.Stage(_detail.Summary.Stage)}, so the record is read-only."
                : null;

    private IReadOnlyList<ModerationCell> Shown => _filter.Apply(_board?.Cells ?? []);

    private IEnumerable<(string Id, string Name)> Criteria =>
        (_board?.Cells ?? []).Select(c => (c.Criterion, c.CriterionName)).DistinctBy(c => c.Criterion).OrderBy(c => c.CriterionName, StringComparer.CurrentCulture);

    private IEnumerable<(string Code, string Name)> Bidders =>
        (_board?.Cells ?? []).Select(c => (c.Alternative, c.AlternativeName)).DistinctBy(c => c.Alternative).OrderBy(c => c.AlternativeName, StringComparer.CurrentCulture);

    protected override async Task OnParametersSetAsync()
    {
        // The layout may hand the same parameters again (a sign-in check, a re-render above): keep what is on screen.
        if (Id == _shownId)
        {
            return;
        }

        _shownId = Id;
        _notice = null;
        _open.Clear();
        _filter = new ModerationFilter();
        (_detail, _problem) = await Attempt.RunAsync(() => Evaluations.GetAsync(Id), Log, "reading an evaluation");
        if (_detail is null)
        {
            return;
        }

        _names = _detail.Panel.Where(p => p.Role == PanelRole.Assessor && p.AssessorCode is not null)
            .DistinctBy(p => p.AssessorCode).ToDictionary(p => p.AssessorCode!, p => p.DisplayName, StringComparer.Ordinal);
        await ReloadAsync();
        _terms = Terms(_board?.RatingScale ?? []);

        // The discussion starts with the flagged cells; every cell is one tick away.
        _filter = new ModerationFilter(FlaggedOnly: _board?.Flagged > 0);
    }

    private async Task ReloadAsync() =>
        (_board, _problem) = await Attempt.RunAsync(() => Moderation.GetAsync(Id), Log, "reading the moderation board");

    /// <summary>The rating scale's terms with their labels from the plan (the codes alone if the plan cannot be read).</summary>
    private IReadOnlyList<TermChoice> Terms(IReadOnlyList<string> codes)
    {
        var labels = new Dictionary<string, string>(StringComparer.Ordinal);
        if (_detail?.Plan is { } plan)
        {
            try
            {
                foreach (var term in EvaluationFileReader.ReadPlan(plan.GetRawText()).Evaluation.RatingScale.Terms)
                {
                    labels[term.Code] = term.Label;
                }
            }
            catch (Decide.Core.InvalidEvaluationException)
            {
                // A plan that does not read leaves the codes on their own.
            }
        }

        return codes.Select(c => new TermChoice(c, labels.GetValueOrDefault(c, ""))).ToArray();
    }

    private static string? Blank(object? value) => value as string is { Length: > 0 } text ? text : null;

    private void Filter(ModerationFilter filter) => _filter = filter;

    private void Toggle(string key)
    {
        if (!_open.Remove(key))
        {
            _open.Add(key);
        }
    }

    private async Task<ProblemText?> ModerateAsync(ModerationCell cell, ModerateRequest request)
    {
        _notice = null;
        var conflict = false;
        var (saved, problem) = await Attempt.RunAsync(async () =>
        {
            try
            {
                return await Moderation.ModerateAsync(Id, cell.Alternative, cell.Criterion, request);
            }
            catch (DomainProblem p) when (p.Extensions.ContainsKey("current"))
            {
                conflict = true;
                throw;
            }
        }, Log, "recording a moderated value");

        if (saved is null)
        {
            if (conflict)
            {
                await ReloadAsync();
                StateHasChanged();
                return problem! with
                {
                    Detail = "Someone else recorded a moderated value for this cell after you opened it, so nothing was saved. "
                             + "The cell now shows the value in force: read it, and record yours again if the panel still agrees on it.",
                };
            }

            return problem;
        }

        await ReloadAsync();
        _notice = $"Recorded {saved.Term} for {cell.AlternativeName} on {cell.CriterionName}. The original ratings are kept beside it.";
        StateHasChanged();
        return null;
    }
}
