using Decide.Core.Model;
using Decide.Core.Rounds;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace Decide.Assignment.Tests;

public static class Rounds
{
    public static Arbitrary<RandomRound> Round() =>
        Gen.Choose(0, int.MaxValue).Select(RandomRound.Generate).ToArbitrary();
}

[Properties(Arbitrary = [typeof(Rounds)], MaxTest = 60)]
public sealed class ReviewerAssignmentProperties
{
    [Property]
    public void Every_application_gets_k_different_reviewers(RandomRound round)
    {
        var design = ReviewerAssignment.Propose(round.Request).Design;
        foreach (var application in round.Request.Applications)
        {
            var readers = design.ReviewersOf(application.Id);
            Assert.Equal(round.Request.ReviewersPerApplication, readers.Count);
            Assert.Equal(readers.Count, readers.Distinct().Count());
        }
    }

    [Property]
    public void Nobody_reads_an_application_they_are_conflicted_with(RandomRound round)
    {
        var design = ReviewerAssignment.Propose(round.Request).Design;
        foreach (var reviewer in design.Assigned)
        {
            foreach (var application in reviewer.Alternatives)
            {
                Assert.DoesNotContain((reviewer.Assessor, application), round.Request.Conflicts);
            }
        }
    }

    [Property]
    public void Nobody_reads_more_than_the_cap_and_loads_are_even_where_conflicts_allow(RandomRound round)
    {
        var proposal = ReviewerAssignment.Propose(round.Request);
        Assert.All(proposal.Design.Assigned, r => Assert.True(r.Alternatives.Count <= round.Request.MaxLoad));
        Assert.True(proposal.HighestLoad <= round.Request.MaxLoad);
        Assert.Equal(proposal.Design.Assigned.Max(r => r.Alternatives.Count), proposal.HighestLoad);
    }

    [Property]
    public void The_design_is_connected_because_a_connected_one_exists(RandomRound round)
    {
        var proposal = ReviewerAssignment.Propose(round.Request);
        var parts = DesignConnectivity.Parts(round.Request.Applications.Select(a => a.Id).ToArray(), proposal.Design.Assigned);
        Assert.Single(parts);
        Assert.Equal(1, proposal.Parts);
    }

    [Property]
    public void The_same_seed_gives_the_same_proposal(RandomRound round)
    {
        var a = ReviewerAssignment.Propose(round.Request).Design.Assigned;
        var b = ReviewerAssignment.Propose(round.Request).Design.Assigned;
        Assert.Equal(a.Select(r => $"{r.Assessor}:{string.Join(",", r.Alternatives)}"), b.Select(r => $"{r.Assessor}:{string.Join(",", r.Alternatives)}"));
    }

    [Property]
    public void The_proposal_passes_the_engines_design_checks(RandomRound round)
    {
        var design = ReviewerAssignment.Propose(round.Request).Design;
        var evaluation = new Evaluation
        {
            Title = "round",
            Criteria = [new Criterion("C1", "Merit")],
            Alternatives = round.Request.Applications.Select(a => new Alternative(a.Id, a.Name)).ToArray(),
            Assessors = round.Request.Reviewers.Select(r => new Assessor(r.Id, r.Name)).ToArray(),
            Reviews = design,
        };
        Assert.Empty(DesignChecks.Check(evaluation, round.Request.Conflicts));
    }
}

public sealed class ReviewerAssignmentTests
{
    private static AssignmentRequest Round(int applications, int reviewers, int k, int cap, params (string, string)[] conflicts) => new(
        Enumerable.Range(1, applications).Select(a => new Application($"A{a}", $"Application {a}")).ToArray(),
        Enumerable.Range(1, reviewers).Select(x => new Reviewer($"R{x}", $"Reviewer {x}")).ToArray(),
        k,
        cap,
        conflicts.ToHashSet());

    [Fact]
    public void Too_few_reviewers_are_counted_in_the_refusal()
    {
        // 120 × 3 = 360 reviews; 10 reviewers × 30 = 300; 60 more reviews at 30 each = 2 more reviewers.
        var e = Assert.Throws<AssignmentInfeasibleException>(() => ReviewerAssignment.Propose(Round(120, 10, 3, 30)));
        var reason = Assert.Single(e.Reasons);
        Assert.Contains("360 reviews", reason);
        Assert.Contains("give 300", reason);
        Assert.Contains("2 more reviewers are missing", reason);
        Assert.Contains("raise the most each may read to 36", reason);
    }

    [Fact]
    public void An_application_with_too_few_unconflicted_reviewers_is_named()
    {
        var e = Assert.Throws<AssignmentInfeasibleException>(() =>
            ReviewerAssignment.Propose(Round(4, 3, 2, 4, ("R1", "A2"), ("R2", "A2"))));
        var reason = Assert.Single(e.Reasons);
        Assert.Contains("\"Application 2\" has 1 reviewer without a declared conflict of interest and needs 2: 1 more reviewer is missing", reason);
    }

    [Fact]
    public void Fewer_reviewers_than_k_is_refused()
    {
        var e = Assert.Throws<AssignmentInfeasibleException>(() => ReviewerAssignment.Propose(Round(5, 2, 3, 10)));
        Assert.Contains(e.Reasons, r => r.Contains("needs 3 different reviewers but the panel has 2: 1 more reviewer is missing"));
    }

    [Fact]
    public void Loads_are_even_and_pairs_spread_on_a_grant_round()
    {
        // 120 applications, 24 reviewers, k = 3: 360 reviews, exactly 15 each. Each reviewer meets 15 × 2 = 30
        // co-readers among 23 colleagues, so a pair that reads together more than three times is avoidable; the
        // sliding window a design without spreading would use puts pairs together 10 times.
        var proposal = ReviewerAssignment.Propose(Round(120, 24, 3, 20));
        Assert.Equal(15, proposal.LowestLoad);
        Assert.Equal(15, proposal.HighestLoad);
        Assert.True(proposal.MostSharedByOnePair <= 3, $"a pair reads {proposal.MostSharedByOnePair} applications together");
        Assert.Equal(1, proposal.Parts);
    }

    [Fact]
    public void A_reviewer_who_knows_the_field_is_preferred()
    {
        var request = new AssignmentRequest(
            [new Application("A1", "Wetland survey", "water"), new Application("A2", "Mill restoration", "heritage")],
            [new Reviewer("R1", "Reviewer 1", ["water"]), new Reviewer("R2", "Reviewer 2", ["heritage"]), new Reviewer("R3", "Reviewer 3", ["water", "heritage"])],
            1,
            1,
            new HashSet<(string, string)>());
        var proposal = ReviewerAssignment.Propose(request);
        Assert.Equal(2, proposal.TopicMatches);
        Assert.Equal(2, proposal.TopicReviews);
    }
}
