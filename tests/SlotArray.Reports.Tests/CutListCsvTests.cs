using System.Globalization;
using System.Text.Json;

namespace SlotArray.Reports.Tests;

public class CutListCsvTests
{
    private static (List<string[]> Comments, string[] Header, List<string[]> Rows) Parse(string text)
    {
        var records = StrictCsv.Parse(text);
        var comments = records.TakeWhile(r => r[0].StartsWith('#')).ToList();
        return (comments, records[comments.Count], records.Skip(comments.Count + 1).ToList());
    }

    private static double D(string s) => double.Parse(s, NumberStyles.Float, CultureInfo.InvariantCulture);

    [Fact]
    public void Cut_list_is_strict_RFC_4180_and_quotes_the_guide_name_with_its_comma()
    {
        string text = CutListCsv.ToText(ReportFixture.Eight());
        var (comments, header, rows) = Parse(text);          // throws on any RFC 4180 violation
        Assert.Contains("\"# guide: WR-90, custom anodised; inside a = 22.860 mm, b = 10.160 mm\"", text);
        Assert.Contains(comments, c => c[0] == "# guide: WR-90, custom anodised; inside a = 22.860 mm, b = 10.160 mm");
        Assert.Contains(comments, c => c[0] == "# SlotArray cut list: bench \"eight\" demo");   // quote doubled, read back
        Assert.Equal(["slot", "position_mm", "offset_mm", "side", "from_datum_wall_mm", "length_mm", "width_mm", "end", "tolerance_mm"], header);
        Assert.Equal(8, rows.Count);
    }

    [Fact]
    public void Header_block_states_datum_units_guide_wall_metal_and_normalisation()
    {
        var (comments, _, _) = Parse(CutListCsv.ToText(ReportFixture.Eight()));
        string all = string.Join("\n", comments.Select(c => c[0]));
        Assert.Contains("datum A: inner face of end short", all);
        Assert.Contains("baseline dimensioning", all);
        Assert.Contains("units: lengths in mm, angles in deg", all);
        Assert.Contains("wall: 1.270 mm; metal: aluminium 6061", all);
        Assert.Contains("OUTSIDE face of the -x side wall", all);
        Assert.Contains("G0", all);
    }

    // design.json and cutlist.csv agree to the printed precision (3 decimals in mm: |difference| ≤ 0.0005 mm).
    [Fact]
    public void Cut_list_agrees_with_design_json()
    {
        var r = ReportFixture.Eight();
        var json = JsonDocument.Parse(DesignJson.ToText(r)).RootElement;
        var (_, header, rows) = Parse(CutListCsv.ToText(r));
        int Col(string name) => Array.IndexOf(header, name);
        double a = json.GetProperty("guide").GetProperty("a_m").GetDouble() * 1e3;
        double wall = json.GetProperty("guide").GetProperty("wall_m").GetDouble() * 1e3;
        foreach (var (row, slot) in rows.Zip(json.GetProperty("slots").EnumerateArray()))
        {
            Assert.Equal(slot.GetProperty("index").GetInt32(), int.Parse(row[Col("slot")], CultureInfo.InvariantCulture));
            double x = slot.GetProperty("offset_m").GetDouble() * 1e3;
            Check.Absolute(slot.GetProperty("position_m").GetDouble() * 1e3, D(row[Col("position_mm")]), 0.0005, "design.json position_m, printed to 3 decimals");
            Check.Absolute(x, D(row[Col("offset_mm")]), 0.0005, "design.json offset_m, printed to 3 decimals");
            Check.Absolute(slot.GetProperty("overall_length_m").GetDouble() * 1e3, D(row[Col("length_mm")]), 0.0005, "overall tip-to-tip length (issue 5, physics-reference §9.1)");
            Check.Absolute(slot.GetProperty("width_m").GetDouble() * 1e3, D(row[Col("width_mm")]), 0.0005, "design.json width_m");
            Check.Absolute(wall + a / 2 + x, D(row[Col("from_datum_wall_mm")]), 0.0005, "physics-reference §9.3: wall + a/2 ± x");
            Assert.Equal(x > 0 ? "+x" : "-x", row[Col("side")]);
            Assert.Equal("round", row[Col("end")]);
            Assert.Equal("0.025", row[Col("tolerance_mm")]);
        }
    }

    // Equal-area rule, physics-reference §9.1: L_o = L_eq + (1 − π/4) w; w = 1.5875 mm → +0.3407 mm [N].
    [Fact]
    public void Length_column_is_the_overall_length_not_the_equivalent_one()
    {
        var r = ReportFixture.Eight();
        var (_, header, rows) = Parse(CutListCsv.ToText(r));
        Check.Absolute(r.Slots[0].Length * 1e3 + 0.3407, D(rows[0][Array.IndexOf(header, "length_mm")]), 0.0006, "physics-reference §9.1 example: +0.3407 mm for w = 1.5875 mm");
    }

    [Fact]
    public void Edge_slots_use_the_tilt_and_cut_depth_columns()
    {
        var (comments, header, rows) = Parse(CutListCsv.ToText(ReportFixture.Eight(tilt: true)));
        Assert.Equal(["slot", "position_mm", "tilt_deg", "cut_depth_mm", "length_mm", "width_mm", "end", "tolerance_mm"], header);
        Assert.Equal("8.00", rows[0][2]);
        Assert.Equal("-8.70", rows[1][2]);
        Assert.Equal("3.100", rows[0][3]);
        Assert.Contains(comments, c => c[0].Contains("outer narrow-wall face"));
    }

    [Fact]
    public void Mixed_offsets_and_tilts_are_refused()
    {
        var r = ReportFixture.Eight();
        var mixed = r with { Slots = [r.Slots[0], r.Slots[1] with { Offset = null, TiltDeg = 5 }] };
        var e = Assert.Throws<ArgumentException>(() => CutListCsv.ToText(mixed));
        Assert.Contains("mix", e.Message);
    }

    [Theory]
    [InlineData("plain", "plain")]
    [InlineData("a,b", "\"a,b\"")]
    [InlineData("say \"hi\"", "\"say \"\"hi\"\"\"")]
    [InlineData("two\nlines", "\"two\nlines\"")]
    public void Fields_are_quoted_as_RFC_4180_section_2_says(string field, string expected) =>
        Assert.Equal(expected, CutListCsv.Quote(field));
}
