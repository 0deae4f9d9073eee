using System.Globalization;
using System.Text.RegularExpressions;
using System.Xml.Linq;

namespace SlotArray.Reports.Tests;

/// <summary>
/// layout.svg (issue 13): true scale on ISO 216 sheets (landscape), numbered sheets with match lines, ordinate
/// dimensions from datum A, a title block with drawing number, revision, date (as given), scale and units.
/// </summary>
public class LayoutSvgTests
{
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    private static double Attr(XElement e, string name) =>
        double.Parse(e.Attribute(name)!.Value.Replace("mm", ""), NumberStyles.Float, CultureInfo.InvariantCulture);

    private static XElement Root(string text) => XDocument.Parse(text).Root!;

    private static IEnumerable<XElement> Rects(XElement svg) => svg.Descendants(Svg + "rect");

    // ISO 216:2007 sheet sizes (from memory): A4 210 × 297, A3 297 × 420, A1 594 × 841, A0 841 × 1189 mm; drawn landscape.
    // SVG 1.1 (W3C 2011) §7: width/height in mm with a viewBox of the same numbers make one user unit 1 mm.
    [Theory]
    [InlineData("A4", 297, 210)]
    [InlineData("A3", 420, 297)]
    [InlineData("A1", 841, 594)]
    [InlineData("A0", 1189, 841)]
    public void Every_sheet_is_a_standard_size_at_true_scale(string sheet, double width, double height)
    {
        var r = ReportFixture.Eight(count: 24) with { Document = new Model.DocumentInfo { Sheet = sheet } };
        foreach (var (_, text) in LayoutSvg.Sheets(r))
        {
            var svg = Root(text);
            Assert.Equal($"{width:0.000}mm", svg.Attribute("width")!.Value);
            Assert.Equal($"{height:0.000}mm", svg.Attribute("height")!.Value);
            Assert.Equal($"0 0 {width:0.000} {height:0.000}", svg.Attribute("viewBox")!.Value);
            // everything outside the clipped face view lies on the sheet
            foreach (var rect in Rects(svg).Where(x => x.Attribute("transform") is null && x.Ancestors(Svg + "g").All(g => g.Attribute("clip-path") is null) && x.Parent!.Name != Svg + "clipPath"))
            {
                Assert.InRange(Attr(rect, "x"), 0, width);
                Assert.InRange(Attr(rect, "x") + Attr(rect, "width"), 0, width);
                Assert.InRange(Attr(rect, "y") + Attr(rect, "height"), 0, height);
            }
        }
    }

    [Fact]
    public void Face_outline_is_a_plus_two_walls_wide_and_slots_are_drawn_to_size_from_datum_A()
    {
        var r = ReportFixture.Eight();
        var svg = Root(LayoutSvg.Build(r));
        var face = Rects(svg).Single(e => (string?)e.Attribute("id") == "face");
        Check.Absolute(22.86 + 2 * 1.27, Attr(face, "height"), 1e-3, "outside width a + 2·wall of WR-90 with a 1.27 mm wall");
        Check.Absolute(r.Fabrication!.TubeLength.Meters * 1e3, Attr(face, "width"), 1e-3, "the tube, datum A to its far end");
        double faceX = Attr(face, "x"), cl = Attr(face, "y") + Attr(face, "height") / 2;
        foreach (var s in r.Fabrication.Slots)
        {
            var e = Rects(svg).Single(x => (string?)x.Attribute("id") == $"slot-{s.Row.Slot}");
            Check.Absolute(s.Row.OverallLength.Meters * 1e3, Attr(e, "width"), 1e-3, "overall length, true scale");
            Check.Absolute(s.Position.Meters * 1e3, Attr(e, "x") + Attr(e, "width") / 2 - faceX, 1e-3, "slot centre from datum A");
            Check.Absolute(-s.Row.Offset!.Value.Meters * 1e3, Attr(e, "y") + Attr(e, "height") / 2 - cl, 1e-3, "offset from the centreline, +x up");
            Check.Absolute(s.Row.EndRadius!.Value.Meters * 1e3, Attr(e, "rx"), 1e-3, "round ends: radius = cutter radius");
        }
    }

