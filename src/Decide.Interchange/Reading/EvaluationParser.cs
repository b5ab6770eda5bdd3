using System.Text.Json;
using Decide.Core;
using Decide.Core.Analysis;
using Decide.Core.Fuzzy;
using Decide.Core.Model;
using Decide.Core.Scales;

namespace Decide.Interchange.Reading;

/// <summary>
/// Walks a parsed <c>decide-evaluation/1</c> document member by member, builds the engine's model and metadata,
/// then runs the engine's validator; every problem of either kind is reported together, each with its path.
/// </summary>
/// <remarks>
/// The reader goes on after a problem wherever it can, so that one pass finds everything. Where a value cannot be
/// read, it leaves it out and keeps the engine's validator from reporting the same place again in other words: a
/// validator problem is dropped when it sits at or inside a place already reported, when it only follows from a
/// scale that could not be read (the affected terms are then not checked), or when it concerns a criterion whose
/// kind could not be read.
/// </remarks>
internal sealed class EvaluationParser
{
    private static readonly string[] TopMembers =
    [
        "format", "title", "reference", "organisation", "description", "noun", "ratingScale", "importanceScale",
        "pairwiseScale", "groups", "criteria", "alternatives", "assessors", "weighting", "importance", "pairwise",
        "ratings", "moderation", "values", "gates", "options", "publishedWeights", "award", "lowPriceReviews",
        "reviews", "funding",
    ];

    private static readonly string[] GroupMembers = ["id", "name"];
    private static readonly string[] CriterionMembers = ["id", "name", "kind", "direction", "group", "descriptors", "unit", "description"];
    private static readonly string[] AlternativeMembers = ["id", "name", "requested", "topic"];
    private static readonly string[] AssessorMembers = ["id", "name", "weight", "criteria", "topics"];
    private static readonly string[] JudgementMembers = ["row", "col", "tfn", "term"];
    private static readonly string[] RatingMembers = ["term", "rationale", "declined"];
    private static readonly string[] ModeratedMembers = ["term", "reason", "agreedBy"];
    private static readonly string[] GateMembers = ["passed", "note"];
    private static readonly string[] OptionMembers = ["aggregation", "ideal", "divergenceTolerance", "acceptabilityWeights"];

    /// <summary>Stands in for a scale that could not be read, so the rest of the file can still be checked.</summary>
    private static readonly LinguisticScale StandIn = LinguisticScale.Create("stand-in", 1, 2,
        [new LinguisticTerm("a", "a", Tfn.Crisp(1)), new LinguisticTerm("b", "b", Tfn.Crisp(2))]);

    private readonly ReadContext _in = new();
    private readonly PathTranslator _paths = new();
    private readonly HashSet<string> _uncertainCriteria = new(StringComparer.Ordinal);
    private bool _ratingScaleUsable = true;
    private bool _importanceScaleUsable = true;
    private bool _pairwiseScaleUsable = true;
    private bool _weightingUnreadable;

    private readonly bool _planOnly;

    private EvaluationParser(bool planOnly)
    {
        _planOnly = planOnly;
    }

    /// <exception cref="InvalidEvaluationException">The document has problems; every one is listed.</exception>
    public static EvaluationFile Parse(JsonElement root) => new EvaluationParser(planOnly: false).Run(root);

    /// <summary>
    /// Reads a plan: the same document, in which alternatives, assessors and inputs may be absent; only the plan
    /// (title, scales, groups, criteria, weighting, options) is validated.
    /// </summary>
    /// <exception cref="InvalidEvaluationException">The plan has problems; every one is listed.</exception>
    public static EvaluationFile ParsePlan(JsonElement root) => new EvaluationParser(planOnly: true).Run(root);

