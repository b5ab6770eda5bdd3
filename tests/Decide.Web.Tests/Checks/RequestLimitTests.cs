using System.Net;
using System.Net.Http.Headers;
using System.Text;
using System.Text.Json;
using Decide.Data;
using Decide.Web.Infrastructure;
using Decide.Web.Tests.Support;
using Microsoft.AspNetCore.SignalR;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Options;

namespace Decide.Web.Tests.Checks;

/// <summary>
/// Each limit of <see cref="RequestLimits"/> against the service on Kestrel, as in production: a request over it gets
/// 413 (or 400) with a problem document whose detail names the limit, never a 500, and nothing is stored; a request
/// just under it gets past the limit.
/// </summary>
public sealed class RequestLimitTests(KestrelService service) : IClassFixture<KestrelService>
{
    private DecideWebFactory Factory => service.Factory;

    [Fact]
    public async Task An_import_over_the_body_limit_gets_413_naming_the_limit_and_stores_nothing()
    {
        using var admin = await Factory.SignInAsync(DecideWebFactory.Admin);
        var before = await CountEvaluationsAsync();

        var response = await SendAsync(admin, "/api/evaluations/import", JsonOfSize(RequestLimits.MaxRequestBodyBytes + 1));

        await AssertTooLargeAsync(response, RequestLimits.MaxRequestBodyBytes);
        Assert.Equal(before, await CountEvaluationsAsync());
    }

    [Fact]
    public async Task An_import_just_under_the_body_limit_is_read_and_refused_for_its_content_instead()
    {
        using var admin = await Factory.SignInAsync(DecideWebFactory.Admin);

        var response = await SendAsync(admin, "/api/evaluations/import", JsonOfSize(RequestLimits.MaxRequestBodyBytes - 1024));

        var problem = await ApiAssert.ProblemAsync(response, HttpStatusCode.BadRequest);
        ApiAssert.HasError(problem, "file", "JSON object");
    }

    [Fact]
    public async Task An_analysis_over_the_body_limit_gets_413_naming_the_limit_even_without_a_content_length()
    {
        using var client = await Factory.SignInAsync(DecideWebFactory.Assessor);
        var content = new StreamContent(new MemoryStream(Encoding.UTF8.GetBytes(Padding(RequestLimits.MaxRequestBodyBytes + 1))));
        content.Headers.ContentType = new MediaTypeHeaderValue("application/json");
        var request = new HttpRequestMessage(HttpMethod.Post, "/api/analyses?draws=0") { Content = content };
        request.Headers.TransferEncodingChunked = true;

        var response = await client.SendAsync(request);

        await AssertTooLargeAsync(response, RequestLimits.MaxRequestBodyBytes);
    }

    [Fact]
    public async Task A_record_over_the_record_limit_gets_413_naming_the_limit()
    {
        using var client = await Factory.SignInAsync(DecideWebFactory.Observer);

        var response = await SendAsync(client, "/api/records/verification", PdfOfSize(RequestLimits.MaxRecordBytes + 1));

        await AssertTooLargeAsync(response, RequestLimits.MaxRecordBytes);
    }

    [Fact]
    public async Task A_record_larger_than_the_body_limit_but_within_the_record_limit_is_checked()
    {
        using var client = await Factory.SignInAsync(DecideWebFactory.Observer);

        var response = await SendAsync(client, "/api/records/verification", PdfOfSize(RequestLimits.MaxRequestBodyBytes + 1024));

        // Not a record at all: checked and failed, or refused for what it is, but not for its size.
        var status = (int)response.StatusCode;
        Assert.True(status is 200 or 400, $"got {status}: {await response.Content.ReadAsStringAsync()}");
    }

