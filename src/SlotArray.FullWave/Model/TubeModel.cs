using SlotArray.Core.Quantities;
using SlotArray.FullWave.Slots;

namespace SlotArray.FullWave.Model;

/// <summary>A slot of a tube and where its centre is along the guide, mm.</summary>
/// <param name="Cut">The slot.</param>
/// <param name="CentreZMm">Its centre's z, mm.</param>
internal sealed record PlacedSlot(SlotCut Cut, double CentreZMm);

/// <summary>
/// What to build: a rectangular tube along z (inside a × b, wall t, PEC) in free space (or with a ground plane or a
/// flare at its +x narrow wall, <see cref="TubeLayout.Surround"/>), its slots, an optional end
/// short (metal filling the guide for z below <see cref="ShortZMm"/>) and TE10 ports. Port 1 is excited and
/// measured at <see cref="Port1ZMm"/>, looking toward +z when it is below the slots, −z when above. Port 2 (when
/// given) is passive and measured at <see cref="Port2ZMm"/>. Every guide end without a short runs into the PML
/// (a matched termination).
/// </summary>
/// <param name="Guide">Cross-section, mm.</param>
/// <param name="Slots">Slots with their centres.</param>
/// <param name="CutSlots">False builds the same mesh without cutting the slots (the calibration run).</param>
/// <param name="ShortZMm">Inner face of an end short at the low-z end, or null.</param>
/// <param name="Port1ZMm">Port 1 measurement plane, mm.</param>
/// <param name="Port2ZMm">Port 2 measurement plane, mm, or null for a one-port.</param>
/// <param name="CentreFrequencyHz">Pulse centre, Hz.</param>
/// <param name="HalfBandwidthHz">Pulse half-bandwidth (20 dB), Hz.</param>
/// <param name="Density">Mesh density.</param>
/// <param name="SlotVoltageProbes">Whether to probe every slot's voltage across its centre on the outer face.</param>
internal sealed record TubeLayout(GuideSection Guide, IReadOnlyList<PlacedSlot> Slots, bool CutSlots, double? ShortZMm, double Port1ZMm,
    double? Port2ZMm, double CentreFrequencyHz, double HalfBandwidthHz, MeshDensity Density, bool SlotVoltageProbes)
{
    /// <summary>What the slotted narrow wall (+x face) looks into; a bare tube unless set.</summary>
    public SlotSurround Surround { get; init; } = SlotSurround.Tube;

    /// <summary>Extra x mesh lines (position, cell size there), mm: the depths of a family of cuts, so that every run of the family (and its plain-tube calibration) shares one mesh.</summary>
    public IReadOnlyList<(double AtMm, double CellMm)> ExtraXAnchors { get; init; } = [];

    /// <summary>x edges closer than this share one mesh line, mm (default 0.001): an array of edge slots whose depths differ by hundredths of a millimetre would otherwise set a tiny time step.</summary>
    public double XMergeMm { get; init; } = 1e-3;
}

/// <summary>Builds the <see cref="FdtdModel"/> of a <see cref="TubeLayout"/>: geometry, graded mesh, ports and probes.</summary>
internal static class TubeModel
{
    /// <summary>PML thickness in cells (the engine's usual 8).</summary>
    public const int PmlCells = 8;

    private const int WallPriority = 1, SlotPriority = 2;

    /// <summary>Holes are drawn this much inside their edges (mm) so that the mesh lines on their edges stay metal: the engine gives a boundary edge to the higher-priority primitive, and the aperture's edge belongs to the wall.</summary>
    public const double EdgeInsetMm = 1e-4;

    /// <summary>The pulse for a band: centred on <paramref name="designHz"/>, wide enough for the band, its low edge at least 1.2 × the TE10 cutoff (slow group velocity near cutoff rings for a long time).</summary>
    public static (double CentreHz, double HalfBandwidthHz) Pulse(GuideSection g, double designHz, double lowHz, double highHz)
    {
        double cutoff = PhysicalConstants.SpeedOfLight / (2 * g.AMm * 1e-3);
        double half = Math.Max(Math.Max(designHz - lowHz, highHz - designHz) * 1.5, 0.15 * designHz);
        half = Math.Min(half, designHz - 1.2 * cutoff);
        if (half <= 0) throw new ArgumentOutOfRangeException(nameof(designHz), designHz, "the design frequency is too close to the TE10 cutoff for a pulsed run");
        return (designHz, half);
    }

