namespace Decide.Data.Entities;

/// <summary>A bid (alternative) registered in an evaluation.</summary>
public sealed class StoredAlternative
{
    public long Id { get; set; }

    public Guid EvaluationId { get; set; }

    /// <summary>Id in the portable file ("orrinford").</summary>
    public string Code { get; set; } = "";

    public string Name { get; set; } = "";

    /// <summary>The amount an application requests (rounds with a funding line), or null.</summary>
    public double? RequestedAmount { get; set; }

    /// <summary>The application's field, matched with reviewers' topics when assigning; or null.</summary>
    public string? Topic { get; set; }

    /// <summary>Display order.</summary>
    public int Position { get; set; }

    public DateTimeOffset AddedAt { get; set; }
}
