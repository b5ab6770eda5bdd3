using System.Net;
using System.Net.Http.Json;
using System.Text;
using System.Text.Json;
using Decide.Web.Tests.Support;
using Microsoft.AspNetCore.Http;
using Microsoft.AspNetCore.Routing;
using Microsoft.Extensions.DependencyInjection;

namespace Decide.Web.Tests.Checks;

/// <summary>
/// Every endpoint × every kind of caller against the demo evaluation (stage Moderation), from an explicit table,
/// plus the stage-dependent refusals of an evaluation at stage Scoring. "Allowed" means the access decision let the
/// request through: any status but 401, 403 and 404 (a 400 or 409 for a minimal body is fine).
/// </summary>
public sealed class AuthorisationMatrixTests(AuthorisationFixture fixture) : IClassFixture<AuthorisationFixture>
{
    /// <summary>The callers, in the order of the letters in <see cref="Expected"/>.</summary>
    public static readonly string[] Callers = ["anonymous", "stranger", "assessor", "priceEvaluator", "facilitator", "observer", "approver", "administrator"];

    /// <summary>
    /// Endpoint (method and route pattern) → one letter per caller of <see cref="Callers"/>: A allowed, 1 = 401,
    /// 3 = 403, 4 = 404. The demo's price evaluator (kilbane) also holds an assessor seat. An administrator holds no
    /// panel role in the demo: it sees the evaluation but not the panel's work.
    /// </summary>
    public static readonly IReadOnlyDictionary<string, string> Expected = new Dictionary<string, string>
    {
        // Sign-in is sent with the facilitator's real credentials. Refresh is open to anyone, but the token sent here is not a real one: every caller is refused with 401.
        ["POST /api/auth/login"] = "AAAAAAAA",
        ["POST /api/auth/refresh"] = "11111111",
        ["POST /api/auth/logout"] = "1AAAAAAA",
        ["GET /api/accounts/me"] = "1AAAAAAA",
        ["GET /api/accounts/"] = "1333333A",
        ["POST /api/accounts/"] = "1333333A",

        ["GET /api/evaluations/"] = "1AAAAAAA",
        ["POST /api/evaluations/"] = "1333333A",
        ["GET /api/evaluations/{id:guid}"] = "14AAAAAA",
        ["GET /api/evaluations/{id:guid}/setup"] = "1433A333",
        ["PUT /api/evaluations/{id:guid}/plan"] = "1433A333",
        ["PUT /api/evaluations/{id:guid}/panel"] = "1433A333",
        ["PUT /api/evaluations/{id:guid}/bids"] = "1433A333",
        ["POST /api/evaluations/{id:guid}/bids/import"] = "1433A333",
        ["POST /api/evaluations/{id:guid}/lock-plan"] = "1433A333",
        ["POST /api/evaluations/{id:guid}/open-scoring"] = "1433A333",
        ["POST /api/evaluations/{id:guid}/start-moderation"] = "1433A333",
        ["POST /api/evaluations/{id:guid}/open-prices"] = "1433A333",
        ["POST /api/evaluations/{id:guid}/revisions"] = "1433A333",
        // Administrator-only: refused before the evaluation is looked up, so the same 403 for any id leaks nothing.
        ["PUT /api/evaluations/{id:guid}/legal-hold"] = "1333333A",

        ["GET /api/evaluations/{id:guid}/audit"] = "1433AAA3",
        ["GET /api/evaluations/{id:guid}/audit/verification"] = "1433AAA3",
        ["GET /api/audit/verification"] = "1333333A",

        ["GET /api/declaration"] = "1AAAAAAA",
        ["GET /api/evaluations/{id:guid}/declaration"] = "14AA3333",
        ["POST /api/evaluations/{id:guid}/declaration"] = "14AA3333",
        ["POST /api/evaluations/{id:guid}/declaration/names"] = "14AA3333",
        ["POST /api/evaluations/{id:guid}/conflicts"] = "14AA3333",
        ["GET /api/evaluations/{id:guid}/conflicts"] = "14AAAAA3",
        ["GET /api/evaluations/{id:guid}/my/weights/"] = "14AA3333",
        ["PUT /api/evaluations/{id:guid}/my/weights/"] = "14AA3333",
        ["POST /api/evaluations/{id:guid}/my/weights/submit"] = "14AA3333",
        ["GET /api/evaluations/{id:guid}/my/sheet"] = "14AA3333",
        ["PUT /api/evaluations/{id:guid}/my/ratings/{bid}/{criterion}"] = "14AA3333",
        ["POST /api/evaluations/{id:guid}/my/submit"] = "14AA3333",
        ["GET /api/evaluations/{id:guid}/values/"] = "143AAAA3",
        ["PUT /api/evaluations/{id:guid}/values/{bid}/{criterion}"] = "143A3333",
        ["GET /api/evaluations/{id:guid}/gates/"] = "14AAAAA3",
        ["PUT /api/evaluations/{id:guid}/gates/{bid}/{criterion}"] = "1433A333",

        ["GET /api/evaluations/{id:guid}/progress"] = "1433AA33",
        ["GET /api/evaluations/{id:guid}/moderation"] = "14AAAAA3",
        ["PUT /api/evaluations/{id:guid}/moderation/{bid}/{criterion}"] = "1433A333",
        ["POST /api/evaluations/{id:guid}/sheets/{assessorCode}/reopen"] = "1433A333",
        ["GET /api/evaluations/{id:guid}/results"] = "14AAAAA3",
        ["GET /api/evaluations/{id:guid}/award"] = "14AAAAA3",
        // The demo is not a round: callers who may read an assignment get a 409 saying so; an assessor would see only their own list.
        ["GET /api/evaluations/{id:guid}/assignment/"] = "14AAAAA3",
        ["POST /api/evaluations/{id:guid}/assignment/propose"] = "1433A333",
        ["PUT /api/evaluations/{id:guid}/assignment/{reviewer}"] = "1433A333",
        ["PUT /api/evaluations/{id:guid}/low-price-reviews/{bid}"] = "1433A333",

        ["GET /api/evaluations/{id:guid}/export"] = "1433AAA3",
        ["GET /api/evaluations/{id:guid}/export/ratings.csv"] = "1433AAA3",
        ["GET /api/evaluations/{id:guid}/export/results.csv"] = "14AAAAA3",
        ["GET /api/evaluations/{id:guid}/export/ratings.xlsx"] = "1433AAA3",
        ["GET /api/evaluations/{id:guid}/export/results.xlsx"] = "14AAAAA3",
        // The demo is not a round: those who may read the assignment get a 409 saying so.
        ["GET /api/evaluations/{id:guid}/export/assignment.xlsx"] = "1433AAA3",
        ["GET /api/evaluations/{id:guid}/export/award.csv"] = "14AAAAA3",
        ["GET /api/evaluations/{id:guid}/methodology.pdf"] = "14AAAAA3",
        ["GET /api/evaluations/{id:guid}/methodology.txt"] = "14AAAAA3",
        ["POST /api/evaluations/import"] = "1333333A",
        ["POST /api/analyses"] = "1AAAAAAA",

        ["GET /api/evaluations/{id:guid}/approvals/"] = "1433AAA3",
        ["POST /api/evaluations/{id:guid}/approvals/"] = "143333A3",
        ["POST /api/evaluations/{id:guid}/approvals/request"] = "1433A333",
        ["GET /api/evaluations/{id:guid}/records"] = "1433AAA3",
        ["GET /api/evaluations/{id:guid}/record"] = "1433AAA3",
        ["GET /api/evaluations/{id:guid}/feedback/{bid}"] = "1433A333",
        // Anyone signed in may check a record they hold; the answer names only what the file itself says.
        ["POST /api/records/verification"] = "1AAAAAAA",
    };

