using System.Text.RegularExpressions;
using Decide.Core.Analysis;
using Decide.Core.Award;
using Decide.Core.Model;
using Decide.Reports.Content;
using Decide.Reports.Fonts;
using Decide.Reports.Layout;
using PdfSharp.Pdf;

namespace Decide.Reports.Feedback;

/// <summary>
/// A feedback letter for one supplier: its own scores and the winner's per criterion, with the panel's reasons, and
/// nothing about any other supplier. Names of other suppliers inside the written reasons are replaced by "another
/// bidder". Assessors are not named; their reasons are labelled Assessor A, B, ….
/// </summary>
public static class SupplierFeedbackLetter
{
    /// <summary>What replaces another supplier's name in a quoted reason.</summary>
    public const string OtherBidder = "another bidder";

    /// <summary>Renders the letter for <paramref name="alternative"/> (an alternative id) as a PDF.</summary>
    /// <exception cref="ArgumentException">The id is not an alternative of the evaluation.</exception>
    public static byte[] Render(RecordContent content, string alternative)
    {
        ArgumentNullException.ThrowIfNull(content);
        var evaluation = content.Evaluation;
        var supplier = evaluation.Alternatives.FirstOrDefault(a => a.Id == alternative)
            ?? throw new ArgumentException($"'{alternative}' is not an alternative of this evaluation; known: {string.Join(", ", evaluation.Alternatives.Select(a => a.Id))}.", nameof(alternative));
        ReportFonts.EnsureRegistered();
        using var document = new PdfDocument();
        document.Info.Title = $"Feedback: {content.Identity.Title}";
        document.Info.Author = content.Identity.Organisation;
        document.Info.CreationDate = content.GeneratedAt.UtcDateTime;
        var style = new ReportStyle();
        using (var flow = new PageFlow(document, style))
        {
            Write(flow, style, content, supplier);
            flow.FinishPages($"{content.Identity.Organisation} · {content.Identity.Reference} · feedback to {supplier.Name}", "Confidential to the addressee.");
        }

        using var output = new MemoryStream();
        document.Save(output, closeStream: false);
        return output.ToArray();
    }

    private static void Write(PageFlow flow, ReportStyle style, RecordContent content, Alternative supplier)
    {
        var evaluation = content.Evaluation;
        var analysis = content.Analysis;
        var names = new RecordNames(evaluation);
        var award = content.Award is { Method.Binding: BindingResult.Points } binding ? binding : null;
        var winner = award is not null
            ? award.Winner
            : analysis.Ranking.Count > 0 && analysis.Ranking.Count(r => r.Rank == 1) == 1 ? analysis.Ranking[0].Alternative : null;
        var scrub = Scrubber(evaluation, supplier.Id, winner);
        var winnerName = winner is null ? null : names.Alternative(winner);

        flow.Section($"Feedback on your tender: {content.Identity.Title}");
        flow.Facts(
        [
            ("To", supplier.Name),
            ("From", content.Identity.Organisation),
            ("Reference", content.Identity.Reference),
            ("Date", RecordText.Day(content.GeneratedAt)),
        ], labelWidth: 90);

        var excluded = analysis.Excluded.FirstOrDefault(e => e.Alternative == supplier.Id);
        var own = analysis.Ranking.FirstOrDefault(r => r.Alternative == supplier.Id);
        var awardExclusion = award?.Result.Bids.FirstOrDefault(b => b.Id == supplier.Id && b.Excluded is not null && b.Excluded != AwardExclusion.FailedGate);
        if (awardExclusion is not null)
        {
            flow.Paragraph($"Your tender took no part in the award: {AwardText.Exclusion(awardExclusion.Excluded!.Value)} ({scrub(awardExclusion.ExclusionDetail ?? "")}). Below are your quality points on each criterion, with the panel's reasons.");
        }
        else if (excluded is not null)
        {
            var notes = evaluation.Gates.Where(g => g.Alternative == supplier.Id && !g.Passed)
                .Select(g => $"{names.Criterion(g.Criterion)}{(g.Note is null ? "" : ": " + scrub(g.Note))}");
            flow.Paragraph($"Your tender did not meet a pass/fail requirement and was not scored further. {string.Join(" ", notes)}");
        }
        else if (winner == supplier.Id)
        {
            flow.Paragraph("Your tender is the highest-ranked in the panel's evaluation. The award decision is made by the approver and will be notified separately.");
        }
        else if (winnerName is not null)
        {
            flow.Paragraph($"Your tender was not the highest-ranked in the panel's evaluation. The highest-ranked tender was submitted by {winnerName}. Below are your scores and those of the highest-ranked tender on each criterion, with the panel's reasons.");
        }
        else
        {
            flow.Paragraph("The evaluation has not produced a single highest-ranked tender; the panel will decide by the rule in its plan. Below are your scores with the panel's reasons.");
        }

        if (award is not null && (excluded is null || awardExclusion is not null))
        {
            Points(flow, award, supplier.Id, winner == supplier.Id ? null : winner, names);
            Reasons(flow, style, content, supplier.Id, winner == supplier.Id ? null : winner, names, scrub);
        }
        else if (excluded is null)
        {
            Scores(flow, content, supplier.Id, winner == supplier.Id ? null : winner, names);
            flow.Paragraph($"Overall score (closeness coefficient, 0 to 1, higher is better): yours {(own is null ? "—" : RecordText.Closeness(own.Closeness))}"
                + (winner is not null && winner != supplier.Id ? $"; the highest-ranked tender {RecordText.Closeness(analysis.Ranking[0].Closeness)}." : "."), keepWith: 20);
            Reasons(flow, style, content, supplier.Id, winner == supplier.Id ? null : winner, names, scrub);
        }

        flow.Caution("About this letter", [
            "The scores guide the panel's judgement; the decision rests with the approver, on the reasons recorded.",
            "Your rights to further information, any standstill period and how to raise a question depend on the procurement law that applies; see the award notice.",
        ]);
    }

