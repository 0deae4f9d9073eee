using System.Text.Json;
using System.Xml.Linq;
using SlotArray.Tests.Shared;

namespace SlotArray.Cli.Tests;

/// <summary>
/// <c>design</c> end to end on the marine demo (arrays/marine-xband-edge-1m3.yaml: 64 edge slots in WR-90 aluminium,
/// travelling wave at 0.45 λg, Taylor −28 dB n̄ = 5, 5 % to the load; issue 6 "Done when").
/// </summary>
public class TravellingWaveDemoTests
{
    private static readonly Lazy<(int Code, string Out, string Err, string Folder)> Demo = new(() =>
    {
        string folder = Path.Combine(DesignRuns.TempFolder("marine"), "out");
        var (code, o, e) = DesignRuns.Run("design", Path.Combine(RepoFiles.Root, "arrays", "marine-xband-edge-1m3.yaml"), "-o", folder);
        return (code, o, e, folder);
    });

    [Fact]
    public void Marine_demo_runs_and_prints_squint_and_load_power()
    {
        var (code, o, e, _) = Demo.Value;
        // The demo asks -25 dB cross-polar of edge slots (about -18 dB bare): with 'filter: auto' every requirement is met
        // and the exit code is 0 (issue 18).
        Assert.True(code == 0, $"exit {code}: {e}");
        Assert.DoesNotContain(o.Split('\n'), l => l.TrimStart().StartsWith("FAIL", StringComparison.Ordinal));
        Assert.Contains("PASS  peak cross-polar level", o);
        Assert.Contains("squint, scan rate", o);
        Assert.Contains("load power, efficiency 5.00 % of input (asked 5 %)", o);
        Assert.Contains("cross-polar peak", o);
    }

    [Fact]
    public void Issue18_marine_demo_meets_its_vertical_beamwidth_and_cross_polar_requirement_behind_the_filter()
    {
        // Issue 18 "Done when": the marine demo with flare: auto and filter: auto reports a vertical beamwidth within 1°
        // of its requirement (22°) and cross-polar lobes below −25 dB after the filter (worst over the band), with the
        // beam where the phase condition puts it (≤ 0.05°) and the pointing budget in summary.md.
        using var json = JsonDocument.Parse(File.ReadAllText(Path.Combine(Demo.Value.Folder, "design.json")));
        var root = json.RootElement;
        Check.Absolute(22, root.GetProperty("flare").GetProperty("vertical_hpbw_deg").GetDouble(), 1, "issue 18: vertical beamwidth within 1° of 22°");
        Assert.True(root.GetProperty("filter").GetProperty("filtered_worst_db").GetDouble() < -25);
        Assert.True(root.GetProperty("filter").GetProperty("bare_worst_db").GetDouble() > -25, "the bare slots alone miss it");
        Assert.All(root.GetProperty("sweep").EnumerateArray(), q => Assert.True(q.GetProperty("cross_polar_db").GetDouble() < -25));
        Assert.True(Math.Abs(root.GetProperty("travelling_wave").GetProperty("beam_residual_deg").GetDouble()) <= 0.05);
        string md = File.ReadAllText(Path.Combine(Demo.Value.Folder, "summary.md"));
        Assert.Contains("Worst-case bearing error over -25 to 55 °C and ±30.0 MHz", md);
        Assert.True(File.Exists(Path.Combine(Demo.Value.Folder, "vertical.png")));
        var parts = DesignRuns.Records(File.ReadAllText(Path.Combine(Demo.Value.Folder, "parts.csv"))).Where(r => !r[0].StartsWith('#')).ToList();
        Assert.Equal(3, parts.Count);   // header, flare plates, filter plates
        Assert.Equal("2", parts[1][1]);
        // The drawing of the plates (issue 18 item 5): the end view with the flare and filter plates, and the rows of parts.csv.
        var svg = XDocument.Load(Path.Combine(Demo.Value.Folder, "parts.svg"));
        var ids = svg.Root!.Descendants().Select(e => (string?)e.Attribute("id")).Where(id => id is not null).ToHashSet();
        Assert.Superset(new HashSet<string?> { "tube", "filter-plates", "frame" }, ids);
        Assert.Equal(2, svg.Root.Descendants().Count(e => (string?)e.Attribute("class") == "plate"));
        string text = string.Concat(svg.Root.Descendants().Where(e => e.Name.LocalName == "text").Select(e => e.Value + "\n"));
        foreach (var row in parts.Skip(1))
            foreach (string cell in row.Skip(1)) Assert.Contains(cell, text);
        Check.Absolute(root.GetProperty("flare").GetProperty("aperture_m").GetDouble() * 1e3,
            double.Parse(System.Text.RegularExpressions.Regex.Match(text, "aperture ([0-9.]+)").Groups[1].Value, System.Globalization.CultureInfo.InvariantCulture),
            0.0005, "the drawn aperture is design.json's (3 decimals of mm)");
    }

