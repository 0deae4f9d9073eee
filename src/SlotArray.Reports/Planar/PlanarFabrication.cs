using System.Text;
using SlotArray.Core.Fabrication;
using SlotArray.Core.Planar;
using SlotArray.Core.Quantities;

using SlotArray.Reports.Dxf;

namespace SlotArray.Reports.Planar;

/// <summary>
/// The shop's files of a planar array: one cut list per branch (the linear cut list of <see cref="CutList"/>, positions from
/// each branch's own datum, the inner face of its near end short), the feed guide's coupling-slot list, and the plate drawing
/// (true-scale SVG, millimetres) and DXF of the slotted face and of the feed guide's coupled wall.
/// </summary>
internal static class PlanarFabrication
{
    /// <summary>Cut-list CSV of branch <paramref name="b"/> (RFC 4180, mm).</summary>
    public static string BranchCutList(PlanarResult r, PlanarBranch b)
    {
        var d = b.Stick;
        var g = d.Guide;
        var tol = Length.FromMillimeters(0.025);
        var list = CutList.Build(new CutListGuide(g.BroadWall, g.NarrowWall, g.WallThickness),
            [.. d.Slots.Select(s => new SlotCutInput(s.Index, s.Position, Length.FromMeters(s.Coupling), null, s.Length, s.Width, r.Request.Slots.Cutter, tol))]);
        var sb = new StringBuilder();
        sb.Append("# branch ").Append(Invariant.Int(b.Number)).Append(" of ").Append(r.Design.Name)
            .Append(": centre line at aperture y = ").Append(Invariant.Mm(b.Y)).Append(" mm; aperture x = position - ").Append(Invariant.Mm(d.FeedPlane.Meters))
            .Append(" mm; ").Append(string.Join(" ", list.Notes.Select(n => n.Message))).Append('\n');
        sb.Append("slot,position_mm,offset_mm,side,transverse_mm,overall_length_mm,equivalent_length_mm,width_mm,end,tolerance_mm\n");
        foreach (var row in list.Rows)
            sb.Append(Invariant.Int(row.Slot)).Append(',').Append(Invariant.Mm(row.Position.Meters)).Append(',').Append(Invariant.Mm(row.Offset!.Value.Meters))
                .Append(',').Append(row.Side).Append(',').Append(Invariant.Mm(row.TransversePosition!.Value.Meters)).Append(',')
                .Append(Invariant.Mm(row.OverallLength.Meters)).Append(',').Append(Invariant.Mm(row.EquivalentLength.Meters)).Append(',')
                .Append(Invariant.Mm(row.Width.Meters)).Append(',').Append(row.End.Form == SlotEndForm.Round ? "round" : "square").Append(',')
                .Append(Invariant.Mm(row.Tolerance.Meters)).Append('\n');
        return sb.ToString();
    }

    /// <summary>The feed guide's coupling slots: centred on both guides' centre lines, position along the feed guide from its datum end short.</summary>
    public static string FeedCutList(PlanarResult r)
    {
        var d = r.Design;
        double datum = d.Branches[0].Y - d.FeedShortDistance.Meters;
        if (d.FeedPosition == Core.Stick.FeedPosition.End) datum = d.Branches[0].Y - d.FeedInputDistance.Meters;
        var sb = new StringBuilder();
        sb.Append("# feed guide of ").Append(d.Name).Append(": a = ").Append(Invariant.Mm(d.FeedGuide.BroadWall.Meters)).Append(" mm, b = ")
            .Append(Invariant.Mm(d.FeedGuide.NarrowWall.Meters)).Append(" mm; coupling slots centred on the broad-wall centre line, tilt from the feed axis (+: counter-clockwise seen from the branches); ")
            .Append(d.FeedPosition == Core.Stick.FeedPosition.End ? "datum: the input plane" : "datum: the inner face of the end short at the branch-1 end")
            .Append("; Stevenson's resonant lengths (lambda/2): verify by measurement before cutting\n");
        sb.Append("branch,position_mm,tilt_deg,overall_length_mm,equivalent_length_mm,width_mm,series_resistance\n");
        foreach (var b in d.Branches)
        {
            var c = b.Coupling;
            var overall = RoundEndedSlot.OverallLength(c.Length, c.Width, r.Request.Slots.Cutter);
            sb.Append(Invariant.Int(c.Branch)).Append(',').Append(Invariant.Mm(c.Y - datum)).Append(',').Append(Invariant.Fixed(c.Tilt.Degrees, 3)).Append(',')
                .Append(Invariant.Mm(overall.Meters)).Append(',').Append(Invariant.Mm(c.Length.Meters)).Append(',').Append(Invariant.Mm(c.Width.Meters)).Append(',')
                .Append(Invariant.Fixed(c.Resistance, 6)).Append('\n');
        }
        return sb.ToString();
    }

