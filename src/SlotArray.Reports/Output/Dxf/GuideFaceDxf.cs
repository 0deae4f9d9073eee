using SlotArray.Core.Fabrication;
using SlotArray.Reports.Model;

namespace SlotArray.Reports.Dxf;

/// <summary>
/// One DXF file per slotted or cut face of the tube (<see cref="GuideFaces"/>), in mm, for CAM: layer TUBE the face
/// outline (the developed outer face, X from datum A along the tube), DATUM the datum lines (A at X = 0; B on the broad
/// face), SLOTS the slot outlines (lines and arcs of the cutter radius: round ends, or a rectangle for square ends),
/// CENTRES a centre mark (cross, 2 mm arms) at every slot centre, TEXT the slot numbers and the title (drawing number,
/// revision, face). Only formats: the geometry is Core's.
/// </summary>
internal static class GuideFaceDxf
{
    /// <summary>The layer names, in table order.</summary>
    public static readonly IReadOnlyList<string> Layers = ["TUBE", "DATUM", "SLOTS", "CENTRES", "TEXT"];

    /// <summary>Half-length of a centre-mark arm, mm.</summary>
    public const double CentreMarkArm = 1.0;

    /// <summary>File name of a face's DXF: <c>face-&lt;key&gt;.dxf</c>.</summary>
    public static string FileName(GuideFace face) => $"face-{face.Key}.dxf";

    /// <summary>The DXF files of the report: (file name, text), one per face.</summary>
    public static IReadOnlyList<(string Name, string Text)> Files(DesignReport report)
    {
        var plan = CutListCsv.PlanOf(report);
        return [.. GuideFaces.Of(plan).Select(f => (FileName(f), Build(report, f)))];
    }

    /// <summary>Writes the first face's file (the single-file form of the output entry; the folder writes every face).</summary>
    public static void Write(DesignReport report, TextWriter writer) => writer.Write(Files(report)[0].Text);

    /// <summary>The DXF text of one face.</summary>
    public static string Build(DesignReport report, GuideFace face)
    {
        var w = new DxfWriter();
        int[] colours = [7, 1, 5, 3, 7];
        for (int i = 0; i < Layers.Count; i++) w.Layer(Layers[i], colours[i]);
        double mm(double m) => m * 1e3;
        double len = mm(face.Length), y0 = mm(face.YMin), y1 = mm(face.YMax);
        w.Line("TUBE", 0, y0, len, y0);
        w.Line("TUBE", len, y0, len, y1);
        w.Line("TUBE", len, y1, 0, y1);
        w.Line("TUBE", 0, y1, 0, y0);
        w.Line("DATUM", 0, y0 - 5, 0, y1 + 5);
        w.Text("DATUM", -4, y1 + 2, 2.5, "A");
        if (face.DatumB is { } b)
        {
            w.Line("DATUM", -5, mm(b), len + 5, mm(b));
            w.Text("DATUM", len + 2, mm(b) + 0.5, 2.5, "B");
        }
        foreach (var c in face.Cuts)
        {
            foreach (var l in c.Lines) w.Line("SLOTS", mm(l.X1), mm(l.Y1), mm(l.X2), mm(l.Y2));
            foreach (var a in c.Arcs) w.Arc("SLOTS", mm(a.CentreX), mm(a.CentreY), mm(a.Radius), a.StartDeg, a.EndDeg);
            double cx = mm(c.CentreX), cy = mm(c.CentreY);
            w.Line("CENTRES", cx - CentreMarkArm, cy, cx + CentreMarkArm, cy);
            w.Line("CENTRES", cx, cy - CentreMarkArm, cx, cy + CentreMarkArm);
            w.Text("TEXT", cx - 1, y1 + 2, 2, Invariant.Int(c.Slot));
        }
        var d = report.Document;
        w.Text("TEXT", 0, y0 - 8, 3, $"{d.DrawingNumber ?? report.Name} rev {d.Revision}: {face.Name}; mm, 1:1, 20 degC");
        return w.Build(-10, y0 - 12, len + 10, y1 + 10);
    }
}