    /// <summary>Builds the run.</summary>
    public static FdtdModel Build(TubeLayout l, string title)
    {
        var g = l.Guide;
        var s = MeshSettings.Of(l.Density);
        double fMax = l.CentreFrequencyHz + l.HalfBandwidthHz;
        double lambdaMinMm = PhysicalConstants.SpeedOfLight / fMax * 1e3;
        double hMax = lambdaMinMm / s.CellsPerWavelength;
        double hWall = g.WallMm / s.CellsThroughWall;
        double margin = PhysicalConstants.SpeedOfLight / l.CentreFrequencyHz * 1e3 / 4;
        double pml = PmlCells * hMax;
        double xo = g.AMm / 2 + g.WallMm, yo = g.BMm / 2 + g.WallMm;
        double portGap = hMax;

        var (xReach, yReach) = SurroundModel.Extent(l.Surround, yo, margin);
        var xs = new List<(double, double)> { (-xo - margin - pml, hMax), (xo + xReach + pml, hMax), (-xo, hWall), (-g.AMm / 2, hWall), (g.AMm / 2, hWall), (xo, hWall) };
        var ys = new List<(double, double)> { (-yReach - pml, hMax), (yReach + pml, hMax), (-yo, hWall), (-g.BMm / 2, hWall), (g.BMm / 2, hWall), (yo, hWall) };
        SurroundModel.AddAnchors(l.Surround, xo, yo, hMax, xs, ys);
        xs.AddRange(l.ExtraXAnchors);
        var zs = new List<(double, double)>();
        double zLo = l.Port1ZMm, zHi = l.Port1ZMm;
        foreach (var p in l.Slots)
        {
            var (zMin, zMax) = AddSlotAnchors(p, g, s, xs, ys, zs);
            zLo = Math.Min(zLo, zMin);
            zHi = Math.Max(zHi, zMax);
        }
        var ports = new List<WaveguidePortDefinition>();
        double slotsMid = l.Slots.Count > 0 ? l.Slots.Average(p => p.CentreZMm) : 0;
        ports.Add(Port(g, 1, l.Port1ZMm, l.Port1ZMm < slotsMid ? +1 : -1, portGap, excited: true));
        if (l.Port2ZMm is double z2) ports.Add(Port(g, 2, z2, z2 < slotsMid ? +1 : -1, portGap, excited: false));
        foreach (var p in ports)
        {
            zs.Add((p.ExciteZMm, hMax));
            zs.Add((p.MeasureZMm, hMax));
            zLo = Math.Min(zLo, Math.Min(p.ExciteZMm, p.MeasureZMm));
            zHi = Math.Max(zHi, Math.Max(p.ExciteZMm, p.MeasureZMm));
        }
        double zStart, zEnd = zHi + margin + pml;
        if (l.ShortZMm is double zs0)
        {
            zs.Add((zs0, hWall));
            zLo = Math.Min(zLo, zs0);
            zStart = zs0 - g.WallMm - margin - pml;
            zs.Add((zs0 - g.WallMm, hWall));
        }
        else zStart = zLo - margin - pml;
        zs.Add((zStart, hMax));
        zs.Add((zEnd, hMax));
        // Every edge keeps its own line, so each aperture is exactly where the cut list puts it (near-coincident edges of
        // neighbouring slots then cost small cells and a short time step).
        var mesh = new MeshLines(MeshBuilder.Lines(xs, hMax, mergeMm: l.XMergeMm), MeshBuilder.Lines(ys, hMax), MeshBuilder.Lines(zs, hMax));

        // The tube: four metal walls (a metal box owns its faces, so the inner faces at x = ±a/2, y = ±b/2 are PEC
        // exactly); free space (the background) inside and around; guide ends without a short run through the PML.
        var walls = new List<Primitive>
        {
            new BoxPrimitive(new Point3(-xo, -yo, zStart), new Point3(xo, -g.BMm / 2, zEnd), WallPriority),
            new BoxPrimitive(new Point3(-xo, g.BMm / 2, zStart), new Point3(xo, yo, zEnd), WallPriority),
            new BoxPrimitive(new Point3(-xo, -g.BMm / 2, zStart), new Point3(-g.AMm / 2, g.BMm / 2, zEnd), WallPriority),
            new BoxPrimitive(new Point3(g.AMm / 2, -g.BMm / 2, zStart), new Point3(xo, g.BMm / 2, zEnd), WallPriority),
        };
        if (l.ShortZMm is double zShort)
        {
            // The end plate is the wall's own thickness; the tube stops at its outer face.
            for (int i = 0; i < walls.Count; i++)
            {
                var b = (BoxPrimitive)walls[i];
                walls[i] = b with { P1 = b.P1 with { Z = zShort - g.WallMm } };
            }
            walls.Add(new BoxPrimitive(new Point3(-xo, -yo, zShort - g.WallMm), new Point3(xo, yo, zShort), WallPriority));
        }
        var solids = new List<Solid> { new("tube", FillKind.Metal, 1, 0, walls) };
        if (SurroundModel.Solid(l.Surround, xo, yo, xo + xReach + pml, yReach + pml, zStart, zEnd) is { } surround) solids.Add(surround);
        if (l.CutSlots && l.Slots.Count > 0) solids.Add(new Solid("slots", FillKind.Air, 1, 0, l.Slots.SelectMany(p => SlotPrimitives(p, g)).ToList()));

        var probes = new List<VoltageProbe>();
        if (l.SlotVoltageProbes)
        {
            int k = 0;
            foreach (var p in l.Slots)
            {
                k++;
                if (p.Cut is LongitudinalCut lc)
                    probes.Add(new VoltageProbe($"slot_v{k}", new Point3(lc.OffsetMm - lc.Width / 2, yo, p.CentreZMm), new Point3(lc.OffsetMm + lc.Width / 2, yo, p.CentreZMm)));
            }
        }
        int maxSteps = 200_000;
        return new FdtdModel(title, mesh, solids, ports, probes, l.CentreFrequencyHz, l.HalfBandwidthHz, maxSteps, s.EndCriterion, PmlCells);
    }

