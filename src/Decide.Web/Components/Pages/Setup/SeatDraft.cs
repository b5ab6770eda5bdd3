using Decide.Data.Entities;

namespace Decide.Web.Components.Pages.Setup;

/// <summary>A seat on the panel as edited on the setup screen.</summary>
public sealed class SeatDraft
{
    public string Email { get; set; } = "";

    public PanelRole Role { get; set; } = PanelRole.Assessor;

    public string? AssessorCode { get; set; }

    public double Weight { get; set; } = 1;

    /// <summary>The criteria assigned to an assessor; empty means every criterion rated in words.</summary>
    public HashSet<string> Criteria { get; } = new(StringComparer.Ordinal);

    /// <summary>The fields a reviewer knows, comma-separated as typed (rounds).</summary>
    public string Topics { get; set; } = "";

    /// <summary>Assessors and price evaluators carry a code; assessors also a weight and criteria.</summary>
    public bool Scores => Role is PanelRole.Assessor or PanelRole.PriceEvaluator;
}
