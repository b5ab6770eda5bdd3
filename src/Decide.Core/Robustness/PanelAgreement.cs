using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Ranking;

namespace Decide.Core.Robustness;

/// <summary>
/// Measures how far the panel agrees, for the moderator to discuss before the result is signed. It never re-weights
/// or drops an assessor: it only reports.
/// </summary>
/// <remarks>
/// <list type="bullet">
/// <item>Each assessor who rated at least one linguistic cell gets their own fuzzy TOPSIS ranking: their TFN where
/// they rated a cell, the panel's aggregate where they declined or were not assigned (so that a gap is not read as a
/// judgement), numeric criteria as measured, and the panel's criterion weights and ideal points. Their mean vertex
/// distance from the aggregate is taken over the cells they rated.</item>
/// <item>Kendall's W, corrected for ties, over the average-rank vectors of the assessors who rated every alternative
/// in the running (on at least one criterion), with its chi-square test (Kendall &amp; Babington Smith 1939; see
/// <see cref="RankStatistics.KendallW"/>). W needs complete rankings: an assessor who saw only some bids is listed
/// instead, never completed with the panel's values.</item>
/// <item>Krippendorff's alpha (ordinal on the terms' order, interval on their centres) over every cell two or more
/// assessors rated, with a seeded bootstrap interval: the agreement measure that stays valid when each reads only
/// some bids (see <see cref="KrippendorffAlpha"/>).</item>
/// <item>Per cell rated by two or more assessors, the spread of their terms in scale steps; cells whose spread
/// exceeds the tolerance (two steps by default, common practice for a seven-term scale) are listed for
/// discussion.</item>
/// </list>
/// </remarks>
public static class PanelAgreement
{
    /// <summary>The default tolerance: a cell is listed for discussion when its terms lie more than two steps apart.</summary>
    public const int DefaultTolerance = 2;

    /// <summary>Measures the panel's agreement on a prepared evaluation.</summary>
    /// <param name="prepared">A prepared (validated) evaluation.</param>
    /// <param name="tolerance">The largest spread, in scale steps, not listed for discussion; 0 or more.</param>
    /// <exception cref="ArgumentOutOfRangeException">The tolerance is negative.</exception>
    public static PanelAgreementResult Measure(PreparedEvaluation prepared, int tolerance = DefaultTolerance)
    {
        ArgumentNullException.ThrowIfNull(prepared);
        if (tolerance < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(tolerance), tolerance, "The tolerance is a number of scale steps, 0 or more.");
        }

