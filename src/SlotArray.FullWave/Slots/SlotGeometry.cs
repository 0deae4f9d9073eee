namespace SlotArray.FullWave.Slots;

/// <summary>The guide's cross-section, mm: inside a × b and the wall thickness t (the same on all four walls).</summary>
/// <param name="AMm">Inside broad dimension a, mm.</param>
/// <param name="BMm">Inside narrow dimension b, mm.</param>
/// <param name="WallMm">Wall thickness t, mm.</param>
internal sealed record GuideSection(double AMm, double BMm, double WallMm);

/// <summary>A slot cut in the guide, centred at z = 0.</summary>
internal abstract record SlotCut
{
    /// <summary>Slot width, mm.</summary>
    public abstract double WidthMm { get; }
}

/// <summary>
/// A longitudinal slot in the +y broad wall, its centre line at x = <paramref name="OffsetMm"/>, overall length
/// <paramref name="OverallLengthMm"/> tip to tip; ends square, or rounded by a cutter of diameter
/// <paramref name="CutterMm"/> (≤ width: corner radius = cutter/2).
/// </summary>
/// <param name="OffsetMm">Offset of the slot centre from the broad-wall centre line, mm (signed, +x).</param>
/// <param name="OverallLengthMm">Tip-to-tip length, mm.</param>
/// <param name="Width">Slot width, mm.</param>
/// <param name="CutterMm">End-mill diameter, mm, or null for square ends.</param>
internal sealed record LongitudinalCut(double OffsetMm, double OverallLengthMm, double Width, double? CutterMm) : SlotCut
{
    /// <inheritdoc/>
    public override double WidthMm => Width;
}

/// <summary>How an edge slot's wraps into the broad walls end.</summary>
internal enum EdgeCutterForm
{
    /// <summary>A slitting saw (kerf = slot width) plunged square to the narrow wall: the wraps end in a flat bottom at depth D.</summary>
    FlatSaw,

    /// <summary>An end mill of diameter = slot width, its axis normal to the broad walls: each wrap ends in a half-round of radius w/2 whose deepest point is at D.</summary>
    EndMill,
}

/// <summary>
/// An inclined slot in the +x narrow wall: tilted by <paramref name="TiltDeg"/> from the perpendicular to the guide
/// axis, through the whole narrow wall and wrapping into both broad walls to <paramref name="CutDepthMm"/> in from the
/// outer narrow-wall face (so D − t beyond the inner face), kerf <paramref name="Width"/>; the wraps end as the
/// cutter leaves them (<paramref name="Form"/>).
/// </summary>
/// <param name="TiltDeg">Tilt from the perpendicular to the guide axis, degrees (signed).</param>
/// <param name="CutDepthMm">Depth D from the outer narrow-wall face, mm (&gt; t, or the cut does not open the guide).</param>
/// <param name="Width">Saw kerf or end-mill diameter, mm.</param>
/// <param name="Form">Flat-bottomed saw (default) or end mill.</param>
internal sealed record EdgeCut(double TiltDeg, double CutDepthMm, double Width, EdgeCutterForm Form = EdgeCutterForm.FlatSaw) : SlotCut
{
    /// <inheritdoc/>
    public override double WidthMm => Width;
}
