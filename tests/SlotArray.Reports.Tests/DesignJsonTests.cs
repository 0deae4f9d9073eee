using System.Text.Json;
using SlotArray.Reports.Model;

namespace SlotArray.Reports.Tests;

public class DesignJsonTests
{
    private static JsonElement Root(DesignReport r) => JsonDocument.Parse(DesignJson.ToText(r)).RootElement;

    private static string[] Keys(JsonElement e) => [.. e.EnumerateObject().Select(p => p.Name)];

    private static HashSet<string> KeySet(JsonElement e) => [.. Keys(e)];

    // The key lists of issue 5, item 4 (the project's interface): every one must be present, spelled exactly.
    [Fact]
    public void Design_json_carries_every_key_issue_5_lists()
    {
        var root = Root(ReportFixture.Eight());
        Assert.Superset(new HashSet<string> { "name", "frequency_hz", "guide", "slots", "termination", "pattern", "match", "sweep", "warnings" }, KeySet(root));
        Assert.Superset(new HashSet<string> { "designation", "a_m", "b_m", "wall_m", "guide_wavelength_m" }, KeySet(root.GetProperty("guide")));
        foreach (var s in root.GetProperty("slots").EnumerateArray())
            Assert.Superset(new HashSet<string> { "index", "position_m", "offset_m", "length_m", "width_m", "conductance", "target_amplitude", "achieved_amplitude", "achieved_phase_deg" }, KeySet(s));
        Assert.Superset(new HashSet<string> { "type", "distance_m" }, KeySet(root.GetProperty("termination")));
        Assert.Superset(new HashSet<string> { "beam_deg", "hpbw_deg", "peak_sidelobe_db", "first_sidelobe_db", "directivity_dbi", "gain_dbi" }, KeySet(root.GetProperty("pattern")));
        Assert.Superset(new HashSet<string> { "s11_db_at_design", "vswr_at_design", "bandwidth_vswr15_hz", "bandwidth_vswr2_hz" }, KeySet(root.GetProperty("match")));
        foreach (var s in root.GetProperty("sweep").EnumerateArray())
            Assert.Superset(new HashSet<string> { "frequency_hz", "s11_re", "s11_im", "beam_deg", "peak_sidelobe_db", "gain_dbi" }, KeySet(s));
        Assert.Equal(JsonValueKind.String, root.GetProperty("warnings")[0].ValueKind);
    }

    // Freezes the whole key layout (issue 5 keys plus the additions), so a rename or a dropped key fails here.
    [Fact]
    public void Design_json_key_layout_is_frozen()
    {
        var root = Root(ReportFixture.Eight());
        Assert.Equal(["name", "frequency_hz", "normalisation", "band", "guide", "slots", "termination", "fabrication", "pattern", "match", "sweep", "inputs", "requirements", "warnings", "cautions", "tolerance"], Keys(root));
        Assert.Equal(["designation", "a_m", "b_m", "wall_m", "metal", "guide_wavelength_m", "wave_impedance_ohm"], Keys(root.GetProperty("guide")));
        Assert.Equal(["index", "position_m", "offset_m", "length_m", "overall_length_m", "width_m", "end", "conductance", "target_amplitude", "achieved_amplitude", "achieved_phase_deg"], Keys(root.GetProperty("slots")[0]));
        Assert.Equal(["beam_deg", "hpbw_deg", "peak_sidelobe_db", "first_sidelobe_db", "directivity_dbi", "gain_dbi", "design_sidelobe_db", "cut", "transverse_face_width_m", "transverse_hpbw_lower_bound_deg"], Keys(root.GetProperty("pattern")));
        Assert.Contains("G0", root.GetProperty("normalisation").GetString());
    }

    [Fact]
    public void Edge_slots_write_tilt_and_cut_depth_instead_of_offset()
    {
        var r = ReportFixture.Eight(tilt: true);
        var slot = Root(r).GetProperty("slots")[0];
        Assert.False(slot.TryGetProperty("offset_m", out _));
        Assert.Equal(8.0, slot.GetProperty("tilt_deg").GetDouble());
        Assert.Equal(r.Slots[0].CutDepth, slot.GetProperty("cut_depth_m").GetDouble());
    }

    [Fact]
    public void Values_are_SI_as_given()
    {
        var r = ReportFixture.Eight();
        var root = Root(r);
        Assert.Equal(9.375e9, root.GetProperty("frequency_hz").GetDouble());
        Assert.Equal(22.86e-3, root.GetProperty("guide").GetProperty("a_m").GetDouble());
        Assert.Equal(r.Slots[1].Offset, root.GetProperty("slots")[1].GetProperty("offset_m").GetDouble());
        Assert.True(root.GetProperty("slots")[1].GetProperty("offset_m").GetDouble() < 0, "offset is signed");
        Assert.Equal(r.Sweep[3].S11.Imaginary, root.GetProperty("sweep")[3].GetProperty("s11_im").GetDouble());
    }

    // Round trip: the shortest round-trip number form must give every double back exactly.
    [Fact]
    public void Read_returns_what_Write_wrote()
    {
        var r = ReportFixture.Eight();
        using var ms = new MemoryStream(System.Text.Encoding.UTF8.GetBytes(DesignJson.ToText(r)));
        var back = DesignJson.Read(ms);
        Assert.Equal(r.Name, back.Name);
        Assert.Equal(r.Guide, back.Guide);
        Assert.Equal(r.Slots, back.Slots);           // SlotReport is a record of scalars: value equality
        Assert.Equal(r.Sweep, back.Sweep);
        Assert.Equal(r.Termination, back.Termination);
        Assert.Equal(r.Match, back.Match);
        Assert.Equal(r.Inputs, back.Inputs);
        Assert.Equal(r.Requirements, back.Requirements);
        Assert.Equal(r.Warnings, back.Warnings);
        Assert.Equal(r.Pattern.CutLevelDb, back.Pattern.CutLevelDb);
        Assert.Equal(r.Pattern.CutAngleDeg, back.Pattern.CutAngleDeg);
        Assert.Equal(r.Pattern with { CutAngleDeg = [], CutLevelDb = [] }, back.Pattern with { CutAngleDeg = [], CutLevelDb = [] });
        // the fabrication section is written from Core's plan and not read back
        Assert.Equal(DesignJson.ToText(r with { Fabrication = null }), DesignJson.ToText(back));
    }

    [Fact]
    public void Non_finite_numbers_become_null_and_read_back_as_NaN()
    {
        var r = ReportFixture.Eight() with { Match = ReportFixture.Eight().Match with { BandwidthVswr15Hz = double.NaN } };
        string text = DesignJson.ToText(r);
        Assert.Contains("\"bandwidth_vswr15_hz\": null", text);
        var back = DesignJson.Read(new MemoryStream(System.Text.Encoding.UTF8.GetBytes(text)));
        Assert.True(double.IsNaN(back.Match.BandwidthVswr15Hz));
    }

    [Fact]
    public void Text_has_LF_line_ends_and_no_byte_order_mark()
    {
        string text = DesignJson.ToText(ReportFixture.Eight());
        Assert.DoesNotContain('\r', text);
        Assert.NotEqual('\uFEFF', text[0]);
        Assert.EndsWith("}\n", text);
    }
}
