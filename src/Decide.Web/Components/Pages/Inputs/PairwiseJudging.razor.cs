using System.Globalization;
using System.Text.RegularExpressions;
using Decide.Web.Features.Inputs;
using Microsoft.AspNetCore.Components;
using Microsoft.AspNetCore.Components.Web;

namespace Decide.Web.Components.Pages.Inputs;

/// <summary>
/// Pairwise weighting one pair at a time, with the matrix beside it: the pair's judgement on the pairwise scale in
/// both directions, the consistency of each matrix (CR and GCI against their thresholds) from the feedback of the
/// last save, the judgement that fits the others least with the term that would fit and a button to use it, and
/// any circle of judgements in words. Every change is saved at once through <see cref="Save"/>.
/// </summary>
public partial class PairwiseJudging
{
    private static readonly Regex Direction = new(@"\s*\((row|column) over (row|column)\)\s*$", RegexOptions.Compiled, TimeSpan.FromSeconds(1));
    private readonly SaveQueue _queue = new();
    private WeightsView? _seen;
    private WeightsView _view = default!;
    private List<PairwiseEntry> _entries = [];
    private PairSequence _sequence = new([]);
    private int _current;
    private string _saveText = "All changes saved.";
    private bool _saveFailed;

    /// <summary>The judgements with their feedback, as last read or saved.</summary>
    [Parameter, EditorRequired]
    public WeightsView Weights { get; set; } = default!;

    /// <summary>Stores the whole set of judgements and returns them with fresh feedback.</summary>
    [Parameter, EditorRequired]
    public Func<WeightsRequest, Task<WeightsSaveResult>> Save { get; set; } = default!;

    /// <summary>True after submission or once the plan is locked: nothing can be chosen.</summary>
    [Parameter]
    public bool ReadOnly { get; set; }

    private ComparedPair? Pair => _current >= 0 && _current < _sequence.Pairs.Count ? _sequence.Pairs[_current] : null;

    private MatrixFeedback? Matrix => Pair is { } p ? _view.Feedback.Matrices.FirstOrDefault(m => m.Group == p.Group) : null;

    protected override void OnParametersSet()
    {
        if (ReferenceEquals(_seen, Weights) || ReferenceEquals(_view, Weights))
        {
            _seen = Weights;
            return;
        }

        _seen = Weights;
        Show(Weights);
        _current = Math.Max(0, _sequence.Pairs.ToList().FindIndex(p => Middle(p.First, p.Second) is null));
    }

    private void Show(WeightsView view)
    {
        _view = view;
        _entries = view.Pairwise.ToList();
        _sequence = new PairSequence(view.Feedback.Matrices);
        _current = Math.Clamp(_current, 0, Math.Max(0, _sequence.Pairs.Count - 1));
    }

    private string Name(string id) => _view.Nodes.FirstOrDefault(n => n.Id == id)?.Name ?? id;

    private string MatrixName(string? group) => group is null ? "Top level" : $"Within {Name(group)}";

    private double? Middle(string row, string col) => PairSequence.Middle(_entries, _view.Scale, row, col);

    /// <summary>The scale as chosen for the current pair: first item strongest first, then equal, then second item weakest first.</summary>
    private IEnumerable<ScaleTermView> Options() =>
        _view.Scale.Where(t => t.Tfn[1] > 1).OrderByDescending(t => t.Tfn[1])
            .Concat(_view.Scale.Where(t => t.Tfn[1] == 1))
            .Concat(_view.Scale.Where(t => t.Tfn[1] < 1).OrderByDescending(t => t.Tfn[1]));

    private static string Words(ScaleTermView t) => Direction.Replace(t.Label, "");

    /// <summary>The strength shown on an option: its code for the first item, the reciprocal's number for the second.</summary>
    private static string Strength(ScaleTermView t) => t.Tfn[1] >= 1
        ? t.Code
        : t.Code.StartsWith("1/", StringComparison.Ordinal) ? t.Code[2..] : Number(1 / t.Tfn[1]);

