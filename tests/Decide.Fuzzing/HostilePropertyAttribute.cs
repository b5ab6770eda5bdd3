using FsCheck.Xunit;

namespace Decide.Fuzzing;

/// <summary>
/// An FsCheck property over <see cref="HostileCase"/>s whose number of cases and seed come from
/// <see cref="FuzzSettings"/>: <paramref name="ciCases"/> from a fixed seed unless the environment asks otherwise.
/// </summary>
[AttributeUsage(AttributeTargets.Method)]
public sealed class HostilePropertyAttribute : PropertyAttribute
{
    public HostilePropertyAttribute(int ciCases)
    {
        MaxTest = FuzzSettings.Cases(ciCases);
        Replay = FuzzSettings.Replay;
        Arbitrary = [typeof(HostileArbitraries)];
        // Cases are few but large; FsCheck's default sizes only affect the random-bytes lengths.
        EndSize = 100;
    }
}
