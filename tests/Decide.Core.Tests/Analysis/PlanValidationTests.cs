using Decide.Core.Analysis;
using Decide.Core.Model;

namespace Decide.Core.Tests.Analysis;

public sealed class PlanValidationTests
{
    private static Evaluation Plan(params Criterion[] criteria) => new()
    {
        Title = "plan only",
        Criteria = criteria,
        Alternatives = [],
        Assessors = [],
    };

    [Fact]
    public void A_plan_without_panel_bids_or_inputs_is_valid_on_its_own()
    {
        var plan = Plan(new Criterion("Q", "Quality"), new Criterion("P", "Price", CriterionKind.Numeric, Direction.Cost));
        Assert.Empty(EvaluationValidator.ValidatePlan(plan));
        Assert.NotEmpty(EvaluationValidator.Validate(plan)); // the full check still wants bids and a panel
    }

    [Fact]
    public void Plan_problems_are_still_reported_by_place()
    {
        var plan = Plan(new Criterion("Q", "Quality"), new Criterion("Q", "Again"), new Criterion("R", "Risk", Group: "nowhere"));
        var errors = EvaluationValidator.ValidatePlan(plan);
        Assert.Contains(errors, e => e.Path == "$.criteria[1].id" && e.Reason.Contains("used twice", StringComparison.Ordinal));
        Assert.Contains(errors, e => e.Path == "$.criteria[2].group" && e.Reason.Contains("unknown group", StringComparison.Ordinal));
        Assert.DoesNotContain(errors, e => e.Path.StartsWith("$.alternatives", StringComparison.Ordinal) || e.Path.StartsWith("$.importance", StringComparison.Ordinal));
    }
}
