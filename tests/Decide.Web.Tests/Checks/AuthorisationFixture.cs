using Decide.Data.Entities;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.Checks;

/// <summary>
/// One test database with the seeded demo (stage Moderation) and a scenario evaluation at stage Scoring, whose
/// assessor Ashby is a stranger to the demo.
/// </summary>
public sealed class AuthorisationFixture : IAsyncLifetime
{
    public DecideWebFactory Factory { get; } = new();

    public Guid DemoId { get; private set; }

    public Scenario Scoring { get; private set; } = null!;

    public async Task InitializeAsync()
    {
        DemoId = await Factory.DemoEvaluationAsync();
        Scoring = await new ScenarioBuilder(Factory).BuildAsync(EvaluationStage.Scoring);
        foreach (var client in new[] { Scoring.Ashby, Scoring.Brook, Scoring.Carrow })
        {
            await Scoring.ConfirmNamesAsync(client);
        }

        // A rating of Ashby's that Brook must not be able to read before moderation.
        await ApiAssert.OkAsync(await Scenario.RateAsync(Scoring.Ashby, Scoring.Id, ScenarioPlan.Bidders[0].Code, ScenarioPlan.Quality, "VG"));
    }

    public Task DisposeAsync()
    {
        Scoring.Dispose();
        Factory.Dispose();
        return Task.CompletedTask;
    }
}
