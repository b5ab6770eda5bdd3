using Decide.Core.Fuzzy;

namespace Decide.Core.Scales;

/// <summary>One term of a linguistic scale.</summary>
/// <param name="Code">Short code assessors type and files store, such as <c>G</c>; unique within its scale.</param>
/// <param name="Label">The words shown to people, such as "Good".</param>
/// <param name="Value">The triangular fuzzy number the term stands for.</param>
/// <param name="Descriptor">
/// Optional: what the term means in general. Per-criterion descriptors live on the criterion, because "Good" for
/// delivery is not "Good" for security.
/// </param>
public sealed record LinguisticTerm(string Code, string Label, Tfn Value, string? Descriptor = null);
