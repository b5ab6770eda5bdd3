using System.Diagnostics;
using System.Net;
using System.Net.Sockets;
using Decide.Web.Tests.Deployment;

namespace Decide.Web.Tests.Support;

/// <summary>
/// The service as a real process (<c>dotnet Decide.Web.dll</c> from its build output, Production settings, plain HTTP
/// on a loopback port), so that a test can kill it the hard way and start it again on the same data.
/// </summary>
public sealed class ServiceProcess : IDecideHost, IDisposable
{
#if DEBUG
    private const string Configuration = "Debug";
#else
    private const string Configuration = "Release";
#endif

    private readonly Process _process;
    private readonly List<string> _output = [];

    private ServiceProcess(Process process, int port)
    {
        _process = process;
        Port = port;
        _process.OutputDataReceived += (_, e) => Keep(e.Data);
        _process.ErrorDataReceived += (_, e) => Keep(e.Data);
        _process.BeginOutputReadLine();
        _process.BeginErrorReadLine();
    }

    public int Port { get; }

    /// <summary>What the process wrote so far (for failure messages).</summary>
    public string Output
    {
        get
        {
            lock (_output)
            {
                return string.Join('\n', _output.TakeLast(60));
            }
        }
    }

    /// <summary>Starts the service with <paramref name="settings"/> (environment variables) and waits until it is ready.</summary>
    public static async Task<ServiceProcess> StartAsync(IReadOnlyDictionary<string, string> settings)
    {
        var folder = RepositoryFiles.PathOf($"src/Decide.Web/bin/{Configuration}/net10.0");
        var port = FreePort();
        var info = new ProcessStartInfo("dotnet")
        {
            ArgumentList = { Path.Combine(folder, "Decide.Web.dll") },
            WorkingDirectory = folder,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        info.Environment["ASPNETCORE_ENVIRONMENT"] = "Production";
        info.Environment["ASPNETCORE_URLS"] = $"http://127.0.0.1:{port}";
        info.Environment["Security__RequireHttps"] = "false";
        foreach (var (key, value) in settings)
        {
            info.Environment[key] = value;
        }

        var service = new ServiceProcess(Process.Start(info) ?? throw new InvalidOperationException("could not start the service"), port);
        using var probe = service.CreateClient();
        var started = Stopwatch.StartNew();
        while (!await ReadyAsync(probe))
        {
            Assert.False(service._process.HasExited, "the service stopped:\n" + service.Output);
            Assert.True(started.Elapsed < TimeSpan.FromMinutes(3), "the service was not ready within three minutes:\n" + service.Output);
            await Task.Delay(250);
        }

        return service;
    }

    public HttpClient CreateClient() => new() { BaseAddress = new Uri($"http://127.0.0.1:{Port}"), Timeout = TimeSpan.FromSeconds(30) };

    public Task<HttpClient> SignInAsync(string email, string password = Decide.Web.Features.Accounts.DemoSeeder.DemoPassword) =>
        BearerSignIn.SignInAsync(CreateClient(), email, password);

    /// <summary>SIGKILL: no shutdown, no flushing, as when the machine or the container runtime kills the process.</summary>
    public async Task KillAsync()
    {
        _process.Kill(entireProcessTree: true);
        await _process.WaitForExitAsync();
    }

    public void Dispose()
    {
        if (!_process.HasExited)
        {
            _process.Kill(entireProcessTree: true);
            _process.WaitForExit();
        }

        _process.Dispose();
    }

    private void Keep(string? line)
    {
        if (line is null)
        {
            return;
        }

        lock (_output)
        {
            _output.Add(line);
        }
    }

    private static async Task<bool> ReadyAsync(HttpClient http)
    {
        try
        {
            return (await http.GetAsync("/health/ready")).StatusCode == HttpStatusCode.OK;
        }
        catch (Exception e) when (e is HttpRequestException or TaskCanceledException)
        {
            return false;
        }
    }

    /// <summary>A loopback port nobody listens on right now.</summary>
    public static int FreePort()
    {
        using var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        return ((IPEndPoint)listener.LocalEndpoint).Port;
    }
}
