namespace Decide.Core.Award;

/// <summary>The plan's price rule.</summary>
/// <param name="Formula">The formula.</param>
/// <param name="MaxPoints">Smax: the price points (for the formulas that give points).</param>
/// <param name="Budget">B: the budget (budget-based formula); a bid above it is excluded.</param>
/// <param name="Floor">Pfloor: the price at or below which a bid gets all the price points (budget-based formula).</param>
/// <param name="ValuePerQualityPoint">v: the money one quality point is worth (quality-adjusted price).</param>
public sealed record PriceRule(
    PriceFormula Formula, double MaxPoints, double? Budget = null, double? Floor = null, double? ValuePerQualityPoint = null);

/// <summary>How a price rule scores one bid.</summary>
/// <param name="Points">Price points, for a formula that gives points; otherwise null.</param>
/// <param name="Figure">The figure ranked lowest first (value for money, adjusted price, price), for a formula that gives none; otherwise null.</param>
/// <param name="OverBudget">True when a budget-based rule excludes the bid for being above the budget.</param>
public readonly record struct PriceScore(double? Points, double? Figure, bool OverBudget);

/// <summary>Scores prices by the plan's formula (<see cref="PriceFormulas"/> describes each).</summary>
public static class PriceScoring
{
    /// <summary>
    /// Scores each of <paramref name="prices"/> (the admissible bids' prices, all positive) with its bid's quality
    /// points <paramref name="quality"/>. Relative formulas take Pmin and Pmax over <paramref name="prices"/>, so
    /// pass only the bids still in the running; a budget-based rule marks a bid above the budget and leaves it out
    /// of nothing else (it takes no part in any base).
    /// </summary>
    public static PriceScore[] Score(PriceRule rule, IReadOnlyList<double> prices, IReadOnlyList<double> quality)
    {
        ArgumentNullException.ThrowIfNull(rule);
        if (prices.Count != quality.Count)
        {
            throw new ArgumentException("One quality total per price is needed.", nameof(quality));
        }

        var result = new PriceScore[prices.Count];
        if (prices.Count == 0)
        {
            return result;
        }

        double lowest = double.PositiveInfinity, highest = double.NegativeInfinity;
        foreach (var p in prices)
        {
            lowest = Math.Min(lowest, p);
            highest = Math.Max(highest, p);
        }

        var smax = rule.MaxPoints;
        for (var i = 0; i < prices.Count; i++)
        {
            var p = prices[i];
            result[i] = rule.Formula switch
            {
                PriceFormula.LowestPriceRatio => new PriceScore(smax * lowest / p, null, false),
                PriceFormula.LinearFromLowest => new PriceScore(smax * Math.Max(0, 1 - ((p - lowest) / lowest)), null, false),
                PriceFormula.LowestHighestInterpolation => new PriceScore(highest == lowest ? smax : smax * (highest - p) / (highest - lowest), null, false),
                PriceFormula.BudgetBased => Budget(rule, p),
                PriceFormula.ValueForMoney => new PriceScore(null, quality[i] > 0 ? p / quality[i] : double.PositiveInfinity, false),
                PriceFormula.QualityAdjustedPrice => new PriceScore(null, p - ((rule.ValuePerQualityPoint ?? 0) * quality[i]), false),
                PriceFormula.LowestPriceAcceptable => new PriceScore(null, p, false),
                _ => throw new ArgumentOutOfRangeException(nameof(rule), rule.Formula, null),
            };
        }

        return result;
    }

    private static PriceScore Budget(PriceRule rule, double price)
    {
        var budget = rule.Budget ?? throw new ArgumentException("A budget-based rule needs its budget.", nameof(rule));
        var floor = rule.Floor ?? 0;
        if (price > budget)
        {
            return new PriceScore(null, null, true);
        }

        var points = price <= floor ? rule.MaxPoints : rule.MaxPoints * (budget - price) / (budget - floor);
        return new PriceScore(Math.Clamp(points, 0, rule.MaxPoints), null, false);
    }
}
