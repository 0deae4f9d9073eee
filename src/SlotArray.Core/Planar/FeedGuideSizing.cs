using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Planar;

/// <summary>
/// The geometry that ties the feed guide to the branch pitch: a standing-wave feed guide has its coupling slots λg/2
/// apart (each at a current maximum, tilts alternating), so the branch pitch must equal λg/2 of the feed guide; and
/// the pitch must leave room for the branch guide and the wall it shares with its neighbour.
/// </summary>
/// <remarks>
/// Guide wavelength of TE10: λg = λ/√(1 − (λ/2a)²) (e.g. D. M. Pozar, <i>Microwave Engineering</i>, 4th ed., Wiley 2012,
/// Sec. 3.3, from memory). Solving λg/2 = p for the broad wall gives a = λ/(2√(1 − (λ/2p)²)), which exists only for
/// p &gt; λ/2 and is single-mode (a &lt; λ) only for p &gt; λ/√3. Grating lobes of a broadside array with spacing d stay out
/// of real space while the beam scans by less than sin θ = λ/d − 1 (standard array theory, e.g. R. J. Mailloux,
/// <i>Phased Array Antenna Handbook</i>, 2nd ed., Artech 2005, Sec. 1.1, from memory).
/// </remarks>
internal static class FeedGuideSizing
{
    /// <summary>The branch pitch a feed guide needs: λg/2 of the feed guide at f0.</summary>
    public static Length RequiredPitch(RectangularWaveguide feed, Frequency f0) => 0.5 * feed.GuideWavelength(f0);

    /// <summary>The smallest pitch the branch guides allow: inside width a plus the wall two neighbours share.</summary>
    /// <param name="branch">The branch guide.</param>
    /// <param name="commonWall">Thickness of the wall between neighbouring branch guides.</param>
    public static Length MinimumPitch(RectangularWaveguide branch, Length commonWall) => branch.BroadWall + commonWall;

    /// <summary>
    /// The feed-guide broad wall whose λg/2 equals <paramref name="pitch"/> at f0 (air filled). Throws
    /// <see cref="InfeasibleDesignException"/> saying which dimension to change when no single-mode guide does.
    /// </summary>
    public static Length FeedWidthForPitch(Length pitch, Frequency f0, double relativePermittivity = 1)
    {
        double lam = PhysicalConstants.SpeedOfLight / Math.Sqrt(relativePermittivity) / f0.Hertz, p = pitch.Meters;
        if (p <= lam / Math.Sqrt(3))
            throw new InfeasibleDesignException(FormattableString.Invariant(
                $"a feed guide whose λg/2 equals the branch pitch {p * 1e3:0.###} mm needs a broad wall of at least λ = {lam * 1e3:0.###} mm (two-moded) at {f0}: the pitch must exceed λ/√3 = {lam / Math.Sqrt(3) * 1e3:0.###} mm; widen the common wall or the branch guide, or raise the frequency"));
        double q = lam / (2 * p);
        return Length.FromMeters(lam / (2 * Math.Sqrt(1 - q * q)));
    }

    /// <summary>Largest scan sin θ free of grating lobes for element spacing d at f0 (λ/d − 1; negative: a grating lobe already at broadside).</summary>
    public static double GratingLobeFreeSine(Length spacing, Frequency f0) => f0.FreeSpaceWavelength / spacing - 1;
}
