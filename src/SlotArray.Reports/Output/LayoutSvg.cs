using System.Text;
using SlotArray.Reports.Model;

namespace SlotArray.Reports;

/// <summary>
/// <c>layout.svg</c>: a true-scale (1:1) drawing of the slotted face, written by hand as SVG. The sheet's width and
/// height are given in mm and the viewBox is in mm, so one user unit is one millimetre on paper.
/// The guide axis z runs left to right from datum A at the left; +x is up. Every slot centre is
/// baseline-dimensioned from datum A (physics-reference §9.3), one dimension line per slot stacked above the face,
/// shortest nearest the part, so no two labels share a line. Transverse positions are tabulated on the sheet
/// (offset, side and distance from datum B, the outside face of the −x side wall). A long array gives one long sheet
/// (no splitting): every dimension refers to datum A, so the sheet may be tiled for printing without losing any.
/// Edge slots are drawn on the narrow face across its outer height, tilted by their signed tilt from the direction
/// across the face (positive: the end in the upper broad wall lies farther from datum A, i.e. clockwise on the sheet);
/// the two broad walls are drawn folded out above and below the narrow face (developed view), where each cut wraps
/// into them square to the guide axis to its cut depth, measured from the outer narrow-wall face (the fold line).
/// </summary>
public static class LayoutSvg
{
    private const double Margin = 12, DimPitch = 6, Text = 2.5, RowHeight = 5, TitleWidth = 190;

    /// <summary>Writes the drawing of <paramref name="report"/>.</summary>
    public static void Write(DesignReport report, TextWriter writer) => writer.Write(Build(report));

