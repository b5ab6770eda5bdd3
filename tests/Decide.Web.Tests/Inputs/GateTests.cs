using System.Net;
using System.Text.Json;
using Decide.Data.Entities;
using Decide.Web.Tests.Support;
using static Decide.Web.Tests.Support.ScenarioPlan;

namespace Decide.Web.Tests.Inputs;

public sealed class GateTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task The_facilitator_records_gate_results_a_fail_needs_a_note_and_each_result_is_audited()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.PlanLocked);
        var url = s.Url($"/gates/{Westmere}/{Insurance}");
        var passed = await ApiAssert.OkAsync(await s.Facilitator.PutJsonAsync(url, new { passed = true, note = "Certificate seen, EUR 10 million." }));

        var before = await s.StateAsync(s.Facilitator, "/gates");
        var version = passed.GetProperty("version").GetInt64();
        ApiAssert.HasError(await ApiAssert.ProblemAsync(await s.Facilitator.PutJsonAsync(url, new { passed = false, version }), HttpStatusCode.BadRequest),
            "note", "a failed gate needs a note");
        ApiAssert.HasError(await ApiAssert.ProblemAsync(await s.Facilitator.PutJsonAsync(url, new { note = "?", version }), HttpStatusCode.BadRequest),
            "passed", "passes the gate");
        await ApiAssert.ProblemAsync(await s.Facilitator.PutJsonAsync(url, new { passed = false, note = "Late.", version = version + 5 }), HttpStatusCode.Conflict, "changed by someone else");
        Assert.Equal(before, await s.StateAsync(s.Facilitator, "/gates"));

        await ApiAssert.OkAsync(await s.Facilitator.PutJsonAsync(url, new { passed = false, note = "The certificate expired in March.", version }));
        var gates = await ApiAssert.OkAsync(await s.Observer.GetAsync(s.Url("/gates")));
        var cell = gates.GetProperty("cells").EnumerateArray().Single(c => c.GetProperty("alternative").GetString() == Westmere);
        Assert.False(cell.GetProperty("passed").GetBoolean());
        Assert.Equal("The certificate expired in March.", cell.GetProperty("note").GetString());
        Assert.Equal(JsonValueKind.Null, gates.GetProperty("cells").EnumerateArray().Single(c => c.GetProperty("alternative").GetString() == Northgate).GetProperty("passed").ValueKind);

        var entries = await s.AuditEntriesAsync("gate.saved");
        Assert.Equal(2, entries.Count);
        Assert.StartsWith("passed", entries[1].GetProperty("oldValue").GetString());
        Assert.Equal("failed: The certificate expired in March.", entries[1].GetProperty("newValue").GetString());
    }

    [Fact]
    public async Task Gates_take_results_only_on_gate_criteria_from_the_facilitator()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.PlanLocked);
        var before = await s.StateAsync(s.Facilitator, "/gates");

        ApiAssert.HasError(await ApiAssert.ProblemAsync(await s.Facilitator.PutJsonAsync(s.Url($"/gates/{Northgate}/{Price}"), new { passed = true }), HttpStatusCode.BadRequest),
            "criterion", "not a pass/fail gate");
        await ApiAssert.ProblemAsync(await s.Facilitator.PutJsonAsync(s.Url($"/gates/nowhere/{Insurance}"), new { passed = true }), HttpStatusCode.NotFound, "Bid \"nowhere\"");
        await ApiAssert.ProblemAsync(await s.Facilitator.PutJsonAsync(s.Url($"/gates/{Northgate}/nothing"), new { passed = true }), HttpStatusCode.NotFound, "Criterion \"nothing\"");
        foreach (var client in new[] { s.Observer, s.Ashby, s.Carrow })
        {
            await ApiAssert.ProblemAsync(await client.PutJsonAsync(s.Url($"/gates/{Northgate}/{Insurance}"), new { passed = true }), HttpStatusCode.Forbidden, "facilitator");
        }

        Assert.Equal(before, await s.StateAsync(s.Facilitator, "/gates"));
    }

    [Fact]
    public async Task Gates_are_recorded_only_between_plan_lock_and_the_end_of_scoring()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync();
        await ApiAssert.ProblemAsync(await s.Facilitator.PutJsonAsync(s.Url($"/gates/{Northgate}/{Insurance}"), new { passed = true }), HttpStatusCode.Conflict, "PlanLocked or Scoring");

        await s.AdvanceToAsync(EvaluationStage.Scoring);
        await ApiAssert.OkAsync(await s.Facilitator.PutJsonAsync(s.Url($"/gates/{Northgate}/{Insurance}"), new { passed = true }));

        await s.AdvanceToAsync(EvaluationStage.Moderation);
        var before = await s.StateAsync(s.Facilitator, "/gates");
        await ApiAssert.ProblemAsync(await s.Facilitator.PutJsonAsync(s.Url($"/gates/{Westmere}/{Insurance}"), new { passed = true }), HttpStatusCode.Conflict, "Moderation");
        Assert.Equal(before, await s.StateAsync(s.Facilitator, "/gates"));
    }
}
