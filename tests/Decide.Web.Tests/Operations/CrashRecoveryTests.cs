using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using Decide.Data.Entities;
using Decide.Web.Tests.Support;
using Microsoft.Data.Sqlite;
using Npgsql;

namespace Decide.Web.Tests.Operations;

/// <summary>
/// The service killed with SIGKILL in the middle of a burst of saves, then started again on the same data: every save
/// it acknowledged is there, a save it did not get to acknowledge is there completely or not at all (the rating
/// together with its audit entry), the database passes its own integrity check, and the audit chain verifies.
/// </summary>
public sealed class CrashRecoveryTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "decide-crash", Guid.NewGuid().ToString("N"));
    private readonly string _postgresDatabase = "decide_crash_" + Guid.NewGuid().ToString("N");

    [Fact]
    public async Task Acknowledged_saves_survive_a_kill_in_the_middle_of_a_burst_and_the_chain_still_verifies()
    {
        var settings = Settings();
        Scenario scenario;
        var writers = new List<CellWriter>();
        using (var first = await ServiceProcess.StartAsync(settings))
        {
            scenario = await new ScenarioBuilder(first).BuildAsync(EvaluationStage.Scoring);
            await scenario.ConfirmNamesAsync(scenario.Ashby);
            await scenario.ConfirmNamesAsync(scenario.Brook);
            foreach (var (assessor, client) in new[] { (ScenarioBuilder.Ashby, scenario.Ashby), (ScenarioBuilder.Brook, scenario.Brook) })
            {
                writers.AddRange(Scenario.CriteriaOf(assessor).SelectMany(c => ScenarioPlan.Bidders.Select(b =>
                    new CellWriter(first, client.DefaultRequestHeaders.Authorization!.Parameter!, scenario, assessor, b.Code, c))));
            }

            // One writer per cell saves again and again; the service is killed once 60 saves were acknowledged, with
            // saves still in flight.
            var progress = new BurstProgress(60);
            var burst = writers.Select(w => w.RunAsync(progress)).ToArray();
            var reached = await Task.WhenAny(progress.Reached, Task.Delay(TimeSpan.FromMinutes(3)));
            Assert.True(reached == progress.Reached, "the burst did not reach 60 acknowledged saves:\n" + first.Output);
            await first.KillAsync();
            await Task.WhenAll(burst);
        }

        Assert.True(writers.Sum(w => w.Acknowledged.Count) >= 60);
        if (DecideWebFactory.PostgresServer is null)
        {
            AssertSqliteIntact(Path.Combine(_folder, "decide.db"));
        }

        using var second = await ServiceProcess.StartAsync(settings);
        using var facilitator = await second.SignInAsync(scenario.Emails["facilitator"], ScenarioBuilder.Password);
        var audit = await ApiAssert.OkAsync(await facilitator.GetAsync(scenario.Url("/audit")));
        var audited = audit.EnumerateArray().Where(e => e.GetProperty("action").GetString() == "rating.saved")
            .GroupBy(e => e.GetProperty("target").GetString()!).ToDictionary(g => g.Key, g => g.Count());
        foreach (var writer in writers)
        {
            using var reader = await second.SignInAsync(scenario.Emails[writer.Assessor], ScenarioBuilder.Password);
            var sheet = await ApiAssert.OkAsync(await reader.GetAsync(scenario.Url("/my/sheet")));
            var cell = sheet.GetProperty("cells").EnumerateArray().Single(c =>
                c.GetProperty("alternative").GetString() == writer.Alternative && c.GetProperty("criterion").GetString() == writer.Criterion);
            var version = cell.GetProperty("version").ValueKind == JsonValueKind.Number ? cell.GetProperty("version").GetInt64() : 0;
            var rationale = cell.GetProperty("rationale").ValueKind == JsonValueKind.String ? cell.GetProperty("rationale").GetString() : null;
            var (lastVersion, lastRationale) = writer.Acknowledged.Count == 0 ? (0L, null) : writer.Acknowledged[^1];

            // The last acknowledged save, or the one after it that was in flight when the process died — whole.
            if (version == lastVersion)
            {
                Assert.Equal(lastRationale, rationale);
            }
            else
            {
                Assert.True(version == lastVersion + 1 && rationale == writer.InFlight,
                    $"{writer}: stored version {version} \"{rationale}\", last acknowledged {lastVersion} \"{lastRationale}\", in flight \"{writer.InFlight}\"");
            }

            // Each stored version was written with exactly one audit entry.
            Assert.Equal(version, audited.GetValueOrDefault($"ratings/{writer.Assessor}/{writer.Alternative}/{writer.Criterion}"));
        }

        var verification = await ApiAssert.OkAsync(await facilitator.GetAsync(scenario.Url("/audit/verification")));
        Assert.True(verification.GetProperty("valid").GetBoolean(), verification.GetRawText());
        using var admin = await second.SignInAsync(DecideWebFactory.Admin);
        var everything = await ApiAssert.OkAsync(await admin.GetAsync("/api/audit/verification"));
        Assert.True(everything.GetProperty("valid").GetBoolean(), everything.GetRawText());
    }

    private Dictionary<string, string> Settings()
    {
        Directory.CreateDirectory(_folder);
        var settings = new Dictionary<string, string>
        {
            ["Database__DataFolder"] = _folder,
            ["Database__SeedDemo"] = "true",
            ["Logging__LogLevel__Default"] = "Warning",
        };
        if (DecideWebFactory.PostgresServer is { } server)
        {
            settings["Database__Provider"] = "Postgres";
            settings["ConnectionStrings__Decide"] = new NpgsqlConnectionStringBuilder(server) { Database = _postgresDatabase }.ConnectionString;
        }

        return settings;
    }

    /// <summary>SQLite's own checks of the file left by the killed process (after it replays its write-ahead log).</summary>
    private static void AssertSqliteIntact(string file)
    {
        using var connection = new SqliteConnection($"Data Source={file};Pooling=false");
        connection.Open();
        using var integrity = connection.CreateCommand();
        integrity.CommandText = "PRAGMA integrity_check;";
        Assert.Equal("ok", integrity.ExecuteScalar() as string);
        using var keys = connection.CreateCommand();
        keys.CommandText = "PRAGMA foreign_key_check;";
        using var violations = keys.ExecuteReader();
        Assert.False(violations.Read(), "the file has rows whose foreign keys point nowhere");
    }

    public void Dispose()
    {
        SqliteConnection.ClearAllPools();
        if (DecideWebFactory.PostgresServer is { } server)
        {
            NpgsqlConnection.ClearAllPools();
            using var connection = new NpgsqlConnection(new NpgsqlConnectionStringBuilder(server) { Database = "postgres" }.ConnectionString);
            connection.Open();
            using var drop = new NpgsqlCommand($"DROP DATABASE IF EXISTS \"{_postgresDatabase}\" WITH (FORCE)", connection);
            drop.ExecuteNonQuery();
        }

        try
        {
            Directory.Delete(_folder, recursive: true);
        }
        catch (IOException)
        {
            // Left for the temp folder's cleaner.
        }
    }

    /// <summary>Saves one cell again and again until the service stops answering, keeping what was acknowledged.</summary>
    private sealed class CellWriter(IDecideHost host, string token, Scenario scenario, string assessor, string alternative, string criterion)
    {
        public string Assessor => assessor;

        public string Alternative => alternative;

        public string Criterion => criterion;

        /// <summary>Acknowledged saves in order: the version returned and the rationale sent.</summary>
        public List<(long Version, string Rationale)> Acknowledged { get; } = [];

        /// <summary>The rationale of the save that got no answer (sent when the process died), if any.</summary>
        public string? InFlight { get; private set; }

        public async Task RunAsync(BurstProgress progress)
        {
            using var client = host.CreateClient();
            client.DefaultRequestHeaders.Authorization = new("Bearer", token);
            for (var n = 1; ; n++)
            {
                var rationale = $"Save {n} of {assessor} on {alternative}/{criterion}: section {n % 9 + 1} of the method statement applies.";
                InFlight = rationale;
                HttpResponseMessage response;
                try
                {
                    response = await client.PutAsJsonAsync(scenario.Url($"/my/ratings/{alternative}/{criterion}"),
                        new { term = ScenarioPlan.RatingTerms[n % 7], rationale, version = Acknowledged.Count == 0 ? (long?)null : Acknowledged[^1].Version });
                }
                catch (Exception e) when (e is HttpRequestException or TaskCanceledException)
                {
                    return;
                }

                Assert.True(response.StatusCode == HttpStatusCode.OK, $"{this}: {(int)response.StatusCode} {await response.Content.ReadAsStringAsync()}");
                var saved = await response.Content.ReadFromJsonAsync<JsonElement>();
                Acknowledged.Add((saved.GetProperty("version").GetInt64(), rationale));
                InFlight = null;
                progress.Acknowledge();
            }
        }

        public override string ToString() => $"{assessor} {alternative}/{criterion}";
    }

    /// <summary>Counts acknowledged saves; <see cref="Reached"/> completes at the target while the writers go on.</summary>
    private sealed class BurstProgress(int target)
    {
        private readonly TaskCompletionSource _reached = new(TaskCreationOptions.RunContinuationsAsynchronously);
        private int _count;

        public Task Reached => _reached.Task;

        public void Acknowledge()
        {
            if (Interlocked.Increment(ref _count) >= target)
            {
                _reached.TrySetResult();
            }
        }
    }
}