    private EvaluationFile Run(JsonElement root)
    {
        var top = _in.Fields(root, JsonPath.Root, TopMembers, EvaluationFormat.ResultMembers, "an object (the evaluation)")
            ?? throw new InvalidEvaluationException(_in.Errors.ToArray());

        Format(top);
        var title = top.String("title", "the evaluation's title") ?? "";
        var reference = top.String("reference");
        var organisation = top.String("organisation");
        var description = top.String("description");
        var noun = top.String("noun");

        var ratingScale = Scale(top, "ratingScale", EvaluationFormat.DefaultRatingRange, BuiltInScales.ChenRating7, out _ratingScaleUsable);
        var importanceScale = Scale(top, "importanceScale", EvaluationFormat.DefaultImportanceRange, BuiltInScales.ChenImportance7, out _importanceScaleUsable);
        var pairwiseScale = Scale(top, "pairwiseScale", EvaluationFormat.DefaultPairwiseRange, BuiltInScales.Pairwise9, out _pairwiseScaleUsable);

        var groups = List(top, "groups", GroupMembers, required: false, (f, _) =>
            f.String("id", "the group's id") is { } id ? new CriterionGroup(id, f.String("name", "the group's name") ?? "") : null);
        var descriptions = new Dictionary<string, string>(StringComparer.Ordinal);
        var criteria = List(top, "criteria", CriterionMembers, required: true, (f, _) => Criterion(f, descriptions));
        var alternatives = List(top, "alternatives", AlternativeMembers, required: !_planOnly, (f, _) =>
            f.String("id", "the alternative's id") is { } id
                ? new Alternative(id, f.String("name", "the alternative's name") ?? "", f.Number("requested"), f.String("topic"))
                : null);
        var assessors = List(top, "assessors", AssessorMembers, required: !_planOnly, Assessor);

        var weighting = top.Choice("weighting", FormatWords.Weightings, WeightingMethod.Importance, out var weightingReadable);
        if (!weightingReadable)
        {
            // Guess from what the file holds, so that the judgements are still checked.
            _weightingUnreadable = true;
            weighting = top.Has("pairwise") && !top.Has("importance") ? WeightingMethod.Pairwise : WeightingMethod.Importance;
        }

        var award = new AwardReader(_in);
        var round = new RoundReader(_in, _paths);
        var evaluation = new Evaluation
        {
            Title = title,
            RatingScale = ratingScale,
            ImportanceScale = importanceScale,
            PairwiseScale = pairwiseScale,
            Groups = groups,
            Criteria = criteria,
            Alternatives = alternatives,
            Assessors = assessors,
            Weighting = weighting,
            Importance = Importance(top),
            Pairwise = Pairwise(top, pairwiseScale),
            Ratings = Ratings(top),
            Moderated = Moderation(top),
            Values = Values(top),
            Gates = Gates(top),
            Options = Options(top),
            Points = award.Points(top, criteria),
            Award = award.Method(top),
            LowPriceReviews = award.Reviews(top),
            Reviews = round.Reviews(top),
            Funding = round.Funding(top),
        };

        var errors = new List<EvaluationError>(_in.Errors);
        var found = _planOnly ? EvaluationValidator.ValidatePlan(ForValidation(evaluation)) : EvaluationValidator.Validate(ForValidation(evaluation));
        foreach (var error in found)
        {
            var path = _paths.ToFile(error.Path);
            if (!IsConsequence(path))
            {
                errors.Add(error with { Path = path });
            }
        }

        if (errors.Count > 0)
        {
            throw new InvalidEvaluationException(errors.Distinct().ToArray());
        }

        var metadata = new EvaluationMetadata(reference, organisation, description, noun, descriptions);
        return new EvaluationFile(evaluation, metadata);
    }

    private void Format(JsonFields top)
    {
        var format = top.String("format", $"the format name \"{EvaluationFormat.Evaluation}\"");
        if (format is null || format == EvaluationFormat.Evaluation)
        {
            return;
        }

        _in.Error(top.MemberPath("format"), format == EvaluationFormat.Results
            ? $"this is a results document (\"{EvaluationFormat.Results}\"), not an evaluation; give a file whose format is \"{EvaluationFormat.Evaluation}\""
            : $"unsupported format \"{format}\"; this version of Decide reads \"{EvaluationFormat.Evaluation}\"");
    }

