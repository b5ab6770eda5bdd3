using Decide.Core.Model;

namespace Decide.Core.Tests.Properties;

/// <summary>
/// Crisp TOPSIS with linear normalisation (benefit x/maxᵢ x, cost minᵢ x/x) and the distance |x − y| summed over
/// criteria, written from scratch on plain doubles. It reads the evaluation directly (every term of its scales must be
/// crisp) and shares no code with the engine, so agreement checks that fuzzy TOPSIS reduces to it.
/// </summary>
public static class CrispTopsisReference
{
    /// <summary>Closeness per alternative, in input order.</summary>
    public static double[] Closeness(Evaluation e)
    {
        double Rating(string code) => e.RatingScale.Terms.Single(t => t.Code == code).Value.Middle;
        double Importance(string code) => e.ImportanceScale.Terms.Single(t => t.Code == code).Value.Middle;
        var assessorWeight = e.Assessors.ToDictionary(a => a.Id, a => a.Weight);

        int n = e.Alternatives.Count, m = e.Criteria.Count;
        var x = new double[n, m];
        var w = new double[m];
        for (var j = 0; j < m; j++)
        {
            var criterion = e.Criteria[j];
            w[j] = Combine(e.Importance.Where(r => r.Node == criterion.Id).Select(r => (Importance(r.Term), assessorWeight[r.Assessor])), e.Options.Aggregation);
            for (var i = 0; i < n; i++)
            {
                var alternative = e.Alternatives[i].Id;
                x[i, j] = criterion.Kind == CriterionKind.Numeric
                    ? e.Values.Single(v => v.Alternative == alternative && v.Criterion == criterion.Id).Value
                    : Combine(e.Ratings.Where(r => r.Alternative == alternative && r.Criterion == criterion.Id && r.Term is not null)
                        .Select(r => (Rating(r.Term!), assessorWeight[r.Assessor])), e.Options.Aggregation);
            }
        }

        var v = new double[n, m];
        for (var j = 0; j < m; j++)
        {
            var column = Enumerable.Range(0, n).Select(i => x[i, j]).ToArray();
            for (var i = 0; i < n; i++)
            {
                var r = e.Criteria[j].Direction == Direction.Cost
                    ? column.Min() / x[i, j]
                    : column.Max() > 0 ? x[i, j] / column.Max() : 0;
                v[i, j] = r * w[j];
            }
        }

        var closeness = new double[n];
        var dPlus = new double[n];
        var dMinus = new double[n];
        for (var j = 0; j < m; j++)
        {
            var column = Enumerable.Range(0, n).Select(i => v[i, j]).ToArray();
            var (best, worst) = e.Options.Ideal == IdealPoints.Unit ? (1.0, 0.0) : (column.Max(), column.Min());
            for (var i = 0; i < n; i++)
            {
                dPlus[i] += Math.Abs(v[i, j] - best);
                dMinus[i] += Math.Abs(v[i, j] - worst);
            }
        }

        for (var i = 0; i < n; i++)
        {
            closeness[i] = dPlus[i] + dMinus[i] > 0 ? dMinus[i] / (dPlus[i] + dMinus[i]) : 0.5;
        }

        return closeness;
    }

    private static double Combine(IEnumerable<(double Value, double Weight)> values, AggregationRule rule)
    {
        var list = values.ToList();
        var total = list.Sum(p => p.Weight);
        return rule == AggregationRule.Mean
            ? list.Sum(p => p.Value * p.Weight / total)
            : Math.Exp(list.Sum(p => Math.Log(p.Value) * p.Weight / total));
    }
}
