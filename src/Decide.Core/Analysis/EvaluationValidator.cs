using Decide.Core.Consistency;
using Decide.Core.Model;
using Decide.Core.Weighting;

namespace Decide.Core.Analysis;

/// <summary>
/// Checks an evaluation before analysis and reports every problem with its place (a JSON path into the portable
/// file) and a reason a user can act on. Nothing is repaired or imputed.
/// </summary>
public static class EvaluationValidator
{

    /// <summary>Returns every problem found; an empty list means the evaluation can be analysed.</summary>
    public static IReadOnlyList<EvaluationError> Validate(Evaluation evaluation)
    {
        var v = new Walker(evaluation);
        v.Run();
        return Award.AwardChecks.ExcusePricesOfExcluded(evaluation, v.Errors);
    }

    /// <summary>
    /// Checks the plan alone — title, scales, groups, criteria and options — before any panel, bid or input exists
    /// (the service's setup stage). Alternatives, assessors and inputs are ignored.
    /// </summary>
    public static IReadOnlyList<EvaluationError> ValidatePlan(Evaluation evaluation)
    {
        var v = new Walker(evaluation, planOnly: true);
        v.Run();
        return v.Errors;
    }

    /// <summary>Throws <see cref="InvalidEvaluationException"/> listing every problem, if there is any.</summary>
    public static void EnsureValid(Evaluation evaluation)
    {
        var errors = Validate(evaluation);
        if (errors.Count > 0)
        {
            throw new InvalidEvaluationException(errors);
        }
    }

    private sealed class Walker(Evaluation e, bool planOnly = false)
    {
        private readonly List<EvaluationError> _found = [];
        private readonly Dictionary<string, Criterion> _criteria = new(StringComparer.Ordinal);
        private readonly Dictionary<string, CriterionGroup> _groups = new(StringComparer.Ordinal);
        private readonly Dictionary<string, Assessor> _assessors = new(StringComparer.Ordinal);
        private readonly HashSet<string> _alternatives = new(StringComparer.Ordinal);
        private readonly Dictionary<IReadOnlyList<string>, HashSet<string>> _assignedSets = new(ReferenceEqualityComparer.Instance);

        public IReadOnlyList<EvaluationError> Errors => _found;

        public void Run()
        {
            if (string.IsNullOrWhiteSpace(e.Title))
            {
                Add("$.title", "the evaluation needs a title");
            }

            Structure();
            if (e.Options.DivergenceTolerance < 0)
            {
                Add("$.options.divergenceTolerance", $"the divergence tolerance is a number of scale steps, 0 or more; got {e.Options.DivergenceTolerance}");
            }

            GeometricAggregation();
            _found.AddRange(Award.AwardChecks.Plan(e));
            if (planOnly)
            {
                _found.AddRange(Rounds.DesignChecks.Plan(e));
                return;
            }

            _found.AddRange(Rounds.DesignChecks.Check(e));
            var excluded = Gates();
            switch (e.Weighting)
            {
                case WeightingMethod.Importance:
                    Importance();
                    break;
                case WeightingMethod.Pairwise:
                    Pairwise();
                    break;
            }

            Values(excluded);
            var moderated = Moderation();
            Ratings(excluded, moderated);
            _found.AddRange(Award.AwardChecks.Inputs(e));
        }

        private void Add(string path, string reason) => _found.Add(new EvaluationError(path, reason));

        /// <summary>
        /// The geometric mean multiplies the assessors' values: on a scale with a term whose lower value is 0, one
        /// such rating zeroes the panel's lower value (and its middle too when that is 0) whatever everyone else said,
        /// which is a veto and not an average. Refused by name instead of computed.
        /// </summary>
        private void GeometricAggregation()
        {
            if (e.Options.Aggregation != AggregationRule.Geometric)
            {
                return;
            }

            foreach (var (role, zero) in Aggregation.GroupAggregation.TermsAtZero(e))
            {
                var terms = string.Join(", ", zero.Select(t => $"{t.Code} ({t.Label}) {t.Value}"));
                Add("$.options.aggregation",
                    $"the geometric mean multiplies the assessors' values, so on the {role} one rating of a term whose lowest value is 0 would set the panel's value to 0 whatever the others said; {terms} {(zero.Count == 1 ? "has" : "have")} a value of 0. Use the weighted mean, or {(role.StartsWith('i') ? "an" : "a")} {role} whose terms are all above 0");
            }
        }

