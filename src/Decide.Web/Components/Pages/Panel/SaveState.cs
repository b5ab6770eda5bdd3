namespace Decide.Web.Components.Pages.Panel;

/// <summary>Where one editable cell stands: as stored, being saved, saved just now, or refused with the reason.</summary>
public enum SaveState
{
    Stored,
    Saving,
    Saved,
    Refused,
}
