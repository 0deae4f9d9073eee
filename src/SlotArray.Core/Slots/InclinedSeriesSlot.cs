using MathNet.Numerics.RootFinding;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots;

/// <summary>
/// Centred inclined series slot in the broad wall: normalised resonant series resistance r = R/Z_TE as a function
/// of the rotation θ from the guide axis (θ = 0 along the axis, no coupling; θ = 90° transverse), and its inverse.
/// </summary>
/// <remarks>
/// Source: A. F. Stevenson, "Theory of slots in rectangular wave-guides", J. Appl. Phys. 19, 24–38 (1948), the
/// centred inclined series slot (form as tabulated in S. Silver, <i>Microwave Antenna Theory and Design</i>, MIT
/// Rad. Lab. Ser. vol. 12, 1949, pp. 291–295, and R. S. Elliott, <i>Antenna Theory and Design</i>, 1981; equation
/// numbers not re-checked) [M], re-derived by reciprocity [D]:
/// r = (30/(π R_d)) (λ³/(a b λg)) [I(θ) sin θ + (λg/(2a)) J(θ) cos θ]², with c(u) = cos(πu/2)/(1 − u²),
/// ξ = (λ/λg) cos θ + (λ/(2a)) sin θ, ζ = (λ/λg) cos θ − (λ/(2a)) sin θ, I = c(ζ) + c(ξ), J = c(ζ) − c(ξ).
/// The sign of J matters (J = c(ξ) − c(ζ) is wrong: checked by direct numerical integration of the coupling integral [D]). At θ = 90° the form reduces exactly
/// to Stevenson's transverse series slot r = (120/(π R_d)) (λg/λ)³ (λ²/(ab)) cos²(πλ/(4a)) (the "0.523").
/// R_d = 73 Ω as in Stevenson's constants (30/(π·73) = 0.13081, the classic "0.131").
/// Assumptions (validity): zero wall thickness, narrow slot, slot resonant with full length λ/2 and a cosine field,
/// radiation into a half-space over an infinite ground plane, TE10 only, isolated slot. Real resonant lengths are a
/// few per cent shorter than λ/2. Series slots are spaced λg/2 with alternating tilt; the short goes λg/2 beyond the
/// last slot centre (Elliott 1981, from memory).
/// </remarks>
internal static class InclinedSeriesSlot
{
    /// <summary>Stevenson's prefactor 30/(π R_d) with R_d = 73 Ω (dimensionless; 0.13081).</summary>
    public const double StevensonFactor = 30.0 / (Math.PI * PhysicalConstants.HalfWaveDipoleResistance);

    /// <summary>
    /// Normalised resonant series resistance r = R/Z_TE of a centred slot rotated by <paramref name="tilt"/> from
    /// the guide axis (Stevenson 1948). Even in θ; r(0) = 0, r(90°) = transverse slot.
    /// </summary>
    /// <param name="guide">The guide (inside a, b; air filled is assumed by the formula).</param>
    /// <param name="tilt">Rotation of the slot axis from the guide axis; |θ| ≤ 90°.</param>
    /// <param name="f">Frequency; above the TE10 cutoff.</param>
    public static double Resistance(RectangularWaveguide guide, Angle tilt, Frequency f)
    {
        ArgumentNullException.ThrowIfNull(guide);
        double th = tilt.Radians;
        if (!double.IsFinite(th) || Math.Abs(th) > Math.PI / 2 + 1e-12)
            throw new ArgumentOutOfRangeException(nameof(tilt), tilt.ToString(), $"the series-slot rotation must lie within ±90°, got {tilt}");
        double a = guide.BroadWall.Meters, b = guide.NarrowWall.Meters;
        double lam = guide.MediumVelocity / f.Hertz, lg = guide.GuideWavelength(f).Meters;
        double cs = Math.Cos(th), sn = Math.Sin(th);
        double xi = lam / lg * cs + lam / (2 * a) * sn, zeta = lam / lg * cs - lam / (2 * a) * sn;
        double i = C(zeta) + C(xi), j = C(zeta) - C(xi);
        double bracket = i * sn + lg / (2 * a) * j * cs;
        return StevensonFactor * lam * lam * lam / (a * b * lg) * bracket * bracket;
    }

    /// <summary>
    /// The largest resistance a centred series slot gives over 0 ≤ θ ≤ 90°. Over the recommended band of a guide r(θ)
    /// rises monotonically and the maximum is the transverse slot, r(90°) (checked for WR-90, WR-42 and WR-284); close
    /// to cutoff it peaks at an intermediate rotation, found on a 0.5° grid and refined by golden-section search.
    /// </summary>
    /// <param name="guide">The guide.</param>
    /// <param name="f">Frequency; above the TE10 cutoff.</param>
    public static double MaximumResistance(RectangularWaveguide guide, Frequency f) => Resistance(guide, MaximumRotation(guide, f), f);

