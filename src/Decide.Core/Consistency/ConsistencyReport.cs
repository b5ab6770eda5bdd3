namespace Decide.Core.Consistency;

/// <summary>A judgement that disagrees with the rest of its matrix, and the value that would agree.</summary>
/// <param name="Row">Row item id.</param>
/// <param name="Col">Column item id.</param>
/// <param name="Given">The middle value given (row over column).</param>
/// <param name="Consistent">
/// The value the other judgements imply for this pair (geometric mean of the indirect judgements row→k→col over the
/// other items): what the assessor could give to agree with the rest of the matrix.
/// </param>
/// <param name="Deviation">|ln(given / consistent)|: how far off, on a log scale (0 = in agreement).</param>
public sealed record InconsistentJudgement(string Row, string Col, double Given, double Consistent, double Deviation);

/// <summary>
/// Consistency of one pairwise matrix (of one assessor, or of the panel's aggregated matrix), judged on its middle
/// values.
/// </summary>
/// <param name="Size">Order n of the matrix.</param>
/// <param name="LambdaMax">Principal eigenvalue λmax.</param>
/// <param name="ConsistencyIndex">CI = (λmax − n)/(n − 1); 0 for n ≤ 2.</param>
/// <param name="RandomIndex">Saaty's RI(n) used.</param>
/// <param name="RandomIndexTable">Which RI table, for the record.</param>
/// <param name="Ratio">CR = CI/RI; 0 for n ≤ 2.</param>
/// <param name="Threshold">Largest acceptable CR for this n.</param>
/// <param name="Acceptable">CR ≤ threshold.</param>
/// <param name="Gci">Geometric consistency index (second opinion); 0 for n ≤ 2.</param>
/// <param name="GciThreshold">Largest acceptable GCI for this n.</param>
/// <param name="GciAcceptable">GCI ≤ its threshold.</param>
/// <param name="Eigenvector">Principal eigenvector, normalised to sum 1, in item order.</param>
/// <param name="WorstJudgements">When the matrix is not acceptable by either index: up to three judgements contributing most, worst first; otherwise empty.</param>
/// <param name="IntransitiveTriads">Every cycle [a, b, c] with a over b, b over c and c over a (middle values above 1).</param>
public sealed record ConsistencyReport(
    int Size,
    double LambdaMax,
    double ConsistencyIndex,
    double RandomIndex,
    string RandomIndexTable,
    double Ratio,
    double Threshold,
    bool Acceptable,
    double Gci,
    double GciThreshold,
    bool GciAcceptable,
    IReadOnlyList<double> Eigenvector,
    IReadOnlyList<InconsistentJudgement> WorstJudgements,
    IReadOnlyList<IReadOnlyList<string>> IntransitiveTriads);
