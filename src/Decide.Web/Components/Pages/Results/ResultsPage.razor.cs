using Decide.Core.Robustness;
using Decide.Web.Components.Shared;
using Microsoft.AspNetCore.Components;

namespace Decide.Web.Components.Pages.Results;

/// <summary>
/// The results of an evaluation in moderation or later, straight from the engine: the ranking first, then the
/// robustness checks, computed on a worker thread while a progress bar shows. Nothing runs while the screen is
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
    private ResultsCalculator Calculator { get; set; } = default!;

    [Inject]
    private ILogger<ResultsPage> Log { get; set; } = default!;

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
        (_reading, _problem) = await Attempt.RunAsync(() => Calculator.RankAsync(Id, ct), Log, "ranking an evaluation");
        if (_reading is null)
        {
            return;
        }

        StateHasChanged();
        (_robustness, _robustnessProblem) = await Attempt.RunAsync(() => Calculator.CheckRobustnessAsync(_reading, ct), Log, "checking robustness");
    }

    public void Dispose()
    {
        _closing.Cancel();
        _closing.Dispose();
    }
}
