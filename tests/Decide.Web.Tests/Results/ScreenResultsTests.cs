using System.Security.Claims;
using System.Text.Json;
using Decide.Core.Robustness;
using Decide.Data;
using Decide.Web.Features.Results;
using Decide.Web.Infrastructure;
using Decide.Web.Tests.Exchange;
using Decide.Web.Tests.Support;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;

namespace Decide.Web.Tests.Results;

/// <summary>
/// The results screen uses the same service as the API, as a circuit does (no HTTP request; the caller is the
/// circuit's user): the ranking first, the robustness checks after, each reading audited.
/// </summary>
public sealed class ScreenResultsTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task The_screens_ranking_is_the_apis_ranking_and_the_reading_is_audited_with_the_order_shown()
    {
        var id = await factory.DemoEvaluationAsync();
        using var client = await factory.SignInAsync(DecideWebFactory.Facilitator);
        var document = JsonDocument.Parse(await client.GetStringAsync($"/api/evaluations/{id}/results?draws=0")).RootElement;
        var apiOrder = document.GetProperty("ranking").EnumerateArray()
            .Select(r => (Id: r.GetProperty("alternative").GetString(), Closeness: r.GetProperty("closeness").GetDouble()))
            .ToArray();

        await using var scope = await CircuitOfAsync(DecideWebFactory.Facilitator);
        var ranked = await scope.ServiceProvider.GetRequiredService<ResultsService>().RankAsync(id);

        Assert.Equal(id, ranked.Summary.Id);
        Assert.Equal(apiOrder.Select(r => r.Id), ranked.Analysis.Ranking.Select(r => r.Alternative));
        for (var i = 0; i < apiOrder.Length; i++)
        {
            Assert.Equal(apiOrder[i].Closeness, ranked.Analysis.Ranking[i].Closeness, 12);
        }

        var audit = await EvaluationCopies.AuditAsync(factory, id, DecideWebFactory.Facilitator);
        var viewed = audit.EnumerateArray().Last(e => e.GetProperty("action").GetString() == "results.viewed");
        Assert.Equal("ranking " + string.Join(" > ", apiOrder.Select(r => r.Id)), viewed.GetProperty("newValue").GetString());
    }

    [Fact]
    public async Task The_robustness_checks_of_the_screens_ranking_match_the_apis_document_for_the_same_seed()
    {
        var id = await factory.DemoEvaluationAsync();
        using var client = await factory.SignInAsync(DecideWebFactory.Observer);
        var document = JsonDocument.Parse(await client.GetStringAsync($"/api/evaluations/{id}/results?draws=200&seed=9")).RootElement;
        var summary = document.GetProperty("summary").EnumerateArray().Select(s => s.GetString() ?? "").ToArray();

        await using var scope = await CircuitOfAsync(DecideWebFactory.Observer);
        var results = scope.ServiceProvider.GetRequiredService<ResultsService>();
        var ranked = await results.RankAsync(id);
        var robustness = await ResultsService.CheckRobustnessAsync(ranked, new RobustnessOptions { Draws = 200, Seed = 9 });

        Assert.Equal(summary, robustness.Summary);
    }

    [Fact]
    public async Task The_screens_ranking_is_refused_before_moderation_with_the_stage_named_and_nothing_audited()
    {
        var id = await EvaluationCopies.ImportDemoCopyAsync(factory);
        await EvaluationCopies.SetUpAsync(factory, id, 1, [DecideWebFactory.Approver]);
        await EvaluationCopies.OpenScoringAsync(factory, id);
        var before = (await EvaluationCopies.AuditAsync(factory, id)).GetArrayLength();

        await using var scope = await CircuitOfAsync(EvaluationCopies.CopyFacilitator);
        var problem = await Assert.ThrowsAsync<DomainProblem>(() => scope.ServiceProvider.GetRequiredService<ResultsService>().RankAsync(id));

        Assert.Equal(409, problem.Status);
        Assert.Contains("stage Scoring", problem.Detail);
        Assert.Equal(before, (await EvaluationCopies.AuditAsync(factory, id)).GetArrayLength());
    }

    /// <summary>A service scope whose caller is <paramref name="email"/>, as in an interactive screen's circuit.</summary>
    private async Task<AsyncServiceScope> CircuitOfAsync(string email)
    {
        var scope = factory.Services.CreateAsyncScope();
        var db = await scope.ServiceProvider.GetRequiredService<IDbContextFactory<DecideDbContext>>().CreateDbContextAsync();
        await using (db)
        {
            var userId = await db.Users.Where(u => u.Email == email).Select(u => u.Id).SingleAsync();
            scope.ServiceProvider.GetRequiredService<CurrentUser>().UseCircuitUser(
                new ClaimsPrincipal(new ClaimsIdentity([new Claim(ClaimTypes.NameIdentifier, userId)], "test")));
        }

        return scope;
    }
}