    /// <summary>The SVG text of the drawing.</summary>
    public static string Build(DesignReport report)
    {
        var g = report.Guide;
        bool tilt = CutListCsv.UsesTilt(report);
        double mm(double meters) => meters * 1e3;
        double faceHeight = mm(tilt ? g.B + 2 * g.Wall : g.A + 2 * g.Wall);
        var slots = report.Slots.OrderBy(s => s.Position).ThenBy(s => s.Index).ToArray();
        double zEnd = slots.Length == 0 ? 0 : slots.Max(s => mm(s.Position + s.OverallLength / 2));
        double faceLength = zEnd + Math.Max(mm(g.GuideWavelength) / 2, 15);

        // table geometry
        string[] head = tilt
            ? ["slot", "z from A", "tilt (deg)", "cut depth", "length", "width"]
            : ["slot", "z from A", "offset", "side", "from B", "length", "width"];
        double[] colW = tilt ? [12, 24, 22, 22, 22, 18] : [12, 24, 20, 14, 22, 22, 18];
        double blockW = colW.Sum() + 8;

        double left = Margin + 8;
        double sheetW = Math.Max(left + faceLength + Margin + (tilt ? 48 : 20), Math.Max(TitleWidth, blockW) + 2 * Margin);
        int blocks = Math.Max(1, (int)((sheetW - 2 * Margin) / blockW));
        int rowsPerBlock = Math.Max(1, (slots.Length + blocks - 1) / blocks);

        // Edge slots: the broad walls folded out above and below the narrow face, as deep as the deepest cut plus 2 mm.
        double wrap = tilt ? slots.Select(s => mm(s.CutDepth ?? 0)).DefaultIfEmpty(0).Max() + 2 : 0;
        double dimTop = Margin + 10;
        double faceTop = dimTop + DimPitch * slots.Length + 6 + wrap;
        double cl = faceTop + faceHeight / 2;
        double faceBottom = faceTop + faceHeight;
        double tableTop = faceBottom + wrap + (tilt ? 25 : 22);
        double tableBottom = tableTop + RowHeight * (rowsPerBlock + 1);
        double titleTop = tableBottom + 10;
        const int titleLines = 8;
        double sheetH = titleTop + 7 + titleLines * 5 + Margin;

        var sb = new StringBuilder();
        void Ln(string s) { sb.Append(s); sb.Append('\n'); }
        string F(double v) => Invariant.Fixed(v, 3);
        string X(double zMm) => F(left + zMm);
        void Line(double x1, double y1, double x2, double y2, string cls) =>
            Ln($"<line class=\"{cls}\" x1=\"{F(x1)}\" y1=\"{F(y1)}\" x2=\"{F(x2)}\" y2=\"{F(y2)}\"/>");
        void TextAt(double x, double y, string text, string anchor = "start", double size = Text, string extra = "") =>
            Ln($"<text x=\"{F(x)}\" y=\"{F(y)}\" font-size=\"{F(size)}\" text-anchor=\"{anchor}\"{extra}>{Xml(text)}</text>");
        void Arrow(double tipX, double y, int dir) => // dir +1 points right, -1 left
            Ln($"<path class=\"arrow\" d=\"M {F(tipX)} {F(y)} L {F(tipX - dir * 2.5)} {F(y - 0.7)} L {F(tipX - dir * 2.5)} {F(y + 0.7)} Z\"/>");

        Ln("<?xml version=\"1.0\" encoding=\"UTF-8\"?>");
        Ln($"<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"{F(sheetW)}mm\" height=\"{F(sheetH)}mm\" viewBox=\"0 0 {F(sheetW)} {F(sheetH)}\" font-family=\"DejaVu Sans, sans-serif\">");
        Ln($"<title>{Xml(report.Name)}: slot layout, true scale, mm</title>");
        Ln("<style>");
        Ln("line, rect, path { fill: none; stroke: black; stroke-width: 0.25; }");
        Ln(".outline { stroke-width: 0.5; } .datum { stroke-width: 0.7; } .hidden { stroke-dasharray: 2 1; stroke-width: 0.18; }");
        Ln(".centre { stroke-dasharray: 8 1.5 1 1.5; stroke-width: 0.18; } .thin { stroke-width: 0.18; }");
        Ln(".slot { stroke-width: 0.35; fill: #d9d9d9; } .arrow { fill: black; stroke: none; } text { fill: black; stroke: none; }");
        Ln("</style>");
        Ln($"<rect class=\"thin\" x=\"{F(1)}\" y=\"{F(1)}\" width=\"{F(sheetW - 2)}\" height=\"{F(sheetH - 2)}\"/>");

        // face outline, hidden inner walls, centreline, datum A
        Ln($"<rect class=\"outline\" id=\"face\" x=\"{X(0)}\" y=\"{F(faceTop)}\" width=\"{F(faceLength)}\" height=\"{F(faceHeight)}\"/>");
        double inner = mm(g.Wall);
        Line(left, faceTop + inner, left + faceLength, faceTop + inner, "hidden");
        Line(left, faceBottom - inner, left + faceLength, faceBottom - inner, "hidden");
        Line(left - 4, cl, left + faceLength + 6, cl, "centre");
        TextAt(left + faceLength + 7, cl + Text / 3, "CL", "start");
        Line(left, dimTop - 4, left, faceBottom + 12, "datum");
        double note = faceBottom + wrap + (tilt ? 9 : 6);
        if (tilt)
        {
            Ln($"<rect class=\"thin\" id=\"upper-broad-wall\" x=\"{X(0)}\" y=\"{F(faceTop - wrap)}\" width=\"{F(faceLength)}\" height=\"{F(wrap)}\"/>");
            Ln($"<rect class=\"thin\" id=\"lower-broad-wall\" x=\"{X(0)}\" y=\"{F(faceBottom)}\" width=\"{F(faceLength)}\" height=\"{F(wrap)}\"/>");
            TextAt(left + faceLength + 1.5, faceTop - wrap / 2 + Text / 3, "upper broad wall, folded out", "start", Text);
            TextAt(left + faceLength + 1.5, faceBottom + wrap / 2 + Text / 3, "lower broad wall, folded out", "start", Text);
        }
        TextAt(left + 1, note, "DATUM A: " + report.Inputs.DatumDescription, "start", 3);
        TextAt(left + 1, note + 4.5, tilt
            ? "narrow face shown, broad walls folded out above and below; z along the guide from datum A; + tilt: upper end farther from A"
            : "+x side at top; DATUM B: outside face of the -x side wall (bottom edge)", "start", Text);
        TextAt(left + faceLength - 1, faceTop - 1.5, "to feed", "end", Text);

        // slots, centre marks, numbers
        foreach (var s in slots)
        {
            double z = mm(s.Position), len = mm(s.OverallLength), w = mm(s.Width);
            double yc = tilt ? cl : cl - mm(s.Offset!.Value);
            double r = s.EndForm == SlotEndForm.Round ? w / 2 : 0;
            if (tilt)
            {
                // Across the narrow face at the tilt, then square to the guide axis into each folded-out broad wall.
                double th = s.TiltDeg!.Value * Math.PI / 180, run = faceHeight / 2 * Math.Tan(th), depth = mm(s.CutDepth ?? 0);
                Ln($"<rect class=\"slot\" id=\"slot-{Invariant.Int(s.Index)}\" x=\"{X(z - w / 2)}\" y=\"{F(faceTop)}\" width=\"{F(w)}\" height=\"{F(faceHeight / Math.Cos(th))}\" transform=\"rotate({F(s.TiltDeg!.Value)} {X(z)} {F(cl)}) translate(0 {F(faceHeight / 2 - faceHeight / (2 * Math.Cos(th)))})\"/>");
                double wz = w / Math.Cos(th);
                Ln($"<rect class=\"slot\" id=\"wrap-upper-{Invariant.Int(s.Index)}\" x=\"{X(z + run - wz / 2)}\" y=\"{F(faceTop - depth)}\" width=\"{F(wz)}\" height=\"{F(depth)}\" rx=\"{F(r)}\" ry=\"{F(r)}\"/>");
                Ln($"<rect class=\"slot\" id=\"wrap-lower-{Invariant.Int(s.Index)}\" x=\"{X(z - run - wz / 2)}\" y=\"{F(faceBottom)}\" width=\"{F(wz)}\" height=\"{F(depth)}\" rx=\"{F(r)}\" ry=\"{F(r)}\"/>");
            }
            else
                Ln($"<rect class=\"slot\" id=\"slot-{Invariant.Int(s.Index)}\" x=\"{X(z - len / 2)}\" y=\"{F(yc - w / 2)}\" width=\"{F(len)}\" height=\"{F(w)}\" rx=\"{F(r)}\" ry=\"{F(r)}\"/>");
            Line(left + z - 1.2, yc, left + z + 1.2, yc, "thin");
            Line(left + z, yc - 1.2, left + z, yc + 1.2, "thin");
            // broad face: number on the far side of the centreline; narrow face: below the face, clear of the tilted slot
            double side = tilt || s.Offset!.Value >= 0 ? 1 : -1;
            double yn = tilt ? faceBottom + wrap + 3.5 : cl + side * (faceHeight / 2 - 1.2) + (side > 0 ? 0 : Text);
            TextAt(left + z, yn, Invariant.Int(s.Index), "middle", Text, " font-weight=\"bold\"");
        }

        // baseline dimensions from datum A, shortest nearest the face
        for (int k = 0; k < slots.Length; k++)
        {
            var s = slots[k];
            double z = mm(s.Position);
            double y = faceTop - wrap - 6 - DimPitch * k;
            Line(left + z, faceTop - wrap - 0.5, left + z, y - 1.5, "thin");
            Line(left, y, left + z, y, "thin");
            Arrow(left, y, -1);
            Arrow(left + z, y, 1);
            string label = $"{Invariant.Mm(s.Position)} (slot {Invariant.Int(s.Index)})";
            bool fits = TextWidth(label, Text) + 4 < z; // else put it beyond the extension line, clear of the arrows
            TextAt(left + z + (fits ? -1.5 : 1.5), y - 0.8, label, fits ? "end" : "start");
        }
        TextAt(left, dimTop - 5, "slot centres from DATUM A (baseline), mm", "start", Text);

        // transverse table
        TextAt(Margin, tableTop - 3, tilt ? "Slot table (mm, deg): z from datum A; cut depth into each broad wall from the outer narrow-wall face"
            : "Slot table (mm): offset from the broad-wall centreline; 'from B' = wall + a/2 + offset, from the outside of the -x side wall", "start", Text);
        for (int b = 0; b < blocks; b++)
        {
            int first = b * rowsPerBlock;
            if (first >= slots.Length && b > 0) break;
            double x0 = Margin + b * blockW;
            double cx = x0;
            for (int c = 0; c < head.Length; c++)
            {
                TextAt(cx + colW[c] - 1, tableTop + RowHeight - 1.5, head[c], "end", Text, " font-weight=\"bold\"");
                cx += colW[c];
            }
            Line(x0, tableTop + RowHeight, x0 + colW.Sum(), tableTop + RowHeight, "thin");
            var bySlot = report.Slots.Skip(first).Take(rowsPerBlock).ToArray();
            for (int i = 0; i < bySlot.Length; i++)
            {
                var s = bySlot[i];
                string[] cells = tilt
                    ? [Invariant.Int(s.Index), Invariant.Mm(s.Position), Invariant.Fixed(s.TiltDeg!.Value, 2), Invariant.Mm(s.CutDepth ?? double.NaN), Invariant.Mm(s.OverallLength), Invariant.Mm(s.Width)]
                    : [Invariant.Int(s.Index), Invariant.Mm(s.Position), Invariant.Mm(s.Offset!.Value), CutListCsv.Side(s.Offset.Value), Invariant.Mm(g.Wall + g.A / 2 + s.Offset.Value), Invariant.Mm(s.OverallLength), Invariant.Mm(s.Width)];
                cx = x0;
                double y = tableTop + RowHeight * (i + 2) - 1.5;
                for (int c = 0; c < cells.Length; c++)
                {
                    TextAt(cx + colW[c] - 1, y, cells[c], "end");
                    cx += colW[c];
                }
            }
        }

        // title block
        double tx = sheetW - Margin - TitleWidth;
        Ln($"<rect class=\"outline\" id=\"title-block\" x=\"{F(tx)}\" y=\"{F(titleTop)}\" width=\"{F(TitleWidth)}\" height=\"{F(7 + titleLines * 5 + 2)}\"/>");
        TextAt(tx + 2, titleTop + 6, report.Name, "start", 5, " font-weight=\"bold\"");
        string[] lines =
        [
            $"Slotted {(tilt ? "narrow" : "broad")} face, true scale 1:1. Units: mm (angles deg).",
            "DO NOT SCALE THIS DRAWING: work to the dimensions given.",
            $"Guide {g.Designation}: inside a = {Invariant.Mm(g.A)}, b = {Invariant.Mm(g.B)}; wall {Invariant.Mm(g.Wall)}",
            $"Metal: {g.Metal}. Tolerance unless stated: ± {Invariant.Mm(report.Inputs.CutTolerance)}",
            $"Datum A: {report.Inputs.DatumDescription}; all z by baseline dimensioning from A.",
            "Slot lengths overall tip to tip; round ends radius = width/2 (width = cutter).",
            Invariant.Normalisation + ".",
            $"{Invariant.Int(report.Slots.Count)} slots; design frequency {Invariant.Ghz(report.FrequencyHz, 4)} GHz.",
        ];
        for (int i = 0; i < lines.Length; i++) TextAt(tx + 2, titleTop + 12 + 5 * i, lines[i], "start", 3);
        Ln("</svg>");
        return sb.ToString();
    }

    /// <summary>Generous estimate of a DejaVu Sans text width, mm (0.62 em per character).</summary>
    private static double TextWidth(string text, double size) => 0.62 * size * text.Length;

    /// <summary>XML text escape.</summary>
    private static string Xml(string s) => s.Replace("&", "&amp;").Replace("<", "&lt;").Replace(">", "&gt;").Replace("\"", "&quot;");
}
