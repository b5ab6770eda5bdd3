using FsCheck;
using FsCheck.Fluent;

namespace Decide.Fuzzing;

/// <summary>
/// FsCheck's source of <see cref="HostileCase"/>s: mostly valid documents changed by a few structured mutations
/// (sometimes none, so the accepting path is exercised too), sometimes random bytes or random JSON tokens.
/// </summary>
public static class HostileArbitraries
{
    public static Arbitrary<HostileCase> HostileCase() => Arb.From(Cases(), c => c.Shrink());

    private static Gen<HostileCase> Cases() => Gen.Frequency(
        (16, Mutated()),
        (1, Random(HostileCaseKind.RandomBytes)),
        (1, Random(HostileCaseKind.TokenSoup)));

    private static Gen<HostileCase> Mutated() =>
        from document in Gen.Choose(0, 1023)
        from count in Gen.Frequency((1, Gen.Constant(0)), (6, Gen.Choose(1, 2)), (3, Gen.Choose(3, 6)))
        from mutations in Gen.ArrayOf(Mutation(), count)
        from bytes in Gen.Frequency<ByteMutation?>((3, Gen.Constant<ByteMutation?>(null)), (1, ByteChange().Select(b => (ByteMutation?)b)))
        from contentType in ContentType()
        select new HostileCase(HostileCaseKind.Mutated, document, mutations, bytes, contentType, 0, 0);

    private static Gen<HostileCase> Random(HostileCaseKind kind) =>
        from seed in Gen.Choose(0, int.MaxValue - 1)
        from length in Gen.Sized(size => Gen.Choose(0, 20 + (size * 40)))
        from contentType in ContentType()
        select new HostileCase(kind, 0, [], null, contentType, seed, length);

    private static Gen<int> ContentType() => Gen.Frequency((6, Gen.Constant(0)), (1, Gen.Choose(1, 1000)));

    private static Gen<TreeMutation> Mutation() =>
        from kind in Gen.Frequency(
            (3, Gen.Constant(TreeMutationKind.Remove)),
            (2, Gen.Constant(TreeMutationKind.Duplicate)),
            (3, Gen.Constant(TreeMutationKind.Retype)),
            (3, Gen.Constant(TreeMutationKind.Number)),
            (1, Gen.Constant(TreeMutationKind.Nest)),
            (1, Gen.Constant(TreeMutationKind.LongString)),
            (3, Gen.Constant(TreeMutationKind.Text)),
            (1, Gen.Constant(TreeMutationKind.RawText)),
            (2, Gen.Constant(TreeMutationKind.Rename)),
            (1, Gen.Constant(TreeMutationKind.Empty)),
            (1, Gen.Constant(TreeMutationKind.Multiply)),
            (2, Gen.Constant(TreeMutationKind.SwapReference)),
            (1, Gen.Constant(TreeMutationKind.Widen)))
        from target in Gen.Choose(0, 1_000_000)
        from choice in Gen.Choose(0, 1_000_000)
        select new TreeMutation(kind, target, choice);

    private static Gen<ByteMutation> ByteChange() =>
        from kind in Gen.Elements(Enum.GetValues<ByteMutationKind>())
        from position in Gen.Choose(0, int.MaxValue - 1)
        from choice in Gen.Choose(0, 1_000_000)
        select new ByteMutation(kind, position, choice);
}
