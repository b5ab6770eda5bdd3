using System.Globalization;
using Decide.Core.Consistency;
using Decide.Core.Model;
using Decide.Core.Scales;
using Decide.Reports.Layout;

namespace Decide.Reports;

internal sealed partial class RecordWriter
{
    private void Method()
    {
        _flow.Section("2 Method");
        if (_content.Methodology is { } methodology)
        {
            _flow.Facts(
            [
                ("Methodology (text) SHA-256", methodology),
                ("As published at lock", _content.PublishedMethodology is null
                    ? "not known (the record was made from a file outside the service)"
                    : _content.PublishedMethodology == methodology
                        ? "the same: the method published with the tender is the one applied"
                        : $"DIFFERENT ({_content.PublishedMethodology}): the method applied is not the one published"),
            ], labelWidth: 160);
        }

        _flow.Paragraph("Assessors rate each alternative on each criterion with a term of a linguistic scale. Every term stands for a triangular fuzzy number (l, m, u): the value is most plausibly m and certainly between l and u. The scales and their numbers were fixed in the plan before bids were seen.");
        Scale("Rating scale", Evaluation.RatingScale);
        if (Evaluation.Weighting == WeightingMethod.Importance)
        {
            Scale("Importance scale", Evaluation.ImportanceScale);
        }
        else if (Evaluation.Weighting == WeightingMethod.Pairwise)
        {
            Scale("Pairwise comparison scale", Evaluation.PairwiseScale, chart: false);
        }

        var options = Evaluation.Options;
        _flow.Heading("Aggregation");
        _flow.Paragraph(options.Aggregation == AggregationRule.Mean
            ? "The panel's terms for a cell are combined by the weighted arithmetic mean of their triangles, component by component (Chen 2000), with each assessor's weight from the plan. A cell an assessor declined (for example on recusal) is the mean over those who rated it; nothing is imputed."
            : "The panel's terms for a cell are combined by the weighted geometric mean of their triangles, component by component, with each assessor's weight from the plan, so one extreme term pulls the result less than in an arithmetic mean. A declined cell is the mean over those who rated it; nothing is imputed.");
        _flow.Paragraph("Where the panel moderated a cell, the agreed term replaces the aggregate in the decision matrix; the individual terms stay in the record (section 7 and the appendix). Numeric criteria (such as price) enter as exact values.");

        _flow.Heading("Weighting");
        _flow.Paragraph(Evaluation.Weighting switch
        {
            WeightingMethod.Importance => "Each assessor rated the importance of every criterion (and of each criterion group) with a term of the importance scale; the panel's fuzzy weight is the aggregate of those terms. A grouped criterion's weight is its group's weight multiplied by its weight within the group.",
            WeightingMethod.Points => "The weights are the points published with the tender: each criterion's weight is its points divided by the total, used as a crisp triangle (s, s, s). Nobody on the panel judged the weights.",
            _ => "Each assessor compared the criteria (and groups) in pairs. The panel's judgements are combined by the element-wise geometric mean, and fuzzy weights follow from Buckley's geometric-mean method (1985). A grouped criterion's weight is its group's weight multiplied by its weight within the group.",
        });
        _flow.Paragraph("The crisp share printed beside each fuzzy weight is its centroid (l + m + u)/3, normalised so that all shares add up to 100%. The analysis itself uses the fuzzy weights.");

        _flow.Heading("Ranking: fuzzy TOPSIS");
        _flow.Paragraph("Ranking follows the fuzzy TOPSIS of Chen (2000, Fuzzy Sets and Systems 114:1–9). Benefit criteria are divided by the largest upper value among the alternatives; cost criteria use the smallest lower value divided by each value, so lower prices score higher. Each normalised value is multiplied by the criterion's fuzzy weight. Alternatives that failed a gate take no part in the normalisation.");
        _flow.Paragraph(options.Ideal == IdealPoints.Unit
            ? "Ideal points: (1, 1, 1) as the positive ideal and (0, 0, 0) as the negative ideal for every criterion, as in Chen (2000)."
            : "Ideal points: for each criterion, the largest upper value of the weighted matrix as the positive ideal and the smallest lower value as the negative ideal, both crisp.");
        _flow.Paragraph("Distances use the vertex distance d(a, b) = √(((l₁−l₂)² + (m₁−m₂)² + (u₁−u₂)²)/3). For each alternative, d⁺ and d⁻ are the sums over criteria of its distances from the positive and negative ideal, and the closeness coefficient CC = d⁻/(d⁺ + d⁻) ranks it: higher is better. Note that TOPSIS, like any relative method, can reorder the others when a bid is added, withdrawn or disqualified; section 6 checks this.");

        _flow.Heading("Consistency of pairwise judgements");
        _flow.Paragraph("CR = CI/RI(n) with CI = (λmax − n)/(n − 1), computed on the matrix of middle values. Acceptable: CR ≤ 0.05 for n = 3, ≤ 0.08 for n = 4, ≤ 0.10 for larger matrices (Saaty 1994); the geometric consistency index GCI is reported beside it (thresholds 0.31, 0.35, 0.37; Aguarón and Moreno-Jiménez 2003). Matrices of order 2 or less are always consistent."
            + (Evaluation.Weighting switch
            {
                WeightingMethod.Importance => " In this evaluation the weights come from importance ratings, so these thresholds are stated for completeness only.",
                WeightingMethod.Points => " In this evaluation the weights are published points, so these thresholds are stated for completeness only.",
                _ => "",
            }));
        _flow.Paragraph($"Random index table used: {RandomIndex.TableName}.", _style.Cell);
        var orders = Enumerable.Range(3, RandomIndex.MaxOrder - 2).ToArray();
        _flow.Table(
            [new TableColumn("n", 1.6), .. orders.Select(n => new TableColumn(n.ToString(CultureInfo.InvariantCulture), 1, CellAlign.Right))],
            [
                ["RI(n)", .. orders.Select(n => RecordText.Number(RandomIndex.For(n), 2))],
                ["CR limit", .. orders.Select(n => RecordText.Number(RandomIndex.Threshold(n), 2))],
                ["GCI limit", .. orders.Select(n => RecordText.Number(RandomIndex.GciThreshold(n), 2))],
            ],
            boldColumns: 1);

        _flow.Heading("Robustness checks and software");
        var acceptability = _content.Robustness.Sensitivity.Acceptability;
        _flow.Paragraph("Weight sweeps move one criterion's share from 0% to 100% with the others keeping their proportions; critical changes give the smallest change of one criterion's weight that reverses a pair, both as the share it must reach and as the change of that weight alone before rescaling (Triantaphyllou and Sánchez 1997); rank acceptability draws weights and ratings at random within the panel's triangles"
            + (acceptability.Draws > 0 ? $" ({acceptability.Draws.ToString("N0", CultureInfo.InvariantCulture)} draws, seed {acceptability.Seed.ToString(CultureInfo.InvariantCulture)}, so the figures can be reproduced)" : " (not run for this record)")
            + "; leave-one-out repeats the analysis without each assessor and without each alternative; panel agreement uses Kendall's W. All are diagnostic and change nothing.");
        _flow.Paragraph("The method cross-check ranks the same inputs under the other aggregation rule, under the other ideal points, and by the weighted total of scores on the rating scale, the score procurement scoring rules assume: each rating's centre (l + m + u)/3 as a share of the top of the rating scale, each price or other number relative to the best bid (lowest ÷ value for a cost, value ÷ highest for a benefit; this one part is relative), each times the criterion's weight share. Unlike TOPSIS it does not divide a criterion's ratings by the best rating received. A method that cannot be applied to the evaluation is listed as not applicable, with the reason.");
        _flow.Paragraph($"Figures computed by Decide {_content.SoftwareVersion}. Anyone can recompute them from the embedded {EvaluationRecordDocument.AttachmentName} with the same version.");
    }

    private void Scale(string title, LinguisticScale scale, bool chart = true)
    {
        _flow.Heading($"{title}: {scale.Name}", keepWith: chart ? 150 : 60);
        if (chart)
        {
            var area = _flow.Reserve(120);
            ChartPainter.TermTriangles(_flow.Gfx, area, scale, _style);
            _flow.Space(6);
        }

        _flow.Table(
            [new("Code", 1), new("Term", 2.2), new("Lower l", 1.2, CellAlign.Right), new("Middle m", 1.2, CellAlign.Right), new("Upper u", 1.2, CellAlign.Right), new("Meaning", 5)],
            scale.Terms.Select(t => (IReadOnlyList<string>)
                [t.Code, t.Label, Trim(t.Value.Lower), Trim(t.Value.Middle), Trim(t.Value.Upper), t.Descriptor ?? ""]));
    }

    private static string Trim(double value) => value.ToString("0.###", CultureInfo.InvariantCulture);
}