    [Fact]
    public void Issue11_marine_demo_near_field_bound_uses_the_narrow_face_the_edge_slots_are_cut_in()
    {
        // 4P/A (FCC OET Bulletin 65, 1997) with A = 64 slots × 20 mm by the narrow face b + 2t = 10.16 + 2 × 1.27 mm
        // (WR-90, EIA RS-261-B): 4 × 25 W / (1.28 m × 0.0127 m) = 6151.6 W/m², printed to 3 figures. The broad face
        // a + 2t = 25.4 mm gave half of it (3080 W/m²).
        string md = File.ReadAllText(Path.Combine(Demo.Value.Folder, "summary.md"));
        Assert.Contains("The near-field bound 4P/A is 6150 W/m²", md);
    }

    [Fact]
    public void Marine_demo_cut_list_and_drawing_describe_tilted_edge_slots_completely()
    {
        string folder = Demo.Value.Folder;
        var rows = DesignRuns.CsvRecords(Path.Combine(folder, "cutlist.csv"));
        Assert.Equal(["feature", "slot", "z_from_A_mm", "z_tol_mm", "tilt_deg", "tilt_tol_deg", "cut_depth_upper_broad_wall_mm",
            "cut_depth_lower_broad_wall_mm", "cut_depth_tol_mm", "length_mm", "length_tol_mm", "width_mm", "width_tol_mm", "end", "end_radius_mm", "changed"], rows[0]);
        Assert.Equal(65, rows.Count);
        using var json = JsonDocument.Parse(File.ReadAllText(Path.Combine(folder, "design.json")));
        var slots = json.RootElement.GetProperty("slots").EnumerateArray().ToArray();
        for (int i = 1; i < rows.Count; i++)
        {
            var r = rows[i];
            double tilt = double.Parse(r[4], System.Globalization.CultureInfo.InvariantCulture);
            Check.Absolute(slots[i - 1].GetProperty("tilt_deg").GetDouble(), tilt, 0.0005, "cut list tilt = design.json tilt (3 decimals)");
            Check.Absolute(slots[i - 1].GetProperty("cut_depth_m").GetDouble(), DesignRuns.Mm(r[6]), 0.5e-6, "cut depth, 3 decimals of mm");
            Assert.Equal(r[6], r[7]);   // the same depth into each broad wall
            Assert.True(i == 1 || Math.Sign(tilt) != Math.Sign(double.Parse(rows[i - 1][4], System.Globalization.CultureInfo.InvariantCulture)), "tilts alternate ±θ");
            Assert.Equal("round", r[13]);
        }
        Assert.Contains("datum A: machined end face of the tube at the load end, flush with the load-end flange face", File.ReadAllText(Path.Combine(folder, "cutlist.csv")));
        var sheets = Directory.GetFiles(folder, "layout*.svg");
        Assert.True(sheets.Length > 1, "a 1.3 m tube needs several A3 sheets");
        var ids = sheets.SelectMany(f => XDocument.Load(f).Root!.Descendants()).Select(e => (string?)e.Attribute("id")).Where(id => id is not null).ToHashSet();
        for (int n = 1; n <= 64; n++)
            Assert.True(ids.Contains($"slot-{n}") && ids.Contains($"wrap-upper-{n}") && ids.Contains($"wrap-lower-{n}"), $"slot {n} and its wraps are drawn");
        Assert.Contains("upper-broad-wall", ids);
        Assert.True(File.Exists(Path.Combine(folder, "scan.png")));
        Assert.Contains("## Frequency scan", File.ReadAllText(Path.Combine(folder, "summary.md")));
    }
}
