using System.Security.Claims;

namespace Decide.Web.Infrastructure;

/// <summary>Who is making the request.</summary>
public sealed class CurrentUser(IHttpContextAccessor accessor)
{
    private ClaimsPrincipal Principal => accessor.HttpContext?.User ?? new ClaimsPrincipal();

    public bool IsSignedIn => Principal.Identity?.IsAuthenticated == true;

    /// <summary>The account id.</summary>
    /// <exception cref="DomainProblem">401 when nobody is signed in.</exception>
    public string Id => Principal.FindFirstValue(ClaimTypes.NameIdentifier)
        ?? throw new DomainProblem(StatusCodes.Status401Unauthorized, "Sign in first", "This request needs a signed-in user.");

    public string? Name => Principal.FindFirstValue(ClaimTypes.Name);

    public bool IsAdministrator => Principal.IsInRole(IdentitySetup.AdministratorRole);
}
