namespace Decide.Reports.Verification;

/// <summary>Every check made on a signed record, in the order they were made.</summary>
public sealed record VerificationReport(IReadOnlyList<VerificationCheck> Checks)
{
    /// <summary>True when there is at least one check and every check passed.</summary>
    public bool AllPassed => Checks.Count > 0 && Checks.All(c => c.Passed);

    /// <summary>The checks that failed.</summary>
    public IReadOnlyList<VerificationCheck> Failed => Checks.Where(c => !c.Passed).ToArray();
}