        private void Structure()
        {
            for (var g = 0; g < e.Groups.Count; g++)
            {
                var group = e.Groups[g];
                var at = $"$.groups[{g}]";
                if (CheckId(group.Id, $"{at}.id") && !_groups.TryAdd(group.Id, group))
                {
                    Add($"{at}.id", $"group id \"{group.Id}\" is used twice");
                }
            }

            if (e.Criteria.Count == 0)
            {
                Add("$.criteria", "the evaluation needs at least one criterion");
            }

            for (var c = 0; c < e.Criteria.Count; c++)
            {
                var criterion = e.Criteria[c];
                var at = $"$.criteria[{c}]";
                if (CheckId(criterion.Id, $"{at}.id"))
                {
                    if (_groups.ContainsKey(criterion.Id))
                    {
                        Add($"{at}.id", $"criterion id \"{criterion.Id}\" is also a group id; ids of criteria and groups must differ");
                    }
                    else if (!_criteria.TryAdd(criterion.Id, criterion))
                    {
                        Add($"{at}.id", $"criterion id \"{criterion.Id}\" is used twice");
                    }
                }

                if (string.IsNullOrWhiteSpace(criterion.Name))
                {
                    Add($"{at}.name", $"criterion \"{criterion.Id}\" needs a name");
                }

                if (criterion.Group is { } group)
                {
                    if (criterion.Kind == CriterionKind.Gate)
                    {
                        Add($"{at}.group", $"gate \"{criterion.Id}\" cannot sit in a group: gates are pass/fail and carry no weight");
                    }
                    else if (!_groups.ContainsKey(group))
                    {
                        Add($"{at}.group", $"unknown group \"{group}\"; declare it under $.groups");
                    }
                }

                if (criterion.Kind == CriterionKind.Linguistic && criterion.Direction == Direction.Cost
                    && e.RatingScale.Terms.Min(t => t.Value.Lower) <= 0)
                {
                    Add($"{at}.direction",
                        $"linguistic cost criterion \"{criterion.Id}\" needs a rating scale whose terms all have a lower value above 0 (Chen's cost normalisation divides by it), and \"{e.RatingScale.Name}\" starts at 0; rate it as a benefit instead (for example, how well a risk is managed)");
                }

                if (criterion.Descriptors is { } descriptors)
                {
                    foreach (var code in descriptors.Keys)
                    {
                        if (!e.RatingScale.TryFind(code, out _))
                        {
                            Add(JsonPath.Keys(at, "descriptors", code), $"descriptor for unknown term \"{code}\"; the rating scale has {e.RatingScale.CodeList}");
                        }
                    }
                }
            }

            if (e.Criteria.Count > 0 && e.Criteria.All(c => c.Kind == CriterionKind.Gate))
            {
                Add("$.criteria", "every criterion is a pass/fail gate; at least one criterion must be scored (linguistic or numeric) to rank the alternatives");
            }

            foreach (var group in e.Groups)
            {
                if (!e.Criteria.Any(c => c.Group == group.Id))
                {
                    Add(JsonPath.Key("$.groups", group.Id), $"group \"{group.Id}\" has no criteria");
                }
            }

            if (e.Alternatives.Count == 0 && !planOnly)
            {
                Add("$.alternatives", "the evaluation needs at least one alternative");
            }

            for (var a = 0; a < e.Alternatives.Count; a++)
            {
                var alternative = e.Alternatives[a];
                var at = $"$.alternatives[{a}]";
                if (CheckId(alternative.Id, $"{at}.id") && !_alternatives.Add(alternative.Id))
                {
                    Add($"{at}.id", $"alternative id \"{alternative.Id}\" is used twice");
                }

                if (string.IsNullOrWhiteSpace(alternative.Name))
                {
                    Add($"{at}.name", $"alternative \"{alternative.Id}\" needs a name");
                }
            }

            if (e.Assessors.Count == 0 && !planOnly)
            {
                Add("$.assessors", "the evaluation needs at least one assessor");
            }

            for (var k = 0; k < e.Assessors.Count; k++)
            {
                var assessor = e.Assessors[k];
                var at = $"$.assessors[{k}]";
                if (CheckId(assessor.Id, $"{at}.id"))
                {
                    if (assessor.Id == WeightStructure.PanelId)
                    {
                        Add($"{at}.id", $"\"{WeightStructure.PanelId}\" is reserved for the panel's aggregate; choose another id");
                    }
                    else if (!_assessors.TryAdd(assessor.Id, assessor))
                    {
                        Add($"{at}.id", $"assessor id \"{assessor.Id}\" is used twice");
                    }
                }

                if (!(assessor.Weight > 0) || !double.IsFinite(assessor.Weight))
                {
                    Add($"{at}.weight", $"assessor \"{assessor.Id}\" has weight {assessor.Weight}; a weight must be a positive number");
                }

                if (assessor.Criteria is { } assigned)
                {
                    for (var c = 0; c < assigned.Count; c++)
                    {
                        if (!_criteria.TryGetValue(assigned[c], out var criterion))
                        {
                            Add($"{at}.criteria[{c}]", $"unknown criterion \"{assigned[c]}\"");
                        }
                        else if (criterion.Kind != CriterionKind.Linguistic)
                        {
                            Add($"{at}.criteria[{c}]", $"criterion \"{assigned[c]}\" is {Describe(criterion.Kind)}; only linguistic criteria are assigned to assessors");
                        }
                    }
                }
            }
        }

