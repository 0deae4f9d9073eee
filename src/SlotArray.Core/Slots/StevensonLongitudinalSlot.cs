using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Slots;

/// <summary>
/// Stevenson's resonant conductance of a longitudinal shunt slot in the broad wall, forward g(x) and inverse x(g).
/// </summary>
/// <remarks>
/// g = (480 Ω/(π R_d)) (a/b) (λg/λ) cos²(πλ/(2λg)) sin²(πx/a), R_d = 73 Ω, 480 Ω = 4 η_S/π with η_S = 120π Ω:
/// A. F. Stevenson, "Theory of slots in rectangular wave-guides", J. Appl. Phys. 19, 24–38, 1948, as tabulated in
/// S. Silver, <i>Microwave Antenna Theory and Design</i>, MIT Rad. Lab. Ser. 12, 1949, pp. 291–295 (forms from
/// memory [M], re-derived by reciprocity [D]). Assumptions: zero wall thickness, narrow resonant half-wave slot, TE10 only, isolated slot radiating into a
/// half-space. λ is the wavelength in the guide's filling.
/// </remarks>
internal static class StevensonLongitudinalSlot
{
    /// <summary>Largest offset treated as usable, a/4 (common practice, no source); the maximum conductance is g(a/4).</summary>
    public static double MaximumOffset(RectangularWaveguide guide) => guide.BroadWall.Meters / 4;

    /// <summary>The coefficient g(x)/sin²(πx/a) = (480/(π·73)) (a/b)(λg/λ) cos²(πλ/(2λg)) at frequency f.</summary>
    public static double Coefficient(RectangularWaveguide guide, Frequency f)
    {
        ArgumentNullException.ThrowIfNull(guide);
        double lam = 2 * Math.PI / guide.MediumWavenumber(f), lg = guide.GuideWavelength(f).Meters;
        double c = Math.Cos(Math.PI * lam / (2 * lg));
        return 4 * PhysicalConstants.EtaClassical / Math.PI / (Math.PI * PhysicalConstants.HalfWaveDipoleResistance)
            * (guide.BroadWall / guide.NarrowWall) * (lg / lam) * c * c;
    }

    /// <summary>Resonant conductance g = G/G0 of a slot at signed offset x (m) from the centre line.</summary>
    public static double Conductance(RectangularWaveguide guide, double offset, Frequency f)
    {
        double s = Math.Sin(Math.PI * offset / guide.BroadWall.Meters);
        return Coefficient(guide, f) * s * s;
    }

    /// <summary>Largest conductance at the largest usable offset a/4.</summary>
    public static double MaximumConductance(RectangularWaveguide guide, Frequency f) => Conductance(guide, MaximumOffset(guide), f);

    /// <summary>
    /// The positive offset x = (a/π) asin(√(g/coefficient)) giving conductance g. Throws
    /// <see cref="InfeasibleDesignException"/> when g exceeds the conductance at the largest usable offset a/4.
    /// </summary>
    public static double Offset(RectangularWaveguide guide, double conductance, Frequency f)
    {
        if (!(conductance >= 0) || !double.IsFinite(conductance))
            throw new ArgumentOutOfRangeException(nameof(conductance), conductance, "conductance must be zero or positive");
        double gMax = MaximumConductance(guide, f);
        if (conductance > gMax)
            throw new InfeasibleDesignException(FormattableString.Invariant(
                $"a longitudinal slot needs g = {conductance:0.####}, above the {gMax:0.####} this guide ({guide.Designation}) gives at {f} at the largest usable offset {MaximumOffset(guide) * 1e3:0.###} mm (a/4): use more slots or a gentler taper"));
        return guide.BroadWall.Meters / Math.PI * Math.Asin(Math.Sqrt(conductance / Coefficient(guide, f)));
    }

    /// <summary>Validity limits of Stevenson's formula for this slot (empty when none).</summary>
    public static IReadOnlyList<DesignWarning> Warnings(RectangularWaveguide guide, double offset, Frequency f)
    {
        var list = new List<DesignWarning>();
        double a = guide.BroadWall.Meters;
        if (Math.Abs(offset) > MaximumOffset(guide))
            list.Add(new DesignWarning("stevenson-offset-range", FormattableString.Invariant(
                $"offset {Math.Abs(offset) * 1e3:0.###} mm is beyond a/4 = {a / 4 * 1e3:0.###} mm, where Stevenson's isolated-shunt model is no longer reliable")));
        if (guide.WallThickness.Meters > 0)
            list.Add(new DesignWarning("stevenson-thin-wall", FormattableString.Invariant(
                $"Stevenson's formula assumes a zero-thickness wall; this wall is {guide.WallThickness.Millimeters:0.###} mm (use the moment-method model for the resonant length)")));
        var (low, high) = guide.SingleModeBand;
        if (f <= low || f >= high)
            list.Add(new DesignWarning("stevenson-single-mode", $"{f} is outside the single-mode band {low} – {high} of this guide"));
        return list;
    }
}
