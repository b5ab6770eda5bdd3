using System.Security.Claims;
using Decide.Data;
using Decide.Data.Entities;
using Decide.Web.Features.Audit;
using Decide.Web.Infrastructure;
using Microsoft.AspNetCore.Identity;
using Microsoft.EntityFrameworkCore;

namespace Decide.Web.Features.Accounts;

/// <summary>Sign in with e-mail and password.</summary>
public sealed record SignInRequest(string Email, string Password);

/// <summary>A new local account (administrator).</summary>
public sealed record CreateAccountRequest(string Email, string DisplayName, string Password, bool Administrator = false);

/// <summary>An account as others see it.</summary>
public sealed record AccountView(string Id, string Email, string DisplayName, bool Administrator, bool LockedOut);

/// <summary>Accounts and sign-in; every attempt is recorded in the system audit chain (never the password).</summary>
public sealed class AccountService(
    UserManager<DecideUser> users,
    SignInManager<DecideUser> signIn,
    IDbContextFactory<DecideDbContext> factory,
    AuditWriter audit,
    CurrentUser current,
    TimeProvider clock)
{
    /// <summary>
    /// Checks the password (counting failures towards lockout) and signs in with a cookie or, for scripts, a bearer
    /// token written to the response by the bearer handler.
    /// </summary>
    public async Task<IResult> SignInAsync(SignInRequest request, bool useCookies, CancellationToken ct)
    {
        var outcome = await PasswordSignInAsync(request,
            useCookies ? IdentityConstants.ApplicationScheme : IdentityConstants.BearerScheme, ct);
        return outcome switch
        {
            SignInOutcome.LockedOut => TypedResults.Problem(statusCode: StatusCodes.Status423Locked, title: "Account locked",
                detail: "Too many failed sign-ins: the account is locked for a while. Try again later or ask an administrator."),
            SignInOutcome.Failed => TypedResults.Problem(statusCode: StatusCodes.Status401Unauthorized, title: "Sign-in failed",
                detail: "The e-mail address or the password is wrong."),

            // The sign-in manager has already written the cookie or the token response.
            _ => TypedResults.Empty,
        };
    }

    /// <summary>
    /// Checks the password (counting failures towards lockout), signs in with <paramref name="scheme"/> when it is
    /// right, and records the attempt in the system audit chain. Shared by the API and the sign-in screen.
    /// </summary>
    public async Task<SignInOutcome> PasswordSignInAsync(SignInRequest request, string scheme, CancellationToken ct)
    {
        signIn.AuthenticationScheme = scheme;
        var user = string.IsNullOrWhiteSpace(request.Email) ? null : await users.FindByEmailAsync(request.Email);
        var result = user is null
            ? Microsoft.AspNetCore.Identity.SignInResult.Failed
            : await signIn.PasswordSignInAsync(user, request.Password ?? "", isPersistent: false, lockoutOnFailure: true);

        await RecordAsync(user, result.Succeeded ? "signin.succeeded" : result.IsLockedOut ? "signin.locked-out" : "signin.failed",
            request.Email, ct);
        return result.Succeeded ? SignInOutcome.Succeeded : result.IsLockedOut ? SignInOutcome.LockedOut : SignInOutcome.Failed;
    }

    public async Task<AccountView> CreateAsync(CreateAccountRequest request, CancellationToken ct)
    {
        RequireAdministrator();
        var user = new DecideUser
        {
            UserName = request.Email, Email = request.Email, EmailConfirmed = true,
            DisplayName = request.DisplayName?.Trim() ?? "", CreatedAt = clock.GetUtcNow(),
        };
        var errors = new Dictionary<string, string[]>();
        if (string.IsNullOrWhiteSpace(user.DisplayName))
        {
            errors["displayName"] = ["give the person's name as others should see it"];
        }

        if (errors.Count == 0)
        {
            var created = await users.CreateAsync(user, request.Password ?? "");
            if (!created.Succeeded)
            {
                foreach (var error in created.Errors)
                {
                    var field = error.Code.Contains("Password", StringComparison.Ordinal) ? "password" : "email";
                    errors[field] = [.. errors.GetValueOrDefault(field, []), error.Description];
                }
            }
        }

        if (errors.Count > 0)
        {
            throw DomainProblem.Invalid(errors);
        }

        if (request.Administrator)
        {
            await users.AddToRoleAsync(user, IdentitySetup.AdministratorRole);
        }

        await UnitOfWork.RunAsync(factory, async db =>
        {
            audit.Record(db, null, new AuditEvent("account.created", $"accounts/{user.Id}", null,
                $"{user.Email} ({user.DisplayName}){(request.Administrator ? ", administrator" : "")}"));
            return await db.SaveChangesAsync(ct);
        }, ct);
        return new AccountView(user.Id, user.Email!, user.DisplayName, request.Administrator, false);
    }

    public async Task<IReadOnlyList<AccountView>> ListAsync(CancellationToken ct)
    {
        RequireAdministrator();
        var admins = (await users.GetUsersInRoleAsync(IdentitySetup.AdministratorRole)).Select(u => u.Id).ToHashSet();
        var now = clock.GetUtcNow();
        var all = await users.Users.AsNoTracking().OrderBy(u => u.Email).ToListAsync(ct);
        return all.Select(u => new AccountView(u.Id, u.Email!, u.DisplayName, admins.Contains(u.Id), u.LockoutEnd > now)).ToArray();
    }

    public async Task<AccountView> MeAsync()
    {
        var user = await users.FindByIdAsync(current.Id) ?? throw DomainProblem.NotFound("Your account");
        return new AccountView(user.Id, user.Email!, user.DisplayName, current.IsAdministrator, false);
    }

    /// <summary>The claims principal a signed-in user gets (used by refresh).</summary>
    public Task<ClaimsPrincipal> PrincipalAsync(DecideUser user) => signIn.CreateUserPrincipalAsync(user);

    private void RequireAdministrator()
    {
        if (!current.IsAdministrator)
        {
            throw DomainProblem.Forbidden("Only an administrator manages accounts.");
        }
    }

    private Task RecordAsync(DecideUser? user, string action, string? email, CancellationToken ct) =>
        UnitOfWork.RunAsync(factory, async db =>
        {
            audit.RecordFor(db, user?.Id, user?.Email ?? email, new AuditEvent(action, "accounts/sign-in", null, email));
            return await db.SaveChangesAsync(ct);
        }, ct);
}
