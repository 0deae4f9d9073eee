using System.Text;
using SlotArray.Reports.Model;

namespace SlotArray.Reports;

/// <summary>
/// <c>parts.svg</c>: the drawing of the flare's and the filter's plates (written only when the spec has a flare or a
/// filter): an end view across the guide at the slotted face (the tube's section, the flare plates diverging from the
/// face's edges, the filter plates' depth), dimensioned, and the table of <c>parts.csv</c> with positions from datum A
/// (the cut list's and layout's datum). One ISO 216 landscape sheet (the spec's sheet size), the end view at 1:1 when it
/// fits, else at the largest of 1:2, 1:5, 1:10 that does; the viewBox in mm, so print at 100 %. Only formats: the parts
/// are Core's (<see cref="Core.Marine.MarineParts"/>).
/// </summary>
internal static class PartsSvg
{
    private const double Margin = 10, Text = 2.5, RowHeight = 5;

    /// <summary>The SVG text of the sheet, or null when the report has no flare and no filter.</summary>
    /// <param name="report">The report (its <see cref="DesignReport.Parts"/>, <see cref="DesignReport.Flare"/>, <see cref="DesignReport.Filter"/>).</param>
    /// <exception cref="ArgumentException">The sheet size is unknown.</exception>
    public static string? Build(DesignReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        if (report.Parts.Count == 0) return null;
        if (!LayoutSvg.SheetSizes.TryGetValue(report.Document.Sheet, out var size))
            throw new ArgumentException($"sheet size '{report.Document.Sheet}': use A4, A3, A1 or A0", nameof(report));
        var sb = new StringBuilder();
        void Ln(string s) => sb.Append(s).Append('\n');
        var g = report.Guide;
        double tube = (g.B + 2 * g.Wall) * 1e3, depth = (g.A + 2 * g.Wall) * 1e3;   // the edge slots' narrow face, and the tube behind it
        double throat = report.Flare?.ThroatM * 1e3 ?? tube, aperture = report.Flare?.ApertureM * 1e3 ?? tube, length = report.Flare?.LengthM * 1e3 ?? 0;
        double filterDepth = report.Filter?.DepthM * 1e3 ?? 0;
        double viewW = depth + Math.Max(length, filterDepth) + 40, viewH = Math.Max(aperture, tube) + 30;
        double areaW = size.Width - 2 * Margin - 10, areaH = size.Height * 0.55 - Margin - 12;
        double scale = new[] { 1.0, 0.5, 0.2, 0.1 }.FirstOrDefault(s => viewW * s <= areaW && viewH * s <= areaH, 0.05);
        Ln("<?xml version=\"1.0\" encoding=\"UTF-8\"?>");
        Ln($"<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"{F(size.Width)}mm\" height=\"{F(size.Height)}mm\" viewBox=\"0 0 {F(size.Width)} {F(size.Height)}\" font-family=\"DejaVu Sans, sans-serif\">");
        Ln($"<title>{Xml(report.Name)}: flare and polarisation-filter plates, {report.Document.Sheet}, end view 1:{Invariant.Fixed(1 / scale, 0)}, mm</title>");
        Ln("<style>line, rect, path, polygon { fill: none; stroke: black; stroke-width: 0.25; } .outline { stroke-width: 0.5; } .plate { stroke-width: 0.7; } .filter { fill: #d9d9d9; stroke-width: 0.35; } .centre { stroke-dasharray: 8 1.5 1 1.5; stroke-width: 0.18; } text { fill: black; stroke: none; }</style>");
        Ln($"<rect class=\"outline\" id=\"frame\" x=\"{F(Margin)}\" y=\"{F(Margin)}\" width=\"{F(size.Width - 2 * Margin)}\" height=\"{F(size.Height - 2 * Margin)}\"/>");
        Ln(TextAt(Margin + 4, Margin + 7, $"{report.Name}: flare and polarisation-filter plates. End view across the guide at the slotted face, scale 1:{Invariant.Fixed(1 / scale, 0)}; mm, deg; at 20 degC.", 3.2));
        double face = Margin + 10 + depth * scale, axis = Margin + 14 + viewH * scale / 2;
        EndView(Ln, scale, face, axis, (tube, depth, throat, aperture, length, filterDepth));
        PartsTable(Ln, report, size.Height * 0.55 + 4);
        var d = report.Document;
        Ln(TextAt(Margin + 4, size.Height - Margin - 4, $"Drawing no. {d.DrawingNumber ?? report.Name}-P   Revision {d.Revision}   Date {d.Date ?? "not dated"}   SlotArray {d.ToolVersion}; spec SHA-256 {(d.SpecSha256 is { } h ? h[..16] + "..." : "not from a file")}. Positions from datum A as on the layout and in cutlist.csv; plates span the slotted section.", 2.4));
        Ln("</svg>");
        return sb.ToString();
    }

