using SlotArray.Spec;

namespace SlotArray.Spec.Tests;

/// <summary>
/// Issue 11, the causes a check can predict: each spec that once passed the check and then failed inside the design
/// (exit 3) is now refused by the check with the line and column of the value to change.
/// </summary>
public class DesignabilityCheckTests
{
    /// <summary>The base spec of <see cref="SpecErrorTests"/> (16 slots in WR-90, Taylor -26 dB, lines 1 to 17) with edits.</summary>
    private static string With(params (int Line, string? Text)[] edits) => SpecErrorTests.With(edits);

    private static SpecError Refused(string yaml, long line, long column, string fragment)
    {
        var r = SpecLoader.Parse(yaml, "t.yaml");
        Assert.Null(r.Request);
        var e = Assert.Single(r.Errors);
        Assert.Equal((line, column), (e.Line, e.Column));
        Assert.Contains(fragment, e.Message, StringComparison.Ordinal);
        return e;
    }

    [Fact]
    public void Villeneuve_with_six_slots_and_the_default_nbar_4_is_refused_at_the_taper_type()
    {
        // Villeneuve (IEEE Trans. AP-32, 1984) moves n̄ − 1 zeros among the N − 1 array zeros: n̄ ≤ (N − 1)/2 = 2 for N = 6.
        Refused(With((11, "  count: 6"), (16, "  type: villeneuve")), 16, 9, "n̄ at most (N - 1)/2 = 2 (the default is 4)");
    }

    [Fact]
    public void Villeneuve_with_four_slots_is_refused_whatever_the_nbar()
    {
        Refused(With((11, "  count: 4"), (16, "  type: villeneuve"), (17, "  sidelobes: -26 dB\n  nbar: 2")), 18, 9, "needs at least 5 slots");
    }

    [Theory]
    [InlineData("-14 dB")]
    [InlineData("-70 dB")]
    public void Bayliss_sidelobes_outside_minus_15_to_minus_60_dB_are_refused(string level)
    {
        // Bayliss's 1968 parameter table (Bell Syst. Tech. J. 47, Fig. 4) covers 15 to 60 dB.
        Refused(With((16, "  type: bayliss"), (17, $"  sidelobes: {level}")), 17, 14, "between -60 dB and -15 dB");
    }

    [Fact]
    public void Taylor_sidelobes_between_the_uniform_level_and_minus_13_3_dB_are_refused()
    {
        // -13.28 dB passed the old check (< -13.26 dB) but the Taylor synthesis needs ≤ -13.3 dB.
        Refused(With((17, "  sidelobes: -13.28 dB")), 17, 14, "between -100 dB and -13.3 dB");
    }

    [Fact]
    public void A_longitudinal_slot_8_mm_wide_in_WR90_is_refused_as_too_wide_for_the_narrow_slot_model()
    {
        // λ = c/f = 31.86 mm at 9.41 GHz; 0.2 λ = 6.37 mm.
        Refused(With((12, "  width: 8 mm")), 12, 10, "above 0.2 wavelength (6.3718 mm");
    }

    [Fact]
    public void A_slot_0_01_mm_wide_is_refused_as_too_narrow()
    {
        Refused(With((12, "  width: 0.01 mm")), 12, 10, "below 0.002 wavelength (0.0637 mm");
    }

    [Fact]
    public void An_edge_slot_as_wide_as_the_narrow_wall_is_refused()
    {
        Refused(With((10, "  type: edge"), (12, "  width: 10.2 mm")), 12, 10, "less than the narrow wall b = 10.16 mm");
    }

    [Fact]
    public void Inclined_series_slots_are_refused_at_the_slot_type()
    {
        Refused(With((10, "  type: inclined-series")), 10, 9, "no array designer yet");
    }

    [Fact]
    public void Mutual_coupling_with_edge_slots_is_refused_at_the_coupling_key()
    {
        Refused(With((10, "  type: edge"), (17, "  sidelobes: -26 dB\ncoupling: mutual")), 18, 11, "broad-wall (longitudinal) slots only");
    }

    [Fact]
    public void Broad_wall_slots_at_0_1_guide_wavelength_are_refused_because_every_other_slot_overlaps()
    {
        // λg = 44.42 mm in WR-90 at 9.41 GHz; 2 × 0.1 λg = 8.88 mm < 0.36 λ = 11.47 mm, the shortest resonant length.
        Refused(With((14, "  type: standing-wave\n  spacing: 0.1 guide-wavelength")), 15, 12, "every other slot is 8.8838 mm from the next on its side");
    }

    [Fact]
    public void Edge_slots_spaced_less_than_their_width_are_refused()
    {
        Refused(With((10, "  type: edge"), (14, "  type: travelling-wave\n  spacing: 1.5 mm")), 15, 12, "cannot be cut 1.5 mm apart");
    }

    [Fact]
    public void A_grating_lobe_spacing_is_reported_by_the_check_at_the_spacing()
    {
        // 0.9 λg = 39.98 mm ≥ λ = 31.86 mm: a broadside array with d ≥ λ has grating lobes (array factor periodic in kd sin θ).
        var r = SpecLoader.Parse(With((14, "  type: standing-wave\n  spacing: 0.9 guide-wavelength")), "t.yaml");
        Assert.Empty(r.Errors);
        var w = Assert.Single(r.Warnings, w => w.Message.Contains("grating lobes", StringComparison.Ordinal));
        Assert.Equal((15L, 12L), (w.Line, w.Column));
    }

    [Fact]
    public void A_travelling_wave_grating_lobe_spacing_is_reported_by_the_check()
    {
        // 0.9 λg travelling wave: sin θ = λ/λg − λ/(2d) = 0.717 − 0.398 = 0.319; d (1 + sin θ) = 52.7 mm ≥ λ = 31.86 mm.
        var r = SpecLoader.Parse(With((14, "  type: travelling-wave\n  spacing: 0.9 guide-wavelength")), "t.yaml");
        Assert.Empty(r.Errors);
        var w = Assert.Single(r.Warnings, w => w.Message.Contains("grating lobe", StringComparison.Ordinal));
        Assert.Equal((15L, 12L), (w.Line, w.Column));
    }

    [Fact]
    public void Non_ASCII_digits_are_a_positioned_error_not_an_internal_FormatException()
    {
        var e = Refused(With((3, "frequency: ٩.٤١ GHz")), 3, 12, "digits other than 0-9");
        Assert.DoesNotContain("FormatException", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("\"..\"")]
    [InlineData(".")]
    [InlineData("...")]
    public void A_name_of_dots_is_refused_because_it_would_write_outside_out(string name)
    {
        Refused(With((2, $"name: {name}")), 2, 7, "used as a folder name");
    }
}
