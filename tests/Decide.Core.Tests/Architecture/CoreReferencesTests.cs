using Decide.Core.Fuzzy;

namespace Decide.Core.Tests.Architecture;

/// <summary>
/// Decide.Core is pure computation (ADR 1): it references nothing but the .NET runtime, so it never learns about
/// files, HTTP, databases, PDFs or the clock.
/// </summary>
public sealed class CoreReferencesTests
{
    [Fact]
    public void Decide_Core_references_only_the_runtime()
    {
        var references = typeof(Tfn).Assembly.GetReferencedAssemblies().Select(a => a.Name!).ToArray();
        Assert.NotEmpty(references);
        Assert.All(references, name => Assert.True(name.StartsWith("System", StringComparison.Ordinal) || name is "netstandard" or "mscorlib",
            $"Decide.Core references {name}; the engine may depend on the runtime only"));
        Assert.DoesNotContain(references, name => name.Contains("Decide", StringComparison.Ordinal));
    }
}
