namespace Decide.Reports.Content;

/// <summary>One cell the panel moderated. The original individual terms stay in the record beside the agreed one.</summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Criterion">Criterion id.</param>
/// <param name="OriginalTerms">Each assessor's original term ("ravelle: G"), as recorded before moderation.</param>
/// <param name="ModeratedTerm">The agreed term.</param>
/// <param name="Reason">The minute of the discussion.</param>
/// <param name="By">Who recorded the moderation (or who agreed).</param>
/// <param name="At">When; null if not recorded.</param>
public sealed record ModerationOnRecord(
    string Alternative, string Criterion, IReadOnlyList<string> OriginalTerms, string ModeratedTerm, string Reason, string By, DateTimeOffset? At);
