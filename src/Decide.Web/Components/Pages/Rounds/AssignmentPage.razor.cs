using Decide.Data.Entities;
using Decide.Web.Components.Shared;
using Decide.Web.Features.Rounds;
using Microsoft.AspNetCore.Components;

namespace Decide.Web.Components.Pages.Rounds;

/// <summary>
/// Who reads which application in a round, from the same assignment service as the API: Decide's proposal with its
/// figures, what stops it from being frozen, and each reviewer's list, which the facilitator can change until scoring
/// opens.
/// </summary>
public partial class AssignmentPage
{
    private AssignmentView? _view;
    private ProblemText? _problem;
    private ProblemText? _actionProblem;
    private string? _editing;
    private IReadOnlyCollection<string> _chosen = [];
    private bool _busy;
    private ulong _seed = 1;

    [Parameter]
    public Guid Id { get; set; }

    [Inject]
    private AssignmentService Assignment { get; set; } = default!;

    [Inject]
    private ILogger<AssignmentPage> Log { get; set; } = default!;

    /// <summary>The applications as a collection the virtualised table can page through.</summary>
    private ICollection<ApplicationReadersView> Applications
    {
        get
        {
            if (!ReferenceEquals(_applicationsOf, _view))
            {
                (_applicationsOf, _applications) = (_view, _view?.Applications.ToArray() ?? []);
            }

            return _applications;
        }
    }

    private AssignmentView? _applicationsOf;
    private ApplicationReadersView[] _applications = [];

    private bool Facilitates => _view?.Evaluation.MyRoles.Contains(PanelRole.Facilitator) == true;

    protected override async Task OnParametersSetAsync()
    {
        if (!RendererInfo.IsInteractive)
        {
            return;
        }

        (_view, _problem) = await Attempt.RunAsync(() => Assignment.GetAsync(Id), Log, "reading the assignment");
    }

    private async Task ProposeAsync()
    {
        _busy = true;
        _editing = null;
        var seed = _view?.Figures is null ? 1 : ++_seed;
        (var view, _actionProblem) = await Attempt.RunAsync(() => Assignment.ProposeAsync(Id, new ProposeAssignmentRequest(seed)), Log, "proposing an assignment");
        _view = view ?? _view;
        _busy = false;
    }

    private void Edit(ReviewerLoadView reviewer)
    {
        _editing = reviewer.Code;
        _chosen = reviewer.Applications.ToArray();
        _actionProblem = null;
    }

    private async Task SaveAsync(string reviewer)
    {
        _busy = true;
        var order = _view!.Applications.Select((a, i) => (a.Code, i)).ToDictionary(x => x.Code, x => x.i);
        var chosen = _chosen.OrderBy(c => order.GetValueOrDefault(c, int.MaxValue)).ToArray();
        (var view, _actionProblem) = await Attempt.RunAsync(
            () => Assignment.SetAsync(Id, reviewer, new ReviewerApplicationsRequest(chosen)), Log, "changing a reviewer's applications");
        if (view is not null)
        {
            _view = view;
            _editing = null;
        }

        _busy = false;
    }

    /// <summary>The applications a reviewer may be given: all but those they declared a conflict with.</summary>
    private IEnumerable<ApplicationReadersView> Choices(ReviewerLoadView reviewer) =>
        _view!.Applications.Where(a => !reviewer.Conflicts.Contains(a.Code));

    private string NameOf(string code) => _view?.Applications.FirstOrDefault(a => a.Code == code)?.Name ?? code;

    private string ReviewerName(string code) => _view?.Reviewers.FirstOrDefault(r => r.Code == code)?.Name ?? code;
}
