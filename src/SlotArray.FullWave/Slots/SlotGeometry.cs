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

/// <summary>
/// An inclined slot in the +x narrow wall, cut by a flat-bottomed saw of kerf <paramref name="Width"/>: tilted by
/// <paramref name="TiltDeg"/> from the perpendicular to the guide axis, its flat bottom
/// <paramref name="CutDepthMm"/> in from the outer narrow-wall face, so it wraps D − t into each broad wall.
/// </summary>
/// <param name="TiltDeg">Tilt from the perpendicular to the guide axis, degrees (signed).</param>
/// <param name="CutDepthMm">Depth D from the outer narrow-wall face, mm (&gt; t, or the cut does not open the guide).</param>
/// <param name="Width">Saw kerf, mm.</param>
internal sealed record EdgeCut(double TiltDeg, double CutDepthMm, double Width) : SlotCut
{
    /// <inheritdoc/>
    public override double WidthMm => Width;
}