    [Fact]
    public async Task A_sign_in_form_over_the_form_limit_is_refused_naming_the_limit_and_signs_nobody_in()
    {
        using var client = Factory.CreateClient(new Microsoft.AspNetCore.Mvc.Testing.WebApplicationFactoryClientOptions
        {
            AllowAutoRedirect = false, HandleCookies = true, BaseAddress = Factory.ClientOptions.BaseAddress,
        });
        var page = await client.GetStringAsync("/signin");
        var token = System.Text.RegularExpressions.Regex.Match(page, "name=\"__RequestVerificationToken\" value=\"([^\"]+)\"").Groups[1].Value;
        var form = new FormUrlEncodedContent(new Dictionary<string, string>
        {
            ["__RequestVerificationToken"] = token, ["Email"] = DecideWebFactory.Assessor, ["Password"] = Decide.Web.Features.Accounts.DemoSeeder.DemoPassword,
            ["ReturnUrl"] = "/" + new string('x', RequestLimits.MaxFormBytes),
        });

        var response = await SendAsync(client, "/account/signin", form);

        var status = (int)response.StatusCode;
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(status is 400 or 413, $"got {status}: {body}");
        Assert.Contains(RequestLimits.Describe(RequestLimits.MaxFormBytes), ProblemDetail(body));
        Assert.False(response.Headers.TryGetValues("Set-Cookie", out var cookies) && cookies.Any(c => c.StartsWith(".AspNetCore.Identity", StringComparison.Ordinal)));
    }

    [Fact]
    public void A_screens_circuit_accepts_messages_up_to_the_named_limit_which_holds_the_longest_text_field()
    {
        var hubType = typeof(Microsoft.AspNetCore.Components.Server.CircuitOptions).Assembly.GetType("Microsoft.AspNetCore.Components.Server.ComponentHub", throwOnError: true)!;
        var options = (IOptions<HubOptions>)Factory.Services.GetRequiredService(typeof(IOptions<>).MakeGenericType(typeof(HubOptions<>).MakeGenericType(hubType)));

        Assert.Equal(RequestLimits.MaxCircuitMessageBytes, options.Value.MaximumReceiveMessageSize);
        // The longest field a screen sends (4,000 characters) as JSON with every character escaped (\uXXXX), plus
        // room for the message's own envelope.
        Assert.True(4000 * 6 + 1024 <= RequestLimits.MaxCircuitMessageBytes);
    }

    /// <summary>
    /// Posts with "Expect: 100-continue", as careful clients do: the server can refuse a body by its announced length
    /// before it is sent. Without it the server still answers 413, but closes the connection while the client is
    /// still sending, and the client sees a broken pipe instead of the answer.
    /// </summary>
    private static Task<HttpResponseMessage> SendAsync(HttpClient client, string url, HttpContent content)
    {
        var request = new HttpRequestMessage(HttpMethod.Post, url) { Content = content };
        request.Headers.ExpectContinue = true;
        return client.SendAsync(request);
    }

    private static async Task AssertTooLargeAsync(HttpResponseMessage response, long limit)
    {
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode is HttpStatusCode.RequestEntityTooLarge or HttpStatusCode.BadRequest,
            $"expected 413 or 400, got {(int)response.StatusCode}: {body}");
        Assert.StartsWith("application/problem+json", response.Content.Headers.ContentType?.MediaType ?? "", StringComparison.Ordinal);
        Assert.Contains(RequestLimits.Describe(limit), ProblemDetail(body));
    }

    private static string ProblemDetail(string body) => JsonDocument.Parse(body).RootElement.GetProperty("detail").GetString() ?? "";

    private async Task<int> CountEvaluationsAsync()
    {
        await using var db = await Factory.Services.GetRequiredService<IDbContextFactory<DecideDbContext>>().CreateDbContextAsync();
        return await db.Evaluations.CountAsync();
    }

    /// <summary>A JSON object of exactly <paramref name="bytes"/> bytes (one long string member).</summary>
    private static StringContent JsonOfSize(long bytes) => new(Padding(bytes), Encoding.UTF8, "application/json");

    private static string Padding(long bytes) => "{\"x\":\"" + new string('x', (int)bytes - 8) + "\"}";

    private static ByteArrayContent PdfOfSize(long bytes)
    {
        var content = new ByteArrayContent([.. "%PDF-1.7\n"u8, .. new byte[bytes - 9]]);
        content.Headers.ContentType = new MediaTypeHeaderValue("application/pdf");
        return content;
    }
}
