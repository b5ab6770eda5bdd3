using System.Text;

namespace Decide.Fuzzing;

/// <summary>The bytes of a case and what was done to make them.</summary>
public sealed record HostileBody(byte[] Bytes, string ContentType, string Description)
{
    /// <summary>The start of the bytes as text, control characters made visible, for failure messages.</summary>
    public string Excerpt(int length = 300)
    {
        var text = Encoding.UTF8.GetString(Bytes, 0, Math.Min(Bytes.Length, length * 4));
        text = text.Length > length ? text[..length] + "…" : text;
        return Mutator.Escape(text);
    }

    public override string ToString() => $"{Description} [{Bytes.Length} bytes, {ContentType}]";
}