    private static WaveguidePortDefinition Port(GuideSection g, int number, double measureZ, int direction, double gap, bool excited) =>
        new(number, -g.AMm / 2, g.AMm / 2, -g.BMm / 2, g.BMm / 2, measureZ - direction * gap, measureZ, excited);

    /// <summary>Mesh anchors of one slot; returns the z extent it occupies.</summary>
    private static (double ZMin, double ZMax) AddSlotAnchors(PlacedSlot p, GuideSection g, MeshSettings s, List<(double, double)> xs,
        List<(double, double)> ys, List<(double, double)> zs)
    {
        double h = p.Cut.WidthMm / s.CellsAcrossSlot;
        switch (p.Cut)
        {
            case LongitudinalCut c:
            {
                xs.Add((c.OffsetMm - c.Width / 2, h));
                xs.Add((c.OffsetMm + c.Width / 2, h));
                double half = c.OverallLengthMm / 2;
                zs.Add((p.CentreZMm - half, h));
                zs.Add((p.CentreZMm + half, h));
                return (p.CentreZMm - half, p.CentreZMm + half);
            }
            case EdgeCut e:
            {
                // The tilted kerf cannot lie on a rectilinear grid: it is staircased on cells of at most w/(n + 1)
                // (n = cells across the slot) over the whole face it crosses (y through both walls, z over its run),
                // spread evenly between the walls' faces so that no sliver cell sets the time step; its depth D and an
                // end mill's half-round centre lie on x lines.
                double xo = g.AMm / 2 + g.WallMm, yo = g.BMm / 2 + g.WallMm;
                double hs = e.Width / (s.CellsAcrossSlot + 1);
                xs.Add((xo - e.CutDepthMm, hs));
                if (e.Form == EdgeCutterForm.EndMill) xs.Add((xo - e.CutDepthMm + e.Width / 2, hs));
                double th = e.TiltDeg * Math.PI / 180;
                double zExt = Math.Abs(yo * Math.Tan(th)) + e.Width / (2 * Math.Cos(th));
                foreach (var (from, to) in new[] { (-yo, -g.BMm / 2), (-g.BMm / 2, g.BMm / 2), (g.BMm / 2, yo) })
                    ys.AddRange(EvenLines(from, to, hs));
                zs.AddRange(EvenLines(p.CentreZMm - zExt, p.CentreZMm + zExt, hs));
                return (p.CentreZMm - zExt, p.CentreZMm + zExt);
            }
            default:
                throw new ArgumentOutOfRangeException(nameof(p), p.Cut.GetType().Name, "unknown slot kind");
        }
    }

