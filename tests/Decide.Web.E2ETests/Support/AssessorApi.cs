using System.Net.Http.Headers;
using System.Net.Http.Json;
using System.Text.Json;

namespace Decide.Web.E2ETests.Support;

/// <summary>
/// An assessor's part of setup done through the API, as a script would: sign the declaration, rate the importance
/// of every weighed criterion and group, submit. Lets a browser journey reach the lock without the assessor's screens.
/// </summary>
public static class AssessorApi
{
    /// <summary>Signs in as <paramref name="email"/>, accepts the declaration and submits <paramref name="term"/> as the importance of every node.</summary>
    public static async Task SubmitImportanceAsync(string baseUrl, string email, Guid evaluation, string term)
    {
        using var client = new HttpClient { BaseAddress = new Uri(baseUrl) };
        var login = await Ok(await client.PostAsJsonAsync("/api/auth/login", new { email, password = DecideServer.Password }));
        client.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", login.GetProperty("accessToken").GetString());

        var declaration = await Ok(await client.GetAsync("/api/declaration"));
        await Ok(await client.PostAsJsonAsync($"/api/evaluations/{evaluation}/declaration", new { version = declaration.GetProperty("version").GetString(), accepted = true }));
        var weights = await Ok(await client.GetAsync($"/api/evaluations/{evaluation}/my/weights"));
        var importance = weights.GetProperty("nodes").EnumerateArray().ToDictionary(n => n.GetProperty("id").GetString()!, _ => term);
        await Ok(await client.PutAsJsonAsync($"/api/evaluations/{evaluation}/my/weights", new { importance }));
        await Ok(await client.PostAsJsonAsync($"/api/evaluations/{evaluation}/my/weights/submit", new { }));
    }

    private static async Task<JsonElement> Ok(HttpResponseMessage response)
    {
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.IsSuccessStatusCode, $"{(int)response.StatusCode} {response.RequestMessage?.Method} {response.RequestMessage?.RequestUri}: {body}");
        return JsonDocument.Parse(body).RootElement.Clone();
    }
}
