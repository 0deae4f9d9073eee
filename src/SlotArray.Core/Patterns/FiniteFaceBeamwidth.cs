using SlotArray.Core.Quantities;

namespace SlotArray.Core.Patterns;

/// <summary>
/// The transverse-plane (E-plane) beamwidth of slots cut in one face of a tube, as far as the face's width w bounds it:
/// the plane perpendicular to the guide axis, in which a slot on an infinite ground plane radiates uniformly over the
/// half-space (its E-plane), so that the beam in this plane is set by the finite face alone.
/// </summary>
/// <remarks>
/// <para>Model (a lower bound): the currents the slot drives on the face cover at most its width w. Among aperture
/// distributions of width w without superdirective (rapidly alternating) currents, the uniform one has the narrowest
/// beam: E(u) ∝ sin(πwu/λ)/(πwu/λ), u = sin θ, half power at πwu/λ = x₁/₂ = 1.39156 (sin x/x = 1/√2), so
/// HPBW ≥ 2 asin(x₁/₂ λ/(π w)) = 2 asin(0.44295 λ/w), about 50.8 λ/w degrees for w ≫ λ (C. A. Balanis, <i>Antenna
/// Theory</i>, 3rd ed., Wiley 2005, Table 12.1, uniform aperture on a ground plane, E-plane HPBW ≈ 50.6°/(w/λ) for
/// w ≫ λ, from memory; x₁/₂ is the root of sin x/x = 1/√2, recomputed in the tests).</para>
/// <para>Limit: the true pattern is broader. The face is not uniformly lit: the slot's field reaches the edges at
/// grazing incidence and they diffract (geometrical theory of diffraction for a slot in a finite ground plane: Balanis
/// 2005, Sec. 12.10, from memory), which broadens the beam, ripples it and radiates behind the tube. When
/// 0.44295 λ/w ≥ 1 (a face narrower than 0.443 λ) even uniform illumination cannot hold the half-power points inside the front half-space:
/// the pattern fills it and wraps behind the tube, the omnidirectional behaviour of a slotted narrow tube, and no
/// beamwidth is given (<see cref="LowerBound"/> returns null). Use a full-wave model or a measurement for the figure itself.</para>
/// </remarks>
internal static class FiniteFaceBeamwidth
{
    /// <summary>x₁/₂ with sin x / x = 1/√2: the half-power argument of the uniform line source.</summary>
    public const double HalfPowerArgument = 1.3915573782515103;

    /// <summary>
    /// The lower bound 2 asin(x₁/₂ λ/(π w)) on the transverse-plane half-power beamwidth of slots in a face of width
    /// <paramref name="faceWidth"/> at <paramref name="frequency"/>; null when the face is too narrow to form a beam (see remarks).
    /// </summary>
    /// <param name="faceWidth">Outside width w of the slotted face, &gt; 0.</param>
    /// <param name="frequency">The frequency, &gt; 0.</param>
    public static Angle? LowerBound(Length faceWidth, Frequency frequency)
    {
        if (!(faceWidth.Meters > 0)) throw new ArgumentOutOfRangeException(nameof(faceWidth), faceWidth.ToString(), "the face width must be positive");
        if (!(frequency.Hertz > 0)) throw new ArgumentOutOfRangeException(nameof(frequency), frequency.ToString(), "the frequency must be positive");
        double s = HalfPowerArgument * frequency.FreeSpaceWavelength.Meters / (Math.PI * faceWidth.Meters);
        return s >= 1 ? null : Angle.FromRadians(2 * Math.Asin(s));
    }

    /// <summary>The outside width of the face the slots are cut in: the broad face a + 2t for broad-wall slots, the narrow face b + 2t for edge slots.</summary>
    /// <param name="guide">The guide.</param>
    /// <param name="edgeSlots">Edge (narrow-wall) slots rather than broad-wall slots.</param>
    public static Length SlottedFaceWidth(Waveguides.RectangularWaveguide guide, bool edgeSlots)
    {
        ArgumentNullException.ThrowIfNull(guide);
        return (edgeSlots ? guide.NarrowWall : guide.BroadWall) + 2 * guide.WallThickness;
    }
}