    private LinguisticScale Scale(
        JsonFields top, string name, (double, double) defaultRange, LinguisticScale fallback, out bool usable)
    {
        usable = true;
        return top.TryGet(name, out var member)
            ? ScaleReader.Read(_in, member.Value, member.Path, defaultRange, fallback, out usable)
            : fallback;
    }

    /// <summary>
    /// Reads an array of objects. An element that cannot be identified is left out, and the model's positions are
    /// mapped back to the file's for the validator's paths.
    /// </summary>
    private List<T> List<T>(
        JsonFields top, string name, string[] allowed, bool required, Func<JsonFields, int, T?> read)
        where T : class
    {
        var result = new List<T>();
        if (!top.TryGet(name, out var member))
        {
            if (required)
            {
                top.Require(name, $"the list of {name}");
            }

            return result;
        }

        var fileIndex = new List<int>();
        foreach (var (i, item, at) in _in.Items(member.Value, member.Path))
        {
            if (_in.Fields(item, at, allowed) is { } fields && read(fields, result.Count) is { } value)
            {
                result.Add(value);
                fileIndex.Add(i);
            }
        }

        _paths.Map(JsonPath.Key(JsonPath.Root, name), fileIndex);
        return result;
    }

    private Criterion? Criterion(JsonFields f, Dictionary<string, string> descriptions)
    {
        if (f.String("id", "the criterion's id") is not { } id)
        {
            return null;
        }

        var name = f.String("name", "the criterion's name") ?? "";
        var kind = f.Choice("kind", FormatWords.Kinds, CriterionKind.Linguistic, out var kindReadable);
        if (!kindReadable)
        {
            _uncertainCriteria.Add(id);
            _in.Cover(f.MemberPath("direction")); // the direction rules depend on the kind
        }

        var direction = f.Choice("direction", FormatWords.Directions, Direction.Benefit, out _);
        var group = f.String("group");
        var descriptors = f.StringMap("descriptors");
        var unit = f.String("unit");
        if (f.String("description") is { } text)
        {
            descriptions.TryAdd(id, text);
        }

        return new Criterion(id, name, kind, direction, group, descriptors, unit);
    }

    private Assessor? Assessor(JsonFields f, int modelIndex)
    {
        if (f.String("id", "the assessor's id") is not { } id)
        {
            return null;
        }

        var name = f.String("name", "the assessor's name") ?? "";
        var weight = f.Number("weight") ?? 1;
        List<string>? assigned = null;
        if (f.TryGet("criteria", out var list))
        {
            assigned = [];
            var fileIndex = new List<int>();
            foreach (var (i, item, at) in _in.Items(list.Value, list.Path))
            {
                if (_in.String(item, at) is { } criterion)
                {
                    assigned.Add(criterion);
                    fileIndex.Add(i);
                }
            }

            _paths.Map(JsonPath.Key(JsonPath.Index("$.assessors", modelIndex), "criteria"), fileIndex);
        }

        List<string>? topics = null;
        if (f.TryGet("topics", out var topicList))
        {
            topics = [];
            foreach (var (_, item, at) in _in.Items(topicList.Value, topicList.Path))
            {
                if (_in.String(item, at) is { } topic)
                {
                    topics.Add(topic);
                }
            }
        }

        return new Assessor(id, name, weight, assigned, topics);
    }

