using Decide.Web.Components.Shared;
using Decide.Web.Features.Inputs;

namespace Decide.Web.Components.Pages.Inputs;

/// <summary>The outcome of saving weight judgements: the judgements with fresh feedback, what is stored now (someone else saved first), or a refusal.</summary>
public sealed record WeightsSaveResult(WeightsView? Saved, WeightsView? Current, ProblemText? Problem)
{
    public static WeightsSaveResult Ok(WeightsView saved) => new(saved, null, null);

    public static WeightsSaveResult Stale(WeightsView current) => new(null, current, null);

    public static WeightsSaveResult Refused(ProblemText problem) => new(null, null, problem);
}
