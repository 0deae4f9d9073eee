using BenchmarkDotNet.Attributes;
using SlotArray.Core.Design;
using SlotArray.Core.Fabrication;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;
using SlotArray.Core.Tolerance;
using SlotArray.Core.Waveguides;

namespace SlotArray.Benchmarks;

/// <summary>
/// Issue 7's target: 10,000 Monte Carlo trials of a standing-wave array of N moment-method slots (WR-90, 1.27 mm
/// aluminium wall, 9.375 GHz, Taylor −30 dB n̄ 5), each trial a line-network solve with every slot's admittance from its
/// surrogate, a 2048-point pattern cut, its metrics, the half-space directivity and the error floor, on 2 threads;
/// the statistics and the 256-angle percentile envelope included. The surrogates (real moment-method solves) are built
/// in the setup, once per design, as the tolerance command does before its trials.
/// Measured (--job short, 2 cores shared with other work, load average 2–7): N = 16: 1.05 s, N = 64: 1.87 s, N = 128: 3.59 s
/// per 10,000 trials, i.e. 0.19 ms of wall time per trial at N = 64 on 2 threads (CPU ≈ 0.34 ms per trial, measured apart).
/// Growth: a fixed ≈ 0.2 ms CPU per trial (pattern metrics, envelope, network set-up, statistics) plus a part linear in N
/// (the cut's Horner sums, N × 2049 × 3 series terms), with the O(N²) power kernel showing from N ≈ 256 (1.5 ms CPU per trial).
/// Under heavy contention (load average 13–20) the same run took 5.8 s at N = 64.
/// Issue 12 (512-bit Goertzel sums without register copies, vectorised half-space power, lobe refinement only where it can
/// win, bounded envelope sample): --job short --inProcess at load average 13–20: N = 16: 2.0 s, N = 64: 1.78 s, N = 128:
/// 2.83 s (allocated 41 / 96 / 171 MB per 10,000 trials: the per-trial network still allocates); not comparable with the
/// quiet figures above. One thread at N = 64, measured apart with a stopwatch: before, about 120 µs a trial (24 µs network,
/// 96 µs evaluation; wall clock, load 6–8); after, 65 µs of process CPU a trial (load 8–12: Goertzel sums 21 µs, line
/// network and surrogates 12–15 µs, peak-sidelobe search 6 µs, half-space power 5.5 µs, floor 3 µs).
/// </summary>
[MemoryDiagnoser]
public class ToleranceBenchmarks
{
    private static readonly Frequency F0 = Frequency.FromGigahertz(9.375);
    private static readonly ToleranceOptions Options = new(PatternPoints: 2048, MaxThreads: 2);
    private ArrayTrialModel model = null!;

    /// <summary>Number of slots.</summary>
    [Params(16, 64, 128)]
    public int Slots { get; set; }

    /// <summary>Designs the array and builds its surrogates.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var guide = RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium);
        var width = Length.FromMillimeters(1.6);
        MachiningTolerance U(double mm) => new(Length.FromMillimeters(mm), ErrorDistribution.Uniform);
        var tol = new ToleranceRequest(U(0.02), U(0.03), U(0.03), U(0.02), U(0.05), new MachiningTolerance(Length.FromMillimeters(0.05), ErrorDistribution.Normal),
            Length.Zero, Length.Zero, 10_000, 7);
        var request = new ArrayRequest("bench", F0, Frequency.FromGigahertz(9.2), Frequency.FromGigahertz(9.55), guide,
            new SlotRequest(SlotType.Longitudinal, Slots, width, null, SlotModelKind.MomentMethod),
            new FeedRequest(FeedType.StandingWave, GuideDistance.InGuideWavelengths(0.5), FeedPosition.End, 0, GuideDistance.InGuideWavelengths(0.25)),
            new TaperRequest(TaperType.Taylor, -30, 5, -20, 2, null), CouplingMode.None, tol, Requirements.None, null);
        var slot = new MomentMethodSlotModel(guide, width);
        var design = StandingWaveDesigner.Design(StickRequest.Of(request, slot, TaperSynthesis.Synthesize(request.Taper, Slots).Weights)).Design;
        model = ArrayTrialModel.Build(design, slot, ToleranceAnalysis.FactoryFor(request), tol, Options);
    }

    /// <summary>10,000 trials and their statistics.</summary>
    [Benchmark]
    public double TenThousandTrials() => ToleranceMonteCarlo.Run(model, 10_000, 7, -30, Options).PeakSidelobeDb.P95;
}