    /// <summary>The outline of every radiating slot (aperture mm, rectangle of its overall length and width, along x) and of every branch guide's inside walls.</summary>
    private static (List<(double X, double Y, double L, double W)> Slots, List<(double Y0, double Y1)> Guides, double Half) Shapes(PlanarResult r)
    {
        var slots = new List<(double, double, double, double)>();
        for (int i = 0; i < r.Design.Layout.Count; i++)
        {
            var (_, s) = r.Design.SlotAt(i);
            var overall = RoundEndedSlot.OverallLength(s.Length, s.Width, r.Request.Slots.Cutter);
            slots.Add((r.Positions[i].X * 1e3, r.Positions[i].Y * 1e3, overall.Millimeters, s.Width.Millimeters));
        }
        double a = r.Design.BranchGuide.BroadWall.Millimeters;
        var guides = r.Design.Branches.Select(b => (b.Y * 1e3 - a / 2, b.Y * 1e3 + a / 2)).ToList();
        double half = r.Design.Branches.Max(b => (b.Stick.Slots[^1].Position + b.Stick.FarTermination!.Distance - b.Stick.FeedPlane).Millimeters);
        return (slots, guides, half);
    }

    /// <summary>A true-scale SVG (1 user unit = 1 mm) of the slotted face: branch guides' inside walls dashed, slots outlined, centre marked.</summary>
    public static string PlateSvg(PlanarResult r)
    {
        var (slots, guides, half) = Shapes(r);
        double m = 20, y0 = guides.Min(g => g.Y0) - m, y1 = guides.Max(g => g.Y1) + m, x0 = -half - m, x1 = half + m;
        var sb = new StringBuilder();
        string F(double v) => Invariant.Fixed(v, 3);
        sb.Append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        sb.Append($"<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"{F(x1 - x0)}mm\" height=\"{F(y1 - y0)}mm\" viewBox=\"{F(x0)} {F(-y1)} {F(x1 - x0)} {F(y1 - y0)}\">\n");
        sb.Append($"<title>{System.Security.SecurityElement.Escape(r.Design.Name)}: slotted face, true scale (mm), aperture axes x right, y up</title>\n");
        sb.Append("<g fill=\"none\" stroke=\"black\" stroke-width=\"0.2\">\n");
        foreach (var (ga, gb) in guides)
        {
            sb.Append($"<line x1=\"{F(-half)}\" y1=\"{F(-ga)}\" x2=\"{F(half)}\" y2=\"{F(-ga)}\" stroke-dasharray=\"2 1\"/>\n");
            sb.Append($"<line x1=\"{F(-half)}\" y1=\"{F(-gb)}\" x2=\"{F(half)}\" y2=\"{F(-gb)}\" stroke-dasharray=\"2 1\"/>\n");
        }
        foreach (var (x, y, l, w) in slots)
            sb.Append($"<rect x=\"{F(x - l / 2)}\" y=\"{F(-y - w / 2)}\" width=\"{F(l)}\" height=\"{F(w)}\" rx=\"{F(w / 2)}\"/>\n");
        sb.Append($"<line x1=\"-5\" y1=\"0\" x2=\"5\" y2=\"0\" stroke=\"red\"/><line x1=\"0\" y1=\"-5\" x2=\"0\" y2=\"5\" stroke=\"red\"/>\n");
        sb.Append("</g>\n</svg>\n");
        return sb.ToString();
    }

