using System.Text;
using SlotArray.Core.Fabrication;
using SlotArray.Reports.Model;

namespace SlotArray.Reports;

/// <summary>
/// The drawing of the slotted tube at true scale (1:1) on standard ISO 216 sheets in landscape (A3 by default; A4, A1,
/// A0), written by hand as SVG: <c>layout.svg</c> is sheet 1, <c>layout-2.svg</c> … the following sheets. Each sheet's
/// width and height are in mm and its viewBox in mm, so one user unit is one millimetre on paper: print at 100 %.
/// The tube axis runs left to right from datum A (the tube's machined end face, sheet 1's left end); +x is up. A long
/// tube continues across numbered sheets; each cut is marked by a MATCH LINE at the same distance from datum A on both
/// sheets. Every slot centre and tube feature carries an ordinate dimension from datum A (the zero on sheet 1): a
/// single baseline, the value written along each extension line, so nothing stacks. Each sheet tabulates its own
/// slots (broad-wall slots: offset, side and the distance from datum B, the outside face of the −x side wall, at the
/// nominal wall; edge slots: tilt and the depth of cut into each broad wall), and carries a title block with the
/// drawing number, revision, date (as given, never the clock), sheet number, scale, units and the spec's checksum.
/// Edge slots are drawn on the narrow face with the broad walls folded out above and below (developed view). Only
/// formats: the geometry is Core's (<see cref="FabricationPlan"/>, <see cref="GuideFaces"/>).
/// </summary>
internal static class LayoutSvg
{
    private const double Margin = 10, Text = 2.5, RowHeight = 4.5, TitleWidth = 180, TitleHeight = 40, OrdinateZone = 26;

    /// <summary>ISO 216 sheet sizes, landscape, mm (width, height).</summary>
    public static readonly IReadOnlyDictionary<string, (double Width, double Height)> SheetSizes = new Dictionary<string, (double, double)>
    {
        ["A4"] = (297, 210),
        ["A3"] = (420, 297),
        ["A1"] = (841, 594),
        ["A0"] = (1189, 841),
    };

    /// <summary>Writes sheet 1 of the drawing of <paramref name="report"/>.</summary>
    public static void Write(DesignReport report, TextWriter writer) => writer.Write(Build(report));

    /// <summary>The SVG text of sheet 1.</summary>
    public static string Build(DesignReport report) => Sheets(report)[0].Text;

    /// <summary>File name of sheet <paramref name="k"/> (1-based): layout.svg, layout-2.svg, …</summary>
    public static string SheetName(int k) => k == 1 ? "layout.svg" : $"layout-{Invariant.Int(k)}.svg";

    /// <summary>Every sheet of the drawing: file name and SVG text.</summary>
    /// <exception cref="ArgumentException">The report has no fabrication plan, or its sheet size is unknown.</exception>
    public static IReadOnlyList<(string Name, string Text)> Sheets(DesignReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        var plan = CutListCsv.PlanOf(report);
        bool tilt = CutListCsv.UsesTilt(report);
        if (!SheetSizes.TryGetValue(report.Document.Sheet, out var size))
            throw new ArgumentException($"sheet size '{report.Document.Sheet}': use A4, A3, A1 or A0", nameof(report));
        var faces = GuideFaces.Of(plan);
        var face = faces[0];
        double mm(double m) => m * 1e3;
        double faceHeight = mm(face.YMax - face.YMin);
        double wrap = tilt ? plan.Slots.Select(s => mm(s.Row.DepthOfCut?.Meters ?? 0)).DefaultIfEmpty(0).Max() + 2 : 0;
        double left = Margin + 14, right = size.Width - Margin - 6, usable = right - left;
        double faceTop = Margin + 8 + OrdinateZone + wrap;
        double faceBottom = faceTop + faceHeight;
        double tableTop = faceBottom + wrap + OrdinateZone + 14;
        double tableBottom = size.Height - Margin - TitleHeight - 4;
        double[] colW = tilt ? [10, 22, 18, 16, 22, 20, 18, 16] : [10, 22, 20, 12, 26, 20, 18, 16];
        double blockW = colW.Sum() + 6;
        int blocks = Math.Max(1, (int)((size.Width - 2 * Margin - 4) / blockW));
        int rowsPerBlock = (int)((tableBottom - tableTop) / RowHeight) - 1;
        if (rowsPerBlock < 1)
            throw new ArgumentException($"the {report.Document.Sheet} sheet is too small for this face ({faceHeight:0.#} mm high at 1:1): use a larger sheet", nameof(report));
        int capacity = blocks * rowsPerBlock;

        // Split the tube along X: at most the usable width per sheet, and no more slots than the sheet's table holds.
        double length = mm(plan.TubeLength.Meters);
        var z = plan.Slots.Select(s => mm(s.Position.Meters)).ToArray();
        var ranges = new List<(double X0, double X1)>();
        double x0 = 0;
        while (x0 < length - 1e-9)
        {
            double x1 = Math.Min(length, x0 + usable);
            if (x1 < length)
            {
                // break midway between two slots, never through one: the last gap centre in the sheet's second half
                double start = x0;
                var gaps = Enumerable.Range(1, Math.Max(0, z.Length - 1)).Select(i => (z[i - 1] + z[i]) / 2).Where(m => m > start + usable / 2 && m <= x1).ToArray();
                if (gaps.Length > 0) x1 = gaps[^1];
            }
            var inside = Enumerable.Range(0, z.Length).Where(i => z[i] >= x0 && z[i] < x1).ToArray();
            if (inside.Length > capacity) x1 = (z[inside[capacity - 1]] + z[inside[capacity]]) / 2;
            ranges.Add((x0, x1));
            x0 = x1;
        }

        var sheets = new List<(string, string)>();
        for (int k = 0; k < ranges.Count; k++)
            sheets.Add((SheetName(k + 1), Sheet(report, plan, face, tilt, size, k + 1, ranges.Count, ranges[k], left, faceTop, faceHeight, wrap, tableTop, colW, blockW, rowsPerBlock)));
        return sheets;
    }

