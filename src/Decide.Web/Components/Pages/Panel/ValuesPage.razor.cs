using Decide.Data.Entities;
using Decide.Web.Components.Shared;
using Decide.Web.Features.Evaluations;
using Decide.Web.Features.Inputs;
using Decide.Web.Infrastructure;
using Microsoft.AspNetCore.Components;

namespace Decide.Web.Components.Pages.Panel;

/// <summary>
/// The measured values (the price evaluator's, during scoring) and the gate results (the facilitator's, from the
/// plan's lock to the end of scoring) as small tables saved cell by cell; read-only otherwise, saying why.
/// </summary>
public partial class ValuesPage
{
    private EvaluationDetail? _detail;
    private ValuesView? _values;
    private GatesView? _gates;
    private ProblemText? _problem;
    private ProblemText? _valuesProblem;
    private ProblemText? _gatesProblem;
    private ProblemText? _conflict;
    private bool _loaded;
    private readonly Dictionary<string, SaveState> _states = new(StringComparer.Ordinal);
    private readonly Dictionary<string, string> _refusals = new(StringComparer.Ordinal);

    private Guid? _shownId;

    [Parameter]
    public Guid Id { get; set; }

    [Inject]
    private EvaluationService Evaluations { get; set; } = default!;

    [Inject]
    private NumericValueService Values { get; set; } = default!;

    [Inject]
    private GateService Gates { get; set; } = default!;

    [Inject]
    private ILogger<ValuesPage> Log { get; set; } = default!;

    private bool Has(PanelRole role) => _detail?.Summary.MyRoles.Contains(role) == true;

    private string StageName => TradeWords.Stage(_detail!.Summary.Stage);

    private string? ValuesReadOnlyReason => _values is null || _values.Editable
        ? null
        : !Has(PanelRole.PriceEvaluator)
            ? "The price evaluator enters these values; you can read them here."
            : $"Values are entered during scoring; this evaluation is at stage {StageName}, so they are read-only.";

    private string? GatesReadOnlyReason => _gates is null || _gates.Editable
        ? null
        : !Has(PanelRole.Facilitator)
            ? "The facilitator records the gate results; you can read them here."
            : $"Gate results are recorded from the plan's lock until scoring closes; this evaluation is at stage {StageName}, so they are read-only.";

    protected override async Task OnParametersSetAsync()
    {
        // The layout may hand the same parameters again (a sign-in check, a re-render above): keep what is on screen.
        if (Id == _shownId)
        {
            return;
        }

        _shownId = Id;
        _loaded = false;
        _states.Clear();
        _refusals.Clear();
        _conflict = null;
        (_detail, _problem) = await Attempt.RunAsync(() => Evaluations.GetAsync(Id), Log, "reading an evaluation");
        if (_detail is null)
        {
            return;
        }

        await ReloadAsync();
        _loaded = true;
    }

    private async Task ReloadAsync()
    {
        (_values, _valuesProblem) = await Attempt.RunAsync(() => Values.GetAsync(Id), Log, "reading numeric values");
        (_gates, _gatesProblem) = await Attempt.RunAsync(() => Gates.GetAsync(Id), Log, "reading gate results");
    }

    private async Task SaveValueAsync((ValueCell Cell, double? Value, string Text) edit)
    {
        var key = $"{edit.Cell.Alternative}/{edit.Cell.Criterion}";
        await SaveAsync(key, () => Values.SaveAsync(Id, edit.Cell.Alternative, edit.Cell.Criterion, new ValueRequest(edit.Value, edit.Cell.Version)),
            saved => _values = _values! with { Cells = Replace(_values.Cells, saved, c => c.Alternative == saved.Alternative && c.Criterion == saved.Criterion) },
            "saving a numeric value", problem => problem.For("value"));
    }

    private async Task SaveGateAsync((GateCell Cell, GateRequest Request) edit)
    {
        var key = $"{edit.Cell.Alternative}/{edit.Cell.Criterion}";
        await SaveAsync(key, () => Gates.SaveAsync(Id, edit.Cell.Alternative, edit.Cell.Criterion, edit.Request),
            saved => _gates = _gates! with { Cells = Replace(_gates.Cells, saved, c => c.Alternative == saved.Alternative && c.Criterion == saved.Criterion) },
            "saving a gate result", problem => problem.For("note") ?? problem.For("passed"));
    }

    /// <summary>
    /// Saves one cell and shows its state. Someone else's change in between reloads the tables (their value shows)
    /// and says so; other refusals stay beside the cell.
    /// </summary>
    private async Task SaveAsync<T>(string key, Func<Task<T>> save, Action<T> apply, string what, Func<ProblemText, string?> fieldReason)
        where T : class
    {
        _conflict = null;
        _states[key] = SaveState.Saving;
        StateHasChanged();
        var conflict = false;
        var (saved, problem) = await Attempt.RunAsync(async () =>
        {
            try
            {
                return await save();
            }
            catch (DomainProblem p) when (p.Extensions.ContainsKey("current"))
            {
                conflict = true;
                throw;
            }
        }, Log, what);

        if (saved is not null)
        {
            apply(saved);
            _states[key] = SaveState.Saved;
            return;
        }

        if (conflict)
        {
            await ReloadAsync();
            _states[key] = SaveState.Refused;
            _refusals[key] = "someone else changed it first; the value shown is theirs";
            _conflict = problem! with
            {
                Detail = "Someone else saved this cell after you opened the screen, so your change was not saved. The tables now show what is stored: check it, and enter your change again if it still applies.",
            };
            return;
        }

        _states[key] = SaveState.Refused;
        _refusals[key] = fieldReason(problem!) ?? problem!.OneLine;
    }

    private static IReadOnlyList<T> Replace<T>(IReadOnlyList<T> cells, T saved, Func<T, bool> same)
    {
        var list = cells.ToList();
        var i = list.FindIndex(c => same(c));
        if (i >= 0)
        {
            list[i] = saved;
        }
        else
        {
            list.Add(saved);
        }

        return list;
    }
}
