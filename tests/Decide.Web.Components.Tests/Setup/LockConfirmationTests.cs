using System.Text.Json;
using Decide.Data.Entities;
using Decide.Web.Components.Pages.Setup;
using Decide.Web.Components.Tests.Support;
using Decide.Web.Features.Evaluations;

namespace Decide.Web.Components.Tests.Setup;

public sealed class LockConfirmationTests : MudComponentTest
{
    private static readonly SeatDraft[] Seats =
    [
        new() { Email = "ravelle@kv.example", Role = PanelRole.Assessor, AssessorCode = "ravelle", Weight = 2 },
        new() { Email = "probity@kv.example", Role = PanelRole.Observer },
    ];

    [Fact]
    public void It_lists_every_part_that_becomes_unchangeable_with_what_the_plan_holds()
    {
        var draft = Draft();

        var cut = Render<LockConfirmation>(p => p.Add(x => x.Draft, draft).Add(x => x.Seats, Seats).Add(x => x.Readiness, new LockReadiness([], [])));

        var parts = cut.FindAll("[data-lock]").ToDictionary(li => li.GetAttribute("data-lock")!, li => li.TextContent);
        Assert.Equal(["criteria", "descriptors", "scales", "weights", "tolerance", "panel"], parts.Keys);
        Assert.Contains("Display legibility", parts["criteria"], StringComparison.Ordinal);
        Assert.Contains("Price", parts["criteria"], StringComparison.Ordinal);
        Assert.Contains($"{draft.DivergenceTolerance} scale steps", parts["tolerance"], StringComparison.Ordinal);
        Assert.Contains(draft.RatingScale.Name, parts["scales"], StringComparison.Ordinal);
        Assert.Contains("ravelle@kv.example", parts["panel"], StringComparison.Ordinal);
        Assert.Contains("probity@kv.example", parts["panel"], StringComparison.Ordinal);
        Assert.False(cut.FindAll("button").Single(b => b.TextContent.Contains("Lock the plan", StringComparison.Ordinal)).HasAttribute("disabled"));
    }

    [Fact]
    public void What_stops_the_lock_is_listed_and_the_lock_button_cannot_be_pressed()
    {
        var readiness = new LockReadiness(["Assessor ravelle has weight judgements that are not submitted yet."], ["Assessor fenwright has given no weights."]);

        var cut = Render<LockConfirmation>(p => p.Add(x => x.Draft, Draft()).Add(x => x.Seats, Seats).Add(x => x.Readiness, readiness));

        Assert.Contains(readiness.Blocking[0], cut.Find("[data-testid=lock-blocking]").TextContent, StringComparison.Ordinal);
        Assert.Contains(readiness.Warnings[0], cut.Find("[data-testid=lock-warnings]").TextContent, StringComparison.Ordinal);
        Assert.True(cut.FindAll("button").Single(b => b.TextContent.Contains("Lock the plan", StringComparison.Ordinal)).HasAttribute("disabled"));
    }

    [Fact]
    public void Confirming_and_cancelling_reach_the_page()
    {
        var (confirmed, cancelled) = (0, 0);
        var cut = Render<LockConfirmation>(p => p.Add(x => x.Draft, Draft()).Add(x => x.Seats, Seats)
            .Add(x => x.OnConfirm, () => confirmed++).Add(x => x.OnCancel, () => cancelled++));

        cut.FindAll("button").Single(b => b.TextContent.Contains("Lock the plan", StringComparison.Ordinal)).Click();
        cut.FindAll("button").Single(b => b.TextContent.Contains("Not yet", StringComparison.Ordinal)).Click();

        Assert.Equal((1, 1), (confirmed, cancelled));
    }

    private static PlanDraft Draft()
    {
        var draft = PlanDraft.From(JsonDocument.Parse("""
            {"format":"decide-evaluation/1","title":"T","criteria":[
              {"id":"display","name":"Display legibility"},
              {"id":"price","name":"Price","kind":"numeric","direction":"cost"}],
             "options":{"divergenceTolerance":3}}
            """).RootElement, new EvaluationSettings(20, false, 1));
        return draft;
    }
}
