using MathNet.Numerics.RootFinding;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots;

/// <summary>
/// Inclined narrow-wall ("edge") slot: normalised resonant shunt conductance g = G/G0 as a function of the tilt θ
/// of the slot axis from the direction perpendicular to the guide axis (θ = 0: slot parallel to the narrow-wall
/// E-field, no coupling), and its inverse.
/// </summary>
/// <remarks>
/// Formula (form from memory [M], re-derived and checked numerically [D]):
/// g = (30/(π R_d)) (λ³ λg/(a³ b)) [sin θ cos((πλ/(2λg)) sin θ) / (1 − ((λ/λg) sin θ)²)]², R_d = 73 Ω.
/// The form follows the reciprocity analysis of A. F. Stevenson, "Theory of slots in rectangular wave-guides",
/// J. Appl. Phys. 19, 24–38 (1948); its attribution is usually to W. H. Watson (1946–47) [from memory, Medium
/// confidence], as tabulated in S. Silver, <i>Microwave Antenna Theory and Design</i>, MIT Rad. Lab. Ser. vol. 12,
/// 1949, pp. 291–295. Equation numbers were not re-checked against the texts.
/// <para>
/// Which factor: some tabulations print λ⁴/(a³ b λg) in place of λ³ λg/(a³ b). That variant is wrong: it has units
/// of 1/length, so it cannot be a normalised conductance; the dimensionless λ⁵/(a³ b λg) would give half the value
/// (factor (λ/λg)² = 0.511 in WR-90 at 9.375 GHz). The edge slot couples to the same H_z as the broad-wall
/// longitudinal slot (at the side wall cos(πx′/a) = 1), so its prefactor follows from Stevenson's 2.09 formula as
/// 2.09 (aλg/(bλ)) (λ/2a)⁴ = (2.09/16) λ³λg/(a³b); numerical integration of the coupling integral confirms it
/// to 1e-15 [D; N].
/// </para>
/// <para>
/// Validity: idealised slot, resonant at full length λ/2 with a cosine field, zero wall thickness, radiating into a
/// half-space over an infinite ground plane, TE10 only, isolated slot. A real edge slot must wrap into both broad
/// walls because b &lt; λ/2, the narrow wall is not an infinite ground plane and wall thickness matters: confidence
/// High for the form, Medium for absolute accuracy. Production designs should use measured or full-wave data.
/// </para>
/// </remarks>
internal static class EdgeSlotConductance
{
    /// <summary>
    /// Normalised resonant conductance g = G/G0 at tilt θ (formula in the remarks). Even in θ, g(0) = 0.
    /// </summary>
    /// <param name="guide">The guide (inside a, b).</param>
    /// <param name="tilt">Tilt of the slot from the perpendicular to the guide axis; |θ| &lt; 90°.</param>
    /// <param name="f">Frequency; above the TE10 cutoff.</param>
    public static double Conductance(RectangularWaveguide guide, Angle tilt, Frequency f)
    {
        ArgumentNullException.ThrowIfNull(guide);
        double th = tilt.Radians;
        if (!double.IsFinite(th) || Math.Abs(th) >= Math.PI / 2)
            throw new ArgumentOutOfRangeException(nameof(tilt), tilt.ToString(), $"the edge-slot tilt must lie strictly within ±90°, got {tilt}");
        double a = guide.BroadWall.Meters, b = guide.NarrowWall.Meters;
        double lam = guide.MediumVelocity / f.Hertz, lg = guide.GuideWavelength(f).Meters;
        double sn = Math.Sin(th), q = lam / lg * sn;
        double shape = sn * Math.Cos(Math.PI * q / 2) / (1 - q * q);
        return InclinedSeriesSlot.StevensonFactor * lam * lam * lam * lg / (a * a * a * b) * shape * shape;
    }

    /// <summary>
    /// Inverse of <see cref="Conductance"/>: the tilt 0 &lt; θ ≤ <paramref name="maximumTilt"/> giving the resonant
    /// conductance g (g rises monotonically with θ over the tilts in use; Brent's method to 1e-13 rad). Throws
    /// <see cref="InfeasibleDesignException"/>, stating the maximum, when g exceeds g(<paramref name="maximumTilt"/>).
    /// </summary>
    /// <param name="guide">The guide.</param>
    /// <param name="conductance">Target g = G/G0; g &gt; 0.</param>
    /// <param name="f">Frequency; above the TE10 cutoff.</param>
    /// <param name="maximumTilt">Largest tilt allowed; 0 &lt; θ_max ≤ 60° (the edge-slot model uses 30°).</param>
    public static Angle TiltForConductance(RectangularWaveguide guide, double conductance, Frequency f, Angle maximumTilt)
    {
        if (!double.IsFinite(conductance) || conductance <= 0)
            throw new ArgumentOutOfRangeException(nameof(conductance), conductance, "the edge-slot conductance g must be a positive number");
        if (!(maximumTilt.Radians > 0 && maximumTilt.Radians <= Math.PI / 3))
            throw new ArgumentOutOfRangeException(nameof(maximumTilt), maximumTilt.ToString(), "the maximum tilt must lie in (0°, 60°]");
        double max = Conductance(guide, maximumTilt, f);
        if (conductance > max)
            throw new InfeasibleDesignException(FormattableString.Invariant(
                $"an edge slot needs g = {conductance:0.#####}, above the maximum {max:0.#####} that the {maximumTilt} tilt limit gives in {guide.Designation} at {f}: use more slots, a gentler taper or (travelling wave) a larger load fraction"));
        if (conductance == max) return maximumTilt;
        double th = Brent.FindRoot(t => Conductance(guide, Angle.FromRadians(t), f) - conductance, 0, maximumTilt.Radians, 1e-13, 200);
        return Angle.FromRadians(th);
    }
}