    private static string Sheet(DesignReport report, FabricationPlan plan, GuideFace face, bool tilt, (double Width, double Height) size,
        int number, int count, (double X0, double X1) range, double left, double faceTop, double faceHeight, double wrap,
        double tableTop, double[] colW, double blockW, int rowsPerBlock)
    {
        var c = new SheetCanvas(left, range.X0);
        double viewLeft = c.X(range.X0), viewRight = c.X(range.X1);
        SheetHead(c, report, size, number, count, viewLeft, viewRight);
        Face(c, report, plan, tilt, faceTop, faceHeight, wrap);
        var own = plan.Slots.Where(s => ToMm(s.Position.Meters) >= range.X0 && ToMm(s.Position.Meters) < range.X1 + (number == count ? 1e-9 : 0)).ToList();
        Ordinates(c, plan, own, tilt, number, count, range, left, faceTop, faceHeight, wrap, tableTop, viewLeft);
        SlotTable(c, report, own, tilt, tableTop, colW, blockW, rowsPerBlock);
        TitleBlock(c, report, plan, tilt, size, number, count);
        return c.ToString();
    }

    private static double ToMm(double m) => m * 1e3;

    /// <summary>The XML prologue, title, styles, clip path of this sheet's stretch of tube and the frame.</summary>
    private static void SheetHead(SheetCanvas c, DesignReport report, (double Width, double Height) size, int number, int count,
        double viewLeft, double viewRight)
    {
        c.Ln("<?xml version=\"1.0\" encoding=\"UTF-8\"?>");
        c.Ln($"<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"{SheetCanvas.F(size.Width)}mm\" height=\"{SheetCanvas.F(size.Height)}mm\" viewBox=\"0 0 {SheetCanvas.F(size.Width)} {SheetCanvas.F(size.Height)}\" font-family=\"DejaVu Sans, sans-serif\">");
        c.Ln($"<title>{Xml(report.Name)}: slot layout, sheet {Invariant.Int(number)} of {Invariant.Int(count)}, {report.Document.Sheet}, scale 1:1, mm</title>");
        c.Ln("<style>");
        c.Ln("line, rect, path { fill: none; stroke: black; stroke-width: 0.25; }");
        c.Ln(".outline { stroke-width: 0.5; } .datum { stroke-width: 0.7; } .hidden { stroke-dasharray: 2 1; stroke-width: 0.18; }");
        c.Ln(".centre { stroke-dasharray: 8 1.5 1 1.5; stroke-width: 0.18; } .thin { stroke-width: 0.18; } .match { stroke-width: 0.7; stroke-dasharray: 12 2 2 2; }");
        c.Ln(".slot { stroke-width: 0.35; fill: #d9d9d9; } text { fill: black; stroke: none; }");
        c.Ln("</style>");
        c.Ln($"<defs><clipPath id=\"view\"><rect x=\"{SheetCanvas.F(viewLeft)}\" y=\"0\" width=\"{SheetCanvas.F(viewRight - viewLeft)}\" height=\"{SheetCanvas.F(size.Height)}\"/></clipPath></defs>");
        c.Ln($"<rect class=\"outline\" id=\"frame\" x=\"{SheetCanvas.F(Margin)}\" y=\"{SheetCanvas.F(Margin)}\" width=\"{SheetCanvas.F(size.Width - 2 * Margin)}\" height=\"{SheetCanvas.F(size.Height - 2 * Margin)}\"/>");
    }

