namespace Decide.Web.Tests.Support;

/// <summary>
/// The small invented plan every <see cref="ScenarioBuilder"/> evaluation starts from: three linguistic criteria
/// (one top-level, two in the group "service"), one numeric cost criterion (price) and one gate, rated on Chen's
/// seven-term scale. The pairwise matrices are the top level {service, quality, price} and the group {staffing, response}.
/// </summary>
public static class ScenarioPlan
{
    public const string Quality = "quality";
    public const string Staffing = "staffing";
    public const string Response = "response";
    public const string Price = "price";
    public const string Insurance = "insurance";
    public const string Service = "service";

    public const string Northgate = "northgate";
    public const string Westmere = "westmere";
    public const string Eastfold = "eastfold";

    /// <summary>The linguistic criteria, in plan order.</summary>
    public static readonly string[] Linguistic = [Quality, Staffing, Response];

    /// <summary>What weights are given for: the group and every non-gate criterion.</summary>
    public static readonly string[] WeightNodes = [Service, Quality, Staffing, Response, Price];

    /// <summary>The bids, in order.</summary>
    public static readonly (string Code, string Name)[] Bidders =
        [(Northgate, "Northgate Facility Care"), (Westmere, "Westmere Cleaning Co-operative"), (Eastfold, "Eastfold Property Services")];

    /// <summary>The rating scale's codes, least favourable first (chen-rating-7).</summary>
    public static readonly string[] RatingTerms = ["VP", "P", "MP", "F", "MG", "G", "VG"];

    /// <summary>The codes of the points scale a points award rates on (points-0-5).</summary>
    public static readonly string[] PointsTerms = ["0", "1", "2", "3", "4", "5"];

    /// <summary>
    /// The plan. Under <c>"points"</c> weighting it rates on the 0–5 points scale and publishes quality 30, service 30
    /// (staffing 20, response 10) and price 40 of 100, awarded by the lowest-price ratio with a quality threshold of
    /// 40 %, a flag on prices more than 20 % below the mean of the others, and (when <paramref name="twoStage"/>)
    /// prices sealed until quality moderation is closed.
    /// </summary>
    public static object Plan(string reference, string weighting, bool twoStage = false)
    {
        var points = weighting == "points";
        var plan = BasePlan(reference, weighting, points ? PointsTerms : RatingTerms);
        if (!points)
        {
            return plan;
        }

        plan["ratingScale"] = "points-0-5";
        plan["publishedWeights"] = new { total = 100, groups = new Dictionary<string, double> { [Service] = 30 },
            criteria = new Dictionary<string, double> { [Quality] = 30, [Staffing] = 20, [Response] = 10, [Price] = 40 } };
        plan["award"] = new
        {
            binding = "points", panelScore = "moderated",
            price = new { criterion = Price, formula = "lowest-price-ratio" },
            thresholds = new { qualityShare = 0.4 },
            abnormallyLow = new { belowMeanOfOthersPercent = 20 },
            twoStage,
        };
        return plan;
    }

    private static Dictionary<string, object?> BasePlan(string reference, string weighting, string[] codes) => new Dictionary<string, object?>
    {
        ["format"] = "decide-evaluation/1",
        ["title"] = "Cleaning of three bus depots, 2027–2030",
        ["reference"] = reference,
        ["organisation"] = "Scenario Transport Board",
        ["ratingScale"] = "chen-rating-7",
        ["importanceScale"] = "chen-importance-7",
        ["groups"] = new[] { new { id = Service, name = "Service delivery" } },
        ["criteria"] = new object[]
        {
            new
            {
                id = Quality, name = "Cleaning method and quality control", kind = "linguistic", direction = "benefit",
                description = "How the method, materials and checks keep the depots clean and safe.",
                descriptors = Descriptors(codes, "no method statement", "a method that misses the depots' workshops", "a generic method",
                    "a method covering every area with monthly checks", "a method with weekly checks and photo evidence",
                    "a depot-specific method with independent audits", "as good, with a record of audited results on similar sites"),
            },
            new
            {
                id = Staffing, name = "Staffing and supervision", kind = "linguistic", direction = "benefit", group = Service,
                description = "Staff numbers per shift, supervision and cover for absence.",
                descriptors = Descriptors(codes, "no staffing plan", "staffing below the specification", "staffing without cover for absence",
                    "staffing as specified with cover", "named supervisors and cover", "a supervisor on every shift and trained cover",
                    "as good, with a low staff turnover record"),
            },
            new
            {
                id = Response, name = "Response to urgent requests", kind = "linguistic", direction = "benefit", group = Service,
                description = "How quickly spills and hazards are dealt with, day and night.",
            },
            new { id = Price, name = "Three-year price", kind = "numeric", direction = "cost", unit = "EUR" },
            new { id = Insurance, name = "Public liability insurance of at least EUR 10 million", kind = "gate" },
        },
        ["weighting"] = weighting,
    };

    /// <summary>One descriptor per term of the scale, from the least favourable (the 0–5 scale takes the first six meanings).</summary>
    private static Dictionary<string, string> Descriptors(string[] codes, params string[] meanings) =>
        codes.Zip(meanings).ToDictionary(x => x.First, x => $"The bid offers {x.Second}.");
}
