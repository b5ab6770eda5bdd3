namespace Decide.Web.Infrastructure;

/// <summary>
/// How the service protects itself (section <c>Security</c>): HTTPS with HSTS and secure cookies, and the limits on
/// sign-in attempts. Read once at start; an invalid value stops the service with a message naming the setting.
/// </summary>
public sealed class SecurityOptions
{
    public const string Section = "Security";

    /// <summary>
    /// Send plain-HTTP requests to HTTPS (the health probes excepted), send HSTS, and mark every cookie Secure.
    /// Unset: true outside Development. Behind a reverse proxy that terminates TLS, the proxy's
    /// <c>X-Forwarded-Proto</c> (trusted from <c>Proxy:KnownNetworks</c>) tells the service the request was HTTPS.
    /// </summary>
    public bool? RequireHttps { get; set; }

    /// <summary>The port browsers reach HTTPS on, used in redirects (the proxy's, 443 by default).</summary>
    public int HttpsPort { get; set; } = 443;

    /// <summary>Limits on sign-in attempts.</summary>
    public SignInLimitOptions SignIn { get; set; } = new();

    /// <summary>Whether HTTPS is required in <paramref name="environment"/>: as configured, else everywhere but Development.</summary>
    public bool HttpsRequiredIn(IHostEnvironment environment) => RequireHttps ?? !environment.IsDevelopment();

    /// <summary>Every setting that is out of range, as "Security:Key must … (it is …)".</summary>
    public IEnumerable<string> Problems()
    {
        if (HttpsPort is < 1 or > 65535)
        {
            yield return $"Security:HttpsPort must be a port number between 1 and 65535 (it is {HttpsPort}).";
        }

        if (SignIn.PerAccountPermits < 1)
        {
            yield return $"Security:SignIn:PerAccountPermits must be at least 1 (it is {SignIn.PerAccountPermits}).";
        }

        if (SignIn.PerAddressPermits < SignIn.PerAccountPermits)
        {
            yield return $"Security:SignIn:PerAddressPermits must be at least PerAccountPermits ({SignIn.PerAccountPermits}); it is {SignIn.PerAddressPermits}.";
        }

        if (SignIn.WindowSeconds < 1)
        {
            yield return $"Security:SignIn:WindowSeconds must be at least 1 (it is {SignIn.WindowSeconds}).";
        }
    }
}
