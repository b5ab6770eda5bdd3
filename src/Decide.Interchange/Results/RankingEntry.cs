namespace Decide.Interchange.Results;

/// <summary>An alternative's place in the ranking.</summary>
/// <param name="Alternative">Alternative id.</param>
/// <param name="Name">Alternative name.</param>
/// <param name="Rank">1 = best; exact ties share a rank.</param>
/// <param name="Closeness">Closeness coefficient in [0, 1]; larger is better.</param>
/// <param name="DPlus">Distance from the positive ideal.</param>
/// <param name="DMinus">Distance from the negative ideal.</param>
/// <param name="Contributions">Each scored criterion's share of the two distances, in criterion order.</param>
public sealed record RankingEntry(
    string Alternative,
    string Name,
    int Rank,
    double Closeness,
    double DPlus,
    double DMinus,
    IReadOnlyList<ContributionEntry> Contributions);
