using BenchmarkDotNet.Attributes;
using SlotArray.Core.Patterns;
using Complex = System.Numerics.Complex;

namespace SlotArray.Benchmarks;

/// <summary>
/// Issue 3 target: the pattern of N = 1,000 elements on 8,192 angles in ≤ 20 ms, both on the uniform-spacing fast
/// path and by the direct sum for arbitrary positions.
/// </summary>
[MemoryDiagnoser]
public class PatternBenchmarks
{
    private const double K = 2 * Math.PI;          // λ = 1 m
    private double[] uniform = [];
    private double[] jittered = [];
    private Complex[] excitations = [];
    private AngleGrid grid = AngleGrid.HalfSpaceInTheta(8192);
    private AngleGrid asymmetric = AngleGrid.UniformInTheta(-1.2, 1.5, 8192);

    /// <summary>Positions, excitations and the grid.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var rng = new Random(1);
        uniform = ArrayGeometry.Uniform(1000, 0.7);
        jittered = uniform.Select(z => z + 0.01 * (rng.NextDouble() - 0.5)).ToArray();
        excitations = uniform.Select(_ => Complex.FromPolarCoordinates(0.5 + rng.NextDouble(), rng.NextDouble())).ToArray();
        grid = AngleGrid.HalfSpaceInTheta(8192);
        asymmetric = AngleGrid.UniformInTheta(-1.2, 1.5, 8192);
    }

    /// <summary>Uniform spacing: vectorised Horner recurrence.</summary>
    [Benchmark]
    public object UniformSpacing_1000x8192() => ArrayFactor.Compute(uniform, excitations, K, grid, ElementPatterns.HalfWaveSlotHPlane);

    /// <summary>Arbitrary positions on an asymmetric grid (−68.8° … 85.9°): no ±u sharing.</summary>
    [Benchmark]
    public object ArbitraryPositions_AsymmetricGrid_1000x8192() => ArrayFactor.Compute(jittered, excitations, K, asymmetric, ElementPatterns.HalfWaveSlotHPlane);

    /// <summary>Arbitrary positions: vectorised direct sum (the −90° … 90° grid is symmetric, so ±u share the sines).</summary>
    [Benchmark]
    public object ArbitraryPositions_1000x8192() => ArrayFactor.Compute(jittered, excitations, K, grid, ElementPatterns.HalfWaveSlotHPlane);
}