        private bool CheckId(string id, string path)
        {
            if (string.IsNullOrWhiteSpace(id))
            {
                Add(path, "an id must not be empty");
                return false;
            }

            return true;
        }

        private HashSet<string> Gates()
        {
            var excluded = new HashSet<string>(StringComparer.Ordinal);
            var seen = new HashSet<(string, string)>();
            foreach (var gate in e.Gates)
            {
                string At() => JsonPath.Keys("$.gates", gate.Alternative, gate.Criterion);
                if (!_alternatives.Contains(gate.Alternative))
                {
                    Add(JsonPath.Key("$.gates", gate.Alternative), $"unknown alternative \"{gate.Alternative}\"");
                    continue;
                }

                if (!_criteria.TryGetValue(gate.Criterion, out var criterion))
                {
                    Add(At(), $"unknown criterion \"{gate.Criterion}\"");
                    continue;
                }

                if (criterion.Kind != CriterionKind.Gate)
                {
                    Add(At(), $"criterion \"{gate.Criterion}\" is {Describe(criterion.Kind)}, not a gate");
                    continue;
                }

                if (!seen.Add((gate.Alternative, gate.Criterion)))
                {
                    Add(At(), "this gate result is given twice");
                }

                if (!gate.Passed)
                {
                    excluded.Add(gate.Alternative);
                }
            }

            foreach (var criterion in e.Criteria.Where(c => c.Kind == CriterionKind.Gate))
            {
                foreach (var alternative in e.Alternatives)
                {
                    if (!seen.Contains((alternative.Id, criterion.Id)))
                    {
                        Add(JsonPath.Keys("$.gates", alternative.Id, criterion.Id),
                            $"no pass/fail result for alternative \"{alternative.Id}\" on gate \"{criterion.Id}\"; a gate is never assumed passed");
                    }
                }
            }

            return excluded;
        }

        /// <summary>Weighted nodes: groups and the criteria that carry weight.</summary>
        private bool IsNode(string id) =>
            _groups.ContainsKey(id) || (_criteria.TryGetValue(id, out var c) && c.Kind != CriterionKind.Gate);

        private IEnumerable<string> Nodes() => WeightStructure.Nodes(e);

