namespace Decide.Core.Model;

/// <summary>How a criterion is judged.</summary>
public enum CriterionKind
{
    /// <summary>Assessors rate each alternative with a term of the rating scale.</summary>
    Linguistic,

    /// <summary>A measured number per alternative (price, delivery days), used as the crisp TFN (x, x, x).</summary>
    Numeric,

    /// <summary>Pass or fail. An alternative that fails any gate is excluded before normalisation.</summary>
    Gate,
}

/// <summary>Whether more is better or worse.</summary>
public enum Direction
{
    /// <summary>More is better (quality, experience).</summary>
    Benefit,

    /// <summary>Less is better (price, delivery time, risk).</summary>
    Cost,
}

/// <summary>Where the criterion weights come from.</summary>
public enum WeightingMethod
{
    /// <summary>Each assessor rates each criterion's importance on the importance scale (Chen 2000).</summary>
    Importance,

    /// <summary>Each assessor compares criteria in pairs; weights by Buckley's geometric mean (1985).</summary>
    Pairwise,

    /// <summary>
    /// Crisp points per group and criterion fixed in the plan and published with the tender; each criterion's weight
    /// is its points ÷ the stated total, as the crisp triangle (s, s, s).
    /// </summary>
    Points,
}

/// <summary>How the panel's individual TFNs become one.</summary>
public enum AggregationRule
{
    /// <summary>Weighted arithmetic mean, component-wise (Chen 2000, eqs. 13–14).</summary>
    Mean,

    /// <summary>
    /// Weighted geometric mean, component-wise. It multiplies the assessors' values, so one value of 0 makes the
    /// panel's value 0 whatever the others said: a veto. The validator therefore refuses it on a scale with a term
    /// whose lower value is 0 (every built-in rating and importance scale has such terms).
    /// </summary>
    Geometric,
}

/// <summary>The reference points distances are measured from in fuzzy TOPSIS.</summary>
public enum IdealPoints
{
    /// <summary>FPIS (1, 1, 1) and FNIS (0, 0, 0) for every criterion, as in Chen (2000).</summary>
    Unit,

    /// <summary>Per criterion, the largest upper value and the smallest lower value of the weighted matrix, as crisp points.</summary>
    Extreme,
}

/// <summary>Where the weights of the Monte Carlo draws come from.</summary>
public enum AcceptabilityWeights
{
    /// <summary>Each criterion's weight drawn from the triangular distribution on its aggregated fuzzy weight.</summary>
    Fuzzy,

    /// <summary>"No weight information": weight vectors uniform on the simplex.</summary>
    Uniform,
}
