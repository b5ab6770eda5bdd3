using System.Net;
using System.Text.Json;
using Decide.Data.Entities;
using Decide.Web.Tests.Support;
using static Decide.Web.Tests.Support.ScenarioPlan;

namespace Decide.Web.Tests.Award;

/// <summary>
/// A published points award run in two stages through the API, as the panel runs it: prices sealed while quality is
/// scored and moderated, opened once moderation is closed (and only for the bids that passed the threshold), a
/// flagged price reviewed, the award read as the table a bidder can recompute.
/// </summary>
public sealed class TwoStageAwardTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    /// <summary>
    /// Ratings on the 0–5 scale: Northgate strong (Ashby 5 and Brook 1 on quality: a divergent cell to moderate),
    /// Westmere fair, Eastfold weak (below the 40 % quality threshold).
    /// </summary>
    private static async Task<Scenario> ScoredAsync(DecideWebFactory factory)
    {
        var s = await new ScenarioBuilder(factory).WithPointsAward(twoStage: true).BuildAsync(EvaluationStage.Scoring);
        foreach (var (bid, _) in Bidders)
        {
            await ApiAssert.OkAsync(await s.Facilitator.PutJsonAsync(s.Url($"/gates/{bid}/{Insurance}"), new { passed = true, note = "Certificate seen." }));
        }

        var terms = new Dictionary<string, (string Ashby, string Brook)>
        {
            [Northgate] = ("5", "1"), [Westmere] = ("3", "3"), [Eastfold] = ("1", "1"),
        };
        foreach (var (code, client) in s.Assessors)
        {
            await s.ConfirmNamesAsync(client);
            foreach (var (bid, term) in terms)
            {
                foreach (var criterion in Scenario.CriteriaOf(code))
                {
                    var given = bid == Northgate && criterion != Quality ? "4" : code == ScenarioBuilder.Ashby ? term.Ashby : term.Brook;
                    await ApiAssert.OkAsync(await Scenario.RateAsync(client, s.Id, bid, criterion, given));
                }
            }

            await ApiAssert.OkAsync(await client.PostJsonAsync(s.Url("/my/submit")));
        }

        await s.ConfirmNamesAsync(s.Carrow);
        return s;
    }

    [Fact]
    public async Task Prices_stay_sealed_until_moderation_is_closed_then_open_for_the_bids_that_remain_and_the_award_is_recomputable()
    {
        using var s = await ScoredAsync(factory);

        // Scoring: no price can be entered, so none can be shown or exported.
        await ApiAssert.ProblemAsync(await s.Carrow.PutJsonAsync(s.Url($"/values/{Northgate}/{Price}"), new { value = 100_000.0 }), HttpStatusCode.Conflict, "prices stay sealed");
        var export = await (await s.Facilitator.GetAsync(s.Url("/export"))).Content.ReadAsStringAsync();
        Assert.False(JsonDocument.Parse(export).RootElement.TryGetProperty("values", out var none) && none.EnumerateObject().Any());

        await ApiAssert.OkAsync(await s.Facilitator.PostJsonAsync(s.Url("/start-moderation"), new { version = await s.VersionAsync() }));

        // Moderation, prices sealed: the ranking is refused, the quality stage of the award is shown.
        await ApiAssert.ProblemAsync(await s.Observer.GetAsync(s.Url("/results")), HttpStatusCode.Conflict, "prices stay sealed");
        await ApiAssert.ProblemAsync(await s.Observer.GetAsync(s.Url("/export/results.csv")), HttpStatusCode.Conflict, "prices stay sealed");
        var quality = await ApiAssert.OkAsync(await s.Observer.GetAsync(s.Url("/award")));
        Assert.True(quality.GetProperty("pricesSealed").GetBoolean());
        var eastfold = Bid(quality, Eastfold);
        Assert.Equal("below the quality threshold", eastfold.GetProperty("excluded").GetString());
        Assert.All(quality.GetProperty("award").GetProperty("bids").EnumerateArray(), b => Assert.Equal(JsonValueKind.Null, b.GetProperty("price").ValueKind));

        // Opening is refused while a divergent cell is not moderated (Northgate quality: 5 against 1).
        await ApiAssert.ProblemAsync(await s.Facilitator.PostJsonAsync(s.Url("/open-prices"), new { version = await s.VersionAsync() }), HttpStatusCode.Conflict, "quality moderation is still open");
        await ApiAssert.OkAsync(await s.Facilitator.PutJsonAsync(s.Url($"/moderation/{Northgate}/{Quality}"),
            new { term = "4", reason = "The panel read section 2 together: a depot-specific method with weekly checks.", agreedBy = new[] { ScenarioBuilder.Ashby, ScenarioBuilder.Brook } }));
        var opened = await ApiAssert.OkAsync(await s.Facilitator.PostJsonAsync(s.Url("/open-prices"), new { version = await s.VersionAsync() }));
        Assert.Contains(opened.GetProperty("warnings").EnumerateArray(), w => w.GetString()!.StartsWith("Eastfold Property Services takes no part in price", StringComparison.Ordinal));
        Assert.Single(await s.AuditEntriesAsync("prices.opened"));
        await ApiAssert.ProblemAsync(await s.Observer.GetAsync(s.Url("/results")), HttpStatusCode.Conflict, "is not entered");
        Assert.True((await ApiAssert.OkAsync(await s.Observer.GetAsync(s.Url("/award")))).GetProperty("award").GetProperty("pricesSealed").GetBoolean());

        // Quality is final now; the price of a bid below the threshold stays sealed.
        await ApiAssert.ProblemAsync(await s.Facilitator.PutJsonAsync(s.Url($"/moderation/{Westmere}/{Quality}"),
            new { term = "4", reason = "Second thoughts after the prices were seen.", agreedBy = new[] { ScenarioBuilder.Ashby } }), HttpStatusCode.Conflict, "quality was closed");
        await ApiAssert.ProblemAsync(await s.Carrow.PutJsonAsync(s.Url($"/values/{Eastfold}/{Price}"), new { value = 60_000.0 }), HttpStatusCode.Conflict, "takes no part in price");
        await ApiAssert.OkAsync(await s.Carrow.PutJsonAsync(s.Url($"/values/{Northgate}/{Price}"), new { value = 100_000.0 }));
        await ApiAssert.OkAsync(await s.Carrow.PutJsonAsync(s.Url($"/values/{Westmere}/{Price}"), new { value = 70_000.0 }));

        // Westmere is 30 % below the mean of the others (100,000): flagged, and sign-off waits for the decision.
        var flagged = await ApiAssert.OkAsync(await s.Facilitator.GetAsync(s.Url("/award")));
        Assert.Equal([Westmere], flagged.GetProperty("award").GetProperty("awaitingDecision").EnumerateArray().Select(x => x.GetString()));
        Assert.Equal(JsonValueKind.Null, flagged.GetProperty("award").GetProperty("winner").ValueKind);
        await ApiAssert.ProblemAsync(await s.Facilitator.PostJsonAsync(s.Url("/approvals/request"),
            new { note = "The panel recommends the award as computed.", version = await s.VersionAsync() }), HttpStatusCode.Conflict, "abnormally low");

        var problem = await ApiAssert.ProblemAsync(await s.Facilitator.PutJsonAsync(s.Url($"/low-price-reviews/{Westmere}"),
            new { asked = "Please explain how the price covers the specified staffing.", decision = "accepted" }), HttpStatusCode.BadRequest);
        ApiAssert.HasError(problem, "reasons", "reasons");
        await ApiAssert.ProblemAsync(await s.Facilitator.PutJsonAsync(s.Url($"/low-price-reviews/{Northgate}"),
            new { asked = "Please explain your price in full." }), HttpStatusCode.Conflict, "not flagged");
        var reviewed = await ApiAssert.OkAsync(await s.Facilitator.PutJsonAsync(s.Url($"/low-price-reviews/{Westmere}"), new
        {
            asked = "Please explain how the price covers the specified staffing.",
            answer = "Our depot is next door and our staff already work the neighbouring contract.",
            decision = "accepted",
            reasons = "The shared depot and staff account for the difference; the price is sustainable.",
        }));
        Assert.Equal("accepted", reviewed.GetProperty("reviews")[0].GetProperty("decision").GetString());
        Assert.Single(await s.AuditEntriesAsync("low-price.reviewed"));

        // The award, worked with a calculator from the ratings (0–5 scale; quality 30, staffing 20, response 10, price 40):
        // Northgate: quality moderated 4 → 24; staffing (4 + 4)/2 = 4 → 16; response 4 → 8; quality points 48.
        //   Price 40 × 70,000 / 100,000 = 28; total 76.
        // Westmere: quality 3 → 18; staffing 3 → 12; response 3 → 6; 36. Price 40; total 76 — a tie, broken by the
        //   default first rule, the higher quality points: Northgate first.
        var award = (await ApiAssert.OkAsync(await s.Observer.GetAsync(s.Url("/award")))).GetProperty("award");
        var northgate = Bid(award, Northgate);
        Assert.Equal(48, northgate.GetProperty("qualityPoints").GetDouble(), 9);
        Assert.Equal(28, northgate.GetProperty("pricePoints").GetDouble(), 9);
        Assert.Equal(76, northgate.GetProperty("total").GetDouble(), 9);
        Assert.Equal(1, northgate.GetProperty("rank").GetInt32());
        Assert.Equal("higher-quality", northgate.GetProperty("decidedBy").GetString());
        Assert.Equal(76, Bid(award, Westmere).GetProperty("total").GetDouble(), 9);
        Assert.Equal(Northgate, award.GetProperty("winner").GetString());
        Assert.Equal("moderated", northgate.GetProperty("cells")[0].GetProperty("source").GetString());

        // The results document now carries the same table.
        var results = await ApiAssert.OkAsync(await s.Observer.GetAsync(s.Url("/results?draws=0")));
        Assert.Equal(Northgate, results.GetProperty("pointsAward").GetProperty("winner").GetString());
        var csv = await (await s.Observer.GetAsync(s.Url("/export/award.csv"))).Content.ReadAsStringAsync();
        Assert.Contains("quality_points", csv, StringComparison.Ordinal);
        Assert.Contains(Northgate, csv, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Under_points_weighting_assessors_give_no_weights_and_the_plan_locks_without_them()
    {
        using var s = await new ScenarioBuilder(factory).WithPointsAward(twoStage: false).BuildAsync();
        await s.SignDeclarationAsync(s.Ashby);
        await ApiAssert.ProblemAsync(await s.Ashby.PutJsonAsync(s.Url("/my/weights"), new { importance = new Dictionary<string, string> { [Quality] = "H" } }),
            HttpStatusCode.Conflict, "published in the plan");
        var setup = await ApiAssert.OkAsync(await s.Facilitator.GetAsync(s.Url("/setup")));
        Assert.DoesNotContain("weights", setup.GetRawText(), StringComparison.OrdinalIgnoreCase);

        await s.SignDeclarationAsync(s.Brook);
        await s.SignDeclarationAsync(s.Carrow);
        await ApiAssert.OkAsync(await s.Facilitator.PostJsonAsync(s.Url("/lock-plan"), new { version = await s.VersionAsync() }));
        Assert.Equal(EvaluationStage.PlanLocked, await s.StageAsync());

        // The methodology published with the tender is the one whose fingerprint was stored at lock.
        var text = await (await s.Ashby.GetAsync(s.Url("/methodology.txt"))).Content.ReadAsByteArrayAsync();
        var stored = (await s.DetailAsync()).GetProperty("methodologyHash").GetString();
        Assert.Equal(Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(text)), stored);
        Assert.Contains("Lowest-price ratio", System.Text.Encoding.UTF8.GetString(text), StringComparison.Ordinal);
        var pdf = await s.Observer.GetAsync(s.Url("/methodology.pdf"));
        Assert.Equal("application/pdf", pdf.Content.Headers.ContentType?.MediaType);
    }

    private static JsonElement Bid(JsonElement view, string bid)
    {
        var award = view.TryGetProperty("award", out var inner) ? inner : view;
        return award.GetProperty("bids").EnumerateArray().Single(b => b.GetProperty("alternative").GetString() == bid);
    }
}
