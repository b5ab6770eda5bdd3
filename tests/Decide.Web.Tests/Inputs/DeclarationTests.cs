using System.Net;
using System.Text.Json;
using Decide.Data.Entities;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.Inputs;

public sealed class DeclarationTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task The_declaration_in_force_has_a_version_and_covers_interests_confidentiality_independence_disclosure_and_the_law()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync();
        var declaration = await ApiAssert.OkAsync(await s.Ashby.GetAsync("/api/declaration"));
        Assert.False(string.IsNullOrWhiteSpace(declaration.GetProperty("version").GetString()));
        var text = string.Join(" ", declaration.GetProperty("paragraphs").EnumerateArray().Select(p => p.GetString()));
        foreach (var needed in new[] { "conflict", "confidential", "on my own", "published criteria", "rationale", "disclosed", "does not replace", "law" })
        {
            Assert.Contains(needed, text, StringComparison.OrdinalIgnoreCase);
        }
    }

    [Fact]
    public async Task Until_they_sign_an_assessor_and_a_price_evaluator_see_only_the_evaluation_summary_and_the_declaration()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync();

        var detail = await s.DetailAsync(s.Ashby);
        Assert.Equal(JsonValueKind.Null, detail.GetProperty("plan").ValueKind);
        var mine = await ApiAssert.OkAsync(await s.Ashby.GetAsync(s.Url("/declaration")));
        Assert.Equal(JsonValueKind.Null, mine.GetProperty("signedVersion").ValueKind);

        foreach (var (client, path) in new[] { (s.Ashby, "/my/weights"), (s.Ashby, "/gates"), (s.Ashby, "/conflicts"), (s.Carrow, "/values"), (s.Carrow, "/gates") })
        {
            await ApiAssert.ProblemAsync(await client.GetAsync(s.Url(path)), HttpStatusCode.Forbidden, "sign the declaration first");
        }

        await ApiAssert.ProblemAsync(await s.Ashby.PutJsonAsync(s.Url("/my/weights"), s.CompleteWeights()), HttpStatusCode.Forbidden, "sign the declaration first");
    }

    [Fact]
    public async Task A_stale_version_or_a_declaration_not_accepted_is_refused_by_field_and_changes_nothing()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync();
        var before = await s.StateAsync(s.Ashby, "/declaration");

        var stale = await ApiAssert.ProblemAsync(await s.Ashby.PostJsonAsync(s.Url("/declaration"), new { version = "1999-1", accepted = true }), HttpStatusCode.BadRequest);
        ApiAssert.HasError(stale, "version", "in force is version");
        var declined = await ApiAssert.ProblemAsync(await s.Ashby.PostJsonAsync(s.Url("/declaration"), new { version = Declaration(), accepted = false }), HttpStatusCode.BadRequest);
        ApiAssert.HasError(declined, "accepted", "accepting");

        Assert.Equal(before, await s.StateAsync(s.Ashby, "/declaration"));
    }

    [Fact]
    public async Task Signing_records_the_version_shows_the_plan_and_leaves_an_audit_entry_and_a_second_signature_is_refused()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync();
        await s.SignDeclarationAsync(s.Ashby);

        var mine = await ApiAssert.OkAsync(await s.Ashby.GetAsync(s.Url("/declaration")));
        Assert.Equal(Declaration(), mine.GetProperty("signedVersion").GetString());
        Assert.NotEqual(JsonValueKind.Null, mine.GetProperty("signedAt").ValueKind);
        Assert.Equal(JsonValueKind.Object, (await s.DetailAsync(s.Ashby)).GetProperty("plan").ValueKind);
        var seat = (await s.DetailAsync()).GetProperty("panel").EnumerateArray().Single(p => p.GetProperty("assessorCode").GetString() == ScenarioBuilder.Ashby);
        Assert.True(seat.GetProperty("declarationSigned").GetBoolean());
        var entry = Assert.Single(await s.AuditEntriesAsync("declaration.signed"));
        Assert.Equal($"declarations/{ScenarioBuilder.Ashby}", entry.GetProperty("target").GetString());
        Assert.Contains(Declaration(), entry.GetProperty("newValue").GetString());

        var before = await s.StateAsync(s.Ashby, "/declaration");
        await ApiAssert.ProblemAsync(await s.Ashby.PostJsonAsync(s.Url("/declaration"), new { version = Declaration(), accepted = true }), HttpStatusCode.Conflict, "already");
        Assert.Equal(before, await s.StateAsync(s.Ashby, "/declaration"));
    }

    [Fact]
    public async Task Only_assessors_and_price_evaluators_sign_and_not_once_the_evaluation_is_signed_off_or_superseded()
    {
        using var s = await new ScenarioBuilder(factory).BuildAsync(EvaluationStage.PlanLocked);
        await ApiAssert.ProblemAsync(await s.Observer.PostJsonAsync(s.Url("/declaration"), new { version = Declaration(), accepted = true }), HttpStatusCode.Forbidden, "assessor or priceevaluator");

        // A new revision supersedes this one; its declarations can no longer be signed.
        await ApiAssert.OkAsync(await s.Facilitator.PostJsonAsync(s.Url("/revisions"), new { reason = "The specification of the insurance gate was corrected." }));
        await ApiAssert.ProblemAsync(await s.Carrow.PostJsonAsync(s.Url("/declaration"), new { version = Declaration(), accepted = true }), HttpStatusCode.Conflict, "Superseded");
    }

    private static string Declaration() => Decide.Web.Features.Inputs.Declaration.Version;
}
