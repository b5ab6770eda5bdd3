using System.Text;

namespace Decide.Fuzzing;

/// <summary>Applies a <see cref="ByteMutation"/> to written bytes.</summary>
public static class ByteMutator
{
    public static byte[] Apply(byte[] bytes, ByteMutation mutation)
    {
        var at = bytes.Length == 0 ? 0 : mutation.Position % bytes.Length;
        var garbage = HostileValues.Garbage[mutation.Choice % HostileValues.Garbage.Length];
        switch (mutation.Kind)
        {
            case ByteMutationKind.Truncate:
                return bytes[..at];
            case ByteMutationKind.Insert:
                return [.. bytes[..at], .. garbage, .. bytes[at..]];
            case ByteMutationKind.FlipBit:
                var flipped = bytes.ToArray();
                if (flipped.Length > 0)
                {
                    flipped[at] ^= (byte)(1 << (mutation.Choice % 8));
                }

                return flipped;
            case ByteMutationKind.Append:
                return [.. bytes, .. garbage];
            case ByteMutationKind.Utf16:
                return [.. Encoding.Unicode.GetPreamble(), .. Encoding.Unicode.GetBytes(Encoding.UTF8.GetString(bytes))];
            case ByteMutationKind.DoubleBom:
                return [0xEF, 0xBB, 0xBF, 0xEF, 0xBB, 0xBF, .. bytes];
            default:
                throw new ArgumentOutOfRangeException(nameof(mutation), mutation.Kind, "unknown byte mutation");
        }
    }
}
