using System.Net;
using System.Text.Json;
using Decide.Data.Entities;
using Decide.Web.Tests.Support;
using static Decide.Web.Tests.Support.ScenarioPlan;

namespace Decide.Web.Tests.Inputs;

public sealed class RatingSheetTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task The_sheet_shows_every_bidder_against_the_assigned_criteria_with_descriptors_and_progress()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.Scoring);
        await s.ConfirmNamesAsync(s.Brook);

        var sheet = await ApiAssert.OkAsync(await s.Brook.GetAsync(s.Url("/my/sheet")));
        Assert.Equal(ScenarioBuilder.Brook, sheet.GetProperty("assessor").GetString());
        Assert.Equal(Bidders.Select(b => b.Code), sheet.GetProperty("bidders").EnumerateArray().Select(b => b.GetProperty("code").GetString()));
        Assert.Equal([Quality, Staffing], sheet.GetProperty("criteria").EnumerateArray().Select(c => c.GetProperty("id").GetString()));
        Assert.Equal(RatingTerms, sheet.GetProperty("scale").EnumerateArray().Select(t => t.GetProperty("code").GetString()));
        var quality = sheet.GetProperty("criteria")[0];
        Assert.Equal(RatingTerms, quality.GetProperty("descriptors").EnumerateObject().Select(d => d.Name));
        Assert.False(string.IsNullOrEmpty(quality.GetProperty("description").GetString()));

        var cells = sheet.GetProperty("cells").EnumerateArray().ToArray();
        Assert.Equal(Bidders.Length * 2, cells.Length);
        Assert.All(cells, c => Assert.Equal(JsonValueKind.Null, c.GetProperty("version").ValueKind));
        Assert.Equal(0, sheet.GetProperty("progress").GetProperty("done").GetInt32());
        Assert.Equal(Bidders.Length * 2, sheet.GetProperty("progress").GetProperty("total").GetInt32());
        Assert.Equal(20, sheet.GetProperty("minRationaleLength").GetInt32());
        Assert.True(sheet.GetProperty("editable").GetBoolean());
        Assert.False(sheet.GetProperty("submitted").GetBoolean());
        Assert.DoesNotContain(Price, sheet.GetRawText());
    }

    [Fact]
    public async Task The_sheet_opens_only_when_scoring_opens()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.PlanLocked);
        await ApiAssert.ProblemAsync(await s.Ashby.GetAsync(s.Url("/my/sheet")), HttpStatusCode.Conflict, "opens when scoring opens");
    }

    [Fact]
    public async Task A_first_save_has_no_version_and_every_later_save_needs_the_current_one()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.Scoring);
        await s.ConfirmNamesAsync(s.Ashby);
        var url = s.Url($"/my/ratings/{Westmere}/{Staffing}");

        var before = await s.StateAsync(s.Ashby, "/my/sheet");
        var early = await ApiAssert.ProblemAsync(await s.Ashby.PutJsonAsync(url, new { term = "G", rationale = "Two supervisors per shift, see staffing plan p. 12.", version = 3 }), HttpStatusCode.BadRequest);
        ApiAssert.HasError(early, "version", "not been saved yet");
        Assert.Equal(before, await s.StateAsync(s.Ashby, "/my/sheet"));

        var first = await ApiAssert.OkAsync(await s.Ashby.PutJsonAsync(url, new { term = "G", rationale = "Two supervisors per shift, see staffing plan p. 12." }));
        var v1 = first.GetProperty("version").GetInt64();
        Assert.True(first.GetProperty("done").GetBoolean());

        var second = await ApiAssert.OkAsync(await s.Ashby.PutJsonAsync(url, new { term = "MG", rationale = "Cover for absence relies on agency staff (p. 13).", version = v1 }));
        var v2 = second.GetProperty("version").GetInt64();
        Assert.NotEqual(v1, v2);

        before = await s.StateAsync(s.Ashby, "/my/sheet");
        foreach (long? stale in new long?[] { v1, null })
        {
            var conflict = await ApiAssert.ProblemAsync(await s.Ashby.PutJsonAsync(url, new { term = "VG", rationale = "Overwriting from an old screen.", version = stale }),
                HttpStatusCode.Conflict, "changed by someone else");
            var current = conflict.GetProperty("current");
            Assert.Equal("MG", current.GetProperty("term").GetString());
            Assert.Equal(v2, current.GetProperty("version").GetInt64());
        }

        Assert.Equal(before, await s.StateAsync(s.Ashby, "/my/sheet"));
    }

    [Fact]
    public async Task Invalid_ratings_are_refused_by_field_naming_what_is_wrong_and_change_nothing()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.Scoring);
        await s.ConfirmNamesAsync(s.Brook);
        var before = await s.StateAsync(s.Brook, "/my/sheet");
        var cell = s.Url($"/my/ratings/{Northgate}/{Quality}");

        ApiAssert.HasError(await ApiAssert.ProblemAsync(await s.Brook.PutJsonAsync(cell, new { term = "XX", rationale = "The method statement covers every area." }), HttpStatusCode.BadRequest),
            "term", "unknown term \"XX\"; the rating scale has VP, P, MP, F, MG, G, VG");
        ApiAssert.HasError(await ApiAssert.ProblemAsync(await s.Brook.PutJsonAsync(cell, new { term = "G", rationale = "Good method." }), HttpStatusCode.BadRequest),
            "rationale", "at least 20 characters");
        ApiAssert.HasError(await ApiAssert.ProblemAsync(await s.Brook.PutJsonAsync(cell, new { term = "G" }), HttpStatusCode.BadRequest),
            "rationale", "at least 20 characters");
        ApiAssert.HasError(await ApiAssert.ProblemAsync(await s.Brook.PutJsonAsync(cell, new { declined = "  " }), HttpStatusCode.BadRequest),
            "declined", "say why you decline");
        ApiAssert.HasError(await ApiAssert.ProblemAsync(await s.Brook.PutJsonAsync(cell, new { term = "G", declined = "Outside my expertise." }), HttpStatusCode.BadRequest),
            "term", "not both");
        ApiAssert.HasError(await ApiAssert.ProblemAsync(await s.Brook.PutJsonAsync(cell, new { term = "VG", rationale = "The bid offers as good, with a record of audited results on similar sites." }), HttpStatusCode.BadRequest),
            "rationale", "repeats the criterion or a descriptor");

        await ApiAssert.ProblemAsync(await Scenario.RateAsync(s.Brook, s.Id, "nowhere", Quality, "G"), HttpStatusCode.NotFound, "Bid \"nowhere\"");
        await ApiAssert.ProblemAsync(await Scenario.RateAsync(s.Brook, s.Id, Northgate, "nothing", "G"), HttpStatusCode.NotFound, "Criterion \"nothing\"");
        ApiAssert.HasError(await ApiAssert.ProblemAsync(await Scenario.RateAsync(s.Brook, s.Id, Northgate, Response, "G"), HttpStatusCode.BadRequest),
            "criterion", "\"response\" is not assigned to you");
        ApiAssert.HasError(await ApiAssert.ProblemAsync(await Scenario.RateAsync(s.Brook, s.Id, Northgate, Price, "G"), HttpStatusCode.BadRequest),
            "criterion", "numeric");
        ApiAssert.HasError(await ApiAssert.ProblemAsync(await Scenario.RateAsync(s.Brook, s.Id, Northgate, Insurance, "G"), HttpStatusCode.BadRequest),
            "criterion", "pass/fail gate");

        Assert.Equal(before, await s.StateAsync(s.Brook, "/my/sheet"));
    }

    [Fact]
    public async Task Submitting_an_incomplete_sheet_lists_every_missing_cell_and_changes_nothing()
    {
        using var s = await new ScenarioBuilder(factory).WithMinRationaleLength(30).BuildAsync(EvaluationStage.Scoring);
        await s.ConfirmNamesAsync(s.Brook);
        await ApiAssert.OkAsync(await s.Brook.PutJsonAsync(s.Url($"/my/ratings/{Northgate}/{Quality}"),
            new { term = "G", rationale = "Independent monthly audits, annex C, pages 3 to 5." }));
        await ApiAssert.OkAsync(await s.Brook.PutJsonAsync(s.Url($"/my/ratings/{Northgate}/{Staffing}"), new { declined = "Outside my expertise: staffing law." }));

        var before = await s.StateAsync(s.Brook, "/my/sheet");
        var problem = await ApiAssert.ProblemAsync(await s.Brook.PostJsonAsync(s.Url("/my/submit")), HttpStatusCode.BadRequest, "4 cell(s)");
        var missing = problem.GetProperty("errors").EnumerateObject().Select(e => e.Name).Order().ToArray();
        Assert.Equal(
            new[] { Eastfold, Westmere }.SelectMany(a => new[] { Quality, Staffing }.Select(c => $"ratings.{a}.{c}")).Order(),
            missing);
        Assert.Equal(before, await s.StateAsync(s.Brook, "/my/sheet"));
    }

    [Fact]
    public async Task A_submitted_sheet_is_read_only_and_each_save_and_the_submission_are_audited()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.Scoring);
        await s.CompleteSheetAsync(s.Brook);

        var sheet = await ApiAssert.OkAsync(await s.Brook.GetAsync(s.Url("/my/sheet")));
        Assert.True(sheet.GetProperty("submitted").GetBoolean());
        Assert.False(sheet.GetProperty("editable").GetBoolean());
        Assert.Equal(sheet.GetProperty("progress").GetProperty("total").GetInt32(), sheet.GetProperty("progress").GetProperty("done").GetInt32());

        var before = await s.StateAsync(s.Brook, "/my/sheet");
        var version = sheet.GetProperty("cells")[0].GetProperty("version").GetInt64();
        await ApiAssert.ProblemAsync(await Scenario.RateAsync(s.Brook, s.Id, Northgate, Quality, "VP", version), HttpStatusCode.Conflict, "read-only");
        await ApiAssert.ProblemAsync(await s.Brook.PostJsonAsync(s.Url("/my/submit")), HttpStatusCode.Conflict, "read-only");
        Assert.Equal(before, await s.StateAsync(s.Brook, "/my/sheet"));

        var saved = await s.AuditEntriesAsync("rating.saved");
        Assert.Equal(Bidders.Length * 2, saved.Count(e => e.GetProperty("target").GetString()!.StartsWith("ratings/brook/", StringComparison.Ordinal)));
        var submitted = Assert.Single(await s.AuditEntriesAsync("sheet.submitted"));
        Assert.Equal("sheets/brook", submitted.GetProperty("target").GetString());
    }

    [Fact]
    public async Task A_changed_rating_is_audited_with_what_it_replaced()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.Scoring);
        await s.ConfirmNamesAsync(s.Ashby);
        var url = s.Url($"/my/ratings/{Eastfold}/{Response}");
        var first = await ApiAssert.OkAsync(await s.Ashby.PutJsonAsync(url, new { term = "F", rationale = "Four-hour response by day only (schedule 2)." }));
        await ApiAssert.OkAsync(await s.Ashby.PutJsonAsync(url, new { declined = "I wrote the response schedule in the tender documents.", version = first.GetProperty("version").GetInt64() }));

        var entries = (await s.AuditAsync()).EnumerateArray().Where(e => e.GetProperty("target").GetString() == $"ratings/ashby/{Eastfold}/{Response}").ToArray();
        Assert.Equal(["rating.saved", "rating.declined"], entries.Select(e => e.GetProperty("action").GetString()));
        Assert.Equal(JsonValueKind.Null, entries[0].GetProperty("oldValue").ValueKind);
        Assert.Contains("Four-hour response", entries[1].GetProperty("oldValue").GetString());
        Assert.Contains("declined: I wrote the response schedule", entries[1].GetProperty("newValue").GetString());
    }

    [Fact]
    public async Task A_bid_that_failed_a_gate_is_not_required_and_not_rated()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.Scoring);
        await ApiAssert.OkAsync(await s.Facilitator.PutJsonAsync(s.Url($"/gates/{Eastfold}/{Insurance}"),
            new { passed = false, note = "The certificate covers EUR 5 million only." }));
        await s.ConfirmNamesAsync(s.Brook);

        var sheet = await ApiAssert.OkAsync(await s.Brook.GetAsync(s.Url("/my/sheet")));
        var eastfold = sheet.GetProperty("bidders").EnumerateArray().Single(b => b.GetProperty("code").GetString() == Eastfold);
        Assert.Equal([Insurance], eastfold.GetProperty("failedGates").EnumerateArray().Select(g => g.GetString()));
        Assert.Equal((Bidders.Length - 1) * 2, sheet.GetProperty("progress").GetProperty("total").GetInt32());

        var before = await s.StateAsync(s.Brook, "/my/sheet");
        await ApiAssert.ProblemAsync(await Scenario.RateAsync(s.Brook, s.Id, Eastfold, Quality, "G"), HttpStatusCode.Conflict, "failed the gate insurance");
        Assert.Equal(before, await s.StateAsync(s.Brook, "/my/sheet"));
    }
}
