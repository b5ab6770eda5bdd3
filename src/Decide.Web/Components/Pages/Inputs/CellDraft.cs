using Decide.Web.Features.Inputs;

namespace Decide.Web.Components.Pages.Inputs;

/// <summary>
/// One rating cell as the assessor is editing it, beside the last version stored, and what saving it now would
/// send. Pure state: the grid decides when to save, this decides what.
/// </summary>
public sealed class CellDraft(SheetCell stored, int minimumRationale)
{
    public string Alternative { get; } = stored.Alternative;

    public string Criterion { get; } = stored.Criterion;

    public bool Required { get; } = stored.Required;

    public string? Term { get; set; } = stored.Term;

    public string? Rationale { get; set; } = stored.Rationale;

    public string? Declined { get; set; } = stored.Declined;

    /// <summary>The last version stored (what the next save must send).</summary>
    public SheetCell Stored { get; private set; } = stored;

    public CellState State { get; set; } = CellState.Saved;

    /// <summary>Why the cell is a draft, was refused, or went stale.</summary>
    public string? Message { get; set; }

    /// <summary>When stale: the assessor's own change that was not saved.</summary>
    public (string? Term, string? Rationale, string? Declined)? Mine { get; set; }

    /// <summary>The shortest rationale the plan accepts (at least one character).</summary>
    public int Minimum { get; } = Math.Max(1, minimumRationale);

    public bool RationaleLongEnough => (Rationale?.Trim().Length ?? 0) >= Minimum;

    /// <summary>True when what is shown differs from what is stored.</summary>
    public bool Changed =>
        Term != Stored.Term || Norm(Rationale) != Norm(Stored.Rationale) || Norm(Declined) != Norm(Stored.Declined);

    /// <summary>Rated with a long enough rationale, or declined with a reason — as stored.</summary>
    public bool Done => Stored.Declined is { Length: > 0 } || (Stored.Term is not null && (Stored.Rationale?.Trim().Length ?? 0) >= Minimum);

    /// <summary>What to send to store the shown state, or null when there is nothing to send (unchanged, or not savable yet).</summary>
    public RatingRequest? Request()
    {
        if (!Changed)
        {
            return null;
        }

        if (Declined is not null)
        {
            return string.IsNullOrWhiteSpace(Declined) ? null : new RatingRequest(null, null, Declined.Trim(), Stored.Version);
        }

        return Term is not null && RationaleLongEnough ? new RatingRequest(Term, Rationale!.Trim(), null, Stored.Version) : null;
    }

    /// <summary>Why the shown state cannot be saved yet, or null.</summary>
    public string? NotSavableReason() =>
        !Changed ? null
        : Declined is not null ? (string.IsNullOrWhiteSpace(Declined) ? "give the reason for declining" : null)
        : Term is null ? "choose a term, or decline the cell with a reason"
        : !RationaleLongEnough ? $"add a rationale of at least {Minimum} characters (Enter opens it)"
        : null;

    /// <summary>
    /// The one place the cell's shown state follows from its contents when no save is on its way: saved when it shows
    /// what is stored, otherwise a draft with the reason it cannot be saved yet (if any). A cell changed elsewhere
    /// stays stale until the assessor chooses.
    /// </summary>
    public void Settle()
    {
        if (State is CellState.Stale)
        {
            return;
        }

        State = Changed ? CellState.Draft : CellState.Saved;
        Message = NotSavableReason();
    }

    /// <summary>Takes what the service stored as the new baseline, keeping anything typed since the save was sent.</summary>
    public void Accept(SheetCell saved, RatingRequest sent)
    {
        var typedSince = Term != sent.Term || Norm(Rationale) != Norm(sent.Rationale) || Norm(Declined) != Norm(sent.Declined);
        Stored = saved;
        if (!typedSince)
        {
            (Term, Rationale, Declined) = (saved.Term, saved.Rationale, saved.Declined);
        }

        Mine = null;
    }

    /// <summary>The cell was saved elsewhere: show what is stored and keep the assessor's change aside, unsaved.</summary>
    public void Overtaken(SheetCell current)
    {
        Mine = (Term, Rationale, Declined);
        Stored = current;
        (Term, Rationale, Declined) = (current.Term, current.Rationale, current.Declined);
        State = CellState.Stale;
    }

    /// <summary>Puts the assessor's own change back over the stored one (it is then saved against the stored version).</summary>
    public void RestoreMine()
    {
        if (Mine is { } mine)
        {
            (Term, Rationale, Declined) = mine;
            Mine = null;
        }
    }

    private static string Norm(string? text) => text?.Trim() ?? "";
}
