using System.Text.Json;
using SlotArray.Spec;
using SlotArray.Tests.Shared;

namespace SlotArray.Cli.Tests;

/// <summary>
/// <c>slots.data</c> end to end: <c>slot … --table FILE</c> writes the built-in model's table, a design made from it
/// matches the built-in design (round trip), and the file's SHA-256 and provenance reach design.json, summary.md and the cut list.
/// </summary>
public class SlotTableDesignTests
{
    [Fact]
    public void Round_trip_the_moment_method_table_designs_the_demo_as_the_built_in_model_does()
    {
        string dir = DesignRuns.TempFolder("table-roundtrip");
        string table = Path.Combine(dir, "mom.csv");
        var (code, _, err) = DesignRuns.Run("slot", "--guide", "WR-90", "--frequency", "9.41GHz", "--offset", "2mm", "--wall", "1.27mm",
            "--width", "1.6mm", "--table", table);
        Assert.True(code == 0, err);
        string csv = File.ReadAllText(table);
        Assert.StartsWith("# produced by: slotarray slot --table (built-in model: moment-method)", csv);
        Assert.Contains("offset_mm,length_mm,frequency_ghz,g,b", csv);

        string demo = File.ReadAllText(RepoFiles.Demo);
        string spec = Path.Combine(dir, "demo-table.yaml");
        File.WriteAllText(spec, demo.Replace("  model: moment-method", "  data: mom.csv"));
        string builtIn = Design(demo, "builtin");
        string fromTable = Design(File.ReadAllText(spec), "fromtable", spec);

        var a = DesignRuns.CsvRecords(Path.Combine(builtIn, "cutlist.csv"));
        var b = DesignRuns.CsvRecords(Path.Combine(fromTable, "cutlist.csv"));
        Assert.Equal(a.Count, b.Count);
        int off = Array.IndexOf(a[0], "offset_mm"), len = Array.IndexOf(a[0], "length_mm");
        Assert.Equal(["slot_table", "changed"], b[0][^2..]);   // the revision flag stays the last column
        for (int i = 1; i < a.Count; i++)
        {
            // The table holds the same moment method at 30 offsets: its monotone fits must give the built-in offsets and
            // lengths to the cut list's 0.001 mm resolution, give or take one count.
            Check.Absolute(DesignRuns.Mm(a[i][off]), DesignRuns.Mm(b[i][off]), 2.0e-6, "built-in moment-method design (the table's source)");
            Check.Absolute(DesignRuns.Mm(a[i][len]), DesignRuns.Mm(b[i][len]), 2.0e-6, "built-in moment-method design (the table's source)");
            Assert.Equal("in table", b[i][^2]);
        }

        string sha = SlotTableCsv.Sha256(File.ReadAllBytes(table));
        using var json = JsonDocument.Parse(File.ReadAllText(Path.Combine(fromTable, "design.json")));
        var sd = json.RootElement.GetProperty("slot_data");
        Assert.Equal(sha, sd.GetProperty("sha256").GetString());
        Assert.Equal("mom.csv", sd.GetProperty("file").GetString());
        Assert.Contains("produced by: slotarray slot --table (built-in model: moment-method)", sd.GetProperty("provenance").EnumerateArray().Select(p => p.GetString()));
        Assert.Contains(sha, File.ReadAllText(Path.Combine(fromTable, "summary.md")));
        Assert.Contains($"# slot data: mom.csv (SHA-256 {sha})", File.ReadAllText(Path.Combine(fromTable, "cutlist.csv")));
        Assert.Contains("# slot data provenance: produced by: slotarray slot --table", File.ReadAllText(Path.Combine(fromTable, "cutlist.csv")));

        // The design folder rebuilds its design on its own (compare and verify read its spec.yaml): it holds a copy of the
        // table, byte for byte, and its spec.yaml names that copy (the original path is relative to the spec's folder,
        // not to the design folder).
        string copy = Path.Combine(fromTable, "slot-table.csv");
        Assert.Equal(sha, SlotTableCsv.Sha256(File.ReadAllBytes(copy)));
        string written = File.ReadAllText(Path.Combine(fromTable, "spec.yaml"));
        Assert.Contains("  data: slot-table.csv", written);
        Assert.DoesNotContain("data: mom.csv", written);
        Assert.Contains($"copy 'slotarray design' made of 'mom.csv' (SHA-256 {sha})", written);
        var (checkCode, _, checkErr) = DesignRuns.Run("check", Path.Combine(fromTable, "spec.yaml"));
        Assert.True(checkCode == 0, checkErr);
        Assert.False(File.Exists(Path.Combine(builtIn, "slot-table.csv")), "a design from the built-in model has no table to copy");
    }

