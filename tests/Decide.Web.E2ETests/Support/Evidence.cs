using Deque.AxeCore.Commons;
using Deque.AxeCore.Playwright;
using Microsoft.Playwright;

namespace Decide.Web.E2ETests.Support;

/// <summary>Screenshots for people to look at, and an accessibility scan of each screen.</summary>
public static class Evidence
{
    /// <summary><c>artifacts/screenshots/</c> at the repository root.</summary>
    public static string ScreenshotFolder
    {
        get
        {
            var dir = new DirectoryInfo(AppContext.BaseDirectory);
            while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "Decide.sln")))
            {
                dir = dir.Parent;
            }

            var folder = Path.Combine(dir?.FullName ?? Path.GetTempPath(), "artifacts", "screenshots");
            Directory.CreateDirectory(folder);
            return folder;
        }
    }

    public static async Task ScreenshotAsync(IPage page, string name) =>
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(ScreenshotFolder, name + ".png"), FullPage = true });

    /// <summary>Runs axe-core on the page and fails on any serious or critical violation, naming each one and where it is.</summary>
    public static async Task AssertAccessibleAsync(IPage page, string screen)
    {
        var result = await page.RunAxe();
        var grave = result.Violations.Where(v => v.Impact is "serious" or "critical").ToArray();
        Assert.True(grave.Length == 0, $"Accessibility problems on {screen}:\n" + string.Join("\n", grave.Select(Describe)));
    }

    private static string Describe(AxeResultItem v) =>
        $"- {v.Impact} {v.Id}: {v.Help} at {string.Join(", ", v.Nodes.Take(5).Select(n => n.Target?.ToString()))}";
}
