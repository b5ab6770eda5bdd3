using System.Net;
using Decide.Data.Entities;
using Decide.Web.Tests.Support;
using static Decide.Web.Tests.Support.ScenarioPlan;

namespace Decide.Web.Tests.Inputs;

public sealed class PriceValueTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task The_price_evaluator_enters_a_value_that_is_shown_and_audited()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.Scoring);
        await s.ConfirmNamesAsync(s.Carrow);

        var saved = await ApiAssert.OkAsync(await s.Carrow.PutJsonAsync(s.Url($"/values/{Westmere}/{Price}"), new { value = 362_400.5 }));
        Assert.Equal(362_400.5, saved.GetProperty("value").GetDouble());
        var values = await ApiAssert.OkAsync(await s.Carrow.GetAsync(s.Url("/values")));
        Assert.True(values.GetProperty("editable").GetBoolean());
        Assert.Equal([Price], values.GetProperty("criteria").EnumerateArray().Select(c => c.GetProperty("id").GetString()));
        Assert.Equal(Bidders.Length, values.GetProperty("cells").GetArrayLength());

        var corrected = await ApiAssert.OkAsync(await s.Carrow.PutJsonAsync(s.Url($"/values/{Westmere}/{Price}"),
            new { value = 362_040.5, version = saved.GetProperty("version").GetInt64() }));
        Assert.Equal(362_040.5, corrected.GetProperty("value").GetDouble());

        var entries = await s.AuditEntriesAsync("value.saved");
        Assert.Equal(2, entries.Count);
        Assert.Equal($"values/{Westmere}/{Price}", entries[1].GetProperty("target").GetString());
        Assert.Equal("362400.5 EUR", entries[1].GetProperty("oldValue").GetString());
        Assert.Equal("362040.5 EUR", entries[1].GetProperty("newValue").GetString());
    }

    [Fact]
    public async Task Values_that_break_the_engine_s_rules_are_refused_in_its_words_and_change_nothing()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.Scoring);
        await s.ConfirmNamesAsync(s.Carrow);
        var before = await s.StateAsync(s.Carrow, "/values");
        var url = s.Url($"/values/{Northgate}/{Price}");

        foreach (var bad in new[] { 0.0, -12.5 })
        {
            ApiAssert.HasError(await ApiAssert.ProblemAsync(await s.Carrow.PutJsonAsync(url, new { value = bad }), HttpStatusCode.BadRequest),
                "value", "cost criterion \"price\" needs values above 0");
        }

        ApiAssert.HasError(await ApiAssert.ProblemAsync(await s.Carrow.PutJsonAsync(url, new { value = (double?)null }), HttpStatusCode.BadRequest), "value", "give the value as a number in EUR");
        using var text = new StringContent("{\"value\": \"a lot\"}", System.Text.Encoding.UTF8, "application/json");
        await ApiAssert.ProblemAsync(await s.Carrow.PutAsync(url, text), HttpStatusCode.BadRequest, "not valid JSON");
        ApiAssert.HasError(await ApiAssert.ProblemAsync(await s.Carrow.PutJsonAsync(s.Url($"/values/{Northgate}/{Quality}"), new { value = 3.0 }), HttpStatusCode.BadRequest),
            "criterion", "linguistic");
        ApiAssert.HasError(await ApiAssert.ProblemAsync(await s.Carrow.PutJsonAsync(s.Url($"/values/{Northgate}/{Insurance}"), new { value = 1.0 }), HttpStatusCode.BadRequest),
            "criterion", "pass/fail gate");
        await ApiAssert.ProblemAsync(await s.Carrow.PutJsonAsync(s.Url($"/values/nowhere/{Price}"), new { value = 1.0 }), HttpStatusCode.NotFound, "Bid \"nowhere\"");

        Assert.Equal(before, await s.StateAsync(s.Carrow, "/values"));
    }

    [Fact]
    public async Task A_stale_version_is_refused_with_the_current_value()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.Scoring);
        await s.ConfirmNamesAsync(s.Carrow);
        var url = s.Url($"/values/{Eastfold}/{Price}");
        var first = await ApiAssert.OkAsync(await s.Carrow.PutJsonAsync(url, new { value = 500_000.0 }));
        await ApiAssert.OkAsync(await s.Carrow.PutJsonAsync(url, new { value = 499_000.0, version = first.GetProperty("version").GetInt64() }));

        var before = await s.StateAsync(s.Carrow, "/values");
        var conflict = await ApiAssert.ProblemAsync(await s.Carrow.PutJsonAsync(url, new { value = 1.0, version = first.GetProperty("version").GetInt64() }), HttpStatusCode.Conflict);
        Assert.Equal(499_000.0, conflict.GetProperty("current").GetProperty("value").GetDouble());
        Assert.Equal(before, await s.StateAsync(s.Carrow, "/values"));
    }

    [Fact]
    public async Task Only_the_price_evaluator_enters_values_only_during_scoring_and_never_for_a_bidder_they_declared_a_conflict_with()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.Scoring);
        await s.ConfirmNamesAsync(s.Carrow, (Eastfold, "I audited Eastfold's accounts in 2025."));
        await s.ConfirmNamesAsync(s.Ashby);
        var before = await s.StateAsync(s.Carrow, "/values");

        await ApiAssert.ProblemAsync(await s.Ashby.PutJsonAsync(s.Url($"/values/{Northgate}/{Price}"), new { value = 1.0 }), HttpStatusCode.Forbidden, "priceevaluator");
        await ApiAssert.ProblemAsync(await s.Facilitator.PutJsonAsync(s.Url($"/values/{Northgate}/{Price}"), new { value = 1.0 }), HttpStatusCode.Forbidden, "priceevaluator");
        await ApiAssert.ProblemAsync(await s.Carrow.PutJsonAsync(s.Url($"/values/{Eastfold}/{Price}"), new { value = 1.0 }), HttpStatusCode.Forbidden, "conflict of interest");
        Assert.Equal(before, await s.StateAsync(s.Carrow, "/values"));

        foreach (var code in new[] { Northgate, Westmere })
        {
            await ApiAssert.OkAsync(await s.Carrow.PutJsonAsync(s.Url($"/values/{code}/{Price}"), new { value = 300_000.0 }));
        }

        await s.AdvanceToAsync(EvaluationStage.Moderation);
        before = await s.StateAsync(s.Carrow, "/values");
        await ApiAssert.ProblemAsync(await s.Carrow.PutJsonAsync(s.Url($"/values/{Northgate}/{Price}"), new { value = 1.0, version = 1 }), HttpStatusCode.Conflict, "only at Scoring");
        Assert.Equal(before, await s.StateAsync(s.Carrow, "/values"));
    }
}
