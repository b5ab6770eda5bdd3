using System.Text;

namespace Decide.Fuzzing;

/// <summary>
/// One generated hostile input: which valid document it starts from and what is done to it (or random bytes). It
/// is a recipe rather than the bytes, so that FsCheck can shrink it (fewer mutations, shorter random bytes) and the
/// failure message names each step; <see cref="Render"/> makes the bytes.
/// </summary>
public sealed record HostileCase(
    HostileCaseKind Kind,
    int Document,
    IReadOnlyList<TreeMutation> Mutations,
    ByteMutation? Bytes,
    int ContentType,
    int RandomSeed,
    int RandomLength)
{
    private static readonly string[] Tokens =
    [
        "{", "}", "[", "]", ":", ",", "\"", "\"format\"", "\"decide-evaluation/1\"", "\"criteria\"", "\"ratings\"", "\"id\"",
        "\"term\"", "1", "-1e400", "null", "true", "0.5", "\"x\"", " ", "\n", "\\", "\"\\ud800\"", "NaN",
    ];

    /// <summary>
    /// The bytes for this case, starting from one of <paramref name="documents"/> (picked modulo their number), with
    /// the content type a client would send them with.
    /// </summary>
    public HostileBody Render(IReadOnlyList<byte[]> documents)
    {
        var contentType = HostileValues.ContentTypes[ContentType % HostileValues.ContentTypes.Length] ?? "";
        switch (Kind)
        {
            case HostileCaseKind.RandomBytes:
                var bytes = new byte[RandomLength];
                new Random(RandomSeed).NextBytes(bytes);
                return new HostileBody(bytes, contentType, $"{RandomLength} random bytes (seed {RandomSeed})");
            case HostileCaseKind.TokenSoup:
                var random = new Random(RandomSeed);
                var soup = string.Concat(Enumerable.Range(0, RandomLength).Select(_ => Tokens[random.Next(Tokens.Length)]));
                return new HostileBody(Encoding.UTF8.GetBytes(soup), contentType, $"{RandomLength} random JSON tokens (seed {RandomSeed})");
        }

        var root = JsonTree.Parse(documents[Document % documents.Count]);
        var steps = new List<string> { $"document {Document % documents.Count}" };
        foreach (var mutation in Mutations)
        {
            var before = root.Clone();
            (root, var step) = Mutator.Apply(root, mutation);
            if (JsonTree.Size(root) > HostileValues.MaxDocumentBytes)
            {
                (root, step) = (before, step + " (undone: over the size budget)");
            }

            steps.Add(step);
        }

        var written = JsonTree.Write(root);
        if (Bytes is { } b)
        {
            written = ByteMutator.Apply(written, b);
            steps.Add(b.ToString());
        }

        return new HostileBody(written, contentType, string.Join("; ", steps));
    }

    /// <summary>Simpler cases that may fail the same way: one mutation fewer, no byte change, fewer random bytes, plain JSON.</summary>
    public IEnumerable<HostileCase> Shrink()
    {
        if (ContentType != 0)
        {
            yield return this with { ContentType = 0 };
        }

        if (Kind != HostileCaseKind.Mutated)
        {
            if (RandomLength > 0)
            {
                yield return this with { RandomLength = RandomLength / 2 };
                yield return this with { RandomLength = RandomLength - 1 };
            }

            yield break;
        }

        if (Bytes is not null)
        {
            yield return this with { Bytes = null };
        }

        for (var i = 0; i < Mutations.Count; i++)
        {
            yield return this with { Mutations = [.. Mutations.Take(i), .. Mutations.Skip(i + 1)] };
        }

        if (Document != 0)
        {
            yield return this with { Document = 0 };
        }
    }

    public override string ToString() => Kind == HostileCaseKind.Mutated
        ? $"Mutated(document {Document}, [{string.Join(", ", Mutations)}], bytes {Bytes?.ToString() ?? "unchanged"}, content type {ContentType})"
        : $"{Kind}(seed {RandomSeed}, length {RandomLength}, content type {ContentType})";
}
