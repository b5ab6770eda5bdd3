namespace Decide.Fuzzing;

/// <summary>
/// One structured change to a document: <see cref="Kind"/> applied to the node picked by <see cref="Target"/> (taken
/// modulo the number of nodes; a multiple of three picks among the shallow ones, the plan's members), with
/// <see cref="Choice"/> picking the variant (which number, which text, how deep).
/// </summary>
public sealed record TreeMutation(TreeMutationKind Kind, int Target, int Choice)
{
    public override string ToString() => $"{Kind}(target {Target}, choice {Choice})";
}
