using System.Formats.Asn1;
using System.Security.Cryptography;
using System.Security.Cryptography.Pkcs;
using System.Security.Cryptography.X509Certificates;

namespace Decide.Reports.Verification;

/// <summary>
/// A decoded CMS (PKCS#7) detached signature, checked in two separate steps: the signer's signature over the signed
/// attributes (does not involve the document), and the message digest those attributes carry against the document.
/// </summary>
internal sealed class CmsSignature
{
    private const string MessageDigestOid = "1.2.840.113549.1.9.4";

    private readonly SignedCms _cms;

    private CmsSignature(SignedCms cms, SignerInfo signer)
    {
        _cms = cms;
        Signer = signer;
    }

    public SignerInfo Signer { get; }

    public X509Certificate2? Certificate => Signer.Certificate;

    public static CmsSignature? Decode(byte[] signature, out string problem)
    {
        problem = "";
        try
        {
            // The /Contents string is zero-padded to its reserved size: decode exactly one encoded value.
            AsnDecoder.ReadEncodedValue(signature, AsnEncodingRules.BER, out _, out _, out var length);
            var cms = new SignedCms(new ContentInfo([]), detached: true);
            cms.Decode(signature.AsSpan(0, length));
            if (cms.SignerInfos.Count != 1)
            {
                problem = $"The signature holds {cms.SignerInfos.Count} signers; a record has exactly one.";
                return null;
            }

            return new CmsSignature(cms, cms.SignerInfos[0]);
        }
        catch (Exception ex) when (ex is CryptographicException or AsnContentException)
        {
            problem = $"The signature is not a readable CMS signature ({ex.Message.TrimEnd('.')}).";
            return null;
        }
    }

    /// <summary>Verifies the signer's signature over the signed attributes with the public key of the embedded certificate.</summary>
    public bool SignatureVerifies(out string problem)
    {
        problem = "";
        if (Certificate is not { } certificate)
        {
            problem = "The signature does not include the signer's certificate, so it cannot be checked.";
            return false;
        }

        if (Signer.SignedAttributes.Count == 0)
        {
            // Without signed attributes the signature is made over the document's digest itself. For RSA with
            // PKCS#1 v1.5 the signed digest can be recovered with the public key, which checks the signature on its
            // own; comparing that digest with the document is the separate "unchanged" check.
            if (RecoveredDigest(certificate, out problem) is not null)
            {
                return true;
            }

            return false;
        }

        var signedAttributes = EncodeSignedAttributes();
        var signature = Signer.GetSignature();
        var hash = HashName(Signer.DigestAlgorithm.Value);
        if (hash is null)
        {
            problem = $"The digest algorithm {Signer.DigestAlgorithm.Value} is not supported.";
            return false;
        }

        using var rsa = certificate.GetRSAPublicKey();
        if (rsa is not null)
        {
            var padding = Signer.SignatureAlgorithm.Value == "1.2.840.113549.1.1.10" ? RSASignaturePadding.Pss : RSASignaturePadding.Pkcs1;
            if (rsa.VerifyData(signedAttributes, signature, hash.Value, padding))
            {
                return true;
            }

            problem = "The signature value does not verify with the signer's public key.";
            return false;
        }

        using var ecdsa = certificate.GetECDsaPublicKey();
        if (ecdsa is not null)
        {
            if (ecdsa.VerifyData(signedAttributes, signature, hash.Value, DSASignatureFormat.Rfc3279DerSequence))
            {
                return true;
            }

            problem = "The signature value does not verify with the signer's public key.";
            return false;
        }

        problem = "The signer's key type is not supported (RSA or ECDSA expected).";
        return false;
    }

    /// <summary>Whether the signed message digest equals the digest of <paramref name="content"/>.</summary>
    public bool DigestMatches(byte[] content, out string algorithm)
    {
        var hash = HashName(Signer.DigestAlgorithm.Value);
        algorithm = hash?.Name ?? Signer.DigestAlgorithm.Value ?? "unknown";
        var signed = Signer.SignedAttributes.Count == 0 && Certificate is { } certificate ? RecoveredDigest(certificate, out _) : SignedDigest();
        if (hash is null || signed is null)
        {
            return false;
        }

        var actual = hash.Value.Name switch
        {
            "SHA384" => SHA384.HashData(content),
            "SHA512" => SHA512.HashData(content),
            _ => SHA256.HashData(content),
        };
        if (!CryptographicOperations.FixedTimeEquals(actual, signed))
        {
            return false;
        }

        // The digest matches: let the platform confirm the whole signature over this content too.
        try
        {
            var full = new SignedCms(new ContentInfo(content), detached: true);
            full.Decode(_cms.Encode());
            full.CheckSignature(verifySignatureOnly: true);
            return true;
        }
        catch (CryptographicException)
        {
            return false;
        }
    }

