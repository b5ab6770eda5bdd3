namespace Decide.Web.Tests.Support;

/// <summary>A running service that tests talk to over HTTP: in memory (<see cref="DecideWebFactory"/>) or a real process (<see cref="ServiceProcess"/>).</summary>
public interface IDecideHost
{
    /// <summary>A client of the service, not signed in.</summary>
    HttpClient CreateClient();

    /// <summary>A client signed in as <paramref name="email"/> with a bearer token.</summary>
    Task<HttpClient> SignInAsync(string email, string password = Decide.Web.Features.Accounts.DemoSeeder.DemoPassword);
}