    private static void Scores(PageFlow flow, RecordContent content, string supplier, string? winner, RecordNames names)
    {
        var evaluation = content.Evaluation;
        var cells = content.Analysis.Matrix.ToDictionary(c => (c.Alternative, c.Criterion));
        var weights = content.Analysis.Weights.ToDictionary(w => w.Criterion, w => w.Crisp, StringComparer.Ordinal);
        var scale = evaluation.RatingScale;
        string Score(string alternative, Criterion criterion)
        {
            if (!cells.TryGetValue((alternative, criterion.Id), out var cell))
            {
                return "—";
            }

            if (criterion.Kind == CriterionKind.Numeric)
            {
                return RecordText.Measured(cell.Aggregated.Middle) + (criterion.Unit is null ? "" : " " + criterion.Unit);
            }

            var centroid = cell.Aggregated.Centroid;
            var nearest = scale.Terms.MinBy(t => Math.Abs(t.Value.Centroid - centroid))!;
            return $"{RecordText.Number(centroid, 1)} of {RecordText.Number(scale.Maximum, 0)} (about \"{nearest.Label}\")";
        }

        var scored = evaluation.Criteria.Where(c => c.Kind != CriterionKind.Gate).ToArray();
        flow.Heading("Scores by criterion");
        flow.Table(
            winner is null
                ? [new("Criterion", 3.5), new("Weight", 1, CellAlign.Right), new("Your tender", 3)]
                : [new("Criterion", 3.5), new("Weight", 1, CellAlign.Right), new("Your tender", 3), new("Highest-ranked tender", 3)],
            scored.Select(c => (IReadOnlyList<string>)(winner is null
                ? [c.Name, weights.TryGetValue(c.Id, out var w) ? RecordText.Percent(w) : "—", Score(supplier, c)]
                : [c.Name, weights.TryGetValue(c.Id, out var w2) ? RecordText.Percent(w2) : "—", Score(supplier, c), Score(winner, c)])));
        flow.Paragraph("Quality scores are the panel's combined rating on the published scale (its centre of gravity); measured values are as tendered.", flow.Style.Cell, flow.Style.MutedBrush);
    }