    [Fact]
    public void Edge_slot_travelling_wave_design_from_a_table_outside_its_tilts_exits_1_and_with_extrapolate_flags_the_slots()
    {
        string dir = DesignRuns.TempFolder("table-edge");
        string table = Path.Combine(dir, "edge.csv");
        var (code, _, err) = DesignRuns.Run("slot", "--guide", "WR-90", "--frequency", "9.41GHz", "--tilt", "10deg", "--wall", "1.27mm",
            "--width", "1.6mm", "--table", table);
        Assert.True(code == 0, err);
        // Keep only tilts of 12° and more: the marine example's smallest tilts fall below the table.
        var lines = File.ReadAllLines(table);
        File.WriteAllLines(table, lines.Where(l => l.StartsWith('#') || l.StartsWith("tilt", StringComparison.Ordinal)
            || double.Parse(l.Split(',')[0], System.Globalization.CultureInfo.InvariantCulture) >= 12));
        string marine = File.ReadAllText(Path.Combine(RepoFiles.Root, "arrays", "marine-xband-edge-1m3.yaml"));
        string withData = marine.Replace("  width: 1.6 mm", "  width: 1.6 mm\n  data: edge.csv");
        Assert.Contains("data: edge.csv", withData);
        string spec = Path.Combine(dir, "marine-table.yaml");
        File.WriteAllText(spec, withData);
        var (c1, _, e1) = DesignRuns.Run("design", spec, "-o", Path.Combine(dir, "out1"), "--no-cache");
        Assert.Equal(1, c1);
        Assert.Contains("needs a slot outside the slot table edge.csv", e1);
        // The built-in edge-slot table (full-wave calibration) runs in steps of 2 deg to 25 deg: 13 deg to 25 deg remain.
        Assert.Contains("outside the table's 13 deg to 25 deg", e1);

        File.WriteAllText(spec, withData.Replace("  data: edge.csv", "  data: edge.csv\n  extrapolate: true"));
        var (c2, _, e2) = DesignRuns.Run("design", spec, "-o", Path.Combine(dir, "out2"), "--no-cache");
        // The design is written and, behind the example's automatic polarisation filter, meets its requirements.
        Assert.True(c2 == 0, e2);
        var rows = DesignRuns.CsvRecords(Path.Combine(dir, "out2", "cutlist.csv"));
        int tilt = Array.IndexOf(rows[0], "tilt_deg");
        foreach (var r in rows.Skip(1))
            Assert.Equal(Math.Abs(double.Parse(r[tilt], System.Globalization.CultureInfo.InvariantCulture)) < 13 - 1e-9 ? "outside" : "in table", r[^2]);   // before the revision flag
        Assert.Contains(rows.Skip(1), r => r[^2] == "outside");
        Assert.Contains("(outside table)", File.ReadAllText(Path.Combine(dir, "out2", "summary.md")));
    }

    private static string Design(string yaml, string tag, string? specPath = null)
    {
        string spec = specPath ?? DesignRuns.Spec(tag, yaml);
        string outDir = Path.Combine(DesignRuns.TempFolder(tag + "-out"), "out");
        var (code, _, err) = DesignRuns.Run("design", spec, "-o", outDir, "--cache-dir", DesignRuns.TempFolder(tag + "-cache"));
        Assert.True(code == 0, err);
        return outDir;
    }
}
