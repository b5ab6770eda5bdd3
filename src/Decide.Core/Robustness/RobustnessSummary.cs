using System.Globalization;
using Decide.Core.Analysis;

namespace Decide.Core.Robustness;

/// <summary>
/// Writes the robustness findings as short plain sentences for the report and the screens, naming alternatives
/// and criteria by their names. Every sentence is derived from a number in the results.
/// </summary>
public static class RobustnessSummary
{
    /// <summary>The sentences, most important first.</summary>
    public static IReadOnlyList<string> Write(
        PreparedEvaluation prepared, AnalysisResult result, SensitivityResult sensitivity, PanelAgreementResult agreement)
    {
        var names = prepared.Source.Alternatives.ToDictionary(a => a.Id, a => a.Name, StringComparer.Ordinal);
        var criteria = prepared.Source.Criteria.ToDictionary(c => c.Id, c => c.Name, StringComparer.Ordinal);
        var lines = new List<string>();
        var ranking = result.Ranking;
        if (ranking.Count == 0)
        {
            lines.Add("No alternative passed every gate, so there is nothing to rank.");
            return lines;
        }

        var top = ranking[0];
        var winner = names[top.Alternative];
        if (ranking.Count == 1)
        {
            lines.Add($"{winner} is the only alternative that passed every gate; there is nothing to compare it with.");
            return lines;
        }

        var tied = ranking.Where(r => r.Rank == 1).Select(r => names[r.Alternative]).ToArray();
        if (tied.Length > 1)
        {
            lines.Add($"{Join(tied)} tie for first place with closeness {F(top.Closeness, 3)}; the panel must break the tie by its documented rule.");
        }
        else
        {
            var second = ranking[1];
            lines.Add($"{winner} ranks first with closeness {F(top.Closeness, 3)}, {F(top.Closeness - second.Closeness, 3)} ahead of {names[second.Alternative]} ({F(second.Closeness, 3)}).");
        }

        Acceptability(lines, sensitivity.Acceptability, top.Alternative, names);
        Panel(lines, sensitivity.LeaveOneOut, names, prepared);
        Critical(lines, sensitivity.CriticalChanges, names, criteria);
        BidSet(lines, sensitivity.WithoutAlternative, names);
        Methods(lines, sensitivity.Methods, names);
        Agreement(lines, agreement);
        return lines;
    }

    private static void Acceptability(List<string> lines, AcceptabilityResult acceptability, string top, Dictionary<string, string> names)
    {
        if (acceptability.Draws == 0)
        {
            return;
        }

        var first = acceptability.Alternatives.Single(a => a.Alternative == top);
        var interval = first.Intervals[0];
        var others = acceptability.Alternatives.Where(a => a.Alternative != top && a.Ranks[0] > 0)
            .OrderByDescending(a => a.Ranks[0]).Select(a => $"{names[a.Alternative]} {P(a.Ranks[0])}").ToArray();
        var source = acceptability.Weights == Model.AcceptabilityWeights.Uniform ? "weightings of any kind" : "plausible weightings";
        lines.Add($"{names[top]} ranks first in {P(first.Ranks[0])} of {acceptability.Draws:N0} draws of {source} and ratings within the panel's terms (95% interval {P(interval.Low)}–{P(interval.High)})"
            + (others.Length > 0 ? $"; also first: {string.Join(", ", others)}." : "."));
    }

    private static void Panel(List<string> lines, IReadOnlyList<LeaveOneOutResult> leaveOneOut, Dictionary<string, string> names, PreparedEvaluation prepared)
    {
        if (leaveOneOut.Count < 2)
        {
            return;
        }

        var assessorNames = prepared.Source.Assessors.ToDictionary(a => a.Id, a => a.Name, StringComparer.Ordinal);
        var changed = leaveOneOut.Where(l => l.WinnerChanged && l.Winner is not null).ToArray();
        var impossible = leaveOneOut.Where(l => l.Problem is not null).ToArray();
        if (changed.Length == 0)
        {
            lines.Add(impossible.Length == 0
                ? "Removing any single assessor leaves the same alternative first."
                : $"Removing any single assessor leaves the same alternative first, where a ranking is possible (not without {Join(impossible.Select(l => assessorNames[l.Assessor]))}).");
        }
        else
        {
            lines.Add(string.Join(" ", changed.Select(l => $"Without {assessorNames[l.Assessor]}'s judgements, {names[l.Winner!]} would rank first.")));
        }
    }

