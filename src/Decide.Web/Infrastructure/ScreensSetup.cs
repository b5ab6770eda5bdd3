using Decide.Web.Components;
using Decide.Web.Components.Account;
using Microsoft.AspNetCore.Components.Authorization;
using Microsoft.AspNetCore.Components.Server.Circuits;
using MudBlazor;
using MudBlazor.Services;

namespace Decide.Web.Infrastructure;

/// <summary>
/// The screens: Blazor components rendered interactively on the server (MudBlazor), the sign-in form posts, and
/// the static assets (Decide's own from the repository's wwwroot/, MudBlazor's and the framework's).
/// </summary>
public static class ScreensSetup
{
    public static WebApplicationBuilder AddDecideScreens(this WebApplicationBuilder builder)
    {
        builder.Services.AddRazorComponents().AddInteractiveServerComponents()
            .AddHubOptions(o => o.MaximumReceiveMessageSize = RequestLimits.MaxCircuitMessageBytes);
        builder.Services.AddCascadingAuthenticationState();
        builder.Services.AddScoped<AuthenticationStateProvider, SignedInStateProvider>();
        builder.Services.AddScoped<CircuitHandler, CircuitUserHandler>();
        builder.Services.AddMudServices(o =>
        {
            o.SnackbarConfiguration.PositionClass = Defaults.Classes.Position.BottomRight;
            o.SnackbarConfiguration.VisibleStateDuration = 8000;
            o.SnackbarConfiguration.PreventDuplicates = true;
        });
        return builder;
    }

    public static WebApplication MapDecideScreens(this WebApplication app)
    {
        app.UseDecideAntiforgery();
        app.MapStaticAssets();
        app.MapSignInEndpoints();
        app.MapRazorComponents<App>().AddInteractiveServerRenderMode();
        return app;
    }
}
