using System.Diagnostics;
using System.Globalization;
using System.Text.Json;
using SlotArray.Reports.Dxf;

namespace SlotArray.Reports.Tests;

/// <summary>
/// The DXF files for CAM (issue 13), read back twice, by the small reader of these tests and by Debian's python3-ezdxf
/// (an independent general-purpose DXF library, installed by .ci/run), and every slot's geometry checked against the
/// cut list and design.json to 1 µm: centre mark at the slot centre, outline extents = overall length and width, end
/// arcs of the cutter radius; edge slots: the tilt across the narrow face and the depth of cut into each broad wall.
/// </summary>
public class GuideFaceDxfTests
{
    private const double Um = 1e-3;   // 1 µm in mm

    private static double D(string s) => double.Parse(s, NumberStyles.Float, CultureInfo.InvariantCulture);

    private static List<DxfEntity> ByEzdxf(string text)
    {
        string file = Path.Combine(Path.GetTempPath(), "slotarray-dxf-" + Guid.NewGuid().ToString("N")[..8] + ".dxf");
        File.WriteAllText(file, text);
        const string script = """
            import ezdxf, json, sys
            doc = ezdxf.readfile(sys.argv[1])
            assert doc.header.get('$INSUNITS') == 4, 'units must be mm'
            out = []
            for e in doc.modelspace():
                t = e.dxftype(); v = {}
                if t == 'LINE':
                    v = {10: e.dxf.start.x, 20: e.dxf.start.y, 11: e.dxf.end.x, 21: e.dxf.end.y}
                elif t in ('ARC', 'CIRCLE'):
                    v = {10: e.dxf.center.x, 20: e.dxf.center.y, 40: e.dxf.radius}
                    if t == 'ARC': v.update({50: e.dxf.start_angle, 51: e.dxf.end_angle})
                elif t == 'TEXT':
                    v = {10: e.dxf.insert.x, 20: e.dxf.insert.y, 40: e.dxf.height}
                out.append({'type': t, 'layer': e.dxf.layer, 'values': v, 'text': e.dxf.text if t == 'TEXT' else None})
            print(json.dumps({'layers': [l.dxf.name for l in doc.layers], 'entities': out}))
            """;
        try
        {
            var psi = new ProcessStartInfo("/usr/bin/python3") { RedirectStandardOutput = true, RedirectStandardError = true };
            psi.ArgumentList.Add("-c");
            psi.ArgumentList.Add(script);
            psi.ArgumentList.Add(file);
            using var p = Process.Start(psi)!;
            string stdout = p.StandardOutput.ReadToEnd(), stderr = p.StandardError.ReadToEnd();
            p.WaitForExit();
            Assert.True(p.ExitCode == 0, "python3-ezdxf could not read the file (install python3-ezdxf: .ci/run does): " + stderr);
            var root = JsonDocument.Parse(stdout).RootElement;
            foreach (string layer in GuideFaceDxf.Layers) Assert.Contains(root.GetProperty("layers").EnumerateArray(), l => l.GetString() == layer);
            return [.. root.GetProperty("entities").EnumerateArray().Select(e => new DxfEntity(e.GetProperty("type").GetString()!, e.GetProperty("layer").GetString()!,
                e.GetProperty("values").EnumerateObject().ToDictionary(kv => int.Parse(kv.Name, CultureInfo.InvariantCulture), kv => kv.Value.GetDouble()),
                e.GetProperty("text").ValueKind == JsonValueKind.String ? e.GetProperty("text").GetString() : null))];
        }
        finally
        {
            File.Delete(file);
        }
    }

    private static List<DxfEntity> ByOwnReader(string text)
    {
        var (header, layers, entities) = DxfReader.Read(text);
        Assert.Equal("AC1009", header["$ACADVER"]);
        Assert.Equal(GuideFaceDxf.Layers, layers);
        return entities;
    }

    private static (string[] Header, List<string[]> Slots) CutList(Model.DesignReport r)
    {
        var records = StrictCsv.Parse(CutListCsv.ToText(r));
        var body = records.SkipWhile(x => x[0].StartsWith('#')).ToList();
        return (body[0], body.Skip(1).Where(x => x[0] == "slot").ToList());
    }