    private List<ImportanceRating> Importance(JsonFields top)
    {
        var result = new List<ImportanceRating>();
        if (!top.TryGet("importance", out var member))
        {
            return result;
        }

        foreach (var assessor in _in.Members(member.Value, member.Path, "an object {assessorId: {criterionOrGroupId: term}}") ?? [])
        {
            foreach (var node in _in.Members(assessor.Value, assessor.Path, "an object {criterionOrGroupId: term}") ?? [])
            {
                if (_in.String(node.Value, node.Path) is { } term)
                {
                    result.Add(new ImportanceRating(assessor.Name, node.Name, term));
                }
            }
        }

        return result;
    }

    private List<PairwiseJudgement> Pairwise(JsonFields top, LinguisticScale scale)
    {
        var result = new List<PairwiseJudgement>();
        if (!top.TryGet("pairwise", out var member))
        {
            return result;
        }

        foreach (var assessor in _in.Members(member.Value, member.Path, "an object {assessorId: [judgements]}") ?? [])
        {
            var fileIndex = new List<int>();
            foreach (var (i, item, at) in _in.Items(assessor.Value, assessor.Path))
            {
                if (_in.Fields(item, at, JudgementMembers) is { } f && Judgement(assessor.Name, f, at, scale) is { } judgement)
                {
                    result.Add(judgement);
                    fileIndex.Add(i);
                }
            }

            _paths.Map(assessor.Path, fileIndex);
        }

        return result;
    }

    private PairwiseJudgement? Judgement(string assessor, JsonFields f, string at, LinguisticScale scale)
    {
        var row = f.String("row", "the criterion or group id of the row");
        var col = f.String("col", "the criterion or group id of the column");
        var value = Tfn.One;
        string? term = null;
        var (hasTfn, hasTerm) = (f.Has("tfn"), f.Has("term"));
        if (hasTfn && hasTerm)
        {
            _in.Error(at, "give either \"tfn\" or \"term\", not both");
        }
        else if (!hasTfn && !hasTerm)
        {
            _in.Error(at, "required: the judgement, as \"term\" (a code of the pairwise scale) or \"tfn\" [lower, middle, upper]");
        }
        else if (hasTfn)
        {
            value = f.Tfn("tfn") ?? Tfn.One;
        }
        else if (f.String("term") is { } code)
        {
            if (_pairwiseScaleUsable && scale.TryFind(code, out var step))
            {
                (value, term) = (scale[step].Value, code);
            }
            else if (_pairwiseScaleUsable)
            {
                _in.Error(f.MemberPath("term"), $"unknown term \"{code}\"; the pairwise scale has {scale.CodeList}");
            }
        }

        return row is null || col is null ? null : new PairwiseJudgement(assessor, row, col, value, term);
    }

    private List<Rating> Ratings(JsonFields top)
    {
        var result = new List<Rating>();
        if (!top.TryGet("ratings", out var member))
        {
            return result;
        }

        foreach (var assessor in _in.Members(member.Value, member.Path, "an object {assessorId: {alternativeId: {criterionId: rating}}}") ?? [])
        {
            foreach (var alternative in _in.Members(assessor.Value, assessor.Path, "an object {alternativeId: {criterionId: rating}}") ?? [])
            {
                foreach (var cell in _in.Members(alternative.Value, alternative.Path, "an object {criterionId: rating}") ?? [])
                {
                    if (Rating(assessor.Name, alternative.Name, cell) is { } rating)
                    {
                        result.Add(rating);
                    }
                }
            }
        }

        return result;
    }

    private Rating? Rating(string assessor, string alternative, JsonMember cell)
    {
        switch (cell.Value.ValueKind)
        {
            case JsonValueKind.String:
                return new Rating(assessor, alternative, cell.Name, cell.Value.GetString());
            case JsonValueKind.Object:
                var before = _in.ErrorCount;
                var f = _in.Fields(cell.Value, cell.Path, RatingMembers)!;
                var rating = new Rating(assessor, alternative, cell.Name, f.String("term"), f.String("rationale"), f.String("declined"));
                if (_in.ErrorCount > before && rating is { Term: null, Declined: null })
                {
                    CoverCell(alternative, cell);
                }

                return rating;
            default:
                _in.WrongType(cell.Value, cell.Path, "a term (string), {\"term\", \"rationale\"} or {\"declined\": reason}");
                CoverCell(alternative, cell);
                return null;
        }
    }