    private string Meaning(ScaleTermView t, ComparedPair p) =>
        t.Tfn[1] > 1 ? $"{Name(p.First)} is more important: {Words(t).ToLowerInvariant()} ({t.Code})"
        : t.Tfn[1] < 1 ? $"{Name(p.Second)} is more important: {Words(t).ToLowerInvariant()} ({Strength(t)})"
        : "Equally important (1)";

    /// <summary>The judgement of row over column as shown in the matrix: the term's code, or the number.</summary>
    private string Shown(string row, string col) =>
        row == col ? "1"
        : Middle(row, col) is not { } m ? ""
        : PairSequence.TermFor(_view.Scale, m)?.Code ?? Number(m);

    private static string Number(double value) => value.ToString(value >= 10 ? "0.#" : "0.##", CultureInfo.InvariantCulture);

    /// <summary>The least consistent judgement of the matrix shown, when it sits at (row, col); the engine lists it first.</summary>
    private JudgementHint? Worst(string row, string col) =>
        Matrix?.WorstJudgements.FirstOrDefault() is { } worst && worst.Row == row && worst.Col == col ? worst : null;

    private bool IsCurrent(string row, string col) =>
        Pair is { } p && ((p.First == row && p.Second == col) || (p.First == col && p.Second == row));

    private async Task ChooseAsync(ComparedPair pair, string code)
    {
        Put(new PairwiseEntry(pair.First, pair.Second, code, null));
        await SaveAllAsync();
    }

    /// <summary>Takes the term the other judgements imply for the least consistent one.</summary>
    private async Task UseSuggestedAsync(JudgementHint hint)
    {
        Put(new PairwiseEntry(hint.Row, hint.Col, hint.SuggestedTerm, null));
        var at = _sequence.IndexOf(hint.Row, hint.Col);
        if (at >= 0)
        {
            _current = at;
        }

        await SaveAllAsync();
    }

    private void Put(PairwiseEntry entry)
    {
        _entries.RemoveAll(e => (e.Row == entry.Row && e.Col == entry.Col) || (e.Row == entry.Col && e.Col == entry.Row));
        _entries.Add(entry);
    }

    private Task SaveAllAsync()
    {
        _saveText = "Saving…";
        _saveFailed = false;
        return _queue.RunAsync(async () =>
        {
            var result = await Save(new WeightsRequest(null, _entries.ToArray(), _view.Version));
            if (result.Saved is { } saved)
            {
                var chosen = _entries.ToArray();
                Show(saved);

                // A change made while this save was on its way is kept, and saved next.
                _entries = chosen.ToList();
                _saveText = "All changes saved.";
            }
            else if (result.Current is { } current)
            {
                Show(current);
                _saveFailed = true;
                _saveText = "Not saved: your judgements were changed elsewhere (another window?) since this screen read them. The stored judgements are shown; make your change again.";
            }
            else
            {
                _saveFailed = true;
                _saveText = $"Not saved: {result.Problem?.OneLine}";
            }

            StateHasChanged();
        });
    }

    private void Go(int index) => _current = Math.Clamp(index, 0, _sequence.Pairs.Count - 1);

    private void GoToNextOpen()
    {
        var next = _sequence.Pairs.Select((p, i) => (p, i)).FirstOrDefault(x => x.i > _current && Middle(x.p.First, x.p.Second) is null, (default!, -1)).Item2;
        Go(next >= 0 ? next : _current + 1);
    }

    private void OnScaleKey(KeyboardEventArgs e)
    {
        if (e.Key == "Enter")
        {
            Go(_current + 1);
        }
    }

    private void GoToCell(string row, string col)
    {
        var at = _sequence.IndexOf(row, col);
        if (at >= 0)
        {
            _current = at;
        }
    }

    private static string Ratio(double? value) => value is { } v ? v.ToString("0.000", CultureInfo.InvariantCulture) : "—";

    private string Triad(IReadOnlyList<string> t) =>
        $"{Name(t[0])} over {Name(t[1])}, and {Name(t[1])} over {Name(t[2])}, but {Name(t[2])} over {Name(t[0])}.";
}
