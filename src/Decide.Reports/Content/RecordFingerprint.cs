using System.Security.Cryptography;

namespace Decide.Reports.Content;

/// <summary>The fingerprint of a record: SHA-256 of the embedded evaluation file, as lower-case hex.</summary>
public static class RecordFingerprint
{
    /// <summary>SHA-256 of <paramref name="snapshot"/> in lower-case hex (64 characters).</summary>
    public static string Of(ReadOnlySpan<byte> snapshot) => Convert.ToHexStringLower(SHA256.HashData(snapshot));
}
