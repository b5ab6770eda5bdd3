using System.Security.Claims;
using Decide.Data.Entities;
using Microsoft.AspNetCore.Identity;
using Microsoft.Extensions.Options;

namespace Decide.Web.Infrastructure;

/// <summary>Adds the account's display name to the signed-in principal, so that screens can greet the person by name.</summary>
public sealed class DisplayNameClaims(UserManager<DecideUser> users, RoleManager<IdentityRole> roles, IOptions<IdentityOptions> options)
    : UserClaimsPrincipalFactory<DecideUser, IdentityRole>(users, roles, options)
{
    protected override async Task<ClaimsIdentity> GenerateClaimsAsync(DecideUser user)
    {
        var identity = await base.GenerateClaimsAsync(user);
        if (!string.IsNullOrWhiteSpace(user.DisplayName))
        {
            identity.AddClaim(new Claim(CurrentUser.DisplayNameClaim, user.DisplayName));
        }

        return identity;
    }
}