    /// <summary>The face, its walls and centreline and the slots, clipped to this sheet's stretch of tube.</summary>
    private static void Face(SheetCanvas c, DesignReport report, FabricationPlan plan, bool tilt, double faceTop, double faceHeight, double wrap)
    {
        var g = report.Guide;
        double faceBottom = faceTop + faceHeight, cl = faceTop + faceHeight / 2;
        c.Ln("<g clip-path=\"url(#view)\">");
        c.Ln($"<rect class=\"outline\" id=\"face\" x=\"{SheetCanvas.F(c.X(0))}\" y=\"{SheetCanvas.F(faceTop)}\" width=\"{SheetCanvas.F(ToMm(plan.TubeLength.Meters))}\" height=\"{SheetCanvas.F(faceHeight)}\"/>");
        double inner = ToMm(g.Wall);
        c.Line(c.X(0), faceTop + inner, c.X(ToMm(plan.TubeLength.Meters)), faceTop + inner, "hidden");
        c.Line(c.X(0), faceBottom - inner, c.X(ToMm(plan.TubeLength.Meters)), faceBottom - inner, "hidden");
        c.Line(c.X(0) - 4, cl, c.X(ToMm(plan.TubeLength.Meters)) + 6, cl, "centre");
        if (tilt)
        {
            c.Ln($"<rect class=\"thin\" id=\"upper-broad-wall\" x=\"{SheetCanvas.F(c.X(0))}\" y=\"{SheetCanvas.F(faceTop - wrap)}\" width=\"{SheetCanvas.F(ToMm(plan.TubeLength.Meters))}\" height=\"{SheetCanvas.F(wrap)}\"/>");
            c.Ln($"<rect class=\"thin\" id=\"lower-broad-wall\" x=\"{SheetCanvas.F(c.X(0))}\" y=\"{SheetCanvas.F(faceBottom)}\" width=\"{SheetCanvas.F(ToMm(plan.TubeLength.Meters))}\" height=\"{SheetCanvas.F(wrap)}\"/>");
        }
        foreach (var s in plan.Slots)
        {
            double zc = ToMm(s.Position.Meters), w = ToMm(s.Row.Width.Meters), r = ToMm(s.Row.EndRadius?.Meters ?? 0);
            if (tilt)
            {
                double th = s.Row.Tilt!.Value.Radians, deg = s.Row.Tilt.Value.Degrees, run = faceHeight / 2 * Math.Tan(th), depth = ToMm(s.Row.DepthOfCut?.Meters ?? 0);
                double across = depth > 0 ? faceHeight / Math.Cos(th) : ToMm(s.Row.OverallLength.Meters);
                c.Ln($"<rect class=\"slot\" id=\"slot-{Invariant.Int(s.Row.Slot)}\" x=\"{SheetCanvas.F(c.X(zc) - w / 2)}\" y=\"{SheetCanvas.F(cl - across / 2)}\" width=\"{SheetCanvas.F(w)}\" height=\"{SheetCanvas.F(across)}\" transform=\"rotate({SheetCanvas.F(deg)} {SheetCanvas.F(c.X(zc))} {SheetCanvas.F(cl)})\"/>");
                if (depth > 0)
                {
                    double wz = w / Math.Cos(th);
                    c.Ln($"<rect class=\"slot\" id=\"wrap-upper-{Invariant.Int(s.Row.Slot)}\" x=\"{SheetCanvas.F(c.X(zc + run) - wz / 2)}\" y=\"{SheetCanvas.F(faceTop - depth)}\" width=\"{SheetCanvas.F(wz)}\" height=\"{SheetCanvas.F(depth)}\" rx=\"{SheetCanvas.F(r)}\" ry=\"{SheetCanvas.F(r)}\"/>");
                    c.Ln($"<rect class=\"slot\" id=\"wrap-lower-{Invariant.Int(s.Row.Slot)}\" x=\"{SheetCanvas.F(c.X(zc - run) - wz / 2)}\" y=\"{SheetCanvas.F(faceBottom)}\" width=\"{SheetCanvas.F(wz)}\" height=\"{SheetCanvas.F(depth)}\" rx=\"{SheetCanvas.F(r)}\" ry=\"{SheetCanvas.F(r)}\"/>");
                }
            }
            else
            {
                double len = ToMm(s.Row.OverallLength.Meters), yc = cl - ToMm(s.Row.Offset!.Value.Meters);
                c.Ln($"<rect class=\"slot\" id=\"slot-{Invariant.Int(s.Row.Slot)}\" x=\"{SheetCanvas.F(c.X(zc) - len / 2)}\" y=\"{SheetCanvas.F(yc - w / 2)}\" width=\"{SheetCanvas.F(len)}\" height=\"{SheetCanvas.F(w)}\" rx=\"{SheetCanvas.F(r)}\" ry=\"{SheetCanvas.F(r)}\"/>");
            }
        }
        c.Ln("</g>");
    }

