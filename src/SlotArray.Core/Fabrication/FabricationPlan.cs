using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Fabrication;

/// <summary>A feature of the tube other than a slot (its end faces, end shorts, flanges, feed junction), placed from datum A.</summary>
/// <param name="Key">Stable key for revision comparison, e.g. "end-short", "feed-flange".</param>
/// <param name="Name">What the machinist reads, e.g. "end short, inner face".</param>
/// <param name="Position">Distance from datum A along the tube.</param>
/// <param name="Tolerance">± on <paramref name="Position"/> and its source.</param>
public sealed record TubeFeature(string Key, string Name, Length Position, StatedTolerance Tolerance);

/// <summary>One slot as the shop cuts it: the cut-list row re-based to datum A, with each dimension's own tolerance.</summary>
/// <param name="Row">The slot's geometry (position from the design's z origin; see <see cref="Position"/> for datum A).</param>
/// <param name="Position">Slot centre from datum A (the tube's machined end face).</param>
/// <param name="PositionTolerance">± on the position.</param>
/// <param name="OffsetTolerance">± on the offset (broad-wall slots), else null.</param>
/// <param name="TiltTolerance">± on the tilt in radians (edge slots), else null.</param>
/// <param name="CutDepthTolerance">± on the depth of cut into each broad wall (edge slots), else null.</param>
/// <param name="LengthTolerance">± on the length.</param>
/// <param name="WidthTolerance">± on the width.</param>
public sealed record SlotCut(CutListRow Row, Length Position, StatedTolerance PositionTolerance, StatedTolerance? OffsetTolerance,
    StatedTolerance? TiltTolerance, StatedTolerance? CutDepthTolerance, StatedTolerance LengthTolerance, StatedTolerance WidthTolerance)
{
    /// <summary>Stable key for revision comparison: "slot-N".</summary>
    public string Key => "slot-" + Row.Slot.ToString(System.Globalization.CultureInfo.InvariantCulture);
}

