using System.Security.Cryptography;
using System.Security.Cryptography.X509Certificates;
using Decide.Reports.Signing;
using Decide.Data.Storage;
using Decide.Web.Infrastructure;
using Microsoft.AspNetCore.DataProtection;

namespace Decide.Web.Features.Records;

/// <summary>Where the certificate that signs evaluation records comes from (section <c>Signing</c>).</summary>
public sealed class SigningOptions
{
    public const string Section = "Signing";

    /// <summary>A PFX (PKCS #12) file with the organisation's signing certificate and its private key.</summary>
    public string? CertificatePath { get; set; }

    /// <summary>The PFX's password; give it through a secret store or the environment (Signing__CertificatePassword), never in a file in the repository.</summary>
    public string? CertificatePassword { get; set; }

    /// <summary>
    /// Reads the section at start and refuses, naming the setting, a certificate file that is not there: the
    /// mistake shows when the service starts, not when the first record is signed.
    /// </summary>
    /// <exception cref="InvalidOperationException">Signing:CertificatePath names no file.</exception>
    public static SigningOptions Read(IConfiguration configuration, string contentRoot) =>
        StartupSettings.Read<SigningOptions>(configuration, Section, o => o.Problems(contentRoot));

    /// <summary>Every setting that cannot be used, each a sentence naming its key; paths are relative to <paramref name="contentRoot"/>.</summary>
    public IEnumerable<string> Problems(string contentRoot)
    {
        if (!string.IsNullOrWhiteSpace(CertificatePath) && !File.Exists(Path.GetFullPath(CertificatePath, contentRoot)))
        {
            yield return
                $"Signing:CertificatePath '{Path.GetFullPath(CertificatePath, contentRoot)}' does not exist; give the path of a PFX file with the signing certificate and its private key, or leave the setting out to sign with the service's own certificate.";
        }
    }
}

/// <summary>
/// The certificate that signs evaluation records: the configured PFX, or, without one, a self-signed certificate
/// the service creates once and keeps in its data folder, encrypted with Data Protection. A self-signed signature
/// proves the file is unchanged since signing, not who signed it; the screens and the record say so.
/// </summary>
public sealed class SigningCertificate(SigningOptions options, DatabaseOptions database, IWebHostEnvironment environment,
    IDataProtectionProvider protection, TimeProvider clock, ILogger<SigningCertificate> log)
{
    private readonly Lazy<X509Certificate2> _certificate = new(() => Load(options, database, environment, protection, clock, log));

    /// <summary>The certificate with its private key.</summary>
    public X509Certificate2 Certificate => _certificate.Value;

    /// <summary>True when no certificate is configured and the service signs with its own.</summary>
    public bool SelfSigned => SelfSignedCertificate.IsSelfSigned(Certificate);

    private static X509Certificate2 Load(SigningOptions options, DatabaseOptions database, IWebHostEnvironment environment,
        IDataProtectionProvider protection, TimeProvider clock, ILogger log)
    {
        if (!string.IsNullOrWhiteSpace(options.CertificatePath))
        {
            var path = Path.GetFullPath(options.CertificatePath, environment.ContentRootPath);
            var certificate = X509CertificateLoader.LoadPkcs12FromFile(path, options.CertificatePassword, X509KeyStorageFlags.EphemeralKeySet);
            if (!certificate.HasPrivateKey)
            {
                throw new InvalidOperationException($"Signing:CertificatePath '{path}' holds no private key; a signing certificate needs one.");
            }

            log.LogInformation("Signing evaluation records with {Subject} ({Thumbprint})", certificate.Subject, certificate.Thumbprint);
            return certificate;
        }

        var folder = Path.GetFullPath(database.DataFolder, environment.ContentRootPath);
        var file = Path.Combine(folder, "signing-certificate.protected");
        var protector = protection.CreateProtector("Decide.SelfSignedRecordCertificate");
        if (File.Exists(file))
        {
            try
            {
                return X509CertificateLoader.LoadPkcs12(protector.Unprotect(File.ReadAllBytes(file)), null, X509KeyStorageFlags.EphemeralKeySet);
            }
            catch (CryptographicException e)
            {
                // Protected with keys this database does not hold (its key ring was lost or the file came from another
                // installation). Records already signed stay verifiable: each carries its certificate. Keep the old
                // file for the operator and make a new certificate.
                var aside = $"{file}.unreadable-{clock.GetUtcNow():yyyyMMddHHmmss}";
                File.Move(file, aside);
                log.LogWarning(e, "The self-signed record certificate {File} cannot be decrypted with this database's keys; moved it to {Aside} and created a new one.", file, aside);
            }
        }

        using var created = SelfSignedCertificate.Create("Decide evaluation records (self-signed)", clock.GetUtcNow(), TimeSpan.FromDays(3650));
        var pfx = created.Export(X509ContentType.Pkcs12);
        Directory.CreateDirectory(folder);
        File.WriteAllBytes(file, protector.Protect(pfx));
        log.LogWarning("No Signing:CertificatePath configured: created a self-signed certificate for evaluation records ({File}). It proves a record is unchanged, not who signed it.", file);
        return X509CertificateLoader.LoadPkcs12(pfx, null, X509KeyStorageFlags.EphemeralKeySet);
    }
}
