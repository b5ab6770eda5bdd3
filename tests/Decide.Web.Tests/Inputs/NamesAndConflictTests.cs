using System.Net;
using System.Text.Json;
using Decide.Data.Entities;
using Decide.Web.Tests.Support;
using static Decide.Web.Tests.Support.ScenarioPlan;

namespace Decide.Web.Tests.Inputs;

public sealed class NamesAndConflictTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    private const string Recused = "recused: declared conflict of interest";

    [Fact]
    public async Task Bidders_names_and_the_sheet_stay_hidden_until_the_declaration_is_confirmed_against_the_names()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.Scoring);

        Assert.Equal(JsonValueKind.Null, (await s.DetailAsync(s.Ashby)).GetProperty("bids").ValueKind);
        await ApiAssert.ProblemAsync(await s.Ashby.GetAsync(s.Url("/my/sheet")), HttpStatusCode.Forbidden, "stay hidden until you confirm your declaration");
        await ApiAssert.ProblemAsync(await s.Carrow.GetAsync(s.Url("/values")), HttpStatusCode.Forbidden, "stay hidden until you confirm your declaration");

        // The declaration itself lists the bidders to confirm against.
        var mine = await ApiAssert.OkAsync(await s.Ashby.GetAsync(s.Url("/declaration")));
        Assert.True(mine.GetProperty("canConfirmNames").GetBoolean());
        Assert.Equal(Bidders.Select(b => b.Code), mine.GetProperty("bidders").EnumerateArray().Select(b => b.GetProperty("code").GetString()));

        await s.ConfirmNamesAsync(s.Ashby);
        Assert.Equal(Bidders.Length, (await s.DetailAsync(s.Ashby)).GetProperty("bids").GetArrayLength());
        await ApiAssert.OkAsync(await s.Ashby.GetAsync(s.Url("/my/sheet")));
        var entry = Assert.Single(await s.AuditEntriesAsync("declaration.names-confirmed"));
        Assert.Contains("no conflict of interest declared", entry.GetProperty("newValue").GetString());
    }

    [Fact]
    public async Task Names_cannot_be_confirmed_before_scoring_opens()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.PlanLocked);
        var before = await s.StateAsync(s.Ashby, "/declaration");
        await ApiAssert.ProblemAsync(await s.Ashby.PostJsonAsync(s.Url("/declaration/names"), new { conflicts = Array.Empty<object>() }), HttpStatusCode.Conflict, "PlanLocked");
        Assert.Equal(JsonValueKind.Null, (await ApiAssert.OkAsync(await s.Ashby.GetAsync(s.Url("/declaration")))).GetProperty("bidders").ValueKind);
        Assert.Equal(before, await s.StateAsync(s.Ashby, "/declaration"));
    }

    [Fact]
    public async Task A_conflict_declared_with_the_names_recuses_the_assessor_from_every_assigned_criterion_of_that_bidder()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.Scoring);
        await s.ConfirmNamesAsync(s.Brook, (Westmere, "My brother-in-law is a director of Westmere."));

        var sheet = await ApiAssert.OkAsync(await s.Brook.GetAsync(s.Url("/my/sheet")));
        Assert.True(sheet.GetProperty("bidders").EnumerateArray().Single(b => b.GetProperty("code").GetString() == Westmere).GetProperty("recused").GetBoolean());
        var westmere = sheet.GetProperty("cells").EnumerateArray().Where(c => c.GetProperty("alternative").GetString() == Westmere).ToArray();
        Assert.Equal([Quality, Staffing], westmere.Select(c => c.GetProperty("criterion").GetString()));
        Assert.All(westmere, c =>
        {
            Assert.Equal(Recused, c.GetProperty("declined").GetString());
            Assert.True(c.GetProperty("done").GetBoolean());
        });
        Assert.Equal(2, sheet.GetProperty("progress").GetProperty("done").GetInt32());

        Assert.Single(await s.AuditEntriesAsync("conflict.declared"));
        Assert.Equal([$"ratings/brook/{Westmere}/{Quality}", $"ratings/brook/{Westmere}/{Staffing}"],
            (await s.AuditEntriesAsync("rating.recused")).Select(e => e.GetProperty("target").GetString()));
        var conflict = Assert.Single((await ApiAssert.OkAsync(await s.Facilitator.GetAsync(s.Url("/conflicts")))).EnumerateArray());
        Assert.Equal(ScenarioBuilder.Brook, conflict.GetProperty("assessorCode").GetString());
        Assert.Equal(Westmere, conflict.GetProperty("alternative").GetString());

        // The recused cells cannot be rated.
        var before = await s.StateAsync(s.Brook, "/my/sheet");
        await ApiAssert.ProblemAsync(await Scenario.RateAsync(s.Brook, s.Id, Westmere, Quality, "G", 1), HttpStatusCode.Forbidden, "conflict of interest");
        Assert.Equal(before, await s.StateAsync(s.Brook, "/my/sheet"));
    }

    [Fact]
    public async Task A_later_conflict_turns_a_saved_rating_into_a_recusal_and_the_audit_keeps_the_rating_it_replaced()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.Scoring);
        await s.ConfirmNamesAsync(s.Ashby);
        var saved = await ApiAssert.OkAsync(await s.Ashby.PutJsonAsync(s.Url($"/my/ratings/{Northgate}/{Quality}"),
            new { term = "MG", rationale = "The method statement in annex B covers workshops and pits." }));

        await ApiAssert.OkAsync(await s.Ashby.PostJsonAsync(s.Url("/conflicts"),
            new { alternative = Northgate, statement = "Northgate offered me a consultancy contract last week." }));

        var cell = (await ApiAssert.OkAsync(await s.Ashby.GetAsync(s.Url("/my/sheet")))).GetProperty("cells").EnumerateArray()
            .Single(c => c.GetProperty("alternative").GetString() == Northgate && c.GetProperty("criterion").GetString() == Quality);
        Assert.Equal(JsonValueKind.Null, cell.GetProperty("term").ValueKind);
        Assert.Equal(Recused, cell.GetProperty("declined").GetString());
        Assert.True(cell.GetProperty("version").GetInt64() > saved.GetProperty("version").GetInt64());

        var recusals = await s.AuditEntriesAsync("rating.recused");
        Assert.Equal(3, recusals.Count);
        var replaced = recusals.Single(e => e.GetProperty("target").GetString() == $"ratings/ashby/{Northgate}/{Quality}");
        Assert.Contains("annex B covers workshops", replaced.GetProperty("oldValue").GetString());
        Assert.Contains(Recused, replaced.GetProperty("newValue").GetString());
    }

    [Fact]
    public async Task Invalid_conflict_declarations_are_refused_by_field_and_change_nothing()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.Scoring);
        var before = await s.StateAsync(s.Ashby, "/declaration");

        var problem = await ApiAssert.ProblemAsync(await s.Ashby.PostJsonAsync(s.Url("/declaration/names"), new
        {
            conflicts = new object[]
            {
                new { alternative = "nowhere", statement = "A company I used to work for." },
                new { alternative = Eastfold, statement = "friend" },
                new { alternative = Westmere, statement = "I hold shares in Westmere." },
                new { alternative = Westmere, statement = "I hold shares in Westmere, again." },
            },
        }), HttpStatusCode.BadRequest);
        ApiAssert.HasError(problem, "conflicts[0].alternative", "unknown bidder \"nowhere\"");
        ApiAssert.HasError(problem, "conflicts[1].statement", "say what the interest is");
        ApiAssert.HasError(problem, "conflicts[3].alternative", "already declared");
        Assert.Equal(before, await s.StateAsync(s.Ashby, "/declaration"));

        // One more conflict needs the names confirmed first.
        await ApiAssert.ProblemAsync(await s.Ashby.PostJsonAsync(s.Url("/conflicts"), new { alternative = Eastfold, statement = "A former colleague leads the bid." }),
            HttpStatusCode.Forbidden, "confirm your declaration");
        Assert.Equal(before, await s.StateAsync(s.Ashby, "/declaration"));

        await s.ConfirmNamesAsync(s.Ashby);
        var confirmed = await s.StateAsync(s.Ashby, "/declaration");
        await ApiAssert.ProblemAsync(await s.Ashby.PostJsonAsync(s.Url("/declaration/names"), new { conflicts = Array.Empty<object>() }), HttpStatusCode.Conflict, "already");
        Assert.Equal(confirmed, await s.StateAsync(s.Ashby, "/declaration"));
    }

    [Fact]
    public async Task An_assessor_sees_only_their_own_conflicts_and_the_facilitator_sees_everyone_s()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.Scoring);
        await s.ConfirmNamesAsync(s.Ashby, (Eastfold, "Eastfold employs my daughter as a supervisor."));
        await s.ConfirmNamesAsync(s.Brook, (Westmere, "I was a member of the Westmere co-operative until 2025."));

        var ashby = (await ApiAssert.OkAsync(await s.Ashby.GetAsync(s.Url("/conflicts")))).EnumerateArray().ToArray();
        Assert.Equal([Eastfold], ashby.Select(c => c.GetProperty("alternative").GetString()));
        var all = (await ApiAssert.OkAsync(await s.Facilitator.GetAsync(s.Url("/conflicts")))).EnumerateArray().ToArray();
        Assert.Equal([Eastfold, Westmere], all.Select(c => c.GetProperty("alternative").GetString()).Order());
    }
}