/// <summary>
/// What the shop needs to make the slotted tube, positions from a datum that can be probed: datum A is the tube's
/// machined end face at the near end (the end short or the load end); the end short's inner face, every slot, the
/// feed junction, the flanges and the far end are dimensioned from it (baseline dimensioning from one datum, after the
/// principle of ASME Y14.5-2018, so that errors do not accumulate). Also the overall tube length, each dimension's
/// own tolerance with its source, the reference temperature and the tube's length change per kelvin.
/// </summary>
/// <remarks>
/// Layout [common practice, no source]: a standing-wave array's end short is a plate as thick as the wall fitted flush
/// into the bore at the machined end face, so its inner face (the design's z = 0) lies one plate thickness from datum
/// A. A travelling-wave array's tube is brazed flush into its load-end flange, whose face is datum A and the design's
/// z = 0. An end-fed array's feed flange face (the far tube end) lies a whole number n ≥ 1 of half guide wavelengths
/// beyond the feed reference plane, the smallest that leaves <see cref="FlangeClearance"/> between the last slot's end
/// and the flange: a lossless line nλg/2 long repeats its input impedance at the design frequency (D. M. Pozar,
/// <i>Microwave Engineering</i>, 4th ed., 2012, Sec. 2.3, "half-wave line", from memory), so S11 at the flange equals
/// S11 at the feed plane there. A centre-fed array ends in a second plate beyond its far short.
/// </remarks>
/// <param name="Guide">The guide's inside dimensions and wall.</param>
/// <param name="Datum">Datum A in words.</param>
/// <param name="DesignOrigin">Distance from datum A to the design's z = 0 (the near termination's plane): slot z from A = z + this.</param>
/// <param name="EndPlateThickness">Thickness of each end-short plate (zero for a flanged load end).</param>
/// <param name="TubeLength">Overall tube length, datum A to the far end face.</param>
/// <param name="TubeLengthTolerance">± on the tube length and its source.</param>
/// <param name="Features">The non-slot features, ordered by position.</param>
/// <param name="Slots">The slots, by slot number.</param>
/// <param name="Tolerances">The slot tolerances and their sources.</param>
/// <param name="Thermal">The wall metal's expansion coefficient, or null when the metal is not known.</param>
/// <param name="Notes">Notes for the cut list and the drawing (length rule, square ends, edge-slot geometry).</param>
public sealed record FabricationPlan(CutListGuide Guide, string Datum, Length DesignOrigin, Length EndPlateThickness, Length TubeLength,
    StatedTolerance TubeLengthTolerance, IReadOnlyList<TubeFeature> Features, IReadOnlyList<SlotCut> Slots,
    FeatureTolerances Tolerances, ThermalExpansion? Thermal, IReadOnlyList<DesignWarning> Notes)
{
    /// <summary>Smallest clear length between the last slot's end and the feed flange face, 10 mm (common practice, no source).</summary>
    public static Length FlangeClearance { get; } = Length.FromMillimeters(10);

    /// <summary>Keys (<see cref="TubeFeature.Key"/>, <see cref="SlotCut.Key"/>, "tube-length") of what changed since the previous revision; empty for a first issue.</summary>
    public IReadOnlySet<string> Changed { get; init; } = new HashSet<string>(StringComparer.Ordinal);

    /// <summary>The tube's length change per kelvin at the reference temperature, or null when the metal is not known.</summary>
    public Length? ChangePerKelvin => Thermal?.ChangePerKelvin(TubeLength);

    /// <summary>Builds the plan of a designed array.</summary>
    /// <param name="design">The designed array.</param>
    /// <param name="feed">Standing-wave (datum: the end short) or travelling-wave (datum: the load-end flange).</param>
    /// <param name="cutter">End-mill diameter for round-ended slots, or null for square ends.</param>
    /// <param name="tolerance">The spec's tolerance block, or null for the defaults.</param>
    /// <exception cref="InfeasibleDesignException">A slot does not fit the broad wall, or its cutter is wider than the slot.</exception>
    internal static FabricationPlan Build(ArrayDesign design, FeedType feed, Length? cutter, ToleranceRequest? tolerance)
    {
        ArgumentNullException.ThrowIfNull(design);
        var tol = FeatureTolerances.From(tolerance);
        var cut = CutListOf(design, feed, cutter, Length.FromMeters(tol.Position.Value));
        var far = design.FarTermination is { } f ? design.Slots[^1].Position + f.Distance : (Length?)null;
        return Layout(cut, tol, design.NearTermination.Kind != TerminationKind.Short, design.FeedPlane, far, design.GuideWavelength, design.Guide.MetalName);
    }

    /// <summary>Lays a cut list out on the tube (see the remarks): datum A, end plates, flanges, feed junction, tube length.</summary>
    /// <param name="cut">The cut list, positions from the design's z = 0 (the near termination's plane).</param>
    /// <param name="tol">The tolerances.</param>
    /// <param name="flangedLoadEnd">True for a travelling-wave array (matched load behind a flange at z = 0); false for an end short at z = 0.</param>
    /// <param name="feedPlane">z of the feed reference plane (end feed) or of the series junction (centre feed).</param>
    /// <param name="farShort">Centre feed: z of the second end short's inner face; null for an end feed.</param>
    /// <param name="guideWavelength">λg at the design frequency.</param>
    /// <param name="metalName">The wall metal's name, for the expansion coefficient.</param>
    internal static FabricationPlan Layout(CutList cut, FeatureTolerances tol, bool flangedLoadEnd, Length feedPlane, Length? farShort,
        Length guideWavelength, string metalName)
    {
        ArgumentNullException.ThrowIfNull(cut);
        ArgumentNullException.ThrowIfNull(tol);
        if (cut.Rows.Count == 0) throw new ArgumentException("the cut list has no slots", nameof(cut));
        var g = cut.Guide;
        bool travelling = flangedLoadEnd;
        var plate = travelling ? Length.Zero : g.WallThickness;
        var origin = plate;
        var features = new List<TubeFeature>();
        string datum;
        if (travelling)
        {
            datum = "machined end face of the tube at the load end, flush with the load-end flange face (the matched load's plane)";
            features.Add(new TubeFeature("load-flange", "tube end face = load-end flange face (datum A, matched load)", Length.Zero, new StatedTolerance(0, "datum")));
        }
        else
        {
            datum = "machined end face of the tube at the end-short end; the end-short plate sits flush in the bore, its inner face one plate thickness in";
            features.Add(new TubeFeature("tube-end", "tube end face (datum A), outer face of the end-short plate", Length.Zero, new StatedTolerance(0, "datum")));
            features.Add(new TubeFeature("end-short", $"end short, inner face (plate {Mm(plate)} mm thick)", origin, tol.Position));
        }

        Length tubeLength;
        if (farShort is { } farZ)
        {
            var junction = origin + feedPlane;
            var second = origin + farZ;
            features.Add(new TubeFeature("feed-junction", "feed junction (series T at the centre, feed guide axis)", junction, tol.Position));
            features.Add(new TubeFeature("second-short", "second end short, inner face", second, tol.Position));
            tubeLength = second + plate;
            features.Add(new TubeFeature("far-tube-end", "far tube end face, outer face of the second end-short plate", tubeLength, General(tubeLength)));
        }
        else
        {
            var last = cut.Rows[^1];
            var lastEnd = origin + last.Position + 0.5 * last.OverallLength;
            var feed = origin + feedPlane;
            double half = guideWavelength.Meters / 2;
            int n = Math.Max(1, (int)Math.Ceiling(((lastEnd + FlangeClearance) - feed).Meters / half - 1e-9));
            tubeLength = feed + Length.FromMeters(n * half);
            features.Add(new TubeFeature("feed-flange",
                $"feed flange face = far tube end ({n.ToString(System.Globalization.CultureInfo.InvariantCulture)} x half guide wavelength beyond the feed plane)", tubeLength, General(tubeLength)));
        }

        var slots = cut.Rows.Select(r => new SlotCut(r, origin + r.Position, tol.Position,
            r.Offset is null ? null : tol.Offset,
            r.Tilt is null ? null : tol.TiltFor(r.EquivalentLength),
            r.Tilt is null ? null : tol.CutDepth,
            tol.Length, tol.Width)).ToList();
        var notes = cut.Notes.Where(n => n.Code != "cutlist-datum").ToList();
        return new FabricationPlan(cut.Guide, datum, origin, plate, tubeLength, General(tubeLength),
            [.. features.OrderBy(f => f.Position.Meters)], slots, tol, ThermalExpansion.For(metalName), notes);
    }

    /// <summary>
    /// This plan with <see cref="Changed"/> set to what differs from <paramref name="previous"/>: a feature, slot or
    /// the tube length whose nominal dimensions or tolerances moved by more than 0.5 µm (or 0.0005° for a tilt), or
    /// that the previous revision did not have.
    /// </summary>
    /// <param name="previous">The previous revision's plan.</param>
    public FabricationPlan WithChangesFrom(FabricationPlan previous)
    {
        ArgumentNullException.ThrowIfNull(previous);
        var changed = new HashSet<string>(StringComparer.Ordinal);
        if (Differs(TubeLength, previous.TubeLength) || Differs(TubeLengthTolerance.Value, previous.TubeLengthTolerance.Value)) changed.Add("tube-length");
        foreach (var f in Features)
        {
            var p = previous.Features.FirstOrDefault(x => x.Key == f.Key);
            if (p is null || Differs(f.Position, p.Position) || Differs(f.Tolerance.Value, p.Tolerance.Value)) changed.Add(f.Key);
        }
        foreach (var s in Slots)
        {
            var p = previous.Slots.FirstOrDefault(x => x.Key == s.Key);
            if (p is null || SlotDiffers(s, p)) changed.Add(s.Key);
        }
        return this with { Changed = changed };
    }

    private static bool SlotDiffers(SlotCut a, SlotCut b)
    {
        var r = a.Row;
        var q = b.Row;
        return Differs(a.Position, b.Position) || Differs(r.Offset, q.Offset) || Differs(r.DepthOfCut, q.DepthOfCut)
            || Differs(r.OverallLength, q.OverallLength) || Differs(r.Width, q.Width)
            || (r.Tilt is null) != (q.Tilt is null) || (r.Tilt is { } t && Math.Abs(t.Degrees - q.Tilt!.Value.Degrees) > 5e-4)
            || r.End != q.End
            || Differs(a.PositionTolerance.Value, b.PositionTolerance.Value) || Differs(a.LengthTolerance.Value, b.LengthTolerance.Value)
            || Differs(a.WidthTolerance.Value, b.WidthTolerance.Value) || Differs(a.OffsetTolerance?.Value, b.OffsetTolerance?.Value)
            || Differs(a.CutDepthTolerance?.Value, b.CutDepthTolerance?.Value);
    }

    private static bool Differs(Length? a, Length? b) => Differs(a?.Meters, b?.Meters);

    private static bool Differs(double? a, double? b) => (a is null) != (b is null) || (a is { } x && Math.Abs(x - b!.Value) > 0.5e-6);

    /// <summary>ISO 2768-1 class f for the nominal size (tube length and flange positions).</summary>
    private static StatedTolerance General(Length nominal) =>
        GeneralTolerances.For(Iso2768Class.Fine, nominal) is { } t
            ? new StatedTolerance(t.Meters, "ISO 2768-1:1989 class f, Table 1, for this nominal size (from memory)")
            : new StatedTolerance(1e-3, "beyond ISO 2768-1 class f's table: ±1 mm, agree it with the shop (common practice, no source)");

    private static CutList CutListOf(ArrayDesign design, FeedType feed, Length? cutter, Length tolerance)
    {
        var g = design.Guide;
        bool tilt = design.CouplingKind == Core.Slots.SlotCouplingKind.Tilt;
        var inputs = design.Slots.Select(s => new SlotCutInput(s.Index, s.Position,
            tilt ? null : Length.FromMeters(s.Coupling), tilt ? Angle.FromRadians(s.Coupling) : null,
            s.Length, s.Width, cutter, tolerance)).ToList();
        var datums = feed == FeedType.TravellingWave
            ? Datums.Default with { Longitudinal = LongitudinalDatumKind.LoadFlangeInnerFace }
            : Datums.Default;
        return CutList.Build(new CutListGuide(g.BroadWall, g.NarrowWall, g.WallThickness), inputs, datums);
    }

    private static string Mm(Length l) => l.Millimeters.ToString("0.000", System.Globalization.CultureInfo.InvariantCulture);
}
