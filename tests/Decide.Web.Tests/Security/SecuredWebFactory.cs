using System.Net;
using Decide.Web.Tests.Support;
using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;

namespace Decide.Web.Tests.Security;

/// <summary>
/// The service as deployed: environment Production with the <c>Security</c> section's defaults (HTTPS required,
/// the shipped sign-in limits). Clients speak HTTPS to the in-memory server by default, as they do through the proxy.
/// Every log entry is captured (<see cref="Logs"/>, all categories at Trace). The in-memory server has no network
/// connections, so a test names its client's address in the <see cref="ClientAddressHeader"/> header (loopback
/// without it); the limits count by that address.
/// </summary>
public class SecuredWebFactory : DecideWebFactory
{
    /// <summary>The request header carrying the client address a test stands for.</summary>
    public const string ClientAddressHeader = "X-Test-Client-Address";

    /// <summary>The site's public name in these tests (HSTS is never sent for localhost).</summary>
    public static readonly Uri Site = new("https://decide.example");

    public SecuredWebFactory()
    {
        ClientOptions.BaseAddress = Site;
    }

    /// <summary>Every entry the service has logged.</summary>
    public CapturedLogs Logs { get; } = new();

    protected override bool SecurityAsDeployed => true;

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        base.ConfigureWebHost(builder);
        builder.UseEnvironment("Production");

        // Outside Development the build output maps _content/* and the site's own files only with this.
        builder.UseStaticWebAssets();
        builder.UseSetting("Logging:LogLevel:Default", "Trace");
        builder.UseSetting("Logging:LogLevel:Microsoft.AspNetCore", "Trace");
        builder.UseSetting("Logging:LogLevel:Microsoft.EntityFrameworkCore", "Trace");
        builder.ConfigureLogging(logging => logging.AddProvider(Logs));
        builder.ConfigureServices(services => services.AddSingleton<IStartupFilter>(new ClientAddressFromHeader()));
    }

    /// <summary>A client as a browser: keeps cookies, does not follow redirects, comes from <paramref name="address"/>.</summary>
    public HttpClient Browser(string address, Uri? site = null)
    {
        var client = CreateClient(new WebApplicationFactoryClientOptions { BaseAddress = site ?? Site, AllowAutoRedirect = false, HandleCookies = true });
        client.DefaultRequestHeaders.Add(ClientAddressHeader, address);
        return client;
    }

    /// <summary>Sets the connection's remote address from the test's header before anything else runs.</summary>
    private sealed class ClientAddressFromHeader : IStartupFilter
    {
        public Action<IApplicationBuilder> Configure(Action<IApplicationBuilder> next) => app =>
        {
            app.Use((context, following) =>
            {
                context.Connection.RemoteIpAddress = IPAddress.TryParse(context.Request.Headers[ClientAddressHeader].ToString(), out var address)
                    ? address
                    : IPAddress.Loopback;
                return following(context);
            });
            next(app);
        };
    }
}
