using System.Globalization;
using Decide.Core.Analysis;
using Decide.Core.Model;
using Decide.Core.Robustness;
using Decide.Interchange;

namespace Decide.Cli;

/// <summary>
/// The robustness part of the table output: the plain-words summary first, then rank acceptability, the most
/// critical criteria, leave-one-assessor-out, bid-set changes, the method cross-check and panel agreement.
/// </summary>
internal static class RobustnessRenderer
{
    public static void Render(EvaluationFile file, AnalysisResult result, RobustnessResult robustness, TextWriter output)
    {
        var e = file.Evaluation;
        var names = new Names(
            e.Alternatives.GroupBy(a => a.Id).ToDictionary(g => g.Key, g => g.First().Name),
            e.Criteria.GroupBy(c => c.Id).ToDictionary(g => g.Key, g => g.First().Name),
            e.Assessors.GroupBy(a => a.Id).ToDictionary(g => g.Key, g => g.First().Name));
        var s = robustness.Sensitivity;

        output.WriteLine();
        output.WriteLine("Robustness (diagnostic only: nothing here changes the ranking)");
        foreach (var sentence in robustness.Summary)
        {
            output.WriteLine($"  {sentence}");
        }

        Acceptability(s.Acceptability, result, names, output);
        Critical(s.CriticalChanges, names, output);
        LeaveOneOut(s.LeaveOneOut, names, output);
        BidSet(s.WithoutAlternative, output);
        Methods(s.Methods, names, output);
        Agreement(robustness.Agreement, e.Assessors, output);
    }

