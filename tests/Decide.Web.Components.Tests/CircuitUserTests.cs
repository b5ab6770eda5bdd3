using System.Security.Claims;
using Decide.Web.Infrastructure;
using Microsoft.AspNetCore.Components.Authorization;
using Microsoft.AspNetCore.Http;

namespace Decide.Web.Components.Tests;

/// <summary>An interactive screen has no HTTP request: its services learn who is signed in from the circuit.</summary>
public sealed class CircuitUserTests
{
    [Fact]
    public async Task A_circuit_without_an_http_request_knows_its_user_from_the_authentication_state_and_follows_changes()
    {
        var user = new CurrentUser(new HttpContextAccessor());
        Assert.False(user.IsSignedIn);
        var state = new ChangingState(Person("account-7", "ione@kestrel-vale.example", IdentitySetup.AdministratorRole));

        var handler = new CircuitUserHandler(state, user);
        await handler.OnCircuitOpenedAsync(null!, CancellationToken.None);

        Assert.True(user.IsSignedIn);
        Assert.Equal("account-7", user.Id);
        Assert.Equal("ione@kestrel-vale.example", user.Name);
        Assert.True(user.IsAdministrator);

        // Revalidation signs the person out of the open screens: the services follow.
        state.Set(new ClaimsPrincipal(new ClaimsIdentity()));
        Assert.False(user.IsSignedIn);
        handler.Dispose();
    }

    private static ClaimsPrincipal Person(string id, string name, string role) => new(new ClaimsIdentity(
        [new Claim(ClaimTypes.NameIdentifier, id), new Claim(ClaimTypes.Name, name), new Claim(ClaimTypes.Role, role)], "test"));

    private sealed class ChangingState(ClaimsPrincipal user) : AuthenticationStateProvider
    {
        private Task<AuthenticationState> _state = Task.FromResult(new AuthenticationState(user));

        public override Task<AuthenticationState> GetAuthenticationStateAsync() => _state;

        public void Set(ClaimsPrincipal next)
        {
            _state = Task.FromResult(new AuthenticationState(next));
            NotifyAuthenticationStateChanged(_state);
        }
    }
}