    /// <summary>
    /// Inverse of <see cref="Resistance"/>: the smallest rotation 0 &lt; θ ≤ 90° that gives the resonant resistance r
    /// (first sign change on a 0.5° grid, then Brent's method to 1e-13 rad).
    /// Throws <see cref="InfeasibleDesignException"/> when r exceeds <see cref="MaximumResistance"/>.
    /// </summary>
    /// <param name="guide">The guide.</param>
    /// <param name="resistance">Target normalised resistance r = R/Z_TE; r &gt; 0.</param>
    /// <param name="f">Frequency; above the TE10 cutoff.</param>
    public static Angle TiltForResistance(RectangularWaveguide guide, double resistance, Frequency f)
    {
        if (!double.IsFinite(resistance) || resistance <= 0)
            throw new ArgumentOutOfRangeException(nameof(resistance), resistance, "the series-slot resistance r must be a positive number");
        var peak = MaximumRotation(guide, f);
        double max = Resistance(guide, peak, f);
        if (resistance > max)
            throw new InfeasibleDesignException(FormattableString.Invariant(
                $"a centred inclined series slot needs r = {resistance:0.#####}, above the maximum {max:0.#####} (at {peak.Degrees:0.#} deg) this {guide.Designation} guide gives at {f}: use more slots or a gentler taper"));
        if (resistance == max) return peak;
        double F(double t) => Resistance(guide, Angle.FromRadians(t), f) - resistance;
        double lo = 0;
        for (int i = 1; i <= GridSteps; i++)
        {
            double hi = Math.Min(i * GridStep, peak.Radians);
            if (F(hi) >= 0) return Angle.FromRadians(Brent.FindRoot(F, lo, hi, 1e-13, 200));
            lo = hi;
        }
        return peak; // unreachable: F(peak) ≥ 0
    }

    private const int GridSteps = 180;
    private const double GridStep = Math.PI / 2 / GridSteps;

    private static Angle MaximumRotation(RectangularWaveguide guide, Frequency f)
    {
        double R(double t) => Resistance(guide, Angle.FromRadians(t), f);
        int best = GridSteps;
        for (int i = GridSteps - 1; i >= 1; i--) if (R(i * GridStep) > R(best * GridStep)) best = i;
        if (best == GridSteps) return Angle.FromDegrees(90);
        double a = (best - 1) * GridStep, b = Math.Min(best + 1, GridSteps) * GridStep, phi = (Math.Sqrt(5) - 1) / 2;
        while (b - a > 1e-12)
        {
            double m1 = b - phi * (b - a), m2 = a + phi * (b - a);
            if (R(m1) < R(m2)) a = m1; else b = m2;
        }
        return Angle.FromRadians(0.5 * (a + b));
    }

    /// <summary>
    /// Validity limits of the closed form at this rotation and frequency: outside the guide's single-mode band;
    /// a half-wave slot at this rotation that does not fit across the broad wall ((λ/2)|sin θ| + w|cos θ| &gt; a);
    /// a wall thickness the formula ignores (it assumes a zero-thickness wall).
    /// </summary>
    /// <param name="guide">The guide.</param>
    /// <param name="tilt">Rotation from the guide axis.</param>
    /// <param name="width">Slot width; &gt; 0.</param>
    /// <param name="f">Frequency.</param>
    public static IReadOnlyList<DesignWarning> Warnings(RectangularWaveguide guide, Angle tilt, Length width, Frequency f)
    {
        ArgumentNullException.ThrowIfNull(guide);
        var list = new List<DesignWarning>();
        var band = guide.SingleModeBand;
        if (f <= band.Low || f >= band.High)
            list.Add(new DesignWarning("guide-not-single-mode", $"{f} lies outside the single-mode band {band.Low} to {band.High} of {guide.Designation}: the Stevenson closed forms assume TE10 only"));
        double lam = guide.MediumVelocity / f.Hertz;
        double across = lam / 2 * Math.Abs(Math.Sin(tilt.Radians)) + width.Meters * Math.Abs(Math.Cos(tilt.Radians));
        if (across > guide.BroadWall.Meters)
            list.Add(new DesignWarning("series-slot-does-not-fit", FormattableString.Invariant(
                $"a half-wave slot at {tilt} spans {across * 1e3:0.###} mm across the broad wall, more than a = {guide.BroadWall.Millimeters:0.###} mm: reduce the rotation")));
        if (guide.WallThickness.Meters > 0)
            list.Add(new DesignWarning("series-slot-thin-wall-formula", FormattableString.Invariant(
                $"the inclined series-slot resistance assumes a zero-thickness wall; the {guide.WallThickness.Millimeters:0.###} mm wall lengthens the resonant slot and changes r: verify by measurement or full-wave analysis")));
        return list;
    }

    /// <summary>c(u) = cos(πu/2)/(1 − u²) with its removable points c(±1) = π/4 (series near |u| = 1).</summary>
    internal static double C(double u)
    {
        double e = 1 - Math.Abs(u);
        if (Math.Abs(e) < 1e-4)
        {
            // cos(π(1−e)/2) = sin(πe/2) ≈ (πe/2)(1 − (πe/2)²/6); 1 − u² = e(2 − e).
            double h = Math.PI * e / 2;
            return Math.PI / 2 * (1 - h * h / 6) / (2 - e);
        }
        return Math.Cos(Math.PI * u / 2) / (1 - u * u);
    }
}
