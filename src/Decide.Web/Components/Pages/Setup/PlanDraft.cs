using System.Text;
using System.Text.Json;
using Decide.Core.Award;
using Decide.Core.Model;
using Decide.Core.Scales;
using Decide.Interchange.Plans;
using Decide.Web.Features.Evaluations;

namespace Decide.Web.Components.Pages.Setup;

/// <summary>
/// The plan while the facilitator edits it: read from the stored plan by the file format's lenient reader (a plan in
/// the making may not be complete), changed by the setup steps, and written back by the format's plan writer, with
/// the settings that live beside it. No JSON is read or written here. The panel and the bids are not part of it.
/// </summary>
public sealed class PlanDraft
{
    /// <summary>Rating scales to choose from (built in).</summary>
    public static readonly IReadOnlyList<string> RatingScales = ["chen-rating-7", "rating-5", "points-0-5", "points-0-10"];

    /// <summary>Importance scales to choose from (built in).</summary>
    public static readonly IReadOnlyList<string> ImportanceScales = ["chen-importance-7", "importance-5"];

    /// <summary>Nouns for what is chosen, offered as suggestions; any other plural noun is fine.</summary>
    public static readonly IReadOnlyList<string> Nouns = ["bids", "suppliers", "tenders", "candidates", "options"];

    public string Title { get; set; } = "";

    public string? Reference { get; set; }

    public string? Organisation { get; set; }

    /// <summary>The purpose of the evaluation (the plan's <c>description</c>).</summary>
    public string? Description { get; set; }

    /// <summary>What is chosen, plural ("bids"); the plan's <c>noun</c>.</summary>
    public string? Noun { get; set; }

    public PlanScale RatingScale { get; set; } = PlanScale.Named("chen-rating-7");

    public PlanScale ImportanceScale { get; set; } = PlanScale.Named("chen-importance-7");

    public PlanScale PairwiseScale { get; set; } = PlanScale.Named("pairwise-9");

    public List<GroupDraft> Groups { get; } = [];

    public List<CriterionDraft> Criteria { get; } = [];

    public WeightingMethod Weighting { get; set; } = WeightingMethod.Importance;

    /// <summary>What the published points add up to (points weighting); 100 for percentages.</summary>
    public double PointsTotal { get; set; } = 100;

    /// <summary>The published award method.</summary>
    public AwardDraft Award { get; set; } = new();

    /// <summary>True when each reviewer reads only the applications assigned to them (a grant round).</summary>
    public bool Round { get; set; }

    /// <summary>Reviewers per application in a round.</summary>
    public int ReviewersPerApplication { get; set; } = 3;

    /// <summary>The most applications one reviewer may be given in a round.</summary>
    public int MaxLoad { get; set; } = 20;

    /// <summary>True to show a ranking with each reviewer's terms standardised beside the raw one.</summary>
    public bool Calibrate { get; set; }

    /// <summary>The round's budget, or null for no funding line.</summary>
    public double? Budget { get; set; }

    /// <summary>How the budget is spent down the ranking.</summary>
    public FundingRule FundingRule { get; set; } = FundingRule.StopAtFirstUnaffordable;

    /// <summary>The unit of the budget and the requested amounts ("EUR").</summary>
    public string? Currency { get; set; }

    public AggregationRule Aggregation { get; set; } = AggregationRule.Mean;

    public IdealPoints Ideal { get; set; } = IdealPoints.Unit;

    /// <summary>The largest spread of one cell's terms, in rating-scale steps, that needs no discussion.</summary>
    public int DivergenceTolerance { get; set; } = 2;

    public AcceptabilityWeights AcceptabilityWeights { get; set; } = AcceptabilityWeights.Fuzzy;

    public int MinRationaleLength { get; set; }

    public bool PricesVisibleToAssessors { get; set; }

    public int RequiredApprovals { get; set; } = 1;

    /// <summary>The rating scale's terms, or Chen's seven when a custom scale cannot be read.</summary>
    public LinguisticScale RatingTerms => RatingScale.Resolve("ratingScale") ?? BuiltInScales.ChenRating7;

    /// <summary>The settings kept beside the plan.</summary>
    public EvaluationSettings Settings => new(MinRationaleLength, PricesVisibleToAssessors, RequiredApprovals);

