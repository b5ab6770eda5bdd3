using BenchmarkDotNet.Running;
using Decide.Benchmarks;

// `-- --digest` prints fingerprints of the engine's results on the benchmark inputs (compare before and after an
// optimisation); anything else goes to BenchmarkDotNet, e.g. `-- --filter '*' --job short`.
if (args is ["--digest"])
{
    ResultDigest.Write(Console.Out);
    return;
}

BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
