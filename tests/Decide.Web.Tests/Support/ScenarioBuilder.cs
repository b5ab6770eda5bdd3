using System.Net.Http.Json;
using System.Text.Json;
using Decide.Data.Entities;

namespace Decide.Web.Tests.Support;

/// <summary>
/// Builds an evaluation through the API as its users would: the administrator creates the accounts and the
/// evaluation; the facilitator sets the plan (<see cref="ScenarioPlan"/>), the panel and the bids; then the panel
/// and the facilitator drive it to the stage asked for. Every account and reference is new, so several scenarios
/// share one test database.
/// </summary>
/// <remarks>
/// The panel: assessors <see cref="Ashby"/> (every linguistic criterion) and <see cref="Brook"/> (quality and
/// staffing only), price evaluator <see cref="Carrow"/>, an observer and the facilitator.
/// </remarks>
public sealed class ScenarioBuilder(IDecideHost factory)
{
    public const string Password = "Scenario-pass-2026";
    public const string Ashby = "ashby";
    public const string Brook = "brook";
    public const string Carrow = "carrow";

    private string _weighting = "importance";
    private bool _twoStage;
    private bool _pricesVisible;
    private int _minRationale = 20;
    private (int K, int MaxLoad, double Budget)? _round;

    /// <summary>Weights by pairwise comparison instead of importance terms.</summary>
    public ScenarioBuilder WithPairwiseWeighting()
    {
        _weighting = "pairwise";
        return this;
    }

    /// <summary>
    /// Publishes points and a points award (<see cref="ScenarioPlan.Plan"/>); with <paramref name="twoStage"/> the
    /// prices stay sealed until quality moderation is closed.
    /// </summary>
    public ScenarioBuilder WithPointsAward(bool twoStage)
    {
        (_weighting, _twoStage) = ("points", twoStage);
        return this;
    }

    /// <summary>Lets quality assessors see numeric (price) values.</summary>
    public ScenarioBuilder WithPricesVisibleToAssessors()
    {
        _pricesVisible = true;
        return this;
    }

    /// <summary>
    /// Makes the evaluation a round: each bid read by <paramref name="k"/> reviewers, at most
    /// <paramref name="maxLoad"/> per reviewer, a funding line of <paramref name="budget"/>; the bids request
    /// 40,000, 30,000 and 20,000.
    /// </summary>
    public ScenarioBuilder WithRound(int k, int maxLoad, double budget)
    {
        _round = (k, maxLoad, budget);
        return this;
    }

    public ScenarioBuilder WithMinRationaleLength(int characters)
    {
        _minRationale = characters;
        return this;
    }

    /// <summary>Creates the evaluation and brings it to <paramref name="stage"/> (Setup, PlanLocked, Scoring or Moderation).</summary>
    public async Task<Scenario> BuildAsync(EvaluationStage stage = EvaluationStage.Setup)
    {
        var tag = Guid.NewGuid().ToString("N")[..8];
        using var admin = await factory.SignInAsync(DecideWebFactory.Admin);
        var emails = new Dictionary<string, string>();
        foreach (var (who, name) in new[]
                 {
                     ("facilitator", "Morwen Tallis (facilitator)"), (Ashby, "Rhiannon Ashby"), (Brook, "Teodor Brook"),
                     (Carrow, "Ines Carrow (commercial)"), ("observer", "Lowri Dunmore (probity observer)"),
                 })
        {
            var email = $"{who}.{tag}@scenario.example";
            await ApiAssert.OkAsync(await admin.PostAsJsonAsync("/api/accounts", new { email, displayName = name, password = Password }));
            emails[who] = email;
        }

        var reference = $"SC-{tag}";
        var created = await ApiAssert.OkAsync(await admin.PostAsJsonAsync("/api/evaluations",
            new { reference, title = "Scenario evaluation", organisation = "Scenario Transport Board", facilitatorEmail = emails["facilitator"] }));
        var id = created.GetProperty("id").GetGuid();

        var scenario = new Scenario(id, reference, emails,
            await factory.SignInAsync(emails["facilitator"], Password),
            await factory.SignInAsync(emails[Ashby], Password),
            await factory.SignInAsync(emails[Brook], Password),
            await factory.SignInAsync(emails[Carrow], Password),
            await factory.SignInAsync(emails["observer"], Password),
            _weighting);

        var f = scenario.Facilitator;
        object plan = ScenarioPlan.Plan(reference, _weighting, _twoStage);
        if (_round is { } round && plan is Dictionary<string, object?> members)
        {
            members["reviews"] = new { reviewersPerApplication = round.K, maxLoad = round.MaxLoad, assigned = new { } };
            members["funding"] = new { budget = round.Budget, rule = "stop-at-first-unaffordable", currency = "EUR" };
        }

        await ApiAssert.OkAsync(await f.PutJsonAsync(scenario.Url("/plan"), new
        {
            plan,
            settings = new { minRationaleLength = _minRationale, pricesVisibleToAssessors = _pricesVisible, requiredApprovals = 1 },
            version = await scenario.VersionAsync(),
        }));
        await ApiAssert.OkAsync(await f.PutJsonAsync(scenario.Url("/panel"), new
        {
            seats = new object[]
            {
                new { email = emails[Ashby], role = "assessor", assessorCode = Ashby },
                new { email = emails[Brook], role = "assessor", assessorCode = Brook, criteria = new[] { ScenarioPlan.Quality, ScenarioPlan.Staffing } },
                new { email = emails[Carrow], role = "priceEvaluator", assessorCode = Carrow },
                new { email = emails["observer"], role = "observer" },
            },
            version = await scenario.VersionAsync(),
        }));
        await ApiAssert.OkAsync(await f.PutJsonAsync(scenario.Url("/bids"), new
        {
            bids = ScenarioPlan.Bidders.Select((b, i) => new { code = b.Code, name = b.Name, requested = _round is null ? (double?)null : 40_000 - (10_000 * i) }).ToArray(),
            version = await scenario.VersionAsync(),
        }));

        await scenario.AdvanceToAsync(stage);
        return scenario;
    }
}
