namespace Decide.Benchmarks;

/// <summary>The shape of a synthetic panel: how many alternatives, criteria and assessors.</summary>
/// <param name="Name">Label shown in benchmark tables.</param>
/// <param name="Alternatives">n, the bids being compared.</param>
/// <param name="Criteria">m, every criterion including the single pass/fail gate.</param>
/// <param name="Assessors">k, the panel members; each rates every linguistic cell.</param>
public sealed record PanelSize(string Name, int Alternatives, int Criteria, int Assessors)
{
    /// <summary>A typical award panel: 8 bids, 12 criteria, 7 assessors.</summary>
    public static PanelSize Typical { get; } = new("Typical", 8, 12, 7);

    /// <summary>A large framework tender: 100 bids, 60 criteria, 30 assessors.</summary>
    public static PanelSize Large { get; } = new("Large", 100, 60, 30);

    /// <summary>The robustness target's shape: 20 bids, 15 criteria (plus the gate), 5 assessors.</summary>
    public static PanelSize Acceptability { get; } = new("Acceptability", 20, 16, 5);

    /// <summary>Looks a size up by its name (benchmark parameters are plain strings).</summary>
    public static PanelSize Named(string name) => name switch
    {
        "Typical" => Typical,
        "Large" => Large,
        "Acceptability" => Acceptability,
        _ => throw new ArgumentOutOfRangeException(nameof(name), name, "Known panel sizes: Typical, Large."),
    };

    /// <inheritdoc />
    public override string ToString() => $"{Name} ({Alternatives} × {Criteria} × {Assessors})";
}