    /// <summary>The centre mark of a cut: the midpoint of its horizontal CENTRES line nearest (x, y).</summary>
    private static (double X, double Y) CentreMark(List<DxfEntity> es, double x, double y)
    {
        var h = es.Where(e => e.Type == "LINE" && e.Layer == "CENTRES" && Math.Abs(e[20] - e[21]) < 1e-9)
            .Select(e => (X: (e[10] + e[11]) / 2, Y: e[20])).MinBy(c => Math.Abs(c.X - x) + Math.Abs(c.Y - y));
        return h;
    }

    public static TheoryData<string> Readers => new() { "own", "ezdxf" };

    [Theory]
    [MemberData(nameof(Readers))]
    public void Broad_face_slots_read_back_match_the_cut_list_and_design_json_to_1_um(string reader)
    {
        var r = ReportFixture.Eight();
        var files = GuideFaceDxf.Files(r);
        Assert.Equal(["face-broad.dxf"], files.Select(f => f.Name));
        var es = reader == "own" ? ByOwnReader(files[0].Text) : ByEzdxf(files[0].Text);
        var (header, rows) = CutList(r);
        int Col(string n) => Array.IndexOf(header, n);
        var json = JsonDocument.Parse(DesignJson.ToText(r)).RootElement;
        var fab = json.GetProperty("fabrication").GetProperty("slots").EnumerateArray().ToList();
        var slotsJson = json.GetProperty("slots").EnumerateArray().ToList();
        var arcs = es.Where(e => e.Type == "ARC" && e.Layer == "SLOTS").ToList();
        Assert.Equal(2 * rows.Count, arcs.Count);   // cutter = width: two half circles per slot
        for (int i = 0; i < rows.Count; i++)
        {
            double z = D(rows[i][Col("z_from_A_mm")]), x = D(rows[i][Col("offset_mm")]);
            double len = D(rows[i][Col("length_mm")]), w = D(rows[i][Col("width_mm")]), rad = D(rows[i][Col("end_radius_mm")]);
            var (cx, cy) = CentreMark(es, z, x);
            var mine = arcs.Where(a => Math.Abs(a[10] - cx) < len / 2 + 0.5 && Math.Abs(a[20] - cy) < w).ToList();
            Assert.Equal(2, mine.Count);
            double r0 = mine[0][40];
            double lo = mine.Max(a => a[10]) - mine.Min(a => a[10]) + 2 * r0;
            double wd = mine.Max(a => a[20]) - mine.Min(a => a[20]) + 2 * r0;
            double mx = (mine.Max(a => a[10]) + mine.Min(a => a[10])) / 2;
            // against the cut list (printed to 1 µm: rounding ≤ 0.5 µm) and design.json (full precision), to 1 µm
            Check.Absolute(z, cx, Um, $"slot {i + 1}: centre mark z = cut list z_from_A_mm");
            Check.Absolute(x, cy, Um, $"slot {i + 1}: centre mark y = cut list offset_mm");
            Check.Absolute(cx, mx, Um, $"slot {i + 1}: outline centred on its mark");
            Check.Absolute(len, lo, Um, $"slot {i + 1}: outline tip to tip = cut list length_mm");
            Check.Absolute(w, wd, Um, $"slot {i + 1}: outline width = cut list width_mm");
            Check.Absolute(rad, r0, Um, $"slot {i + 1}: end arcs of the cutter radius");
            Check.Absolute(fab[i].GetProperty("position_from_datum_m").GetDouble() * 1e3, cx, Um, "design.json fabrication position");
            Check.Absolute(slotsJson[i].GetProperty("offset_m").GetDouble() * 1e3, cy, Um, "design.json offset");
            Check.Absolute(slotsJson[i].GetProperty("overall_length_m").GetDouble() * 1e3, lo, Um, "design.json overall length");
        }
        // the tube outline and datum A
        var plan = r.Fabrication!;
        var tube = es.Where(e => e.Type == "LINE" && e.Layer == "TUBE").ToList();
        Assert.Equal(4, tube.Count);
        Check.Absolute(plan.TubeLength.Meters * 1e3, tube.Max(e => Math.Max(e[10], e[11])), Um, "tube outline = tube length");
        Check.Absolute(0, tube.Min(e => Math.Min(e[10], e[11])), Um, "tube starts at datum A");
        Check.Absolute((22.86 + 2 * 1.27) / 2, tube.Max(e => Math.Max(e[20], e[21])), Um, "broad face = a + 2t wide");
        Assert.Contains(es, e => e.Layer == "DATUM" && e.Type == "LINE" && e[10] == 0 && e[11] == 0);
    }

