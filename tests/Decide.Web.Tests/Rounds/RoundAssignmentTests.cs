using System.Net;
using System.Text.Json;
using Decide.Data.Entities;
using Decide.Web.Tests.Support;
using static Decide.Web.Tests.Support.ScenarioPlan;

namespace Decide.Web.Tests.Rounds;

/// <summary>
/// A round through the API, as a facilitator and two reviewers run it: conflicts declared against the applicants'
/// names before scoring, Decide's proposal keeping the conflicted reviewer off, an edit refused for a conflict, the
/// assignment frozen when scoring opens (and refused while the design falls apart), each sheet holding only its own
/// applications, and the results carrying the funding line.
/// </summary>
public sealed class RoundAssignmentTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task A_round_is_assigned_around_conflicts_frozen_at_scoring_and_scored_without_fake_cells()
    {
        using var s = await new ScenarioBuilder(factory).WithRound(k: 1, maxLoad: 3, budget: 65_000).BuildAsync(EvaluationStage.PlanLocked);

        // Before scoring, in a round, reviewers confirm against the names and declare conflicts.
        await s.ConfirmNamesAsync(s.Brook, (Northgate, "My sister manages Northgate's depot contracts."));
        await s.ConfirmNamesAsync(s.Ashby);

        var proposed = await ApiAssert.OkAsync(await s.Facilitator.PostJsonAsync(s.Url("/assignment/propose"), new { seed = 7 }));
        var brook = Reviewer(proposed, ScenarioBuilder.Brook);
        Assert.DoesNotContain(Northgate, brook.GetProperty("applications").EnumerateArray().Select(a => a.GetString()));
        Assert.Contains(Northgate, brook.GetProperty("conflicts").EnumerateArray().Select(a => a.GetString()));
        Assert.All(proposed.GetProperty("applications").EnumerateArray(), a => Assert.Equal(1, a.GetProperty("reviewers").GetArrayLength()));
        Assert.Single(await s.AuditEntriesAsync("assignment.proposed"));

        // An edit that gives Brook the application he is conflicted with is refused by its position.
        var refused = await ApiAssert.ProblemAsync(await s.Facilitator.PutJsonAsync(s.Url($"/assignment/{ScenarioBuilder.Brook}"),
            new { applications = new[] { Westmere, Northgate } }), HttpStatusCode.BadRequest);
        ApiAssert.HasError(refused, "applications[1]", "declared a conflict of interest with \"Northgate Facility Care\"");

        // A design that falls into two parts is refused when scoring is opened, and nothing moves.
        await ApiAssert.OkAsync(await s.Facilitator.PutJsonAsync(s.Url($"/assignment/{ScenarioBuilder.Ashby}"), new { applications = new[] { Northgate, Westmere } }));
        await ApiAssert.OkAsync(await s.Facilitator.PutJsonAsync(s.Url($"/assignment/{ScenarioBuilder.Brook}"), new { applications = new[] { Eastfold } }));
        var parts = await ApiAssert.OkAsync(await s.Facilitator.GetAsync(s.Url("/assignment")));
        Assert.Contains(parts.GetProperty("problems").EnumerateArray(), p => p.GetString()!.Contains("falls into 2 parts that share no reviewer"));
        await ApiAssert.ProblemAsync(await s.Facilitator.PostJsonAsync(s.Url("/open-scoring"), new { version = await s.VersionAsync() }),
            HttpStatusCode.Conflict, "the assignment of reviewers is not ready");
        Assert.Equal(EvaluationStage.PlanLocked, await s.StageAsync());

        // Ashby reads everything (he rates every criterion); Brook reads two, so the design is joined.
        await ApiAssert.OkAsync(await s.Facilitator.PutJsonAsync(s.Url($"/assignment/{ScenarioBuilder.Ashby}"), new { applications = new[] { Northgate, Westmere, Eastfold } }));
        await ApiAssert.OkAsync(await s.Facilitator.PutJsonAsync(s.Url($"/assignment/{ScenarioBuilder.Brook}"), new { applications = new[] { Westmere, Eastfold } }));
        var ready = await ApiAssert.OkAsync(await s.Facilitator.GetAsync(s.Url("/assignment")));
        Assert.Empty(ready.GetProperty("problems").EnumerateArray());
        await ApiAssert.OkAsync(await s.Facilitator.PostJsonAsync(s.Url("/open-scoring"), new { version = await s.VersionAsync() }));
        Assert.Equal("5 reviews frozen as assigned", (await s.AuditEntriesAsync("assignment.frozen")).Single().GetProperty("newValue").GetString());

        // Frozen: no more edits.
        await ApiAssert.ProblemAsync(await s.Facilitator.PutJsonAsync(s.Url($"/assignment/{ScenarioBuilder.Brook}"), new { applications = new[] { Westmere } }),
            HttpStatusCode.Conflict, "frozen when scoring opens");

        // Brook's sheet holds his two applications and nothing else; rating another is refused.
        var sheet = await ApiAssert.OkAsync(await s.Brook.GetAsync(s.Url("/my/sheet")));
        Assert.Equal([Westmere, Eastfold], sheet.GetProperty("bidders").EnumerateArray().Select(b => b.GetProperty("code").GetString()));
        await ApiAssert.ProblemAsync(await Scenario.RateAsync(s.Brook, s.Id, Northgate, Quality, "G"), HttpStatusCode.Forbidden, "is not assigned to you");

        // An assessor sees only their own list.
        var own = await ApiAssert.OkAsync(await s.Brook.GetAsync(s.Url("/assignment")));
        Assert.Equal([ScenarioBuilder.Brook], own.GetProperty("reviewers").EnumerateArray().Select(r => r.GetProperty("code").GetString()));
        Assert.Empty(own.GetProperty("applications").EnumerateArray());

        foreach (var (bid, _) in Bidders)
        {
            await ApiAssert.OkAsync(await s.Facilitator.PutJsonAsync(s.Url($"/gates/{bid}/{Insurance}"), new { passed = true, note = "Certificate seen." }));
        }

        await s.ConfirmNamesAsync(s.Carrow);
        foreach (var (bid, price) in new[] { (Northgate, 120_000.0), (Westmere, 110_000.0), (Eastfold, 100_000.0) })
        {
            await ApiAssert.OkAsync(await s.Carrow.PutJsonAsync(s.Url($"/values/{bid}/{Price}"), new { value = price }));
        }

        await s.CompleteSheetAsync(s.Ashby);
        await s.CompleteSheetAsync(s.Brook);

        // The board counts each reviewer's own cells: Brook two applications × his two criteria, Ashby three × three.
        var board = await ApiAssert.OkAsync(await s.Facilitator.GetAsync(s.Url("/progress")));
        var rows = board.GetProperty("assessors").EnumerateArray().ToDictionary(a => a.GetProperty("assessorCode").GetString()!);
        Assert.Equal((4, 4), (rows[ScenarioBuilder.Brook].GetProperty("ratingsDone").GetInt32(), rows[ScenarioBuilder.Brook].GetProperty("ratingsTotal").GetInt32()));
        Assert.Equal((9, 9), (rows[ScenarioBuilder.Ashby].GetProperty("ratingsDone").GetInt32(), rows[ScenarioBuilder.Ashby].GetProperty("ratingsTotal").GetInt32()));
        await ApiAssert.OkAsync(await s.Facilitator.PostJsonAsync(s.Url("/start-moderation"), new { version = await s.VersionAsync() }));

        var results = await ApiAssert.OkAsync(await s.Observer.GetAsync(s.Url("/results?draws=300")));
        var round = results.GetProperty("round");
        Assert.Equal(3, round.GetProperty("order").GetArrayLength());
        Assert.Equal(65_000, round.GetProperty("funding").GetProperty("budget").GetDouble());
        var northgate = results.GetProperty("matrix").EnumerateArray().First(c => c.GetProperty("alternative").GetString() == Northgate && c.GetProperty("criterion").GetString() == Quality);
        Assert.Equal(1, northgate.GetProperty("raters").GetInt32()); // Ashby alone: Brook is neither imputed nor declined
        Assert.Empty(northgate.GetProperty("declined").EnumerateArray());
    }

    [Fact]
    public async Task An_evaluation_that_is_not_a_round_has_no_assignment()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync();
        await ApiAssert.ProblemAsync(await s.Facilitator.PostJsonAsync(s.Url("/assignment/propose"), new { }), HttpStatusCode.Conflict, "is not a round");
    }

    [Fact]
    public async Task A_proposal_that_cannot_be_met_says_how_many_reviewers_are_missing()
    {
        // Three bids, two reviewers who may read one each: 3 × 1 reviews needed, 2 available.
        using var s = await new ScenarioBuilder(factory).WithRound(k: 1, maxLoad: 1, budget: 65_000).BuildAsync(EvaluationStage.PlanLocked);
        var problem = await ApiAssert.ProblemAsync(await s.Facilitator.PostJsonAsync(s.Url("/assignment/propose"), new { }), HttpStatusCode.BadRequest);
        ApiAssert.HasError(problem, "assignment", "1 more reviewer is missing");
        Assert.Empty(await s.AuditEntriesAsync("assignment.proposed"));
    }

    private static JsonElement Reviewer(JsonElement view, string code) =>
        view.GetProperty("reviewers").EnumerateArray().Single(r => r.GetProperty("code").GetString() == code);
}
