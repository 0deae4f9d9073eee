using SlotArray.Spec;

namespace SlotArray.Spec.Tests;

/// <summary>One test per error class of the spec, each asserting the exact line and column of the error.</summary>
public class SpecErrorTests
{
    /// <summary>A valid spec; the line numbers in the comments are what the tests below edit.</summary>
    private static readonly string[] Base =
    [
        "spec: 1",                       // 1
        "name: t",                       // 2
        "frequency: 9.41 GHz",           // 3
        "band: [9.30 GHz, 9.52 GHz]",    // 4
        "guide:",                        // 5
        "  size: WR-90",                 // 6
        "  wall: 1.27 mm",               // 7
        "  metal: aluminium",            // 8
        "slots:",                        // 9
        "  type: longitudinal",          // 10
        "  count: 16",                   // 11
        "  width: 1.6 mm",               // 12
        "feed:",                         // 13
        "  type: standing-wave",         // 14
        "taper:",                        // 15
        "  type: taylor",                // 16
        "  sidelobes: -26 dB",           // 17
    ];

    /// <summary>The base spec with 1-based line <paramref name="line"/> replaced (null deletes it; "\n" inserts lines).</summary>
    internal static string With(params (int Line, string? Text)[] edits)
    {
        var lines = Base.Select(l => (string?)l).ToArray();
        foreach (var (line, text) in edits) lines[line - 1] = text;
        return string.Join("\n", lines.Where(l => l is not null)) + "\n";
    }

    private static SpecError Single(string yaml)
    {
        var r = SpecLoader.Parse(yaml, "t.yaml");
        Assert.Null(r.Request);
        return Assert.Single(r.Errors);
    }

    private static void At(SpecError e, long line, long column, string fragment)
    {
        Assert.Equal((line, column), (e.Line, e.Column));
        Assert.Contains(fragment, e.Message);
        Assert.Equal("t.yaml", e.File);
    }

    [Fact]
    public void The_base_spec_is_valid()
    {
        var r = SpecLoader.Parse(With(), "t.yaml");
        Assert.Empty(r.Errors);
        Assert.Empty(r.Warnings);
        Assert.NotNull(r.Request);
    }

    [Fact]
    public void Wall_given_in_gigahertz_is_reported_at_its_value()
    {
        var e = Single(With((7, "  wall: 1.27 GHz")));
        At(e, 7, 9, "'wall' needs a length such as '1.27 mm'");
        Assert.Contains("frequency", e.Message);
        Assert.StartsWith("t.yaml:7:9: 'wall' needs a length such as '1.27 mm'", e.ToString());
    }

    [Fact]
    public void Yaml_syntax_error() => At(Single(With((7, "  wall: \"1.27 mm"))), 7, 9, "YAML syntax");

    [Fact]
    public void Tab_indentation_is_reported_at_the_tab() => At(Single(With((7, "\twall: 1.27 mm"))), 7, 1, "never tabs");

    [Fact]
    public void Unknown_key_suggests_the_nearest() => At(Single(With((8, "  metl: aluminium"))), 8, 3, "did you mean 'metal'?");

    [Fact]
    public void Duplicate_key_is_reported_at_the_second() => At(Single(With((8, "  wall: 1.5 mm\n  metal: aluminium"))), 8, 3, "duplicate key 'wall'");

    [Fact]
    public void Missing_required_key_is_reported_at_its_section() => At(Single(With((7, null))), 5, 1, "'guide' needs 'wall'");

    [Fact]
    public void Missing_unit() => At(Single(With((7, "  wall: 1.27"))), 7, 9, "has no unit");

    [Fact]
    public void Non_numeric_value() => At(Single(With((12, "  width: wide"))), 12, 10, "not a number");

    [Fact]
    public void Non_finite_value() => At(Single(With((12, "  width: 1e400 mm"))), 12, 10, "finite");

    [Fact]
    public void Negative_value() => At(Single(With((12, "  width: -1.6 mm"))), 12, 10, "positive");

    [Fact]
    public void Out_of_range_value() => At(Single(With((17, "  sidelobes: -10 dB"))), 17, 14, "between -100 dB and -13.3 dB");

    [Fact]
    public void Fewer_than_two_slots() => At(Single(With((11, "  count: 1"))), 11, 10, "at least 2");

    [Fact]
    public void Count_must_be_whole() => At(Single(With((11, "  count: 16.5"))), 11, 10, "whole number");

    [Fact]
    public void Narrow_wall_not_smaller_than_broad_wall() => At(Single(With((8, "  metal: aluminium\n  b: 30 mm"))), 9, 6, "must be smaller than the broad wall a = 22.86 mm");

