namespace Decide.Load;

/// <summary>What one load run does.</summary>
/// <param name="BaseUrl">The running service, e.g. http://127.0.0.1:5080.</param>
/// <param name="AdminEmail">An administrator account that may create accounts and import evaluations.</param>
/// <param name="AdminPassword">Its password (from an environment variable, never the command line).</param>
/// <param name="Assessors">Simulated assessors, all rating at once.</param>
/// <param name="Rounds">How many times each assessor rates every cell of the sheet (later rounds revise earlier ratings).</param>
/// <param name="ReadEvery">Each assessor reads the sheet back after this many saves.</param>
/// <param name="ThinkMilliseconds">Mean pause between one assessor's requests (uniform jitter of ±50%); 0 for a stress run.</param>
/// <param name="RampMilliseconds">The assessors arrive (sign in) spread evenly over this time, as a panel does.</param>
/// <param name="Seed">Seeds every pause and term choice, so a run can be repeated.</param>
public sealed record LoadOptions(
    Uri BaseUrl, string AdminEmail, string AdminPassword, int Assessors, int Rounds, int ReadEvery, int ThinkMilliseconds, int RampMilliseconds, int Seed);
