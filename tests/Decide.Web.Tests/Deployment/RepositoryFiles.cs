namespace Decide.Web.Tests.Deployment;

/// <summary>Finds files of the repository from the test's output folder.</summary>
public static class RepositoryFiles
{
    /// <summary>The folder holding Decide.sln.</summary>
    public static string Root { get; } = FindRoot();

    public static string PathOf(string relative) => Path.Combine(Root, relative);

    private static string FindRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "Decide.sln")))
            {
                return dir.FullName;
            }
        }

        throw new InvalidOperationException("Decide.sln not found above " + AppContext.BaseDirectory);
    }
}