    [Fact]
    public void Slot_width_not_below_half_the_broad_wall()
        // a/2 = 0.900 in × 25.4 / 2 = 11.43 mm (WR-90 inside width, EIA RS-261-B)
        => At(Single(With((12, "  width: 11.5 mm"))), 12, 10, "a/2 = 11.43 mm");

    [Fact]
    public void Frequency_above_the_TE20_cutoff()
        // TE20 cutoff of WR-90 = c/a = 299 792 458 / 0.02286 = 13.11428 GHz (Pozar, Microwave Engineering, Sec. 3.3; computed here)
        => At(Single(With((3, "frequency: 14 GHz"), (4, "band: [13.9 GHz, 14.1 GHz]"))), 3, 12, "14 GHz is above the TE20 cutoff 13.11428 GHz");

    [Fact]
    public void Frequency_below_the_TE10_cutoff()
    {
        // TE10 cutoff of WR-90 = c/(2a) = 6.55714 GHz (Pozar Sec. 3.3 gives 6.557140 GHz)
        var r = SpecLoader.Parse(With((3, "frequency: 6 GHz"), (4, "band: [5.9 GHz, 6.1 GHz]")), "t.yaml");
        At(r.Errors[0], 3, 12, "6 GHz is below the TE10 cutoff 6.55714 GHz");
        At(r.Errors[1], 4, 7, "at or below the TE10 cutoff");
        Assert.Equal(2, r.Errors.Count);
    }

    [Fact]
    public void Band_must_contain_the_frequency() => At(Single(With((4, "band: [9.5 GHz, 9.6 GHz]"))), 4, 7, "does not contain the design frequency 9.41 GHz");

    [Fact]
    public void Unknown_guide_size_lists_near_names() => At(Single(With((6, "  size: WR-91"))), 6, 9, "near ones: WR-90");

    [Fact]
    public void Unknown_metal_lists_the_known_ones() => At(Single(With((8, "  metal: unobtainium"))), 8, 10, "known: copper, aluminium, 6061, brass, silver");

    [Fact]
    public void Unknown_choice_suggests_the_nearest() => At(Single(With((10, "  type: longitudnal"))), 10, 9, "did you mean 'longitudinal'?");

    [Fact]
    public void Key_that_does_not_apply_to_the_taper() => At(Single(With((17, "  sidelobes: -26 dB\n  edge: -20 dB"))), 18, 9, "does not apply to a taylor taper");

    [Fact]
    public void Unknown_spec_version() => At(Single(With((1, "spec: 2"))), 1, 7, "write 'spec: 1'");

    [Fact]
    public void Key_at_the_wrong_level_names_its_section() => At(Single(With((2, "name: t\ncutter: 1.6 mm"))), 3, 1, "it belongs in 'slots'");

    [Fact]
    public void Key_of_two_sections_at_the_wrong_level_names_both()
        => At(Single(With((2, "name: t\nwall: 1 mm"))), 3, 1, "it belongs in 'guide' or 'tolerance'");

    [Fact]
    public void Empty_document() => At(Single(""), 1, 1, "the spec is empty");

    [Fact]
    public void A_list_instead_of_a_mapping() => At(Single("- a\n- b\n"), 1, 1, "block of 'key: value' lines");

    [Fact]
    public void Value_missing_after_the_colon() => At(Single(With((7, "  wall:"))), 7, 8, "'wall' has no value");

    [Fact]
    public void All_errors_are_collected_in_one_pass()
    {
        var r = SpecLoader.Parse(With((3, "frequency: 9.41"), (7, "  wall: 1.27 GHz"), (8, "  metl: aluminium"), (11, "  count: 1"), (17, "  sidelobes: -26")), "t.yaml");
        Assert.Equal(new long[] { 3, 7, 8, 11, 17 }, r.Errors.Select(e => e.Line).ToArray());
        Assert.Null(r.Request);
    }

    [Fact]
    public void Frequency_outside_the_recommended_band_is_a_warning()
    {
        // WR-90 recommended band 8.20–12.40 GHz (EIA RS-261-B); 8.0 GHz is single-mode (above 6.557 GHz) but outside it.
        var r = SpecLoader.Parse(With((3, "frequency: 8.0 GHz"), (4, "band: [7.9 GHz, 8.1 GHz]")), "t.yaml");
        Assert.Empty(r.Errors);
        var w = Assert.Single(r.Warnings);
        Assert.Equal((3L, 12L), (w.Line, w.Column));
        Assert.Contains("outside the recommended band 8.2 GHz to 12.4 GHz of WR-90", w.Message);
    }
}