    /// <summary>DXF (mm) of the slotted face: layer SLOTS (slot outlines), GUIDES (inside walls), CENTRE.</summary>
    public static string PlateDxf(PlanarResult r)
    {
        var (slots, guides, half) = Shapes(r);
        var dxf = new DxfWriter();
        dxf.Layer("SLOTS", 1);
        dxf.Layer("GUIDES", 8);
        dxf.Layer("CENTRE", 3);
        foreach (var (ga, gb) in guides)
        {
            dxf.Line("GUIDES", -half, ga, half, ga);
            dxf.Line("GUIDES", -half, gb, half, gb);
        }
        foreach (var (x, y, l, w) in slots) Stadium(dxf, x, y, l, w, 0);
        dxf.Line("CENTRE", -5, 0, 5, 0);
        dxf.Line("CENTRE", 0, -5, 0, 5);
        return dxf.Build(-half - 10, guides.Min(g => g.Y0) - 10, half + 10, guides.Max(g => g.Y1) + 10);
    }

    /// <summary>DXF (mm) of the feed guide's coupled wall: the coupling slots at (0, y), rotated by their tilt from the feed axis (y).</summary>
    public static string FeedDxf(PlanarResult r)
    {
        var dxf = new DxfWriter();
        dxf.Layer("SLOTS", 1);
        dxf.Layer("GUIDE", 8);
        double a = r.Design.FeedGuide.BroadWall.Millimeters;
        double y0 = r.Design.Branches[0].Y * 1e3 - r.Design.FeedShortDistance.Millimeters, y1 = r.Design.Branches[^1].Y * 1e3 + r.Design.FeedShortDistance.Millimeters;
        dxf.Line("GUIDE", -a / 2, y0, -a / 2, y1);
        dxf.Line("GUIDE", a / 2, y0, a / 2, y1);
        foreach (var b in r.Design.Branches)
        {
            var c = b.Coupling;
            var overall = RoundEndedSlot.OverallLength(c.Length, c.Width, r.Request.Slots.Cutter);
            // The slot axis is θ from the feed axis (y): angle from x is 90° − θ.
            Stadium(dxf, 0, c.Y * 1e3, overall.Millimeters, c.Width.Millimeters, Math.PI / 2 - c.Tilt.Radians);
        }
        return dxf.Build(-a, y0 - 10, a, y1 + 10);
    }

    /// <summary>A round-ended slot of overall length l and width w centred at (x, y), axis at angle phi from x.</summary>
    private static void Stadium(DxfWriter dxf, double x, double y, double l, double w, double phi)
    {
        double r = w / 2, h = l / 2 - r, c = Math.Cos(phi), s = Math.Sin(phi), deg = phi * 180 / Math.PI;
        (double, double) P(double u, double v) => (x + u * c - v * s, y + u * s + v * c);
        var (ax, ay) = P(-h, r);
        var (bx, by) = P(h, r);
        var (cx, cy) = P(h, -r);
        var (dx, dy) = P(-h, -r);
        dxf.Line("SLOTS", ax, ay, bx, by);
        dxf.Line("SLOTS", dx, dy, cx, cy);
        var (e1x, e1y) = P(h, 0);
        var (e2x, e2y) = P(-h, 0);
        dxf.Arc("SLOTS", e1x, e1y, r, deg - 90, deg + 90);
        dxf.Arc("SLOTS", e2x, e2y, r, deg + 90, deg + 270);
    }
}