        private void Importance()
        {
            if (e.Importance.Count == 0)
            {
                Add("$.importance", "weighting is \"importance\" but nobody has rated the criteria's importance");
                return;
            }

            var given = new Dictionary<string, HashSet<string>>(StringComparer.Ordinal);
            foreach (var rating in e.Importance)
            {
                string At() => JsonPath.Keys("$.importance", rating.Assessor, rating.Node);
                if (!_assessors.ContainsKey(rating.Assessor))
                {
                    Add(JsonPath.Key("$.importance", rating.Assessor), $"unknown assessor \"{rating.Assessor}\"");
                    continue;
                }

                if (!IsNode(rating.Node))
                {
                    Add(At(), _criteria.TryGetValue(rating.Node, out var c) && c.Kind == CriterionKind.Gate
                        ? $"\"{rating.Node}\" is a pass/fail gate and carries no weight"
                        : $"unknown criterion or group \"{rating.Node}\"");
                    continue;
                }

                if (!e.ImportanceScale.TryFind(rating.Term, out _))
                {
                    Add(At(), $"unknown term \"{rating.Term}\"; the importance scale has {e.ImportanceScale.CodeList}");
                }

                var set = given.TryGetValue(rating.Assessor, out var s) ? s : given[rating.Assessor] = new HashSet<string>(StringComparer.Ordinal);
                if (!set.Add(rating.Node))
                {
                    Add(At(), "importance is given twice");
                }
            }

            var all = Nodes().ToArray();
            foreach (var (assessor, nodes) in given)
            {
                var missing = all.Where(n => !nodes.Contains(n)).ToArray();
                if (missing.Length > 0)
                {
                    Add(JsonPath.Key("$.importance", assessor),
                        $"assessor \"{assessor}\" has not rated the importance of {List(missing)}; an assessor who weighs must weigh every criterion and group");
                }
            }
        }

        private void Pairwise()
        {
            if (e.Pairwise.Count == 0)
            {
                Add("$.pairwise", "weighting is \"pairwise\" but nobody has compared the criteria");
                return;
            }

            var matrices = MatrixOf();
            foreach (var (name, items) in matrices)
            {
                if (items.Count > RandomIndex.MaxOrder)
                {
                    var matrix = name == "" ? "the top level" : $"group \"{(e.Groups.First(g => g.Id == name) is { Name.Length: > 0 } group ? group.Name : name)}\"";
                    Add(name == "" ? "$.criteria" : JsonPath.Key("$.groups", name),
                        $"the pairwise matrix of {matrix} compares {items.Count} items; the consistency check has a published random index only up to {RandomIndex.MaxOrder}, so split these criteria into groups of at most {RandomIndex.MaxOrder}");
                }
            }

            var index = new Dictionary<string, int>(StringComparer.Ordinal);
            var pairs = new Dictionary<string, Dictionary<(string, string), int>>(StringComparer.Ordinal);
            foreach (var judgement in e.Pairwise)
            {
                var k = index[judgement.Assessor] = index.GetValueOrDefault(judgement.Assessor, -1) + 1;
                string At() => PairwisePath(judgement.Assessor, k);
                if (!_assessors.ContainsKey(judgement.Assessor))
                {
                    Add(JsonPath.Key("$.pairwise", judgement.Assessor), $"unknown assessor \"{judgement.Assessor}\"");
                    continue;
                }

                var rowIsNode = IsComparable(judgement.Row, judgement.Assessor, k, "row");
                var colIsNode = IsComparable(judgement.Col, judgement.Assessor, k, "col");
                if (!rowIsNode || !colIsNode)
                {
                    continue;
                }

                if (judgement.Row == judgement.Col)
                {
                    Add(At(), $"\"{judgement.Row}\" is compared with itself");
                    continue;
                }

                if (ParentOf(judgement.Row) != ParentOf(judgement.Col))
                {
                    Add(At(), $"\"{judgement.Row}\" and \"{judgement.Col}\" are not in the same group; compare criteria within a group, and groups with each other and with top-level criteria");
                    continue;
                }

                if (!(judgement.Value.Lower > 0))
                {
                    Add($"{At()}.tfn", $"a pairwise judgement must be above 0; got {judgement.Value}");
                }

                var set = pairs.TryGetValue(judgement.Assessor, out var s) ? s : pairs[judgement.Assessor] = [];
                var key = string.CompareOrdinal(judgement.Row, judgement.Col) < 0 ? (judgement.Row, judgement.Col) : (judgement.Col, judgement.Row);
                if (set.TryGetValue(key, out var first))
                {
                    Add(At(), $"the pair {judgement.Row}–{judgement.Col} is already judged at index {first}; give each pair once");
                }
                else
                {
                    set[key] = k;
                }
            }

            foreach (var (assessor, given) in pairs)
            {
                var missing = new List<string>();
                foreach (var (_, items) in matrices)
                {
                    for (var i = 0; i < items.Count; i++)
                    {
                        for (var j = i + 1; j < items.Count; j++)
                        {
                            var key = string.CompareOrdinal(items[i], items[j]) < 0 ? (items[i], items[j]) : (items[j], items[i]);
                            if (!given.ContainsKey(key))
                            {
                                missing.Add($"{items[i]}–{items[j]}");
                            }
                        }
                    }
                }

                if (missing.Count > 0)
                {
                    Add(JsonPath.Key("$.pairwise", assessor),
                        $"assessor \"{assessor}\" has not compared {List(missing)}; every pair must be judged once");
                }
            }
        }

