using Microsoft.Playwright;

namespace Decide.Web.E2ETests.Support;

/// <summary>Collects what went wrong on a page: responses of 400 or more, failed requests, console errors and script errors.</summary>
public sealed class PageWatch
{
    private readonly List<string> _problems = [];

    public PageWatch(IPage page)
    {
        page.Response += (_, response) =>
        {
            if (response.Status >= 400)
            {
                Add($"{response.Status} {response.Request.Method} {response.Url}");
            }
        };
        page.RequestFailed += (_, request) =>
        {
            // A request the page itself abandoned by navigating away is not a failure of the service.
            if (request.Failure is not "net::ERR_ABORTED")
            {
                Add($"request failed ({request.Failure}): {request.Method} {request.Url}");
            }
        };
        page.Console += (_, message) =>
        {
            if (message.Type == "error")
            {
                Add($"console error: {message.Text}");
            }
        };
        page.PageError += (_, error) => Add($"script error: {error}");
    }

    /// <summary>Fails the test with every problem seen so far.</summary>
    public void AssertClean()
    {
        lock (_problems)
        {
            Assert.True(_problems.Count == 0, "The browser saw problems:\n" + string.Join("\n", _problems));
        }
    }

    private void Add(string problem)
    {
        lock (_problems)
        {
            _problems.Add(problem);
        }
    }
}
