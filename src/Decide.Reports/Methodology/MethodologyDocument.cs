using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using Decide.Core.Award;
using Decide.Core.Model;
using Decide.Reports.Fonts;
using Decide.Reports.Layout;
using PdfSharp.Pdf;

namespace Decide.Reports.Methodology;

/// <summary>What the methodology is made from: the plan alone (no bids), with the words the plan gives for people.</summary>
/// <param name="Plan">The plan as the engine reads it (criteria, scales, published points, award method).</param>
/// <param name="Reference">The buyer's reference.</param>
/// <param name="Organisation">The buyer.</param>
/// <param name="Descriptions">What each criterion assesses, by criterion id.</param>
public sealed record MethodologyInput(Evaluation Plan, string? Reference, string? Organisation, IReadOnlyDictionary<string, string> Descriptions);

/// <summary>One block of the methodology: a heading, a paragraph, bullets or a table.</summary>
internal abstract record Block;

internal sealed record HeadingBlock(string Text) : Block;

internal sealed record ParagraphBlock(string Text) : Block;

internal sealed record BulletsBlock(IReadOnlyList<string> Items) : Block;

internal sealed record TableBlock(IReadOnlyList<(string Header, double Width, bool Right)> Columns, IReadOnlyList<IReadOnlyList<string>> Rows) : Block;

/// <summary>
/// The evaluation methodology for the tender pack, made from the plan before any bid arrives: the criteria and their
/// points, the scoring scale with every descriptor, how scores become points, the price formula with a worked
/// example on invented prices, the thresholds, the stage order, the tie-breaks and the cautions. The same content is
/// written as plain text and as a PDF; the SHA-256 of the text (<see cref="Fingerprint"/>) is stored when the plan is
/// locked and printed in the record, so that anyone can check the published method is the one applied.
/// </summary>
public static class MethodologyDocument
{
    /// <summary>The invented prices of the worked example (they belong to no bidder).</summary>
    private static readonly (string Name, double Quality, double Price)[] Example =
        [("Example bid A", 0.80, 100_000), ("Example bid B", 0.65, 88_000), ("Example bid C", 0.90, 125_000)];

    /// <summary>The methodology as plain UTF-8 text, the same every time for the same plan.</summary>
    public static string Text(MethodologyInput input)
    {
        ArgumentNullException.ThrowIfNull(input);
        var sb = new StringBuilder();
        foreach (var block in Blocks(input))
        {
            switch (block)
            {
                case HeadingBlock h:
                    sb.Append('\n').Append(h.Text).Append('\n').Append(new string('=', h.Text.Length)).Append('\n');
                    break;
                case ParagraphBlock p:
                    sb.Append(p.Text).Append('\n');
                    break;
                case BulletsBlock b:
                    foreach (var item in b.Items)
                    {
                        sb.Append("- ").Append(item).Append('\n');
                    }

                    break;
                case TableBlock t:
                    sb.Append(string.Join(" | ", t.Columns.Select(c => c.Header))).Append('\n');
                    foreach (var row in t.Rows)
                    {
                        sb.Append(string.Join(" | ", row)).Append('\n');
                    }

                    break;
            }
        }

        return sb.ToString();
    }

