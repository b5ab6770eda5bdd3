namespace Decide.Web.Components.Pages.Inputs;

/// <summary>Where a rating cell stands against what is stored.</summary>
public enum CellState
{
    /// <summary>What is shown is what is stored.</summary>
    Saved,

    /// <summary>Being saved now.</summary>
    Saving,

    /// <summary>Changed here but not savable yet (a term without a long enough rationale).</summary>
    Draft,

    /// <summary>The last save was refused; the message says why.</summary>
    Error,

    /// <summary>Saved elsewhere since it was read: the stored rating is shown, the assessor's own change is kept aside.</summary>
    Stale,
}
