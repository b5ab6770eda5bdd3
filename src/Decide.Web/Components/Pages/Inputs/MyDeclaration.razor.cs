using Decide.Web.Components.Shared;
using Decide.Web.Features.Evaluations;
using Decide.Web.Features.Inputs;
using Microsoft.AspNetCore.Components;

namespace Decide.Web.Components.Pages.Inputs;

/// <summary>
/// The declaration an assessor or price evaluator accepts before anything else of the evaluation is shown, and
/// its confirmation against the bidders' names once scoring opens, declaring any conflict of interest per bidder.
/// </summary>
public partial class MyDeclaration
{
    private readonly DeclarationView _text = DeclarationService.Current();
    private readonly Dictionary<string, string> _conflicts = new(StringComparer.Ordinal);
    private EvaluationSummary? _summary;
    private MyDeclarationView? _mine;
    private ProblemText? _problem;
    private bool _accepted;
    private bool _busy;
    private bool _showText;
    private bool _confirming;
    private string _furtherBidder = "";
    private string _furtherStatement = "";

    [Parameter]
    public Guid Id { get; set; }

    [Inject]
    private EvaluationService Evaluations { get; set; } = default!;

    [Inject]
    private DeclarationService Declarations { get; set; } = default!;

    [Inject]
    private ILogger<MyDeclaration> Log { get; set; } = default!;

    protected override async Task OnParametersSetAsync()
    {
        EvaluationDetail? detail;
        (detail, _problem) = await Attempt.RunAsync(() => Evaluations.GetAsync(Id), Log, "reading an evaluation");
        _summary = detail?.Summary;
        if (_summary is not null)
        {
            (_mine, _problem) = await Attempt.RunAsync(() => Declarations.GetMineAsync(Id), Log, "reading a declaration");
        }
    }

    private async Task SignAsync()
    {
        await RunAsync(() => Declarations.SignAsync(Id, new SignDeclarationRequest(_text.Version, _accepted)), "signing the declaration");
        if (_mine?.SignedAt is not null)
        {
            // The header's tabs and the plan follow the signature.
            (var detail, _) = await Attempt.RunAsync(() => Evaluations.GetAsync(Id), Log, "reading an evaluation");
            _summary = detail?.Summary ?? _summary;
        }
    }

    private async Task ConfirmNamesAsync()
    {
        var conflicts = _conflicts.Select(c => new ConflictRequest(c.Key, c.Value)).ToArray();
        await RunAsync(() => Declarations.ConfirmNamesAsync(Id, new ConfirmNamesRequest(conflicts)), "confirming the declaration against the names");
        _confirming = false;
        if (_problem is null)
        {
            _conflicts.Clear();
        }
    }

    private async Task DeclareFurtherAsync()
    {
        await RunAsync(() => Declarations.DeclareConflictAsync(Id, new ConflictRequest(_furtherBidder, _furtherStatement)), "declaring a conflict of interest");
        if (_problem is null)
        {
            (_furtherBidder, _furtherStatement) = ("", "");
        }
    }

    private async Task RunAsync(Func<Task<MyDeclarationView>> work, string what)
    {
        _busy = true;
        try
        {
            var (mine, problem) = await Attempt.RunAsync(work, Log, what);
            _problem = problem;
            _mine = mine ?? _mine;
        }
        finally
        {
            _busy = false;
        }
    }

    private void ToggleConflict(string code, ChangeEventArgs e)
    {
        if (e.Value is true)
        {
            _conflicts.TryAdd(code, "");
        }
        else
        {
            _conflicts.Remove(code);
        }

        _confirming = false;
    }

    private void SetStatement(string bid, ChangeEventArgs e) => _conflicts[bid] = e.Value as string ?? "";

    /// <summary>The bidder a "conflicts[i].statement" error is about, in the order the conflicts were sent.</summary>
    private string? ConflictAt(string path)
    {
        var open = path.IndexOf('[', StringComparison.Ordinal);
        var close = path.IndexOf(']', StringComparison.Ordinal);
        return open >= 0 && close > open && int.TryParse(path[(open + 1)..close], out var i) && i < _conflicts.Count
            ? _conflicts.Keys.ElementAt(i)
            : null;
    }

    private string BidderName(string code) => _mine?.Bidders?.FirstOrDefault(b => b.Code == code)?.Name ?? code;
}
