using BenchmarkDotNet.Attributes;
using SlotArray.Core.Tapers;

namespace SlotArray.Benchmarks;

/// <summary>
/// Issue 3 target: Dolph–Chebyshev weights for N = 10,000 in ≤ 50 ms and still accurate. The setup compares the FFT
/// weights with the O(N²) direct DFT of Dolph 1946 once and prints the largest difference.
/// </summary>
[MemoryDiagnoser]
public class TaperBenchmarks
{
    /// <summary>Accuracy check against the direct DFT (printed, and fails the run if above 1e-9).</summary>
    [GlobalSetup]
    public void Setup()
    {
        var fft = DolphChebyshev.Weights(10_000, -30);
        var dft = DolphChebyshev.WeightsByDirectDft(10_000, -30);
        double worst = fft.Zip(dft, (a, b) => Math.Abs(a - b)).Max();
        Console.WriteLine($"// Dolph-Chebyshev N = 10000, 30 dB: max |FFT − direct DFT| = {worst:G3} (weights max-normalised)");
        if (!(worst < 1e-9)) throw new InvalidOperationException($"FFT and direct DFT weights differ by {worst:G3}");
    }

    /// <summary>Dolph–Chebyshev, N = 10,000, 30 dB, by FFT.</summary>
    [Benchmark]
    public double[] DolphChebyshev_10000() => DolphChebyshev.Weights(10_000, -30);

    /// <summary>Sampled Taylor, N = 10,000, 30 dB, n̄ = 6, for comparison.</summary>
    [Benchmark]
    public double[] Taylor_10000() => TaylorLineSource.Weights(10_000, -30, 6);

    /// <summary>Villeneuve, N = 10,000, 30 dB, n̄ = 6.</summary>
    [Benchmark]
    public double[] Villeneuve_10000() => Villeneuve.Weights(10_000, -30, 6);
}
