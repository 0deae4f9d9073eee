using BenchmarkDotNet.Running;

namespace SlotArray.Benchmarks;

/// <summary>Entry point: runs the benchmarks chosen with BenchmarkDotNet's --filter.</summary>
public static class Program
{
    /// <summary>Runs the benchmark switcher over this assembly.</summary>
    public static void Main(string[] args) => BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
}
