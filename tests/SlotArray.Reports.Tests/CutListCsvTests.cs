using System.Globalization;
using System.Text.Json;

namespace SlotArray.Reports.Tests;

/// <summary>
/// cutlist.csv (issue 13): strict RFC 4180 (IETF RFC 4180, 2005, §2), a probeable datum A on the tube's end face, every
/// feature and slot from it, each dimension's own tolerance, the reference temperature and expansion, the edge-slot
/// definitions in the file itself, tool version, spec checksum and revision, and a per-row changed flag.
/// </summary>
public class CutListCsvTests
{
    private static (List<string[]> Comments, string[] Header, List<string[]> Rows) Parse(string text)
    {
        var records = StrictCsv.Parse(text);
        var comments = records.TakeWhile(r => r[0].StartsWith('#')).ToList();
        return (comments, records[comments.Count], records.Skip(comments.Count + 1).ToList());
    }

    private static double D(string s) => double.Parse(s, NumberStyles.Float, CultureInfo.InvariantCulture);

    private static string All(List<string[]> comments) => string.Join("\n", comments.Select(c => c[0]));

    [Fact]
    public void Cut_list_is_strict_RFC_4180_with_units_in_the_header()
    {
        string text = CutListCsv.ToText(ReportFixture.Eight());
        var (comments, header, rows) = Parse(text);          // throws on any RFC 4180 violation
        Assert.Contains(comments, c => c[0] == "# SlotArray cut list: bench \"eight\" demo");   // quote doubled, read back
        Assert.Equal(CutListCsv.OffsetColumns, header);
        Assert.All(header.Skip(2).Where(h => h is not ("side" or "end" or "changed")), h => Assert.True(h.EndsWith("_mm", StringComparison.Ordinal), h));
        Assert.Equal(8, rows.Count(r => r[0] == "slot"));
        Assert.Equal(["tube end face (datum A), outer face of the end-short plate", "end short, inner face (plate 1.270 mm thick)"], rows.Take(2).Select(r => r[0]));
        Assert.StartsWith("feed flange face", rows[^1][0]);
        // rows run in order of distance from datum A
        var z = rows.Select(r => D(r[2])).ToList();
        Assert.Equal(z.Order(), z);
    }

    [Fact]
    public void Header_states_datum_tube_length_temperature_expansion_tolerance_sources_and_document()
    {
        var r = ReportFixture.Eight() with { Document = new Model.DocumentInfo { DrawingNumber = "SA-0042", Revision = "C", Date = "2026-12-05", SpecSha256 = new string('a', 64) } };
        var (comments, _, rows) = Parse(CutListCsv.ToText(r));
        string all = All(comments);
        Assert.Contains("datum A: machined end face of the tube", all);
        Assert.Contains("baseline dimensioning", all);
        var plan = r.Fabrication!;
        Assert.Contains($"overall length {(plan.TubeLength.Meters * 1e3).ToString("0.000", CultureInfo.InvariantCulture)} mm", all);
        Assert.Contains("reference temperature 20 degC (ISO 1:2016)", all);
        // aluminium α = 23.1e-6 /K (CRC Handbook, from memory): α L per kelvin
        Assert.Contains($"the tube grows {(23.1e-6 * plan.TubeLength.Meters * 1e3).ToString("0.0000", CultureInfo.InvariantCulture)} mm per K", all);
        Assert.Contains("23.1e-6 per K (CRC Handbook", all);
        Assert.Contains("default: routine precision CNC milling of slots (common practice, no source)", all);
        Assert.Contains("drawing SA-0042; revision C; date 2026-12-05; tool SlotArray ", all);
        Assert.Contains("spec SHA-256 " + new string('a', 64), all);
        Assert.Contains("assumes the NOMINAL wall 1.270 mm", all);
        Assert.Contains("G0", all);
        Assert.All(rows, row => Assert.Equal("no", row[^1]));   // first issue: nothing changed
    }

