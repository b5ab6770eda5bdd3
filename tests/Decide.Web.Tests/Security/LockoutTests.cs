using System.Net;
using System.Net.Http.Json;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.Security;

/// <summary>
/// Lockout through the API (the sign-in form's side is in SignInFormTests): five wrong passwords in a row lock the
/// account, and then even the right password is refused with a sentence saying so, not the usual "wrong password".
/// </summary>
public sealed class LockoutTests(SecuredWebFactory factory) : IClassFixture<SecuredWebFactory>
{
    [Fact]
    public async Task The_fifth_wrong_password_in_a_row_locks_the_account_and_the_right_password_is_then_refused()
    {
        const string email = "lockout-api@kestrel-vale.example";
        const string password = "Lockout-api-2026";
        using (var admin = await factory.SignInAsync(DecideWebFactory.Admin))
        {
            var created = await admin.PostAsJsonAsync("/api/accounts", new { email, displayName = "Lockout Api", password });
            Assert.Equal(HttpStatusCode.Created, created.StatusCode);
        }

        using var client = factory.Browser("198.51.100.40");
        for (var attempt = 1; attempt <= 4; attempt++)
        {
            await ApiAssert.ProblemAsync(await LoginAsync(client, email, "Wrong-password-2026"), HttpStatusCode.Unauthorized, "password is wrong");
        }

        // Identity counts this failure, reaches MaxFailedAccessAttempts (5) and locks the account at once.
        await ApiAssert.ProblemAsync(await LoginAsync(client, email, "Wrong-password-2026"), (HttpStatusCode)423, "account is locked");
        var right = await LoginAsync(client, email, password);
        var problem = await ApiAssert.ProblemAsync(right, (HttpStatusCode)423, "Too many failed sign-ins: the account is locked");
        Assert.Equal("Account locked", problem.GetProperty("title").GetString());

        using var administrator = await factory.SignInAsync(DecideWebFactory.Admin);
        var accounts = await administrator.GetFromJsonAsync<List<Account>>("/api/accounts");
        Assert.True(accounts!.Single(a => a.Email == email).LockedOut);
    }

    private static Task<HttpResponseMessage> LoginAsync(HttpClient client, string email, string password) =>
        client.PostAsJsonAsync("/api/auth/login", new { email, password });

    private sealed record Account(string Email, bool LockedOut);
}
