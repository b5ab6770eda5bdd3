using System.Globalization;
using Decide.Core.Model;
using Decide.Core.Rounds;
using Decide.Reports.Layout;

namespace Decide.Reports;

internal sealed partial class RecordWriter
{
    /// <summary>
    /// A round: who read what (frozen when scoring opened), the ranking with its bands and the funding line, the
    /// funding decisions a check could change and what leaving each reviewer out does.
    /// </summary>
    private void Round(RoundReport round)
    {
        if (Evaluation.Reviews is { } design)
        {
            _flow.Heading("Who read what");
            _flow.Paragraph($"Each application was read by at least {design.ReviewersPerApplication} {(design.ReviewersPerApplication == 1 ? "reviewer" : "reviewers")}, nobody was given more than {design.MaxLoad}, and the assignment was frozen when scoring opened. A reviewer rated only the applications listed for them; no rating was expected, declined or made up for the others, and a cell's panel value is the aggregate of the reviewers who rated it.");
            var parts = DesignConnectivity.Parts(Evaluation.Alternatives.Select(a => a.Id).ToArray(), design.Assigned).Count;
            _flow.Paragraph(parts == 1
                ? "Every application is linked to every other through reviewers who read both, so scores can be compared across the round."
                : $"The applications fall into {parts} groups that share no reviewer.");
            _flow.Table(
                [new("Reviewer", 2.6), new("Reads", 0.9, CellAlign.Right), new("Applications", 9)],
                Evaluation.Assessors.Select(a => (IReadOnlyList<string>)
                [
                    _names.Assessor(a.Id),
                    design.ApplicationsOf(a.Id).Count.ToString(CultureInfo.InvariantCulture),
                    string.Join(", ", design.ApplicationsOf(a.Id).Select(_names.Alternative)),
                ]));
        }

        _flow.Heading(round.Funding is null ? "Bands" : "Bands and the funding line");
        if (round.Funding is { } funding)
        {
            var unit = funding.Plan.Currency is { } c ? $" {c}" : "";
            _flow.Paragraph($"Budget {RecordText.Measured(funding.Plan.Budget)}{unit}, {RoundText.FundingRule(funding.Plan.Rule)}: {funding.Funded.Count()} funded for {RecordText.Measured(funding.Spent)}{unit}.");
            if (funding.TiedAcrossTheLine.Count > 0)
            {
                _flow.Caution("The funding line falls inside a tie", [$"{string.Join(", ", funding.TiedAcrossTheLine.Select(_names.Alternative))} have the same score; the panel decides between them and records why."]);
            }
        }

        if (round.Bands.Count > 0)
        {
            _flow.Paragraph("A band groups applications that the uncertainty of the panel's ratings and weights cannot put in order: their 95% ranges of places in the rank acceptability draws overlap the first of the band's. The order between bands holds in those draws; inside a band it is the panel's best estimate.", _style.Cell, _style.MutedBrush);
        }

        _flow.Table(
            [new("Place", 0.9, CellAlign.Right), new("Application", 5), new("Band", 0.9, CellAlign.Right), new("Likely places", 1.6), new("Requested", 1.7, CellAlign.Right), new("Funded", 2)],
            round.Rows().Select(row => (IReadOnlyList<string>)
            [
                row.Place.ToString(CultureInfo.InvariantCulture),
                _names.Alternative(row.Alternative),
                row.Band?.ToString(CultureInfo.InvariantCulture) ?? "–",
                row.Interval is { } interval ? RoundText.Places(interval) : "–",
                row.Funding is { } d ? RecordText.Measured(d.Requested) : "–",
                row.Funding is { } e ? RoundText.Decision(e) : "–",
            ]));

        if (round.Flips.Count > 0)
        {
            _flow.Paragraph("Funding decisions a robustness check could change:", _style.BodyBold, after: 2, keepWith: 40);
            _flow.Bullets(round.Flips.Select(f => $"{_names.Alternative(f.Alternative)} is {(f.FundedNow ? "funded" : "not funded")}, but {string.Join("; and ", f.Because)}.").ToArray());
        }

        var moves = round.Reviewers.Where(r => r.LargestMove is not null && r.From != r.To).ToArray();
        if (moves.Length > 0)
        {
            _flow.Paragraph("Without one reviewer (the analysis re-run without their ratings, the others keeping their applications):", _style.BodyBold, after: 2, keepWith: 40);
            _flow.Bullets(moves.Select(m => $"Without {_names.Assessor(m.Assessor)} (who rated {m.Read}), {_names.Alternative(m.LargestMove!)} would move from place {m.From} to {m.To}.").ToArray());
        }
    }
}
