using Decide.Web.Components.Shared;
using Decide.Web.Features.Inputs;
using Microsoft.AspNetCore.Components;
using Microsoft.AspNetCore.Components.Web;
using Microsoft.JSInterop;

namespace Decide.Web.Components.Pages.Inputs;

/// <summary>
/// An assessor's rating sheet as a grid of bids × criteria, worked from the keyboard: the arrow keys move the
/// focused cell, a term's code (or its digit) rates it, Enter opens the rationale, Escape returns to the grid. Every
/// cell saves itself (when its term changes, a pause in typing, leaving the rationale) through
/// <see cref="OnSave"/> with the version it was read at; a cell saved elsewhere meanwhile shows what is stored and
/// keeps the assessor's change aside instead of overwriting it. Holds no service: the screen passes the callbacks.
/// </summary>
public partial class RatingGrid : IAsyncDisposable
{
    private readonly Dictionary<string, CancellationTokenSource> _timers = new(StringComparer.Ordinal);
    private readonly Dictionary<string, SaveQueue> _queues = new(StringComparer.Ordinal);
    private RatingSheetView? _shown;
    private Dictionary<string, CellDraft> _drafts = new(StringComparer.Ordinal);
    private GridKeyboard _keys = new(0, 0, [], _ => false);
    private ElementReference[] _cellRefs = [];
    private ElementReference _editorRef;
    private ElementReference _gridRef;
    private IJSObjectReference? _module;
    private bool _focusCell;
    private bool _focusEditor;
    private bool _gridWired;
    private CellDraft? _editing;
    private bool _declining;
    private bool _checked;
    private bool _fullRationales;
    private bool _confirming;
    private bool _submitting;
    private ProblemText? _submitProblem;

    /// <summary>The sheet as the service returned it.</summary>
    [Parameter, EditorRequired]
    public RatingSheetView Sheet { get; set; } = default!;

    /// <summary>Stores one cell: the cell as last stored (its place and version) and what to store.</summary>
    [Parameter, EditorRequired]
    public Func<SheetCell, RatingRequest, Task<CellSaveResult>> OnSave { get; set; } = default!;

    /// <summary>Submits the sheet; a refusal comes back to be shown, null when it was submitted.</summary>
    [Parameter, EditorRequired]
    public Func<Task<ProblemText?>> OnSubmit { get; set; } = default!;

    /// <summary>The pause in typing a rationale after which it is saved; zero saves only on leaving the rationale.</summary>
    [Parameter]
    public TimeSpan AutosaveDelay { get; set; } = TimeSpan.FromSeconds(1.5);

    [Inject]
    private IJSRuntime JS { get; set; } = default!;

    private bool Editable => Sheet.Editable;

    private IReadOnlyList<SheetBidder> Bidders => Sheet.Bidders;

    private IReadOnlyList<SheetCriterion> Criteria => Sheet.Criteria;

    /// <summary>Done and total over the cells that must be done, as stored.</summary>
    private (int Done, int Total) Progress => (_drafts.Values.Count(d => d.Required && d.Done), _drafts.Values.Count(d => d.Required));

    protected override void OnParametersSet()
    {
        if (ReferenceEquals(_shown, Sheet))
        {
            return;
        }

        _shown = Sheet;
        _drafts = Sheet.Cells.ToDictionary(c => Key(c.Alternative, c.Criterion), c => new CellDraft(c, Sheet.MinRationaleLength), StringComparer.Ordinal);
        _keys = new GridKeyboard(Bidders.Count, Criteria.Count, Sheet.Scale.Select(t => t.Code).ToArray(), Rateable);
        _cellRefs = new ElementReference[Bidders.Count * Criteria.Count];
        _editing = null;
        _checked = false;
        _confirming = false;
    }

    protected override async Task OnAfterRenderAsync(bool firstRender)
    {
        if (Editable && !_gridWired && _keys.HasFocus)
        {
            _gridWired = true;
            await KeepArrowKeysInGridAsync();
        }

        if (_focusEditor)
        {
            _focusEditor = false;
            await FocusAsync(_editorRef);
        }
        else if (_focusCell && _keys.HasFocus)
        {
            _focusCell = false;
            await FocusAsync(_cellRefs[_keys.Row * Criteria.Count + _keys.Column]);
        }
    }

    private bool Rateable(int row) => row >= 0 && row < Bidders.Count && NotRateableReason(Bidders[row]) is null;

    /// <summary>Why a bid is not rated on this sheet, or null when it is.</summary>
    private static string? NotRateableReason(SheetBidder b) =>
        b.Recused ? "Not rated by you: you declared a conflict of interest with this bidder."
        : b.FailedGates.Count > 0 ? $"Not rated: the bid failed the pass/fail gate {string.Join(", ", b.FailedGates)}."
        : null;