    private byte[]? SignedDigest()
    {
        foreach (var attribute in Signer.SignedAttributes)
        {
            if (attribute.Oid.Value == MessageDigestOid && attribute.Values.Count == 1)
            {
                return new Pkcs9MessageDigest { RawData = attribute.Values[0].RawData }.MessageDigest;
            }
        }

        return null;
    }

    /// <summary>
    /// The digest an RSA PKCS#1 v1.5 signature was made over, recovered with the public key (RFC 8017, 8.2.2): the
    /// signature raised to the public exponent must be 00 01 FF…FF 00 followed by a DigestInfo naming the signer's digest
    /// algorithm. Null, with the reason, when the signature does not have that form under this key.
    /// </summary>
    private byte[]? RecoveredDigest(X509Certificate2 certificate, out string problem)
    {
        problem = "";
        using var rsa = certificate.GetRSAPublicKey();
        if (rsa is null)
        {
            problem = "The signature has no signed attributes and the key is not RSA, so the signature cannot be checked apart from the document.";
            return null;
        }

        var key = rsa.ExportParameters(includePrivateParameters: false);
        var signature = Signer.GetSignature();
        var modulus = new System.Numerics.BigInteger(key.Modulus, isUnsigned: true, isBigEndian: true);
        var value = new System.Numerics.BigInteger(signature, isUnsigned: true, isBigEndian: true);
        if (signature.Length != key.Modulus!.Length || value >= modulus)
        {
            problem = "The signature value does not fit the signer's RSA key.";
            return null;
        }

        var message = System.Numerics.BigInteger.ModPow(value, new System.Numerics.BigInteger(key.Exponent, isUnsigned: true, isBigEndian: true), modulus)
            .ToByteArray(isUnsigned: true, isBigEndian: true);
        var encoded = new byte[key.Modulus.Length];
        message.CopyTo(encoded, encoded.Length - message.Length);
        var i = 2;
        if (encoded[0] != 0 || encoded[1] != 1)
        {
            problem = "The signature value does not verify with the signer's public key.";
            return null;
        }

        while (i < encoded.Length && encoded[i] == 0xFF)
        {
            i++;
        }

        if (i < 10 || i >= encoded.Length || encoded[i] != 0)
        {
            problem = "The signature value does not verify with the signer's public key.";
            return null;
        }

        try
        {
            var reader = new AsnReader(encoded.AsMemory(i + 1), AsnEncodingRules.DER);
            var digestInfo = reader.ReadSequence();
            var algorithm = digestInfo.ReadSequence();
            var oid = algorithm.ReadObjectIdentifier();
            var digest = digestInfo.ReadOctetString();
            if (oid != Signer.DigestAlgorithm.Value || reader.HasData || digestInfo.HasData)
            {
                problem = "The signature names a different digest algorithm from the signer information.";
                return null;
            }

            return digest;
        }
        catch (AsnContentException)
        {
            problem = "The signature value does not verify with the signer's public key.";
            return null;
        }
    }

    private byte[] EncodeSignedAttributes()
    {
        // The signature covers the DER encoding of the signed attributes as a SET OF Attribute (RFC 5652, 5.4).
        var writer = new AsnWriter(AsnEncodingRules.DER);
        using (writer.PushSetOf())
        {
            foreach (var attribute in Signer.SignedAttributes)
            {
                using (writer.PushSequence())
                {
                    writer.WriteObjectIdentifier(attribute.Oid.Value!);
                    using (writer.PushSetOf())
                    {
                        foreach (var value in attribute.Values)
                        {
                            writer.WriteEncodedValue(value.RawData);
                        }
                    }
                }
            }
        }

        return writer.Encode();
    }

    private static HashAlgorithmName? HashName(string? oid) => oid switch
    {
        "2.16.840.1.101.3.4.2.1" => HashAlgorithmName.SHA256,
        "2.16.840.1.101.3.4.2.2" => HashAlgorithmName.SHA384,
        "2.16.840.1.101.3.4.2.3" => HashAlgorithmName.SHA512,
        _ => null,
    };
}
