using System.Globalization;
using Decide.Core;
using Decide.Core.Weighting;
using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Robustness;
using Decide.Interchange;

namespace Decide.Cli;

/// <summary>
/// Prints an analysis as plain-text tables for people: ranking, exclusions, weights, consistency and, when it was run,
/// robustness; the caution comes last.
/// </summary>
public static class TableRenderer
{
    /// <summary>The sentence every printed result ends with.</summary>
    public const string Caution =
        "Decide supports and does not replace the panel's documented judgement; follow the procurement law and rules that apply to you.";

    /// <summary>Writes the tables for <paramref name="result"/>, naming things as <paramref name="file"/> does.</summary>
    /// <param name="file">The evaluation file analysed.</param>
    /// <param name="run">The analysis, its robustness when it was run, and the published award when the plan states one.</param>
    /// <param name="output">Where to write.</param>
    public static void Render(EvaluationFile file, DecisionRun run, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(file);
        ArgumentNullException.ThrowIfNull(run);
        ArgumentNullException.ThrowIfNull(output);
        var (result, robustness) = (run.Analysis, run.Robustness);
        var e = file.Evaluation;
        var meta = file.Metadata;
        var alternatives = e.Alternatives.GroupBy(a => a.Id).ToDictionary(g => g.Key, g => g.First().Name);
        var criteria = e.Criteria.GroupBy(c => c.Id).ToDictionary(g => g.Key, g => g.First().Name);

        output.WriteLine(result.Title);
        var about = new[] { meta.Reference, meta.Organisation }.Where(s => !string.IsNullOrWhiteSpace(s)).ToArray();
        if (about.Length > 0)
        {
            output.WriteLine(string.Join(" · ", about));
        }

        output.WriteLine($"Method: {Weighting(result.Weighting)}; {Aggregation(result.Options.Aggregation)}; {Ideal(result.Options.Ideal)}; ranked by fuzzy TOPSIS (Chen 2000).");
        output.WriteLine();

        output.WriteLine(meta.Noun is { Length: > 0 } noun ? $"Ranking of {noun}" : "Ranking");
        var ranking = new TextTable("Rank", "Id", "Name", "Closeness", "d+", "d-").AlignRight(0, 3, 4, 5);
        foreach (var r in result.Ranking)
        {
            ranking.Add(r.Rank.ToString(CultureInfo.InvariantCulture), r.Alternative, alternatives.GetValueOrDefault(r.Alternative, r.Alternative),
                F(r.Closeness, 4), F(r.DPlus, 4), F(r.DMinus, 4));
        }

        ranking.Write(output);

        if (result.Excluded.Count > 0)
        {
            output.WriteLine();
            output.WriteLine("Excluded (failed a pass/fail gate, or excluded by the published award)");
            foreach (var x in result.Excluded)
            {
                var gates = string.Join("; ", x.Gates.Select(g => $"{criteria.GetValueOrDefault(g, g)} ({g})"));
                var why = x.Gates.Count > 0 ? $"failed {gates}" : x.Reason;
                output.WriteLine($"  {x.Alternative} {alternatives.GetValueOrDefault(x.Alternative, x.Alternative)}: {why}");
            }
        }

        output.WriteLine();
        output.WriteLine("Weights");
        var weights = new TextTable("Criterion", "Name", "Fuzzy weight", "Crisp").AlignRight(3);
        foreach (var w in result.Weights)
        {
            weights.Add(w.Criterion, criteria.GetValueOrDefault(w.Criterion, w.Criterion), Tfn(w.Fuzzy),
                string.Create(CultureInfo.InvariantCulture, $"{w.Crisp * 100:F1} %"));
        }

        weights.Write(output);

        if (result.Consistency.Count > 0)
        {
            RenderConsistency(result.Consistency, output);
        }

        if (run.Award is { } award)
        {
            AwardRenderer.Render(file, award, run.AwardAgreement!, run.AwardRobustness, output);
        }

        if (run.Round is { } round)
        {
            RoundRenderer.Render(file, round, robustness?.Agreement, output);
        }

        if (robustness is not null)
        {
            RobustnessRenderer.Render(file, result, robustness, output);
        }

        output.WriteLine();
        output.WriteLine(Caution);
    }

    private static void RenderConsistency(IReadOnlyList<MatrixConsistency> consistency, TextWriter output)
    {
        output.WriteLine();
        output.WriteLine("Consistency of the pairwise comparisons");
        var table = new TextTable("Assessor", "Group", "n", "CR (threshold)", "GCI (threshold)", "Flag").AlignRight(2);
        var notes = new List<string>();
        foreach (var m in consistency)
        {
            var r = m.Report;
            var flags = new List<string>();
            if (!r.Acceptable)
            {
                flags.Add("CR");
            }

            if (!r.GciAcceptable)
            {
                flags.Add("GCI");
            }

            table.Add(m.Assessor, m.Group ?? "(top level)", r.Size.ToString(CultureInfo.InvariantCulture),
                $"{F(r.Ratio, 3)} ({G(r.Threshold)})", $"{F(r.Gci, 3)} ({G(r.GciThreshold)})",
                flags.Count == 0 ? "ok" : $"review {string.Join(", ", flags)}");

            var where = $"{m.Assessor}, {m.Group ?? "top level"}";
            if (r.WorstJudgements.Count > 0)
            {
                notes.Add($"  {where}: judgements most out of line: " + string.Join("; ",
                    r.WorstJudgements.Select(j => $"{j.Row} over {j.Col} given {G(j.Given)}, consistent with the rest {F(j.Consistent, 2)}")));
            }

            foreach (var triad in r.IntransitiveTriads)
            {
                notes.Add($"  {where}: intransitive: {string.Join(" > ", triad)} > {triad[0]}");
            }
        }

        table.Write(output);
        foreach (var note in notes)
        {
            output.WriteLine(note);
        }
    }

    private static string Weighting(WeightingMethod w) => w switch
    {
        WeightingMethod.Pairwise => "pairwise comparison weights (Buckley's geometric mean)",
        WeightingMethod.Points => "published points as crisp weights",
        _ => "importance-rating weights",
    };

    private static string Aggregation(AggregationRule a) => a == AggregationRule.Geometric
        ? "panel aggregated by weighted geometric mean"
        : "panel aggregated by weighted mean";

    private static string Ideal(IdealPoints i) => i == IdealPoints.Extreme
        ? "ideal points from the best and worst values"
        : "ideal points (1, 1, 1) and (0, 0, 0)";

    private static string Tfn(Tfn t) => $"({F(t.Lower, 3)}, {F(t.Middle, 3)}, {F(t.Upper, 3)})";

    private static string F(double x, int decimals) => x.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    private static string G(double x) => x.ToString("G4", CultureInfo.InvariantCulture);
}
