using SlotArray.Core.Quantities;

namespace SlotArray.Core.Fabrication;

/// <summary>The face every longitudinal slot position is dimensioned from (baseline dimensioning).</summary>
internal enum LongitudinalDatumKind
{
    /// <summary>The inner face of the end short-circuit plate (default; the λg/4 short distance is referenced to it).</summary>
    EndShortInnerFace,
    /// <summary>The face of the feed flange.</summary>
    FeedFlangeFace,
    /// <summary>The inner face of the load-end flange, where the matched load of a travelling-wave array sits.</summary>
    LoadFlangeInnerFace,
}

/// <summary>Which narrow (side) wall the transverse positions of broad-wall slots are measured from.</summary>
/// <remarks>Axes as in architecture.md: x runs across the broad wall from its centreline, positive toward the +x side wall.</remarks>
internal enum TransverseDatumSide
{
    /// <summary>The −x side wall (default): distance = t + a/2 + x, so +x slots read larger.</summary>
    MinusXWall,
    /// <summary>The +x side wall: distance = t + a/2 − x.</summary>
    PlusXWall,
}

/// <summary>
/// The drawing's datums and the dimensioning rules for slot positions.
/// </summary>
/// <remarks>
/// Principle [C: common practice, after ASME Y14.5 baseline dimensioning]: every slot centre is dimensioned from
/// one datum so that errors do not accumulate (baseline, not chain dimensioning); transverse positions of broad-wall
/// slots are given from the outside of a datum narrow wall as t + a/2 ± x; edge slots carry their centre along the
/// narrow wall, their signed tilt and the depth of cut into each broad wall from the outer narrow-wall face.
/// </remarks>
/// <param name="Longitudinal">The longitudinal datum face.</param>
/// <param name="Transverse">The datum side wall for transverse positions.</param>
internal sealed record Datums(LongitudinalDatumKind Longitudinal, TransverseDatumSide Transverse)
{
    /// <summary>The default: inner face of the end short, and the −x side wall.</summary>
    public static Datums Default { get; } = new(LongitudinalDatumKind.EndShortInnerFace, TransverseDatumSide.MinusXWall);

    /// <summary>One sentence naming the datums, for the cut-list header and the drawing.</summary>
    public string Description =>
        (Longitudinal switch
        {
            LongitudinalDatumKind.EndShortInnerFace => "inner face of the end short",
            LongitudinalDatumKind.LoadFlangeInnerFace => "inner face of the load-end flange (matched load)",
            _ => "feed flange face",
        })
        + ": every slot centre position by baseline dimensioning from this one face; transverse positions from the outside of the "
        + (Transverse == TransverseDatumSide.MinusXWall ? "-x" : "+x") + " side wall (x positive toward the +x side wall)";

    /// <summary>
    /// Re-references a position given from one datum to another datum on the same guide axis, measuring away from the
    /// new datum: |z_newDatum − z| (both measured from the old datum along the same direction).
    /// </summary>
    /// <param name="positionFromOldDatum">Slot centre from the old datum, ≥ 0.</param>
    /// <param name="newDatumFromOldDatum">The new datum face, measured from the old datum in the same direction, ≥ 0.</param>
    public static Length Rebase(Length positionFromOldDatum, Length newDatumFromOldDatum)
        => Length.FromMeters(Math.Abs(newDatumFromOldDatum.Meters - positionFromOldDatum.Meters));

    /// <summary>
    /// Transverse position of a broad-wall longitudinal slot's centre from the OUTSIDE of the datum narrow wall:
    /// t + a/2 + x from the −x wall, t + a/2 − x from the +x wall (baseline dimensioning from a side-wall datum [C]).
    /// </summary>
    /// <param name="sideWallThickness">Thickness t of the datum narrow wall, ≥ 0.</param>
    /// <param name="broadWall">Inside broad dimension a, &gt; 0.</param>
    /// <param name="offset">Signed offset x of the slot centre from the broad-wall centreline, |x| &lt; a/2.</param>
    /// <param name="side">The datum side wall.</param>
    public static Length TransversePosition(Length sideWallThickness, Length broadWall, Length offset, TransverseDatumSide side)
    {
        if (!(sideWallThickness.Meters >= 0)) throw new ArgumentOutOfRangeException(nameof(sideWallThickness), sideWallThickness.ToString(), "the wall thickness must be zero or positive");
        if (!(broadWall.Meters > 0)) throw new ArgumentOutOfRangeException(nameof(broadWall), broadWall.ToString(), "the broad wall must be a positive length");
        if (!(Math.Abs(offset.Meters) < broadWall.Meters / 2))
            throw new ArgumentOutOfRangeException(nameof(offset), offset.ToString(), $"the offset must lie inside the broad wall, |x| < a/2 = {0.5 * broadWall}");
        double sign = side == TransverseDatumSide.MinusXWall ? 1 : -1;
        return Length.FromMeters(sideWallThickness.Meters + broadWall.Meters / 2 + sign * offset.Meters);
    }

    /// <summary>
    /// Depth of cut of an edge slot into each broad wall, measured from the outer narrow-wall face:
    /// d = t + (L − b/cos θ)/2, or null when the slot fits inside the narrow wall (L ≤ b/cos θ) and does not wrap.
    /// </summary>
    /// <remarks>
    /// Geometry [D: this project] of a straight cut plunged square to the narrow wall: on the inner surfaces the cut
    /// crosses the narrow wall over b/cos θ and runs (D − t) into each broad wall, so its path length is
    /// b/cos θ + 2(D − t). Setting that path equal to the slot's equivalent length L is an approximation [C: common
    /// practice, no source]; production edge-slot arrays calibrate depth against measured or full-wave resonance
    /// (an edge slot wraps into both broad walls because b &lt; λ/2; see <c>EdgeSlotConductance</c>).
    /// </remarks>
    /// <param name="slotLength">Equivalent slot length L along the cut path, &gt; 0.</param>
    /// <param name="tilt">Tilt θ from the direction perpendicular to the guide axis, |θ| &lt; 90°.</param>
    /// <param name="narrowWall">Inside narrow dimension b, &gt; 0.</param>
    /// <param name="wallThickness">Narrow-wall thickness t, ≥ 0.</param>
    public static Length? EdgeSlotDepthOfCut(Length slotLength, Angle tilt, Length narrowWall, Length wallThickness)
    {
        if (!(slotLength.Meters > 0)) throw new ArgumentOutOfRangeException(nameof(slotLength), slotLength.ToString(), "the slot length must be positive");
        if (!(Math.Abs(tilt.Degrees) < 90)) throw new ArgumentOutOfRangeException(nameof(tilt), tilt.ToString(), "the tilt must lie between −90° and 90°");
        if (!(narrowWall.Meters > 0)) throw new ArgumentOutOfRangeException(nameof(narrowWall), narrowWall.ToString(), "the narrow wall must be a positive length");
        if (!(wallThickness.Meters >= 0)) throw new ArgumentOutOfRangeException(nameof(wallThickness), wallThickness.ToString(), "the wall thickness must be zero or positive");
        double across = narrowWall.Meters / Math.Cos(tilt.Radians);
        if (slotLength.Meters <= across) return null;
        return Length.FromMeters(wallThickness.Meters + (slotLength.Meters - across) / 2);
    }
}
