namespace Decide.Core.Award;

/// <summary>How price enters the award, chosen in the plan and published with the tender (PRACTICE §4).</summary>
public enum PriceFormula
{
    /// <summary>S = Smax × Pmin ÷ P. Relative: the lowest admissible price sets the scale.</summary>
    LowestPriceRatio,

    /// <summary>S = Smax × max(0, 1 − (P − Pmin) ÷ Pmin). Relative: each 1 % above the lowest costs 1 % of the points.</summary>
    LinearFromLowest,

    /// <summary>S = Smax × (Pmax − P) ÷ (Pmax − Pmin). Relative: the dearest bid gets 0 however close it is.</summary>
    LowestHighestInterpolation,

    /// <summary>S = Smax × (B − P) ÷ (B − Pfloor), within [0, Smax]; a bid over the budget B is excluded. Absolute.</summary>
    BudgetBased,

    /// <summary>Price per quality point, P ÷ Q; the lowest wins. Absolute.</summary>
    ValueForMoney,

    /// <summary>Quality-adjusted price, P − v × Q with v the money value of a quality point; the lowest wins. Absolute.</summary>
    QualityAdjustedPrice,

    /// <summary>Lowest price among the bids that pass every threshold; quality gives no points. Absolute.</summary>
    LowestPriceAcceptable,
}

/// <summary>What a price formula is, in the words the methodology, the screens and the record print.</summary>
/// <param name="Name">Its name.</param>
/// <param name="Equation">The equation as printed (Smax the price points, P the bid's price, Pmin/Pmax the lowest/highest admissible price).</param>
/// <param name="Properties">What a bidder should know about it.</param>
/// <param name="Source">Where it is stated.</param>
/// <param name="Relative">True when a bid's price score depends on the other bids' prices.</param>
/// <param name="GivesPoints">True when it gives price points added to the quality points; false when bids are ranked by a figure, lowest first.</param>
public sealed record PriceFormulaInfo(string Name, string Equation, string Properties, string Source, bool Relative, bool GivesPoints);

/// <summary>The description of each price formula.</summary>
public static class PriceFormulas
{
    /// <summary>The description of <paramref name="formula"/>.</summary>
    public static PriceFormulaInfo Describe(PriceFormula formula) => formula switch
    {
        PriceFormula.LowestPriceRatio => new("Lowest-price ratio", "S = Smax × Pmin / P",
            "The lowest admissible price gets all the price points; the others in proportion. Not linear, and it depends on the other bids: removing the lowest bid can reverse the order of two others.",
            "Stilger, Siderius & van Raaij (2017), J. Public Procurement 17(1); Bergman & Lundberg (2013), J. Purchasing & Supply Management 19(2); World Bank QCBS Sf = 100 × Fm / F.",
            Relative: true, GivesPoints: true),
        PriceFormula.LinearFromLowest => new("Linear from the lowest price", "S = Smax × max(0, 1 − (P − Pmin) / Pmin)",
            "Each 1 % above the lowest admissible price costs 1 % of the price points; a bid at twice the lowest or more gets none. Depends on the other bids.",
            "Stilger, Siderius & van Raaij (2017), J. Public Procurement 17(1).", Relative: true, GivesPoints: true),
        PriceFormula.LowestHighestInterpolation => new("Interpolation between the lowest and the highest price", "S = Smax × (Pmax − P) / (Pmax − Pmin)",
            "The lowest admissible price gets all the price points and the highest none, however close the two are; with two bids price is all or nothing. Depends on the other bids.",
            "Stilger, Siderius & van Raaij (2017), J. Public Procurement 17(1) (\"highest bid – lowest bid\").", Relative: true, GivesPoints: true),
        PriceFormula.BudgetBased => new("Budget-based", "S = Smax × (B − P) / (B − Pfloor), between 0 and Smax; bids above B are excluded",
            "A bid's price points depend only on its own price, the budget B and the floor Pfloor stated in the plan; a bid over the budget is excluded with that reason.",
            "Local Government Procurement NSW, \"Methods of evaluating price in tenders\"; PRACTICE §4 (absolute formulas).", Relative: false, GivesPoints: true),
        PriceFormula.ValueForMoney => new("Value for money (price per quality point)", "V = P / Q",
            "Bids are ranked by their price per quality point, lowest first; a bid's figure depends only on its own price and quality.",
            "Local Government Procurement NSW, \"Methods of evaluating price in tenders\".", Relative: false, GivesPoints: false),
        PriceFormula.QualityAdjustedPrice => new("Quality-adjusted price", "A = P − v × Q",
            "Quality is turned into money at the rate v stated in the plan and taken off the price; bids are ranked by the adjusted price, lowest first.",
            "Bergman & Lundberg (2013), J. Purchasing & Supply Management 19(2); NZ Transport Agency, price-quality method.", Relative: false, GivesPoints: false),
        PriceFormula.LowestPriceAcceptable => new("Lowest price technically acceptable", "lowest P among the bids that pass every threshold",
            "Quality is judged only against the thresholds; among the bids that pass, the lowest price wins. No trade-off between price and quality.",
            "US FAR 15.101-2; Directive 2014/24/EU Art 67(2) (lowest price).", Relative: false, GivesPoints: false),
        _ => throw new ArgumentOutOfRangeException(nameof(formula), formula, null),
    };
}
