using System.Numerics;
using BenchmarkDotNet.Attributes;
using SlotArray.Core.Design;
using SlotArray.Core.Patterns;
using SlotArray.Core.Planar;
using SlotArray.Core.Quantities;
using SlotArray.Core.Tapers;
using SlotArray.Core.Waveguides;

namespace SlotArray.Benchmarks;

/// <summary>
/// Issue 17's planar targets: the u-v pattern of 1,000 slots on a 256 × 256 grid (≤ 0.5 s) and Elliott's coupled planar design
/// of about 1,000 slots (≤ 30 s): a 32-branch × 32-slot WR-90 aperture at 9.375 GHz, separable Taylor −25/−25 dB, Stevenson
/// slots (the moment method's characterisation would add its own cold-start cost), design only (the band sweep is the
/// pipeline's). Run one at a time with --job dry on a shared machine, e.g. <c>--filter '*Planar*UvGrid*' --job dry</c>.
/// </summary>
public class PlanarBenchmarks
{
    private PlanarArrayFactor field = null!;
    private PlanarRequest request = null!;

    /// <summary>Builds the aperture and its request.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var f0 = Frequency.FromGigahertz(9.375);
        var guide = RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium);
        var pitch = Length.FromMillimeters(23.86);
        var layout = PlanarLayout.Create(32, 32, 0.5 * guide.GuideWavelength(f0), pitch, PlanarOutline.Rectangle);
        var t = new TaperRequest(TaperType.Taylor, -25, 4, -20, 2, null);
        var taper = new ApertureTaper(t, t);
        var (w, _, _) = taper.Weights(layout);
        field = new PlanarArrayFactor(layout.Slots.Select(s => s.X).ToArray(), layout.Slots.Select(s => s.Y).ToArray(),
            w.Select(a => new Complex(a, 0)).ToArray(), f0.FreeSpaceWavenumber);
        var slot = Core.Slots.LongitudinalSlotModels.Create(Core.Slots.SlotModelKind.Stevenson, guide, Length.FromMillimeters(1.6), f0);
        request = new PlanarRequest("bench", guide, guide with { BroadWall = FeedGuideSizing.FeedWidthForPitch(pitch, f0) }, f0, layout, taper,
            slot, Core.Stick.FeedPosition.Centre, true);
    }

    /// <summary>|F|² of 1,024 slots on a 256 × 256 u-v grid.</summary>
    [Benchmark]
    public double UvGrid() => field.PowerGrid(256)[128, 128];

    /// <summary>Elliott's coupled design of 1,024 slots with the feed.</summary>
    [Benchmark]
    public int CoupledDesign() => PlanarDesigner.Design(request).Iterations.Count;
}