    /// <summary>Centre marks, numbers and ordinates of this sheet's slots, the feature ordinates, datum A, match lines and notes.</summary>
    private static void Ordinates(SheetCanvas c, FabricationPlan plan, List<SlotCut> own, bool tilt, int number, int count,
        (double X0, double X1) range, double left, double faceTop, double faceHeight, double wrap, double tableTop, double viewLeft)
    {
        double faceBottom = faceTop + faceHeight, cl = faceTop + faceHeight / 2;
        double ordinateBase = faceTop - wrap - 2;
        foreach (var s in own)
        {
            double zc = ToMm(s.Position.Meters);
            double yc = tilt ? cl : cl - ToMm(s.Row.Offset!.Value.Meters);
            c.Line(c.X(zc) - 1.2, yc, c.X(zc) + 1.2, yc, "thin", $" id=\"centre-{Invariant.Int(s.Row.Slot)}\"");
            c.Line(c.X(zc), yc - 1.2, c.X(zc), yc + 1.2, "thin");
            double side = tilt || s.Row.Offset!.Value.Meters >= 0 ? 1 : -1;
            double yn = tilt ? faceBottom + wrap + 3.5 : cl + side * (faceHeight / 2 - 1.2) + (side > 0 ? 0 : Text);
            c.TextAt(c.X(zc), yn, Invariant.Int(s.Row.Slot), "middle", Text, " font-weight=\"bold\"");
            c.Line(c.X(zc), faceTop - wrap - 0.5, c.X(zc), ordinateBase - OrdinateZone + 4, "thin");
            c.Vertical(c.X(zc), ordinateBase - 1, Invariant.Mm(s.Position.Meters), "start");
        }
        // feature ordinates below the face
        double below = faceBottom + wrap + (tilt ? 6 : 2);
        double lastText = double.NegativeInfinity;
        foreach (var f in plan.Features.Where(f => ToMm(f.Position.Meters) >= range.X0 - 1e-9 && ToMm(f.Position.Meters) <= range.X1 + 1e-9))
        {
            // ordinates closer than a text height apart get a jogged extension line, so their figures never overlap
            double xf = c.X(ToMm(f.Position.Meters)), xt = Math.Max(xf, lastText + 3.5);
            lastText = xt;
            c.Line(xf, faceTop - wrap, xf, below + 3, f.Position.Meters == 0 ? "datum" : "thin", $" id=\"feature-{f.Key}\"");
            c.Line(xf, below + 3, xt, below + 6, "thin");
            c.Line(xt, below + 6, xt, below + OrdinateZone, "thin");
            c.Vertical(xt, below + OrdinateZone, Invariant.Mm(f.Position.Meters) + " " + Short(f), "start");
        }
        if (number == 1)
        {
            c.Line(c.X(0), Margin + 4, c.X(0), faceBottom + wrap + 4, "datum");
            c.TextAt(c.X(0) - 2, Margin + 7, "A", "end", 4, " font-weight=\"bold\"");
        }
        c.TextAt(left, Margin + 5, $"ORDINATE DIMENSIONS FROM DATUM A (tube end face), mm; sheet {Invariant.Int(number)} of {Invariant.Int(count)}", "start", Text);
        if (number > 1) Match(range.X0, number - 1);
        if (number < count) Match(range.X1, number + 1);
        void Match(double xMatch, int other)
        {
            c.Line(c.X(xMatch), faceTop - wrap - 4, c.X(xMatch), faceBottom + wrap + 4, "match", $" id=\"match-{Invariant.Int(other)}\"");
            c.TextAt(c.X(xMatch) + (other > number ? -1 : 1), faceBottom + wrap + 8, $"MATCH LINE {Invariant.Fixed(xMatch, 3)} FROM A: SEE SHEET {Invariant.Int(other)}",
                other > number ? "end" : "start", Text, " font-weight=\"bold\"");
        }
        if (!tilt) c.TextAt(Margin + 2, tableTop - 6, "DATUM B: outside face of the -x side wall (bottom edge of the face); +x side at top", "start", Text);
        else c.TextAt(viewLeft + 1, faceTop - wrap - 0.8, "upper broad wall, folded out; + tilt: upper end farther from A (clockwise)", "start", 2);
    }