        var assessors = MeasureAssessors(prepared, out var ranksByAssessor, out var partial);
        var concordance = ranksByAssessor.Length >= 2 ? RankStatistics.KendallW(ranksByAssessor) : null;
        var cells = Spreads(prepared);
        var forDiscussion = cells
            .Select((cell, position) => (cell, position))
            .Where(x => x.cell.Spread > tolerance)
            .OrderByDescending(x => x.cell.Spread)
            .ThenBy(x => x.position) // cells are already in alternative order, then criterion order
            .Select(x => x.cell)
            .ToArray();
        return new PanelAgreementResult(tolerance, assessors, concordance, cells, forDiscussion, Reliability(prepared), partial);
    }

    /// <summary>Seed of the bootstrap interval of alpha: fixed, so the same ratings always print the same interval.</summary>
    public const ulong ReliabilitySeed = 20110101;

    /// <summary>Krippendorff's alpha over the linguistic cells of the alternatives in the running.</summary>
    public static PanelReliability? Reliability(PreparedEvaluation prepared, int draws = KrippendorffAlpha.DefaultDraws)
    {
        ArgumentNullException.ThrowIfNull(prepared);
        int n = prepared.Alternatives.Count, m = prepared.Criteria.Count, k = prepared.Assessors.Count;
        var scale = prepared.Source.RatingScale;
        var steps = new List<IReadOnlyList<double>>();
        var centres = new List<IReadOnlyList<double>>();
        for (var cell = 0; cell < n * m; cell++)
        {
            if (prepared.Criteria[cell % m].Kind != CriterionKind.Linguistic)
            {
                continue;
            }

            var s = new List<double>();
            var c = new List<double>();
            for (var a = 0; a < k; a++)
            {
                var step = prepared.Steps[(a * n * m) + cell];
                if (step >= 0)
                {
                    s.Add(step);
                    var t = scale[step].Value;
                    c.Add((t.Lower + t.Middle + t.Upper) / 3);
                }
            }

            if (s.Count >= 2)
            {
                steps.Add(s);
                centres.Add(c);
            }
        }

        return steps.Count == 0
            ? null
            : new PanelReliability(
                KrippendorffAlpha.Estimate(steps, AlphaMetric.Ordinal, draws, ReliabilitySeed),
                KrippendorffAlpha.Estimate(centres, AlphaMetric.Interval, draws, ReliabilitySeed));
    }

    private static AssessorAgreement[] MeasureAssessors(PreparedEvaluation prepared, out double[][] ranksByAssessor, out string[] partial)
    {
        int n = prepared.Alternatives.Count, m = prepared.Criteria.Count, k = prepared.Assessors.Count;
        var scale = prepared.Source.RatingScale;
        var ideal = prepared.Source.Options.Ideal;

        var weighted = new Tfn[n * m];
        double[] dPlus = new double[n], dMinus = new double[n];
        var panelCloseness = new double[n];
        FuzzyTopsis.Evaluate(prepared.Matrix, m, prepared.IsCost, prepared.FuzzyWeights, ideal, weighted, dPlus, dMinus, panelCloseness);

        var results = new List<AssessorAgreement>(k);
        var ranks = new List<double[]>(k);
        var outside = new List<string>();
        var matrix = new Tfn[n * m];
        var seen = new bool[n];
        for (var a = 0; a < k; a++)
        {
            prepared.Matrix.CopyTo(matrix, 0);
            Array.Clear(seen);
            var rated = 0;
            double distance = 0;
            for (var cell = 0; cell < n * m; cell++)
            {
                var step = prepared.Steps[(a * n * m) + cell];
                if (step < 0)
                {
                    continue;
                }

                seen[cell / m] = true;

                var own = scale[step].Value;
                distance += Tfn.Distance(own, prepared.Matrix[cell]);
                matrix[cell] = own;
                rated++;
            }

            if (rated == 0)
            {
                continue; // rated nothing (only weighed the criteria, or declined every cell): no ranking of their own
            }

            var closeness = new double[n];
            FuzzyTopsis.Evaluate(matrix, m, prepared.IsCost, prepared.FuzzyWeights, ideal, weighted, dPlus, dMinus, closeness);
            int[] rank = new int[n], order = new int[n];
            FuzzyTopsis.Rank(closeness, rank, order);
            if (Array.TrueForAll(seen, x => x))
            {
                var averageRanks = new double[n];
                RankStatistics.AverageRanks(closeness, averageRanks);
                ranks.Add(averageRanks);
            }
            else
            {
                outside.Add(prepared.Assessors[a].Id);
            }

            results.Add(new AssessorAgreement(
                prepared.Assessors[a].Id,
                prepared.Alternatives.Select((alt, i) => new AlternativeCloseness(alt.Id, closeness[i], rank[i])).ToArray(),
                order.Select(i => prepared.Alternatives[i].Id).ToArray(),
                rated,
                distance / rated,
                RankStatistics.KendallTauB(closeness, panelCloseness)));
        }

        ranksByAssessor = ranks.ToArray();
        partial = outside.ToArray();
        return results.ToArray();
    }

    private static CellSpread[] Spreads(PreparedEvaluation prepared)
    {
        int n = prepared.Alternatives.Count, m = prepared.Criteria.Count, k = prepared.Assessors.Count;
        var scale = prepared.Source.RatingScale;
        var cells = new List<CellSpread>();
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < m; j++)
            {
                if (prepared.Criteria[j].Kind != CriterionKind.Linguistic)
                {
                    continue;
                }

                var cell = (i * m) + j;
                var terms = new List<AssessorTerm>();
                int low = int.MaxValue, high = int.MinValue;
                for (var a = 0; a < k; a++)
                {
                    var step = prepared.Steps[(a * n * m) + cell];
                    if (step < 0)
                    {
                        continue;
                    }

                    terms.Add(new AssessorTerm(prepared.Assessors[a].Id, scale[step].Code));
                    low = Math.Min(low, step);
                    high = Math.Max(high, step);
                }

                if (terms.Count >= 2)
                {
                    cells.Add(new CellSpread(prepared.Alternatives[i].Id, prepared.Criteria[j].Id, high - low, terms));
                }
            }
        }

        return cells.ToArray();
    }
}
