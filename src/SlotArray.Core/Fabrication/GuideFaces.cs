using SlotArray.Core.Quantities;

namespace SlotArray.Core.Fabrication;

/// <summary>A straight segment of an outline on a face, face coordinates in metres (X along the tube from datum A, Y across the face).</summary>
/// <param name="X1">Start X.</param>
/// <param name="Y1">Start Y.</param>
/// <param name="X2">End X.</param>
/// <param name="Y2">End Y.</param>
internal sealed record FaceLine(double X1, double Y1, double X2, double Y2);

/// <summary>A circular arc of an outline, counter-clockwise from <paramref name="StartDeg"/> to <paramref name="EndDeg"/> (as DXF draws arcs).</summary>
/// <param name="CentreX">Centre X, m.</param>
/// <param name="CentreY">Centre Y, m.</param>
/// <param name="Radius">Radius, m (the cutter radius).</param>
/// <param name="StartDeg">Start angle, degrees from +X, 0 ≤ angle &lt; 360.</param>
/// <param name="EndDeg">End angle, degrees from +X, 0 ≤ angle &lt; 360.</param>
internal sealed record FaceArc(double CentreX, double CentreY, double Radius, double StartDeg, double EndDeg);

/// <summary>One slot's cut on one face: its closed outline (lines and arcs) and its centre mark.</summary>
/// <param name="Slot">Slot number.</param>
/// <param name="CentreX">Centre-mark X, m.</param>
/// <param name="CentreY">Centre-mark Y, m.</param>
/// <param name="Lines">Straight parts of the outline.</param>
/// <param name="Arcs">Round parts of the outline (empty for square ends).</param>
internal sealed record FaceCut(int Slot, double CentreX, double CentreY, IReadOnlyList<FaceLine> Lines, IReadOnlyList<FaceArc> Arcs);

/// <summary>One outer face of the tube, developed flat, with the cuts on it.</summary>
/// <param name="Key">File-name key: "broad", "narrow", "upper-broad" or "lower-broad".</param>
/// <param name="Name">What the face is, in words, with its coordinate axes.</param>
/// <param name="Length">Face length along the tube (the tube length), m; X runs 0 … Length from datum A.</param>
/// <param name="YMin">Lowest Y of the face, m.</param>
/// <param name="YMax">Highest Y of the face, m.</param>
/// <param name="DatumB">Y of datum B on this face (broad face: the outside of the −x side wall), or null.</param>
/// <param name="Cuts">The cuts on this face, by slot number.</param>
internal sealed record GuideFace(string Key, string Name, double Length, double YMin, double YMax, double? DatumB, IReadOnlyList<FaceCut> Cuts);

/// <summary>
/// The outer faces of the slotted tube with every slot outline in face coordinates (for CAM files and drawings): X along
/// the tube from datum A, Y across the face. Broad-wall slots: one face, Y = the signed offset from the broad-wall
/// centreline (+x up), datum B at Y = −(a/2 + t). Edge slots: the narrow face (Y from its centreline, + toward the upper
/// broad wall), where each cut crosses the whole outer face at its tilt, and the upper and lower broad faces (Y from the
/// slotted narrow wall's outer face into the broad wall), where each cut runs square to the tube axis to its depth, as
/// wide along X as the tilted cut, w/cos θ.
/// </summary>
/// <remarks>
/// Outlines: a round-ended slot is the rounded rectangle the cutter leaves (corner radius = cutter radius r; with
/// r = w/2 two half circles), a square-ended one a rectangle; the overall length is tip to tip along X. An edge slot's
/// sign follows <c>SlotEnd</c>/<c>CutList</c>: + when its end in the upper broad wall lies farther from datum A.
/// </remarks>
internal static class GuideFaces
{
    /// <summary>The faces of a plan: one for broad-wall slots, three (narrow, upper broad, lower broad) for edge slots.</summary>
    /// <param name="plan">The fabrication plan.</param>
    public static IReadOnlyList<GuideFace> Of(FabricationPlan plan)
    {
        ArgumentNullException.ThrowIfNull(plan);
        var g = plan.Guide;
        double a = g.BroadWall.Meters, b = g.NarrowWall.Meters, t = g.WallThickness.Meters, len = plan.TubeLength.Meters;
        bool edge = plan.Slots.Any(s => s.Row.Tilt is not null);
        if (!edge)
        {
            var cuts = plan.Slots.Select(s => Rounded(s.Row.Slot, s.Position.Meters, s.Row.Offset!.Value.Meters, s.Row.OverallLength.Meters,
                s.Row.Width.Meters, s.Row.EndRadius?.Meters ?? 0)).ToList();
            return [new GuideFace("broad", "slotted broad face, X along the tube from datum A, Y = offset from the broad-wall centreline (+x up)",
                len, -(a / 2 + t), a / 2 + t, -(a / 2 + t), cuts)];
        }
        double h = b + 2 * t;
        var narrow = new List<FaceCut>();
        var upper = new List<FaceCut>();
        var lower = new List<FaceCut>();
        foreach (var s in plan.Slots)
        {
            double z = s.Position.Meters, th = s.Row.Tilt!.Value.Radians, w = s.Row.Width.Meters, r = s.Row.EndRadius?.Meters ?? 0;
            double depth = s.Row.DepthOfCut?.Meters ?? 0;
            if (depth <= 0)
            {
                narrow.Add(Rotate(Rounded(s.Row.Slot, 0, 0, s.Row.OverallLength.Meters, w, r), Math.PI / 2 - th, z, 0));
                continue;
            }
            double run = h / 2 * Math.Tan(th), wz = w / Math.Cos(th);
            narrow.Add(new FaceCut(s.Row.Slot, z, 0,
            [
                new FaceLine(z - run - wz / 2, -h / 2, z - run + wz / 2, -h / 2),
                new FaceLine(z - run + wz / 2, -h / 2, z + run + wz / 2, h / 2),
                new FaceLine(z + run + wz / 2, h / 2, z + run - wz / 2, h / 2),
                new FaceLine(z + run - wz / 2, h / 2, z - run - wz / 2, -h / 2),
            ], []));
            upper.Add(Wrap(s.Row.Slot, z + run, wz, depth, r));
            lower.Add(Wrap(s.Row.Slot, z - run, wz, depth, r));
        }
        return
        [
            new GuideFace("narrow", "slotted narrow face, X along the tube from datum A, Y from the narrow-face centreline (+ toward the upper broad wall)", len, -h / 2, h / 2, null, narrow),
            new GuideFace("upper-broad", "upper broad face, X along the tube from datum A, Y from the slotted narrow wall's outer face into the broad wall", len, 0, a + 2 * t, null, upper),
            new GuideFace("lower-broad", "lower broad face, X along the tube from datum A, Y from the slotted narrow wall's outer face into the broad wall", len, 0, a + 2 * t, null, lower),
        ];
    }

