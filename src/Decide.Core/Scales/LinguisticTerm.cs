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
/// <param name="Points">
/// Optional: the points the term scores in a published points award (5 for "Excellent" on a 0–5 scale), beside its
/// triangular number. A scale gives points to every term or to none, never decreasing from one term to the next.
/// </param>
public sealed record LinguisticTerm(string Code, string Label, Tfn Value, string? Descriptor = null, double? Points = null);