    public static TheoryData<string> CallerRows() => new(Callers);

    [Fact]
    public void Every_api_endpoint_has_a_row_in_the_table_and_every_row_an_endpoint()
    {
        var endpoints = ApiEndpoints();
        Assert.Empty(endpoints.Except(Expected.Keys));
        Assert.Empty(Expected.Keys.Except(endpoints));
        Assert.All(Expected.Values, letters => Assert.Equal(Callers.Length, letters.Length));
    }

    [Theory]
    [MemberData(nameof(CallerRows))]
    public async Task Each_endpoint_grants_or_refuses_the_caller_as_the_table_says(string caller)
    {
        using var client = await ClientAsync(caller);
        var column = Array.IndexOf(Callers, caller);
        var mismatches = new List<string>();
        foreach (var endpoint in ApiEndpoints().Where(Expected.ContainsKey))
        {
            var expected = Expected[endpoint][column];
            var response = await SendAsync(client, endpoint, fixture.DemoId);
            var status = (int)response.StatusCode;
            var body = await response.Content.ReadAsStringAsync();
            Assert.True(status < 500, $"{endpoint} as {caller}: {status} {body}");
            var matches = expected switch
            {
                'A' => status is not (401 or 403 or 404),
                '1' => status == 401,
                '3' => status == 403,
                _ => status == 404,
            };
            if (!matches)
            {
                mismatches.Add($"{endpoint}: expected {expected}, got {status} {Shorten(body)}");
            }
            else if (status is 403 or 404 && !body.Contains("\"detail\"", StringComparison.Ordinal))
            {
                mismatches.Add($"{endpoint}: refusal {status} without a problem detail: {Shorten(body)}");
            }
        }

        Assert.True(mismatches.Count == 0, $"{caller}:\n" + string.Join("\n", mismatches));
    }

