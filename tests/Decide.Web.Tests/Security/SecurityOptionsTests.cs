using Decide.Web.Infrastructure;

namespace Decide.Web.Tests.Security;

/// <summary>Settings of section <c>Security</c> that make no sense stop the service with a sentence naming the setting.</summary>
public sealed class SecurityOptionsTests
{
    [Fact]
    public void The_shipped_settings_are_valid()
    {
        Assert.Empty(new SecurityOptions().Problems());
    }

    [Theory]
    [InlineData(0, 300, 60, 443, "Security:SignIn:PerAccountPermits must be at least 1 (it is 0).")]
    [InlineData(10, 5, 60, 443, "Security:SignIn:PerAddressPermits must be at least PerAccountPermits (10); it is 5.")]
    [InlineData(10, 300, 0, 443, "Security:SignIn:WindowSeconds must be at least 1 (it is 0).")]
    [InlineData(10, 300, 60, 70000, "Security:HttpsPort must be a port number between 1 and 65535 (it is 70000).")]
    public void A_setting_out_of_range_is_named_with_its_value(int perAccount, int perAddress, int window, int httpsPort, string problem)
    {
        var options = new SecurityOptions
        {
            HttpsPort = httpsPort,
            SignIn = new SignInLimitOptions { PerAccountPermits = perAccount, PerAddressPermits = perAddress, WindowSeconds = window },
        };
        Assert.Equal([problem], options.Problems());
    }
}
