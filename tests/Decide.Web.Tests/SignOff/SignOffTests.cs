using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using Decide.Web.Features.Accounts;
using Decide.Web.Tests.Exchange;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.SignOff;

public sealed class SignOffTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    private const string SecondApprover = "treasurer@" + DemoSeeder.Domain;
    private const string Statement = "I approve the award recommendation to the top-ranked supplier on the moderated scores.";

    [Fact]
    public async Task A_wrong_password_is_refused_and_audited_without_the_password()
    {
        var id = await EvaluationCopies.CopyAwaitingSignOffAsync(factory);
        using var approver = await factory.SignInAsync(DecideWebFactory.Approver);
        const string wrong = "Not-the-password-2026";
        var response = await approver.PostAsJsonAsync($"/api/evaluations/{id}/approvals", new { password = wrong, statement = Statement });
        var problem = await EvaluationCopies.ProblemAsync(response, HttpStatusCode.Forbidden);
        Assert.Contains("password is wrong", problem.GetProperty("detail").GetString());

        var state = await approver.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}/approvals");
        Assert.Equal("moderation", state.GetProperty("stage").GetString());
        Assert.Empty(state.GetProperty("approvals").EnumerateArray());

        var audit = await EvaluationCopies.AuditAsync(factory, id);
        var refused = audit.EnumerateArray().Single(e => e.GetProperty("action").GetString() == "approval.refused");
        Assert.Equal(DecideWebFactory.Approver, refused.GetProperty("userName").GetString());
        Assert.DoesNotContain(wrong, audit.GetRawText());
    }

    [Fact]
    public async Task One_required_approval_signs_the_evaluation_off_and_the_approval_is_audited()
    {
        var id = await EvaluationCopies.CopyAwaitingSignOffAsync(factory);
        using var approver = await factory.SignInAsync(DecideWebFactory.Approver);
        var response = await approver.PostAsJsonAsync($"/api/evaluations/{id}/approvals",
            new { password = DemoSeeder.DemoPassword, statement = Statement });
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var state = await response.Content.ReadFromJsonAsync<JsonElement>();
        Assert.Equal("signedOff", state.GetProperty("stage").GetString());
        Assert.Equal(JsonValueKind.String, state.GetProperty("signedOffAt").ValueKind);
        Assert.Equal(Statement, state.GetProperty("approvals")[0].GetProperty("statement").GetString());

        var actions = (await EvaluationCopies.AuditAsync(factory, id)).EnumerateArray().Select(e => e.GetProperty("action").GetString()).ToArray();
        Assert.Contains("approval.recorded", actions);
        Assert.Contains("evaluation.signed-off", actions);
        Assert.DoesNotContain(DemoSeeder.DemoPassword, (await EvaluationCopies.AuditAsync(factory, id)).GetRawText());
    }

    [Fact]
    public async Task Two_required_approvals_need_two_approvers_and_nobody_approves_twice()
    {
        await EvaluationCopies.EnsureAccountAsync(factory, SecondApprover, "Ada Quennell (Treasurer, approver)");
        var id = await EvaluationCopies.CopyAwaitingSignOffAsync(factory, 2, [DecideWebFactory.Approver, SecondApprover]);
        var url = $"/api/evaluations/{id}/approvals";

        using var first = await factory.SignInAsync(DecideWebFactory.Approver);
        var one = await (await first.PostAsJsonAsync(url, new { password = DemoSeeder.DemoPassword, statement = Statement })).Content.ReadFromJsonAsync<JsonElement>();
        Assert.Equal("moderation", one.GetProperty("stage").GetString());
        Assert.Equal(2, one.GetProperty("required").GetInt32());
        Assert.Single(one.GetProperty("approvals").EnumerateArray());

        var twice = await first.PostAsJsonAsync(url, new { password = DemoSeeder.DemoPassword, statement = Statement });
        var problem = await EvaluationCopies.ProblemAsync(twice, HttpStatusCode.Conflict);
        Assert.Contains("each approver approves once", problem.GetProperty("detail").GetString());

        using var second = await factory.SignInAsync(SecondApprover);
        var two = await second.PostAsJsonAsync(url, new { password = DemoSeeder.DemoPassword, statement = "Approved: the moderation minutes support the ranking." });
        Assert.Equal(HttpStatusCode.OK, two.StatusCode);
        var state = await two.Content.ReadFromJsonAsync<JsonElement>();
        Assert.Equal("signedOff", state.GetProperty("stage").GetString());
        Assert.Equal(2, state.GetProperty("approvals").GetArrayLength());
    }

    [Fact]
    public async Task Only_approvers_approve_with_a_statement_and_only_in_moderation()
    {
        var id = await factory.DemoEvaluationAsync();
        foreach (var email in new[] { DecideWebFactory.Facilitator, DecideWebFactory.Assessor, DecideWebFactory.Observer })
        {
            using var client = await factory.SignInAsync(email);
            var response = await client.PostAsJsonAsync($"/api/evaluations/{id}/approvals", new { password = DemoSeeder.DemoPassword, statement = Statement });
            Assert.Contains("role approver", (await EvaluationCopies.ProblemAsync(response, HttpStatusCode.Forbidden)).GetProperty("detail").GetString());
        }

        using var approver = await factory.SignInAsync(DecideWebFactory.Approver);
        var unasked = await approver.PostAsJsonAsync($"/api/evaluations/{id}/approvals", new { password = DemoSeeder.DemoPassword, statement = Statement });
        Assert.Contains("has not asked for sign-off", (await EvaluationCopies.ProblemAsync(unasked, HttpStatusCode.Conflict)).GetProperty("detail").GetString());

        var asked = await EvaluationCopies.CopyAwaitingSignOffAsync(factory);
        var bare = await approver.PostAsJsonAsync($"/api/evaluations/{asked}/approvals", new { password = DemoSeeder.DemoPassword, statement = "" });
        Assert.Contains("what you approve", (await EvaluationCopies.ProblemAsync(bare, HttpStatusCode.BadRequest)).GetProperty("errors").GetProperty("statement")[0].GetString());

        var early = await EvaluationCopies.ImportDemoCopyAsync(factory);
        await EvaluationCopies.SetUpAsync(factory, early, 1, [DecideWebFactory.Approver]);
        var response2 = await approver.PostAsJsonAsync($"/api/evaluations/{early}/approvals", new { password = DemoSeeder.DemoPassword, statement = Statement });
        Assert.Contains("only at Moderation", (await EvaluationCopies.ProblemAsync(response2, HttpStatusCode.Conflict)).GetProperty("detail").GetString());
    }

    [Fact]
    public async Task A_reopened_sheet_blocks_approval_until_it_is_submitted_again()
    {
        var id = await EvaluationCopies.CopyAwaitingSignOffAsync(factory);
        using (var facilitator = await factory.SignInAsync(EvaluationCopies.CopyFacilitator))
        {
            var reopen = await facilitator.PostAsJsonAsync($"/api/evaluations/{id}/sheets/ellingsby/reopen", new { reason = "Ellingsby is correcting a rationale." });
            Assert.Equal(HttpStatusCode.OK, reopen.StatusCode);
        }

        using var approver = await factory.SignInAsync(DecideWebFactory.Approver);
        var response = await approver.PostAsJsonAsync($"/api/evaluations/{id}/approvals", new { password = DemoSeeder.DemoPassword, statement = Statement });
        Assert.Contains("ellingsby", (await EvaluationCopies.ProblemAsync(response, HttpStatusCode.Conflict)).GetProperty("detail").GetString());
    }

    [Fact]
    public async Task After_sign_off_every_change_is_refused_and_the_record_stays_readable()
    {
        var id = await EvaluationCopies.CopyAwaitingSignOffAsync(factory);
        using (var approver = await factory.SignInAsync(DecideWebFactory.Approver))
        {
            Assert.Equal(HttpStatusCode.OK, (await approver.PostAsJsonAsync($"/api/evaluations/{id}/approvals",
                new { password = DemoSeeder.DemoPassword, statement = Statement })).StatusCode);
        }

        using var client = await factory.SignInAsync(EvaluationCopies.CopyFacilitator);
        var detail = await client.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}");
        var version = detail.GetProperty("summary").GetProperty("version").GetInt64();
        var refused = new (string What, Task<HttpResponseMessage> Request)[]
        {
            ("moderate", client.PutAsJsonAsync($"/api/evaluations/{id}/moderation/orrinford/display",
                new { term = "G", reason = "A reason of the panel, long enough.", agreedBy = new[] { "ravelle" } })),
            ("reopen", client.PostAsJsonAsync($"/api/evaluations/{id}/sheets/ravelle/reopen", new { reason = "A reason that is long enough." })),
            ("plan", client.PutAsJsonAsync($"/api/evaluations/{id}/plan", new { plan = detail.GetProperty("plan"), version })),
            ("bids", client.PutAsJsonAsync($"/api/evaluations/{id}/bids", new { bids = Array.Empty<object>(), version })),
            ("start moderation", client.PostAsJsonAsync($"/api/evaluations/{id}/start-moderation", new { version })),
        };
        foreach (var (what, request) in refused)
        {
            var response = await request;
            var body = await response.Content.ReadAsStringAsync();
            Assert.True(response.StatusCode == HttpStatusCode.Conflict, $"{what}: {(int)response.StatusCode} {body}");
            Assert.Contains("stage SignedOff", JsonDocument.Parse(body).RootElement.GetProperty("detail").GetString());
        }

        using var approver2 = await factory.SignInAsync(DecideWebFactory.Approver);
        var again = await approver2.PostAsJsonAsync($"/api/evaluations/{id}/approvals", new { password = DemoSeeder.DemoPassword, statement = Statement });
        Assert.Equal(HttpStatusCode.Conflict, again.StatusCode);

        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync($"/api/evaluations/{id}/results?draws=0")).StatusCode);
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync($"/api/evaluations/{id}/moderation")).StatusCode);
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync($"/api/evaluations/{id}/export")).StatusCode);
    }

    [Fact]
    public async Task The_facilitator_asks_for_sign_off_once_with_a_note_when_every_sheet_is_in()
    {
        var id = await EvaluationCopies.CopyAtModerationAsync(factory);
        var url = $"/api/evaluations/{id}/approvals/request";
        using (var approver = await factory.SignInAsync(DecideWebFactory.Approver))
        {
            var notMine = await approver.PostAsJsonAsync(url, new { note = "The panel recommends the top-ranked supplier." });
            Assert.Contains("role facilitator", (await EvaluationCopies.ProblemAsync(notMine, HttpStatusCode.Forbidden)).GetProperty("detail").GetString());
        }

        using var facilitator = await factory.SignInAsync(EvaluationCopies.CopyFacilitator);
        var bare = await facilitator.PostAsJsonAsync(url, new { note = " " });
        Assert.Contains("what you recommend", (await EvaluationCopies.ProblemAsync(bare, HttpStatusCode.BadRequest)).GetProperty("errors").GetProperty("note")[0].GetString());

        var reopen = await facilitator.PostAsJsonAsync($"/api/evaluations/{id}/sheets/ellingsby/reopen", new { reason = "Ellingsby is correcting a rationale." });
        Assert.Equal(HttpStatusCode.OK, reopen.StatusCode);
        var open = await facilitator.PostAsJsonAsync(url, new { note = "The panel recommends the top-ranked supplier." });
        Assert.Contains("ellingsby", (await EvaluationCopies.ProblemAsync(open, HttpStatusCode.Conflict)).GetProperty("detail").GetString());
        using (var ellingsby = await factory.SignInAsync("ellingsby@" + DemoSeeder.Domain))
        {
            Assert.Equal(HttpStatusCode.OK, (await ellingsby.PostAsJsonAsync($"/api/evaluations/{id}/my/submit", new { })).StatusCode);
        }

        const string note = "The panel recommends the top-ranked supplier; moderation minutes attached.";
        var asked = await facilitator.PostAsJsonAsync(url, new { note });
        Assert.Equal(HttpStatusCode.OK, asked.StatusCode);
        var state = await asked.Content.ReadFromJsonAsync<JsonElement>();
        Assert.Equal(note, state.GetProperty("requestNote").GetString());
        Assert.Equal(JsonValueKind.String, state.GetProperty("requestedAt").ValueKind);
        Assert.False(string.IsNullOrEmpty(state.GetProperty("requestedBy").GetString()));

        var twice = await facilitator.PostAsJsonAsync(url, new { note });
        Assert.Contains("already requested", (await EvaluationCopies.ProblemAsync(twice, HttpStatusCode.Conflict)).GetProperty("detail").GetString());
        var requested = (await EvaluationCopies.AuditAsync(factory, id)).EnumerateArray().Single(e => e.GetProperty("action").GetString() == "signoff.requested");
        Assert.Contains(note, requested.GetProperty("newValue").GetString());
    }
}
