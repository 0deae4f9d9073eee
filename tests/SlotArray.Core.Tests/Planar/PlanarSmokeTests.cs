using System.Numerics;
using SlotArray.Core.Patterns;
using SlotArray.Core.Planar;
using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;
using SlotArray.Core.Tests.DesignTests;
using Xunit.Abstractions;
using static SlotArray.Core.Tests.DesignTests.TestArrays;

namespace SlotArray.Core.Tests.PlanarTests;

public class PlanarSmokeTests(ITestOutputHelper output)
{
    [Theory]
    [InlineData(false, FeedPosition.Centre, 0)]
    [InlineData(true, FeedPosition.Centre, 0)]
    [InlineData(true, FeedPosition.End, 0)]
    [InlineData(true, FeedPosition.Centre, 1)]
    public void Smoke(bool coupled, FeedPosition feedPos, int outlineCode)
    {
        var outline = (PlanarOutline)outlineCode; var guide = Wr90Lossless;
        var slot = new StevensonTestSlot(guide, Width);
        var pitch = Length.FromMillimeters(22.86 + 1.0);
        var fw = FeedGuideSizing.FeedWidthForPitch(pitch, F0);
        var feed = guide with { BroadWall = fw };
        int cols = outline == PlanarOutline.Circle ? 14 : 10, rows = outline == PlanarOutline.Circle ? 12 : 8;
        var layout = PlanarLayout.Create(rows, cols, 0.5 * guide.GuideWavelength(F0), pitch, outline);
        var t = new TaperRequest(TaperType.Taylor, -25, 4, -20, 2, null);
        var taper = outline == PlanarOutline.Circle ? ApertureTaper.CircularTaylor(-30, 5) : new ApertureTaper(t, t);
        var req = new PlanarRequest("smoke", guide, feed, F0, layout, taper, slot, feedPos, coupled);
        var sw = System.Diagnostics.Stopwatch.StartNew();
        var d = PlanarDesigner.Design(req);
        output.WriteLine($"design {sw.ElapsedMilliseconds} ms, {layout.Count} slots, iterations {d.Iterations.Count}, feed a {fw}");
        foreach (var b in d.Branches) output.WriteLine($"branch {b.Number} y {b.Y*1e3:0.00} r {b.Coupling.Resistance:0.0000} tilt {b.Coupling.Tilt.Degrees:0.00}");
        sw.Restart();
        var sol = PlanarNetwork.Solve(d, slot, F0, coupled);
        output.WriteLine($"network {sw.ElapsedMilliseconds} ms S11 {20*Math.Log10(sol.S11.Magnitude):0.00} dB; Pin {sol.InputPower:G12} sum {sol.SlotPowers.Sum():G12}");
        var x = new double[layout.Count]; var y = new double[layout.Count];
        var pl = PlanarDesigner.Placements(d);
        for (int i = 0; i < x.Length; i++) { x[i] = pl[i].Position.Meters; y[i] = pl[i].Offset.Meters; }
        var af = new PlanarArrayFactor(x, y, sol.Excitations, F0.FreeSpaceWavenumber);
        sw.Restart();
        var (beam, psl) = af.BeamAndPeakSidelobe();
        output.WriteLine($"psl {psl} beam {beam} in {sw.ElapsedMilliseconds} ms");
        var grid = AngleGrid.UniformInTheta(-Math.PI / 2, Math.PI / 2, 3601);
        var m0 = PatternMetrics.Measure(af.Cut(0, grid)); var m90 = PatternMetrics.Measure(af.Cut(Math.PI / 2, grid));
        output.WriteLine($"H-plane psl {m0.PeakSidelobeDb:0.00} hpbw {m0.HalfPowerBeamwidth.Degrees:0.00}; E-plane psl {m90.PeakSidelobeDb:0.00} hpbw {m90.HalfPowerBeamwidth.Degrees:0.00}");
        sw.Restart();
        double dir = af.Directivity();
        double eta = PatternMetrics.TaperEfficiency(sol.Excitations);
        output.WriteLine($"D {10*Math.Log10(dir):0.00} dBi vs 4piA/l2 eta {10*Math.Log10(4*Math.PI*layout.Area*eta/Math.Pow(F0.FreeSpaceWavelength.Meters,2)):0.00} ({sw.ElapsedMilliseconds} ms)");
        var errs = Enumerable.Range(0, x.Length).Select(i => sol.Excitations[i] / d.Amplitudes[i]).ToArray();
        var mean = errs.Aggregate(Complex.Zero, (s, v) => s + v) / errs.Length;
        output.WriteLine($"exc err max dB {errs.Max(e => Math.Abs(20*Math.Log10((e/mean).Magnitude))):0.000} deg {errs.Max(e => Math.Abs((e/mean).Phase*180/Math.PI)):0.00}");
    }
}