    /// <summary>The slot table of this sheet's slots, in blocks side by side.</summary>
    private static void SlotTable(SheetCanvas c, DesignReport report, List<SlotCut> own, bool tilt, double tableTop, double[] colW, double blockW,
        int rowsPerBlock)
    {
        var g = report.Guide;
        string[] head = tilt
            ? ["slot", "z from A", "tilt deg", "+/-deg", "depth each", "length", "width", "+/-z"]
            : ["slot", "z from A", "offset", "side", "B, nom. wall", "length", "width", "+/-z"];
        c.TextAt(Margin + 2, tableTop - 2, tilt
            ? "Slot table (mm, deg): z from datum A; depth of cut into each broad wall from the outer narrow-wall face; length = path on the inner surfaces"
            : "Slot table (mm): offset from the broad-wall centreline; 'B, nom. wall' = wall + a/2 + offset from the outside of the -x side wall at the nominal wall", "start", 2.2);
        for (int b = 0; b * rowsPerBlock < own.Count || b == 0; b++)
        {
            double bx = Margin + 2 + b * blockW, cx = bx;
            for (int col = 0; col < head.Length; col++)
            {
                c.TextAt(cx + colW[col] - 1, tableTop + RowHeight - 1.2, head[col], "end", 2.2, " font-weight=\"bold\"");
                cx += colW[col];
            }
            c.Line(bx, tableTop + RowHeight, bx + colW.Sum(), tableTop + RowHeight, "thin");
            var rows = own.Skip(b * rowsPerBlock).Take(rowsPerBlock).ToArray();
            for (int i = 0; i < rows.Length; i++)
            {
                var s = rows[i];
                string[] cells = tilt
                    ? [Invariant.Int(s.Row.Slot), Invariant.Mm(s.Position.Meters), Invariant.Fixed(s.Row.Tilt!.Value.Degrees, 3), Invariant.Fixed(s.TiltTolerance!.Value * 180 / Math.PI, 3),
                       Invariant.Mm(s.Row.DepthOfCut?.Meters ?? 0), Invariant.Mm(s.Row.OverallLength.Meters), Invariant.Mm(s.Row.Width.Meters), Invariant.Mm(s.PositionTolerance.Value)]
                    : [Invariant.Int(s.Row.Slot), Invariant.Mm(s.Position.Meters), Invariant.Mm(s.Row.Offset!.Value.Meters), CutListCsv.Side(s.Row.Offset.Value.Meters),
                       Invariant.Mm(g.Wall + g.A / 2 + s.Row.Offset.Value.Meters), Invariant.Mm(s.Row.OverallLength.Meters), Invariant.Mm(s.Row.Width.Meters), Invariant.Mm(s.PositionTolerance.Value)];
                cx = bx;
                double y = tableTop + RowHeight * (i + 2) - 1.2;
                for (int col = 0; col < cells.Length; col++)
                {
                    c.TextAt(cx + colW[col] - 1, y, cells[col], "end", 2.2);
                    cx += colW[col];
                }
            }
        }
    }

