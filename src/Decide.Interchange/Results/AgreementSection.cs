using System.Text.Json.Serialization;

namespace Decide.Interchange.Results;

/// <summary>
/// How far the panel agrees (the <c>agreement</c> section): information for the moderator; nothing in it changes any
/// assessor's weight or rating. Kendall's W and its test are written as null, not left out, when undefined (fewer
/// than two assessors or alternatives, or every assessor's ratings leave all alternatives tied).
/// </summary>
/// <param name="KendallW">Kendall's coefficient of concordance W (tie-corrected) over the assessors' own rankings.</param>
/// <param name="ChiSquare">χ² = m(n − 1)W.</param>
/// <param name="PValue">P(χ² ≥ the value) for rankings made independently at random; rough with few alternatives.</param>
/// <param name="DegreesOfFreedom">n − 1.</param>
/// <param name="Tolerance">The largest spread of a cell's terms, in scale steps, not listed for discussion.</param>
/// <param name="Cells">The cells for discussion: spread above the tolerance, largest first.</param>
/// <param name="Assessors">Every assessor who rated a linguistic cell, in panel order.</param>
/// <param name="Alpha">Krippendorff's alpha (ordinal on the terms' order, interval on their centres), valid with missing cells; empty when no cell has two ratings.</param>
/// <param name="OutsideConcordance">Assessors left out of Kendall's W because they did not rate every alternative in the running.</param>
public sealed record AgreementSection(
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? KendallW,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? ChiSquare,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? PValue,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] int? DegreesOfFreedom,
    int Tolerance,
    IReadOnlyList<CellSpreadEntry> Cells,
    IReadOnlyList<AssessorAgreementEntry> Assessors,
    IReadOnlyList<AlphaEntry>? Alpha = null,
    IReadOnlyList<string>? OutsideConcordance = null);