    /// <summary>The outline of a slot along X: overall length <paramref name="length"/>, width <paramref name="width"/>, corner radius <paramref name="radius"/> (0: square).</summary>
    private static FaceCut Rounded(int slot, double x0, double y0, double length, double width, double radius)
    {
        double hx = length / 2, hy = width / 2, r = Math.Min(radius, hy);
        if (r <= 0)
            return new FaceCut(slot, x0, y0,
            [
                new FaceLine(x0 - hx, y0 - hy, x0 + hx, y0 - hy), new FaceLine(x0 + hx, y0 - hy, x0 + hx, y0 + hy),
                new FaceLine(x0 + hx, y0 + hy, x0 - hx, y0 + hy), new FaceLine(x0 - hx, y0 + hy, x0 - hx, y0 - hy),
            ], []);
        double ix = hx - r, iy = hy - r;
        var lines = new List<FaceLine>
        {
            new(x0 - ix, y0 - hy, x0 + ix, y0 - hy),
            new(x0 + ix, y0 + hy, x0 - ix, y0 + hy),
        };
        var arcs = new List<FaceArc>();
        if (iy > 1e-12)
        {
            lines.Add(new FaceLine(x0 + hx, y0 - iy, x0 + hx, y0 + iy));
            lines.Add(new FaceLine(x0 - hx, y0 + iy, x0 - hx, y0 - iy));
            arcs.Add(new FaceArc(x0 + ix, y0 - iy, r, 270, 0));
            arcs.Add(new FaceArc(x0 + ix, y0 + iy, r, 0, 90));
            arcs.Add(new FaceArc(x0 - ix, y0 + iy, r, 90, 180));
            arcs.Add(new FaceArc(x0 - ix, y0 - iy, r, 180, 270));
        }
        else
        {
            arcs.Add(new FaceArc(x0 + ix, y0, r, 270, 90));
            arcs.Add(new FaceArc(x0 - ix, y0, r, 90, 270));
        }
        return new FaceCut(slot, x0, y0, lines, arcs);
    }

    /// <summary>An edge slot's cut into a broad wall: open at the fold (Y = 0), <paramref name="depth"/> deep, its bottom corners rounded by the cutter.</summary>
    private static FaceCut Wrap(int slot, double x0, double width, double depth, double radius)
    {
        double hx = width / 2, r = Math.Min(radius, Math.Min(hx, depth));
        var lines = new List<FaceLine> { new(x0 + hx, 0, x0 - hx, 0) };
        var arcs = new List<FaceArc>();
        if (r <= 0)
        {
            lines.Add(new FaceLine(x0 - hx, 0, x0 - hx, depth));
            lines.Add(new FaceLine(x0 - hx, depth, x0 + hx, depth));
            lines.Add(new FaceLine(x0 + hx, depth, x0 + hx, 0));
        }
        else
        {
            lines.Add(new FaceLine(x0 - hx, 0, x0 - hx, depth - r));
            if (hx - r > 1e-12) lines.Add(new FaceLine(x0 - hx + r, depth, x0 + hx - r, depth));
            lines.Add(new FaceLine(x0 + hx, depth - r, x0 + hx, 0));
            arcs.Add(new FaceArc(x0 - hx + r, depth - r, r, 90, 180));
            arcs.Add(new FaceArc(x0 + hx - r, depth - r, r, 0, 90));
        }
        return new FaceCut(slot, x0, depth / 2, lines, arcs);
    }

    /// <summary>Rotates a cut about the origin by <paramref name="angle"/> (counter-clockwise) and moves it to (<paramref name="dx"/>, <paramref name="dy"/>).</summary>
    private static FaceCut Rotate(FaceCut c, double angle, double dx, double dy)
    {
        double cs = Math.Cos(angle), sn = Math.Sin(angle), deg = angle * 180 / Math.PI;
        (double, double) P(double x, double y) => (x * cs - y * sn + dx, x * sn + y * cs + dy);
        double Norm(double d) => ((d % 360) + 360) % 360;
        var lines = c.Lines.Select(l => { var (x1, y1) = P(l.X1, l.Y1); var (x2, y2) = P(l.X2, l.Y2); return new FaceLine(x1, y1, x2, y2); }).ToList();
        var arcs = c.Arcs.Select(a => { var (x, y) = P(a.CentreX, a.CentreY); return new FaceArc(x, y, a.Radius, Norm(a.StartDeg + deg), Norm(a.EndDeg + deg)); }).ToList();
        var (cx, cy) = P(c.CentreX, c.CentreY);
        return new FaceCut(c.Slot, cx, cy, lines, arcs);
    }
}
