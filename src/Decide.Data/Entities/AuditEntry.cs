namespace Decide.Data.Entities;

/// <summary>
/// One entry of the append-only audit trail. Entries form hash chains — one per evaluation, one for the system
/// (sign-ins, accounts) — each entry carrying the SHA-256 of the previous one, so an edited, inserted or deleted
/// entry is detected and located.
/// </summary>
public sealed class AuditEntry
{
    public long Id { get; set; }

    /// <summary>The chain: an evaluation id, or "system".</summary>
    public string Chain { get; set; } = "";

    /// <summary>Position in the chain, from 1, without gaps.</summary>
    public long Index { get; set; }

    public DateTimeOffset At { get; set; }

    public string? UserId { get; set; }

    /// <summary>User name at the time (kept even if the account is renamed).</summary>
    public string? UserName { get; set; }

    /// <summary>What happened ("rating.saved", "plan.locked", "signin.succeeded").</summary>
    public string Action { get; set; } = "";

    /// <summary>What it happened to ("ratings/ravelle/orrinford/display").</summary>
    public string? Target { get; set; }

    public string? OldValue { get; set; }

    public string? NewValue { get; set; }

    /// <summary>Hash of the previous entry in the chain (64 zeros for the first).</summary>
    public string PreviousHash { get; set; } = "";

    /// <summary>SHA-256 (hex) of this entry's canonical text, which includes <see cref="PreviousHash"/>.</summary>
    public string Hash { get; set; } = "";
}
