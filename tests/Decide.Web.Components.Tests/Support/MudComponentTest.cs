using Bunit;
using Microsoft.AspNetCore.Components;
using Microsoft.Extensions.DependencyInjection;
using MudBlazor;
using MudBlazor.Services;

namespace Decide.Web.Components.Tests.Support;

/// <summary>
/// The one base for component tests: MudBlazor's services with loose JavaScript interop, transitions off, and a
/// popover provider rendered first (selects and menus need it). MudBlazor's services can only be disposed
/// asynchronously, which xunit 2 does not do on its own: <see cref="IAsyncLifetime"/> disposes the context. A test
/// class adds its own services (authorization, fakes) in its constructor.
/// </summary>
public abstract class MudComponentTest : BunitContext, IAsyncLifetime
{
    protected MudComponentTest()
    {
        JSInterop.Mode = JSRuntimeMode.Loose;
        Services.AddMudServices(o =>
        {
            o.SnackbarConfiguration.ShowTransitionDuration = 0;
            o.SnackbarConfiguration.HideTransitionDuration = 0;
            o.PopoverOptions.CheckForPopoverProvider = false;
        });
    }

    /// <summary>False for tests of a layout that brings its own popover provider (there may be only one).</summary>
    protected virtual bool NeedsPopoverProvider => true;

    /// <summary>
    /// Runs after the derived test's constructor, which may still add services (rendering locks the container).
    /// </summary>
    public Task InitializeAsync()
    {
        // Decide's screens run interactively on the server.
        SetRendererInfo(new RendererInfo("Server", isInteractive: true));
        if (NeedsPopoverProvider)
        {
            Render<MudPopoverProvider>();
        }

        return Task.CompletedTask;
    }

    async Task IAsyncLifetime.DisposeAsync() => await DisposeAsync();
}
