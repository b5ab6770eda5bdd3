using Decide.Data.Entities;

namespace Decide.Web.Features.Inputs;

/// <summary>The current declaration text.</summary>
public sealed record DeclarationView(string Version, string Title, IReadOnlyList<string> Paragraphs, string NamesConfirmation);

/// <summary>Accept the declaration; <paramref name="Version"/> is the version read (it must be the current one).</summary>
public sealed record SignDeclarationRequest(string? Version, bool Accepted);

/// <summary>Confirm the declaration once the bidders are known, declaring every conflict of interest (may be none).</summary>
public sealed record ConfirmNamesRequest(IReadOnlyList<ConflictRequest>? Conflicts);

/// <summary>A conflict of interest with one bidder and what it is.</summary>
public sealed record ConflictRequest(string? Alternative, string? Statement);

/// <summary>The caller's declaration in one evaluation.</summary>
/// <param name="CurrentVersion">The version of the declaration text in force.</param>
/// <param name="SignedVersion">The version the caller accepted, if any.</param>
/// <param name="SignedAt">When.</param>
/// <param name="NamesConfirmedAt">When the caller confirmed the declaration against the bidders' names.</param>
/// <param name="CanConfirmNames">True when the bidders are known (scoring has opened) and the caller may confirm now.</param>
/// <param name="Bidders">The bidders to confirm the declaration against: shown once scoring is open and the declaration signed.</param>
/// <param name="Conflicts">The caller's declared conflicts.</param>
public sealed record MyDeclarationView(
    string CurrentVersion, string? SignedVersion, DateTimeOffset? SignedAt, DateTimeOffset? NamesConfirmedAt, bool CanConfirmNames,
    IReadOnlyList<BidderView>? Bidders, IReadOnlyList<ConflictView> Conflicts);

/// <summary>A bidder as shown on input screens.</summary>
public sealed record BidderView(string Code, string Name);

/// <summary>A declared conflict of interest.</summary>
public sealed record ConflictView(string? AssessorCode, string DeclaredBy, string Alternative, string Statement, DateTimeOffset DeclaredAt, string? Action);

/// <summary>A scale term: code, label and triangular fuzzy number.</summary>
public sealed record ScaleTermView(string Code, string Label, double[] Tfn);

/// <summary>Something weights are given for: a group or a weighted criterion.</summary>
public sealed record WeightNodeView(string Id, string Name, string Kind, string? Group);

/// <summary>Replace the caller's weight judgements: <paramref name="Importance"/> (node → term) or <paramref name="Pairwise"/>, as the plan weighs.</summary>
/// <param name="Importance">Importance term per criterion or group.</param>
/// <param name="Pairwise">Pairwise judgements.</param>
/// <param name="Version">The version of the caller's seat last read (optional); a stale one is refused.</param>
public sealed record WeightsRequest(IReadOnlyDictionary<string, string?>? Importance, IReadOnlyList<PairwiseEntry>? Pairwise, long? Version);

/// <summary>How much more important <paramref name="Row"/> is than <paramref name="Col"/>: a pairwise-scale <paramref name="Term"/> or a <paramref name="Tfn"/> [l, m, u].</summary>
public sealed record PairwiseEntry(string? Row, string? Col, string? Term, double[]? Tfn);

/// <summary>The caller's weight judgements with live feedback.</summary>
/// <param name="Assessor">The caller's assessor code.</param>
/// <param name="Weighting">"importance" or "pairwise".</param>
/// <param name="Nodes">What is weighed.</param>
/// <param name="Scale">The terms to choose from (importance or pairwise scale).</param>
/// <param name="Importance">Importance terms given, by node.</param>
/// <param name="Pairwise">Pairwise judgements given.</param>
/// <param name="Feedback">Completeness and consistency.</param>
/// <param name="SubmittedAt">When the caller submitted them; null while open.</param>
/// <param name="Editable">True at setup.</param>
/// <param name="Version">The caller's seat version, for the next change.</param>
public sealed record WeightsView(
    string Assessor, string Weighting, IReadOnlyList<WeightNodeView> Nodes, IReadOnlyList<ScaleTermView> Scale,
    IReadOnlyDictionary<string, string> Importance, IReadOnlyList<PairwiseEntry> Pairwise, WeightsFeedback Feedback,
    DateTimeOffset? SubmittedAt, bool Editable, long Version);

/// <summary>What is missing and how consistent the judgements are.</summary>
/// <param name="Complete">True when every node (importance) or every pair of every matrix (pairwise) is judged.</param>
/// <param name="MissingNodes">Importance: nodes not rated yet.</param>
/// <param name="Matrices">Pairwise: one entry per matrix (the top level, then each group).</param>
/// <param name="Warnings">Sentences for the assessor (inconsistency, intransitive triads).</param>
public sealed record WeightsFeedback(bool Complete, IReadOnlyList<string> MissingNodes, IReadOnlyList<MatrixFeedback> Matrices, IReadOnlyList<string> Warnings);

