using SlotArray.Core.Design;
using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;
using SlotArray.Tests.Shared;
using static SlotArray.Core.Tests.DesignTests.TestArrays;

namespace SlotArray.Core.Tests.DesignTests;

/// <summary>
/// The standing-wave designer against the design rules of Elliott 1981, Ch. 8 (WR-90 at 9.375 GHz; values computed
/// with numpy [N] from Stevenson's formula). The test double's g_r is Stevenson's, so the offsets check the
/// designer's conductance scaling end to end.
/// </summary>
public class StandingWaveDesignerTests
{
    private const string Ref51 = "Elliott 1981, Ch. 8 [N]";
    private static StevensonTestSlot Slot => new(Wr90, Width);

    [Fact]
    public void Uniform_ten_slot_array_matches_the_reference_offsets_spacing_and_short()
    {
        var d = StandingWaveDesigner.Design(StickRequest.Of(Request(10), Slot, Uniform(10))).Design;

        Check.Absolute(1.0, d.TotalConductance, 1e-12, "Σ g_n = 1 by construction (Elliott 1981, Ch. 8 match rule)");
        Check.Absolute(22.3714e-3, d.Spacing.Meters, 0.5e-7, Ref51 + ": λg/2");
        Check.Absolute(44.74288e-3, d.GuideWavelength.Meters, 0.5e-8, "Pozar 2012, Sec. 3.3 [N]: λg");
        Check.Absolute(11.1857e-3, d.NearTermination.Distance.Meters, 0.5e-7, Ref51 + ": λg/4");
        Assert.Equal(TerminationKind.Short, d.NearTermination.Kind);
        Assert.Null(d.FarTermination);
        for (int i = 0; i < 10; i++)
        {
            var s = d.Slots[i];
            Assert.Equal(i + 1, s.Index);
            Check.Absolute(0.1, s.Conductance, 1e-12, Ref51 + ": g_n = 1/N");
            Check.Absolute(2.0978e-3, Math.Abs(s.Coupling), 0.5e-7, Ref51 + ": |x_n| = 2.0978 mm");
            Check.Absolute(11.1857e-3 + i * 22.3714e-3, s.Position.Meters, 0.5e-7 * (i + 1), Ref51 + ": z_n = λg/4 + (n−1)λg/2");
            Assert.Equal(i % 2 == 0 ? 1 : -1, Math.Sign(s.Coupling));   // alternation, Elliott 1981, Ch. 8
        }
        Assert.Equal(d.Slots[^1].Position, d.FeedPlane);
        Assert.Empty(d.Warnings);
    }

    [Fact]
    public void Taylor_25_dB_nbar_4_ten_slot_offsets_match_the_reference()
    {
        // Elliott 1981, Ch. 8 [N]: |x_n| = 1.09428, 1.45128, 2.02898, 2.56950, 2.86456 mm (symmetric); the given g_n
        // carry 4–5 digits, so the offsets agree to about 1e-4 relative.
        double[] x = [1.09428, 1.45128, 2.02898, 2.56950, 2.86456];
        var d = StandingWaveDesigner.Design(StickRequest.Of(Request(10), Slot, Taylor25Amplitudes)).Design;
        Check.Absolute(1.0, d.TotalConductance, 1e-12, "Σ g_n = 1 (Elliott 1981, Ch. 8)");
        for (int i = 0; i < 10; i++)
        {
            double expected = x[i < 5 ? i : 9 - i] * 1e-3;
            Check.Relative(expected, Math.Abs(d.Slots[i].Coupling), 2e-4, Ref51 + ": Taylor 25 dB n̄ = 4 offsets");
            Assert.Equal(i % 2 == 0 ? 1 : -1, Math.Sign(d.Slots[i].Coupling));
        }
    }

    [Fact]
    public void Three_quarter_wave_short_is_placed_33_5572_mm_beyond_the_last_slot()
    {
        var d = StandingWaveDesigner.Design(StickRequest.Of(Request(10, shortDistance: 0.75), Slot, Uniform(10))).Design;
        Check.Absolute(33.5572e-3, d.NearTermination.Distance.Meters, 0.5e-7, "Elliott 1981, Ch. 8 [N]: 3λg/4");
        Check.Absolute(33.5572e-3, d.Slots[0].Position.Meters, 0.5e-7, "slot 1 at the short distance from the datum");
        Assert.Empty(d.Warnings);
    }

    [Fact]
    public void A_negative_amplitude_flips_the_offset_side_of_that_slot_only()
    {
        double[] a = [1, 1, -1, 1];
        var d = StandingWaveDesigner.Design(StickRequest.Of(Request(4), Slot, a)).Design;
        Assert.Equal([1, -1, -1, -1], d.Slots.Select(s => Math.Sign(s.Coupling)));
        Assert.Equal(-1.0, d.Slots[2].TargetAmplitude);
    }

