using MathNet.Numerics.RootFinding;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Planar;

/// <summary>
/// The centred inclined series-series coupling slot where the feed guide crosses a branch guide behind it: a slot in
/// their common broad wall, centred on both centre lines, rotated by θ from the feed guide's axis (so by 90° − θ from
/// the branch's). At resonance it is an ideal transformer between a series port in the feed and a series port at
/// the branch's centre: z_feed = (r_f(θ)/r_b(90° − θ)) z_branch, both normalised to their own guide's Z_TE.
/// </summary>
/// <remarks>
/// <para>Model [D], built on A. F. Stevenson, "Theory of slots in rectangular wave-guides", J. Appl. Phys. 19, 24–38
/// (1948), centred inclined series slot (<see cref="InclinedSeriesSlot.Resistance"/>): a resonant slot's voltage V_s
/// couples to a guide's TE10 mode with a coefficient c_g, and radiating into a half space it presents r_g = c_g²/G_rad.
/// Between two guides the same slot voltage couples to both, so the feed sees the branch through the turns ratio
/// c_f/c_b: z_feed = (c_f/c_b)² z_branch = (r_f/r_b) z_branch, the half-space conductance cancelling. This is the
/// structure of the series-series crossed-guide coupler in R. S. Elliott, <i>Antenna Theory and Design</i>,
/// Prentice-Hall 1981, Ch. 8 (planar arrays), from memory [M]; Elliott models the coupler with its own measured or
/// computed admittance, which this closed form replaces.</para>
/// <para>Neglected: the coupling slot's reactance away from resonance (the ratio is applied at every frequency, so the
/// band of the feed is optimistic), the wall thickness (Stevenson's zero-thickness wall), and its length is the
/// closed form's resonant λ/2 (real resonant lengths in a thick wall are a few per cent shorter: verify by measurement
/// or full-wave analysis before cutting).</para>
/// </remarks>
internal static class CouplingSlot
{
    /// <summary>The impedance ratio z_feed/z_branch = r_f(θ)/r_b(90° − θ) of a coupling slot rotated θ from the feed axis.</summary>
    /// <param name="feed">The feed guide.</param>
    /// <param name="branch">The branch guide.</param>
    /// <param name="tilt">Rotation from the feed axis, 0 &lt; θ &lt; 90°.</param>
    /// <param name="f">Frequency.</param>
    public static double ImpedanceRatio(RectangularWaveguide feed, RectangularWaveguide branch, Angle tilt, Frequency f)
    {
        double rf = InclinedSeriesSlot.Resistance(feed, tilt, f);
        double rb = InclinedSeriesSlot.Resistance(branch, Angle.FromRadians(Math.PI / 2 - Math.Abs(tilt.Radians)), f);
        return rf / rb;
    }

    /// <summary>
    /// The rotation θ (from the feed axis, 0 … 90°) that gives the ratio <paramref name="ratio"/> = z_feed/z_branch:
    /// Brent's method on the ratio, which rises monotonically from 0 at θ = 0 to ∞ at 90° over the guides' bands.
    /// Throws <see cref="InfeasibleDesignException"/> naming the branch when the rotation needed leaves 1° … 89°.
    /// </summary>
    /// <param name="feed">The feed guide.</param>
    /// <param name="branch">The branch guide.</param>
    /// <param name="ratio">z_feed/z_branch asked, &gt; 0.</param>
    /// <param name="f">Design frequency.</param>
    /// <param name="branchNumber">Branch number, for the message.</param>
    public static Angle TiltForRatio(RectangularWaveguide feed, RectangularWaveguide branch, double ratio, Frequency f, int branchNumber)
    {
        if (!(ratio > 0) || !double.IsFinite(ratio)) throw new ArgumentOutOfRangeException(nameof(ratio), ratio, "the impedance ratio must be positive");
        double lo = Math.PI / 180, hi = 89 * Math.PI / 180;
        double R(double t) => Math.Log(ImpedanceRatio(feed, branch, Angle.FromRadians(t), f) / ratio);
        if (R(lo) > 0 || R(hi) < 0)
            throw new InfeasibleDesignException(FormattableString.Invariant(
                $"branch {branchNumber}: its coupling slot must give z_feed/z_branch = {ratio:G4}, outside the {ImpedanceRatio(feed, branch, Angle.FromRadians(lo), f):G3} … {ImpedanceRatio(feed, branch, Angle.FromRadians(hi), f):G3} a slot rotated 1° … 89° gives: change the feed guide or the taper across the branches"));
        return Angle.FromRadians(Brent.FindRoot(R, lo, hi, 1e-13, 200));
    }

    /// <summary>Stevenson's resonant length of the coupling slot, λ/2 of the medium (see remarks).</summary>
    /// <param name="guide">The guide (its medium).</param>
    /// <param name="f">Design frequency.</param>
    public static Length ResonantLength(RectangularWaveguide guide, Frequency f) => Length.FromMeters(0.5 * guide.MediumVelocity / f.Hertz);
}
