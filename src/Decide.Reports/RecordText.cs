using System.Globalization;
using Decide.Core.Fuzzy;
using Decide.Core.Model;

namespace Decide.Reports;

/// <summary>
/// How the record writes numbers and names. Public so that a verifier can rebuild the printed figures from a
/// re-analysis with exactly the same formatting.
/// </summary>
public static class RecordText
{
    /// <summary>Decimals printed for closeness coefficients and distances.</summary>
    public const int ClosenessDecimals = 4;

    /// <summary>The wording on the cover and the sign-off page about what the ranking is and is not.</summary>
    public static IReadOnlyList<string> Cautions { get; } =
    [
        "The ranking supports, and does not replace, the panel's documented judgement and the approver's decision.",
        "Follow the procurement law that applies to this award and your organisation's own rules; where they differ from anything in this record, they prevail.",
        "Sensitivity results are diagnostic: they must not be used to change weights or criteria after bids have been opened.",
    ];

    /// <summary>A closeness coefficient or distance as printed (4 decimals).</summary>
    public static string Closeness(double value) => value.ToString("F" + ClosenessDecimals, CultureInfo.InvariantCulture);

    /// <summary>A number with <paramref name="decimals"/> decimals, invariant culture.</summary>
    public static string Number(double value, int decimals) => value.ToString("F" + decimals, CultureInfo.InvariantCulture);

    /// <summary>A share as a percentage with one decimal ("23.4%").</summary>
    public static string Percent(double share) => (share * 100).ToString("F1", CultureInfo.InvariantCulture) + "%";

    /// <summary>A TFN as (l, m, u) with <paramref name="decimals"/> decimals.</summary>
    public static string Tfn(Tfn value, int decimals = 3) =>
        value.IsCrisp ? Number(value.Middle, decimals) : $"({Number(value.Lower, decimals)}, {Number(value.Middle, decimals)}, {Number(value.Upper, decimals)})";

    /// <summary>A measured value with thousands separators and up to two decimals ("1,842,000").</summary>
    public static string Measured(double value) => value.ToString("#,##0.##", CultureInfo.InvariantCulture);

    /// <summary>A date and time in UTC ("2026-03-24 14:05 UTC").</summary>
    public static string When(DateTimeOffset at) => at.UtcDateTime.ToString("yyyy-MM-dd HH:mm 'UTC'", CultureInfo.InvariantCulture);

    /// <summary>A date ("2026-03-24").</summary>
    public static string Day(DateTimeOffset at) => at.UtcDateTime.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);

    /// <summary>
    /// The cells of each ranking row exactly as the record prints them: rank, alternative name, closeness, d⁺, d⁻.
    /// </summary>
    public static IReadOnlyList<IReadOnlyList<string>> RankingRows(Evaluation evaluation, Decide.Core.Analysis.AnalysisResult analysis)
    {
        ArgumentNullException.ThrowIfNull(evaluation);
        ArgumentNullException.ThrowIfNull(analysis);
        var names = new RecordNames(evaluation);
        return analysis.Ranking.Select(r => (IReadOnlyList<string>)
        [
            r.Rank.ToString(CultureInfo.InvariantCulture),
            names.Alternative(r.Alternative),
            Closeness(r.Closeness),
            Closeness(r.DPlus),
            Closeness(r.DMinus),
        ]).ToArray();
    }
}