    [Fact]
    public async Task At_scoring_an_assessor_reads_their_own_sheet_only_and_nothing_that_shows_another_assessors_ratings()
    {
        var s = fixture.Scoring;
        var sheet = await ApiAssert.OkAsync(await s.Brook.GetAsync(s.Url("/my/sheet")));
        Assert.All(sheet.GetProperty("cells").EnumerateArray(),
            c => Assert.Contains(c.GetProperty("criterion").GetString(), Scenario.CriteriaOf(ScenarioBuilder.Brook)));

        var ashbysRating = sheet.GetProperty("cells").EnumerateArray()
            .Single(c => c.GetProperty("alternative").GetString() == ScenarioPlan.Bidders[0].Code && c.GetProperty("criterion").GetString() == ScenarioPlan.Quality);
        Assert.False(ashbysRating.GetProperty("done").GetBoolean(), $"Brook's own cell must not show Ashby's rating: {ashbysRating}");

        foreach (var client in new[] { s.Ashby, s.Brook })
        {
            await ApiAssert.ProblemAsync(await client.GetAsync(s.Url("/moderation")), HttpStatusCode.Conflict, "stage Scoring");
            await ApiAssert.ProblemAsync(await client.GetAsync(s.Url("/results")), HttpStatusCode.Conflict, "stage Scoring");
        }

        await ApiAssert.ProblemAsync(await s.Ashby.GetAsync(s.Url("/results")), HttpStatusCode.Conflict, "stage Scoring");
        await ApiAssert.ProblemAsync(await s.Ashby.GetAsync(s.Url("/export/results.csv")), HttpStatusCode.Conflict, "stage Scoring");
        await ApiAssert.ProblemAsync(await s.Ashby.GetAsync(s.Url("/export")), HttpStatusCode.Forbidden, "facilitator");
        await ApiAssert.ProblemAsync(await s.Ashby.GetAsync(s.Url("/export/ratings.csv")), HttpStatusCode.Forbidden, "facilitator");
        await ApiAssert.ProblemAsync(await s.Ashby.GetAsync(s.Url("/progress")), HttpStatusCode.Forbidden, "facilitator");
        await ApiAssert.ProblemAsync(await s.Ashby.GetAsync(s.Url("/audit")), HttpStatusCode.Forbidden, "facilitator");
    }

    [Fact]
    public async Task A_quality_assessor_cannot_read_prices_unless_the_plan_shows_them()
    {
        var s = fixture.Scoring;
        await ApiAssert.ProblemAsync(await s.Brook.GetAsync(s.Url("/values")), HttpStatusCode.Forbidden, "withheld from quality assessors");
        await ApiAssert.OkAsync(await s.Carrow.GetAsync(s.Url("/values")));

        using var visible = await new ScenarioBuilder(fixture.Factory).WithPricesVisibleToAssessors().BuildAsync(Decide.Data.Entities.EvaluationStage.Scoring);
        await visible.ConfirmNamesAsync(visible.Brook);
        await ApiAssert.OkAsync(await visible.Brook.GetAsync(visible.Url("/values")));
    }

