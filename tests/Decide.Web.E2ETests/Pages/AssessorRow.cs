namespace Decide.Web.E2ETests.Pages;

/// <summary>One assessor's line of the scoring board as the screen shows it.</summary>
/// <param name="Code">Assessor code.</param>
/// <param name="Declaration">The declaration column ("signed 13 Nov 2026; …" or "not signed").</param>
/// <param name="Weights">"submitted" or "not submitted".</param>
/// <param name="Consistency">The consistency column, without the flag ("—" for importance weighting).</param>
/// <param name="ConsistencyFlagged">The consistency ratio is above the limit.</param>
/// <param name="Ratings">"done of total", as shown.</param>
/// <param name="Sheet">"submitted …" or "open".</param>
/// <param name="CanReopen">A "Reopen sheet" button is offered.</param>
public sealed record AssessorRow(
    string Code, string Declaration, string Weights, string Consistency, bool ConsistencyFlagged, string Ratings, string Sheet, bool CanReopen);
