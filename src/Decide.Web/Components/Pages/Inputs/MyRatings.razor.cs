using Decide.Data.Entities;
using Decide.Web.Components.Shared;
using Decide.Web.Features.Evaluations;
using Decide.Web.Features.Inputs;
using Decide.Web.Infrastructure;
using Microsoft.AspNetCore.Components;

namespace Decide.Web.Components.Pages.Inputs;

/// <summary>The assessor's rating sheet: the grid of their bids × criteria, saved cell by cell, and its submission.</summary>
public partial class MyRatings
{
    private EvaluationSummary? _summary;
    private RatingSheetView? _sheet;
    private ProblemText? _problem;
    private bool _needsDeclaration;

    [Parameter]
    public Guid Id { get; set; }

    [Inject]
    private EvaluationService Evaluations { get; set; } = default!;

    [Inject]
    private RatingSheetService Sheets { get; set; } = default!;

    [Inject]
    private ILogger<MyRatings> Log { get; set; } = default!;

    protected override async Task OnParametersSetAsync()
    {
        _sheet = null;
        _needsDeclaration = false;
        EvaluationDetail? detail;
        (detail, _problem) = await Attempt.RunAsync(() => Evaluations.GetAsync(Id), Log, "reading an evaluation");
        _summary = detail?.Summary;
        if (_summary is null)
        {
            return;
        }

        try
        {
            _sheet = await Sheets.GetAsync(Id);
        }
        catch (DomainProblem p) when (p.Status == StatusCodes.Status403Forbidden && _summary.MyRoles.Contains(PanelRole.Assessor))
        {
            // The sheet stays hidden until the declaration is signed and confirmed against the bidders' names.
            _problem = new ProblemText("Your declaration comes first",
                "The bidders and your rating sheet are shown once you have signed the declaration and confirmed it against the bidders' names.",
                new Dictionary<string, string[]>());
            _needsDeclaration = true;
        }
        catch (Exception e) when (ProblemText.From(e) is { } problem)
        {
            _problem = problem;
        }
    }

    private async Task<CellSaveResult> SaveAsync(SheetCell cell, RatingRequest request)
    {
        try
        {
            return CellSaveResult.Ok(await Sheets.SaveAsync(Id, cell.Alternative, cell.Criterion, request));
        }
        catch (DomainProblem p) when (p.Extensions.TryGetValue("current", out var current) && current is SheetCell stored)
        {
            return CellSaveResult.Stale(stored);
        }
        catch (Exception e) when (e is not OperationCanceledException)
        {
            if (ProblemText.From(e) is { } problem)
            {
                return CellSaveResult.Refused(problem);
            }

            Log.LogError(e, "Failed while saving a rating");
            return CellSaveResult.Refused(ProblemText.Unexpected);
        }
    }

    private async Task<ProblemText?> SubmitAsync()
    {
        var (submitted, problem) = await Attempt.RunAsync(() => Sheets.SubmitAsync(Id), Log, "submitting a rating sheet");
        if (submitted is not null)
        {
            _sheet = submitted;
            StateHasChanged();
        }

        return problem;
    }
}
