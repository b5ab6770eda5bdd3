using Decide.Web.Features.Inputs;

namespace Decide.Web.Components.Pages.Inputs;

/// <summary>A cell that stops the sheet from being submitted, and why.</summary>
public sealed record SheetIssue(string Alternative, string Criterion, string BidderName, string CriterionName, string Reason)
{
    /// <summary>Every required cell on a rateable bid that is not done as stored, or not saved, in sheet order.</summary>
    public static IReadOnlyList<SheetIssue> Find(RatingSheetView sheet, IEnumerable<CellDraft> drafts)
    {
        var byKey = drafts.ToDictionary(d => (d.Alternative, d.Criterion));
        var issues = new List<SheetIssue>();
        foreach (var b in sheet.Bidders.Where(b => !b.Recused && b.FailedGates.Count == 0))
        {
            foreach (var c in sheet.Criteria)
            {
                if (!byKey.TryGetValue((b.Code, c.Id), out var d) || !d.Required)
                {
                    continue;
                }

                var reason = d.State is CellState.Error or CellState.Stale ? $"not saved: {d.Message}"
                    : d.Done && !d.Changed ? null
                    : d.Term is null && d.Declined is null ? "not rated yet"
                    : d.Declined is not null ? "give the reason for declining"
                    : !d.RationaleLongEnough ? $"the rationale is shorter than {d.Minimum} characters"
                    : "not saved yet";
                if (reason is not null)
                {
                    issues.Add(new SheetIssue(b.Code, c.Id, b.Name, c.Name, reason));
                }
            }
        }

        return issues;
    }
}
