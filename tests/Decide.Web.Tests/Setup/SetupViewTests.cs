using System.Net;
using System.Text.Json;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.Setup;

/// <summary>The facilitator's setup view: seats with e-mail addresses, and what stops the plan from being locked.</summary>
public sealed class SetupViewTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task The_facilitator_reads_every_seat_with_its_e_mail_address_role_code_and_assigned_criteria()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync();

        var setup = await ApiAssert.OkAsync(await s.Facilitator.GetAsync(s.Url("/setup")));

        var seats = setup.GetProperty("seats").EnumerateArray().ToArray();
        Assert.Equal(
            [s.Emails[ScenarioBuilder.Ashby], s.Emails[ScenarioBuilder.Brook], s.Emails[ScenarioBuilder.Carrow], s.Emails["observer"]],
            seats.Select(x => x.GetProperty("email").GetString()));
        Assert.Equal(["assessor", "assessor", "priceEvaluator", "observer"], seats.Select(x => x.GetProperty("role").GetString()));
        Assert.Equal(ScenarioBuilder.Brook, seats[1].GetProperty("assessorCode").GetString());
        Assert.Equal(Scenario.CriteriaOf(ScenarioBuilder.Brook), seats[1].GetProperty("criteria").EnumerateArray().Select(c => c.GetString()));
        Assert.Equal(JsonValueKind.Null, seats[3].GetProperty("weight").ValueKind);
    }

    [Fact]
    public async Task Readiness_names_unsubmitted_weights_as_blocking_and_assessors_without_weights_as_warnings()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync();

        // Nobody has weighed yet: the lock would be refused because no importance is rated.
        var before = (await ApiAssert.OkAsync(await s.Facilitator.GetAsync(s.Url("/setup")))).GetProperty("readiness");
        Assert.Contains(Lines(before, "blocking"), b => b.StartsWith("$.importance:", StringComparison.Ordinal));
        Assert.Contains(Lines(before, "warnings"), w => w.Contains("Assessor ashby has not signed the declaration", StringComparison.Ordinal));

        // Ashby weighs but has not submitted: that stops the lock, by name.
        await s.SignDeclarationAsync(s.Ashby);
        await ApiAssert.OkAsync(await s.Ashby.PutJsonAsync(s.Url("/my/weights"), s.CompleteWeights()));
        var started = (await ApiAssert.OkAsync(await s.Facilitator.GetAsync(s.Url("/setup")))).GetProperty("readiness");
        Assert.Contains(Lines(started, "blocking"), b => b.Contains("Assessor ashby has weight judgements that are not submitted", StringComparison.Ordinal));

        // Submitted: nothing blocks; Brook, who gave none, is still a warning.
        await ApiAssert.OkAsync(await s.Ashby.PostJsonAsync(s.Url("/my/weights/submit")));
        var ready = (await ApiAssert.OkAsync(await s.Facilitator.GetAsync(s.Url("/setup")))).GetProperty("readiness");
        Assert.Empty(Lines(ready, "blocking"));
        Assert.Equal(["Assessor brook has not signed the declaration yet, so has given no weights; the panel's weights will come from the others."], Lines(ready, "warnings"));

        // And the lock agrees with the readiness it was shown.
        await ApiAssert.OkAsync(await s.Facilitator.PostJsonAsync(s.Url("/lock-plan"), new { version = await s.VersionAsync() }));
        var locked = await ApiAssert.OkAsync(await s.Facilitator.GetAsync(s.Url("/setup")));
        Assert.Equal(JsonValueKind.Null, locked.GetProperty("readiness").ValueKind);
    }

    [Fact]
    public async Task Only_the_facilitator_reads_the_setup_view()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync();

        await ApiAssert.ProblemAsync(await s.Ashby.GetAsync(s.Url("/setup")), HttpStatusCode.Forbidden);
        await ApiAssert.ProblemAsync(await s.Observer.GetAsync(s.Url("/setup")), HttpStatusCode.Forbidden);
    }

    private static string[] Lines(JsonElement readiness, string name) =>
        readiness.GetProperty(name).EnumerateArray().Select(x => x.GetString()!).ToArray();
}
