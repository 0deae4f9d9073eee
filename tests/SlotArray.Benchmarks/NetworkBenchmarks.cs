using System.Numerics;
using BenchmarkDotNet.Attributes;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;
using SlotArray.Core;
using SlotArray.Core.Design;
using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;

namespace SlotArray.Benchmarks;

/// <summary>
/// Network sweep of a designed standing-wave array (issue 5): N slots over a 9.2–9.55 GHz grid. The slot model is a
/// closed-form stand-in (Stevenson g_r, single-pole length dependence), so the figures measure the network, not a slot model.
/// </summary>
[MemoryDiagnoser]
public class NetworkBenchmarks
{
    private static readonly Frequency F0 = Frequency.FromGigahertz(9.375);
    private ArrayDesign design = null!;
    private ClosedFormSlot slot = null!;

    /// <summary>Number of slots.</summary>
    [Params(16, 150)]
    public int Slots { get; set; }

    /// <summary>Number of sweep frequencies.</summary>
    [Params(201, 401)]
    public int Points { get; set; }

    /// <summary>Designs the array once per parameter set.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var guide = RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium);
        slot = new ClosedFormSlot(guide);
        var request = new ArrayRequest("bench", F0, Frequency.FromGigahertz(9.2), Frequency.FromGigahertz(9.55), guide,
            new SlotRequest(SlotType.Longitudinal, Slots, slot.Width, null, SlotModelKind.Stevenson),
            new FeedRequest(FeedType.StandingWave, GuideDistance.InGuideWavelengths(0.5), FeedPosition.End, 0, GuideDistance.InGuideWavelengths(0.25)),
            TaperRequest.Uniform, CouplingMode.None, null, Requirements.None, null);
        design = StandingWaveDesigner.Design(StickRequest.Of(request, slot, Enumerable.Repeat(1.0, Slots).ToArray())).Design;
    }

    /// <summary>The sweep plus both VSWR bands.</summary>
    [Benchmark]
    public double Sweep()
    {
        var s = ArrayNetwork.Sweep(design, slot, Frequency.FromGigahertz(9.2), Frequency.FromGigahertz(9.55), Points);
        return s.Band(2.0)!.Width.Hertz + (s.Band(1.5)?.Width.Hertz ?? 0);
    }

    /// <summary>Closed-form stand-in slot: g_r = K sin²(πx/a) (Stevenson), y = g_r/(1 + jQ(L/L_r − L_r/L)).</summary>
    private sealed class ClosedFormSlot(RectangularWaveguide guide) : IShuntSlotModel
    {
        private const double Q = 5, K = 1.237057;   // K: WR-90 at 9.375 GHz, Stevenson 1948 [N]
        public RectangularWaveguide Guide { get; } = guide;
        public Length Width => Length.FromMillimeters(1.6);
        public SlotCouplingKind CouplingKind => SlotCouplingKind.Offset;
        public string Name => "benchmark closed form";
        public double MaximumCoupling => 5e-3;
        private double Lr(Frequency f) => 0.95 * f.FreeSpaceWavelength.Meters / 2;
        private double G(double x) => K * Math.Pow(Math.Sin(Math.PI * x / Guide.BroadWall.Meters), 2);
        public Complex Admittance(double coupling, Length length, Frequency f)
        {
            double r = length.Meters / Lr(f);
            return G(coupling) / new Complex(1, Q * (r - 1 / r));
        }
        public SlotResonance Resonance(double coupling, Frequency f) => new(coupling, Length.FromMeters(Lr(f)), G(coupling));
        public SlotResonance ForConductance(double conductance, Frequency f)
            => new(Guide.BroadWall.Meters / Math.PI * Math.Asin(Math.Sqrt(conductance / K)), Length.FromMeters(Lr(f)), conductance);
        public double MaximumConductance(Frequency f) => G(MaximumCoupling);
        public IReadOnlyList<DesignWarning> Warnings(double coupling, Frequency f) => [];
    }
}
