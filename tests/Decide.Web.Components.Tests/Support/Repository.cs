namespace Decide.Web.Components.Tests.Support;

/// <summary>Finds the repository's files from the test's output folder.</summary>
internal static class Repository
{
    /// <summary>The folder holding Decide.sln.</summary>
    public static string Root { get; } = FindRoot();

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
