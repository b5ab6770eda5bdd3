using Decide.Web.Features.Moderation;

namespace Decide.Web.Components.Pages.Panel;

/// <summary>
/// Which cells of the moderation board to show, and in what order: flagged cells first (the widest spread first),
/// then the rest as they came (bid and criterion order).
/// </summary>
/// <param name="FlaggedOnly">Only cells whose spread is above the tolerance.</param>
/// <param name="Criterion">Only this criterion's cells; null for every criterion.</param>
/// <param name="Alternative">Only this bid's cells; null for every bid.</param>
public sealed record ModerationFilter(bool FlaggedOnly = false, string? Criterion = null, string? Alternative = null)
{
    /// <summary>The cells to show, flagged first.</summary>
    public IReadOnlyList<ModerationCell> Apply(IEnumerable<ModerationCell> cells) =>
        cells.Select((cell, position) => (cell, position))
            .Where(x => (!FlaggedOnly || x.cell.Flagged)
                        && (Criterion is null || x.cell.Criterion == Criterion)
                        && (Alternative is null || x.cell.Alternative == Alternative))
            .OrderByDescending(x => x.cell.Flagged)
            .ThenByDescending(x => x.cell.Flagged ? x.cell.Spread : 0)
            .ThenBy(x => x.position)
            .Select(x => x.cell)
            .ToArray();

    /// <summary>True when any filter narrows the list.</summary>
    public bool Narrows => FlaggedOnly || Criterion is not null || Alternative is not null;
}
