using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using System.Text.Json.Nodes;
using Decide.Web.Tests.Exchange;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.Moderation;

public sealed class ModerationTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    private const string Reason = "The panel agreed the trial photos in Appendix B show legibility at 10 m; two members had missed them.";

    [Fact]
    public async Task The_board_flags_the_same_cells_as_the_engines_agreement_largest_spread_first()
    {
        var id = await factory.DemoEvaluationAsync();
        using var client = await factory.SignInAsync(DecideWebFactory.Observer);
        var board = await client.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}/moderation");
        var results = await client.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}/results?draws=0");

        var cells = board.GetProperty("cells").EnumerateArray().ToArray();
        var flagged = cells.Where(c => c.GetProperty("flagged").GetBoolean())
            .Select(c => (c.GetProperty("alternative").GetString(), c.GetProperty("criterion").GetString(), c.GetProperty("spread").GetInt32())).ToArray();
        var engine = results.GetProperty("agreement").GetProperty("cells").EnumerateArray()
            .Select(c => (c.GetProperty("alternative").GetString(), c.GetProperty("criterion").GetString(), c.GetProperty("spread").GetInt32())).ToArray();
        Assert.NotEmpty(engine);
        Assert.Equal(engine.OrderBy(x => x).ToArray(), flagged.OrderBy(x => x).ToArray());
        Assert.Equal(results.GetProperty("agreement").GetProperty("tolerance").GetInt32(), board.GetProperty("tolerance").GetInt32());
        Assert.Equal(flagged.Length, board.GetProperty("flagged").GetInt32());

        // Flagged cells come first, by spread descending.
        Assert.All(cells.Take(flagged.Length), c => Assert.True(c.GetProperty("flagged").GetBoolean()));
        var spreads = flagged.Select(f => f.Item3).ToArray();
        Assert.Equal(spreads.OrderByDescending(s => s).ToArray(), spreads);

        // Every cell of every scored bidder is there; the bidder that failed a gate is listed apart.
        var excluded = results.GetProperty("excluded").EnumerateArray().Select(e => e.GetProperty("alternative").GetString()).ToArray();
        Assert.Equal(excluded, board.GetProperty("excluded").EnumerateArray().Select(e => e.GetProperty("alternative").GetString()).ToArray());
        Assert.DoesNotContain(cells, c => excluded.Contains(c.GetProperty("alternative").GetString()));
        var linguistic = results.GetProperty("matrix").EnumerateArray().Where(m => m.GetProperty("raters").GetInt32() > 0)
            .Select(m => (m.GetProperty("alternative").GetString(), m.GetProperty("criterion").GetString())).ToHashSet();
        Assert.Equal(linguistic.Count, cells.Length);
    }

    [Fact]
    public async Task Each_cell_shows_every_assessors_term_and_rationale_side_by_side()
    {
        var id = await factory.DemoEvaluationAsync();
        var file = await EvaluationCopies.ExportDemoAsync(factory);
        using var assessor = await factory.SignInAsync(DecideWebFactory.OtherAssessor);
        var board = await assessor.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}/moderation");
        var cell = board.GetProperty("cells").EnumerateArray()
            .Single(c => c.GetProperty("alternative").GetString() == "orrinford" && c.GetProperty("criterion").GetString() == "display");
        var shown = cell.GetProperty("ratings").EnumerateArray().ToDictionary(r => r.GetProperty("assessor").GetString()!);

        var expected = file["ratings"]!.AsObject()
            .Where(a => a.Value!["orrinford"]?["display"] is not null)
            .ToDictionary(a => a.Key, a => a.Value!["orrinford"]!["display"]!);
        Assert.Equal(expected.Keys.Order(), shown.Keys.Order());
        foreach (var (code, rating) in expected)
        {
            Assert.Equal((string?)rating["term"], shown[code].GetProperty("term").GetString());
            Assert.Equal((string?)rating["rationale"], shown[code].GetProperty("rationale").GetString());
        }
    }

    [Fact]
    public async Task Moderating_a_cell_adds_an_entry_with_the_originals_and_leaves_the_ratings_unchanged()
    {
        var id = await EvaluationCopies.CopyAtModerationAsync(factory);
        using var client = await factory.SignInAsync(EvaluationCopies.CopyFacilitator);
        var before = await BoardCellAsync(client, id, "tessaline", "integration");
        var ratingsBefore = await RatingsAsync(client, id);

        var first = await client.PutAsJsonAsync($"/api/evaluations/{id}/moderation/tessaline/integration",
            new { term = "MG", reason = Reason, agreedBy = new[] { "ravelle", "fenwright", "abernathy" } });
        Assert.Equal(HttpStatusCode.OK, first.StatusCode);
        var entry = await first.Content.ReadFromJsonAsync<JsonElement>();
        var originals = entry.GetProperty("originals").EnumerateArray()
            .ToDictionary(o => o.GetProperty("assessor").GetString()!, o => o.GetProperty("term").GetString());
        var shownBefore = before.GetProperty("ratings").EnumerateArray().Where(r => r.GetProperty("term").ValueKind == JsonValueKind.String)
            .ToDictionary(r => r.GetProperty("assessor").GetString()!, r => r.GetProperty("term").GetString());
        Assert.Equal(shownBefore.OrderBy(x => x.Key), originals.Where(o => o.Value is not null).OrderBy(x => x.Key));

        // Moderate again, replacing the first value: both stay, the newest is in force.
        var second = await client.PutAsJsonAsync($"/api/evaluations/{id}/moderation/tessaline/integration",
            new { term = "G", reason = Reason + " On reflection the panel moved to Good.", agreedBy = new[] { "ravelle" }, replaces = entry.GetProperty("id").GetInt64() });
        Assert.Equal(HttpStatusCode.OK, second.StatusCode);

        var after = await BoardCellAsync(client, id, "tessaline", "integration");
        Assert.Equal("G", after.GetProperty("inForce").GetProperty("term").GetString());
        Assert.Equal("MG", after.GetProperty("history")[0].GetProperty("term").GetString());
        var stored = after.GetProperty("history")[0].GetProperty("originals").EnumerateArray()
            .Where(o => o.GetProperty("term").ValueKind == JsonValueKind.String)
            .ToDictionary(o => o.GetProperty("assessor").GetString()!, o => o.GetProperty("term").GetString());
        Assert.Equal(shownBefore.OrderBy(x => x.Key), stored.OrderBy(x => x.Key));
        Assert.Equal(before.GetProperty("ratings").GetRawText(), after.GetProperty("ratings").GetRawText());
        Assert.Equal(ratingsBefore, await RatingsAsync(client, id));

        // The results use the value in force; the export carries it too.
        var results = await client.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}/results?draws=0");
        var cell = results.GetProperty("matrix").EnumerateArray()
            .Single(m => m.GetProperty("alternative").GetString() == "tessaline" && m.GetProperty("criterion").GetString() == "integration");
        Assert.Equal("G", cell.GetProperty("moderated").GetString());

        var audit = await EvaluationCopies.AuditAsync(factory, id);
        Assert.Equal(2, audit.EnumerateArray().Count(e => e.GetProperty("action").GetString() == "moderation.recorded"));
    }

    [Fact]
    public async Task Moderating_on_a_stale_view_is_a_409_with_the_value_in_force()
    {
        var id = await EvaluationCopies.CopyAtModerationAsync(factory);
        using var client = await factory.SignInAsync(EvaluationCopies.CopyFacilitator);
        var url = $"/api/evaluations/{id}/moderation/quillbright/power";
        Assert.Equal(HttpStatusCode.OK, (await client.PutAsJsonAsync(url, new { term = "F", reason = Reason, agreedBy = new[] { "ravelle" } })).StatusCode);

        var problem = await EvaluationCopies.ProblemAsync(
            await client.PutAsJsonAsync(url, new { term = "MP", reason = Reason, agreedBy = new[] { "ravelle" } }), HttpStatusCode.Conflict);
        Assert.Contains("changed by someone else", problem.GetProperty("detail").GetString());
        Assert.Equal("F", problem.GetProperty("current").GetProperty("term").GetString());
    }

    [Fact]
    public async Task A_moderated_value_needs_a_reason_a_known_term_and_panel_members_who_agreed()
    {
        var id = await factory.DemoEvaluationAsync();
        using var client = await factory.SignInAsync(DecideWebFactory.Facilitator);
        var response = await client.PutAsJsonAsync($"/api/evaluations/{id}/moderation/orrinford/display",
            new { term = "SUPERB", reason = " ", agreedBy = new[] { "ravelle", "nobody" } });
        var errors = (await EvaluationCopies.ProblemAsync(response, HttpStatusCode.BadRequest)).GetProperty("errors");
        Assert.Contains("minute a bidder may read", errors.GetProperty("reason")[0].GetString());
        Assert.Contains("VP", errors.GetProperty("term")[0].GetString());
        Assert.Contains("not an assessor", errors.GetProperty("agreedBy[1]")[0].GetString());

        var numeric = await client.PutAsJsonAsync($"/api/evaluations/{id}/moderation/orrinford/price",
            new { term = "G", reason = Reason, agreedBy = new[] { "ravelle" } });
        Assert.Contains("only linguistic", (await EvaluationCopies.ProblemAsync(numeric, HttpStatusCode.BadRequest)).GetProperty("errors").GetProperty("criterion")[0].GetString());

        var gated = await client.PutAsJsonAsync($"/api/evaluations/{id}/moderation/marrowgate/display",
            new { term = "G", reason = Reason, agreedBy = new[] { "ravelle" } });
        Assert.Contains("not scored", (await EvaluationCopies.ProblemAsync(gated, HttpStatusCode.BadRequest)).GetProperty("errors").GetProperty("alternative")[0].GetString());

        var unknown = await client.PutAsJsonAsync($"/api/evaluations/{id}/moderation/nobody/display",
            new { term = "G", reason = Reason, agreedBy = new[] { "ravelle" } });
        await EvaluationCopies.ProblemAsync(unknown, HttpStatusCode.NotFound);

        var board = await client.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}/moderation");
        Assert.Equal(0, board.GetProperty("moderated").GetInt32());
    }

    [Fact]
    public async Task Only_the_facilitator_moderates()
    {
        var id = await factory.DemoEvaluationAsync();
        foreach (var email in new[] { DecideWebFactory.Observer, DecideWebFactory.Assessor, DecideWebFactory.Approver })
        {
            using var client = await factory.SignInAsync(email);
            var response = await client.PutAsJsonAsync($"/api/evaluations/{id}/moderation/orrinford/display",
                new { term = "G", reason = Reason, agreedBy = new[] { "ravelle" } });
            var problem = await EvaluationCopies.ProblemAsync(response, HttpStatusCode.Forbidden);
            Assert.Contains("role facilitator", problem.GetProperty("detail").GetString());
        }
    }

    [Fact]
    public async Task The_board_and_moderation_are_refused_before_moderation_starts()
    {
        var id = await EvaluationCopies.ImportDemoCopyAsync(factory);
        await EvaluationCopies.SetUpAsync(factory, id, 1, [DecideWebFactory.Approver]);
        await EvaluationCopies.OpenScoringAsync(factory, id);
        using var client = await factory.SignInAsync(EvaluationCopies.CopyFacilitator);
        var board = await EvaluationCopies.ProblemAsync(await client.GetAsync($"/api/evaluations/{id}/moderation"), HttpStatusCode.Conflict);
        Assert.Contains("stage Scoring", board.GetProperty("detail").GetString());
        var put = await client.PutAsJsonAsync($"/api/evaluations/{id}/moderation/orrinford/display",
            new { term = "G", reason = Reason, agreedBy = new[] { "ravelle" } });
        Assert.Contains("only at Moderation", (await EvaluationCopies.ProblemAsync(put, HttpStatusCode.Conflict)).GetProperty("detail").GetString());
    }

    [Fact]
    public async Task Reopening_a_sheet_clears_its_submission_and_audits_the_reason()
    {
        var id = await EvaluationCopies.CopyAtModerationAsync(factory);
        using var client = await factory.SignInAsync(EvaluationCopies.CopyFacilitator);
        var url = $"/api/evaluations/{id}/sheets/abernathy/reopen";
        const string why = "Abernathy asked to correct a rationale that cites the wrong appendix.";

        var noReason = await client.PostAsJsonAsync(url, new { reason = "" });
        Assert.Contains("becomes part of the record", (await EvaluationCopies.ProblemAsync(noReason, HttpStatusCode.BadRequest)).GetProperty("errors").GetProperty("reason")[0].GetString());

        using (var observer = await factory.SignInAsync(DecideWebFactory.Observer))
        {
            await EvaluationCopies.ProblemAsync(await observer.PostAsJsonAsync(url, new { reason = why }), HttpStatusCode.Forbidden);
        }

        var response = await client.PostAsJsonAsync(url, new { reason = why });
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var progress = await client.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}/progress");
        var abernathy = progress.GetProperty("assessors").EnumerateArray().Single(a => a.GetProperty("assessorCode").GetString() == "abernathy");
        Assert.Equal(JsonValueKind.Null, abernathy.GetProperty("submittedAt").ValueKind);
        Assert.All(progress.GetProperty("assessors").EnumerateArray().Where(a => a.GetProperty("assessorCode").GetString() != "abernathy"),
            a => Assert.Equal(JsonValueKind.String, a.GetProperty("submittedAt").ValueKind));

        var again = await client.PostAsJsonAsync(url, new { reason = why });
        Assert.Contains("not submitted", (await EvaluationCopies.ProblemAsync(again, HttpStatusCode.Conflict)).GetProperty("detail").GetString());

        var audit = await EvaluationCopies.AuditAsync(factory, id);
        var entry = audit.EnumerateArray().Single(e => e.GetProperty("action").GetString() == "sheet.reopened");
        Assert.Equal("sheets/abernathy", entry.GetProperty("target").GetString());
        Assert.Contains(why, entry.GetProperty("newValue").GetString());
    }

    [Fact]
    public async Task A_sheet_cannot_be_reopened_during_setup()
    {
        var id = await EvaluationCopies.ImportDemoCopyAsync(factory);
        using var client = await factory.SignInAsync(EvaluationCopies.CopyFacilitator);
        var response = await client.PostAsJsonAsync($"/api/evaluations/{id}/sheets/ravelle/reopen", new { reason = "A reason that is long enough." });
        var problem = await EvaluationCopies.ProblemAsync(response, HttpStatusCode.Conflict);
        Assert.Contains("only at Scoring or Moderation", problem.GetProperty("detail").GetString());
    }

    private static async Task<JsonElement> BoardCellAsync(HttpClient client, Guid id, string alternative, string criterion)
    {
        var board = await client.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}/moderation");
        return board.GetProperty("cells").EnumerateArray()
            .Single(c => c.GetProperty("alternative").GetString() == alternative && c.GetProperty("criterion").GetString() == criterion);
    }

    /// <summary>The ratings as exported: the original ratings, which moderation must not change.</summary>
    private static async Task<string> RatingsAsync(HttpClient client, Guid id) =>
        JsonNode.Parse(await (await client.GetAsync($"/api/evaluations/{id}/export")).Content.ReadAsStringAsync())!["ratings"]!.ToJsonString();
}
