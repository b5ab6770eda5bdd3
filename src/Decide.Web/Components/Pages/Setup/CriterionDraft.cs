using Decide.Core.Model;

namespace Decide.Web.Components.Pages.Setup;

/// <summary>A criterion as edited on the setup screen.</summary>
public sealed class CriterionDraft
{
    public string Id { get; set; } = "";

    public string Name { get; set; } = "";

    public CriterionKind Kind { get; set; } = CriterionKind.Linguistic;

    public Direction Direction { get; set; } = Direction.Benefit;

    /// <summary>The group's id, or null for a criterion of its own.</summary>
    public string? Group { get; set; }

    /// <summary>Unit of a numeric criterion ("EUR", "days").</summary>
    public string? Unit { get; set; }

    public string? Description { get; set; }

    /// <summary>What each rating term means for this criterion, by term code (kept when the scale changes; only the scale's terms are saved).</summary>
    public Dictionary<string, string> Descriptors { get; } = new(StringComparer.Ordinal);

    /// <summary>Its published points (points weighting), or null when not given yet.</summary>
    public double? Points { get; set; }

    /// <summary>The least term the panel's score must reach under the published award, or null for none.</summary>
    public string? MinimumTerm { get; set; }

    /// <summary>True once the criterion was read from the stored plan: its id is then kept (weights and assignments refer to it).</summary>
    public bool Stored { get; set; }
}
