using System.Net;
using System.Net.Http.Json;
using System.Text.Json;

namespace Decide.Web.Tests.Support;

/// <summary>Assertions on API responses that show the response body when they fail.</summary>
public static class ApiAssert
{
    /// <summary>Asserts a 2xx response and returns its JSON body.</summary>
    public static async Task<JsonElement> OkAsync(HttpResponseMessage response)
    {
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.IsSuccessStatusCode, $"Expected success, got {(int)response.StatusCode}: {body}");
        return body.Length == 0 ? default : JsonDocument.Parse(body).RootElement.Clone();
    }

    /// <summary>Asserts a problem response with <paramref name="status"/> whose detail contains <paramref name="detail"/> (ignoring case).</summary>
    public static async Task<JsonElement> ProblemAsync(HttpResponseMessage response, HttpStatusCode status, string? detail = null)
    {
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == status, $"Expected {(int)status}, got {(int)response.StatusCode}: {body}");
        var problem = JsonDocument.Parse(body).RootElement.Clone();
        if (detail is not null)
        {
            var text = problem.GetProperty("detail").GetString() ?? "";
            Assert.True(text.Contains(detail, StringComparison.OrdinalIgnoreCase), $"Expected the detail to contain \"{detail}\": {text}");
        }

        return problem;
    }

    /// <summary>Asserts that the problem's <c>errors</c> name <paramref name="field"/> with a reason containing <paramref name="reason"/>.</summary>
    public static void HasError(JsonElement problem, string field, string reason)
    {
        Assert.True(problem.TryGetProperty("errors", out var errors), $"No errors in {problem}");
        Assert.True(errors.TryGetProperty(field, out var reasons), $"No error for {field} in {errors}");
        Assert.Contains(reasons.EnumerateArray(), r => r.GetString()!.Contains(reason, StringComparison.OrdinalIgnoreCase));
    }

    /// <summary>Sends JSON with PUT.</summary>
    public static Task<HttpResponseMessage> PutJsonAsync(this HttpClient client, string url, object body) => client.PutAsJsonAsync(url, body);

    /// <summary>Sends JSON with POST (an empty object when <paramref name="body"/> is null).</summary>
    public static Task<HttpResponseMessage> PostJsonAsync(this HttpClient client, string url, object? body = null) => client.PostAsJsonAsync(url, body ?? new { });
}
