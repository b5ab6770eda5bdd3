namespace Decide.Interchange.Results;

/// <summary>A pairwise judgement out of line with the rest of its matrix.</summary>
/// <param name="Row">Row item id.</param>
/// <param name="Col">Column item id.</param>
/// <param name="Given">The middle value given (row over column).</param>
/// <param name="Consistent">The value that would agree with the other judgements.</param>
public sealed record JudgementEntry(string Row, string Col, double Given, double Consistent);
