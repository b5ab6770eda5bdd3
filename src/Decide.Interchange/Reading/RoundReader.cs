using Decide.Core;
using Decide.Core.Model;
using Decide.Core.Rounds;

namespace Decide.Interchange.Reading;

/// <summary>
/// Reads the members of a round: <c>reviews</c> (who reads which application) and <c>funding</c> (the budget and the
/// rule that spends it). Whether the design covers, balances and joins is the engine's to check
/// (<see cref="DesignChecks"/>); this reads shapes and words, each problem by its place.
/// </summary>
internal sealed class RoundReader(ReadContext context, PathTranslator paths)
{
    private static readonly string[] ReviewMembers = ["reviewersPerApplication", "maxLoad", "assigned", "calibration"];
    private static readonly string[] FundingMembers = ["budget", "rule", "currency"];

    /// <summary>The review design, or null when every assessor rates every alternative.</summary>
    public ReviewDesign? Reviews(JsonFields top)
    {
        if (!top.TryGet("reviews", out var member)
            || context.Fields(member.Value, member.Path, ReviewMembers, expected: "an object {\"reviewersPerApplication\", \"maxLoad\", \"assigned\"}") is not { } f)
        {
            return null;
        }

        var k = Whole(f, "reviewersPerApplication", "how many reviewers read each application");
        var load = Whole(f, "maxLoad", "the most applications one reviewer may read");
        var assigned = new List<ReviewAssignment>();
        if (f.Require("assigned", "who reads what, as {assessorId: [alternativeId, …]}") && f.TryGet("assigned", out var list))
        {
            foreach (var reviewer in context.Members(list.Value, list.Path, "an object {assessorId: [alternativeId, …]}") ?? [])
            {
                var applications = new List<string>();
                var fileIndex = new List<int>();
                foreach (var (i, item, at) in context.Items(reviewer.Value, reviewer.Path))
                {
                    if (context.String(item, at) is { } id)
                    {
                        applications.Add(id);
                        fileIndex.Add(i);
                    }
                }

                paths.Map(reviewer.Path, fileIndex);
                assigned.Add(new ReviewAssignment(reviewer.Name, applications));
            }
        }

        var calibration = f.Choice("calibration", FormatWords.Calibrations, ReviewerCalibration.None, out _);
        return new ReviewDesign(k, load, assigned, calibration);
    }

    /// <summary>The funding line, or null when the round has none.</summary>
    public FundingPlan? Funding(JsonFields top)
    {
        if (!top.TryGet("funding", out var member)
            || context.Fields(member.Value, member.Path, FundingMembers, expected: "an object {\"budget\", \"rule\"}") is not { } f)
        {
            return null;
        }

        f.Require("budget", "the amount the round can spend");
        var budget = f.Number("budget") ?? 0;
        var rule = f.Choice("rule", FormatWords.FundingRules, FundingRule.StopAtFirstUnaffordable, out _);
        return new FundingPlan(budget, rule, f.String("currency"));
    }

    private int Whole(JsonFields f, string name, string what)
    {
        if (!f.Require(name, what) || f.Number(name) is not { } value)
        {
            return 1;
        }

        if (value != Math.Floor(value) || value is < 1 or > 10_000)
        {
            context.Error(f.MemberPath(name), $"a whole number from 1 to 10000; got {value}");
            return 1;
        }

        return (int)value;
    }
}
