namespace Decide.Interchange.Results;

/// <summary>The consistency of one pairwise matrix.</summary>
/// <param name="Assessor">Assessor id, or <c>panel</c> for the panel's aggregated matrix.</param>
/// <param name="Group">The group compared within, or null for the top-level matrix.</param>
/// <param name="Items">The ids compared, in matrix order.</param>
/// <param name="N">Order of the matrix.</param>
/// <param name="LambdaMax">Principal eigenvalue.</param>
/// <param name="Ci">Consistency index (λmax − n)/(n − 1).</param>
/// <param name="Ri">Random index used.</param>
/// <param name="RandomIndexTable">Which random-index table.</param>
/// <param name="Cr">Consistency ratio CI/RI.</param>
/// <param name="Threshold">Largest acceptable CR for this n.</param>
/// <param name="Acceptable">CR ≤ threshold.</param>
/// <param name="Gci">Geometric consistency index.</param>
/// <param name="GciThreshold">Largest acceptable GCI for this n.</param>
/// <param name="GciAcceptable">GCI ≤ its threshold.</param>
/// <param name="Weights">The fuzzy weights [l, m, u] this matrix gives its items, in item order.</param>
/// <param name="WorstJudgements">The judgements that break consistency most (only when not acceptable).</param>
/// <param name="IntransitiveTriads">Cycles [a, b, c]: a over b, b over c, c over a.</param>
public sealed record ConsistencyEntry(
    string Assessor,
    string? Group,
    IReadOnlyList<string> Items,
    int N,
    double LambdaMax,
    double Ci,
    double Ri,
    string RandomIndexTable,
    double Cr,
    double Threshold,
    bool Acceptable,
    double Gci,
    double GciThreshold,
    bool GciAcceptable,
    IReadOnlyList<IReadOnlyList<double>> Weights,
    IReadOnlyList<JudgementEntry> WorstJudgements,
    IReadOnlyList<IReadOnlyList<string>> IntransitiveTriads);
