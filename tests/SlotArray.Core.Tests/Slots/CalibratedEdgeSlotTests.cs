using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;
using SlotArray.Tests.Shared;
using Xunit.Abstractions;

namespace SlotArray.Core.Tests.Slots;

/// <summary>
/// The calibrated edge-slot model against the full-wave runs it rests on (data/fullwave/edge-slot-calibration.csv: the
/// project's own openEMS runs, provenance in the file) and against the independent full-wave figures quoted in issue 20.
/// </summary>
public sealed class CalibratedEdgeSlotTests(ITestOutputHelper log)
{
    private static readonly RectangularWaveguide Wr90 = RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium);
    private static readonly Length Kerf = Length.FromMillimeters(1.6);
    private static readonly Frequency F0 = Frequency.FromGigahertz(9.375);
    private const string Runs = "the project's openEMS runs, data/fullwave/edge-slot-calibration.csv";

    private static EdgeSlotCalibrationFamily Wr90Tube =>
        EdgeSlotCalibration.Families.Single(f => f.Guide == "WR-90" && f.Surround == EdgeSlotSurround.Tube && f.Form == "saw");

    [Fact]
    public void The_interpolation_passes_through_every_run()
    {
        foreach (var fam in EdgeSlotCalibration.Families)
        {
            var guide = RectangularWaveguide.Create(Length.FromMillimeters(fam.BroadWallMm), Length.FromMillimeters(fam.NarrowWallMm), Length.FromMillimeters(fam.WallMm), Metal.Aluminium);
            var surface = new EdgeSlotAdmittanceSurface(fam, guide);
            foreach (var t in fam.Tilts)
                for (int j = 0; j < t.DepthsMm.Count; j++)
                    for (int k = 0; k < fam.FrequenciesHz.Count; k += 3)
                    {
                        var y = surface.AtFamily(t.TiltDeg * Math.PI / 180, t.DepthsMm[j], fam.FrequenciesHz[k]);
                        Check.Absolute(t.Y[j, k].Real, y.Real, 1e-9, Runs);
                        Check.Absolute(t.Y[j, k].Imaginary, y.Imaginary, 1e-9, Runs);
                    }
        }
    }

    [Fact]
    public void A_tilt_left_out_of_the_table_is_predicted_from_its_neighbours()
    {
        var fam = Wr90Tube;
        var full = CalibratedEdgeSlot.Create(Wr90, Kerf, EdgeSlotSurround.Tube, [fam]);
        for (int i = 1; i + 1 < fam.Tilts.Count; i++)
        {
            var without = fam with { Tilts = [.. fam.Tilts.Where((_, k) => k != i)] };
            var model = CalibratedEdgeSlot.Create(Wr90, Kerf, EdgeSlotSurround.Tube, [without]);
            double th = fam.Tilts[i].TiltDeg * Math.PI / 180;
            var truth = full.DesignCut(th, F0);
            var guess = model.DesignCut(th, F0);
            log.WriteLine($"tilt {fam.Tilts[i].TiltDeg} deg: runs {truth.DepthMm:0.000} mm y {truth.Admittance.Real:0.0000}{truth.Admittance.Imaginary:+0.0000;-0.0000}j, "
                + $"left out {guess.DepthMm:0.000} mm y {guess.Admittance.Real:0.0000}{guess.Admittance.Imaginary:+0.0000;-0.0000}j");
            // The runs at that tilt read directly (the full table passes through them) against the neighbours' interpolation.
            var yRun = full.Admittance(th, full.DevelopedLength(th, truth.DepthMm), F0);
            var yGuess = model.Admittance(th, model.DevelopedLength(th, truth.DepthMm), F0);
            Assert.True((yGuess - yRun).Magnitude <= 0.01 + 0.1 * yRun.Magnitude,
                $"tilt {fam.Tilts[i].TiltDeg} deg: y {yGuess} from the neighbours against {yRun} from the runs ({Runs}; issue 20 target 0.01 + 10 %)");
        }
    }

    [Fact]
    public void At_small_tilts_no_depth_is_purely_conductive_and_the_background_is_capacitive()
    {
        // Issue 20's independent runs: at 10 deg "a capacitive background of about j0.01 rides on the slot's resonance";
        // our runs at 5 deg: b > 0 at every depth run.
        var fam = Wr90Tube;
        var five = fam.Tilts.First(t => t.TiltDeg == 5);
        int k0 = fam.FrequenciesHz.ToList().FindIndex(f => Math.Abs(f - F0.Hertz) < 1);
        for (int j = 0; j < five.DepthsMm.Count; j++) Assert.True(five.Y[j, k0].Imaginary > 0, $"b > 0 at 5 deg, {five.DepthsMm[j]} mm ({Runs})");
        var cut = CalibratedEdgeSlot.Create(Wr90, Kerf).DesignCut(5 * Math.PI / 180, F0);
        Assert.False(cut.Resonant);
        Assert.True(cut.Admittance.Imaginary > 0);
    }

    [Fact]
    public void Against_the_independent_full_wave_figures_quoted_in_issue_20()
    {
        // Issue 20 (independent FDTD, bare WR-90 tube, 1.27 mm wall, 1.6 mm saw, 9.375 GHz): 20 deg resonant at
        // D = 3.29 mm, g = 0.067; 10 deg: no purely conductive depth, conductance peak 0.015 at 3.24 mm.
        var model = CalibratedEdgeSlot.Create(Wr90, Kerf);
        var c20 = model.DesignCut(20 * Math.PI / 180, F0);
        var c10 = model.DesignCut(10 * Math.PI / 180, F0);
        log.WriteLine($"20 deg: {(c20.Resonant ? "resonant" : "not resonant")} at {c20.DepthMm:0.000} mm, g {c20.Admittance.Real:0.0000}, peak {c20.PeakConductance:0.0000} at {c20.PeakDepthMm:0.000}");
        log.WriteLine($"10 deg: {(c10.Resonant ? "resonant" : "not resonant")} at {c10.DepthMm:0.000} mm, y {c10.Admittance}, peak {c10.PeakConductance:0.0000} at {c10.PeakDepthMm:0.000}");
        Assert.True(c20.Resonant);
        Check.Relative(0.067, c20.Admittance.Real, 0.10, "independent FDTD figures quoted in issue 20 (20 deg resonant conductance)");
        // Depth: our runs resonate shallower than the issue's reference (README, edge-slot model limits): held to 0.3 mm.
        Check.Absolute(3.29, c20.DepthMm, 0.3, "independent FDTD figures quoted in issue 20 (20 deg resonant depth)");
        Check.Relative(0.015, c10.PeakConductance, 0.25, "independent FDTD figures quoted in issue 20 (10 deg conductance peak)");
    }
}
