using Microsoft.AspNetCore.Identity;

namespace Decide.Data.Entities;

/// <summary>A person with a local account. Roles in an evaluation come from <see cref="PanelMember"/>; the only global role is administrator.</summary>
public sealed class DecideUser : IdentityUser
{
    /// <summary>Name shown to other people ("Tamsin Ravelle").</summary>
    public string DisplayName { get; set; } = "";

    /// <summary>When the account was created.</summary>
    public DateTimeOffset CreatedAt { get; set; }
}
