namespace Decide.Web.Components.Pages.Setup;

/// <summary>A criterion group as edited on the setup screen (one level deep).</summary>
public sealed class GroupDraft
{
    public string Id { get; set; } = "";

    public string Name { get; set; } = "";

    /// <summary>Its published points (points weighting): the sum of its criteria's.</summary>
    public double? Points { get; set; }

    /// <summary>True once the group was read from the stored plan: its id is then kept (weights refer to it).</summary>
    public bool Stored { get; set; }
}