    /// <summary>Reads a stored plan (leniently, <see cref="PlanDocumentReader"/>); members it does not recognise are left at their defaults.</summary>
    public static PlanDraft From(JsonElement plan, EvaluationSettings settings)
    {
        var read = PlanDocumentReader.Read(plan);
        var d = new PlanDraft
        {
            Title = read.Title,
            Reference = read.Reference,
            Organisation = read.Organisation,
            Description = read.Description,
            Noun = read.Noun,
            RatingScale = read.RatingScale,
            ImportanceScale = read.ImportanceScale,
            PairwiseScale = read.PairwiseScale,
            Weighting = read.Weighting,
            PointsTotal = read.Points?.Total ?? 100,
            Award = AwardDraft.From(read.Award),
            Round = read.Reviews is not null,
            ReviewersPerApplication = read.Reviews?.ReviewersPerApplication ?? 3,
            MaxLoad = read.Reviews?.MaxLoad ?? 20,
            Calibrate = read.Reviews?.Calibration == ReviewerCalibration.Standardise,
            Budget = read.Funding?.Budget,
            FundingRule = read.Funding?.Rule ?? FundingRule.StopAtFirstUnaffordable,
            Currency = read.Funding?.Currency,
            Aggregation = read.Options.Aggregation,
            Ideal = read.Options.Ideal,
            DivergenceTolerance = read.Options.DivergenceTolerance,
            AcceptabilityWeights = read.Options.AcceptabilityWeights,
            MinRationaleLength = settings.MinRationaleLength,
            PricesVisibleToAssessors = settings.PricesVisibleToAssessors,
            RequiredApprovals = settings.RequiredApprovals,
        };
        d.Groups.AddRange(read.Groups.Select(g => new GroupDraft
        {
            Id = g.Id, Name = g.Name, Stored = true, Points = read.Points?.Groups.TryGetValue(g.Id, out var points) == true ? points : null,
        }));
        foreach (var c in read.Criteria)
        {
            var criterion = new CriterionDraft
            {
                Id = c.Id, Name = c.Name, Kind = c.Kind, Direction = c.Direction, Group = c.Group, Unit = c.Unit,
                Description = c.Description, Stored = true,
                Points = read.Points?.PointsOf(c.Id), MinimumTerm = read.Award?.MinimumTerms?.GetValueOrDefault(c.Id),
            };
            foreach (var (code, text) in c.Descriptors ?? new Dictionary<string, string>())
            {
                criterion.Descriptors[code] = text;
            }

            d.Criteria.Add(criterion);
        }

        return d;
    }

    /// <summary>The plan being edited, as the file format's plan document.</summary>
    public PlanDocument ToDocument() => new()
    {
        Title = Title,
        Reference = Reference,
        Organisation = Organisation,
        Description = Description,
        Noun = Noun,
        RatingScale = RatingScale,
        ImportanceScale = ImportanceScale,
        PairwiseScale = PairwiseScale,
        Groups = Groups.Select(g => new CriterionGroup(g.Id, g.Name)).ToArray(),
        Criteria = Criteria.Select(c => new PlanCriterion(c.Id, c.Name, c.Kind, c.Direction, c.Group, c.Unit, c.Description,
            new Dictionary<string, string>(c.Descriptors, StringComparer.Ordinal))).ToArray(),
        Weighting = Weighting,
        Points = Weighting == WeightingMethod.Points ? PublishedPoints() : null,
        Award = Weighting == WeightingMethod.Points
            ? Award.ToMethod(Criteria.Where(c => c.Kind == CriterionKind.Linguistic && !string.IsNullOrWhiteSpace(c.MinimumTerm))
                .ToDictionary(c => c.Id, c => c.MinimumTerm!, StringComparer.Ordinal))
            : null,
        Options = new AnalysisOptions(Aggregation, Ideal, DivergenceTolerance, AcceptabilityWeights),
        Reviews = Round ? new ReviewDesign(ReviewersPerApplication, MaxLoad, [], Calibrate ? ReviewerCalibration.Standardise : ReviewerCalibration.None) : null,
        Funding = Budget is { } budget ? new FundingPlan(budget, FundingRule, string.IsNullOrWhiteSpace(Currency) ? null : Currency.Trim()) : null,
    };

    /// <summary>The published points as the plan states them: every group and scored criterion that has points.</summary>
    private PublishedWeights PublishedPoints() => new(
        PointsTotal,
        Groups.Where(g => g.Points is not null).ToDictionary(g => g.Id, g => g.Points!.Value, StringComparer.Ordinal),
        Criteria.Where(c => c.Kind != CriterionKind.Gate && c.Points is not null).Select(c => new PublishedCriterion(c.Id, c.Points!.Value, c.Group)).ToArray());

