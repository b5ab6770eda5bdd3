using System.Text.Json.Nodes;

namespace Decide.Load;

/// <summary>
/// Prepares an evaluation for the run through the API, as its users would: the administrator creates a facilitator
/// and one account per simulated assessor and imports an invented plan naming them; each assessor signs the
/// declaration, submits the imported weights and confirms the bidders' names; the facilitator locks the plan and
/// opens scoring.
/// </summary>
public sealed class LoadPanel
{
    /// <summary>The linguistic criteria of the invented plan.</summary>
    public static readonly string[] Criteria = ["method", "staffing", "quality", "safety", "social", "transition"];

    /// <summary>The bids of the invented plan.</summary>
    public static readonly string[] Bids = ["alderbank", "brackenhurst", "colvenmoor", "dunstreath", "elmscarr"];

    /// <summary>The rating terms (chen-rating-7).</summary>
    public static readonly string[] Terms = ["VP", "P", "MP", "F", "MG", "G", "VG"];

    private static readonly string[] Importance = ["M", "MH", "H", "VH"];

    private LoadPanel(Guid id, IReadOnlyList<(string Code, string Email)> assessors, string password, HttpClient facilitator)
    {
        Id = id;
        Assessors = assessors;
        Password = password;
        Facilitator = facilitator;
    }

    public Guid Id { get; }

    public IReadOnlyList<(string Code, string Email)> Assessors { get; }

    /// <summary>The password of every account the run created (random per run).</summary>
    public string Password { get; }

    public HttpClient Facilitator { get; }

    public string Url(string path) => $"/api/evaluations/{Id}{path}";

    public static async Task<LoadPanel> PrepareAsync(HttpMessageHandler handler, LoadOptions options, TextWriter log, CancellationToken ct)
    {
        var tag = Guid.NewGuid().ToString("N")[..8];
        var password = $"Load-{Guid.NewGuid():N}"[..20] + "A1";
        using var admin = await Api.SignInAsync(handler, options.BaseUrl, options.AdminEmail, options.AdminPassword, ct);

        var facilitatorEmail = $"facilitator.{tag}@load.example";
        await Api.PostAsync(admin, "/api/accounts", new { email = facilitatorEmail, displayName = $"Load facilitator {tag}", password }, "creating the facilitator", ct);
        var assessors = Enumerable.Range(1, options.Assessors).Select(i => ($"a{i:D3}", $"assessor{i:D3}.{tag}@load.example")).ToArray();
        await Parallel.ForEachAsync(assessors, new ParallelOptions { MaxDegreeOfParallelism = 4, CancellationToken = ct }, async (a, token) =>
            await Api.PostAsync(admin, "/api/accounts", new { email = a.Item2, displayName = $"Load assessor {a.Item1}", password }, $"creating {a.Item2}", token));
        log.WriteLine($"created {assessors.Length + 1} accounts ({tag})");

        var reference = $"LOAD-{tag}";
        var created = await Api.PostAsync(admin, "/api/evaluations", new
        {
            reference, title = "Grounds maintenance of twelve parks, 2027–2031 (load run)",
            organisation = "Harrowdene Borough Council (invented)", facilitatorEmail,
        }, "creating the evaluation", ct);
        var id = created.GetProperty("id").GetGuid();
        var facilitator = await Api.SignInAsync(handler, options.BaseUrl, facilitatorEmail, password, ct);
        var panel = new LoadPanel(id, assessors, password, facilitator);
        await Api.PutAsync(facilitator, panel.Url("/plan"), new
        {
            plan = Plan(reference),
            settings = new { minRationaleLength = 20, pricesVisibleToAssessors = false, requiredApprovals = 1 },
            version = await panel.VersionAsync(ct),
        }, "setting the plan", ct);
        await Api.PutAsync(facilitator, panel.Url("/panel"), new
        {
            seats = assessors.Select(a => new { email = a.Item2, role = "assessor", assessorCode = a.Item1 }).ToArray(),
            version = await panel.VersionAsync(ct),
        }, "setting the panel", ct);
        await Api.PutAsync(facilitator, panel.Url("/bids"), new
        {
            bids = Bids.Select(b => new { code = b, name = Name(b) + " Grounds Ltd" }).ToArray(),
            version = await panel.VersionAsync(ct),
        }, "registering the bids", ct);

        var random = new Random(options.Seed);
        var weights = assessors.ToDictionary(a => a.Item1, _ => Criteria.ToDictionary(c => c, _ => Importance[random.Next(Importance.Length)]));
        await Parallel.ForEachAsync(assessors, new ParallelOptions { MaxDegreeOfParallelism = 4, CancellationToken = ct }, async (a, token) =>
        {
            using var client = await Api.SignInAsync(handler, options.BaseUrl, a.Item2, password, token);
            var declaration = await Api.GetAsync(client, "/api/declaration", "reading the declaration", token);
            await Api.PostAsync(client, panel.Url("/declaration"), new { version = declaration.GetProperty("version").GetString(), accepted = true }, $"{a.Item1} signing the declaration", token);
            await Api.PutAsync(client, panel.Url("/my/weights"), new { importance = weights[a.Item1] }, $"{a.Item1} giving weights", token);
            await Api.PostAsync(client, panel.Url("/my/weights/submit"), null, $"{a.Item1} submitting weights", token);
        });
        await Api.PostAsync(facilitator, panel.Url("/lock-plan"), new { version = await panel.VersionAsync(ct) }, "locking the plan", ct);
        await Api.PostAsync(facilitator, panel.Url("/open-scoring"), new { version = await panel.VersionAsync(ct) }, "opening scoring", ct);
        log.WriteLine($"evaluation {id} open for scoring with {assessors.Length} assessors × {Bids.Length} bids × {Criteria.Length} criteria");
        return panel;
    }

    private async Task<long> VersionAsync(CancellationToken ct) =>
        (await Api.GetAsync(Facilitator, Url(""), "reading the evaluation", ct)).GetProperty("summary").GetProperty("version").GetInt64();

    /// <summary>An invented plan: six linguistic benefit criteria on Chen's seven-term scales, weighted by importance.</summary>
    private static JsonObject Plan(string reference) => new()
    {
        ["format"] = "decide-evaluation/1",
        ["title"] = "Grounds maintenance of twelve parks, 2027–2031 (load run)",
        ["reference"] = reference,
        ["organisation"] = "Harrowdene Borough Council (invented)",
        ["ratingScale"] = "chen-rating-7",
        ["importanceScale"] = "chen-importance-7",
        ["criteria"] = new JsonArray(Criteria.Select(c => (JsonNode)new JsonObject
        {
            ["id"] = c, ["name"] = Name(c), ["kind"] = "linguistic", ["direction"] = "benefit",
        }).ToArray()),
        ["weighting"] = "importance",
    };

    private static string Name(string code) => char.ToUpperInvariant(code[0]) + code[1..];
}
