using System.Globalization;
using System.Xml.Linq;

namespace SlotArray.Reports.Tests;

public class LayoutSvgTests
{
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    private static double Attr(XElement e, string name) =>
        double.Parse(e.Attribute(name)!.Value.Replace("mm", ""), NumberStyles.Float, CultureInfo.InvariantCulture);

    // SVG 1.1 (W3C 2011) §7: width/height with unit "mm" plus a viewBox of the same numbers make one user unit 1 mm.
    [Fact]
    public void Sheet_is_true_scale_in_mm()
    {
        var doc = XDocument.Parse(LayoutSvg.Build(ReportFixture.Eight()));
        var svg = doc.Root!;
        Assert.EndsWith("mm", svg.Attribute("width")!.Value);
        Assert.EndsWith("mm", svg.Attribute("height")!.Value);
        double[] box = [.. svg.Attribute("viewBox")!.Value.Split(' ').Select(v => double.Parse(v, CultureInfo.InvariantCulture))];
        Assert.Equal([0, 0, Attr(svg, "width"), Attr(svg, "height")], box);
        // every rectangle lies on the sheet
        foreach (var rect in svg.Descendants(Svg + "rect").Where(r => r.Attribute("transform") is null))
        {
            Assert.InRange(Attr(rect, "x"), 0, box[2]);
            Assert.InRange(Attr(rect, "x") + Attr(rect, "width"), 0, box[2]);
            Assert.InRange(Attr(rect, "y") + Attr(rect, "height"), 0, box[3]);
        }
    }

    [Fact]
    public void Face_outline_is_a_plus_two_walls_wide_and_slots_are_drawn_to_size()
    {
        var r = ReportFixture.Eight();
        var svg = XDocument.Parse(LayoutSvg.Build(r)).Root!;
        var face = svg.Descendants(Svg + "rect").Single(e => (string?)e.Attribute("id") == "face");
        Check.Absolute(22.86 + 2 * 1.27, Attr(face, "height"), 1e-3, "outside width a + 2·wall of WR-90 with a 1.27 mm wall");
        var slots = svg.Descendants(Svg + "rect").Where(e => (string?)e.Attribute("class") == "slot").ToList();
        Assert.Equal(r.Slots.Count, slots.Count);
        double faceX = Attr(face, "x"), cl = Attr(face, "y") + Attr(face, "height") / 2;
        foreach (var s in r.Slots)
        {
            var e = slots.Single(x => (string?)x.Attribute("id") == $"slot-{s.Index}");
            Check.Absolute(s.OverallLength * 1e3, Attr(e, "width"), 1e-3, "overall length, true scale");
            Check.Absolute(s.Position * 1e3, Attr(e, "x") + Attr(e, "width") / 2 - faceX, 1e-3, "slot centre from datum A");
            Check.Absolute(-s.Offset!.Value * 1e3, Attr(e, "y") + Attr(e, "height") / 2 - cl, 1e-3, "offset from the centreline, +x up");
            Check.Absolute(s.Width * 1e3 / 2, Attr(e, "rx"), 1e-3, "round ends: radius = width/2 (physics-reference §9.1)");
        }
    }

    [Fact]
    public void Sheet_carries_datum_title_block_dimensions_and_a_table_row_per_slot()
    {
        var r = ReportFixture.Eight();
        var svg = XDocument.Parse(LayoutSvg.Build(r)).Root!;
        var texts = svg.Descendants(Svg + "text").Select(t => t.Value).ToList();
        Assert.Contains("DATUM A: inner face of end short", texts);
        Assert.Contains(texts, t => t.Contains("DO NOT SCALE"));
        Assert.Contains(texts, t => t.Contains("Units: mm"));
        Assert.Contains(texts, t => t.Contains("G0"));
        Assert.Contains(r.Name, texts);                   // escaped quote survives the XML round trip
        foreach (var s in r.Slots)
        {
            string pos = (s.Position * 1e3).ToString("F3", CultureInfo.InvariantCulture);
            Assert.Contains($"{pos} (slot {s.Index})", texts);                    // baseline dimension label
            Assert.Contains((s.Offset!.Value * 1e3).ToString("F3", CultureInfo.InvariantCulture), texts); // table cell
        }
        Assert.Equal(2 * r.Slots.Count, svg.Descendants(Svg + "path").Count(p => (string?)p.Attribute("class") == "arrow"));
    }

    // Baseline dimensions stack one per level: no two labels share a y, so none collide.
    [Fact]
    public void Dimension_labels_do_not_share_a_line()
    {
        var svg = XDocument.Parse(LayoutSvg.Build(ReportFixture.Eight())).Root!;
        var ys = svg.Descendants(Svg + "text").Where(t => t.Value.Contains("(slot ")).Select(t => Attr(t, "y")).ToList();
        Assert.Equal(8, ys.Count);
        var sorted = ys.Order().ToList();
        for (int i = 1; i < sorted.Count; i++) Assert.True(sorted[i] - sorted[i - 1] >= 2.5 + 1, "label pitch exceeds the 2.5 mm text height");
    }

    [Fact]
    public void A_long_array_gives_one_valid_long_sheet()
    {
        var r = ReportFixture.Eight(count: 56);   // 56 × λg/2 ≈ 1.25 m
        var svg = XDocument.Parse(LayoutSvg.Build(r)).Root!;
        Assert.True(Attr(svg, "width") > 1250, "sheet as long as the array");
        Assert.Equal(56, svg.Descendants(Svg + "rect").Count(e => (string?)e.Attribute("class") == "slot"));
    }

    [Fact]
    public void Edge_slots_are_drawn_tilted_on_the_narrow_face()
    {
        var svg = XDocument.Parse(LayoutSvg.Build(ReportFixture.Eight(tilt: true))).Root!;
        var face = svg.Descendants(Svg + "rect").Single(e => (string?)e.Attribute("id") == "face");
        Check.Absolute(10.16 + 2 * 1.27, Attr(face, "height"), 1e-3, "outside height b + 2·wall");
        var slot1 = svg.Descendants(Svg + "rect").Single(e => (string?)e.Attribute("id") == "slot-1");
        // + tilt: the end in the upper broad wall lies farther from datum A (clockwise on the sheet: SVG rotate is clockwise with y down).
        Assert.StartsWith("rotate(8.000 ", slot1.Attribute("transform")!.Value);
        // The wraps into the folded-out broad walls are as deep as the cut depth (fixture: 3.1 mm for slot 1).
        foreach (string id in new[] { "wrap-upper-1", "wrap-lower-1" })
            Check.Absolute(3.1, Attr(svg.Descendants(Svg + "rect").Single(e => (string?)e.Attribute("id") == id), "height"), 1e-3, "cut depth from the outer narrow-wall face");
    }
}