    private static string Key(string alternative, string criterion) => alternative + "\u001f" + criterion;

    private CellDraft Draft(int row, int column) => _drafts[Key(Bidders[row].Code, Criteria[column].Id)];

    private bool IsFocused(int row, int column) => _keys.Row == row && _keys.Column == column;

    private ScaleTermView? Term(string? code) => code is null ? null : Sheet.Scale.FirstOrDefault(t => t.Code == code);

    private static string? Descriptor(SheetCriterion c, string? code) =>
        code is not null && c.Descriptors.TryGetValue(code, out var said) ? said : null;

    private string TermTitle(SheetCriterion c, ScaleTermView t) =>
        Descriptor(c, t.Code) is { } said ? $"{t.Label}: {said}" : t.Label;

    /// <summary>
    /// A key on a cell acts on the cell the grid has focused, which the browser's focus may not have reached yet
    /// when keys come quickly one after the other (Home then ArrowDown): the grid's own position is the truth.
    /// </summary>
    private async Task OnCellKeyAsync(KeyboardEventArgs e)
    {
        var (row, column) = (_keys.Row, _keys.Column);
        var command = _keys.Press(e.Key, e.CtrlKey || e.AltKey || e.MetaKey);
        switch (command.Kind)
        {
            case GridCommandKind.Moved:
                _focusCell = true;
                break;
            case GridCommandKind.OpenEditor:
                OpenEditor(row, column);
                break;
            case GridCommandKind.SetTerm:
                await SetTermAsync(Draft(row, column), command.Term!);
                break;
        }
    }

    private void OnCellFocus(int row, int column) => _keys.FocusAt(row, column);

    private void OnCellClick(int row, int column)
    {
        _keys.FocusAt(row, column);
        OpenEditor(row, column);
    }

    private void OpenEditor(int row, int column)
    {
        _editing = Draft(row, column);
        _declining = _editing.Declined is not null;
        _focusEditor = true;
    }

    private async Task CloseEditorAsync()
    {
        if (_editing is { } d)
        {
            _editing = null;
            _focusCell = true;
            await SaveNowAsync(d);
        }
    }

    private async Task OnEditorKeyAsync(KeyboardEventArgs e)
    {
        if (e.Key == "Escape")
        {
            await CloseEditorAsync();
        }
    }

    private async Task SetTermAsync(CellDraft d, string code)
    {
        d.Term = code;
        d.Declined = null;
        if (ReferenceEquals(d, _editing))
        {
            _declining = false;
        }

        await SaveNowAsync(d);
    }

    private void OnRationaleInput(CellDraft d, ChangeEventArgs e)
    {
        d.Rationale = e.Value as string ?? "";
        Schedule(d);
    }

    private void OnDeclineInput(CellDraft d, ChangeEventArgs e) => d.Declined = e.Value as string ?? "";

    private void StartDeclining(CellDraft d)
    {
        _declining = true;
        d.Declined ??= "";
    }

    private void StopDeclining(CellDraft d)
    {
        _declining = false;
        d.Declined = null;
        d.Settle();
    }

    private async Task RestoreMineAsync(CellDraft d)
    {
        d.RestoreMine();
        await SaveNowAsync(d);
    }

    /// <summary>Saves after a pause in typing (the pause restarts with every key).</summary>
    private void Schedule(CellDraft d)
    {
        var key = Key(d.Alternative, d.Criterion);
        CancelTimer(key);
        if (d.State is not CellState.Saving)
        {
            d.Settle();
        }

        if (AutosaveDelay <= TimeSpan.Zero)
        {
            return;
        }

        var cts = new CancellationTokenSource();
        _timers[key] = cts;
        _ = SaveLaterAsync(d, cts.Token);
    }

    private async Task SaveLaterAsync(CellDraft d, CancellationToken token)
    {
        try
        {
            await Task.Delay(AutosaveDelay, token);
        }
        catch (OperationCanceledException)
        {
            return;
        }

        await InvokeAsync(() => SaveNowAsync(d));
    }

    private void CancelTimer(string key)
    {
        if (_timers.Remove(key, out var old))
        {
            old.Cancel();
            old.Dispose();
        }
    }