        private static string PairwisePath(string assessor, int k) => JsonPath.Index(JsonPath.Key("$.pairwise", assessor), k);

        /// <summary>Whether a judgement's row or column names a weighted node; if not, says so at its field.</summary>
        private bool IsComparable(string id, string assessor, int k, string field)
        {
            if (IsNode(id))
            {
                return true;
            }

            Add($"{PairwisePath(assessor, k)}.{field}", _criteria.TryGetValue(id, out var c) && c.Kind == CriterionKind.Gate
                ? $"\"{id}\" is a pass/fail gate and is not weighed"
                : $"unknown criterion or group \"{id}\"");
            return false;
        }

        private string ParentOf(string node) =>
            _criteria.TryGetValue(node, out var c) && c.Group is { } g ? g : "";

        /// <summary>The matrices to fill: "" for the top level (groups and ungrouped criteria), then one per group.</summary>
        private List<(string Name, IReadOnlyList<string> Items)> MatrixOf() =>
            WeightStructure.Matrices(e).Select(m => (m.Group ?? "", m.Items)).ToList();

        private void Values(HashSet<string> excluded)
        {
            var seen = new HashSet<(string, string)>();
            foreach (var value in e.Values)
            {
                string At() => JsonPath.Keys("$.values", value.Alternative, value.Criterion);
                if (!_alternatives.Contains(value.Alternative))
                {
                    Add(JsonPath.Key("$.values", value.Alternative), $"unknown alternative \"{value.Alternative}\"");
                    continue;
                }

                if (!_criteria.TryGetValue(value.Criterion, out var criterion))
                {
                    Add(At(), $"unknown criterion \"{value.Criterion}\"");
                    continue;
                }

                if (criterion.Kind != CriterionKind.Numeric)
                {
                    Add(At(), $"criterion \"{value.Criterion}\" is {Describe(criterion.Kind)}; only numeric criteria take values");
                    continue;
                }

                if (!seen.Add((value.Alternative, value.Criterion)))
                {
                    Add(At(), "this value is given twice");
                }

                if (!double.IsFinite(value.Value))
                {
                    Add(At(), "the value must be a finite number");
                }
                else if (criterion.Direction == Direction.Cost && !(value.Value > 0))
                {
                    Add(At(), $"cost criterion \"{value.Criterion}\" needs values above 0 (its normalisation divides by the value); got {value.Value}");
                }
                else if (value.Value < 0)
                {
                    Add(At(), $"values must not be negative; got {value.Value}");
                }
            }

            foreach (var criterion in e.Criteria.Where(c => c.Kind == CriterionKind.Numeric))
            {
                foreach (var alternative in e.Alternatives.Where(a => !excluded.Contains(a.Id)))
                {
                    if (!seen.Contains((alternative.Id, criterion.Id)))
                    {
                        Add(JsonPath.Keys("$.values", alternative.Id, criterion.Id),
                            $"no value for alternative \"{alternative.Id}\" on numeric criterion \"{criterion.Id}\"");
                    }
                }
            }
        }

