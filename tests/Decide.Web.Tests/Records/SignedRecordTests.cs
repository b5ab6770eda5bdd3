using System.Net;
using System.Net.Http.Headers;
using System.Net.Http.Json;
using System.Text.Json;
using Decide.Web.Features.Accounts;
using Decide.Web.Tests.Exchange;
using Decide.Web.Tests.Support;
using UglyToad.PdfPig;

namespace Decide.Web.Tests.Records;

/// <summary>
/// Sign-off issues the signed record once, archives it, and anyone holding a copy can check it: each check answered
/// separately, a changed byte named as such, and the archive recognising its own record.
/// </summary>
public sealed class SignedRecordTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    private const string Statement = "I approve the award recommendation to the top-ranked supplier on the moderated scores.";

    private async Task<Guid> SignedOffAsync()
    {
        var id = await EvaluationCopies.CopyAwaitingSignOffAsync(factory);
        using var approver = await factory.SignInAsync(DecideWebFactory.Approver);
        var response = await approver.PostAsJsonAsync($"/api/evaluations/{id}/approvals", new { password = DemoSeeder.DemoPassword, statement = Statement });
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        return id;
    }

    private static async Task<JsonElement> VerifyAsync(HttpClient client, byte[] pdf)
    {
        using var body = new ByteArrayContent(pdf);
        body.Headers.ContentType = new MediaTypeHeaderValue("application/pdf");
        var response = await client.PostAsync("/api/records/verification", body);
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        return await response.Content.ReadFromJsonAsync<JsonElement>();
    }

    private static string Squash(string text) => string.Concat(text.Where(c => !char.IsWhiteSpace(c)));

    private static JsonElement Check(JsonElement verification, string name) =>
        verification.GetProperty("checks").EnumerateArray().Single(c => c.GetProperty("name").GetString() == name);

    [Fact]
    public async Task Sign_off_issues_one_signed_record_that_verifies_and_matches_the_archive()
    {
        var id = await SignedOffAsync();
        using var observer = await factory.SignInAsync(DecideWebFactory.Observer);
        var response = await observer.GetAsync($"/api/evaluations/{id}/record");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("application/pdf", response.Content.Headers.ContentType?.MediaType);
        var pdf = await response.Content.ReadAsByteArrayAsync();

        // Downloading again gives the same bytes: the record is issued once, not re-made.
        var again = await (await observer.GetAsync($"/api/evaluations/{id}/record")).Content.ReadAsByteArrayAsync();
        Assert.Equal(pdf, again);
        var list = await observer.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}/records");
        var record = Assert.Single(list.EnumerateArray());
        Assert.Equal("record", record.GetProperty("kind").GetString());
        Assert.Equal(pdf.Length, record.GetProperty("bytes").GetInt64());

        var verification = await VerifyAsync(observer, pdf);
        Assert.True(verification.GetProperty("allPassed").GetBoolean(), verification.GetRawText());
        Assert.Equal(5, verification.GetProperty("checks").GetArrayLength());
        var reference = (await observer.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}")).GetProperty("summary").GetProperty("reference").GetString();
        Assert.Equal(reference, verification.GetProperty("reference").GetString());

        // The record prints the approver's statement and anchors the audit chain's head as it stood at issue.
        using var document = PdfDocument.Open(pdf);
        // PdfPig joins the words of a line without spaces; compare without whitespace.
        var text = Squash(string.Join("", document.GetPages().Select(p => p.Text)));
        Assert.Contains(Squash(Statement), text);
        var audit = (await EvaluationCopies.AuditAsync(factory, id)).EnumerateArray().ToArray();
        var archived = audit.Single(e => e.GetProperty("action").GetString() == "record.archived");
        var headAtIssue = audit.TakeWhile(e => e.GetProperty("action").GetString() != "record.archived").Last().GetProperty("hash").GetString()!;
        Assert.Contains($"audit head {headAtIssue}", archived.GetProperty("newValue").GetString());
    }

    [Fact]
    public async Task A_record_with_one_changed_byte_fails_the_unchanged_check_and_the_archive_match()
    {
        var id = await SignedOffAsync();
        using var facilitator = await factory.SignInAsync(EvaluationCopies.CopyFacilitator);
        var pdf = await (await facilitator.GetAsync($"/api/evaluations/{id}/record")).Content.ReadAsByteArrayAsync();
        var changed = (byte[])pdf.Clone();
        changed[pdf.Length / 3] ^= 0x01;

        var verification = await VerifyAsync(facilitator, changed);
        Assert.False(verification.GetProperty("allPassed").GetBoolean());
        Assert.False(Check(verification, "document unchanged since signing").GetProperty("passed").GetBoolean());
        Assert.False(Check(verification, "matches an archived record").GetProperty("passed").GetBoolean());
        Assert.Equal(JsonValueKind.Null, verification.GetProperty("reference").ValueKind);
    }

    [Fact]
    public async Task No_record_before_sign_off_and_an_empty_or_wrong_upload_is_refused_by_name()
    {
        var id = await factory.DemoEvaluationAsync();
        using var facilitator = await factory.SignInAsync(DecideWebFactory.Facilitator);
        var early = await facilitator.GetAsync($"/api/evaluations/{id}/record");
        Assert.Contains("only at SignedOff", (await EvaluationCopies.ProblemAsync(early, HttpStatusCode.Conflict)).GetProperty("detail").GetString());

        using var empty = new ByteArrayContent([]);
        empty.Headers.ContentType = new MediaTypeHeaderValue("application/pdf");
        var none = await facilitator.PostAsync("/api/records/verification", empty);
        Assert.Contains("upload was empty", (await EvaluationCopies.ProblemAsync(none, HttpStatusCode.BadRequest)).GetProperty("errors").GetProperty("file")[0].GetString());
        var json = await facilitator.PostAsJsonAsync("/api/records/verification", new { });
        Assert.Contains("application/pdf", (await EvaluationCopies.ProblemAsync(json, HttpStatusCode.BadRequest)).GetProperty("errors").GetProperty("body")[0].GetString());
    }

    [Fact]
    public async Task A_feedback_letter_names_its_bidder_and_no_other()
    {
        var id = await SignedOffAsync();
        using var facilitator = await factory.SignInAsync(EvaluationCopies.CopyFacilitator);
        var detail = await facilitator.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}");
        var bids = detail.GetProperty("bids").EnumerateArray()
            .Select(a => (Code: a.GetProperty("code").GetString()!, Name: a.GetProperty("name").GetString()!)).ToArray();
        var results = await facilitator.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}/results?draws=0");
        var winner = results.GetProperty("ranking")[0].GetProperty("alternative").GetString();
        var (code, name) = bids.Last(b => b.Code != winner);
        var response = await facilitator.GetAsync($"/api/evaluations/{id}/feedback/{code}");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        using var document = PdfDocument.Open(await response.Content.ReadAsByteArrayAsync());
        var text = string.Join(" ", document.GetPages().Select(p => p.Text));
        Assert.Contains(name, text);

        // The recommended bid may be named (as in a standstill letter); no other bidder is.
        foreach (var other in bids.Where(b => b.Code != code && b.Code != winner))
        {
            Assert.DoesNotContain(other.Name, text);
        }

        using var approver = await factory.SignInAsync(DecideWebFactory.Approver);
        var refused = await approver.GetAsync($"/api/evaluations/{id}/feedback/{code}");
        Assert.Equal(HttpStatusCode.Forbidden, refused.StatusCode);
    }
}
