using SlotArray.Core.Coupling;
using SlotArray.Core.Design;
using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;
using SlotArray.Core.Tests.DesignTests;
using Xunit;
using static SlotArray.Core.Tests.DesignTests.TestArrays;

namespace SlotArray.Core.Tests.Network;

/// <summary>
/// The mutual impedances interpolated across a band equal the model's direct fills. Source of the bound: the
/// geometric convergence of Chebyshev interpolation of an analytic function (J.-P. Berrut and L. N. Trefethen,
/// "Barycentric Lagrange interpolation", SIAM Review 46(3), 2004, Sec. 6, from memory): with the centre-distance phase
/// removed the entries move by ≲ 0.2 rad over a 5 % band, so seven nodes leave an error of order 10⁻⁹ of the entries.
/// </summary>
public class CouplingAcrossBandTests
{
    [Fact]
    public void Interpolated_mutual_impedances_match_direct_fills_across_a_five_percent_band()
    {
        var slot = new StevensonTestSlot(Wr90, Width);
        var weights = Enumerable.Range(0, 16).Select(i => 0.4 + 0.6 * Math.Sin(Math.PI * (i + 0.5) / 16)).ToArray();
        var design = StandingWaveDesigner.Design(StickRequest.Of(Request(16), slot, weights)).Design;
        var placements = design.Slots.Select(s => new LongitudinalSlotPlacement(s.Position, Length.FromMeters(s.Coupling), 0.5 * s.Length)).ToArray();
        var low = Frequency.FromHertz(F0.Hertz * 0.975);
        var high = Frequency.FromHertz(F0.Hertz * 1.025);
        var band = new CouplingAcrossBand(placements, Width, low, high, CoupledSlotImpedances.HalfCosineCentreReferred);
        double worst = 0;
        foreach (double u in new[] { 0.0, 0.013, 0.37, 0.5, 0.81, 0.999, 1.0 })
        {
            var f = Frequency.FromHertz(low.Hertz + u * (high.Hertz - low.Hertz));
            Assert.True(band.Covers(f));
            var direct = CoupledSlotImpedances.HalfCosineCentreReferred(placements, Width, f);
            var interpolated = band.At(f);
            double scale = 0;
            for (int m = 0; m < 16; m++) for (int n = 0; n < 16; n++) scale = Math.Max(scale, direct[m, n].Magnitude);
            for (int m = 0; m < 16; m++) for (int n = 0; n < 16; n++) worst = Math.Max(worst, (direct[m, n] - interpolated[m, n]).Magnitude / scale);
        }
        Assert.True(worst < 1e-7, $"largest interpolation error {worst:G3} of the largest entry, expected below 1e-7");
        Assert.False(band.Covers(Frequency.FromHertz(high.Hertz * 1.001)));
    }

    [Fact]
    public void The_coupled_sweep_with_interpolated_coupling_matches_direct_fills_and_keeps_the_design_frequency_exact()
    {
        // Issue 12: CoupledArrayNetwork.Sweep fills the mutual impedances at the seven nodes of the band and interpolates
        // (the bound above); every sweep point must agree with a solve on a direct fill, and the design frequency is
        // solved on its own fill, so its figures are Solve's to the bit.
        var slot = new StevensonTestSlot(Wr90, Width);
        var weights = Enumerable.Range(0, 16).Select(i => 0.4 + 0.6 * Math.Sin(Math.PI * (i + 0.5) / 16)).ToArray();
        var design = StandingWaveDesigner.Design(StickRequest.Of(Request(16), slot, weights)).Design;
        var low = Frequency.FromHertz(F0.Hertz * 0.98);
        var high = Frequency.FromHertz(F0.Hertz * 1.02);
        var sweep = CoupledArrayNetwork.Sweep(design, slot, low, high, 9);
        var atDesign = CoupledArrayNetwork.Solve(design, slot, design.DesignFrequency);
        Assert.Equal(atDesign.S11, sweep.AtDesign.S11);
        Assert.Equal(atDesign.Excitations, sweep.AtDesign.Excitations);
        double worst = 0;
        foreach (var p in sweep.Points)
        {
            var direct = CoupledArrayNetwork.Solve(design, slot, p.Frequency);
            worst = Math.Max(worst, (direct.S11 - p.S11).Magnitude);
            for (int n = 0; n < design.Count; n++)
                worst = Math.Max(worst, (direct.Excitations[n] - p.Excitations[n]).Magnitude / direct.Excitations.Max(e => e.Magnitude));
        }
        Assert.True(worst < 1e-7, $"largest difference from direct fills {worst:G3}, expected below 1e-7");
    }
}
