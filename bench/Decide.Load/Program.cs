using System.CommandLine;
using System.Diagnostics;
using System.Globalization;
using Decide.Load;

// decide-load: a panel of simulated assessors rating at once through the HTTP API of a running service, with the
// latency of each kind of request and a check that every acknowledged save was stored exactly once.
// Exit code 0 when nothing failed and nothing was lost, 1 otherwise, 2 when the run could not be prepared.
var url = new Option<string>("--url") { Description = "The running service.", DefaultValueFactory = _ => "http://127.0.0.1:5080" };
var assessors = new Option<int>("--assessors") { Description = "Simulated assessors rating at once.", DefaultValueFactory = _ => 100 };
var rounds = new Option<int>("--rounds") { Description = "Times each assessor rates every cell of the sheet.", DefaultValueFactory = _ => 2 };
var readEvery = new Option<int>("--read-every") { Description = "Read the sheet back after this many saves.", DefaultValueFactory = _ => 5 };
var think = new Option<int>("--think-ms") { Description = "Mean pause between one assessor's requests (ms); 0 for a stress run.", DefaultValueFactory = _ => 1000 };
var ramp = new Option<int>("--ramp-ms") { Description = "The assessors sign in spread over this time (ms).", DefaultValueFactory = _ => 10000 };
var seed = new Option<int>("--seed") { Description = "Seed of pauses and terms.", DefaultValueFactory = _ => 20261202 };
var admin = new Option<string>("--admin") { Description = "Administrator account (its password in DECIDE_LOAD_PASSWORD).", DefaultValueFactory = _ => "admin@decide.example" };

var command = new RootCommand("Simulated assessors rating at once through the HTTP API, with latencies and a check that nothing was lost.")
{
    url, assessors, rounds, readEvery, think, ramp, seed, admin,
};
command.SetAction((parse, ct) => RunAsync(new LoadOptions(
    new Uri(parse.GetValue(url)!, UriKind.Absolute), parse.GetValue(admin)!, Environment.GetEnvironmentVariable("DECIDE_LOAD_PASSWORD") ?? "Decide-demo-2026",
    parse.GetValue(assessors), parse.GetValue(rounds), Math.Max(1, parse.GetValue(readEvery)), parse.GetValue(think), parse.GetValue(ramp), parse.GetValue(seed)), ct));
return await command.Parse(args).InvokeAsync();

static async Task<int> RunAsync(LoadOptions options, CancellationToken ct)
{
    var output = Console.Out;
    using var handler = new SocketsHttpHandler { MaxConnectionsPerServer = options.Assessors + 10, PooledConnectionLifetime = TimeSpan.FromMinutes(10) };
    LoadPanel panel;
    try
    {
        panel = await LoadPanel.PrepareAsync(handler, options, output, ct);
    }
    catch (Exception e) when (e is LoadSetupException or HttpRequestException)
    {
        Console.Error.WriteLine($"decide-load: could not prepare the run: {e.Message}");
        return 2;
    }

    var log = new LatencyLog();
    var sessions = panel.Assessors.Select(a => new AssessorSession(panel, a.Code, a.Email, options, log, handler)).ToArray();
    var clock = Stopwatch.StartNew();
    await Task.WhenAll(sessions.Select((s, i) => s.RunAsync(i, ct)));
    clock.Stop();

    var check = await StoredCheck.RunAsync(panel, sessions, ct);
    var inv = CultureInfo.InvariantCulture;
    output.WriteLine(string.Create(inv, $"{options.Assessors} assessors, {options.Rounds} rounds, think {options.ThinkMilliseconds} ms, ramp {options.RampMilliseconds} ms, {clock.Elapsed.TotalSeconds:F1} s"));
    output.WriteLine("operation         count  errors   per s    p50 ms   p95 ms   p99 ms   max ms");
    foreach (var operation in log.Operations)
    {
        var f = log.Figures(operation, clock.Elapsed);
        output.WriteLine(string.Create(inv, $"{f.Operation,-16} {f.Count,6} {f.Errors,7} {f.PerSecond,7:F1} {f.P50,9:F1} {f.P95,8:F1} {f.P99,8:F1} {f.Max,8:F1}"));
    }

    var all = log.Operations.SelectMany(o => new[] { log.Figures(o, clock.Elapsed) }).ToArray();
    output.WriteLine(string.Create(inv, $"all requests: {all.Sum(f => f.Count)} in {clock.Elapsed.TotalSeconds:F1} s = {all.Sum(f => f.Count) / clock.Elapsed.TotalSeconds:F1} per s"));
    output.WriteLine($"stored check: {check.Acknowledged} acknowledged saves in {check.CellsChecked} cells; {check.Problems.Count} problems; " +
                     $"{check.UncertainCells} cells with an unanswered save; audit chain {(check.ChainValid ? "verifies" : "BROKEN")} ({check.AuditEntries} entries)");
    foreach (var line in log.Errors.Take(20).Concat(check.Problems.Take(20)))
    {
        output.WriteLine("  " + line);
    }

    return log.ErrorCount == 0 && check.Problems.Count == 0 && check.ChainValid ? 0 : 1;
}
