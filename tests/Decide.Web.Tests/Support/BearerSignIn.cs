using System.Net.Http.Headers;
using System.Net.Http.Json;

namespace Decide.Web.Tests.Support;

/// <summary>Signs a client in through <c>POST /api/auth/login</c> and makes it carry the bearer token.</summary>
public static class BearerSignIn
{
    public static async Task<HttpClient> SignInAsync(HttpClient client, string email, string password)
    {
        var response = await client.PostAsJsonAsync("/api/auth/login", new { email, password });
        response.EnsureSuccessStatusCode();
        var token = await response.Content.ReadFromJsonAsync<TokenResponse>();
        client.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", token!.AccessToken);
        return client;
    }

    private sealed record TokenResponse(string AccessToken);
}