    [Fact]
    public void Ordinates_give_every_slot_once_with_its_cut_list_position_and_the_title_block_its_fields()
    {
        var r = ReportFixture.Eight() with { Document = new Model.DocumentInfo { DrawingNumber = "SA-0042", Revision = "B", Date = "2026-12-05" } };
        var svg = Root(LayoutSvg.Build(r));
        var texts = svg.Descendants(Svg + "text").Select(t => t.Value).ToList();
        foreach (var s in r.Fabrication!.Slots)
            Assert.Equal(2, texts.Count(t => t == (s.Position.Meters * 1e3).ToString("F3", CultureInfo.InvariantCulture)));   // one ordinate per slot, and its table cell
        // ordinates are written along their extension lines (rotated), all reading from one baseline: no stacked dimension lines
        var ordinates = svg.Descendants(Svg + "text").Where(t => (t.Attribute("transform")?.Value ?? "").StartsWith("rotate(-90", StringComparison.Ordinal)).ToList();
        Assert.True(ordinates.Count >= r.Slots.Count);
        Assert.Contains(texts, t => t.Contains("Drawing no. SA-0042   Revision B   Date 2026-12-05   Sheet A3"));
        Assert.Contains(texts, t => t.Contains("Scale 1:1") && t.Contains("Units: mm"));
        Assert.Contains(texts, t => t.Contains("DO NOT SCALE"));
        Assert.Contains("SHEET 1 OF 1", texts);
        Assert.Contains(r.Name, texts);                   // escaped quote survives the XML round trip
        Assert.DoesNotContain(texts, t => t.Contains("not dated"));
        Assert.Contains(LayoutSvg.Build(ReportFixture.Eight()).Split('\n'), l => l.Contains("Date not dated"));   // never the clock
    }

    [Fact]
    public void A_long_array_runs_across_numbered_sheets_joined_by_match_lines()
    {
        var r = ReportFixture.Eight(count: 56);   // 56 × λg/2 ≈ 1.25 m on A3
        var sheets = LayoutSvg.Sheets(r);
        Assert.True(sheets.Count >= 4, $"{sheets.Count} sheets");
        Assert.Equal(Enumerable.Range(1, sheets.Count).Select(LayoutSvg.SheetName), sheets.Select(s => s.Name));
        var centres = new List<string>();
        for (int k = 0; k < sheets.Count; k++)
        {
            var svg = Root(sheets[k].Text);
            var texts = svg.Descendants(Svg + "text").Select(t => t.Value).ToList();
            Assert.Contains($"SHEET {k + 1} OF {sheets.Count}", texts);
            centres.AddRange(svg.Descendants(Svg + "line").Select(l => (string?)l.Attribute("id")).OfType<string>().Where(id => id.StartsWith("centre-", StringComparison.Ordinal)));
            if (k + 1 < sheets.Count)
            {
                // the match line to the next sheet names the same distance from A as the next sheet's line back
                string here = texts.Single(t => t.EndsWith($"SEE SHEET {k + 2}", StringComparison.Ordinal));
                string there = Root(sheets[k + 1].Text).Descendants(Svg + "text").Select(t => t.Value).Single(t => t.EndsWith($"SEE SHEET {k + 1}", StringComparison.Ordinal));
                Assert.Equal(Regex.Match(here, @"[0-9.]+").Value, Regex.Match(there, @"[0-9.]+").Value);
                double at = double.Parse(Regex.Match(here, @"[0-9.]+").Value, CultureInfo.InvariantCulture);
                // never through a slot: the break lies in a gap between cuts
                Assert.All(r.Fabrication!.Slots, s => Assert.True(Math.Abs(s.Position.Meters * 1e3 - at) > s.Row.OverallLength.Meters * 1e3 / 2, $"slot {s.Row.Slot} straddles the match line at {at}"));
            }
        }
        Assert.Equal(Enumerable.Range(1, 56).Select(n => $"centre-{n}"), centres);   // every slot's centre on exactly one sheet
    }

    [Fact]
    public void Edge_slots_are_drawn_tilted_on_the_narrow_face_with_their_wraps()
    {
        var r = ReportFixture.Eight(tilt: true);
        var svg = Root(LayoutSvg.Build(r));
        var face = Rects(svg).Single(e => (string?)e.Attribute("id") == "face");
        Check.Absolute(10.16 + 2 * 1.27, Attr(face, "height"), 1e-3, "outside height b + 2·wall");
        var slot1 = Rects(svg).Single(e => (string?)e.Attribute("id") == "slot-1");
        // + tilt: the end in the upper broad wall lies farther from datum A (clockwise on the sheet: SVG rotate is clockwise with y down).
        Assert.StartsWith("rotate(8.000 ", slot1.Attribute("transform")!.Value);
        foreach (string id in new[] { "wrap-upper-1", "wrap-lower-1" })
            Check.Absolute(r.Slots[0].CutDepth!.Value * 1e3, Attr(Rects(svg).Single(e => (string?)e.Attribute("id") == id), "height"), 1e-3, "cut depth from the outer narrow-wall face");
    }

    [Fact]
    public void Drawing_is_byte_identical_run_to_run()
    {
        var r = ReportFixture.Eight(count: 30);
        Assert.Equal(LayoutSvg.Sheets(r), LayoutSvg.Sheets(r));
    }
}
