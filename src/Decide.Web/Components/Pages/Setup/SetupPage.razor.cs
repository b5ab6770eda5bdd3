using System.Text.Json;
using Decide.Core.Model;
using Decide.Data.Entities;
using Decide.Web.Components.Shared;
using Decide.Web.Features.Evaluations;
using Microsoft.AspNetCore.Components;

namespace Decide.Web.Components.Pages.Setup;

/// <summary>
/// The facilitator prepares the evaluation in steps — purpose, criteria, scales, bids, panel, method — and locks the
/// plan; once locked, registers the last bids and opens scoring. Each step saves through <see cref="EvaluationService"/>
/// on top of the version it read; a change made meanwhile by someone else is reported and the screen reloads.
/// </summary>
public partial class SetupPage
{
    private static readonly string[] Steps = ["Purpose", "Criteria", "Scales", "Bids", "Panel", "Method", "Review and lock"];

    private const int BidsStep = 3, PanelStep = 4, ReviewStepIndex = 6;

    private EvaluationDetail? _detail;
    private SetupView? _setup;
    private PlanDraft? _draft;
    private List<SeatDraft> _seats = [];
    private List<BidDraft> _bids = [];
    private string _savedPlan = "", _savedSeats = "", _savedBids = "";
    private ProblemText? _loadProblem, _problem;
    private IReadOnlyList<string> _lockWarnings = [];
    private int _step;
    private bool _busy, _confirmLock, _confirmOpen, _changedElsewhere;
    private string _status = "";

    [Parameter]
    public Guid Id { get; set; }

    [Inject]
    private EvaluationService Evaluations { get; set; } = default!;

    [Inject]
    private EvaluationLifecycleService Lifecycle { get; set; } = default!;

    [Inject]
    private ILogger<SetupPage> Log { get; set; } = default!;

    private bool Facilitates => _detail?.Summary.MyRoles.Contains(PanelRole.Facilitator) == true;

    private bool PlanEditable => Facilitates && _detail!.Summary.Stage == EvaluationStage.Setup;

    private bool BidsEditable => Facilitates && _detail!.Summary.Stage is EvaluationStage.Setup or EvaluationStage.PlanLocked;

    private string Noun => string.IsNullOrWhiteSpace(_draft?.Noun) ? "bids" : _draft.Noun.Trim();

    private bool PlanUnsaved => _draft is not null && _draft.ToJson() != _savedPlan;

    private bool PanelUnsaved => SeatsJson() != _savedSeats;

    private bool BidsUnsaved => BidsJson() != _savedBids;

    private bool Unsaved => PlanUnsaved || PanelUnsaved || BidsUnsaved;

    private IReadOnlyList<(string Id, string Name)> Rated =>
        _draft!.Criteria.Where(c => c.Kind == CriterionKind.Linguistic && c.Id.Length > 0).Select(c => (c.Id, c.Name)).ToArray();

    private string Lead => _detail!.Summary.Stage switch
    {
        EvaluationStage.Setup when Facilitates => _draft?.Weighting == Decide.Core.Model.WeightingMethod.Points
            ? "Prepare the evaluation step by step; each step is saved on its own. The weights are the points you publish, so nobody weighs: when the plan is complete, lock it, and the methodology for the tender pack is fixed with it."
            : "Prepare the evaluation step by step; each step is saved on its own. When the plan is complete and the assessors have submitted their weights, lock it.",
        EvaluationStage.Setup => "The facilitator prepares the plan here.",
        EvaluationStage.PlanLocked => "The plan is locked and shown read-only. Register the remaining bids, then open scoring.",
        _ => "The plan is locked and scoring has opened: everything here is read-only.",
    };

    protected override async Task OnParametersSetAsync() => await LoadAsync();