    private static void Acceptability(AcceptabilityResult a, AnalysisResult result, Names names, TextWriter output)
    {
        output.WriteLine();
        if (a.Draws == 0)
        {
            output.WriteLine("Rank acceptability: skipped (no draws).");
            return;
        }

        var source = a.Weights == AcceptabilityWeights.Uniform ? "any weights (uniform)" : "weights within the fuzzy weights";
        output.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"Rank acceptability ({a.Draws:N0} draws of {source} and ratings within the panel's terms; seed {a.Seed})"));
        var n = a.Alternatives.Count;
        var table = new TextTable("Id", "Name", "Rank 1", "95% interval", "Overall", $"Share of rank 1…{n} (%)").AlignRight(2, 3, 4);
        var byId = a.Alternatives.ToDictionary(x => x.Alternative);
        var ranked = result.Ranking.Select(r => r.Alternative).Where(byId.ContainsKey).ToArray();
        foreach (var id in ranked)
        {
            var x = byId[id];
            table.Add(id, names.Alternative(id), Percent(x.Ranks[0]), $"{Percent(x.Intervals[0].Low)}–{Percent(x.Intervals[0].High)}",
                Percent(x.Holistic), string.Join(" ", x.Ranks.Select(Compact)));
        }

        table.Write(output);
        output.WriteLine(n > 1
            ? "  Overall: overall acceptability, each rank's share counted in equal steps from in full for first place to not at all for last."
            : "  Overall: overall acceptability, the share of first place.");

        if (a.CentralWeights.Count == 0)
        {
            return;
        }

        output.WriteLine();
        output.WriteLine("Weights under which each wins, on average, and how often it still wins at them when only the ratings vary");
        var central = new TextTable("Id", "Name", "Confidence at its central weights", "Central weights").AlignRight(2);
        var byWinner = a.CentralWeights.ToDictionary(c => c.Alternative);
        foreach (var id in ranked.Where(byWinner.ContainsKey))
        {
            var c = byWinner[id];
            central.Add(id, names.Alternative(id), Percent(c.Confidence),
                string.Join(", ", c.Criteria.Zip(c.Weights, (criterion, w) => $"{criterion} {Percent(w)}")));
        }

        central.Write(output);
    }

    private static void Critical(CriticalChangesResult c, Names names, TextWriter output)
    {
        output.WriteLine();
        output.WriteLine("Most critical criteria (the smallest change of one criterion's weight that reverses a pair)");
        output.WriteLine("  change of share: the share the criterion must reach, the others keeping their proportions (what panels publish);");
        output.WriteLine("  change of weight alone: Triantaphyllou & Sánchez (1997), the criterion's weight alone changed, then all renormalised to 100%");
        var table = new TextTable("Place", "Smallest", "Criterion", "Reversal", "Share now", "Reverses at", "Change of share", "Change of weight alone").AlignRight(4, 5);
        Row(table, "first", "change of share", c.TopShare, names);
        Row(table, "first", "weight alone", c.TopAbsolute, names);
        Row(table, "first", "weight alone, % of it", c.TopRelative, names);
        Row(table, "any", "change of share", c.AnyShare, names);
        Row(table, "any", "weight alone", c.AnyAbsolute, names);
        Row(table, "any", "weight alone, % of it", c.AnyRelative, names);
        table.Write(output);
    }

    private static void Row(TextTable table, string place, string measured, MostCriticalCriterion? m, Names names)
    {
        if (m is null)
        {
            table.Add(place, measured, "none",
                measured == "change of share" ? "no single weight change reverses such a pair" : "no change of one weight alone, kept within 0-100%, reverses such a pair",
                "", "", "", "");
            return;
        }

        table.Add(place, measured, $"{m.Criterion} {names.Criterion(m.Criterion)}", $"{m.Challenger} overtakes {m.Leader}",
            Percent(m.Current), Percent(m.Weight),
            string.Create(CultureInfo.InvariantCulture, $"{(m.Weight - m.Current) * 100:+0.0;-0.0} pp ({m.Relative:0.#}% of its share)"),
            m.Delta is { } delta
                ? string.Create(CultureInfo.InvariantCulture, $"{-delta * 100:+0.0;-0.0} pp ({-m.DeltaRelative!.Value:+0.#;-0.#}% of its weight)")
                : "only with the whole weight");
    }

    private static void LeaveOneOut(IReadOnlyList<LeaveOneOutResult> results, Names names, TextWriter output)
    {
        output.WriteLine();
        output.WriteLine("Without each assessor (all their judgements removed)");
        if (results.Count == 0)
        {
            output.WriteLine("  not checked: a single assessor");
            return;
        }

        var table = new TextTable("Assessor", "Name", "Winner", "Winner changed");
        foreach (var l in results)
        {
            table.Add(l.Assessor, names.Assessor(l.Assessor),
                l.Winner is { } w ? $"{w} {names.Alternative(w)}" : $"no ranking: {l.Problem}",
                l.Winner is null ? "-" : l.WinnerChanged ? "YES" : "no");
        }

        table.Write(output);
    }

    private static void BidSet(IReadOnlyList<WithoutAlternativeResult> results, TextWriter output)
    {
        output.WriteLine();
        output.WriteLine("Without each alternative (a withdrawal or late disqualification)");
        if (results.Count == 0)
        {
            output.WriteLine("  not checked: fewer than three alternatives are ranked");
            return;
        }

        var reversing = results.Where(r => r.Reversals.Count > 0).ToArray();
        if (reversing.Length == 0)
        {
            output.WriteLine("  no reversals: removing any one leaves the order of the others unchanged");
        }

        foreach (var r in reversing)
        {
            output.WriteLine($"  without {r.Alternative}: " + string.Join("; ", r.Reversals.Select(x => $"{x.NowAhead} moves ahead of {x.WasAhead}")));
        }
    }

    private static void Methods(IReadOnlyList<MethodComparison> methods, Names names, TextWriter output)
    {
        output.WriteLine();
        output.WriteLine("Method cross-check (Kendall's tau against this ranking's closeness)");
        if (methods.Count == 0)
        {
            output.WriteLine("  not checked: nothing ranked");
            return;
        }

        var table = new TextTable("Method", "Winner", "Tau", "Description").AlignRight(2);
        foreach (var m in methods)
        {
            var winner = m.Note is { } note ? note
                : m.Ranking.Count > 0 ? $"{m.Ranking[0]} {names.Alternative(m.Ranking[0])}{(m.SameWinner ? "" : " (differs)")}" : "-";
            table.Add(m.Method, winner, m.KendallTau is { } tau ? F(tau, 3) : "n/a", m.Description);
        }

        table.Write(output);
    }

    private static void Agreement(PanelAgreementResult a, IReadOnlyList<Assessor> panel, TextWriter output)
    {
        output.WriteLine();
        output.WriteLine("Panel agreement (information for the moderator; nobody is re-weighted)");
        output.WriteLine(a.Concordance is { } w
            ? string.Create(CultureInfo.InvariantCulture,
                $"  Kendall's W = {F(w.W, 3)}, chi-square = {F(w.ChiSquare, 2)} with {w.DegreesOfFreedom} degrees of freedom, p = {P(w.PValue)} ({w.Rankings} assessors' rankings of {w.Objects} alternatives)")
            : "  Kendall's W: not defined (fewer than two assessors or alternatives, or no assessor's ratings separate the alternatives)");
        if (a.ForDiscussion.Count == 0)
        {
            output.WriteLine($"  Cells for discussion: none (no cell's terms lie more than {a.Tolerance} scale steps apart)");
            return;
        }

        output.WriteLine($"  Cells for discussion (terms more than {a.Tolerance} scale steps apart), each assessor's term:");
        var involved = panel.Select(p => p.Id).Where(id => a.ForDiscussion.Any(c => c.Terms.Any(t => t.Assessor == id))).Distinct().ToArray();
        var table = new TextTable(["Alternative", "Criterion", "Spread", .. involved]).AlignRight(2);
        foreach (var c in a.ForDiscussion)
        {
            var terms = c.Terms.ToDictionary(t => t.Assessor, t => t.Term);
            table.Add([c.Alternative, c.Criterion, c.Spread.ToString(CultureInfo.InvariantCulture), .. involved.Select(id => terms.GetValueOrDefault(id, "-"))]);
        }

        table.Write(output, "  ");
    }

    /// <summary>A share as a whole percentage for the compact rank profile: "&lt;1" and "&gt;99" keep rare outcomes visible.</summary>
    private static string Compact(double share)
    {
        var percent = share * 100;
        var text = percent switch
        {
            0 => "0",
            < 0.5 => "<1",
            > 99.5 and < 100 => ">99",
            _ => percent.ToString("0", CultureInfo.InvariantCulture),
        };
        return text.PadLeft(3);
    }

    private static string Percent(double share) => (share * 100).ToString("0.0", CultureInfo.InvariantCulture) + " %";

    private static string P(double p) => p < 0.001 ? "< 0.001" : F(p, 3);

    private static string F(double x, int decimals) => x.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    private sealed record Names(
        Dictionary<string, string> Alternatives, Dictionary<string, string> Criteria, Dictionary<string, string> Assessors)
    {
        public string Alternative(string id) => Alternatives.GetValueOrDefault(id, id);

        public string Criterion(string id) => Criteria.GetValueOrDefault(id, id);

        public string Assessor(string id) => Assessors.GetValueOrDefault(id, id);
    }
}
