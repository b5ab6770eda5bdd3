namespace Decide.Web.Infrastructure;

/// <summary>
/// Limits on sign-in attempts (section <c>Security:SignIn</c>), counted in fixed windows per client address: the
/// sign-in form, <c>POST /api/auth/login</c> and <c>POST /api/auth/refresh</c> together. ADR 16 gives the reasoning.
/// </summary>
public sealed class SignInLimitOptions
{
    /// <summary>
    /// Attempts for one account from one address per window (10 by default): enough for a person who mistypes, far
    /// too few to guess a password. Lockout (5 wrong passwords in a row) still guards an account attacked from many
    /// addresses.
    /// </summary>
    public int PerAccountPermits { get; set; } = 10;

    /// <summary>
    /// Attempts from one address per window whatever the account (300 by default): stops one client spraying many
    /// accounts, while a department behind one address, or a load test signing in 100 assessors from loopback, passes.
    /// </summary>
    public int PerAddressPermits { get; set; } = 300;

    /// <summary>The window's length in seconds (60 by default).</summary>
    public int WindowSeconds { get; set; } = 60;

    /// <summary>The window as a time span.</summary>
    public TimeSpan Window => TimeSpan.FromSeconds(WindowSeconds);
}
