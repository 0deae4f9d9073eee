using System.Numerics;
using SlotArray.Core.Design;
using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;
using SlotArray.Core.Tests.DesignTests;
using SlotArray.Tests.Shared;
using static SlotArray.Core.Tests.DesignTests.TestArrays;

namespace SlotArray.Core.Tests.Network;

/// <summary>Network analysis of designed arrays: power balance, match at resonance, the taper reproduced, bandwidths.</summary>
public class ArrayNetworkTests
{
    private static readonly Frequency Low = Frequency.FromGigahertz(7), High = Frequency.FromGigahertz(12), Step = Frequency.FromMegahertz(5);

    public static TheoryData<FeedPosition, bool, string> Cases => new()
    {
        { FeedPosition.End, false, "short" }, { FeedPosition.Centre, false, "short" }, { FeedPosition.End, true, "short" },
        { FeedPosition.Centre, true, "short" }, { FeedPosition.End, true, "matched" }, { FeedPosition.End, true, "load" },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Radiated_plus_wall_loss_plus_load_plus_reflected_is_the_incident_power(FeedPosition feed, bool taylor, string end)
    {
        var slot = new StevensonTestSlot(Wr90, Width, maximumCoupling: 8e-3);
        var d = StandingWaveDesigner.Design(StickRequest.Of(Request(10, feed), slot, taylor ? Taylor25Amplitudes : Uniform(10))).Design;
        d = end switch
        {
            "matched" => d with { NearTermination = Termination.MatchedLoadAt(Length.FromMillimeters(40)) },
            "load" => d with { NearTermination = Termination.LoadAt(Length.FromMillimeters(17), new Complex(0.3, -0.8)) },
            _ => d,
        };
        var sweep = ArrayNetwork.Sweep(d, slot, Frequency.FromGigahertz(8.5), Frequency.FromGigahertz(10.5), 41);
        foreach (var s in sweep.Points.Append(sweep.AtDesign))
        {
            Check.Absolute(0, s.PowerBalanceError, 1e-9, "energy conservation of a passive network");
            Assert.True(s.WallLoss > 0 && s.LoadPower >= 0 && s.RadiatedPowers.All(p => p >= 0), $"negative power at {s.Frequency}");
            if (end == "short") Assert.Equal(0, s.LoadPower);
        }
    }

    [Theory]
    [InlineData(FeedPosition.End)]
    [InlineData(FeedPosition.Centre)]
    public void A_resonant_array_of_resonant_slots_is_matched_at_the_design_frequency(FeedPosition feed)
    {
        // Elliott 1981, Ch. 8 [M]: all slots resonant, Σ g = 1 (per half), short λg/4 → y_in = 1. Lossless line: exact.
        var slot = new StevensonTestSlot(Wr90Lossless, Width);
        var d = StandingWaveDesigner.Design(StickRequest.Of(Request(16, feed, Wr90Lossless), slot, Uniform(16))).Design;
        var s = ArrayNetwork.Solve(d, slot, F0);
        Check.Absolute(0, s.S11.Magnitude, 1e-9, "Elliott 1981, Ch. 8: resonant array matched at f0");
        Check.Absolute(1, s.RadiatedPower, 1e-9, "lossless: all power radiated");
        if (feed == FeedPosition.End)   // derived: each section looks into a real y ≤ 1, so its voltage maximum is at a slot, where |V| = 1
            Check.Absolute(1, s.PeakModeVoltage, 1e-9, "matched resonant line: peak |V| equals the incident wave's");
        // Aluminium walls: the loss unbalances the mode voltages slightly; the match stays better than 40 dB return loss.
        var lossy = StandingWaveDesigner.Design(StickRequest.Of(Request(16, feed), new StevensonTestSlot(Wr90, Width), Uniform(16))).Design;
        Assert.True(ArrayNetwork.Solve(lossy, new StevensonTestSlot(Wr90, Width), F0).ReturnLossDb > 40);
    }

    [Theory]
    [InlineData(FeedPosition.End)]
    [InlineData(FeedPosition.Centre)]
    public void The_slot_excitations_reproduce_the_signed_taper_at_the_design_frequency(FeedPosition feed)
    {
        // Design against analysis: excitation e_n ∝ a_n at f0 on a lossless line (Elliott 1983 and Elliott 1981, Ch. 8:
        // equal mode-voltage magnitudes, alternation cancelled by the offset signs). Checks the alternation across the
        // centre junction and the sign of a negative weight.
        var slot = new StevensonTestSlot(Wr90Lossless, Width);
        var a = Taylor25Amplitudes;
        a[3] = -a[3];
        var d = StandingWaveDesigner.Design(StickRequest.Of(Request(10, feed, Wr90Lossless), slot, a)).Design;
        var s = ArrayNetwork.Solve(d, slot, F0);
        var reference = s.Excitations[0] / a[0];
        for (int i = 0; i < 10; i++)
        {
            var ratio = s.Excitations[i] / a[i] / reference;
            Check.Absolute(1, ratio.Real, 1e-9, $"e_{i + 1}/a_{i + 1} equal for all slots");
            Check.Absolute(0, ratio.Imaginary, 1e-9, $"e_{i + 1} in phase with the taper");
            Check.Relative(s.ModeVoltages[0].Magnitude, s.ModeVoltages[i].Magnitude, 1e-9, "equal mode-voltage magnitudes (Elliott 1983)");
        }
    }

    [Fact]
    public void Slot_admittances_are_evaluated_at_each_slots_geometry_and_frequency()
    {
        var slot = new StevensonTestSlot(Wr90, Width);
        var d = StandingWaveDesigner.Design(StickRequest.Of(Request(10), slot, Taylor25Amplitudes)).Design;
        var f = Frequency.FromGigahertz(9.6);
        var s = ArrayNetwork.Solve(d, slot, f);
        for (int i = 0; i < 10; i++)
            Assert.Equal(slot.Admittance(d.Slots[i].Coupling, d.Slots[i].Length, f), s.SlotAdmittances[i]);
        Assert.True(Math.Abs(s.SlotAdmittances[0].Imaginary) > 1e-3, "off resonance the test slot has a susceptance");
    }

    [Theory]
    [InlineData(4, 8.51)]
    [InlineData(8, 4.22)]
    [InlineData(10, 3.38)]
    [InlineData(16, 2.11)]
    [InlineData(20, 1.69)]
    [InlineData(32, 1.05)]
    public void Idealised_end_fed_line_has_the_reference_VSWR_2_bandwidth(int n, double percent)
    {
        // numpy line model [N]: N frequency-independent g = 1/N, λg0/2 spacing, short at λg0/4, WR-90 dispersion,
        // VSWR ≤ 2 → 8.51, 4.22, 3.38, 2.11, 1.69, 1.05 % (≈ 33.7 %/N). Quoted to 3 digits: ±0.005 %.
        var band = IdealBand(n, FeedPosition.End);
        Check.Absolute(percent, 100 * band.FractionalWidth, 0.005, "numpy line model [N], idealised bandwidth");
        Assert.False(band.LowLimited || band.HighLimited);
    }

    [Theory]
    [InlineData(8)]
    [InlineData(16)]
    [InlineData(32)]
    public void Centre_feed_with_halves_matched_to_the_junction_doubles_the_ideal_bandwidth(int n)
    {
        // Lossless: |Γ| is invariant along a line, and the λg/4 inversion maps a half's Γ onto the feed (z_feed = z_half),
        // so a centre-fed N array has exactly the VSWR of an end-fed N/2 array (derivation in StandingWaveDesigner's
        // remarks); common practice [C]: "centre-feeding roughly doubles the bandwidth".
        var centre = IdealBand(n, FeedPosition.Centre);
        var halfEnd = IdealBand(n / 2, FeedPosition.End);
        Check.Relative(halfEnd.FractionalWidth, centre.FractionalWidth, 1e-6, "centre-fed N ≡ end-fed N/2 (derived)");
        Check.Relative(2, centre.FractionalWidth / IdealBand(n, FeedPosition.End).FractionalWidth, 0.02, "common practice [C]: about double");
    }

    [Fact]
    public void Slot_dispersion_changes_the_ideal_bandwidth_less_as_the_array_grows()
    {
        // Relation found (see the report): the slot's series-type resonance y = g/(1 + jQ(f/f_r − f_r/f)) has a
        // susceptance slope −2Q·Σg opposite to the line's, which grows ∝ N; so at Q = 5 it widens the band, by less as N
        // grows, and only the conductance dispersion of Stevenson's g_r(f) (Q = 0) narrows it, slightly.
        double previous = double.PositiveInfinity;
        foreach (int n in new[] { 4, 10, 32 })
        {
            double ideal = IdealBand(n, FeedPosition.End).FractionalWidth;
            double resonant = Band(new StevensonTestSlot(Wr90Lossless, Width, q: 5, maximumCoupling: 8e-3), n).FractionalWidth;
            double conductanceOnly = Band(new StevensonTestSlot(Wr90Lossless, Width, q: 0, maximumCoupling: 8e-3), n).FractionalWidth;
            Assert.True(resonant > ideal, $"N = {n}: Q = 5 band {resonant:P3} not wider than ideal {ideal:P3}");
            Assert.True(conductanceOnly < ideal, $"N = {n}: g_r(f) band {conductanceOnly:P3} not narrower than ideal {ideal:P3}");
            Assert.True(resonant / ideal < previous, $"N = {n}: widening did not shrink with N");
            previous = resonant / ideal;
        }
    }

    [Fact]
    public void Sweep_bands_agree_with_the_root_found_bands_and_nest()
    {
        var slot = new StevensonTestSlot(Wr90, Width);
        var d = StandingWaveDesigner.Design(StickRequest.Of(Request(10), slot, Taylor25Amplitudes)).Design;
        var sweep = ArrayNetwork.Sweep(d, slot, Frequency.FromGigahertz(9.0), Frequency.FromGigahertz(9.8), 401);
        double step = 0.8e9 / 400;
        foreach (double limit in new[] { 1.5, 2.0 })
        {
            var grid = sweep.Band(limit)!;
            var exact = ArrayNetwork.FindBand(d, slot, limit, Low, High, Step)!;
            Check.Absolute(exact.Low.Hertz, grid.Low.Hertz, 0.05 * step, "bisection to 1e-9 f0 vs linear interpolation on the grid");
            Check.Absolute(exact.High.Hertz, grid.High.Hertz, 0.05 * step, "bisection to 1e-9 f0 vs linear interpolation on the grid");
            Assert.True(grid.Low < F0 && F0 < grid.High);
        }
        Assert.True(sweep.Band(1.5)!.Width.Hertz < sweep.Band(2.0)!.Width.Hertz);
        var narrow = ArrayNetwork.Sweep(d, slot, Frequency.FromGigahertz(9.35), Frequency.FromGigahertz(9.40), 11).Band(2.0)!;
        Assert.True(narrow.LowLimited && narrow.HighLimited, "a band wider than the sweep is marked limited at both edges");
    }

    private static MatchBand IdealBand(int n, FeedPosition feed)
    {
        var slot = StevensonTestSlot.FrequencyIndependent(Wr90Lossless, Width, F0, maximumCoupling: 8e-3);
        return Band(slot, n, feed);
    }

    private static MatchBand Band(StevensonTestSlot slot, int n, FeedPosition feed = FeedPosition.End)
    {
        var d = StandingWaveDesigner.Design(StickRequest.Of(Request(n, feed, Wr90Lossless), slot, Uniform(n))).Design;
        return ArrayNetwork.FindBand(d, slot, 2.0, Low, High, Step)!;
    }
}
