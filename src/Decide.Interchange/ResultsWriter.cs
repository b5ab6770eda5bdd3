using System.Reflection;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using Decide.Core;
using Decide.Core.Award;
using Decide.Core.Weighting;
using Decide.Core.Analysis;
using Decide.Core.Consistency;
using Decide.Core.Model;
using Decide.Core.Robustness;
using Decide.Interchange.Results;

namespace Decide.Interchange;

/// <summary>
/// Turns the engine's <see cref="AnalysisResult"/> into the results document (<c>decide-results/1</c>): indented
/// JSON, camelCase member names, invariant culture, numbers written so they read back to the same double.
/// </summary>
/// <remarks>
/// Build the document with <see cref="CreateDocument(DecisionRun, Evaluation)"/>, add later sections with <c>with { … }</c>, and write it
/// with <see cref="ToJson(ResultsDocument)"/> or <see cref="Write"/>.
/// </remarks>
public static class ResultsWriter
{
    private static readonly ResultsJsonContext Context = new(new JsonSerializerOptions(ResultsJsonContext.Default.Options)
    {
        Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
    });

    /// <summary>The engine's version as recorded in results: Decide.Core's informational version.</summary>
    public static string EngineVersion { get; } =
        typeof(DecisionEngine).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion
        ?? typeof(DecisionEngine).Assembly.GetName().Version?.ToString()
        ?? "unknown";

    /// <summary>The results document for <paramref name="result"/>, with names taken from <paramref name="evaluation"/>.</summary>
    /// <param name="result">The analysis.</param>
    /// <param name="evaluation">The evaluation analysed (for names).</param>
    /// <param name="robustness">
    /// The robustness of the same analysis, from <see cref="RobustnessAnalysis.Run"/>; when given, the document gets
    /// its <c>sensitivity</c>, <c>agreement</c> and <c>summary</c> sections.
    /// </param>
    /// <param name="award">The published award applied and its agreement with the ranking, when the plan states an award method.</param>
    public static ResultsDocument CreateDocument(
        AnalysisResult result, Evaluation evaluation, RobustnessResult? robustness = null, (AwardReport Report, AwardAgreement Agreement)? award = null)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(evaluation);
        var alternativeNames = Names(evaluation.Alternatives.Select(a => (a.Id, a.Name)));
        var criterionNames = Names(evaluation.Criteria.Select(c => (c.Id, c.Name)));
        string AlternativeName(string id) => alternativeNames.GetValueOrDefault(id, id);
        string CriterionName(string id) => criterionNames.GetValueOrDefault(id, id);

