using System.Text.Json;
using Decide.Data.Entities;

namespace Decide.Web.Tests.Support;

/// <summary>An evaluation built by <see cref="ScenarioBuilder"/>, with a signed-in client for each person.</summary>
public sealed class Scenario(
    Guid id, string reference, IReadOnlyDictionary<string, string> emails,
    HttpClient facilitator, HttpClient ashby, HttpClient brook, HttpClient carrow, HttpClient observer, string weighting) : IDisposable
{
    public Guid Id { get; } = id;

    public string Reference { get; } = reference;

    /// <summary>E-mail addresses by person ("facilitator", "ashby", "brook", "carrow", "observer").</summary>
    public IReadOnlyDictionary<string, string> Emails { get; } = emails;

    public HttpClient Facilitator { get; } = facilitator;

    /// <summary>Assessor rating every linguistic criterion.</summary>
    public HttpClient Ashby { get; } = ashby;

    /// <summary>Assessor rating quality and staffing only.</summary>
    public HttpClient Brook { get; } = brook;

    /// <summary>The price evaluator.</summary>
    public HttpClient Carrow { get; } = carrow;

    public HttpClient Observer { get; } = observer;

    /// <summary>"importance", "pairwise" or "points".</summary>
    public string Weighting { get; } = weighting;

    /// <summary>The assessors' clients by code.</summary>
    public IReadOnlyDictionary<string, HttpClient> Assessors => new Dictionary<string, HttpClient>
    {
        [ScenarioBuilder.Ashby] = Ashby, [ScenarioBuilder.Brook] = Brook,
    };

    /// <summary>The linguistic criteria each assessor rates.</summary>
    public static IReadOnlyList<string> CriteriaOf(string assessor) =>
        assessor == ScenarioBuilder.Brook ? [ScenarioPlan.Quality, ScenarioPlan.Staffing] : ScenarioPlan.Linguistic;

    /// <summary>The evaluation's API address plus <paramref name="path"/> ("/my/sheet").</summary>
    public string Url(string path = "") => $"/api/evaluations/{Id}{path}";

    public async Task<JsonElement> DetailAsync(HttpClient? client = null) =>
        await ApiAssert.OkAsync(await (client ?? Facilitator).GetAsync(Url()));

    public async Task<EvaluationStage> StageAsync() =>
        Enum.Parse<EvaluationStage>((await DetailAsync()).GetProperty("summary").GetProperty("stage").GetString()!, ignoreCase: true);

    /// <summary>The evaluation's current version (for facilitator changes).</summary>
    public async Task<long> VersionAsync() => (await DetailAsync()).GetProperty("summary").GetProperty("version").GetInt64();

    /// <summary>The audit trail as the facilitator reads it.</summary>
    public async Task<JsonElement> AuditAsync() => await ApiAssert.OkAsync(await Facilitator.GetAsync(Url("/audit")));

    /// <summary>Audit entries with the given action, oldest first.</summary>
    public async Task<IReadOnlyList<JsonElement>> AuditEntriesAsync(string action) =>
        (await AuditAsync()).EnumerateArray().Where(e => e.GetProperty("action").GetString() == action).ToArray();

    /// <summary>
    /// What <paramref name="reader"/> sees at <paramref name="path"/> together with the whole audit trail: equal
    /// before and after a request only if the request changed nothing.
    /// </summary>
    public async Task<string> StateAsync(HttpClient reader, string path) =>
        await (await reader.GetAsync(Url(path))).Content.ReadAsStringAsync() + "\n" + (await AuditAsync()).GetRawText();

    /// <summary>Accepts the declaration in force.</summary>
    public async Task SignDeclarationAsync(HttpClient client)
    {
        var declaration = await ApiAssert.OkAsync(await client.GetAsync("/api/declaration"));
        await ApiAssert.OkAsync(await client.PostJsonAsync(Url("/declaration"), new { version = declaration.GetProperty("version").GetString(), accepted = true }));
    }

    /// <summary>Confirms the declaration against the bidders' names, declaring the given conflicts.</summary>
    public async Task<JsonElement> ConfirmNamesAsync(HttpClient client, params (string Alternative, string Statement)[] conflicts) =>
        await ApiAssert.OkAsync(await client.PostJsonAsync(Url("/declaration/names"),
            new { conflicts = conflicts.Select(c => new { alternative = c.Alternative, statement = c.Statement }).ToArray() }));

    /// <summary>A complete and consistent set of judgements for this scenario's weighting (every node High, or every pair equal).</summary>
    public object CompleteWeights() => Weighting == "importance"
        ? new { importance = ScenarioPlan.WeightNodes.ToDictionary(n => n, _ => "H") }
        : new
        {
            pairwise = new object[]
            {
                new { row = ScenarioPlan.Service, col = ScenarioPlan.Quality, term = "1" },
                new { row = ScenarioPlan.Service, col = ScenarioPlan.Price, term = "1" },
                new { row = ScenarioPlan.Quality, col = ScenarioPlan.Price, term = "1" },
                new { row = ScenarioPlan.Staffing, col = ScenarioPlan.Response, term = "1" },
            },
        };

    /// <summary>Saves a rating with a rationale long enough for the default minimum.</summary>
    public static Task<HttpResponseMessage> RateAsync(HttpClient client, Guid id, string alternative, string criterion, string term, long? version = null) =>
        client.PutJsonAsync($"/api/evaluations/{id}/my/ratings/{alternative}/{criterion}",
            new { term, rationale = $"Section 4 of the {alternative} bid supports {term} on {criterion}.", version });

    /// <summary>Moves the evaluation forward through every stage up to <paramref name="stage"/>, doing what each needs.</summary>
    public async Task AdvanceToAsync(EvaluationStage stage)
    {
        if (stage >= EvaluationStage.PlanLocked && await StageAsync() == EvaluationStage.Setup)
        {
            foreach (var client in Assessors.Values)
            {
                await SignDeclarationAsync(client);
                if (Weighting != "points")
                {
                    await ApiAssert.OkAsync(await client.PutJsonAsync(Url("/my/weights"), CompleteWeights()));
                    await ApiAssert.OkAsync(await client.PostJsonAsync(Url("/my/weights/submit")));
                }
            }

            await SignDeclarationAsync(Carrow);
            await ApiAssert.OkAsync(await Facilitator.PostJsonAsync(Url("/lock-plan"), new { version = await VersionAsync() }));
        }

        if (stage >= EvaluationStage.Scoring && await StageAsync() == EvaluationStage.PlanLocked)
        {
            await ApiAssert.OkAsync(await Facilitator.PostJsonAsync(Url("/open-scoring"), new { version = await VersionAsync() }));
        }

        if (stage >= EvaluationStage.Moderation && await StageAsync() == EvaluationStage.Scoring)
        {
            foreach (var client in Assessors.Values)
            {
                await CompleteSheetAsync(client);
            }

            await ApiAssert.OkAsync(await Facilitator.PostJsonAsync(Url("/start-moderation"), new { version = await VersionAsync() }));
        }
    }

    /// <summary>The term <see cref="CompleteSheetAsync"/> rates with: "G" on Chen's scale, "4" on the points scale.</summary>
    public string GoodTerm => Weighting == "points" ? "4" : "G";

    /// <summary>Confirms the names if needed, rates every cell not yet done <see cref="GoodTerm"/> and submits the sheet.</summary>
    public async Task CompleteSheetAsync(HttpClient client)
    {
        var declaration = await ApiAssert.OkAsync(await client.GetAsync(Url("/declaration")));
        if (declaration.GetProperty("namesConfirmedAt").ValueKind == JsonValueKind.Null)
        {
            await ConfirmNamesAsync(client);
        }

        var sheet = await ApiAssert.OkAsync(await client.GetAsync(Url("/my/sheet")));
        foreach (var cell in sheet.GetProperty("cells").EnumerateArray().Where(c => !c.GetProperty("done").GetBoolean()))
        {
            var version = cell.GetProperty("version");
            await ApiAssert.OkAsync(await RateAsync(client, Id, cell.GetProperty("alternative").GetString()!, cell.GetProperty("criterion").GetString()!, GoodTerm,
                version.ValueKind == JsonValueKind.Null ? null : version.GetInt64()));
        }

        await ApiAssert.OkAsync(await client.PostJsonAsync(Url("/my/submit")));
    }

    public void Dispose()
    {
        foreach (var client in new[] { Facilitator, Ashby, Brook, Carrow, Observer })
        {
            client.Dispose();
        }
    }
}
