using Decide.Data.Entities;
using Decide.Web.Components.Shared;
using Decide.Web.Features.Evaluations;
using Decide.Web.Features.Inputs;
using Decide.Web.Infrastructure;
using Microsoft.AspNetCore.Components;

namespace Decide.Web.Components.Pages.Inputs;

/// <summary>The assessor's weight judgements: importance terms or pairwise comparisons as the plan weighs, saved at each change, then submitted.</summary>
public partial class MyWeights
{
    private EvaluationSummary? _summary;
    private WeightsView? _view;
    private ProblemText? _problem;
    private bool _needsDeclaration;
    private bool _confirming;
    private bool _busy;

    [Parameter]
    public Guid Id { get; set; }

    [Inject]
    private EvaluationService Evaluations { get; set; } = default!;

    [Inject]
    private WeightsService Weights { get; set; } = default!;

    [Inject]
    private ILogger<MyWeights> Log { get; set; } = default!;

    private bool ReadOnly => _view is null || !_view.Editable || _view.SubmittedAt is not null;

    protected override async Task OnParametersSetAsync()
    {
        _view = null;
        _needsDeclaration = false;
        EvaluationDetail? detail;
        (detail, _problem) = await Attempt.RunAsync(() => Evaluations.GetAsync(Id), Log, "reading an evaluation");
        _summary = detail?.Summary;
        if (_summary is null)
        {
            return;
        }

        (_view, _problem) = await Attempt.RunAsync(() => Weights.GetAsync(Id), Log, "reading weight judgements");
        _needsDeclaration = _problem is { Title: "Not allowed" } && _summary.MyRoles.Contains(PanelRole.Assessor);
    }

    private async Task<WeightsSaveResult> SaveAsync(WeightsRequest request)
    {
        _problem = null;
        try
        {
            _view = await Weights.PutAsync(Id, request);
            StateHasChanged();
            return WeightsSaveResult.Ok(_view);
        }
        catch (DomainProblem p) when (p.Extensions.TryGetValue("current", out var current) && current is WeightsView stored)
        {
            _view = stored;
            StateHasChanged();
            return WeightsSaveResult.Stale(stored);
        }
        catch (Exception e) when (e is not OperationCanceledException)
        {
            if (ProblemText.From(e) is { } problem)
            {
                return WeightsSaveResult.Refused(problem);
            }

            Log.LogError(e, "Failed while saving weight judgements");
            return WeightsSaveResult.Refused(ProblemText.Unexpected);
        }
    }

    private async Task SubmitAsync()
    {
        _busy = true;
        try
        {
            WeightsSubmitted? submitted;
            (submitted, _problem) = await Attempt.RunAsync(() => Weights.SubmitAsync(Id), Log, "submitting weight judgements");
            if (submitted is not null)
            {
                _view = submitted.Weights;
                _confirming = false;
            }
        }
        finally
        {
            _busy = false;
        }
    }
}
