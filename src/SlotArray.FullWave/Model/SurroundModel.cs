namespace SlotArray.FullWave.Model;

/// <summary>
/// The geometry of a <see cref="SlotSurround"/> at the tube's +x narrow wall (outer face x = x_o, its edges at
/// y = ±y_o): how far the drawing reaches, the mesh anchors it needs and its metal.
/// </summary>
internal static class SurroundModel
{
    private const int SurroundPriority = 1;

    /// <summary>
    /// Air to draw past the face (+x) and out to ±y before the absorbing layer, mm: a quarter wavelength
    /// (<paramref name="marginMm"/>) all round a bare tube or a ground plane; a flare's drawn reach, plus the margin
    /// beyond its mouth when the mouth is drawn, and its plates' outer faces plus the margin in y.
    /// </summary>
    public static (double XReachMm, double YReachMm) Extent(SlotSurround s, double yo, double marginMm)
    {
        if (s.Kind != SurroundKind.Flare) return (marginMm, yo + marginMm);
        double reach = s.DrawnReachMm;
        double yPlate = yo + reach * Math.Tan(s.FlareHalfAngle(2 * yo)) + SlotSurround.PlateMm;
        return (s.PlatesRunIntoAbsorber ? reach : reach + marginMm, yPlate + marginMm);
    }

    /// <summary>Mesh anchors of the surroundings: the ground plane's plane, a flare's mouth and its plates' ends.</summary>
    public static void AddAnchors(SlotSurround s, double xo, double yo, double hMax, List<(double, double)> xs, List<(double, double)> ys)
    {
        if (s.Kind != SurroundKind.Flare || s.PlatesRunIntoAbsorber) return;
        double yMouth = yo + s.FlareLengthMm * Math.Tan(s.FlareHalfAngle(2 * yo));
        xs.Add((xo + s.FlareLengthMm, hMax));
        ys.Add((-yMouth, hMax));
        ys.Add((yMouth, hMax));
    }

    /// <summary>
    /// The surroundings' metal, or null for a bare tube. Ground plane: a sheet in the face's plane x = x_o for |y| ≥ y_o
    /// out through the absorbing layer (the wraps' openings on the outer broad-wall faces open behind it). Flare: two
    /// plates <see cref="SlotSurround.PlateMm"/> thick, their inner faces from (x_o, ±y_o) to the mouth (or on into the
    /// absorbing layer), along the whole guide.
    /// </summary>
    public static Solid? Solid(SlotSurround s, double xo, double yo, double xEnd, double yEnd, double zStart, double zEnd)
    {
        switch (s.Kind)
        {
            case SurroundKind.GroundPlane:
                return new Solid("ground-plane", FillKind.Metal, 1, 0,
                [
                    new BoxPrimitive(new Point3(xo, yo, zStart), new Point3(xo, yEnd, zEnd), SurroundPriority),
                    new BoxPrimitive(new Point3(xo, -yEnd, zStart), new Point3(xo, -yo, zEnd), SurroundPriority),
                ]);
            case SurroundKind.Flare:
            {
                double tan = Math.Tan(s.FlareHalfAngle(2 * yo)), tp = SlotSurround.PlateMm;
                double x1 = s.PlatesRunIntoAbsorber ? xEnd : xo + s.FlareLengthMm, y1 = yo + (x1 - xo) * tan;
                var plates = new List<Primitive>();
                foreach (int side in new[] { 1, -1 })
                {
                    // Polygon in the (x, y) plane, extruded along z; the plate's inner face is the flare's wall.
                    var v = new List<(double, double)> { (xo, side * yo), (x1, side * y1), (x1, side * (y1 + tp)), (xo, side * (yo + tp)) };
                    if (side < 0) v.Reverse();
                    plates.Add(new ExtrudedPolygon(2, zStart, zEnd - zStart, v, SurroundPriority));
                }
                return new Solid("flare", FillKind.Metal, 1, 0, plates);
            }
            default:
                return null;
        }
    }
}
