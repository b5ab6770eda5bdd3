using Decide.Web.Components.Shared;
using Decide.Web.Features.Inputs;

namespace Decide.Web.Components.Pages.Inputs;

/// <summary>The outcome of saving one rating cell: the stored cell, the newer cell that stopped it, or a refusal.</summary>
public sealed record CellSaveResult(SheetCell? Saved, SheetCell? Current, ProblemText? Problem)
{
    public static CellSaveResult Ok(SheetCell saved) => new(saved, null, null);

    /// <summary>The cell was saved elsewhere since it was read; <paramref name="current"/> is what is stored.</summary>
    public static CellSaveResult Stale(SheetCell current) => new(null, current, null);

    public static CellSaveResult Refused(ProblemText problem) => new(null, null, problem);
}
