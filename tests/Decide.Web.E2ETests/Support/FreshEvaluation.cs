using System.Net.Http.Headers;
using System.Net.Http.Json;
using System.Text.Json;

namespace Decide.Web.E2ETests.Support;

/// <summary>
/// A new evaluation made through the API as its users would: the administrator creates an assessor's account and
/// the evaluation; the demo facilitator sets a small invented plan (weighted by pairwise comparison), a panel of
/// that one assessor and three bids; later moves it on (lock the plan, open scoring).
/// </summary>
public sealed class FreshEvaluation
{
    public const string AssessorPassword = "Harrow-assess-2026";

    /// <summary>The bids: code and name, in order.</summary>
    public static readonly (string Code, string Name)[] Bidders =
        [("lindqvist", "Lindqvist Shelters Ltd"), ("oakridge", "Oakridge Street Furniture"), ("pembury", "Pembury Signal Works")];

    private readonly string _baseUrl;

    private FreshEvaluation(string baseUrl, Guid id, string reference, string assessorEmail)
    {
        _baseUrl = baseUrl;
        Id = id;
        Reference = reference;
        AssessorEmail = assessorEmail;
    }

    public Guid Id { get; }

    public string Reference { get; }

    public string AssessorEmail { get; }

    public static async Task<FreshEvaluation> CreateAsync(string baseUrl)
    {
        var tag = Guid.NewGuid().ToString("N")[..6];
        using var admin = await SignInAsync(baseUrl, DecideServer.Administrator, DecideServer.Password);
        var email = $"harrow.{tag}@kestrel-vale.example";
        await OkAsync(await admin.PostAsJsonAsync("/api/accounts", new { email, displayName = "Ilse Harrow (depot engineer)", password = AssessorPassword }));
        var reference = $"KVTA-E2E-{tag}";
        var created = await OkAsync(await admin.PostAsJsonAsync("/api/evaluations",
            new { reference, title = "Passenger shelters for the north corridor", organisation = "Kestrel Vale Transit Authority", facilitatorEmail = DecideServer.Facilitator }));
        var evaluation = new FreshEvaluation(baseUrl, created.GetProperty("id").GetGuid(), reference, email);

        using var f = await SignInAsync(baseUrl, DecideServer.Facilitator, DecideServer.Password);
        await OkAsync(await f.PutAsJsonAsync(evaluation.Url("/plan"), new
        {
            plan = Plan(reference),
            settings = new { minRationaleLength = 20, pricesVisibleToAssessors = false, requiredApprovals = 1 },
            version = await evaluation.VersionAsync(f),
        }));
        await OkAsync(await f.PutAsJsonAsync(evaluation.Url("/panel"), new
        {
            seats = new object[] { new { email, role = "assessor", assessorCode = "harrow" } },
            version = await evaluation.VersionAsync(f),
        }));
        await OkAsync(await f.PutAsJsonAsync(evaluation.Url("/bids"), new
        {
            bids = Bidders.Select(b => new { code = b.Code, name = b.Name }).ToArray(),
            version = await evaluation.VersionAsync(f),
        }));
        return evaluation;
    }

    /// <summary>The facilitator locks the plan (the assessor's weights must be submitted) and opens scoring.</summary>
    public async Task OpenScoringAsync()
    {
        using var f = await SignInAsync(_baseUrl, DecideServer.Facilitator, DecideServer.Password);
        await OkAsync(await f.PostAsJsonAsync(Url("/lock-plan"), new { version = await VersionAsync(f) }));
        await OkAsync(await f.PostAsJsonAsync(Url("/open-scoring"), new { version = await VersionAsync(f) }));
    }

    private string Url(string path) => $"/api/evaluations/{Id}{path}";

    private async Task<long> VersionAsync(HttpClient client) =>
        (await OkAsync(await client.GetAsync(Url("")))).GetProperty("summary").GetProperty("version").GetInt64();

    private static async Task<HttpClient> SignInAsync(string baseUrl, string email, string password)
    {
        var client = new HttpClient { BaseAddress = new Uri(baseUrl) };
        var token = await OkAsync(await client.PostAsJsonAsync("/api/auth/login", new { email, password }));
        client.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", token.GetProperty("accessToken").GetString());
        return client;
    }

    private static async Task<JsonElement> OkAsync(HttpResponseMessage response)
    {
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.IsSuccessStatusCode, $"{response.RequestMessage?.Method} {response.RequestMessage?.RequestUri} answered {(int)response.StatusCode}: {body}");
        return body.Length == 0 ? default : JsonDocument.Parse(body).RootElement.Clone();
    }

    /// <summary>Three criteria at the top level (one of them a group of two), rated on Chen's seven terms.</summary>
    private static object Plan(string reference) => new Dictionary<string, object?>
    {
        ["format"] = "decide-evaluation/1",
        ["title"] = "Passenger shelters for the north corridor",
        ["reference"] = reference,
        ["organisation"] = "Kestrel Vale Transit Authority",
        ["ratingScale"] = "chen-rating-7",
        ["importanceScale"] = "chen-importance-7",
        ["groups"] = new[] { new { id = "service", name = "Service and upkeep" } },
        ["criteria"] = new object[]
        {
            new
            {
                id = "design", name = "Design and accessibility", kind = "linguistic", direction = "benefit",
                description = "Step-free access, seating, shelter from wind and rain, legible information.",
                descriptors = new Dictionary<string, string>
                {
                    ["VP"] = "No design offered.", ["P"] = "A design that leaves out step-free access.", ["MP"] = "A standard design with gaps in shelter.",
                    ["F"] = "A design meeting the specification.", ["MG"] = "A design with tested wind shielding.",
                    ["G"] = "A design tested with wheelchair users.", ["VG"] = "As good, with results from similar corridors.",
                },
            },
            new { id = "durability", name = "Durability of materials", kind = "linguistic", direction = "benefit", description = "Expected life and resistance to vandalism." },
            new { id = "maintenance", name = "Maintenance regime", kind = "linguistic", direction = "benefit", group = "service" },
            new { id = "repairs", name = "Repair response", kind = "linguistic", direction = "benefit", group = "service" },
        },
        ["weighting"] = "pairwise",
    };
}
