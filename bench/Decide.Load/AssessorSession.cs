using System.Diagnostics;
using System.Net;
using System.Net.Http.Json;
using System.Text.Json;

namespace Decide.Load;

/// <summary>
/// One simulated assessor: signs in, confirms the bidders' names, then rates every cell of the sheet with a term
/// and a rationale (several rounds revise earlier ratings), reading the sheet back now and then, with a pause
/// between requests. Keeps what the service acknowledged, to be checked against what it stored.
/// </summary>
public sealed class AssessorSession(LoadPanel panel, string code, string email, LoadOptions options, LatencyLog log, HttpMessageHandler handler)
{
    public const string SignIn = "sign-in";
    public const string ConfirmNames = "confirm-names";
    public const string SaveRating = "save-rating";
    public const string ReadSheet = "read-sheet";

    private readonly Dictionary<string, long?> _versions = new(StringComparer.Ordinal);

    public string Code => code;

    /// <summary>Every acknowledged save: the cell's address, the version returned and the rationale sent.</summary>
    public List<(string Cell, long Version, string Rationale)> Acknowledged { get; } = [];

    /// <summary>Cells with a save that failed or went unanswered (it may or may not have been stored).</summary>
    public HashSet<string> Unacknowledged { get; } = new(StringComparer.Ordinal);

    public HttpClient? Client { get; private set; }

    public async Task RunAsync(int index, CancellationToken ct)
    {
        var random = new Random(unchecked(options.Seed * 7919 + index)); // HashCode.Combine would differ per process
        await Task.Delay(TimeSpan.FromMilliseconds((double)options.RampMilliseconds * index / Math.Max(1, options.Assessors)), ct);
        Client = await TimedAsync(SignIn, () => Api.SignInAsync(handler, options.BaseUrl, email, panel.Password, ct));
        if (Client is null)
        {
            return;
        }

        await TimedAsync(ConfirmNames, () => Api.PostAsync(Client, panel.Url("/declaration/names"), new { conflicts = Array.Empty<object>() }, "confirming names", ct));
        var cells = LoadPanel.Bids.SelectMany(b => LoadPanel.Criteria.Select(c => (Bid: b, Criterion: c))).OrderBy(_ => random.Next()).ToArray();
        var saves = 0;
        for (var round = 1; round <= options.Rounds; round++)
        {
            foreach (var (bid, criterion) in cells)
            {
                await ThinkAsync(random, ct);
                await SaveAsync(bid, criterion, round, random, ct);
                if (++saves % options.ReadEvery == 0)
                {
                    await ThinkAsync(random, ct);
                    await ReadSheetAsync(ct);
                }
            }
        }
    }

    private async Task SaveAsync(string bid, string criterion, int round, Random random, CancellationToken ct)
    {
        var cell = $"{bid}/{criterion}";
        var term = LoadPanel.Terms[random.Next(2, LoadPanel.Terms.Length)];
        var rationale = $"Round {round}, assessor {code}: the {bid} method statement, section {random.Next(1, 9)}, " +
                        $"supports {term} on {criterion}; the evidence offered is specific to our sites.";
        var started = Stopwatch.GetTimestamp();
        try
        {
            var response = await Client!.PutAsJsonAsync(panel.Url($"/my/ratings/{bid}/{criterion}"),
                new { term, rationale, version = _versions.GetValueOrDefault(cell) }, ct);
            var elapsed = Stopwatch.GetElapsedTime(started).TotalMilliseconds;
            if (response.StatusCode == HttpStatusCode.OK)
            {
                var saved = await response.Content.ReadFromJsonAsync<JsonElement>(ct);
                log.Add(SaveRating, elapsed);
                var version = saved.GetProperty("version").GetInt64();
                _versions[cell] = version;
                Acknowledged.Add((cell, version, rationale));
                return;
            }

            var body = await response.Content.ReadAsStringAsync(ct);
            log.Fail(SaveRating, $"{(int)response.StatusCode} {(body.Length > 300 ? body[..300] + "…" : body)}");
        }
        catch (Exception e) when (e is HttpRequestException or TaskCanceledException && !ct.IsCancellationRequested)
        {
            log.Fail(SaveRating, e.Message);
        }

        Unacknowledged.Add(cell);
        await ReadSheetAsync(ct);
    }

    private async Task ReadSheetAsync(CancellationToken ct)
    {
        var sheet = await TimedAsync(ReadSheet, () => Api.GetAsync(Client!, panel.Url("/my/sheet"), "reading the sheet", ct));
        if (sheet.ValueKind != JsonValueKind.Object)
        {
            return;
        }

        foreach (var c in sheet.GetProperty("cells").EnumerateArray())
        {
            var version = c.GetProperty("version");
            _versions[$"{c.GetProperty("alternative").GetString()}/{c.GetProperty("criterion").GetString()}"] =
                version.ValueKind == JsonValueKind.Number ? version.GetInt64() : null;
        }
    }

    private async Task<T?> TimedAsync<T>(string operation, Func<Task<T>> call)
    {
        var started = Stopwatch.GetTimestamp();
        try
        {
            var result = await call();
            log.Add(operation, Stopwatch.GetElapsedTime(started).TotalMilliseconds);
            return result;
        }
        catch (Exception e) when (e is LoadSetupException or HttpRequestException or TaskCanceledException)
        {
            log.Fail(operation, e.Message);
            return default;
        }
    }

    private Task ThinkAsync(Random random, CancellationToken ct) => options.ThinkMilliseconds <= 0
        ? Task.CompletedTask
        : Task.Delay(TimeSpan.FromMilliseconds(options.ThinkMilliseconds * (0.5 + random.NextDouble())), ct);
}