    /// <summary>The title block (ISO 7200 layout is not imitated; these are the fields a shop needs).</summary>
    private static void TitleBlock(SheetCanvas c, DesignReport report, FabricationPlan plan, bool tilt, (double Width, double Height) size,
        int number, int count)
    {
        var g = report.Guide;
        var d = report.Document;
        double tx = size.Width - Margin - TitleWidth, ty = size.Height - Margin - TitleHeight;
        c.Ln($"<rect class=\"outline\" id=\"title-block\" x=\"{SheetCanvas.F(tx)}\" y=\"{SheetCanvas.F(ty)}\" width=\"{SheetCanvas.F(TitleWidth)}\" height=\"{SheetCanvas.F(TitleHeight)}\"/>");
        c.Line(tx, ty + 9, tx + TitleWidth, ty + 9, "thin");
        c.TextAt(tx + 2, ty + 6.5, report.Name, "start", 4.5, " font-weight=\"bold\"");
        c.TextAt(tx + TitleWidth - 2, ty + 6.5, $"SHEET {Invariant.Int(number)} OF {Invariant.Int(count)}", "end", 3.5, " font-weight=\"bold\" id=\"sheet-number\"");
        var t = plan.Tolerances;
        string[] lines =
        [
            $"Drawing no. {d.DrawingNumber ?? report.Name}   Revision {d.Revision}   Date {d.Date ?? "not dated"}   Sheet {report.Document.Sheet}",
            $"Scale 1:1 (print at 100 %). Units: mm, angles deg. Dimensions at 20 degC. DO NOT SCALE: work to the figures.",
            $"Guide {g.Designation}: inside a = {Invariant.Mm(g.A)}, b = {Invariant.Mm(g.B)}; wall {Invariant.Mm(g.Wall)}; {g.Metal}; tube {Invariant.Mm(plan.TubeLength.Meters)} +/- {Invariant.Mm(plan.TubeLengthTolerance.Value)}",
            $"Tolerances +/-: z {Invariant.Mm(t.Position.Value)}, {(tilt ? "depth " + Invariant.Mm(t.CutDepth.Value) : "offset " + Invariant.Mm(t.Offset.Value))}, length {Invariant.Mm(t.Length.Value)}, width {Invariant.Mm(t.Width.Value)}; others ISO 2768-f (cutlist.csv gives sources)",
            $"Datum A: tube end face ({(plan.EndPlateThickness.Meters > 0 ? "end-short plate flush" : "load-end flange face")}). Slot lengths overall tip to tip, end radius = cutter radius.",
            $"{Invariant.Int(report.Slots.Count)} slots; {Invariant.Ghz(report.FrequencyHz, 4)} GHz. SlotArray {d.ToolVersion}; spec SHA-256 {(d.SpecSha256 is { } h ? h[..16] + "..." : "not from a file")}",
        ];
        for (int i = 0; i < lines.Length; i++) c.TextAt(tx + 2, ty + 14 + 4.6 * i, lines[i], "start", 2.4);
        c.Ln("</svg>");
    }

    /// <summary>One sheet being drawn: its SVG text so far, its z origin and the drawing primitives (mm on the sheet).</summary>
    private sealed class SheetCanvas(double left, double x0)
    {
        private readonly StringBuilder sb = new();

        public static string F(double v) => Invariant.Fixed(v, 3);

        public double X(double zMm) => left + zMm - x0;

        public void Ln(string s)
        {
            sb.Append(s);
            sb.Append('\n');
        }

        public void Line(double x1, double y1, double x2, double y2, string cls, string extra = "") =>
            Ln($"<line class=\"{cls}\" x1=\"{F(x1)}\" y1=\"{F(y1)}\" x2=\"{F(x2)}\" y2=\"{F(y2)}\"{extra}/>");

        public void TextAt(double x, double y, string text, string anchor = "start", double sizeMm = Text, string extra = "") =>
            Ln($"<text x=\"{F(x)}\" y=\"{F(y)}\" font-size=\"{F(sizeMm)}\" text-anchor=\"{anchor}\"{extra}>{Xml(text)}</text>");

        /// <summary>Text reading bottom to top, its baseline on the extension line.</summary>
        public void Vertical(double x, double y, string text, string anchor) =>
            TextAt(x + Text / 3, y, text, anchor, Text, $" transform=\"rotate(-90 {F(x + Text / 3)} {F(y)})\"");

        public override string ToString() => sb.ToString();
    }

    /// <summary>A short label for a feature's ordinate.</summary>
    private static string Short(TubeFeature f) => f.Key switch
    {
        "tube-end" => "A",
        "load-flange" => "A flange",
        "end-short" => "short",
        "feed-junction" => "feed T",
        "second-short" => "short 2",
        "feed-flange" => "flange",
        "far-tube-end" => "end",
        _ => f.Key,
    };

    /// <summary>XML text escape.</summary>
    private static string Xml(string s) => s.Replace("&", "&amp;").Replace("<", "&lt;").Replace(">", "&gt;").Replace("\"", "&quot;");
}
