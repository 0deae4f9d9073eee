using System.Numerics;
using BenchmarkDotNet.Attributes;
using SlotArray.Core.Coupling;
using SlotArray.Core.Quantities;

namespace SlotArray.Benchmarks;

/// <summary>
/// Mutual-impedance fill of N longitudinal slots (issue 8 target: N = 1,000, i.e. 499,500 pairs, ≤ 1 s on 2 cores).
/// Layout: WR-90 standing-wave array at 9.375 GHz, λg/2 spacing, alternating offsets, slightly different lengths.
/// Cost grows as N(N − 1)/2 closed-form pair evaluations (each 18 E1(ix) evaluations), i.e. as N².
/// </summary>
[MemoryDiagnoser]
public class CouplingBenchmarks
{
    private static readonly Frequency F0 = Frequency.FromGigahertz(9.375);
    private static readonly Length Width = Length.FromMillimeters(1.5875);
    private LongitudinalSlotPlacement[] _slots = [];

    /// <summary>Number of slots.</summary>
    [Params(100, 1000)]
    public int N { get; set; }

    /// <summary>Builds the slot layout.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _slots = new LongitudinalSlotPlacement[N];
        for (int i = 0; i < N; i++)
            _slots[i] = new LongitudinalSlotPlacement(Length.FromMillimeters(11.1857 + 22.3714 * i),
                Length.FromMillimeters((i % 2 == 0 ? 1 : -1) * (1.0 + 3.0 * i / N)), Length.FromMillimeters(7.2 + 0.3 * i / N));
    }

    /// <summary>Full N × N fill on two threads (symmetric: each pair once; diagonal = self impedance, radius w/4).</summary>
    [Benchmark]
    public Complex FillTwoThreads() => SlotMutualCoupling.EquivalentDipoleImpedances(_slots, Width, F0, maxDegreeOfParallelism: 2)[0, N - 1];

    /// <summary>The same on one thread, to show the parallel speed-up.</summary>
    [Benchmark]
    public Complex FillOneThread() => SlotMutualCoupling.EquivalentDipoleImpedances(_slots, Width, F0, maxDegreeOfParallelism: 1)[0, N - 1];
}
