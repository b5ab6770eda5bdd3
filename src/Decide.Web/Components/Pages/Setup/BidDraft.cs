namespace Decide.Web.Components.Pages.Setup;

/// <summary>A bid (alternative) as edited on the setup screen.</summary>
public sealed class BidDraft
{
    public string Code { get; set; } = "";

    public string Name { get; set; } = "";

    /// <summary>The amount an application requests (rounds with a funding line).</summary>
    public double? Requested { get; set; }

    /// <summary>The application's field, matched with the fields reviewers know.</summary>
    public string? Topic { get; set; }
}
