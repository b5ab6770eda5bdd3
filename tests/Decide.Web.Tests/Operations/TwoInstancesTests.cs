using System.Net.Http.Json;
using System.Text.Json;
using Decide.Data.Entities;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests.Operations;

/// <summary>
/// Two instances of the service on loopback ports sharing one PostgreSQL database, as behind the proxy in
/// deploy/compose.yaml: what one issues the other honours, what one stores the other reads, and concurrent saves
/// through both are neither lost nor duplicated.
/// </summary>
public sealed class TwoInstancesTests : IDisposable
{
    private readonly string _database = "decide_two_" + Guid.NewGuid().ToString("N");
    private readonly DecideWebFactory? _first;
    private readonly DecideWebFactory? _second;

    public TwoInstancesTests()
    {
        if (DecideWebFactory.PostgresServer is null)
        {
            return;
        }

        _first = DecideWebFactory.SharingDatabase(_database, first: true);
        _second = DecideWebFactory.SharingDatabase(_database, first: false);
    }

    [PostgresFact]
    public async Task A_sign_in_and_a_rating_made_through_one_instance_are_honoured_and_read_through_the_other()
    {
        var scenario = await new ScenarioBuilder(_first!).BuildAsync(EvaluationStage.Scoring);
        await scenario.ConfirmNamesAsync(scenario.Ashby);
        var (alternative, criterion) = (ScenarioPlan.Bidders[0].Code, ScenarioPlan.Quality);

        // The bearer token issued by the first instance, presented to the second.
        using var onSecond = _second!.CreateClient();
        onSecond.DefaultRequestHeaders.Authorization = scenario.Ashby.DefaultRequestHeaders.Authorization;
        var me = await ApiAssert.OkAsync(await onSecond.GetAsync("/api/accounts/me"));
        Assert.Equal(scenario.Emails[ScenarioBuilder.Ashby], me.GetProperty("email").GetString());

        const string rationale = "Method statement section 3 sets out a daily quality check with photographs.";
        await ApiAssert.OkAsync(await scenario.Ashby.PutJsonAsync(scenario.Url($"/my/ratings/{alternative}/{criterion}"),
            new { term = await FirstTermAsync(scenario.Ashby, scenario), rationale }));
        var sheet = await ApiAssert.OkAsync(await onSecond.GetAsync(scenario.Url("/my/sheet")));
        var cell = sheet.GetProperty("cells").EnumerateArray()
            .Single(c => c.GetProperty("alternative").GetString() == alternative && c.GetProperty("criterion").GetString() == criterion);
        Assert.Equal(rationale, cell.GetProperty("rationale").GetString());
    }

    [PostgresFact]
    public async Task Fifty_assessors_saving_at_once_through_both_instances_lose_and_duplicate_nothing() =>
        await SaveBurst.RunAsync([_first!, _second!], sessions: 50);

    private static async Task<string> FirstTermAsync(HttpClient client, Scenario scenario) =>
        (await ApiAssert.OkAsync(await client.GetAsync(scenario.Url("/my/sheet")))).GetProperty("scale")[0].GetProperty("code").GetString()!;

    public void Dispose()
    {
        _second?.Dispose();
        _first?.Dispose();
    }
}