    /// <summary>The tube's section, the slotted face, the flare plates and the filter plates' depth, with their dimensions.</summary>
    private static void EndView(Action<string> Ln, double scale, double face, double axis,
        (double Tube, double Depth, double Throat, double Aperture, double Length, double FilterDepth) mm)
    {
        double S(double v) => v * scale;
        Ln($"<rect class=\"outline\" id=\"tube\" x=\"{F(face - S(mm.Depth))}\" y=\"{F(axis - S(mm.Tube) / 2)}\" width=\"{F(S(mm.Depth))}\" height=\"{F(S(mm.Tube))}\"/>");
        Ln($"<line class=\"centre\" x1=\"{F(face - S(mm.Depth) - 4)}\" y1=\"{F(axis)}\" x2=\"{F(face + S(Math.Max(mm.Length, mm.FilterDepth)) + 6)}\" y2=\"{F(axis)}\"/>");
        if (mm.FilterDepth > 0)
        {
            // The filter plates seen edge-on along the guide: their depth out from the face, between the flare plates.
            double h0 = mm.Throat, h1 = mm.Length > 0 ? mm.Throat + (mm.Aperture - mm.Throat) * Math.Min(1, mm.FilterDepth / mm.Length) : mm.Throat;
            Ln($"<polygon class=\"filter\" id=\"filter-plates\" points=\"{F(face)},{F(axis - S(h0) / 2)} {F(face + S(mm.FilterDepth))},{F(axis - S(h1) / 2)} {F(face + S(mm.FilterDepth))},{F(axis + S(h1) / 2)} {F(face)},{F(axis + S(h0) / 2)}\"/>");
            Ln(TextAt(face + S(mm.FilterDepth) + 2, axis + S(h1) / 2 + 4, $"filter plates, depth {Invariant.Mm(mm.FilterDepth * 1e-3)}", Text));
        }
        if (mm.Length > 0)
        {
            foreach (int side in new[] { -1, 1 })
                Ln($"<line class=\"plate\" x1=\"{F(face)}\" y1=\"{F(axis + side * S(mm.Throat) / 2)}\" x2=\"{F(face + S(mm.Length))}\" y2=\"{F(axis + side * S(mm.Aperture) / 2)}\"/>");
            double right = face + S(mm.Length) + 3;
            Ln($"<line x1=\"{F(right)}\" y1=\"{F(axis - S(mm.Aperture) / 2)}\" x2=\"{F(right)}\" y2=\"{F(axis + S(mm.Aperture) / 2)}\"/>");
            Ln(TextAt(right + 1.5, axis - S(mm.Aperture) / 2 + 4, $"aperture {Invariant.Mm(mm.Aperture * 1e-3)}", Text));
            double below = axis + S(mm.Aperture) / 2 + 5;
            Ln($"<line x1=\"{F(face)}\" y1=\"{F(below)}\" x2=\"{F(face + S(mm.Length))}\" y2=\"{F(below)}\"/>");
            Ln(TextAt(face + S(mm.Length) / 2, below + 4, $"flare depth {Invariant.Mm(mm.Length * 1e-3)} from the slotted face", Text, "middle"));
        }
        Ln(TextAt(face - S(mm.Depth) / 2, axis - S(mm.Tube) / 2 - 2, $"tube {Invariant.Mm(mm.Depth * 1e-3)} x {Invariant.Mm(mm.Tube * 1e-3)}", Text, "middle"));
        Ln(TextAt(face - S(mm.Depth), axis + S(mm.Tube) / 2 + 9, $"slotted face, throat {Invariant.Mm(mm.Throat * 1e-3)}", Text));
    }

    /// <summary>The parts table, as parts.csv.</summary>
    private static void PartsTable(Action<string> Ln, DesignReport report, double top)
    {
        string[] head = ["part", "qty", "along guide", "width", "height", "first from A", "pitch", "angle (deg)"];
        double[] colW = [120, 12, 22, 20, 20, 26, 18, 20];
        double x = Margin + 4;
        for (int c = 0; c < head.Length; c++) Ln(TextAt(x + colW.Take(c).Sum(), top, head[c], Text, "start", " font-weight=\"bold\""));
        for (int r = 0; r < report.Parts.Count; r++)
        {
            var p = report.Parts[r];
            string[] cells = [p.Name, Invariant.Int(p.Quantity), Invariant.Fixed(p.AlongGuideMm, 3), Invariant.Fixed(p.WidthMm, 3), Invariant.Fixed(p.HeightMm, 3),
                Invariant.Fixed(p.FirstFromAMm, 3), Invariant.Fixed(p.PitchMm, 3), Invariant.Fixed(p.AngleDeg, 3)];
            for (int c = 0; c < cells.Length; c++) Ln(TextAt(x + colW.Take(c).Sum(), top + RowHeight * (r + 1), cells[c], Text * 0.9));
        }
        Ln(TextAt(x, top + RowHeight * (report.Parts.Count + 1) + 2, "Flare plates: along guide = their length, width = slant width from the face's edge to the aperture, angle = half-flare angle from the face normal. Filter plates: along guide = thickness, width = depth out from the face, height at the outer edge, first = first plate's centre.", 2.2));
    }

    private static string F(double v) => Invariant.Fixed(v, 3);

    private static string TextAt(double x, double y, string text, double sizeMm, string anchor = "start", string extra = "") =>
        $"<text x=\"{F(x)}\" y=\"{F(y)}\" font-size=\"{F(sizeMm)}\" text-anchor=\"{anchor}\"{extra}>{Xml(text)}</text>";

    private static string Xml(string s) => s.Replace("&", "&amp;").Replace("<", "&lt;").Replace(">", "&gt;").Replace("\"", "&quot;");
}