    [Fact]
    public void Centre_fed_design_has_two_shorted_halves_and_the_junction_midway()
    {
        var d = StandingWaveDesigner.Design(StickRequest.Of(Request(10, FeedPosition.Centre), Slot, Uniform(10))).Design;
        Assert.Equal(FeedPosition.Centre, d.Feed);
        Assert.NotNull(d.FarTermination);
        Check.Absolute(11.1857e-3, d.FarTermination!.Distance.Meters, 0.5e-7, Ref51 + ": λg/4 short at each end");
        Check.Absolute((d.Slots[4].Position.Meters + d.Slots[5].Position.Meters) / 2, d.FeedPlane.Meters, 1e-15, "junction midway");
        Check.Absolute(1.0, d.Slots.Take(5).Sum(s => s.Conductance), 1e-12, "each half matched to the junction: Σ_half g = 1 (StandingWaveDesigner remarks)");
        Check.Absolute(1.0, d.Slots.Skip(5).Sum(s => s.Conductance), 1e-12, "each half matched to the junction: Σ_half g = 1 (StandingWaveDesigner remarks)");
        Assert.Equal(2.0, d.JunctionRatio);
        for (int i = 0; i < 10; i++) Assert.Equal(i % 2 == 0 ? 1 : -1, Math.Sign(d.Slots[i].Coupling));
    }

    [Fact]
    public void A_slot_needing_more_than_the_maximum_conductance_is_named_with_the_numbers()
    {
        // g_3 = 9/12 = 0.75; the double's maximum at x = 5 mm is 0.49776 (Stevenson 1948 table [N]).
        var e = Assert.Throws<InfeasibleDesignException>(() => StandingWaveDesigner.Design(StickRequest.Of(Request(4), Slot, [1, 1, 3, 1])).Design);
        Assert.Contains("slot 3 needs g = 0.750", e.Message);
        Assert.Contains("above the 0.498", e.Message);
        Assert.Contains("9.375 GHz", e.Message);
        Assert.Contains("use more slots", e.Message);
        Assert.Contains("gentler taper", e.Message);
    }

    [Fact]
    public void Taper_the_slot_count_cannot_realise_is_rejected_with_what_to_change()
    {
        var count = Assert.Throws<InfeasibleDesignException>(() => StandingWaveDesigner.Design(StickRequest.Of(Request(10), Slot, Uniform(8))).Design);
        Assert.Contains("8 amplitudes but the array has 10 slots", count.Message);
        var zero = Assert.Throws<InfeasibleDesignException>(() => StandingWaveDesigner.Design(StickRequest.Of(Request(4), Slot, [1, 0, 1, 1])).Design);
        Assert.Contains("slot 2 has amplitude 0", zero.Message);
        var odd = Assert.Throws<InfeasibleDesignException>(() => StandingWaveDesigner.Design(StickRequest.Of(Request(9, FeedPosition.Centre), Slot, Uniform(9))).Design);
        Assert.Contains("use 8 or 10 slots", odd.Message);
    }

    [Fact]
    public void Spacing_off_half_guide_wavelength_and_grating_lobes_are_warned()
    {
        // 0.75 λg = 33.56 mm > λ = 31.98 mm: grating lobes (Elliott 1981, Ch. 8 rule d < λ).
        var d = StandingWaveDesigner.Design(StickRequest.Of(Request(4, spacing: 0.75), Slot, Uniform(4))).Design;
        Assert.Contains(d.Warnings, w => w.Code == "grating-lobe");
        Assert.Contains(d.Warnings, w => w.Code == "spacing-not-half-guide-wavelength");
        var s = StandingWaveDesigner.Design(StickRequest.Of(Request(4, shortDistance: 0.3), Slot, Uniform(4))).Design;
        Assert.Contains(s.Warnings, w => w.Code == "short-not-odd-quarter-wave");
    }

    [Fact]
    public void A_travelling_wave_request_is_not_accepted()
    {
        var r = Request(4) with { Feed = Request(4).Feed with { Type = FeedType.TravellingWave } };
        Assert.Throws<ArgumentException>(() => StandingWaveDesigner.Design(StickRequest.Of(r, Slot, Uniform(4))).Design);
    }

    [Fact]
    public void A_slot_model_for_another_guide_is_not_accepted()
    {
        var e = Assert.Throws<ArgumentException>(() => StandingWaveDesigner.Design(StickRequest.Of(Request(4), new StevensonTestSlot(Wr90Lossless, Width), Uniform(4))).Design);
        Assert.Contains("slot model is for the guide", e.Message);
    }
}
