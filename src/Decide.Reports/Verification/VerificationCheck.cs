namespace Decide.Reports.Verification;

/// <summary>The outcome of one check of a signed record.</summary>
/// <param name="Name">What was checked ("signature valid").</param>
/// <param name="Passed">Whether it passed.</param>
/// <param name="Detail">One sentence saying what was found.</param>
public sealed record VerificationCheck(string Name, bool Passed, string Detail);