    private static void Critical(List<string> lines, CriticalChangesResult critical, Dictionary<string, string> names, Dictionary<string, string> criteria)
    {
        if (critical.TopShare is not { } most)
        {
            lines.Add("No change of any single criterion's weight, from 0% to 100%, moves the leader from first place.");
            return;
        }

        var direction = most.Weight < most.Current ? "falls below" : "rises above";
        lines.Add($"The closest challenge to first place: {names[most.Challenger]} overtakes {names[most.Leader]} only if the weight of {criteria[most.Criterion]} {direction} {P(most.Weight)} (now {P(most.Current)}; a change of {F(most.Absolute * 100, 1)} percentage points, {F(most.Relative, 0)}% of its current weight).");
    }

    private static void BidSet(List<string> lines, IReadOnlyList<WithoutAlternativeResult> without, Dictionary<string, string> names)
    {
        if (without.Count == 0)
        {
            return;
        }

        var reversing = without.Where(w => w.Reversals.Count > 0).ToArray();
        lines.Add(reversing.Length == 0
            ? "Removing any one alternative (a withdrawal or late disqualification) leaves the order of the others unchanged."
            : string.Join(" ", reversing.Select(w =>
                $"Removing {names[w.Alternative]} would reorder others: {string.Join("; ", w.Reversals.Select(r => $"{names[r.NowAhead]} would move ahead of {names[r.WasAhead]}"))}.")));
    }

    private static void Methods(List<string> lines, IReadOnlyList<MethodComparison> methods, Dictionary<string, string> names)
    {
        if (methods.Count == 0)
        {
            return;
        }

        var applied = methods.Where(m => m.Applicable).ToArray();
        var differing = applied.Where(m => !m.SameWinner).ToArray();
        var sentence = applied.Length == 0 ? ""
            : differing.Length == 0
                ? applied.Length == methods.Count
                    ? "The weighted total of scores on the rating scale, the other aggregation rule and the other ideal points all give the same winner."
                    : "The other methods that can be applied give the same winner."
                : string.Join(" ", differing.Select(m => $"Under the {m.Description}, {names[m.Ranking[0]]} would rank first."));
        var notApplicable = methods.Where(m => !m.Applicable).Select(m => $"The check by {m.Description} is {m.Note}.");
        var text = string.Join(" ", new[] { sentence }.Concat(notApplicable).Where(t => t.Length > 0));
        if (text.Length > 0)
        {
            lines.Add(text);
        }
    }

    private static void Agreement(List<string> lines, PanelAgreementResult agreement)
    {
        var flagged = agreement.ForDiscussion.Count;
        var cells = flagged switch
        {
            0 => $"no cell's terms differ by more than {agreement.Tolerance} scale steps",
            1 => $"1 cell's terms differ by more than {agreement.Tolerance} scale steps and is listed for discussion",
            _ => $"{flagged} cells' terms differ by more than {agreement.Tolerance} scale steps and are listed for discussion",
        };
        lines.Add(agreement.Concordance is { } w
            ? $"Panel agreement on the order of alternatives: Kendall's W = {F(w.W, 2)} (chi-square p = {F(w.PValue, 3)}); {cells}."
            : $"Panel agreement: {cells}.");
    }

    private static string P(double share) => (share * 100).ToString(share is > 0 and < 0.001 ? "0.00" : share < 0.1 ? "0.0" : "0", CultureInfo.InvariantCulture) + "%";

    private static string F(double value, int decimals) => value.ToString("F" + decimals, CultureInfo.InvariantCulture);

    private static string Join(IEnumerable<string> items)
    {
        var list = items.ToArray();
        return list.Length <= 1 ? string.Join("", list) : $"{string.Join(", ", list[..^1])} and {list[^1]}";
    }
}
