namespace SlotArray.FullWave.Model;

/// <summary>What an edge slot radiates into.</summary>
internal enum SurroundKind
{
    /// <summary>A bare tube in free space (air all round the guide).</summary>
    Tube,

    /// <summary>The slotted narrow-wall face flush in a large metal plane (a thin sheet in the plane of the face, out to the absorbing layer).</summary>
    GroundPlane,

    /// <summary>Two plates from the narrow wall's outer edges diverging to an aperture (a sectoral flare along the whole guide).</summary>
    Flare,
}

/// <summary>
/// The surroundings of the slotted narrow wall (the +x face of the tube). A flare's plates start at the face's edges
/// (y = ±(b/2 + t), spacing b + 2t) and diverge linearly to <paramref name="FlareApertureMm"/> at
/// <paramref name="FlareLengthMm"/> from the face; they run along the whole guide (through the absorbing layer at the
/// ends, as along an array). A flare longer than <see cref="FlareReachMm"/> is drawn to that reach and its plates run
/// on into the absorbing layer at the same angle: the mouth's reflection is left out (a wedge), which costs little
/// for a flare several wavelengths long.
/// </summary>
/// <param name="Kind">Tube, ground plane or flare.</param>
/// <param name="FlareLengthMm">Flare: axial length from the face to the aperture, mm; else 0.</param>
/// <param name="FlareApertureMm">Flare: plate spacing at the aperture, mm (≥ b + 2t); else 0.</param>
internal sealed record SlotSurround(SurroundKind Kind, double FlareLengthMm, double FlareApertureMm)
{
    /// <summary>Plate thickness of a flare, mm (sheet metal; common practice, no source).</summary>
    public const double PlateMm = 1.0;

    /// <summary>Farthest a flare is drawn from the face, mm, before its plates run on into the absorbing layer.</summary>
    public const double FlareReachMm = 40;

    /// <summary>A bare tube.</summary>
    public static SlotSurround Tube { get; } = new(SurroundKind.Tube, 0, 0);

    /// <summary>A ground plane.</summary>
    public static SlotSurround GroundPlane { get; } = new(SurroundKind.GroundPlane, 0, 0);

    /// <summary>A flare of the given length and aperture, mm.</summary>
    public static SlotSurround Flare(double lengthMm, double apertureMm)
    {
        if (!(lengthMm > 0)) throw new ArgumentOutOfRangeException(nameof(lengthMm), lengthMm, "the flare length must be positive");
        return new SlotSurround(SurroundKind.Flare, lengthMm, apertureMm);
    }

    /// <summary>A short word for labels and provenance: tube, ground-plane, or flare-L&lt;length&gt;-A&lt;aperture&gt;.</summary>
    public string Label => Kind switch
    {
        SurroundKind.Tube => "tube",
        SurroundKind.GroundPlane => "ground-plane",
        _ => FormattableString.Invariant($"flare-L{FlareLengthMm:0.#}-A{FlareApertureMm:0.#}"),
    };

    /// <summary>Half-angle of a flare's plates from the guide's x axis, radians (atan of the spread per unit length).</summary>
    /// <param name="outerHeightMm">The face's height b + 2t, mm.</param>
    public double FlareHalfAngle(double outerHeightMm) => Math.Atan((FlareApertureMm - outerHeightMm) / 2 / FlareLengthMm);

    /// <summary>How far past the face (+x) the drawn geometry reaches, mm: the flare's drawn length, else 0.</summary>
    public double DrawnReachMm => Kind == SurroundKind.Flare ? Math.Min(FlareLengthMm, FlareReachMm) : 0;

    /// <summary>Whether the flare's plates run on into the absorbing layer (longer than <see cref="FlareReachMm"/>).</summary>
    public bool PlatesRunIntoAbsorber => Kind == SurroundKind.Flare && FlareLengthMm > FlareReachMm;
}
