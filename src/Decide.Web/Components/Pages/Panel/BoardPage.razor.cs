using Decide.Data.Entities;
using Decide.Web.Components.Shared;
using Decide.Web.Features.Evaluations;
using Decide.Web.Features.Moderation;
using Decide.Web.Infrastructure;
using Microsoft.AspNetCore.Components;

namespace Decide.Web.Components.Pages.Panel;

/// <summary>
/// The facilitator's scoring board: each assessor's progress, reopening a submitted sheet with a reason, starting
/// moderation once every sheet is in, and, from moderation on, how far apart the ratings are in each cell.
/// </summary>
public partial class BoardPage
{
    private EvaluationDetail? _detail;
    private ScoringBoard? _board;
    private ModerationBoard? _spreads;
    private ProblemText? _spreadProblem;
    private ProblemText? _problem;
    private ProblemText? _actionProblem;
    private string? _reasonProblem;
    private string? _notice;
    private string? _reopening;
    private bool _confirmingStart;
    private bool _busy;

    private Guid? _shownId;

    [Parameter]
    public Guid Id { get; set; }

    [Inject]
    private EvaluationService Evaluations { get; set; } = default!;

    [Inject]
    private EvaluationLifecycleService Lifecycle { get; set; } = default!;

    [Inject]
    private ScoringBoardService Progress { get; set; } = default!;

    [Inject]
    private ModerationService Moderation { get; set; } = default!;

    [Inject]
    private ILogger<BoardPage> Log { get; set; } = default!;

    private bool Facilitates => _detail?.Summary.MyRoles.Contains(PanelRole.Facilitator) == true;

    protected override async Task OnParametersSetAsync()
    {
        // The layout may hand the same parameters again (a sign-in check, a re-render above): keep what is on screen.
        if (Id == _shownId)
        {
            return;
        }

        _shownId = Id;
        _notice = null;
        _actionProblem = null;
        await LoadAsync();
    }

    private async Task LoadAsync()
    {
        (_detail, _problem) = await Attempt.RunAsync(() => Evaluations.GetAsync(Id), Log, "reading an evaluation");
        if (_detail is null)
        {
            return;
        }

        (_board, _problem) = await Attempt.RunAsync(() => Progress.GetAsync(Id), Log, "reading the scoring board");
        _spreads = null;
        _spreadProblem = null;
        if (_detail.Dates.ModerationStartedAt is not null)
        {
            (_spreads, _spreadProblem) = await Attempt.RunAsync(() => Moderation.GetAsync(Id), Log, "reading the moderation board");
        }
    }

    private IReadOnlyList<string> BidderOrder => _detail?.Bids?.Select(a => a.Code).ToArray() ?? [];

    /// <summary>The plan's criteria in order, read from the plan the reader sees.</summary>
    private IReadOnlyList<string> CriterionOrder =>
        _detail?.Plan is { } plan && plan.TryGetProperty("criteria", out var criteria) && criteria.ValueKind == System.Text.Json.JsonValueKind.Array
            ? criteria.EnumerateArray().Where(c => c.TryGetProperty("id", out var id) && id.ValueKind == System.Text.Json.JsonValueKind.String)
                .Select(c => c.GetProperty("id").GetString()!).ToArray()
            : [];

    private string NameOf(string code) => _board?.Assessors.FirstOrDefault(a => a.AssessorCode == code)?.Name ?? code;

    private void AskReopen(string code)
    {
        _reopening = code;
        _reasonProblem = null;
        _actionProblem = null;
        _notice = null;
        _confirmingStart = false;
    }

    private async Task ReopenAsync(string reason)
    {
        var code = _reopening!;
        _busy = true;
        var (state, problem) = await Attempt.RunAsync(() => Moderation.ReopenSheetAsync(Id, code, new ReopenSheetRequest(reason)), Log, "reopening a sheet");
        _busy = false;
        if (state is null)
        {
            _reasonProblem = problem?.For("reason");
            _actionProblem = _reasonProblem is null ? problem : null;
            return;
        }

        _reopening = null;
        await LoadAsync();
        _notice = $"The sheet of {code} is open again. {code} can change their ratings and must submit the sheet again.";
    }

    private async Task StartModerationAsync()
    {
        _busy = true;
        _actionProblem = null;
        var version = _detail!.Summary.Version;
        var (result, problem) = await Attempt.RunAsync(() => Lifecycle.StartModerationAsync(Id, new TransitionRequest(version)), Log, "starting moderation");
        _busy = false;
        if (result is null)
        {
            _actionProblem = problem;

            // A stale view (someone else changed the evaluation) or a sheet reopened meanwhile: show what holds now.
            await LoadAsync();
            return;
        }

        _confirmingStart = false;
        await LoadAsync();
        _notice = "Moderation has started. The sheets are locked and the panel can see the results."
                  + (result.Warnings.Count > 0 ? " " + string.Join(" ", result.Warnings) : "");
    }
}
