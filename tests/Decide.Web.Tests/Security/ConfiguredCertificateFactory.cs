using System.Security.Cryptography;
using System.Security.Cryptography.X509Certificates;
using Decide.Reports.Signing;
using Microsoft.AspNetCore.Hosting;

namespace Decide.Web.Tests.Security;

/// <summary>
/// The deployed service signing records with a configured certificate: a PFX protected by
/// <see cref="CertificatePassword"/> (random for each run), given as <c>Signing:CertificatePath</c> and
/// <c>Signing:CertificatePassword</c> as an operator would.
/// </summary>
public sealed class ConfiguredCertificateFactory : SecuredWebFactory
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "decide-tests", "pfx-" + Guid.NewGuid().ToString("N"));

    /// <summary>The PFX's password.</summary>
    public string CertificatePassword { get; } = "Pfx-" + Convert.ToHexString(RandomNumberGenerator.GetBytes(12));

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        base.ConfigureWebHost(builder);
        Directory.CreateDirectory(_folder);
        var path = Path.Combine(_folder, "signing.pfx");
        using (var certificate = SelfSignedCertificate.Create("Kestrel Vale Transit Authority (test)", DateTimeOffset.UtcNow.AddDays(-1), TimeSpan.FromDays(30)))
        {
            File.WriteAllBytes(path, certificate.Export(X509ContentType.Pkcs12, CertificatePassword));
        }

        builder.UseSetting("Signing:CertificatePath", path);
        builder.UseSetting("Signing:CertificatePassword", CertificatePassword);
    }

    protected override void Dispose(bool disposing)
    {
        base.Dispose(disposing);
        try
        {
            Directory.Delete(_folder, recursive: true);
        }
        catch (IOException)
        {
            // Left for the temp folder's cleaner.
        }
    }
}
