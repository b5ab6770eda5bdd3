using Decide.Interchange;
using Decide.Reports.Methodology;

namespace Decide.Recordkeeping;

/// <summary>The methodology of an evaluation file's plan, for the tender pack and for the record's fingerprint check.</summary>
public static class MethodologyInputs
{
    /// <summary>What the methodology is made from: the file's plan (bids, panel and inputs play no part) and its words for people.</summary>
    public static MethodologyInput From(EvaluationFile file)
    {
        ArgumentNullException.ThrowIfNull(file);
        return new MethodologyInput(file.PlanOnly().Evaluation, file.Metadata.Reference, file.Metadata.Organisation,
            file.Metadata.CriterionDescriptions ?? new Dictionary<string, string>());
    }
}