        return new ResultsDocument
        {
            Title = result.Title,
            Engine = new EngineDescription("Decide", EngineVersion),
            Method = new MethodDescription(
                Name(result.Weighting),
                FormatWords.Of(result.Options.Aggregation),
                FormatWords.Of(result.Options.Ideal),
                result.Weighting == WeightingMethod.Pairwise ? RandomIndex.TableName : null),
            Ranking = result.Ranking.Select(r => new RankingEntry(
                r.Alternative, AlternativeName(r.Alternative), r.Rank, r.Closeness, r.DPlus, r.DMinus,
                r.Contributions.Select(c => new ContributionEntry(c.Criterion, c.DPlus, c.DMinus)).ToArray())).ToArray(),
            Excluded = result.Excluded.Select(x => new ExcludedEntry(x.Alternative, AlternativeName(x.Alternative), x.Gates.ToArray(), x.Reason)).ToArray(),
            Weights = result.Weights.Select(w => new WeightEntry(
                w.Criterion, CriterionName(w.Criterion), w.Fuzzy.ToArray(), w.Crisp, w.Group,
                w.GroupWeight?.ToArray(), w.Local?.ToArray())).ToArray(),
            Consistency = result.Consistency.Select(Consistency).ToArray(),
            Matrix = result.Matrix.Select(m => new MatrixEntry(
                m.Alternative, m.Criterion, m.Aggregated.ToArray(), m.Weighted.ToArray(), m.Raters,
                m.Declined.Select(d => new DeclinedEntry(d.Assessor, d.Reason)).ToArray(), m.Moderated)).ToArray(),
            Sensitivity = robustness is null ? null : RobustnessSections.Sensitivity(robustness.Sensitivity, CriterionName),
            Agreement = robustness is null ? null : RobustnessSections.Agreement(robustness.Agreement),
            Summary = robustness?.Summary.ToArray(),
            PointsAward = award is { } a ? AwardSection(a.Report, a.Agreement, evaluation) : null,
        };
    }

    /// <summary>The results document of a whole run: analysis, robustness when run, and the award when the plan states one.</summary>
    public static ResultsDocument CreateDocument(DecisionRun run, Evaluation evaluation)
    {
        ArgumentNullException.ThrowIfNull(run);
        var document = CreateDocument(run.Analysis, evaluation, run.Robustness, run.Award is { } report ? (report, run.AwardAgreement!) : null);
        document = document with { Round = run.Round is { } round ? RobustnessSections.Round(round) : null };
        return run.AwardRobustness is { } checks && document.PointsAward is { } award
            ? document with { PointsAward = award with { Robustness = AwardRobustness(checks) } }
            : document;
    }

    /// <summary>The award's robustness as the results document writes it.</summary>
    public static AwardRobustnessEntry AwardRobustness(AwardRobustnessResult r)
    {
        ArgumentNullException.ThrowIfNull(r);
        static AwardWithoutEntry Without(AwardWithout w) =>
            new(w.Without, w.Winner, w.WinnerChanged, w.Reversed.Select(p => (IReadOnlyList<string>)[p.Above, p.Below]).ToArray());
        return new AwardRobustnessEntry(
            r.WithoutBid.Select(Without).ToArray(),
            r.WithoutAssessor.Select(Without).ToArray(),
            r.Sweeps.Select(s => new AwardSweepEntry(s.Criterion, s.Published, s.Lower, s.LowerWinner, s.Upper, s.UpperWinner)).ToArray(),
            r.Acceptability.Select(a => new AwardAcceptabilityEntry(a.Bid, a.Ranks.ToArray(), a.First, a.Excluded)).ToArray(),
            r.Draws,
            r.Seed,
            r.CriticalChanges.Select(c => new AwardCriticalChangeEntry([c.Above, c.Below], c.Criterion, c.Published, c.Share)).ToArray());
    }

    /// <summary>
    /// The <c>pointsAward</c> section for an award and, once prices are open, its agreement with the closeness ranking:
    /// the table a bidder can recompute. The API serves it alone for the quality stage of a two-stage award.
    /// </summary>
    public static AwardSection AwardSection(AwardReport award, AwardAgreement? agreement, Evaluation evaluation)
    {
        ArgumentNullException.ThrowIfNull(award);
        ArgumentNullException.ThrowIfNull(evaluation);
        var alternativeNames = Names(evaluation.Alternatives.Select(a => (a.Id, a.Name)));
        var criterionNames = Names(evaluation.Criteria.Select(c => (c.Id, c.Name)));
        string alternativeName(string id) => alternativeNames.GetValueOrDefault(id, id);
        string criterionName(string id) => criterionNames.GetValueOrDefault(id, id);
        var f = award.Formula;
        return new AwardSection(
            FormatWords.Of(award.Method.Binding),
            FormatWords.Of(award.Method.PanelScore),
            new FormulaEntry(FormatWords.Of(award.Method.Formula), f.Name, f.Equation, f.Properties, f.Source, f.Relative),
            award.PricePoints,
            award.ScaleMaximum,
            award.QualityCriteria.Select((id, j) => new AwardCriterionEntry(id, criterionName(id), award.CriterionPoints[j])).ToArray(),
            AwardText.Thresholds(award.Method, evaluation),
            award.Method.AppliedTieBreaks.Select(FormatWords.Of).ToArray(),
            award.Lines.Select(line =>
            {
                var b = line.Award;
                return new AwardBidEntry(
                    b.Id, alternativeName(b.Id),
                    line.Cells.Select((c, j) => new AwardCellEntry(c.Criterion, c.Score, c.Source == PanelScoreSource.Moderated ? "moderated" : "mean", c.Term, c.Terms.ToArray(), b.CriterionPoints[j])).ToArray(),
                    b.QualityPoints, b.QualityShare, b.Price, b.PricePoints, b.Figure, b.Total, b.Rank,
                    b.Excluded is { } why ? AwardText.Exclusion(why) : null, b.ExclusionDetail, b.AbnormallyLowFlag,
                    line.Review is { } r ? new LowPriceReviewEntry(r.Asked, r.Answer, r.Decision is { } d ? FormatWords.Of(d) : null, r.Reasons) : null,
                    b.DecidedBy is { } rule ? FormatWords.Of(rule) : null);
            }).ToArray(),
            award.Result.PricesSealed,
            award.Result.UnresolvedTie,
            award.AwaitingDecision.ToArray(),
            agreement?.Winner ?? (award.Method.Binding == BindingResult.Points ? award.Winner : null),
            agreement is null ? null : new AwardAgreementEntry(agreement.PointsWinner, agreement.ClosenessWinner, agreement.SameWinner, agreement.KendallTau, agreement.Compared));
    }

    /// <summary>The results document for an analysis (and, when given, its robustness) as JSON text.</summary>
    public static string ToJson(AnalysisResult result, Evaluation evaluation, RobustnessResult? robustness = null) =>
        ToJson(CreateDocument(result, evaluation, robustness));

    /// <summary>A results document as JSON text (ending with a line break).</summary>
    public static string ToJson(ResultsDocument document)
    {
        using var buffer = new MemoryStream();
        Write(document, buffer);
        return Encoding.UTF8.GetString(buffer.GetBuffer(), 0, (int)buffer.Length);
    }

    /// <summary>Writes a results document to a stream as UTF-8 JSON (no byte-order mark), ending with a line break.</summary>
    public static void Write(ResultsDocument document, Stream stream)
    {
        ArgumentNullException.ThrowIfNull(document);
        ArgumentNullException.ThrowIfNull(stream);
        JsonSerializer.Serialize(stream, document, Context.ResultsDocument);
        stream.WriteByte((byte)'\n');
    }

    private static ConsistencyEntry Consistency(MatrixConsistency m)
    {
        var r = m.Report;
        return new ConsistencyEntry(
            m.Assessor, m.Group, m.Items.ToArray(), r.Size, r.LambdaMax, r.ConsistencyIndex, r.RandomIndex,
            r.RandomIndexTable, r.Ratio, r.Threshold, r.Acceptable, r.Gci, r.GciThreshold, r.GciAcceptable,
            m.Weights.Select(w => (IReadOnlyList<double>)w.ToArray()).ToArray(),
            r.WorstJudgements.Select(j => new JudgementEntry(j.Row, j.Col, j.Given, j.Consistent)).ToArray(),
            r.IntransitiveTriads.Select(t => (IReadOnlyList<string>)t.ToArray()).ToArray());
    }

    private static string Name(WeightingMethod weighting) => FormatWords.Of(weighting);

    private static Dictionary<string, string> Names(IEnumerable<(string Id, string Name)> items)
    {
        var names = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var (id, name) in items)
        {
            names.TryAdd(id, name);
        }

        return names;
    }
}