    /// <summary>Adds a criterion (at the end) and returns it.</summary>
    public CriterionDraft AddCriterion()
    {
        var criterion = new CriterionDraft();
        Criteria.Add(criterion);
        return criterion;
    }

    /// <summary>Adds a group and returns it.</summary>
    public GroupDraft AddGroup()
    {
        var group = new GroupDraft();
        Groups.Add(group);
        return group;
    }

    /// <summary>Removes a group; its criteria stay, outside any group.</summary>
    public void RemoveGroup(GroupDraft group)
    {
        Groups.Remove(group);
        foreach (var c in Criteria.Where(c => c.Group is not null && c.Group == group.Id))
        {
            c.Group = null;
        }
    }

    /// <summary>Names a group; a group not stored yet takes its id from the name, and its criteria follow.</summary>
    public void NameGroup(GroupDraft group, string name)
    {
        group.Name = name;
        if (!group.Stored)
        {
            var oldId = group.Id;
            group.Id = Unique(Slug(name, "group"), TakenExcept(group.Id));
            foreach (var c in Criteria.Where(c => c.Group == oldId))
            {
                c.Group = group.Id;
            }
        }
    }

    /// <summary>Names a criterion; a criterion not stored yet takes its id from the name.</summary>
    public void NameCriterion(CriterionDraft criterion, string name)
    {
        criterion.Name = name;
        if (!criterion.Stored)
        {
            criterion.Id = Unique(Slug(name, "criterion"), TakenExcept(criterion.Id));
        }
    }

    /// <summary>After a save: every id is now part of the stored plan and stays as it is.</summary>
    public void MarkStored()
    {
        Groups.ForEach(g => g.Stored = true);
        Criteria.ForEach(c => c.Stored = true);
    }

    /// <summary>
    /// Gives every criterion and group without an id one made from its name (lower case, letters, digits and
    /// <c>_</c>), unique among both and never <c>panel</c>. Ids already given are kept.
    /// </summary>
    public void AssignIds()
    {
        var taken = new HashSet<string>(Groups.Select(g => g.Id).Concat(Criteria.Select(c => c.Id)).Where(id => id.Length > 0), StringComparer.Ordinal);
        foreach (var g in Groups.Where(g => g.Id.Trim().Length == 0))
        {
            var oldId = g.Id;
            g.Id = Unique(Slug(g.Name, "group"), taken);
            foreach (var c in Criteria.Where(c => c.Group == oldId))
            {
                c.Group = g.Id;
            }
        }

        foreach (var c in Criteria.Where(c => c.Id.Trim().Length == 0))
        {
            c.Id = Unique(Slug(c.Name, "criterion"), taken);
        }
    }

    /// <summary>The plan document (<c>decide-evaluation/1</c>, without panel, bids or inputs), by <see cref="PlanDocumentWriter"/>.</summary>
    public string ToJson() => PlanDocumentWriter.ToJson(ToDocument());

    /// <summary>The plan document as a JSON element, for <see cref="UpdatePlanRequest"/>.</summary>
    public JsonElement ToElement()
    {
        using var document = JsonDocument.Parse(ToJson());
        return document.RootElement.Clone();
    }

    /// <summary>A request to store this plan and its settings on top of <paramref name="version"/>.</summary>
    public UpdatePlanRequest ToRequest(long version) => new(ToElement(), Settings, version);

    private static string Slug(string name, string fallback)
    {
        var sb = new StringBuilder();
        foreach (var ch in name.Trim().ToLowerInvariant())
        {
            if (char.IsAsciiLetterOrDigit(ch))
            {
                sb.Append(ch);
            }
            else if (sb.Length > 0 && sb[^1] != '_')
            {
                sb.Append('_');
            }

            if (sb.Length >= 24)
            {
                break;
            }
        }

        var slug = sb.ToString().Trim('_');
        return slug.Length == 0 || slug == "panel" ? fallback : slug;
    }

    private HashSet<string> TakenExcept(string own)
    {
        var taken = new HashSet<string>(Groups.Select(g => g.Id).Concat(Criteria.Select(c => c.Id)).Where(id => id.Length > 0), StringComparer.Ordinal);
        taken.Remove(own);
        return taken;
    }

    private static string Unique(string id, HashSet<string> taken)
    {
        var candidate = id;
        for (var n = 2; !taken.Add(candidate); n++)
        {
            candidate = $"{id}_{n}";
        }

        return candidate;
    }
}
