using Microsoft.AspNetCore.Hosting;

namespace Decide.Web.Tests.Security;

/// <summary>The deployed service with the per-address limit configured down to <see cref="PerAddressPermits"/> attempts a window.</summary>
public sealed class TightSignInLimitsFactory : SecuredWebFactory
{
    public const int PerAddressPermits = 20;

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        base.ConfigureWebHost(builder);
        builder.UseSetting("Security:SignIn:PerAddressPermits", PerAddressPermits.ToString(System.Globalization.CultureInfo.InvariantCulture));
    }
}