    /// <summary>The published points: per criterion the panel's score and the points, then price, price points and total, for the supplier and the winner.</summary>
    private static void Points(PageFlow flow, AwardReport award, string supplier, string? winner, RecordNames names)
    {
        var lines = award.Lines.ToDictionary(l => l.Alternative, StringComparer.Ordinal);
        string Cell(string bid, int j) => lines.TryGetValue(bid, out var line)
            ? $"{Number(line.Cells[j].Score)} → {Number(line.Award.CriterionPoints[j])} points"
            : "—";
        var rows = award.QualityCriteria.Select((id, j) => (IReadOnlyList<string>)(winner is null
            ? [$"{names.Criterion(id)} ({Number(award.CriterionPoints[j])})", Cell(supplier, j)]
            : [$"{names.Criterion(id)} ({Number(award.CriterionPoints[j])})", Cell(supplier, j), Cell(winner, j)])).ToList();
        string Line(string bid, Func<AwardedBid, string> part) => lines.TryGetValue(bid, out var line) ? part(line.Award) : "—";
        void Add(string label, Func<AwardedBid, string> part) =>
            rows.Add(winner is null ? [label, Line(supplier, part)] : [label, Line(supplier, part), Line(winner, part)]);
        Add("Quality points", b => Number(b.QualityPoints));
        Add("Price", b => b.Price is { } p ? RecordText.Measured(p) : "not opened");
        Add(award.Formula.GivesPoints ? $"Price points ({Number(award.PricePoints)})" : "Price figure (lowest first)", b => (award.Formula.GivesPoints ? b.PricePoints : b.Figure) is { } v ? Number(v) : "—");
        Add("Total", b => b.Total is { } t ? Number(t) : "—");
        Add("Rank", b => b.Rank?.ToString(System.Globalization.CultureInfo.InvariantCulture) ?? "—");

        flow.Heading("Your points, as published in the methodology");
        flow.Table(
            winner is null
                ? [new("Criterion (points)", 4), new("Your tender", 3)]
                : [new("Criterion (points)", 4), new("Your tender", 3), new("Winning tender", 3)],
            rows);
        flow.Paragraph($"Each criterion: the panel's score on the 0–{Number(award.ScaleMaximum)} scale → score ÷ {Number(award.ScaleMaximum)} × the criterion's points. Price: {award.Formula.Name}, {award.Formula.Equation}. You can redo every figure with a calculator.",
            flow.Style.Cell, flow.Style.MutedBrush);
    }

    private static string Number(double value) => value.ToString("0.##", System.Globalization.CultureInfo.InvariantCulture);

    private static void Reasons(PageFlow flow, ReportStyle style, RecordContent content, string supplier, string? winner, RecordNames names, Func<string, string> scrub)
    {
        var evaluation = content.Evaluation;
        var letters = evaluation.Assessors.Select((a, i) => (a.Id, Label: $"Assessor {(char)('A' + (i % 26))}")).ToDictionary(p => p.Id, p => p.Label, StringComparer.Ordinal);
        var moderated = evaluation.Moderated.ToDictionary(m => (m.Alternative, m.Criterion));
        flow.Heading("The panel's reasons");
        foreach (var criterion in evaluation.Criteria.Where(c => c.Kind == CriterionKind.Linguistic))
        {
            flow.Paragraph(criterion.Name, style.BodyBold, after: 2, keepWith: 30);
            foreach (var (alternative, whose) in winner is null ? [(supplier, "Your tender")] : new[] { (supplier, "Your tender"), (winner, "Highest-ranked tender") })
            {
                var rows = evaluation.Ratings.Where(r => r.Alternative == alternative && r.Criterion == criterion.Id && r.Term is not null)
                    .Select(r => (IReadOnlyList<string>)[whose, letters.GetValueOrDefault(r.Assessor, "Assessor"), TermWords(evaluation, r.Term!), scrub(r.Rationale ?? "")]).ToList();
                if (moderated.TryGetValue((alternative, criterion.Id), out var m))
                {
                    rows.Add([whose, "Panel (moderated)", TermWords(evaluation, m.Term), scrub(m.Reason)]);
                }

                if (rows.Count > 0)
                {
                    flow.Table([new("Tender", 1.6), new("Who", 1.4), new("Term", 1.4), new("Reason", 6.4)], rows);
                }
            }
        }
    }

    /// <summary>A term as a bidder reads it: its label, with the code after it.</summary>
    private static string TermWords(Evaluation evaluation, string code) =>
        evaluation.RatingScale.TryFind(code, out var step) ? $"{evaluation.RatingScale[step].Label} ({code})" : code;

    private static Func<string, string> Scrubber(Evaluation evaluation, string supplier, string? winner)
    {
        var others = evaluation.Alternatives.Where(a => a.Id != supplier && a.Id != winner)
            .SelectMany(a => new[] { a.Name, a.Id }).Where(n => n.Length >= 3)
            .OrderByDescending(n => n.Length).Select(Regex.Escape).ToArray();
        if (others.Length == 0)
        {
            return text => text;
        }

        var pattern = new Regex($@"(?<!\w)({string.Join("|", others)})(?!\w)", RegexOptions.IgnoreCase | RegexOptions.CultureInvariant, TimeSpan.FromSeconds(1));
        return text => pattern.Replace(text, OtherBidder);
    }
}
