using SlotArray.Core.Design;
using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;
using SlotArray.Core.Tests.DesignTests;
using SlotArray.Tests.Shared;
using static SlotArray.Core.Tests.DesignTests.TestArrays;

namespace SlotArray.Core.Tests.Network;

/// <summary>Far-field figures from the network's excitations.</summary>
public class ArrayFiguresTests
{
    [Fact]
    public void Uniform_ten_slot_resonant_array_has_the_reference_directivity_and_gain()
    {
        // IEEE Std 145-2013 directivity [N]: N = 10 uniform, d = 0.69959 λ (= λg/2 at 9.375 GHz in WR-90), half-wave slot
        // element, half-space: D = 28.420. Lossless and matched: gain = D.
        var slot = StevensonTestSlot.FrequencyIndependent(Wr90Lossless, Width, F0);
        var d = StandingWaveDesigner.Design(StickRequest.Of(Request(10, guide: Wr90Lossless), slot, Uniform(10))).Design;
        var fig = ArrayFigures.At(d, ArrayNetwork.Solve(d, slot, F0));
        Check.Relative(28.420, fig.Directivity, 2e-5, "IEEE Std 145-2013 directivity [N]");
        Check.Relative(28.420, fig.Gain, 2e-5, "lossless, matched: gain = directivity");
        Check.Absolute(0, fig.Metrics.BeamDirection.Degrees, 1e-6, "resonant array: broadside beam (Elliott 1981, Ch. 8)");
        // Aluminium walls: gain = D × radiated fraction of the incident power (definition, issue 5 item 3).
        var lossySlot = new StevensonTestSlot(Wr90, Width);
        var lossy = StandingWaveDesigner.Design(StickRequest.Of(Request(10), lossySlot, Uniform(10))).Design;
        var lf = ArrayFigures.At(lossy, ArrayNetwork.Solve(lossy, lossySlot, F0));
        Check.Relative(lf.Directivity * lf.Network.RadiationEfficiency * (1 - lf.Network.ReflectedPower), lf.Gain, 1e-12, "G = D η (1 − |S11|²)");
        Assert.True(lf.Gain < lf.Directivity);
    }

    [Theory]
    [InlineData(9.0, -3.412)]
    [InlineData(9.75, 3.030)]
    public void A_matched_load_array_scans_with_frequency_toward_the_load_end(double ghz, double degrees)
    {
        // Elliott 1981, Ch. 8 [N]: alternating offsets, d = λg0/2 = 22.3714 mm: 9.0 GHz → −3.412°, 9.75 GHz → +3.030°,
        // positive toward the load end (architecture.md "Axes"). Weak slots (g = 0.02) keep slot reflections small.
        var slot = StevensonTestSlot.FrequencyIndependent(Wr90Lossless, Width, F0);
        var design = StandingWaveDesigner.Design(StickRequest.Of(Request(50, guide: Wr90Lossless), slot, Uniform(50))).Design;
        design = design with { NearTermination = Termination.MatchedLoadAt(design.NearTermination.Distance) };
        var fig = ArrayFigures.At(design, ArrayNetwork.Solve(design, slot, Frequency.FromGigahertz(ghz)));
        Check.Absolute(degrees, fig.Metrics.BeamDirection.Degrees, 0.02, "Elliott 1981, Ch. 8 [N] travelling-wave beam");
    }

    [Fact]
    public void Sweep_figures_cover_every_point_and_the_design_frequency()
    {
        var slot = new StevensonTestSlot(Wr90, Width);
        var d = StandingWaveDesigner.Design(StickRequest.Of(Request(10), slot, Taylor25Amplitudes)).Design;
        var sweep = ArrayNetwork.Sweep(d, slot, Frequency.FromGigahertz(9.2), Frequency.FromGigahertz(9.55), 8);
        var (atDesign, points) = ArrayFigures.ForSweep(d, sweep);
        Assert.Equal(8, points.Count);
        Assert.Equal(F0, atDesign.Frequency);
        Assert.All(points, p => Assert.True(p.Gain < p.Directivity && p.Metrics.PeakSidelobeDb < 0));
        // Taylor 25 dB n̄ = 4 sampled at N = 10 (Elliott 1981, Ch. 8 weights): the achieved pattern's sidelobes at f0
        // stay within 1 dB of the design level (the slot element pattern lowers the far lobes further).
        Assert.InRange(atDesign.Metrics.PeakSidelobeDb!.Value, -27, -24);
    }
}
