using Microsoft.AspNetCore.Components.Authorization;
using Microsoft.AspNetCore.Components.Server.Circuits;

namespace Decide.Web.Infrastructure;

/// <summary>
/// Gives an interactive circuit's <see cref="CurrentUser"/> the circuit's user before any screen renders, and keeps
/// it current when the authentication state changes (for example when revalidation signs the user out).
/// </summary>
public sealed class CircuitUserHandler(AuthenticationStateProvider authentication, CurrentUser user) : CircuitHandler, IDisposable
{
    public override async Task OnCircuitOpenedAsync(Circuit circuit, CancellationToken cancellationToken)
    {
        authentication.AuthenticationStateChanged += Changed;
        user.UseCircuitUser((await authentication.GetAuthenticationStateAsync()).User);
    }

    public void Dispose() => authentication.AuthenticationStateChanged -= Changed;

    private void Changed(Task<AuthenticationState> state) => _ = Update(state);

    private async Task Update(Task<AuthenticationState> state) => user.UseCircuitUser((await state).User);
}