    [Fact]
    public async Task Anonymous_callers_get_401_with_a_problem_document_everywhere_but_sign_in()
    {
        using var anonymous = fixture.Factory.CreateClient();
        foreach (var endpoint in ApiEndpoints().Where(e => !e.StartsWith("POST /api/auth/", StringComparison.Ordinal)))
        {
            var response = await SendAsync(anonymous, endpoint, fixture.DemoId);
            Assert.True(response.StatusCode == HttpStatusCode.Unauthorized, $"{endpoint}: {(int)response.StatusCode}");
            await ApiAssert.ProblemAsync(response, HttpStatusCode.Unauthorized, "sign in first");
        }

        var login = await anonymous.PostAsJsonAsync("/api/auth/login", new { email = DecideWebFactory.Facilitator, password = Decide.Web.Features.Accounts.DemoSeeder.DemoPassword });
        Assert.Equal(HttpStatusCode.OK, login.StatusCode);
    }

    [Fact]
    public async Task A_stranger_gets_404_for_every_resource_of_an_evaluation_and_for_an_id_that_does_not_exist()
    {
        var s = fixture.Scoring;
        foreach (var endpoint in ApiEndpoints().Where(e => e.Contains("{id:guid}", StringComparison.Ordinal) && !e.EndsWith("/legal-hold", StringComparison.Ordinal)))
        {
            var real = await SendAsync(s.Ashby, endpoint, fixture.DemoId);
            var missing = await SendAsync(s.Ashby, endpoint, Guid.NewGuid());
            await ApiAssert.ProblemAsync(real, HttpStatusCode.NotFound, "does not exist or is not visible to you");
            Assert.Equal(HttpStatusCode.NotFound, missing.StatusCode);
        }
    }

    private IReadOnlyList<string> ApiEndpoints() =>
        fixture.Factory.Services.GetRequiredService<EndpointDataSource>().Endpoints.OfType<RouteEndpoint>()
            .Where(e => e.RoutePattern.RawText?.StartsWith("/api", StringComparison.Ordinal) == true)
            .SelectMany(e => (e.Metadata.GetMetadata<HttpMethodMetadata>()?.HttpMethods ?? []).Select(m => $"{m} {e.RoutePattern.RawText}"))
            .Distinct().Order(StringComparer.Ordinal).ToArray();

    private async Task<HttpClient> ClientAsync(string caller) => caller switch
    {
        "anonymous" => fixture.Factory.CreateClient(),
        "stranger" => await fixture.Factory.SignInAsync(fixture.Scoring.Emails[ScenarioBuilder.Ashby], ScenarioBuilder.Password),
        "assessor" => await fixture.Factory.SignInAsync(DecideWebFactory.Assessor),
        "priceEvaluator" => await fixture.Factory.SignInAsync(DecideWebFactory.PriceEvaluator),
        "facilitator" => await fixture.Factory.SignInAsync(DecideWebFactory.Facilitator),
        "observer" => await fixture.Factory.SignInAsync(DecideWebFactory.Observer),
        "approver" => await fixture.Factory.SignInAsync(DecideWebFactory.Approver),
        _ => await fixture.Factory.SignInAsync(DecideWebFactory.Admin),
    };

    /// <summary>Sends a minimal request to the endpoint: path parameters filled with the demo's codes, an empty JSON object for writes.</summary>
    private static Task<HttpResponseMessage> SendAsync(HttpClient client, string endpoint, Guid id)
    {
        var (method, pattern) = (endpoint[..endpoint.IndexOf(' ')], endpoint[(endpoint.IndexOf(' ') + 1)..]);
        var url = pattern.Replace("{id:guid}", id.ToString()).Replace("{bid}", "orrinford").Replace("{criterion}", "display")
            .Replace("{assessorCode}", "ravelle");
        var request = new HttpRequestMessage(new HttpMethod(method), url);
        if (method != "GET")
        {
            var body = endpoint switch
            {
                "POST /api/auth/refresh" => "{\"refreshToken\":\"not-a-token\"}",
                "POST /api/auth/login" => JsonSerializer.Serialize(new { email = DecideWebFactory.Facilitator, password = Decide.Web.Features.Accounts.DemoSeeder.DemoPassword }),
                _ => "{}",
            };
            request.Content = new StringContent(body, Encoding.UTF8, "application/json");
        }

        return client.SendAsync(request);
    }

    private static string Shorten(string body) => body.Length > 200 ? body[..200] + "…" : body;
}
