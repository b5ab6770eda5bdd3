namespace Decide.Data.Entities;

/// <summary>Where an evaluation is in its life. Stages only go forward; what each allows is in <see cref="StageRules"/>.</summary>
public enum EvaluationStage
{
    /// <summary>The facilitator prepares the plan; weight judgements are collected.</summary>
    Setup,

    /// <summary>Criteria, scales, weights and method are frozen; bids are registered.</summary>
    PlanLocked,

    /// <summary>Assessors rate independently.</summary>
    Scoring,

    /// <summary>The panel compares and moderates; results are reviewed.</summary>
    Moderation,

    /// <summary>Approved and read-only forever.</summary>
    SignedOff,

    /// <summary>Replaced by a newer revision; kept read-only for the record.</summary>
    Superseded,
}

/// <summary>A person's role in one evaluation.</summary>
public enum PanelRole
{
    /// <summary>Sets up, runs and moderates; never scores.</summary>
    Facilitator,

    /// <summary>Gives weight judgements and rates the criteria assigned to them.</summary>
    Assessor,

    /// <summary>Enters and sees numeric (price) criteria.</summary>
    PriceEvaluator,

    /// <summary>Reads everything, changes nothing (probity observer, auditor).</summary>
    Observer,

    /// <summary>Signs off the evaluation.</summary>
    Approver,
}
