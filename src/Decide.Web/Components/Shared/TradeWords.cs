using Decide.Data.Entities;
using MudBlazor;

namespace Decide.Web.Components.Shared;

/// <summary>The plain words screens use for stages and roles, and the colour of each stage.</summary>
public static class TradeWords
{
    /// <summary>The stages an evaluation normally passes through, in order.</summary>
    public static IReadOnlyList<EvaluationStage> Path { get; } =
        [EvaluationStage.Setup, EvaluationStage.PlanLocked, EvaluationStage.Scoring, EvaluationStage.Moderation, EvaluationStage.SignedOff];

    public static string Stage(EvaluationStage stage) => stage switch
    {
        EvaluationStage.Setup => "Setup",
        EvaluationStage.PlanLocked => "Plan locked",
        EvaluationStage.Scoring => "Scoring",
        EvaluationStage.Moderation => "Moderation",
        EvaluationStage.SignedOff => "Signed off",
        EvaluationStage.Superseded => "Superseded",
        _ => stage.ToString(),
    };

    public static Color StageColour(EvaluationStage stage) => stage switch
    {
        EvaluationStage.PlanLocked => Color.Info,
        EvaluationStage.Scoring => Color.Tertiary,
        EvaluationStage.Moderation => Color.Primary,
        EvaluationStage.SignedOff => Color.Success,
        _ => Color.Dark,
    };

    public static string Role(PanelRole role) => role switch
    {
        PanelRole.Facilitator => "Facilitator",
        PanelRole.Assessor => "Assessor",
        PanelRole.PriceEvaluator => "Price evaluator",
        PanelRole.Observer => "Observer",
        PanelRole.Approver => "Approver",
        _ => role.ToString(),
    };

    public static string Roles(IEnumerable<PanelRole> roles) => string.Join(", ", roles.Select(Role)) is { Length: > 0 } text ? text : "—";

    public static string Kind(Decide.Core.Model.CriterionKind kind) => kind switch
    {
        Decide.Core.Model.CriterionKind.Linguistic => "Rated in words",
        Decide.Core.Model.CriterionKind.Numeric => "Measured value",
        Decide.Core.Model.CriterionKind.Gate => "Pass/fail gate",
        _ => kind.ToString(),
    };

    public static string Direction(Decide.Core.Model.Direction direction) =>
        direction == Decide.Core.Model.Direction.Cost ? "Lower is better" : "Higher is better";

    public static string Date(DateTimeOffset? at) =>
        at is { } value ? value.UtcDateTime.ToString("d MMM yyyy", System.Globalization.CultureInfo.InvariantCulture) : "—";

    public static string DateTime(DateTimeOffset at) =>
        at.UtcDateTime.ToString("d MMM yyyy HH:mm:ss 'UTC'", System.Globalization.CultureInfo.InvariantCulture);

    /// <summary>A share as a percentage ("22.6 %").</summary>
    public static string Percent(double share, int decimals = 1) =>
        (share * 100).ToString("F" + decimals, System.Globalization.CultureInfo.InvariantCulture) + " %";

    /// <summary>An amount of money, grouped in thousands ("60,000", "4,500.50"), the same on every machine.</summary>
    public static string Money(double value) =>
        value.ToString("#,0.##", System.Globalization.CultureInfo.InvariantCulture);

    /// <summary>A number with a fixed number of decimals, the same on every machine.</summary>
    public static string Number(double value, int decimals = 3) =>
        value.ToString("F" + decimals, System.Globalization.CultureInfo.InvariantCulture);
}