    /// <summary>The SHA-256 of the text version, lower-case hex: the methodology's fingerprint.</summary>
    public static string Fingerprint(MethodologyInput input) =>
        Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(Text(input))));

    /// <summary>The methodology as a PDF whose every footer carries the fingerprint of the text version.</summary>
    public static byte[] Pdf(MethodologyInput input, DateTimeOffset generatedAt)
    {
        ArgumentNullException.ThrowIfNull(input);
        ReportFonts.EnsureRegistered();
        using var document = new PdfDocument();
        document.Info.Title = $"Evaluation methodology: {input.Plan.Title}";
        document.Info.Author = input.Organisation ?? "";
        document.Info.CreationDate = generatedAt.UtcDateTime;
        document.Info.Keywords = $"decide-methodology sha256:{Fingerprint(input)}";
        var style = new ReportStyle();
        using (var flow = new PageFlow(document, style))
        {
            var first = true;
            foreach (var block in Blocks(input))
            {
                switch (block)
                {
                    case HeadingBlock h when first:
                        flow.Section(h.Text);
                        first = false;
                        break;
                    case HeadingBlock h:
                        flow.Heading(h.Text);
                        break;
                    case ParagraphBlock p:
                        flow.Paragraph(p.Text);
                        break;
                    case BulletsBlock b:
                        flow.Bullets(b.Items);
                        break;
                    case TableBlock t:
                        flow.Table(t.Columns.Select(c => new TableColumn(c.Header, c.Width, c.Right ? CellAlign.Right : CellAlign.Left)).ToArray(), t.Rows);
                        break;
                }
            }

            flow.FinishPages(
                $"Evaluation methodology {input.Reference ?? ""} · {input.Organisation ?? ""}",
                $"Fingerprint (SHA-256 of the text version): {Fingerprint(input)}");
        }

        using var output = new MemoryStream();
        document.Save(output, closeStream: false);
        return output.ToArray();
    }

    private static IEnumerable<Block> Blocks(MethodologyInput input)
    {
        var plan = input.Plan;
        var award = plan.Award;
        var points = plan.Points;
        var scale = plan.RatingScale;
        yield return new HeadingBlock($"Evaluation methodology: {plan.Title}");
        yield return new ParagraphBlock(string.Join(" · ", new[] { input.Reference, input.Organisation }.Where(s => !string.IsNullOrWhiteSpace(s))));
        yield return new ParagraphBlock("This document states how the bids will be evaluated. It is fixed before any bid is received and published with the tender documents; the evaluation follows it as written.");

        yield return new HeadingBlock("How the award is decided");
        var how = new List<string>();
        if (award is not null)
        {
            how.Add(AwardText.Binding(award.Binding));
            how.Add(AwardText.Stages(award.TwoStage));
        }
        else
        {
            how.Add("The bids are ranked by the fuzzy closeness coefficient (Chen 2000) of the panel's ratings; no points award is published.");
        }

        var gates = plan.Criteria.Where(c => c.Kind == CriterionKind.Gate).ToArray();
        if (gates.Length > 0)
        {
            how.Add("Pass/fail requirements, checked first; a bid that fails one is not evaluated further: " + string.Join("; ", gates.Select(g => g.Name)) + ".");
        }

        yield return new BulletsBlock(how);

        yield return new HeadingBlock("Criteria and weights");
        var total = points?.Total;
        yield return new TableBlock(
            [("Criterion", 5, false), ("Group", 3, false), ("What is assessed", 6, false), (points is null ? "Weight" : "Points", 1.4, true), ("Share", 1.3, true)],
            plan.Criteria.Where(c => c.Kind != CriterionKind.Gate).Select(c => (IReadOnlyList<string>)
            [
                c.Name,
                c.Group is { } g ? plan.Groups.FirstOrDefault(x => x.Id == g)?.Name ?? g : "",
                input.Descriptions.GetValueOrDefault(c.Id) ?? (c.Kind == CriterionKind.Numeric ? $"measured{(c.Unit is null ? "" : $" in {c.Unit}")}" : ""),
                points?.PointsOf(c.Id) is { } p ? Number(p) : "by the panel",
                points?.PointsOf(c.Id) is { } q && total is > 0 ? Percent(q / total.Value) : "",
            ]).ToArray());
        if (points is not null)
        {
            var groups = points.Groups.Select(g => $"{plan.Groups.FirstOrDefault(x => x.Id == g.Key)?.Name ?? g.Key} {Number(g.Value)}");
            yield return new ParagraphBlock($"Total {Number(points.Total)} points{(points.Groups.Count > 0 ? $"; groups: {string.Join(", ", groups)}" : "")}.");
        }
        else
        {
            yield return new ParagraphBlock(plan.Weighting == WeightingMethod.Pairwise
                ? "The weights come from the panel's pairwise comparisons of the criteria, made and frozen before bids are received, with a consistency check."
                : "The weights come from the panel's importance ratings of the criteria, made and frozen before bids are received.");
        }

        yield return new HeadingBlock("The scoring scale");
        yield return new TableBlock(
            [("Term", 2.2, false), ("Points", 1.2, true), ("What it means", 9, false)],
            scale.Terms.Reverse().Select(t => (IReadOnlyList<string>)[$"{t.Label} ({t.Code})", t.Points is { } p ? Number(p) : "", t.Descriptor ?? ""]).ToArray());
        yield return new ParagraphBlock($"Each term also stands for a triangular fuzzy number on [{Number(scale.Minimum)}, {Number(scale.Maximum)}], used by the supporting analysis: " +
            string.Join("; ", scale.Terms.Select(t => $"{t.Code} ({Number(t.Value.Lower)}, {Number(t.Value.Middle)}, {Number(t.Value.Upper)})")) + ".");
        foreach (var c in plan.Criteria.Where(c => c.Kind == CriterionKind.Linguistic && c.Descriptors is { Count: > 0 }))
        {
            yield return new ParagraphBlock($"What each term means for \"{c.Name}\":");
            yield return new TableBlock(
                [("Term", 2.2, false), ("What it means for this criterion", 10, false)],
                scale.Terms.Reverse().Where(t => c.Descriptors!.ContainsKey(t.Code)).Select(t => (IReadOnlyList<string>)[$"{t.Label} ({t.Code})", c.Descriptors![t.Code]]).ToArray());
        }

        if (award is null || points is null)
        {
            yield return new HeadingBlock("Cautions");
            yield return Cautions();
            yield break;
        }

        var maximum = scale.Terms[^1].Points ?? 0;
        yield return new HeadingBlock("From scores to points");
        yield return new BulletsBlock([AwardText.PanelScore(award.PanelScore), AwardText.QualityPoints(maximum)]);

        yield return new HeadingBlock("Quality thresholds");
        yield return new ParagraphBlock(AwardText.Thresholds(award, plan));

        var info = PriceFormulas.Describe(award.Formula);
        var pricePoints = points.PointsOf(award.PriceCriterion) ?? 0;
        yield return new HeadingBlock("Price");
        yield return new BulletsBlock(
        [
            $"{info.Name}: {info.Equation}, with Smax = {Number(pricePoints)} points{Parameters(award)}.",
            info.Properties,
            $"Source: {info.Source}",
        ]);
        if (info.Relative)
        {
            yield return new ParagraphBlock("Caution: " + AwardText.RelativeWarning);
        }

        yield return new ParagraphBlock("Worked example on invented prices and quality points (they belong to no bidder; the thresholds are left out):");
        yield return WorkedExample(award, points, pricePoints, info);

        yield return new HeadingBlock("Abnormally low prices");
        yield return new ParagraphBlock(AwardText.AbnormallyLow(award.AbnormallyLow));

        yield return new HeadingBlock("Equal totals");
        yield return new ParagraphBlock(AwardText.TieBreaks(award.AppliedTieBreaks));

        yield return new HeadingBlock("Cautions");
        yield return Cautions();
    }

    private static TableBlock WorkedExample(AwardMethod award, PublishedWeights points, double pricePoints, PriceFormulaInfo info)
    {
        var quality = points.Criteria.Where(c => c.Id != award.PriceCriterion).Sum(c => c.Points);
        var budget = award.Budget ?? Example.Max(e => e.Price) * 1.2;
        var rule = new PriceRule(award.Formula, pricePoints, budget, award.Floor, award.ValuePerQualityPoint);
        var plan = new AwardPlan([quality], 1, rule, TieBreaks: award.AppliedTieBreaks);
        var result = PointsAward.Compute(plan, Example.Select(e => new AwardBid(e.Name, [e.Quality], e.Price)).ToArray());
        return new TableBlock(
            [("Bid", 3, false), ("Quality points", 2, true), ("Price", 2, true), (info.GivesPoints ? "Price points" : "Figure", 2, true), ("Total", 1.6, true), ("Rank", 1, true)],
            result.Bids.Select(b => (IReadOnlyList<string>)
            [
                b.Id,
                Number(b.QualityPoints),
                Money(b.Price ?? 0),
                (info.GivesPoints ? b.PricePoints : b.Figure) is { } s ? Number(s) : b.Excluded is { } why ? AwardText.Exclusion(why) : "–",
                b.Total is { } t ? Number(t) : "–",
                b.Rank?.ToString(CultureInfo.InvariantCulture) ?? "–",
            ]).ToArray());
    }

    private static string Parameters(AwardMethod award) => award.Formula switch
    {
        PriceFormula.BudgetBased => $"; budget B = {Money(award.Budget ?? 0)}, floor Pfloor = {Money(award.Floor ?? 0)}",
        PriceFormula.QualityAdjustedPrice => $"; one quality point is worth v = {Money(award.ValuePerQualityPoint ?? 0)}",
        _ => "",
    };

    private static BulletsBlock Cautions() => new(
    [
        "Decide supports, and does not replace, the panel's documented judgement.",
        "The procurement law that applies to this award and the buyer's own rules prevail over anything in this document.",
        "Nothing in this methodology changes after bids are received; a change needs a new, published revision.",
    ]);

    private static string Number(double value) => value.ToString("0.##", CultureInfo.InvariantCulture);

    private static string Money(double value) => value.ToString("#,0.##", CultureInfo.InvariantCulture);

    private static string Percent(double share) => (share * 100).ToString("0.#", CultureInfo.InvariantCulture) + " %";
}
