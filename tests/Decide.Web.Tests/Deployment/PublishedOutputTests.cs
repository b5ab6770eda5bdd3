using System.Diagnostics;
using System.Net;
using System.Text.Json;

namespace Decide.Web.Tests.Deployment;

/// <summary>
/// The container's entrypoint and environment, outside a container: the published output started with
/// <c>dotnet Decide.Web.dll</c> and the Dockerfile's settings (production, port from ASPNETCORE_HTTP_PORTS, data in
/// its own folder, JSON logs), probed by the container's own health-check script.
/// </summary>
public sealed class PublishedOutputTests : IDisposable
{
#if DEBUG
    private const string Configuration = "Debug";
#else
    private const string Configuration = "Release";
#endif

    private readonly string _folder = Path.Combine(Path.GetTempPath(), "decide-published", Guid.NewGuid().ToString("N"));

    [Fact]
    public async Task The_published_service_starts_with_the_container_settings_answers_its_probes_and_logs_json_lines()
    {
        var output = Path.Combine(_folder, "app");
        var data = Path.Combine(_folder, "data");
        Directory.CreateDirectory(data);
        var publish = await RunAsync("dotnet", ["publish", RepositoryFiles.PathOf("src/Decide.Web/Decide.Web.csproj"), "-c", Configuration, "--no-build", "-o", output, "-nologo"], null);
        Assert.True(publish.ExitCode == 0, publish.Output);

        var port = Support.ServiceProcess.FreePort();
        var environment = new Dictionary<string, string>
        {
            ["ASPNETCORE_HTTP_PORTS"] = port.ToString(System.Globalization.CultureInfo.InvariantCulture),
            ["ASPNETCORE_ENVIRONMENT"] = "Production",
            ["ASPNETCORE_URLS"] = "",
            ["Database__DataFolder"] = data,
            ["Logging__Format"] = "json",
            ["Logging__LogLevel__Microsoft.AspNetCore.Hosting.Diagnostics"] = "Information",
        };
        using var service = Start("dotnet", [Path.Combine(output, "Decide.Web.dll")], output, environment);
        var lines = new List<string>();
        service.OutputDataReceived += (_, e) => { if (e.Data is not null) { lock (lines) { lines.Add(e.Data); } } };
        service.BeginOutputReadLine();
        service.BeginErrorReadLine();

        using var http = new HttpClient { BaseAddress = new Uri($"http://127.0.0.1:{port}"), Timeout = TimeSpan.FromSeconds(10) };
        var started = Stopwatch.StartNew();
        while (!await AnswersAsync(http, "/health/live"))
        {
            Assert.False(service.HasExited, "the service stopped: " + string.Join("\n", lines));
            Assert.True(started.Elapsed < TimeSpan.FromMinutes(3), "the service did not answer within three minutes");
            await Task.Delay(500);
        }

        var probe = await RunAsync("bash", [RepositoryFiles.PathOf("deploy/healthcheck.sh")], environment);
        Assert.True(probe.ExitCode == 0, "health check: " + probe.Output);
        Assert.Equal(HttpStatusCode.OK, (await http.GetAsync("/health/ready")).StatusCode);
        Assert.True(File.Exists(Path.Combine(data, "decide.db")), "the database lives in the data folder");

        // Every line on standard output is one JSON object; a request's entries carry its request id.
        await Task.Delay(500);
        string[] logged;
        lock (lines)
        {
            logged = lines.ToArray();
        }

        Assert.NotEmpty(logged);
        var notJson = logged.Where(l => !l.TrimStart().StartsWith('{')).ToArray();
        Assert.True(notJson.Length == 0, "lines that are not JSON: " + string.Join(" | ", notJson.Take(5)));
        var entries = logged.Select(l => JsonDocument.Parse(l).RootElement.Clone()).ToArray();
        Assert.All(entries, e => Assert.True(e.TryGetProperty("LogLevel", out _) && e.TryGetProperty("Category", out _)));
        Assert.Contains(entries, e => e.GetProperty("Message").GetString()!.Contains("/health/ready", StringComparison.Ordinal)
            && e.TryGetProperty("Scopes", out var scopes) && scopes.GetRawText().Contains("RequestId", StringComparison.Ordinal));

        service.Kill(entireProcessTree: true);
        await service.WaitForExitAsync();
        var down = await RunAsync("bash", [RepositoryFiles.PathOf("deploy/healthcheck.sh")], environment);
        Assert.NotEqual(0, down.ExitCode);
    }

    private static async Task<bool> AnswersAsync(HttpClient http, string path)
    {
        try
        {
            return (await http.GetAsync(path)).StatusCode == HttpStatusCode.OK;
        }
        catch (HttpRequestException)
        {
            return false;
        }
        catch (TaskCanceledException)
        {
            return false;
        }
    }

    private static Process Start(string file, IEnumerable<string> args, string? directory, IReadOnlyDictionary<string, string>? environment)
    {
        var info = new ProcessStartInfo(file) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var a in args)
        {
            info.ArgumentList.Add(a);
        }

        if (directory is not null)
        {
            info.WorkingDirectory = directory;
        }

        foreach (var (key, value) in environment ?? new Dictionary<string, string>())
        {
            info.Environment[key] = value;
        }

        return Process.Start(info) ?? throw new InvalidOperationException($"could not start {file}");
    }

    private static async Task<(int ExitCode, string Output)> RunAsync(string file, IEnumerable<string> args, IReadOnlyDictionary<string, string>? environment)
    {
        using var process = Start(file, args, null, environment);
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        await process.WaitForExitAsync();
        return (process.ExitCode, await stdout + await stderr);
    }

    public void Dispose()
    {
        try
        {
            Directory.Delete(_folder, recursive: true);
        }
        catch (IOException)
        {
            // Left for the temp folder's cleaner.
        }
    }
}
