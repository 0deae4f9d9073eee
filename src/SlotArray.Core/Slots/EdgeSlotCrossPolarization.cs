using SlotArray.Core.Quantities;

namespace SlotArray.Core.Slots;

/// <summary>
/// Cross-polarised lobes of an array of edge slots with alternating tilts ±θ (derived here [D]).
/// </summary>
/// <remarks>
/// The cross-polarised field components of alternately tilted slots alternate in sign along the array, so they
/// add in phase in the directions sin ψ = ±λ/(2d) from broadside (d = slot spacing), with a peak level of tan θ
/// relative to the co-polar main beam before element-pattern and taper weighting. For d = λg/2 this is
/// sin ψ = λ/λg (WR-90 at 9.375 GHz: ψ = ±45.6°); θ = 15° gives −11.4 dB. Derivation: array factor of
/// alternating-sign sources (Balanis 2005, Sec. 6.3); the co-polar field of a tilted slot goes as cos θ and the
/// cross-polar as sin θ.
/// </remarks>
internal static class EdgeSlotCrossPolarization
{
    /// <summary>
    /// Direction ψ (from broadside, positive root; the lobe pair sits at ±ψ) of the cross-polarised lobes:
    /// sin ψ = λ/(2d). Null when λ/(2d) &gt; 1 (no cross-polarised lobe in real space).
    /// </summary>
    /// <param name="spacing">Slot spacing d; &gt; 0.</param>
    /// <param name="f">Frequency (free-space wavelength λ = c/f).</param>
    public static Angle? LobeDirection(Length spacing, Frequency f)
    {
        if (!(spacing.Meters > 0) || !double.IsFinite(spacing.Meters))
            throw new ArgumentOutOfRangeException(nameof(spacing), spacing.ToString(), "the slot spacing must be a positive length");
        double s = f.FreeSpaceWavelength.Meters / (2 * spacing.Meters);
        return s > 1 ? null : Angle.FromRadians(Math.Asin(s));
    }

    /// <summary>
    /// Peak level of the cross-polarised lobes relative to the co-polar main beam, 20 log10|tan θ| dB, before
    /// element-pattern and taper weighting. For a tapered array the same array-factor sum gives the amplitude-weighted
    /// mean Σ aₙ tan|θₙ| / Σ aₙ in place of tan θ (derived here, not from a source).
    /// </summary>
    /// <param name="tilt">Slot tilt θ; 0 &lt; |θ| &lt; 90°.</param>
    public static double LobeLevelDecibels(Angle tilt)
    {
        double t = Math.Abs(Math.Tan(tilt.Radians));
        if (!(t > 0) || !double.IsFinite(t))
            throw new ArgumentOutOfRangeException(nameof(tilt), tilt.ToString(), "the tilt must lie strictly between 0° and 90° in magnitude");
        return 20 * Math.Log10(t);
    }
}
