namespace Decide.Data.Entities;

/// <summary>A person's place on one evaluation's panel.</summary>
public sealed class PanelMember : IVersioned
{
    public long Id { get; set; }

    public Guid EvaluationId { get; set; }

    public string UserId { get; set; } = "";

    public DecideUser? User { get; set; }

    public PanelRole Role { get; set; }

    /// <summary>For assessors and price evaluators: their id in the portable file ("ravelle").</summary>
    public string? AssessorCode { get; set; }

    /// <summary>Weight of their judgement, fixed with the plan.</summary>
    public double Weight { get; set; } = 1;

    /// <summary>JSON array of the criterion ids assigned to an assessor; null = every linguistic criterion.</summary>
    public string? AssignedCriteriaJson { get; set; }

    /// <summary>JSON array of the fields a reviewer knows (preferred when applications are assigned); null for none.</summary>
    public string? TopicsJson { get; set; }

    /// <summary>When they signed the conflict-of-interest and confidentiality declaration.</summary>
    public DateTimeOffset? DeclarationSignedAt { get; set; }

    /// <summary>Version of the declaration text they signed.</summary>
    public string? DeclarationVersion { get; set; }

    /// <summary>When they confirmed the declaration again after seeing the bidders' names.</summary>
    public DateTimeOffset? NamesConfirmedAt { get; set; }

    /// <summary>When they submitted their weight judgements.</summary>
    public DateTimeOffset? WeightsSubmittedAt { get; set; }

    /// <summary>When they submitted their rating sheet; null while open (or reopened).</summary>
    public DateTimeOffset? SubmittedAt { get; set; }

    public long Version { get; set; }
}