    /// <summary>
    /// A rating that could not be read: the engine's "not rated" and "nobody rated" for that cell follow from it.
    /// </summary>
    private void CoverCell(string alternative, JsonMember cell)
    {
        _in.Cover(cell.Path);
        _in.Cover(JsonPath.Keys("$.ratings.*", alternative, cell.Name));
    }

    private List<ModeratedRating> Moderation(JsonFields top)
    {
        var result = new List<ModeratedRating>();
        if (!top.TryGet("moderation", out var member))
        {
            return result;
        }

        foreach (var alternative in _in.Members(member.Value, member.Path, "an object {alternativeId: {criterionId: moderated value}}") ?? [])
        {
            foreach (var cell in _in.Members(alternative.Value, alternative.Path, "an object {criterionId: moderated value}") ?? [])
            {
                if (Moderated(alternative.Name, cell) is { } moderated)
                {
                    result.Add(moderated);
                }
            }
        }

        return result;
    }

    /// <summary>
    /// A moderated value. Without a readable term it is left out, and the engine's "nobody rated" for a cell everyone
    /// declined follows from that, so it is not reported again. A missing reason is read as empty: the validator's
    /// complaint about it sits at the place already reported.
    /// </summary>
    private ModeratedRating? Moderated(string alternative, JsonMember cell)
    {
        var f = _in.Fields(cell.Value, cell.Path, ModeratedMembers, expected: "a moderated value {\"term\", \"reason\", \"agreedBy\"}");
        var term = f?.String("term", "the term of the rating scale the panel agreed on");
        var reason = f?.String("reason", "why the panel agreed on the term, written as a minute a bidder may read");
        List<string>? agreedBy = null;
        if (f is not null && f.TryGet("agreedBy", out var list))
        {
            agreedBy = [];
            foreach (var (_, item, at) in _in.Items(list.Value, list.Path))
            {
                if (_in.String(item, at) is { } assessor)
                {
                    agreedBy.Add(assessor);
                }
            }
        }

        if (term is null)
        {
            _in.Cover(cell.Path);
            _in.Cover(JsonPath.Keys("$.ratings.*", alternative, cell.Name));
            return null;
        }

        return new ModeratedRating(alternative, cell.Name, term, reason ?? "", agreedBy);
    }

    private List<NumericValue> Values(JsonFields top)
    {
        var result = new List<NumericValue>();
        if (!top.TryGet("values", out var member))
        {
            return result;
        }

        foreach (var alternative in _in.Members(member.Value, member.Path, "an object {alternativeId: {criterionId: number}}") ?? [])
        {
            foreach (var cell in _in.Members(alternative.Value, alternative.Path, "an object {criterionId: number}") ?? [])
            {
                if (_in.Number(cell.Value, cell.Path) is { } value)
                {
                    result.Add(new NumericValue(alternative.Name, cell.Name, value));
                }
            }
        }

        return result;
    }

    private List<GateResult> Gates(JsonFields top)
    {
        var result = new List<GateResult>();
        if (!top.TryGet("gates", out var member))
        {
            return result;
        }

        foreach (var alternative in _in.Members(member.Value, member.Path, "an object {alternativeId: {criterionId: result}}") ?? [])
        {
            foreach (var cell in _in.Members(alternative.Value, alternative.Path, "an object {criterionId: result}") ?? [])
            {
                if (cell.Value.ValueKind is JsonValueKind.True or JsonValueKind.False)
                {
                    result.Add(new GateResult(alternative.Name, cell.Name, cell.Value.GetBoolean()));
                }
                else if (cell.Value.ValueKind == JsonValueKind.Object)
                {
                    var f = _in.Fields(cell.Value, cell.Path, GateMembers)!;
                    var passed = f.Boolean("passed", "true if the alternative passed the gate, false if it failed");
                    var note = f.String("note");
                    if (passed is { } p)
                    {
                        result.Add(new GateResult(alternative.Name, cell.Name, p, note));
                    }
                    else
                    {
                        _in.Cover(cell.Path);
                    }
                }
                else
                {
                    _in.WrongType(cell.Value, cell.Path, "true, false or {\"passed\", \"note\"}");
                }
            }
        }

        return result;
    }