        private HashSet<(string, string)> Moderation()
        {
            var seen = new HashSet<(string, string)>();
            foreach (var m in e.Moderated)
            {
                var at = JsonPath.Keys("$.moderation", m.Alternative, m.Criterion);
                if (!_alternatives.Contains(m.Alternative))
                {
                    Add(JsonPath.Key("$.moderation", m.Alternative), $"unknown alternative \"{m.Alternative}\"");
                    continue;
                }

                if (!_criteria.TryGetValue(m.Criterion, out var criterion))
                {
                    Add(at, $"unknown criterion \"{m.Criterion}\"");
                    continue;
                }

                if (criterion.Kind != CriterionKind.Linguistic)
                {
                    Add(at, $"criterion \"{m.Criterion}\" is {Describe(criterion.Kind)}; only linguistic ratings are moderated");
                    continue;
                }

                if (!seen.Add((m.Alternative, m.Criterion)))
                {
                    Add(at, "this cell is moderated twice");
                }

                if (!e.RatingScale.TryFind(m.Term, out _))
                {
                    Add($"{at}.term", $"unknown term \"{m.Term}\"; the rating scale has {e.RatingScale.CodeList}");
                }

                if (string.IsNullOrWhiteSpace(m.Reason))
                {
                    Add($"{at}.reason", "a moderated value needs the reason the panel agreed on it");
                }

                foreach (var agreed in m.AgreedBy ?? [])
                {
                    if (!_assessors.ContainsKey(agreed))
                    {
                        Add($"{at}.agreedBy", $"unknown assessor \"{agreed}\"");
                    }
                }
            }

            return seen;
        }

