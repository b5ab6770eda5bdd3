using Decide.Core.Robustness;
using Decide.Web.Components.Shared;
using Decide.Web.Features.Results;
using Microsoft.AspNetCore.Components;

namespace Decide.Web.Components.Pages.Results;

/// <summary>
/// The results of an evaluation in moderation or later, from the same results service as the API: the ranking
/// first, then the robustness checks, computed on a worker thread while a progress bar shows. Nothing runs while the screen is
/// prerendered: the engine runs once, when the screen is live.
/// </summary>
public partial class ResultsPage : IDisposable
{
    private readonly CancellationTokenSource _closing = new();
    private ResultsReading? _reading;
    private RobustnessResult? _robustness;
    private ProblemText? _problem;
    private ProblemText? _robustnessProblem;

    [Parameter]
    public Guid Id { get; set; }

    [Inject]
    private ResultsService Results { get; set; } = default!;

    [Inject]
    private ILogger<ResultsPage> Log { get; set; } = default!;

    /// <summary>A round's bands, funding line and flips, once robustness is known; null when the evaluation is not a round.</summary>
    private Decide.Core.Rounds.RoundReport? Round =>
        _reading is null || _robustness is null ? null : _round ??= Decide.Core.Rounds.RoundAnalysis.Of(_reading.Prepared, _reading.Analysis, _reading.Prepared.Award, _robustness);

    private Decide.Core.Rounds.RoundReport? _round;

    private IReadOnlyList<string> Order => _reading?.Analysis.Ranking.Select(r => r.Alternative).ToArray() ?? [];

    protected override async Task OnParametersSetAsync()
    {
        if (!RendererInfo.IsInteractive)
        {
            return;
        }

        var ct = _closing.Token;
        _robustness = null;
        _robustnessProblem = null;
        _round = null;
        RankedEvaluation? ranked;
        (ranked, _problem) = await Attempt.RunAsync(() => Results.RankAsync(Id, ct), Log, "ranking an evaluation");
        _reading = ranked is null ? null : ResultsReading.Of(ranked);
        if (ranked is null)
        {
            return;
        }

        StateHasChanged();
        (_robustness, _robustnessProblem) = await Attempt.RunAsync(
            () => ResultsService.CheckRobustnessAsync(ranked, new RobustnessOptions(), ct), Log, "checking robustness");
    }

    public void Dispose()
    {
        _closing.Cancel();
        _closing.Dispose();
    }
}
