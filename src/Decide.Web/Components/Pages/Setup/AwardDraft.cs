using Decide.Core.Award;

namespace Decide.Web.Components.Pages.Setup;

/// <summary>
/// The published award method as edited on the setup screen: the price rule, how the panel's terms become
/// scores, the thresholds (the per-criterion minimums live on each <see cref="CriterionDraft"/>), the tie-breaks,
/// the abnormally low rule, the stages and which result binds.
/// </summary>
public sealed class AwardDraft
{
    /// <summary>True when the plan publishes an award method.</summary>
    public bool Enabled { get; set; }

    /// <summary>The id of the measured cost criterion that holds the price.</summary>
    public string PriceCriterion { get; set; } = "";

    public PriceFormula Formula { get; set; } = PriceFormula.LowestPriceRatio;

    public BindingResult Binding { get; set; } = BindingResult.Points;

    public PanelScoreRule PanelScore { get; set; } = PanelScoreRule.Moderated;

    public double? Budget { get; set; }

    public double? Floor { get; set; }

    public double? ValuePerQualityPoint { get; set; }

    /// <summary>The least share of all quality points, in per cent (60 for 60 %), or null for none.</summary>
    public double? MinimumQualityPercent { get; set; }

    /// <summary>The tie-break rules in the order they apply.</summary>
    public List<TieBreak> TieBreaks { get; } = [.. AwardMethod.DefaultTieBreaks];

    /// <summary>Flag a price more than this many per cent below the mean of the other admissible prices, or null.</summary>
    public double? BelowMeanOfOthersPercent { get; set; }

    /// <summary>The buyer's estimate, for the test against the estimate.</summary>
    public double? Estimate { get; set; }

    /// <summary>Flag a price more than this many per cent below the estimate, or null.</summary>
    public double? BelowEstimatePercent { get; set; }

    public bool TwoStage { get; set; }

    /// <summary>The draft of a stored award method (or a blank, disabled one).</summary>
    public static AwardDraft From(AwardMethod? award)
    {
        if (award is null)
        {
            return new AwardDraft();
        }

        var d = new AwardDraft
        {
            Enabled = true,
            PriceCriterion = award.PriceCriterion,
            Formula = award.Formula,
            Binding = award.Binding,
            PanelScore = award.PanelScore,
            Budget = award.Budget,
            Floor = award.Floor,
            ValuePerQualityPoint = award.ValuePerQualityPoint,
            MinimumQualityPercent = award.MinimumQualityShare * 100,
            BelowMeanOfOthersPercent = award.AbnormallyLow?.BelowMeanOfOthersPercent,
            Estimate = award.AbnormallyLow?.Estimate,
            BelowEstimatePercent = award.AbnormallyLow?.BelowEstimatePercent,
            TwoStage = award.TwoStage,
        };
        d.TieBreaks.Clear();
        d.TieBreaks.AddRange(award.AppliedTieBreaks);
        return d;
    }

    /// <summary>The award method this draft states, with the per-criterion minimums given; null when not enabled.</summary>
    public AwardMethod? ToMethod(IReadOnlyDictionary<string, string> minimumTerms)
    {
        if (!Enabled)
        {
            return null;
        }

        var budgetRule = Formula == PriceFormula.BudgetBased;
        var low = BelowMeanOfOthersPercent is null && BelowEstimatePercent is null
            ? null
            : new AbnormallyLowRule(BelowMeanOfOthersPercent, BelowEstimatePercent is null ? null : Estimate, BelowEstimatePercent);
        return new AwardMethod(
            PriceCriterion,
            Formula,
            Binding,
            PanelScore,
            budgetRule ? Budget : null,
            budgetRule ? Floor : null,
            Formula == PriceFormula.QualityAdjustedPrice ? ValuePerQualityPoint : null,
            MinimumQualityPercent / 100,
            minimumTerms.Count == 0 ? null : minimumTerms,
            [.. TieBreaks],
            low,
            TwoStage);
    }
}
