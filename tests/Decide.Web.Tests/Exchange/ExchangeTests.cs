using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using System.Text.Json.Nodes;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.Exchange;

public sealed class ExchangeTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task Export_then_import_then_export_gives_an_identical_document()
    {
        var demo = await factory.DemoEvaluationAsync();
        using var facilitator = await factory.SignInAsync(DecideWebFactory.Facilitator);
        var first = await (await facilitator.GetAsync($"/api/evaluations/{demo}/export")).Content.ReadAsStringAsync();

        var copy = await EvaluationCopies.ImportAsync(factory, JsonNode.Parse(first)!.AsObject());
        Assert.NotEqual(demo, copy);
        using var copyDesk = await factory.SignInAsync(EvaluationCopies.CopyFacilitator);
        var detail = await copyDesk.GetFromJsonAsync<JsonElement>($"/api/evaluations/{copy}");
        Assert.Equal("setup", detail.GetProperty("summary").GetProperty("stage").GetString());

        var second = await (await copyDesk.GetAsync($"/api/evaluations/{copy}/export")).Content.ReadAsStringAsync();
        Assert.Equal(first, second);

        // The round trip carried the inputs, not just the plan.
        var file = JsonNode.Parse(second)!;
        Assert.NotEmpty(file["ratings"]!.AsObject());
        Assert.NotEmpty(file["values"]!.AsObject());
        Assert.NotEmpty(file["gates"]!.AsObject());
    }

    [Fact]
    public async Task Export_is_an_attachment_named_after_the_reference_and_is_audited()
    {
        var id = await factory.DemoEvaluationAsync();
        using var observer = await factory.SignInAsync(DecideWebFactory.Observer);
        var response = await observer.GetAsync($"/api/evaluations/{id}/export");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("application/json", response.Content.Headers.ContentType?.MediaType);
        var disposition = response.Content.Headers.ContentDisposition!;
        Assert.Equal("attachment", disposition.DispositionType);
        var reference = JsonNode.Parse(await response.Content.ReadAsStringAsync())!["reference"]!.GetValue<string>();
        Assert.Contains(reference, disposition.FileName ?? disposition.FileNameStar);

        var audit = await EvaluationCopies.AuditAsync(factory, id, DecideWebFactory.Facilitator);
        Assert.Contains(audit.EnumerateArray(), e => e.GetProperty("action").GetString() == "evaluation.exported"
            && e.GetProperty("userName").GetString() == DecideWebFactory.Observer);
    }

    [Fact]
    public async Task Assessors_may_not_export_the_whole_file_or_the_ratings()
    {
        var id = await factory.DemoEvaluationAsync();
        using var assessor = await factory.SignInAsync(DecideWebFactory.Assessor);
        foreach (var path in new[] { "export", "export/ratings.csv" })
        {
            var problem = await EvaluationCopies.ProblemAsync(await assessor.GetAsync($"/api/evaluations/{id}/{path}"), HttpStatusCode.Forbidden);
            Assert.Contains("facilitator or observer or approver", problem.GetProperty("detail").GetString());
        }
    }

    [Fact]
    public async Task Only_an_administrator_imports()
    {
        var file = await EvaluationCopies.ExportDemoAsync(factory);
        using var facilitator = await factory.SignInAsync(DecideWebFactory.Facilitator);
        var response = await facilitator.PostAsJsonAsync("/api/evaluations/import",
            new { file, facilitatorEmail = DecideWebFactory.Facilitator, accounts = EvaluationCopies.DemoAccounts(file) });
        var problem = await EvaluationCopies.ProblemAsync(response, HttpStatusCode.Forbidden);
        Assert.Contains("administrator", problem.GetProperty("detail").GetString());
    }

    [Fact]
    public async Task Import_names_unknown_accounts_missing_assessor_codes_and_codes_the_file_lacks()
    {
        var file = await EvaluationCopies.ExportDemoAsync(factory);
        var accounts = EvaluationCopies.DemoAccounts(file);
        accounts["fenwright"] = "nobody@nowhere.example";
        accounts.Remove("abernathy");
        accounts["stranger"] = DecideWebFactory.Observer;
        using var admin = await factory.SignInAsync(DecideWebFactory.Admin);
        var response = await admin.PostAsJsonAsync("/api/evaluations/import",
            new { file, facilitatorEmail = "ghost@nowhere.example", accounts });
        var errors = (await EvaluationCopies.ProblemAsync(response, HttpStatusCode.BadRequest)).GetProperty("errors");
        Assert.Contains("nobody@nowhere.example", errors.GetProperty("accounts.fenwright")[0].GetString());
        Assert.Contains("needs an account", errors.GetProperty("accounts.abernathy")[0].GetString());
        Assert.Contains("no assessor \"stranger\"", errors.GetProperty("accounts.stranger")[0].GetString());
        Assert.Contains("ghost@nowhere.example", errors.GetProperty("facilitatorEmail")[0].GetString());
    }

    [Fact]
    public async Task Import_of_a_broken_file_names_each_problem_by_its_path_in_the_file()
    {
        var file = await EvaluationCopies.ExportDemoAsync(factory);
        file["ratings"]!["ravelle"]!["orrinford"]!["display"]!["term"] = "SUPERB";
        using var admin = await factory.SignInAsync(DecideWebFactory.Admin);
        var response = await admin.PostAsJsonAsync("/api/evaluations/import",
            new { file, facilitatorEmail = EvaluationCopies.CopyFacilitator, accounts = EvaluationCopies.DemoAccounts(file) });
        var errors = (await EvaluationCopies.ProblemAsync(response, HttpStatusCode.BadRequest)).GetProperty("errors");
        var (path, reasons) = errors.EnumerateObject().Select(p => (p.Name, p.Value)).Single(p => p.Name.Contains("ravelle"));
        Assert.StartsWith("file.ratings", path);
        Assert.Contains("orrinford", path);
        Assert.Contains("SUPERB", reasons[0].GetString());
    }

    [Fact]
    public async Task Ratings_csv_neutralises_a_formula_typed_into_a_rationale_and_quotes_by_rfc_4180()
    {
        const string formula = "=SUM(A1) is what the bidder wrote in section Q1.2";
        const string awkward = "Legible at 10 m, \"tested\" with users;\nsee appendix C";
        var id = await EvaluationCopies.ImportDemoCopyAsync(factory, file =>
        {
            file["ratings"]!["ravelle"]!["orrinford"]!["display"]!["rationale"] = formula;
            file["ratings"]!["fenwright"]!["orrinford"]!["display"]!["rationale"] = awkward;
        });
        using var client = await factory.SignInAsync(EvaluationCopies.CopyFacilitator);
        var response = await client.GetAsync($"/api/evaluations/{id}/export/ratings.csv");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("text/csv", response.Content.Headers.ContentType?.MediaType);
        Assert.Equal("attachment", response.Content.Headers.ContentDisposition?.DispositionType);

        var rows = CsvText.Parse(await response.Content.ReadAsStringAsync());
        Assert.Equal(["assessor", "bidder", "criterion", "term", "rationale", "declined_reason", "moderated_term"], rows[0]);
        string Rationale(string assessor) => rows.Single(r => r[0] == assessor && r[1] == "orrinford" && r[2] == "display")[4];
        Assert.Equal("'" + formula, Rationale("ravelle"));
        Assert.Equal(awkward, Rationale("fenwright"));

        // No cell anywhere starts with a character a spreadsheet would run.
        Assert.DoesNotContain(rows.SelectMany(r => r), cell => cell.Length > 0 && cell[0] is '=' or '+' or '-' or '@' or '\t' or '\r');

        // One row per rating in the file.
        var file = JsonNode.Parse(await (await client.GetAsync($"/api/evaluations/{id}/export")).Content.ReadAsStringAsync())!;
        var ratings = file["ratings"]!.AsObject().Sum(a => a.Value!.AsObject().Sum(b => b.Value!.AsObject().Count));
        Assert.Equal(ratings, rows.Count - 1);
    }

    [Fact]
    public async Task Results_csv_lists_the_ranking_of_the_results_document_and_the_excluded_bidders()
    {
        var id = await factory.DemoEvaluationAsync();
        using var approver = await factory.SignInAsync(DecideWebFactory.Approver);
        var rows = CsvText.Parse(await (await approver.GetAsync($"/api/evaluations/{id}/export/results.csv")).Content.ReadAsStringAsync());
        var results = await approver.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}/results?draws=0");
        Assert.Equal(["rank", "bidder", "name", "closeness", "d_plus", "d_minus", "failed_gates"], rows[0]);

        var ranking = results.GetProperty("ranking").EnumerateArray().ToArray();
        for (var i = 0; i < ranking.Length; i++)
        {
            var row = rows[i + 1];
            Assert.Equal(ranking[i].GetProperty("rank").GetInt32().ToString(System.Globalization.CultureInfo.InvariantCulture), row[0]);
            Assert.Equal(ranking[i].GetProperty("alternative").GetString(), row[1]);
            Assert.Equal(ranking[i].GetProperty("closeness").GetDouble(), double.Parse(row[3], System.Globalization.CultureInfo.InvariantCulture), 12);
            Assert.Equal(ranking[i].GetProperty("dPlus").GetDouble(), double.Parse(row[4], System.Globalization.CultureInfo.InvariantCulture), 12);
            Assert.Equal(ranking[i].GetProperty("dMinus").GetDouble(), double.Parse(row[5], System.Globalization.CultureInfo.InvariantCulture), 12);
        }

        var excluded = results.GetProperty("excluded").EnumerateArray().Select(e => e.GetProperty("alternative").GetString()).ToArray();
        Assert.Equal(excluded, rows.Skip(ranking.Length + 1).Select(r => r[1]).ToArray());
        Assert.All(rows.Skip(ranking.Length + 1), r => Assert.NotEqual("", r[6]));
    }

    [Fact]
    public async Task Results_csv_writes_bidder_names_that_are_formulas_or_markup_as_text_that_reads_back_exactly()
    {
        // Formula prefixes from OWASP's "CSV Injection" page, NUL from OWASP ASVS 5.0 (1.2.10), markup, and a name
        // that starts with the escape character itself.
        string[] names = ["=HYPERLINK(\"http://example.invalid\",\"Click\")", "+cmd|' /C calc'!A0", "-2+3 Ltd", "@SUM(1+1)", "\t=1+1", "'Ohana; =1+1 <script>alert(1)</script>"];
        var id = await EvaluationCopies.ImportDemoCopyAsync(factory, file =>
        {
            var bids = file["alternatives"]!.AsArray();
            for (var i = 0; i < bids.Count; i++)
            {
                bids[i]!["name"] = names[i % names.Length];
            }
        });
        await EvaluationCopies.SetUpAsync(factory, id, 1, [DecideWebFactory.Approver]);
        await EvaluationCopies.OpenScoringAsync(factory, id);
        await EvaluationCopies.SubmitAllSheetsAsync(factory, id);
        await EvaluationCopies.StartModerationAsync(factory, id);
        using var client = await factory.SignInAsync(EvaluationCopies.CopyFacilitator);

        var rows = CsvText.Parse(await (await client.GetAsync($"/api/evaluations/{id}/export/results.csv")).Content.ReadAsStringAsync());

        var named = rows.Skip(1).Select(r => r[2]).ToArray();
        Assert.Equal(names.OrderBy(n => n, StringComparer.Ordinal), named.Select(CsvText.Unescape).Distinct().OrderBy(n => n, StringComparer.Ordinal));
        Assert.DoesNotContain(rows.SelectMany(r => r), cell => cell.Length > 0 && cell[0] is '=' or '+' or '-' or '@' or '\t' or '\r' or '\0');
    }

    [Fact]
    public async Task Results_csv_is_refused_before_moderation_like_the_results()
    {
        var id = await EvaluationCopies.ImportDemoCopyAsync(factory);
        using var client = await factory.SignInAsync(EvaluationCopies.CopyFacilitator);
        var problem = await EvaluationCopies.ProblemAsync(await client.GetAsync($"/api/evaluations/{id}/export/results.csv"), HttpStatusCode.Conflict);
        Assert.Contains("Setup", problem.GetProperty("detail").GetString());
        Assert.Contains("moderation has started", problem.GetProperty("detail").GetString());
    }
}