/// <summary>Feedback on one pairwise matrix.</summary>
/// <param name="Group">Null for the top level (groups and top-level criteria); otherwise the group compared within.</param>
/// <param name="Items">Items compared.</param>
/// <param name="Complete">Every pair judged.</param>
/// <param name="MissingPairs">Pairs not judged yet.</param>
/// <param name="ConsistencyRatio">Saaty's CR of the middle values; null until the matrix is complete.</param>
/// <param name="Threshold">Largest acceptable CR for this size.</param>
/// <param name="Acceptable">CR within the threshold; null until complete.</param>
/// <param name="Gci">Geometric consistency index; null until complete.</param>
/// <param name="GciThreshold">Largest acceptable GCI for this size.</param>
/// <param name="WorstJudgements">When inconsistent: the judgements that fit the others least, with the value that would fit.</param>
/// <param name="IntransitiveTriads">Cycles a &gt; b &gt; c &gt; a among the judgements given (also in an incomplete matrix).</param>
/// <param name="LocalWeights">The crisp local weights this matrix gives (centroid shares of the Buckley weights); null until complete.</param>
public sealed record MatrixFeedback(
    string? Group, IReadOnlyList<string> Items, bool Complete, IReadOnlyList<string[]> MissingPairs,
    double? ConsistencyRatio, double Threshold, bool? Acceptable, double? Gci, double GciThreshold,
    IReadOnlyList<JudgementHint> WorstJudgements, IReadOnlyList<IReadOnlyList<string>> IntransitiveTriads,
    IReadOnlyDictionary<string, double>? LocalWeights);

/// <summary>A judgement that disagrees with the rest of its matrix.</summary>
/// <param name="Row">Row item.</param>
/// <param name="Col">Column item.</param>
/// <param name="Given">The middle value given (row over column).</param>
/// <param name="Consistent">The value the other judgements imply.</param>
/// <param name="SuggestedTerm">The pairwise-scale term nearest to <paramref name="Consistent"/>.</param>
public sealed record JudgementHint(string Row, string Col, double Given, double Consistent, string SuggestedTerm);

/// <summary>The outcome of submitting weights.</summary>
public sealed record WeightsSubmitted(WeightsView Weights, IReadOnlyList<string> Warnings);

/// <summary>Rate a cell (<paramref name="Term"/> with <paramref name="Rationale"/>) or decline it with a reason.</summary>
/// <param name="Term">A rating-scale code.</param>
/// <param name="Rationale">Why, citing the bid.</param>
/// <param name="Declined">The reason for declining instead of rating.</param>
/// <param name="Version">The cell's version last read; leave out on the first save.</param>
public sealed record RatingRequest(string? Term, string? Rationale, string? Declined, long? Version);

/// <summary>An assessor's rating sheet: the bids × the criteria assigned to them.</summary>
public sealed record RatingSheetView(
    string Assessor, EvaluationStage Stage, IReadOnlyList<SheetBidder> Bidders, IReadOnlyList<SheetCriterion> Criteria,
    IReadOnlyList<ScaleTermView> Scale, IReadOnlyList<SheetCell> Cells, SheetProgress Progress,
    DateTimeOffset? SubmittedAt, bool Submitted, bool Editable, int MinRationaleLength);

/// <summary>A bid on the sheet; <paramref name="Recused"/> when the assessor declared a conflict; <paramref name="FailedGates"/> when it is out.</summary>
public sealed record SheetBidder(string Code, string Name, bool Recused, IReadOnlyList<string> FailedGates);

/// <summary>A criterion on the sheet with what each term means for it.</summary>
public sealed record SheetCriterion(string Id, string Name, string? Description, string? Group, IReadOnlyDictionary<string, string> Descriptors);

/// <summary>One cell of the sheet as the assessor left it.</summary>
/// <param name="Alternative">Bid.</param>
/// <param name="Criterion">Criterion.</param>
/// <param name="Term">Rating-scale code, or null.</param>
/// <param name="Rationale">Why.</param>
/// <param name="Declined">Reason for declining, or null.</param>
/// <param name="Version">Version to send with the next change; null until first saved.</param>
/// <param name="Done">Rated with a long enough rationale, or declined with a reason.</param>
/// <param name="Required">False for a bid that failed a gate (not rated).</param>
public sealed record SheetCell(string Alternative, string Criterion, string? Term, string? Rationale, string? Declined, long? Version, bool Done, bool Required);

/// <summary>Cells done out of cells required.</summary>
public sealed record SheetProgress(int Done, int Total);

/// <summary>Enter a numeric value; <paramref name="Version"/> as last read (leave out on the first save).</summary>
public sealed record ValueRequest(double? Value, long? Version);

/// <summary>The numeric criteria's values.</summary>
public sealed record ValuesView(IReadOnlyList<NumericCriterionView> Criteria, IReadOnlyList<BidderView> Bidders, IReadOnlyList<ValueCell> Cells, bool Editable);

/// <summary>A numeric criterion.</summary>
public sealed record NumericCriterionView(string Id, string Name, string? Unit, string Direction);

/// <summary>A value cell; <paramref name="Value"/> null until entered.</summary>
public sealed record ValueCell(string Alternative, string Criterion, double? Value, long? Version, string? EnteredBy, DateTimeOffset? UpdatedAt);

/// <summary>Record a gate result; a fail needs a <paramref name="Note"/>.</summary>
public sealed record GateRequest(bool? Passed, string? Note, long? Version);

/// <summary>The gate criteria's results.</summary>
public sealed record GatesView(IReadOnlyList<GateCriterionView> Criteria, IReadOnlyList<BidderView> Bidders, IReadOnlyList<GateCell> Cells, bool Editable);

/// <summary>A gate criterion.</summary>
public sealed record GateCriterionView(string Id, string Name, string? Description);

/// <summary>A gate cell; <paramref name="Passed"/> null until entered.</summary>
public sealed record GateCell(string Alternative, string Criterion, bool? Passed, string? Note, long? Version, string? EnteredBy, DateTimeOffset? UpdatedAt);
