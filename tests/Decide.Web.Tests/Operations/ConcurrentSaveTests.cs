using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.Operations;

/// <summary>
/// A whole panel saving at once through one instance, on whichever database this run uses (SQLite, then
/// PostgreSQL): every save lands on one audit chain, which grows under its lock, so none is refused for a collision
/// and none is lost.
/// </summary>
public sealed class ConcurrentSaveTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task A_hundred_sessions_saving_at_once_through_one_instance_lose_and_duplicate_nothing() =>
        await SaveBurst.RunAsync([factory], sessions: 100);
}