    private async Task LoadAsync()
    {
        (_detail, _loadProblem) = await Attempt.RunAsync(() => Evaluations.GetAsync(Id), Log, "reading an evaluation for setup");
        if (_detail is null)
        {
            return;
        }

        if (Facilitates)
        {
            ProblemText? setupProblem;
            (_setup, setupProblem) = await Attempt.RunAsync(() => Evaluations.GetSetupAsync(Id), Log, "reading the setup view");
            _loadProblem = setupProblem;
        }
        else
        {
            _loadProblem = new ProblemText("Only the facilitator prepares the plan",
                "This screen belongs to the evaluation's facilitator. The overview shows the plan to everyone who may read it.", new Dictionary<string, string[]>());
            return;
        }

        _draft = _detail.Plan is { } plan ? PlanDraft.From(plan, _detail.Settings) : null;
        _seats = (_setup?.Seats ?? []).Select(s =>
        {
            var seat = new SeatDraft { Email = s.Email, Role = s.Role, AssessorCode = s.AssessorCode, Weight = s.Weight ?? 1, Topics = string.Join(", ", s.Topics ?? []) };
            seat.Criteria.UnionWith(s.Criteria ?? []);
            return seat;
        }).ToList();
        _bids = (_detail.Bids ?? []).Select(a => new BidDraft { Code = a.Code, Name = a.Name, Requested = a.Requested, Topic = a.Topic }).ToList();
        Snapshot();
        if (_detail.Summary.Stage != EvaluationStage.Setup && _step == 0 && !_changedElsewhere)
        {
            _step = _detail.Summary.Stage == EvaluationStage.PlanLocked ? ReviewStepIndex : 0;
        }
    }

    private void Snapshot()
    {
        _savedPlan = _draft?.ToJson() ?? "";
        _savedSeats = SeatsJson();
        _savedBids = BidsJson();
    }

    private string SeatsJson() => JsonSerializer.Serialize(_seats.Select(s => new { s.Email, s.Role, s.AssessorCode, s.Weight, Criteria = s.Criteria.Order().ToArray(), s.Topics }));

    private string BidsJson() => JsonSerializer.Serialize(_bids.Select(b => new { b.Code, b.Name, b.Requested, b.Topic }));

    private void Go(int step)
    {
        _step = step;
        _problem = null;
        _status = "";
        _confirmLock = false;
        _confirmOpen = false;
    }

    private string StepState(int step) => step switch
    {
        1 => $"{_draft!.Criteria.Count} criteria",
        BidsStep => $"{_bids.Count} {Noun}" + (BidsUnsaved ? " · not saved" : ""),
        PanelStep => $"{_seats.Count(s => s.Role == PanelRole.Assessor)} assessor(s)" + (PanelUnsaved ? " · not saved" : ""),
        ReviewStepIndex => TradeWords.Stage(_detail!.Summary.Stage),
        _ => "",
    };

    private bool CanSave(int step) => step switch
    {
        BidsStep => BidsEditable,
        _ => PlanEditable,
    };

    private async Task SaveAsync(bool advance)
    {
        _problem = null;
        _changedElsewhere = false;
        var saved = _step switch
        {
            BidsStep => await SaveBidsAsync(),
            PanelStep => await SavePanelAsync(),
            _ => await SavePlanAsync(),
        };
        if (saved && advance)
        {
            var status = _status;
            Go(_step + 1);
            _status = status;
        }
    }

    private async Task<bool> SavePlanAsync()
    {
        var draft = _draft!;
        if (draft.Criteria.Count == 0)
        {
            // A stored plan needs at least one criterion: what was typed stays on the screen until the first one is added.
            _status = _step == 0
                ? "Kept on this screen: the purpose is saved together with the first criterion (a plan needs at least one)."
                : "Add at least one criterion: a plan cannot be saved without one.";
            return _step == 0;
        }

        draft.AssignIds();
        var result = await RunAsync(() => Evaluations.UpdatePlanAsync(Id, draft.ToRequest(_detail!.Summary.Version)), "saving the plan");
        if (result is null)
        {
            return false;
        }

        draft.MarkStored();
        await AfterSaveAsync(result, "Plan saved.");
        return true;
    }

