using BenchmarkDotNet.Running;

namespace CanopyAdvisor.Benchmarks;

/// <summary>
/// Runs the benchmarks: <c>dotnet run -c Release --project tests/CanopyAdvisor.Benchmarks -- --filter '*'</c>.
/// Never part of the test run.
/// </summary>
internal static class Program
{
    private static void Main(string[] args) => BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
}
