using BenchmarkDotNet.Attributes;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;

namespace SlotArray.Benchmarks;

/// <summary>
/// Longitudinal-slot moment method (WR-90, 1.27 mm wall, 1.5875 mm slot, 9.375 GHz, default truncation: P = 9 and 15 with Richardson extrapolation).
/// Targets (issue 4): one finite-wall y(L, x, f) ≤ 2 ms on one core; a 30-offset characterisation with its resonant
/// searches ≤ 1 s on 2 cores.
/// </summary>
[MemoryDiagnoser]
public class SlotBenchmarks
{
    private static readonly RectangularWaveguide Guide =
        RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Copper);
    private static readonly Length Width = Length.FromMillimeters(1.5875);
    private static readonly Frequency F = Frequency.FromGigahertz(9.375);
    private readonly LongitudinalSlotMomentMethod _warm = new(Guide, Width);
    private int _i;

    /// <summary>Warms the per-offset sums once.</summary>
    [GlobalSetup]
    public void Setup() => _warm.Solve(Length.FromMillimeters(2), Length.FromMillimeters(15.2), F);

    /// <summary>y at a new length, offset already seen (the length-independent sums cached): the resonant-search step.</summary>
    [Benchmark]
    public System.Numerics.Complex AdmittanceNewLength()
        => _warm.Solve(Length.FromMillimeters(2), Length.FromMillimeters(15.2 + 1e-4 * (++_i % 100)), F).Admittance;

    /// <summary>y with a cold solver (a new offset: the length-independent sums are computed as well).</summary>
    [Benchmark]
    public System.Numerics.Complex AdmittanceColdOffset()
        => new LongitudinalSlotMomentMethod(Guide, Width).Solve(Length.FromMillimeters(2), Length.FromMillimeters(15.2), F).Admittance;

    /// <summary>The 30-offset resonant characterisation, uncached, parallel over offsets.</summary>
    [Benchmark]
    public double CharacterisationTable30Offsets()
        => ResonantCharacterisation.ComputeUncached(new LongitudinalSlotMomentMethod(Guide, Width), F, 30).MaximumConductance;
}
