namespace Decide.Web.Components.Pages.Setup;

/// <summary>A bid (alternative) as edited on the setup screen.</summary>
public sealed class BidDraft
{
    public string Code { get; set; } = "";

    public string Name { get; set; } = "";
}
