using Decide.Core.Aggregation;
using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Ranking;
using Decide.Core.Robustness;

namespace Decide.Core.Rounds;

/// <summary>One reviewer's habit on the rating scale, as the calibration saw it.</summary>
/// <param name="Assessor">The reviewer.</param>
/// <param name="Rated">How many cells they rated.</param>
/// <param name="Mean">The mean position of their terms (0 = the scale's first term).</param>
/// <param name="Spread">The standard deviation of their positions (0 when they used one term only).</param>
public sealed record ReviewerHabit(string Assessor, int Rated, double Mean, double Spread);

/// <summary>The ranking with each reviewer's terms standardised, shown beside the raw one; never in its place.</summary>
/// <param name="Order">Alternative ids best first under calibration.</param>
/// <param name="Closeness">Each alternative's calibrated closeness, in <paramref name="Order"/>.</param>
/// <param name="KendallTau">Kendall's tau-b between the calibrated and the raw closeness (1 = the same order), or null.</param>
/// <param name="PanelMean">The whole panel's mean position.</param>
/// <param name="PanelSpread">The whole panel's standard deviation of positions.</param>
/// <param name="Reviewers">Each reviewer's mean and spread, in panel order.</param>
/// <param name="FundingChanges">Applications whose funding decision differs under calibration (empty without a funding line).</param>
public sealed record CalibratedRanking(
    IReadOnlyList<string> Order,
    IReadOnlyList<double> Closeness,
    double? KendallTau,
    double PanelMean,
    double PanelSpread,
    IReadOnlyList<ReviewerHabit> Reviewers,
    IReadOnlyList<string> FundingChanges);

/// <summary>
/// Reviewer calibration (optional, off by default, docs/methods.md §11): in an incomplete design a hard marker's
/// applications are disadvantaged against a lenient marker's, and the design cannot tell a weak application from a
/// strict reader. Each rating's position p on the scale (0, 1, …) is moved to p′ = μ + σ (p − μᵣ) ∕ σᵣ, where μᵣ and σᵣ are
/// the reviewer's mean and standard deviation of positions over every cell they rated, and μ and σ the whole panel's
/// (with σᵣ = 0, a reviewer who used one term only, the term is shifted by μ − μᵣ and not scaled); p′ is clamped to
/// the scale and its triangle read between the two neighbouring terms' triangles, linearly. The panel's value of
/// each cell is then aggregated and ranked as usual; moderated cells keep the panel's agreed term. The result is
/// reported beside the raw ranking; the raw ranking is the panel's and stays the result.
/// </summary>
public static class Calibration
{
    /// <summary>The calibrated ranking of a prepared evaluation.</summary>
    public static CalibratedRanking Rank(PreparedEvaluation prepared, AnalysisResult raw, FundingResult? funding)
    {
        ArgumentNullException.ThrowIfNull(prepared);
        ArgumentNullException.ThrowIfNull(raw);
        int n = prepared.Alternatives.Count, m = prepared.Criteria.Count, k = prepared.Assessors.Count;
        var scale = prepared.Source.RatingScale;
        var steps = prepared.Steps;

        double total = 0, totalSquares = 0;
        var count = 0;
        var habits = new ReviewerHabit[k];
        for (var a = 0; a < k; a++)
        {
            double sum = 0, squares = 0;
            var rated = 0;
            for (var cell = 0; cell < n * m; cell++)
            {
                var p = steps[(a * n * m) + cell];
                if (p >= 0)
                {
                    (sum, squares, rated) = (sum + p, squares + ((double)p * p), rated + 1);
                }
            }

            (total, totalSquares, count) = (total + sum, totalSquares + squares, count + rated);
            var mean = rated == 0 ? 0 : sum / rated;
            habits[a] = new ReviewerHabit(prepared.Assessors[a].Id, rated, mean, rated == 0 ? 0 : Math.Sqrt(Math.Max(0, (squares / rated) - (mean * mean))));
        }

        var panelMean = count == 0 ? 0 : total / count;
        var panelSpread = count == 0 ? 0 : Math.Sqrt(Math.Max(0, (totalSquares / count) - (panelMean * panelMean)));

        var matrix = new Tfn[n * m];
        Span<Tfn> values = k <= 128 ? stackalloc Tfn[k] : new Tfn[k];
        Span<double> weights = k <= 128 ? stackalloc double[k] : new double[k];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < m; j++)
            {
                var cell = (i * m) + j;
                matrix[cell] = prepared.Matrix[cell];
                if (prepared.Criteria[j].Kind != CriterionKind.Linguistic || prepared.ModeratedTerms[cell] is not null)
                {
                    continue; // measured values and the panel's agreed terms stand as they are
                }

                var used = 0;
                for (var a = 0; a < k; a++)
                {
                    var p = steps[(a * n * m) + cell];
                    if (p < 0 || !(prepared.AssessorWeights[a] > 0))
                    {
                        continue;
                    }

                    var h = habits[a];
                    var moved = h.Spread > 0 ? panelMean + (panelSpread * (p - h.Mean) / h.Spread) : p + (panelMean - h.Mean);
                    values[used] = At(scale, moved);
                    weights[used] = prepared.AssessorWeights[a];
                    used++;
                }

                if (used > 0)
                {
                    matrix[cell] = GroupAggregation.Aggregate(values[..used], weights[..used], prepared.Source.Options.Aggregation);
                }
            }
        }

        var workspace = new TopsisWorkspace(n, m);
        workspace.Evaluate(matrix, prepared.IsCost, prepared.FuzzyWeights, prepared.Source.Options.Ideal);
        var order = workspace.Order.Select(i => prepared.Alternatives[i].Id).ToArray();
        var closeness = workspace.Order.Select(i => workspace.Closeness[i]).ToArray();
        var rawCloseness = prepared.Alternatives.Select(alt => raw.Ranking.First(r => r.Alternative == alt.Id).Closeness).ToArray();
        var tau = RankStatistics.KendallTauB(workspace.Closeness, rawCloseness);

        IReadOnlyList<string> changes = [];
        if (funding is not null)
        {
            var requested = prepared.Source.Alternatives.ToDictionary(a => a.Id, a => a.Requested ?? 0, StringComparer.Ordinal);
            var calibrated = FundingLine.Draw(order.Select((id, x) => (id, closeness[x])).ToArray(), id => requested[id], funding.Plan)
                .Funded.ToHashSet(StringComparer.Ordinal);
            var now = funding.Funded.ToHashSet(StringComparer.Ordinal);
            changes = order.Where(id => calibrated.Contains(id) != now.Contains(id)).ToArray();
        }

        return new CalibratedRanking(order, closeness, tau, panelMean, panelSpread, habits, changes);
    }

    /// <summary>The triangle at a fractional position of the scale, read linearly between its neighbouring terms.</summary>
    private static Tfn At(Scales.LinguisticScale scale, double position)
    {
        var p = Math.Clamp(position, 0, scale.Count - 1);
        var below = (int)Math.Floor(p);
        var above = Math.Min(below + 1, scale.Count - 1);
        var f = p - below;
        Tfn a = scale[below].Value, b = scale[above].Value;
        return new Tfn(
            a.Lower + (f * (b.Lower - a.Lower)),
            a.Middle + (f * (b.Middle - a.Middle)),
            a.Upper + (f * (b.Upper - a.Upper)));
    }
}