    private AnalysisOptions Options(JsonFields top)
    {
        if (!top.TryGet("options", out var member) || _in.Fields(member.Value, member.Path, OptionMembers) is not { } f)
        {
            return new AnalysisOptions();
        }

        var defaults = new AnalysisOptions();
        return new AnalysisOptions(
            f.Choice("aggregation", FormatWords.Aggregations, defaults.Aggregation, out _),
            f.Choice("ideal", FormatWords.Ideals, defaults.Ideal, out _),
            f.TryGet("divergenceTolerance", out var tolerance) ? Tolerance(tolerance) ?? defaults.DivergenceTolerance : defaults.DivergenceTolerance,
            f.Choice("acceptabilityWeights", FormatWords.AcceptabilityWeightings, defaults.AcceptabilityWeights, out _));
    }

    /// <summary>A number of scale steps: a whole number, 0 or more (2.0 is accepted as 2, as JSON Schema does).</summary>
    private int? Tolerance(JsonMember member)
    {
        if (_in.Number(member.Value, member.Path) is not { } number)
        {
            return null;
        }

        if (number != Math.Floor(number) || number < 0)
        {
            _in.Error(member.Path, $"the divergence tolerance is a whole number of scale steps, 0 or more; got {member.Value.GetRawText()}");
            return null;
        }

        if (number > int.MaxValue)
        {
            _in.Error(member.Path, $"the divergence tolerance {member.Value.GetRawText()} is too large; a scale has far fewer steps");
            return null;
        }

        return (int)number;
    }

    /// <summary>The model the validator checks: terms of a scale that could not be read are not checked.</summary>
    private Evaluation ForValidation(Evaluation e)
    {
        if (!_ratingScaleUsable)
        {
            e = e with
            {
                RatingScale = StandIn,
                Ratings = e.Ratings.Select(r => r.Term is null ? r : r with { Term = StandIn[0].Code }).ToArray(),
                Moderated = e.Moderated.Select(m => m with { Term = StandIn[0].Code }).ToArray(),
                Criteria = e.Criteria.Select(c => c with { Descriptors = null }).ToArray(),
            };
        }

        if (!_importanceScaleUsable)
        {
            e = e with
            {
                ImportanceScale = StandIn,
                Importance = e.Importance.Select(r => r with { Term = StandIn[0].Code }).ToArray(),
            };
        }

        return e;
    }

    private bool IsConsequence(string path)
    {
        if (_in.Covers(path))
        {
            return true;
        }

        if (_weightingUnreadable && path is "$.importance" or "$.pairwise" or "$.publishedWeights")
        {
            return true;
        }

        if (!_ratingScaleUsable && (path == "$.ratingScale" || path.StartsWith("$.award.thresholds.minimumTerms", StringComparison.Ordinal)))
        {
            return true;
        }

        if (_uncertainCriteria.Count > 0
            && (path.StartsWith("$.ratings", StringComparison.Ordinal) || path.StartsWith("$.values", StringComparison.Ordinal)
                || path.StartsWith("$.gates", StringComparison.Ordinal) || path.StartsWith("$.importance", StringComparison.Ordinal)))
        {
            foreach (var id in _uncertainCriteria)
            {
                if (path.EndsWith(JsonPath.Key("", id), StringComparison.Ordinal))
                {
                    return true;
                }
            }
        }

        return false;
    }
}
