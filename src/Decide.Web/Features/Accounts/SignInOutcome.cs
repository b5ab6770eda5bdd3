namespace Decide.Web.Features.Accounts;

/// <summary>How a password sign-in ended.</summary>
public enum SignInOutcome
{
    /// <summary>Signed in.</summary>
    Succeeded,

    /// <summary>Unknown e-mail address or wrong password (counted towards lockout).</summary>
    Failed,

    /// <summary>Too many failures: the account is locked for a while.</summary>
    LockedOut,
}
