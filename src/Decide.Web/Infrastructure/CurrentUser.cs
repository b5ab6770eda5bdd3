using System.Security.Claims;

namespace Decide.Web.Infrastructure;

/// <summary>
/// Who is making the request. In an HTTP request (the API, a statically rendered page) that is the request's user;
/// in an interactive screen's circuit, where there is no HTTP request, it is the user the circuit was opened for
/// (set by <see cref="CircuitUserHandler"/> from the authentication state).
/// </summary>
public sealed class CurrentUser(IHttpContextAccessor accessor)
{
    /// <summary>The claim that carries the account's display name (added at sign-in).</summary>
    public const string DisplayNameClaim = "decide:display_name";

    private ClaimsPrincipal? _circuitUser;

    private ClaimsPrincipal Principal => _circuitUser ?? accessor.HttpContext?.User ?? new ClaimsPrincipal();

    public bool IsSignedIn => Principal.Identity?.IsAuthenticated == true;

    /// <summary>The account id.</summary>
    /// <exception cref="DomainProblem">401 when nobody is signed in.</exception>
    public string Id => Principal.FindFirstValue(ClaimTypes.NameIdentifier)
        ?? throw new DomainProblem(StatusCodes.Status401Unauthorized, "Sign in first", "This request needs a signed-in user.");

    public string? Name => Principal.FindFirstValue(ClaimTypes.Name);

    /// <summary>The name other people know the user by; the account name when none is recorded.</summary>
    public string? DisplayName => Principal.FindFirstValue(DisplayNameClaim) is { Length: > 0 } name ? name : Name;

    public bool IsAdministrator => Principal.IsInRole(IdentitySetup.AdministratorRole);

    /// <summary>Binds this scope to the user of an interactive circuit (which has no HTTP request).</summary>
    public void UseCircuitUser(ClaimsPrincipal user) => _circuitUser = user;
}