    [Theory]
    [MemberData(nameof(Readers))]
    public void Edge_slot_faces_read_back_give_the_tilt_and_the_depth_of_cut_to_1_um(string reader)
    {
        var r = ReportFixture.Eight(tilt: true);
        var files = GuideFaceDxf.Files(r).ToDictionary(f => f.Name, f => f.Text);
        Assert.Equal(["face-lower-broad.dxf", "face-narrow.dxf", "face-upper-broad.dxf"], files.Keys.Order(StringComparer.Ordinal));
        List<DxfEntity> Read(string name) => reader == "own" ? ByOwnReader(files[name]) : ByEzdxf(files[name]);
        var narrow = Read("face-narrow.dxf");
        var upper = Read("face-upper-broad.dxf");
        var lower = Read("face-lower-broad.dxf");
        var (header, rows) = CutList(r);
        int Col(string n) => Array.IndexOf(header, n);
        double h = 10.16 + 2 * 1.27;   // outer narrow face height b + 2t
        foreach (var row in rows)
        {
            double z = D(row[Col("z_from_A_mm")]), tilt = D(row[Col("tilt_deg")]) * Math.PI / 180, w = D(row[Col("width_mm")]);
            double dUp = D(row[Col("cut_depth_upper_broad_wall_mm")]), dLo = D(row[Col("cut_depth_lower_broad_wall_mm")]);
            var (cx, cy) = CentreMark(narrow, z, 0);
            Check.Absolute(z, cx, Um, "narrow-face centre mark at the cut list z");
            Check.Absolute(0, cy, Um, "on the narrow-face centreline");
            // the slanted sides of the cut across the narrow face: direction atan(dx/dy) = tilt (+: upper end farther from A)
            var sides = narrow.Where(e => e.Type == "LINE" && e.Layer == "SLOTS" && Math.Abs(e[21] - e[20]) > h - 1e-6
                && Math.Abs((e[10] + e[11]) / 2 - z) < 2 * w).ToList();
            Assert.Equal(2, sides.Count);
            foreach (var s in sides)
            {
                double dx = s[11] - s[10], dy = s[21] - s[20];
                Check.Absolute(Math.Tan(tilt), dx / dy, 1e-6, "cut crosses the narrow face at the cut list tilt");
            }
            double sep = Math.Abs((sides[0][10] + sides[0][11]) / 2 - (sides[1][10] + sides[1][11]) / 2);
            Check.Absolute(w / Math.Cos(tilt), sep, Um, "the cut is as wide as the slot, measured square to its sides");
            // each broad wall: the cut's bottom (arc tops) lies at the depth of cut from the fold line
            foreach (var (face, depth, run) in new[] { (upper, dUp, h / 2 * Math.Tan(tilt)), (lower, dLo, -h / 2 * Math.Tan(tilt)) })
            {
                var arcs = face.Where(e => e.Type == "ARC" && e.Layer == "SLOTS" && Math.Abs(e[10] - (z + run)) < w).ToList();
                Assert.Equal(2, arcs.Count);
                Check.Absolute(depth, arcs[0][20] + arcs[0][40], Um, "cut depth into the broad wall = cut list");
                Check.Absolute(D(row[Col("end_radius_mm")]), arcs[0][40], Um, "cutter radius");
                var (mx, my) = CentreMark(face, z + run, depth / 2);
                Check.Absolute(z + run, mx, Um, "wrap centred where the tilted cut meets the broad wall");
            }
        }
    }

    [Fact]
    public void Dxf_files_are_deterministic_and_written_with_the_output_folder()
    {
        var r = ReportFixture.Eight();
        Assert.Equal(GuideFaceDxf.Files(r)[0].Text, GuideFaceDxf.Files(r)[0].Text);
        Assert.Contains("face-broad.dxf", OutputFolder.NamesFor(r));
        Assert.Equal(["face-lower-broad.dxf", "face-narrow.dxf", "face-upper-broad.dxf"],
            OutputFolder.NamesFor(ReportFixture.Eight(tilt: true)).Where(n => n.EndsWith(".dxf", StringComparison.Ordinal)).Order(StringComparer.Ordinal));
    }
}