        private void Ratings(HashSet<string> excluded, HashSet<(string, string)> moderated)
        {
            // A cell is numbered by the positions of its three ids, so that checking who rated what costs an array
            // look-up rather than hashing three strings; a panel of 30 rating 100 bids on 50 criteria gives 150,000.
            var assessorAt = Positions(_assessors.Keys);
            var assessorOf = _assessors.Values.ToArray();
            var alternativeAt = Positions(_alternatives);
            var criterionAt = Positions(_criteria.Values.Where(c => c.Kind == CriterionKind.Linguistic).Select(c => c.Id));
            int n = alternativeAt.Count, m = criterionAt.Count;
            var cells = new Rating?[assessorAt.Count * n * m];

            // In a round, who reads what as a table of the same positions (null: every assessor reads every bid).
            bool[]? reads = null;
            if (e.Reviews is { } design)
            {
                reads = new bool[assessorAt.Count * n];
                foreach (var reviewer in design.Assigned)
                {
                    if (!assessorAt.TryGetValue(reviewer.Assessor, out var x))
                    {
                        continue;
                    }

                    foreach (var alternative in reviewer.Alternatives)
                    {
                        if (alternativeAt.TryGetValue(alternative, out var i))
                        {
                            reads[(x * n) + i] = true;
                        }
                    }
                }
            }

            foreach (var rating in e.Ratings)
            {
                string At() => JsonPath.Keys("$.ratings", rating.Assessor, rating.Alternative, rating.Criterion);
                if (!assessorAt.TryGetValue(rating.Assessor, out var a))
                {
                    Add(JsonPath.Key("$.ratings", rating.Assessor), $"unknown assessor \"{rating.Assessor}\"");
                    continue;
                }

                if (!alternativeAt.TryGetValue(rating.Alternative, out var i))
                {
                    Add(JsonPath.Keys("$.ratings", rating.Assessor, rating.Alternative), $"unknown alternative \"{rating.Alternative}\"");
                    continue;
                }

                if (!criterionAt.TryGetValue(rating.Criterion, out var j))
                {
                    // Only linguistic criteria are numbered: this one is unknown or of another kind.
                    Add(At(), !_criteria.TryGetValue(rating.Criterion, out var criterion)
                        ? $"unknown criterion \"{rating.Criterion}\""
                        : criterion.Kind == CriterionKind.Numeric
                            ? $"criterion \"{rating.Criterion}\" is numeric; give its value under $.values, not a rating"
                            : $"criterion \"{rating.Criterion}\" is a pass/fail gate; give its result under $.gates, not a rating");
                    continue;
                }

                if (!IsAssigned(assessorOf[a], rating.Criterion))
                {
                    Add(At(), $"criterion \"{rating.Criterion}\" is not assigned to assessor \"{rating.Assessor}\"");
                    continue;
                }

                if (reads is not null && !reads[(a * n) + i])
                {
                    Add(At(), $"application \"{rating.Alternative}\" is not assigned to reviewer \"{rating.Assessor}\"; in this round they rate only the applications assigned to them");
                    continue;
                }

                ref var cell = ref cells[(((a * n) + i) * m) + j];
                if (cell is not null)
                {
                    Add(At(), "this cell is rated twice");
                    continue;
                }

                cell = rating;
                if (rating.Term is null == rating.Declined is null)
                {
                    Add(At(), "give either a term or a reason for declining, not both and not neither");
                }
                else if (rating.Term is { } term && !e.RatingScale.TryFind(term, out _))
                {
                    Add(At(), $"unknown term \"{term}\"; the rating scale has {e.RatingScale.CodeList}");
                }
                else if (rating.Declined is { } reason && string.IsNullOrWhiteSpace(reason))
                {
                    Add(At(), "a declined cell needs a reason (for example: recused, outside expertise)");
                }
            }

            // Per assessor in panel order: the number of their id (-1 if it is not a valid id) and, per criterion,
            // whether they rate it.
            var numberOf = e.Assessors.Select(a => assessorAt.GetValueOrDefault(a.Id, -1)).ToArray();
            var rates = new bool[e.Assessors.Count];
            foreach (var criterion in e.Criteria.Where(c => c.Kind == CriterionKind.Linguistic))
            {
                var j = criterionAt.GetValueOrDefault(criterion.Id, -1);
                for (var k = 0; k < rates.Length; k++)
                {
                    rates[k] = IsAssigned(e.Assessors[k], criterion.Id);
                }

                foreach (var alternative in e.Alternatives.Where(a => !excluded.Contains(a.Id)))
                {
                    var i = alternativeAt.GetValueOrDefault(alternative.Id, -1);
                    var rated = 0;
                    List<string>? declined = null;
                    for (var k = 0; k < rates.Length; k++)
                    {
                        if (!rates[k] || (reads is not null && (numberOf[k] < 0 || i < 0 || !reads[(numberOf[k] * n) + i])))
                        {
                            continue; // not theirs to rate: nothing is expected, and nothing is imputed
                        }

                        var assessor = e.Assessors[k];
                        var rating = i >= 0 && j >= 0 && numberOf[k] >= 0 ? cells[(((numberOf[k] * n) + i) * m) + j] : null;
                        if (rating is null)
                        {
                            Add(JsonPath.Keys("$.ratings", assessor.Id, alternative.Id, criterion.Id),
                                $"assessor \"{assessor.Id}\" has neither rated alternative \"{alternative.Id}\" on criterion \"{criterion.Id}\" nor declined it with a reason");
                        }
                        else if (rating.Term is not null)
                        {
                            rated++;
                        }
                        else
                        {
                            (declined ??= []).Add($"{assessor.Id}: {rating.Declined}");
                        }
                    }

                    if (rated == 0 && !moderated.Contains((alternative.Id, criterion.Id)))
                    {
                        var why = declined is not null ? $" (declined by {string.Join("; ", declined)})" : e.Reviews is null ? " (no assessor is assigned to it)" : " (no reviewer who rates this criterion is assigned to the application)";
                        Add(JsonPath.Keys("$.ratings.*", alternative.Id, criterion.Id),
                            $"nobody rated alternative \"{alternative.Id}\" on criterion \"{criterion.Id}\"{why}; the analysis cannot proceed without at least one rating, and none is imputed");
                    }
                }
            }
        }

        /// <summary>Whether the assessor rates the criterion: every linguistic one, or those in their list.</summary>
        private bool IsAssigned(Assessor assessor, string criterion)
        {
            if (assessor.Criteria is not { } assigned)
            {
                return true;
            }

            if (!_assignedSets.TryGetValue(assigned, out var set))
            {
                set = new HashSet<string>(assigned, StringComparer.Ordinal);
                _assignedSets[assigned] = set;
            }

            return set.Contains(criterion);
        }

        private static Dictionary<string, int> Positions(IEnumerable<string> ids)
        {
            var positions = new Dictionary<string, int>(StringComparer.Ordinal);
            foreach (var id in ids)
            {
                positions.Add(id, positions.Count);
            }

            return positions;
        }

        private static string Describe(CriterionKind kind) => kind switch
        {
            CriterionKind.Numeric => "numeric",
            CriterionKind.Gate => "a pass/fail gate",
            _ => "linguistic",
        };

        private static string List(IReadOnlyCollection<string> items) =>
            items.Count <= 6 ? string.Join(", ", items) : $"{string.Join(", ", items.Take(6))} and {items.Count - 6} more";
    }
}
