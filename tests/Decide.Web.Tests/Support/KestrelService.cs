namespace Decide.Web.Tests.Support;

/// <summary>A class fixture: the service on Kestrel (<see cref="DecideWebFactory.OnKestrel"/>), for tests of the server's limits.</summary>
public sealed class KestrelService : IDisposable
{
    public DecideWebFactory Factory { get; } = DecideWebFactory.OnKestrel();

    public void Dispose() => Factory.Dispose();
}