    private async Task<bool> SavePanelAsync()
    {
        var seats = _seats.Select(s => new SeatRequest(s.Email.Trim(), s.Role, s.Scores ? s.AssessorCode?.Trim() : null,
            s.Role == PanelRole.Assessor ? s.Weight : null, s.Role == PanelRole.Assessor && s.Criteria.Count > 0 ? s.Criteria.Order().ToArray() : null,
            s.Role == PanelRole.Assessor ? s.Topics.Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries) : null)).ToArray();
        var result = await RunAsync(() => Evaluations.UpdatePanelAsync(Id, new UpdatePanelRequest(seats, _detail!.Summary.Version)), "saving the panel");
        if (result is null)
        {
            return false;
        }

        await AfterSaveAsync(result, "Panel saved.");
        return true;
    }

    private async Task<bool> SaveBidsAsync()
    {
        var bids = _bids.Select(b => new BidView(b.Code.Trim(), b.Name.Trim(), b.Requested, string.IsNullOrWhiteSpace(b.Topic) ? null : b.Topic.Trim())).ToArray();
        var result = await RunAsync(() => Evaluations.UpdateBidsAsync(Id, new UpdateBidsRequest(bids, _detail!.Summary.Version)), "saving the bids");
        if (result is null)
        {
            return false;
        }

        await AfterSaveAsync(result, $"List of {Noun} saved.");
        return true;
    }

    /// <summary>An uploaded list was stored: read everything again, so the list shows what the file held.</summary>
    private async Task BidsUploadedAsync(EvaluationSummary summary)
    {
        await LoadAsync();
        _status = $"List of {Noun} taken from the file and saved.";
    }

    /// <summary>Takes the new version; the readiness for the lock is read again, since it depends on what was saved.</summary>
    private async Task AfterSaveAsync(EvaluationSummary summary, string status)
    {
        _detail = _detail! with { Summary = summary };
        (var setup, _) = await Attempt.RunAsync(() => Evaluations.GetSetupAsync(Id), Log, "reading the setup view");
        _setup = setup ?? _setup;
        switch (_step)
        {
            case BidsStep:
                _savedBids = BidsJson();
                break;
            case PanelStep:
                _savedSeats = SeatsJson();
                break;
            default:
                _savedPlan = _draft!.ToJson();
                break;
        }

        _status = status;
    }

    private async Task AskToLockAsync()
    {
        _busy = true;
        (var setup, _problem) = await Attempt.RunAsync(() => Evaluations.GetSetupAsync(Id), Log, "checking the plan before locking");
        _setup = setup ?? _setup;
        _busy = false;
        _confirmLock = _problem is null;
    }

    private async Task LockAsync()
    {
        var result = await RunAsync(() => Lifecycle.LockPlanAsync(Id, new TransitionRequest(_detail!.Summary.Version)), "locking the plan");
        if (result is null)
        {
            return;
        }

        _lockWarnings = result.Warnings;
        _confirmLock = false;
        await LoadAsync();
        _step = ReviewStepIndex;
        _status = "Plan locked.";
    }

    private async Task OpenScoringAsync()
    {
        var result = await RunAsync(() => Lifecycle.OpenScoringAsync(Id, new TransitionRequest(_detail!.Summary.Version)), "opening scoring");
        if (result is null)
        {
            return;
        }

        _confirmOpen = false;
        await LoadAsync();
        _status = "Scoring is open: the assessors can now see the bidders and rate.";
    }

    /// <summary>Runs a change; a refusal is shown, and a change made meanwhile by someone else reloads the screen.</summary>
    private async Task<T?> RunAsync<T>(Func<Task<T>> work, string what) where T : class
    {
        _busy = true;
        _status = "Saving…";
        var (result, problem) = await Attempt.RunAsync(work, Log, what);
        _busy = false;
        _status = "";
        if (problem is not null && problem.Title == ChangedBySomeoneElse)
        {
            _changedElsewhere = true;
            _confirmLock = _confirmOpen = false;
            await LoadAsync();
            return null;
        }

        _problem = problem;
        if (problem is not null)
        {
            _status = "Not saved: see what to fix above.";
        }

        return result;
    }

    /// <summary>The title of the service's refusal when the evaluation changed since it was read (409).</summary>
    private const string ChangedBySomeoneElse = "Changed by someone else";
}