    /// <summary>The air primitives that cut one slot through the wall (and, for an edge slot, its wraps into the broad walls).</summary>
    internal static IEnumerable<Primitive> SlotPrimitives(PlacedSlot p, GuideSection g)
    {
        double yIn = g.BMm / 2 - 0.01 * g.WallMm, yOut = g.BMm / 2 + g.WallMm * 1.01, e0 = EdgeInsetMm;
        switch (p.Cut)
        {
            case LongitudinalCut c:
            {
                double x0 = c.OffsetMm, z0 = p.CentreZMm, half = c.OverallLengthMm / 2 - e0, w = c.Width - 2 * e0;
                double r = c.CutterMm is double d ? d / 2 - e0 : 0;
                if (r <= 0)
                {
                    yield return new BoxPrimitive(new Point3(x0 - w / 2, yIn, z0 - half), new Point3(x0 + w / 2, yOut, z0 + half), SlotPriority);
                    yield break;
                }
                // Round corners of radius r: two crossing boxes and four cylinders through the wall.
                yield return new BoxPrimitive(new Point3(x0 - w / 2, yIn, z0 - half + r), new Point3(x0 + w / 2, yOut, z0 + half - r), SlotPriority);
                if (w / 2 - r > 1e-6)
                    yield return new BoxPrimitive(new Point3(x0 - w / 2 + r, yIn, z0 - half), new Point3(x0 + w / 2 - r, yOut, z0 + half), SlotPriority);
                foreach (double cx in new[] { x0 - w / 2 + r, x0 + w / 2 - r }.Distinct())
                    foreach (double cz in new[] { z0 - half + r, z0 + half - r })
                        yield return new CylinderPrimitive(new Point3(cx, yIn, cz), new Point3(cx, yOut, cz), r, SlotPriority);
                yield break;
            }
            case EdgeCut e:
            {
                double xo = g.AMm / 2 + g.WallMm, yo = g.BMm / 2 + g.WallMm;
                double th = e.TiltDeg * Math.PI / 180;
                double reach = (yo + g.WallMm) / Math.Cos(th);
                (double Y, double Z) along = (Math.Cos(th), Math.Sin(th)), across = (-Math.Sin(th), Math.Cos(th));
                var v = new List<(double, double)>();
                foreach (var (sa, sb) in new[] { (-1, -1), (1, -1), (1, 1), (-1, 1) })
                    v.Add((sa * reach * along.Y + sb * (e.Width / 2 - e0) * across.Y, p.CentreZMm + sa * reach * along.Z + sb * (e.Width / 2 - e0) * across.Z));
                // Flat bottom D in from the outer narrow-wall face; the kerf continues beyond the face into free space.
                if (e.Form == EdgeCutterForm.FlatSaw)
                {
                    yield return new ExtrudedPolygon(0, xo - e.CutDepthMm + e0, e.CutDepthMm + g.WallMm, v, SlotPriority);
                    yield break;
                }
                // End mill (axis along y through each broad wall): the straight kerf stops at the half-round's centre,
                // x = xo − D + w/2, and a cylinder of radius w/2 through each broad wall (at the kerf's z mid-wall) rounds it.
                double r = e.Width / 2 - e0, xc = xo - e.CutDepthMm + e.Width / 2;
                yield return new ExtrudedPolygon(0, xc, xo + g.WallMm - xc, v, SlotPriority);
                foreach (int side in new[] { -1, 1 })
                {
                    double zc = p.CentreZMm + side * (g.BMm / 2 + g.WallMm / 2) * Math.Tan(th);
                    yield return new CylinderPrimitive(new Point3(xc, side * yIn, zc), new Point3(xc, side * yOut, zc), r, SlotPriority);
                }
                yield break;
            }
        }
    }

    /// <summary>Anchors dividing [from, to] into equal cells of at most h (both ends included).</summary>
    private static IEnumerable<(double, double)> EvenLines(double from, double to, double h)
    {
        int n = Math.Max(1, (int)Math.Ceiling((to - from) / h - 1e-9));
        double step = (to - from) / n;
        return Enumerable.Range(0, n + 1).Select(i => (from + i * step, step));
    }
}