    // design.json and cutlist.csv agree to the printed precision (3 decimals in mm: |difference| ≤ 0.0005 mm).
    [Fact]
    public void Cut_list_values_agree_with_design_json()
    {
        var r = ReportFixture.Eight();
        var json = JsonDocument.Parse(DesignJson.ToText(r)).RootElement;
        var (_, header, rows) = Parse(CutListCsv.ToText(r));
        int Col(string name) => Array.IndexOf(header, name);
        double a = json.GetProperty("guide").GetProperty("a_m").GetDouble() * 1e3;
        double wall = json.GetProperty("guide").GetProperty("wall_m").GetDouble() * 1e3;
        var fab = json.GetProperty("fabrication");
        double origin = fab.GetProperty("datum_to_design_origin_m").GetDouble() * 1e3;
        var slotRows = rows.Where(x => x[0] == "slot").ToList();
        var fabSlots = fab.GetProperty("slots").EnumerateArray().ToList();
        foreach (var ((row, slot), f) in slotRows.Zip(json.GetProperty("slots").EnumerateArray()).Zip(fabSlots))
        {
            Assert.Equal(slot.GetProperty("index").GetInt32(), int.Parse(row[Col("slot")], CultureInfo.InvariantCulture));
            double x = slot.GetProperty("offset_m").GetDouble() * 1e3;
            Check.Absolute(slot.GetProperty("position_m").GetDouble() * 1e3 + origin, D(row[Col("z_from_A_mm")]), 0.0005, "design.json position_m re-based to datum A");
            Check.Absolute(f.GetProperty("position_from_datum_m").GetDouble() * 1e3, D(row[Col("z_from_A_mm")]), 0.0005, "design.json fabrication position");
            Check.Absolute(x, D(row[Col("offset_mm")]), 0.0005, "design.json offset_m");
            Check.Absolute(slot.GetProperty("overall_length_m").GetDouble() * 1e3, D(row[Col("length_mm")]), 0.0005, "overall tip-to-tip length");
            Check.Absolute(slot.GetProperty("width_m").GetDouble() * 1e3, D(row[Col("width_mm")]), 0.0005, "design.json width_m");
            Check.Absolute(wall + a / 2 + x, D(row[Col("from_B_at_nominal_wall_mm")]), 0.0005, "datum B rule: wall + a/2 + x");
            Check.Absolute(f.GetProperty("position_tolerance_m").GetDouble() * 1e3, D(row[Col("z_tol_mm")]), 0.0005, "position tolerance");
            Check.Absolute(f.GetProperty("offset_tolerance_m").GetDouble() * 1e3, D(row[Col("offset_tol_mm")]), 0.0005, "offset tolerance");
            Check.Absolute(f.GetProperty("length_tolerance_m").GetDouble() * 1e3, D(row[Col("length_tol_mm")]), 0.0005, "length tolerance");
            Check.Absolute(f.GetProperty("width_tolerance_m").GetDouble() * 1e3, D(row[Col("width_tol_mm")]), 0.0005, "width tolerance");
            Check.Absolute(f.GetProperty("end_radius_m").GetDouble() * 1e3, D(row[Col("end_radius_mm")]), 0.0005, "end radius = cutter radius");
            Assert.Equal(x > 0 ? "+x" : "-x", row[Col("side")]);
            Assert.Equal("round", row[Col("end")]);
        }
        Check.Absolute(fab.GetProperty("tube_length_m").GetDouble() * 1e3, D(rows[^1][Col("z_from_A_mm")]), 0.0005, "tube length = feed flange face");
    }

    [Fact]
    public void Edge_slots_define_tilt_sign_length_and_a_depth_column_per_broad_wall_in_the_file()
    {
        var r = ReportFixture.Eight(tilt: true);
        var (comments, header, rows) = Parse(CutListCsv.ToText(r));
        Assert.Equal(CutListCsv.TiltColumns, header);
        var slots = rows.Where(x => x[0] == "slot").ToList();
        Assert.Equal("8.000", slots[0][Array.IndexOf(header, "tilt_deg")]);
        Assert.Equal("-8.700", slots[1][Array.IndexOf(header, "tilt_deg")]);
        string depth = (r.Slots[0].CutDepth!.Value * 1e3).ToString("0.000", CultureInfo.InvariantCulture);
        Assert.Equal(depth, slots[0][Array.IndexOf(header, "cut_depth_upper_broad_wall_mm")]);
        Assert.Equal(depth, slots[0][Array.IndexOf(header, "cut_depth_lower_broad_wall_mm")]);
        string all = All(comments);
        Assert.Contains(CutListCsv.TiltSignRule, all);
        Assert.Contains("length_mm (edge slots): the one definition", all);
        // the length printed is that definition: b/cos θ + 2 (d − t), with d the printed depth (geometry of the cut)
        double th = 8.0 * Math.PI / 180, b = 10.16, t = 1.27, d = D(depth);
        Check.Absolute(b / Math.Cos(th) + 2 * (d - t), D(slots[0][Array.IndexOf(header, "length_mm")]), 0.0011, "path length on the inner surfaces");
        Assert.StartsWith("tube end face = load-end flange face", rows[0][0]);
    }

    [Fact]
    public void Changed_rows_follow_the_plan()
    {
        var r = ReportFixture.Eight();
        var plan = r.Fabrication! with { Changed = new HashSet<string>(["slot-2", "feed-flange"]) };
        var (comments, header, rows) = Parse(CutListCsv.ToText(r with { Fabrication = plan, Document = new Model.DocumentInfo { Revision = "B" } }));
        Assert.Equal(["slot 2", "feed flange face"], rows.Where(x => x[^1] == "yes").Select(x => x[0] == "slot" ? "slot " + x[1] : x[0][..16]));
        Assert.Contains("revision B", All(comments));
        Assert.Contains("2 changed", All(comments));
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
