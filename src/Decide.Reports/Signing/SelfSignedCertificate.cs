using System.Security.Cryptography;
using System.Security.Cryptography.X509Certificates;

namespace Decide.Reports.Signing;

/// <summary>
/// A throw-away signing certificate for when no certificate is configured. A signature made with it still proves
/// that the file is unchanged since signing, but not who signed it: anyone can make such a certificate.
/// </summary>
public static class SelfSignedCertificate
{
    /// <summary>What the record prints when it is signed with a self-signed certificate.</summary>
    public const string Note =
        "Signed with a self-signed certificate: the signature proves the file is unchanged since signing, not who signed it.";

    /// <summary>
    /// Creates an RSA 3072-bit certificate for <paramref name="subjectName"/> (a plain name; it becomes the CN), valid
    /// from <paramref name="notBefore"/> for <paramref name="validity"/>, with the digital-signature and non-repudiation
    /// key usages. The private key is exportable so that it can be used by the signer on every platform.
    /// </summary>
    public static X509Certificate2 Create(string subjectName, DateTimeOffset notBefore, TimeSpan validity)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(subjectName);
        using var rsa = RSA.Create(3072);
        var subject = new X500DistinguishedNameBuilder();
        subject.AddCommonName(subjectName);
        var request = new CertificateRequest(subject.Build(), rsa, HashAlgorithmName.SHA256, RSASignaturePadding.Pkcs1);
        request.CertificateExtensions.Add(new X509KeyUsageExtension(X509KeyUsageFlags.DigitalSignature | X509KeyUsageFlags.NonRepudiation, critical: true));
        request.CertificateExtensions.Add(new X509BasicConstraintsExtension(false, false, 0, critical: true));
        request.CertificateExtensions.Add(new X509SubjectKeyIdentifierExtension(request.PublicKey, critical: false));
        using var created = request.CreateSelfSigned(notBefore, notBefore + validity);
        // Round-trip through PKCS#12 so the key is a persisted, usable private key on every platform.
        return X509CertificateLoader.LoadPkcs12(created.Export(X509ContentType.Pkcs12), password: null, X509KeyStorageFlags.Exportable);
    }

    /// <summary>Whether <paramref name="certificate"/> is its own issuer.</summary>
    public static bool IsSelfSigned(X509Certificate2 certificate)
    {
        ArgumentNullException.ThrowIfNull(certificate);
        return certificate.SubjectName.RawData.AsSpan().SequenceEqual(certificate.IssuerName.RawData);
    }
}
