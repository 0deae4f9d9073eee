using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Design;

/// <summary>
/// Main-beam direction (squint) of a slot array fed by a wave travelling along the guide, and its frequency-scan rate
/// (R. S. Elliott, <i>Antenna Theory and Design</i>, Prentice-Hall 1981, Ch. 8, travelling-wave arrays).
/// </summary>
/// <remarks>
/// <para>Phase condition [D; M: standard, e.g. R. S. Elliott, <i>Antenna Theory and Design</i>, Prentice-Hall 1981,
/// Ch. 8]: neighbouring slots d apart are excited β d apart in phase by the travelling wave, plus π when their
/// offsets or tilts alternate; the fields add in phase where k d sin θ_b = β d − π·[alternating] − 2πm, m chosen so
/// that |sin θ_b| ≤ 1 (the smallest |sin θ_b| is the main beam, any other real solution a grating lobe). For
/// alternating slots sin θ_b = λ/λg − λ/(2d); for same-side slots sin θ_b = λ/λg − λ/d.</para>
/// <para>Sign (architecture.md "Axes"; Elliott 1981): θ_b &gt; 0 points toward the load end (the wave's
/// direction of travel), θ_b &lt; 0 toward the feed. λ is the free-space wavelength (the slots radiate into air);
/// λg the guide wavelength, which includes any dielectric filling of the guide.</para>
/// </remarks>
internal static class TravellingWaveBeam
{
    /// <summary>
    /// sin θ_b of the main beam, or null when no solution of the phase condition lies in real space.
    /// </summary>
    /// <param name="guide">The guide (λg).</param>
    /// <param name="spacing">Slot spacing d; &gt; 0.</param>
    /// <param name="f">Frequency, above the TE10 cutoff.</param>
    /// <param name="alternating">True for alternating offsets or tilts (the usual case).</param>
    public static double? SineOfBeam(RectangularWaveguide guide, Length spacing, Frequency f, bool alternating = true)
    {
        ArgumentNullException.ThrowIfNull(guide);
        if (!(spacing.Meters > 0) || !double.IsFinite(spacing.Meters))
            throw new ArgumentOutOfRangeException(nameof(spacing), spacing.ToString(), "the slot spacing must be a positive length");
        double lam = f.FreeSpaceWavelength.Meters, lg = guide.GuideWavelength(f).Meters, d = spacing.Meters;
        // k d sinθ = βd − π·alt − 2πm  ⇔  sinθ = λ/λg − (alt/2 + m) λ/d
        double s0 = lam / lg - (alternating ? 0.5 : 0) * lam / d;
        // m nearest to making s zero
        double m = Math.Round(s0 * d / lam);
        double s = s0 - m * lam / d;
        return Math.Abs(s) <= 1 ? s : null;
    }

    /// <summary>Main-beam direction θ_b from broadside, positive toward the load end; null when none lies in real space.</summary>
    /// <param name="guide">The guide.</param>
    /// <param name="spacing">Slot spacing d.</param>
    /// <param name="f">Frequency.</param>
    /// <param name="alternating">True for alternating offsets or tilts.</param>
    public static Angle? Direction(RectangularWaveguide guide, Length spacing, Frequency f, bool alternating = true)
        => SineOfBeam(guide, spacing, f, alternating) is { } s ? Angle.FromRadians(Math.Asin(s)) : null;

    /// <summary>
    /// Frequency-scan rate dθ_b/df, rad/Hz, by a central difference of <see cref="Direction"/> over ±10⁻⁵ f
    /// (truncation error of order 10⁻¹⁰ relative: the closed form is smooth); null when the beam is not in real space.
    /// </summary>
    /// <param name="guide">The guide.</param>
    /// <param name="spacing">Slot spacing d.</param>
    /// <param name="f">Frequency.</param>
    /// <param name="alternating">True for alternating offsets or tilts.</param>
    public static double? ScanRate(RectangularWaveguide guide, Length spacing, Frequency f, bool alternating = true)
    {
        double h = 1e-5 * f.Hertz;
        var lo = Direction(guide, spacing, Frequency.FromHertz(f.Hertz - h), alternating);
        var hi = Direction(guide, spacing, Frequency.FromHertz(f.Hertz + h), alternating);
        if (lo is null || hi is null) return null;
        return (hi.Value.Radians - lo.Value.Radians) / (2 * h);
    }

    /// <summary>
    /// Whether a second beam (grating lobe) of the travelling-wave phase condition enters real space:
    /// d (1 + |sin θ_b|) ≥ λ (the grating-lobe condition of a scanned array, Elliott 1981, Ch. 8).
    /// </summary>
    /// <param name="guide">The guide.</param>
    /// <param name="spacing">Slot spacing d.</param>
    /// <param name="f">Frequency.</param>
    /// <param name="alternating">True for alternating offsets or tilts.</param>
    public static bool HasGratingLobe(RectangularWaveguide guide, Length spacing, Frequency f, bool alternating = true)
    {
        var s = SineOfBeam(guide, spacing, f, alternating);
        if (s is null) return false;
        return spacing.Meters * (1 + Math.Abs(s.Value)) >= f.FreeSpaceWavelength.Meters;
    }

    /// <summary>
    /// The spacing that puts the main beam of alternating slots at <paramref name="beam"/>: the phase condition
    /// sin θ_b = λ/λg − λ/(2d) solved for d = λ / (2 (λ/λg − sin θ_b)) (m = 0; the inverse of <see cref="SineOfBeam"/>).
    /// </summary>
    /// <param name="guide">The guide.</param>
    /// <param name="beam">Asked direction from broadside, positive toward the load end; |θ| &lt; 90°.</param>
    /// <param name="f">Frequency, above the TE10 cutoff.</param>
    /// <exception cref="ArgumentOutOfRangeException">No positive spacing gives that direction (λ/λg ≤ sin θ_b).</exception>
    public static Length SpacingFor(RectangularWaveguide guide, Angle beam, Frequency f)
    {
        ArgumentNullException.ThrowIfNull(guide);
        double lam = f.FreeSpaceWavelength.Meters, lg = guide.GuideWavelength(f).Meters;
        double denominator = lam / lg - Math.Sin(beam.Radians);
        if (!(Math.Abs(beam.Degrees) < 90) || !(denominator > 0))
            throw new ArgumentOutOfRangeException(nameof(beam), beam.ToString(),
                $"alternating slots cannot point a beam at {beam.Degrees:0.###} deg in {guide.Designation} at {f}: sin θ must be below λ/λg = {lam / lg:0.####}");
        return Length.FromMeters(lam / (2 * denominator));
    }
}
