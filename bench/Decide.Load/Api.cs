using System.Net.Http.Headers;
using System.Net.Http.Json;
using System.Text.Json;

namespace Decide.Load;

/// <summary>The few calls of the service's HTTP API that the load run makes, with bearer-token sign-in.</summary>
public static class Api
{
    /// <summary>Signs in and returns a client carrying the bearer token.</summary>
    public static async Task<HttpClient> SignInAsync(HttpMessageHandler handler, Uri baseUrl, string email, string password, CancellationToken ct)
    {
        var client = new HttpClient(handler, disposeHandler: false) { BaseAddress = baseUrl, Timeout = TimeSpan.FromSeconds(60) };
        var token = await ReadAsync(await client.PostAsJsonAsync("/api/auth/login", new { email, password }, ct), $"sign-in of {email}", ct);
        client.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", token.GetProperty("accessToken").GetString());
        return client;
    }

    /// <summary>The body of a successful answer, or an exception naming the step and the service's reason.</summary>
    public static async Task<JsonElement> ReadAsync(HttpResponseMessage response, string step, CancellationToken ct)
    {
        var text = await response.Content.ReadAsStringAsync(ct);
        if (!response.IsSuccessStatusCode)
        {
            throw new LoadSetupException($"{step}: {(int)response.StatusCode} {(text.Length > 400 ? text[..400] + "…" : text)}");
        }

        return text.Length == 0 ? default : JsonDocument.Parse(text).RootElement.Clone();
    }

    public static async Task<JsonElement> PostAsync(HttpClient client, string path, object? body, string step, CancellationToken ct) =>
        await ReadAsync(await client.PostAsJsonAsync(path, body ?? new { }, ct), step, ct);

    public static async Task<JsonElement> PutAsync(HttpClient client, string path, object body, string step, CancellationToken ct) =>
        await ReadAsync(await client.PutAsJsonAsync(path, body, ct), step, ct);

    public static async Task<JsonElement> GetAsync(HttpClient client, string path, string step, CancellationToken ct) =>
        await ReadAsync(await client.GetAsync(path, ct), step, ct);
}

/// <summary>The service refused a step of preparing the run; the message names the step and the reason.</summary>
public sealed class LoadSetupException(string message) : Exception(message);
