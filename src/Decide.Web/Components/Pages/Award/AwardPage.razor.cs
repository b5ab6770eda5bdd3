using Decide.Core.Award;
using Decide.Data.Entities;
using Decide.Interchange;
using Decide.Interchange.Results;
using Decide.Web.Components.Shared;
using Decide.Web.Features.Award;
using Decide.Web.Features.Evaluations;
using Microsoft.AspNetCore.Components;

namespace Decide.Web.Components.Pages.Award;

/// <summary>
/// The published points award, from the same award service as the API: the method as published, the table each
/// bidder can recompute, the reviews of abnormally low prices (recorded here by the facilitator), the award's
/// robustness and, in a two-stage evaluation, the step that closes quality and opens the prices.
/// </summary>
public partial class AwardPage
{
    private AwardView? _view;
    private ProblemText? _problem;
    private ProblemText? _actionProblem;
    private IReadOnlyList<string> _warnings = [];
    private bool _confirmingOpen;
    private bool _busy;

    [Parameter]
    public Guid Id { get; set; }

    [Inject]
    private AwardService Award { get; set; } = default!;

    [Inject]
    private EvaluationLifecycleService Lifecycle { get; set; } = default!;

    [Inject]
    private ILogger<AwardPage> Log { get; set; } = default!;

    private bool Facilitates => _view?.Summary.MyRoles.Contains(PanelRole.Facilitator) == true;

    private bool Signed => _view?.Summary.Stage is EvaluationStage.SignedOff or EvaluationStage.Superseded;

    private BindingResult Binding => FormatWords.Parse(FormatWords.Bindings, _view?.Award.Binding, BindingResult.Points);

    private PriceFormulaInfo Formula => PriceFormulas.Describe(FormatWords.Parse(FormatWords.PriceFormulas, _view?.Award.Formula.Formula, PriceFormula.LowestPriceRatio));

    private IReadOnlyList<TieBreak> TieBreaks =>
        _view?.Award.TieBreaks.Select(t => FormatWords.Parse(FormatWords.TieBreaks, t, TieBreak.EarlierSubmission)).ToArray() ?? [];

    protected override async Task OnParametersSetAsync()
    {
        if (!RendererInfo.IsInteractive)
        {
            return;
        }

        (_view, _problem) = await Attempt.RunAsync(() => Award.GetAsync(Id), Log, "reading the award");
    }

    private async Task OpenPricesAsync()
    {
        _busy = true;
        (var result, _actionProblem) = await Attempt.RunAsync(
            () => Lifecycle.OpenPricesAsync(Id, new TransitionRequest(_view!.Summary.Version)), Log, "opening the prices");
        _busy = false;
        if (result is not null)
        {
            _confirmingOpen = false;
            _warnings = result.Warnings;
            (_view, _problem) = await Attempt.RunAsync(() => Award.GetAsync(Id), Log, "reading the award");
        }
    }

    private async Task<ProblemText?> SaveReviewAsync(string bid, LowPriceReviewRequest request)
    {
        var (view, problem) = await Attempt.RunAsync(() => Award.ReviewAsync(Id, bid, request), Log, "recording the review of a price");
        if (view is not null)
        {
            _view = view;
            StateHasChanged();
        }

        return problem;
    }

    private static string TieBreakWords(string word) => AwardText.Name(FormatWords.Parse(FormatWords.TieBreaks, word, TieBreak.EarlierSubmission));

    private string Name(string bid) => _view?.Award.Bids.FirstOrDefault(b => b.Alternative == bid)?.Name ?? bid;

    private static string CellTitle(AwardCellEntry cell) =>
        $"Assessors' terms: {string.Join(", ", cell.Terms)}" + (cell.Term is { } agreed ? $"; moderated to {agreed}" : "");

    private static string Points(double value) => TradeWords.Number(value, 2);

    private static string Score(double value) => TradeWords.Number(value, 2);
}