    /// <summary>
    /// Sends the cell now if it has something savable. Each cell has its own <see cref="SaveQueue"/>, as the weighting
    /// components do: one save per cell at a time, and a change made meanwhile is sent once more afterwards with the
    /// latest state, unless the first answer showed the cell was changed elsewhere.
    /// </summary>
    private async Task SaveNowAsync(CellDraft d)
    {
        var key = Key(d.Alternative, d.Criterion);
        CancelTimer(key);
        if (!Editable)
        {
            return;
        }

        if (!_queues.TryGetValue(key, out var queue))
        {
            _queues[key] = queue = new SaveQueue();
        }

        var first = true;
        await queue.RunAsync(async () =>
        {
            if (!first && d.State is CellState.Stale)
            {
                return;
            }

            first = false;
            await SendAsync(d);
        });
        StateHasChanged();
    }

    private async Task SendAsync(CellDraft d)
    {
        var request = d.Request();
        if (request is null)
        {
            d.Settle();
            StateHasChanged();
            return;
        }

        d.State = CellState.Saving;
        d.Message = null;
        StateHasChanged();
        var result = await OnSave(d.Stored, request);
        if (result.Saved is { } saved)
        {
            d.Accept(saved, request);
            d.State = CellState.Saved;
            d.Settle();
        }
        else if (result.Current is { } current)
        {
            d.Overtaken(current);
            d.Message = "This cell was saved elsewhere (another window?) after you opened the sheet: the stored rating is shown and yours was not saved.";
        }
        else
        {
            d.State = CellState.Error;
            d.Message = result.Problem?.OneLine ?? ProblemText.Unexpected.Detail;
        }
    }

    /// <summary>Saves everything still waiting, then lists what stops the submission, or asks for confirmation.</summary>
    private async Task CheckAsync()
    {
        _submitProblem = null;
        foreach (var d in _drafts.Values.Where(d => d.Changed).ToArray())
        {
            await SaveNowAsync(d);
        }

        // The list stays and shrinks as the cells are put right.
        _checked = true;
        _confirming = SheetIssue.Find(Sheet, _drafts.Values).Count == 0;
    }

    private async Task SubmitAsync()
    {
        _submitting = true;
        try
        {
            _submitProblem = await OnSubmit();
        }
        finally
        {
            _submitting = false;
        }

        _confirming = _submitProblem is null && _confirming;
    }

    private void GoTo(SheetIssue issue)
    {
        var row = Bidders.ToList().FindIndex(b => b.Code == issue.Alternative);
        var column = Criteria.ToList().FindIndex(c => c.Id == issue.Criterion);
        if (_keys.FocusAt(row, column))
        {
            OpenEditor(row, column);
        }
    }

    /// <summary>The words of the saved state of the whole sheet, for the live region.</summary>
    private string OverallState()
    {
        var drafts = _drafts.Values;
        var saving = drafts.Count(d => d.State == CellState.Saving);
        var errors = drafts.Count(d => d.State is CellState.Error or CellState.Stale);
        var waiting = drafts.Count(d => d.State == CellState.Draft);
        return saving > 0 ? "Saving…"
            : errors > 0 ? $"{errors} cell(s) not saved: see the cells marked “not saved”."
            : waiting > 0 ? $"{waiting} cell(s) not saved yet: each needs a rationale (or a reason for declining)."
            : "All changes saved.";
    }

    private static string StateWords(CellDraft d) => d.State switch
    {
        CellState.Saving => "saving…",
        CellState.Draft => "not saved yet",
        CellState.Error => "not saved",
        CellState.Stale => "changed elsewhere",
        _ => d.Done ? "saved" : d.Stored.Term is not null ? "needs rationale" : "",
    };

    private string RationaleId => $"rationale-{_editing?.Alternative}-{_editing?.Criterion}";

    private async Task KeepArrowKeysInGridAsync()
    {
        try
        {
            _module = await JS.InvokeAsync<IJSObjectReference>("import", "./js/assessor-grid.js");
            if (_module is not null)
            {
                await _module.InvokeVoidAsync("keepArrowKeys", _gridRef);
            }
        }
        catch (Exception e) when (e is JSException or JSDisconnectedException or InvalidOperationException)
        {
            // Without the script the arrow keys still move the focus; the page may also scroll a little.
        }
    }

    private static async Task FocusAsync(ElementReference element)
    {
        try
        {
            await element.FocusAsync();
        }
        catch (Exception e) when (e is JSException or JSDisconnectedException or InvalidOperationException)
        {
            // The element left the page before it could take the focus.
        }
    }

    public async ValueTask DisposeAsync()
    {
        foreach (var cts in _timers.Values)
        {
            cts.Cancel();
            cts.Dispose();
        }

        _timers.Clear();
        if (_module is not null)
        {
            try
            {
                await _module.DisposeAsync();
            }
            catch (JSDisconnectedException)
            {
                // The circuit is gone with the module.
            }
        }

        GC.SuppressFinalize(this);
    }
}
