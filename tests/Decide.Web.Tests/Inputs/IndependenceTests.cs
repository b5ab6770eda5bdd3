using System.Net;
using System.Text.Json;
using Decide.Data.Entities;
using Decide.Web.Tests.Support;
using static Decide.Web.Tests.Support.ScenarioPlan;

namespace Decide.Web.Tests.Inputs;

public sealed class IndependenceTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task An_assessor_never_reads_another_assessor_s_ratings()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.Scoring);
        await s.ConfirmNamesAsync(s.Ashby);
        await s.ConfirmNamesAsync(s.Brook);
        const string secret = "Ashby's reading: annex D shows daily audits";
        await ApiAssert.OkAsync(await s.Ashby.PutJsonAsync(s.Url($"/my/ratings/{Northgate}/{Quality}"), new { term = "VG", rationale = secret }));

        var brook = await ApiAssert.OkAsync(await s.Brook.GetAsync(s.Url("/my/sheet")));
        Assert.DoesNotContain("annex D", brook.GetRawText());
        var cell = brook.GetProperty("cells").EnumerateArray().Single(c => c.GetProperty("alternative").GetString() == Northgate && c.GetProperty("criterion").GetString() == Quality);
        Assert.Equal(JsonValueKind.Null, cell.GetProperty("term").ValueKind);

        // Nothing else an assessor can read carries the ratings.
        foreach (var path in new[] { "", "/declaration", "/conflicts", "/gates", "/my/weights" })
        {
            var response = await s.Brook.GetAsync(s.Url(path));
            Assert.DoesNotContain("annex D", await response.Content.ReadAsStringAsync());
        }

        await ApiAssert.ProblemAsync(await s.Brook.GetAsync(s.Url("/audit")), HttpStatusCode.Forbidden, "facilitator");
        await ApiAssert.ProblemAsync(await s.Brook.GetAsync(s.Url("/values")), HttpStatusCode.Forbidden, "withheld");
    }

    [Fact]
    public async Task Quality_assessors_do_not_read_prices_unless_the_plan_makes_them_visible()
    {
        using var hidden = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.Scoring);
        await hidden.ConfirmNamesAsync(hidden.Ashby);
        await hidden.ConfirmNamesAsync(hidden.Carrow);
        await ApiAssert.OkAsync(await hidden.Carrow.PutJsonAsync(hidden.Url($"/values/{Northgate}/{Price}"), new { value = 418_250.0 }));
        await ApiAssert.ProblemAsync(await hidden.Ashby.GetAsync(hidden.Url("/values")), HttpStatusCode.Forbidden, "withheld from quality assessors");
        Assert.DoesNotContain("418250", await (await hidden.Ashby.GetAsync(hidden.Url())).Content.ReadAsStringAsync());

        using var visible = await new ScenarioBuilder(factory).WithPricesVisibleToAssessors().BuildAsync(EvaluationStage.Scoring);
        await visible.ConfirmNamesAsync(visible.Ashby);
        await visible.ConfirmNamesAsync(visible.Carrow);
        await ApiAssert.OkAsync(await visible.Carrow.PutJsonAsync(visible.Url($"/values/{Northgate}/{Price}"), new { value = 418_250.0 }));
        var values = await ApiAssert.OkAsync(await visible.Ashby.GetAsync(visible.Url("/values")));
        Assert.False(values.GetProperty("editable").GetBoolean());
        Assert.Equal(418_250.0, values.GetProperty("cells").EnumerateArray()
            .Single(c => c.GetProperty("alternative").GetString() == Northgate).GetProperty("value").GetDouble());
        await ApiAssert.ProblemAsync(await visible.Ashby.PutJsonAsync(visible.Url($"/values/{Westmere}/{Price}"), new { value = 1.0 }), HttpStatusCode.Forbidden, "priceevaluator");
    }
}
