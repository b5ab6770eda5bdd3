using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using Decide.Web.Tests.Support;

namespace Decide.Web.Tests;

public sealed class LifecycleSmokeTests(DecideWebFactory factory) : IClassFixture<DecideWebFactory>
{
    [Fact]
    public async Task The_seeded_demo_is_visible_to_its_facilitator_and_its_audit_chain_verifies()
    {
        var id = await factory.DemoEvaluationAsync();
        using var client = await factory.SignInAsync(DecideWebFactory.Facilitator);
        var detail = await client.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}");
        Assert.Equal("moderation", detail.GetProperty("summary").GetProperty("stage").GetString());
        var verification = await client.GetFromJsonAsync<JsonElement>($"/api/evaluations/{id}/audit/verification");
        Assert.True(verification.GetProperty("valid").GetBoolean());
    }

    [Fact]
    public async Task A_locked_plan_refuses_changes_with_a_clear_problem()
    {
        var id = await factory.DemoEvaluationAsync();
        using var client = await factory.SignInAsync(DecideWebFactory.Facilitator);
        var response = await client.PutAsJsonAsync($"/api/evaluations/{id}/plan", new { plan = new { }, version = 0 });
        Assert.Equal(HttpStatusCode.Conflict, response.StatusCode);
        var problem = await response.Content.ReadFromJsonAsync<JsonElement>();
        Assert.Contains("Setup", problem.GetProperty("detail").GetString());
    }

    [Fact]
    public async Task Malformed_json_is_a_400_problem_that_says_why()
    {
        var id = await factory.DemoEvaluationAsync();
        using var client = await factory.SignInAsync(DecideWebFactory.Facilitator);
        using var content = new StringContent("{\"plan\":", System.Text.Encoding.UTF8, "application/json");
        var response = await client.PutAsync($"/api/evaluations/{id}/plan", content);
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        var problem = await response.Content.ReadFromJsonAsync<JsonElement>();
        Assert.Contains("not valid JSON", problem.GetProperty("detail").GetString());
    }

    [Fact]
    public async Task Anonymous_callers_get_401_and_strangers_do_not_see_the_evaluation()
    {
        var id = await factory.DemoEvaluationAsync();
        using var anonymous = factory.CreateClient();
        Assert.Equal(HttpStatusCode.Unauthorized, (await anonymous.GetAsync($"/api/evaluations/{id}")).StatusCode);
    }
}
