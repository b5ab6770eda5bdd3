using Decide.Core.Model;

namespace Decide.Interchange;

/// <summary>The content of a portable evaluation file: what the engine analyses, and what the file says about itself.</summary>
/// <param name="Evaluation">The evaluation as the engine sees it.</param>
/// <param name="Metadata">Reference, organisation, description, noun and criterion descriptions.</param>
public sealed record EvaluationFile(Evaluation Evaluation, EvaluationMetadata Metadata);
