namespace Decide.Cli.Tests;

/// <summary>Finds files of the repository from the test's output folder.</summary>
internal static class RepositoryFiles
{
    /// <summary>The folder holding Decide.sln, found by walking up from the test binaries.</summary>
    public static string Root { get; } = FindRoot();

    public static string MinimalExample => Path.Combine(Root, "docs", "examples", "minimal.json");

    public static string PointsSample => Path.Combine(Root, "samples", "park-grounds-points.json");

    public static string BusStopSample => Path.Combine(Root, "samples", "bus-stop-displays-importance.json");

    private static string FindRoot()
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
