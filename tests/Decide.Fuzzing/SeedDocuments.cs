namespace Decide.Fuzzing;

/// <summary>The valid evaluation files the mutations start from: the format's minimal example and the two samples.</summary>
public static class SeedDocuments
{
    public static IReadOnlyList<string> Paths { get; } =
    [
        Path.Combine(Root, "docs", "examples", "minimal.json"),
        Path.Combine(Root, "samples", "bus-stop-displays-importance.json"),
        Path.Combine(Root, "samples", "bus-stop-displays-pairwise.json"),
    ];

    /// <summary>Their bytes, in the order of <see cref="Paths"/>.</summary>
    public static IReadOnlyList<byte[]> All { get; } = [.. Paths.Select(File.ReadAllBytes)];

    private static string Root
    {
        get
        {
            for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
            {
                if (File.Exists(Path.Combine(dir.FullName, "Decide.sln")))
                {
                    return dir.FullName;
                }
            }

            throw new InvalidOperationException($"No folder above {AppContext.BaseDirectory} holds Decide.sln.");
        }
    }
}
