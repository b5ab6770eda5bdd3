using Microsoft.Playwright;

namespace Decide.Web.E2ETests.Support;

/// <summary>
/// One running service and one headless Chromium for a test class. Playwright cannot download browsers here: it
/// drives Debian's chromium package (<c>DECIDE_CHROMIUM</c> overrides the path). A missing or broken browser fails
/// every test at once with a message saying what to install, instead of hanging.
/// </summary>
public sealed class BrowserSite : IAsyncLifetime
{
    private const float LaunchTimeoutMs = 60_000;

    private IPlaywright? _playwright;

    public DecideServer Server { get; } = new();

    public IBrowser Browser { get; private set; } = default!;

    public static string ChromiumPath => Environment.GetEnvironmentVariable("DECIDE_CHROMIUM") is { Length: > 0 } path ? path : "/usr/bin/chromium";

    public async Task InitializeAsync()
    {
        if (!File.Exists(ChromiumPath))
        {
            throw new InvalidOperationException(
                $"No Chromium at {ChromiumPath}. Install Debian's chromium package (./test.sh does so through scripts/prerequisites.sh), or set DECIDE_CHROMIUM to a Chromium executable.");
        }

        _playwright = await Playwright.CreateAsync();
        try
        {
            Browser = await _playwright.Chromium.LaunchAsync(new BrowserTypeLaunchOptions
            {
                ExecutablePath = ChromiumPath,
                Headless = true,
                Timeout = LaunchTimeoutMs,
                Args =
                [
                    "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
                    "--disable-component-update", "--disable-sync", "--disable-dev-shm-usage",
                ],
            });
        }
        catch (Exception e) when (e is PlaywrightException or TimeoutException)
        {
            throw new InvalidOperationException(
                $"Chromium at {ChromiumPath} could not be started (the wait is at most {LaunchTimeoutMs / 1000:0} s): {e.Message.Split('\n')[0].TrimEnd('.')}. Check that Debian's chromium package is installed and runs headless: chromium --headless --no-sandbox --dump-dom about:blank", e);
        }
    }

    /// <summary>A fresh browser context (own cookies) with a page of the given size; every request and console message is watched.</summary>
    public async Task<(IBrowserContext Context, IPage Page, PageWatch Watch)> OpenAsync(int width = 1280, int height = 800)
    {
        var context = await Browser.NewContextAsync(new BrowserNewContextOptions
        {
            BaseURL = Server.BaseUrl,
            ViewportSize = new ViewportSize { Width = width, Height = height },
            Locale = "en-GB",
        });
        context.SetDefaultTimeout(30_000);
        var page = await context.NewPageAsync();
        return (context, page, new PageWatch(page));
    }

    public async Task DisposeAsync()
    {
        if (Browser is not null)
        {
            await Browser.DisposeAsync();
        }

        _playwright?.Dispose();
        await Server.DisposeAsync();
    }
}
