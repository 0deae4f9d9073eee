using SlotArray.Core.Coupling;
using System.Numerics;
using MathNet.Numerics.RootFinding;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Slots;

/// <summary>
/// A single narrow slot in a flat ground plane, fed across its width: the centre impedance from Babinet's principle
/// (<see cref="Babinet"/>) and the complementary strip dipole, the feed offset from the slot end that gives a target
/// input resistance, and the VSWR ≤ 2 bandwidth that follows.
/// </summary>
/// <remarks>
/// <para>Dipole: thin dipole of full length L and radius ρ = w/4 (Butler 1982, see <see cref="Babinet"/>), sinusoidal
/// current, induced-EMF self-impedance referred to the current maximum (C. A. Balanis, <i>Antenna Theory</i>, 3rd ed.,
/// Wiley 2005, eqs. (8-60a), (8-60b); equation numbers from memory; after Carter 1932):
/// R_m = η/(2π) {γ + ln(kL) − Ci(kL) + ½ sin(kL)[Si(2kL) − 2Si(kL)] + ½ cos(kL)[γ + ln(kL/2) + Ci(2kL) − 2Ci(kL)]},
/// X_m = η/(4π) {2Si(kL) + cos(kL)[2Si(kL) − Si(2kL)] − sin(kL)[2Ci(kL) − Ci(2kL) − Ci(2kρ²/L)]},
/// and at the centre terminals Z_d = Z_m/sin²(kL/2) (Balanis eq. (8-61a), from memory). For L = λ/2 this gives the
/// thin-dipole value 73.08 + j42.51 Ω ([N]; Orfanidis's toolbox documentation [S]).</para>
/// <para>Feed offset: transmission-line model of the slot (common practice, no authoritative source located): the slot
/// voltage falls as sin(k s) towards the shorted ends, so for constant radiated power the impedance seen by a feed at
/// distance s from one end is Z(s) = Z_centre sin²(ks)/sin²(kL/2), which for L = λ/2 is R(s) = R_centre sin²(ks).
/// Valid for thin slots near half-wave length, L &lt; λ.</para>
/// <para>Bandwidth: the contiguous band around f in which the VSWR of Z(s, f′) against the target resistance stays
/// ≤ 2, with L, w and s held fixed and Z recomputed from the same dipole/Babinet/line model at each frequency f′
/// (edges found by a 0.1 % step search out to ±40 % and bisection to 1e-9 relative).</para>
/// </remarks>
internal static class GroundPlaneSlot
{
    /// <summary>VSWR that bounds the reported bandwidth.</summary>
    public const double BandwidthVswr = 2.0;

    /// <summary>
    /// Input impedance at the centre terminals of a thin dipole of full length L and radius ρ (Ω), induced-EMF
    /// closed form (Balanis 2005, eqs. (8-60a), (8-60b), (8-61a); see remarks). Medium: free space, η0.
    /// </summary>
    /// <param name="length">Full length L; 0 &lt; L &lt; λ.</param>
    /// <param name="radius">Wire radius ρ; 0 &lt; ρ &lt; L/2 (thin-wire theory wants ρ ≪ L).</param>
    /// <param name="f">Frequency; &gt; 0.</param>
    public static Complex DipoleImpedance(Length length, Length radius, Frequency f)
    {
        double lam = f.FreeSpaceWavelength.Meters, l = length.Meters, rho = radius.Meters;
        if (!(l > 0) || !(l < lam))
            throw new ArgumentOutOfRangeException(nameof(length), length.ToString(), $"the dipole length must lie between 0 and one wavelength ({f.FreeSpaceWavelength}), got {length}");
        if (!(rho > 0) || !(rho < l / 2))
            throw new ArgumentOutOfRangeException(nameof(radius), radius.ToString(), $"the dipole radius must be positive and below half its length, got {radius}");
        return DipoleImpedanceAtMaximum(f.FreeSpaceWavenumber * l, f.FreeSpaceWavenumber * rho * rho / l)
            / Math.Pow(Math.Sin(f.FreeSpaceWavenumber * l / 2), 2);
    }

    /// <summary>Z_m of Balanis (8-60a/b) for kL and kρ²/L, η = η0 (Ω).</summary>
    private static Complex DipoleImpedanceAtMaximum(double kl, double kRho2OverL)
    {
        double g = SineCosineIntegrals.EulerGamma, s = Math.Sin(kl), c = Math.Cos(kl);
        double si1 = SineCosineIntegrals.Si(kl), si2 = SineCosineIntegrals.Si(2 * kl);
        double ci1 = SineCosineIntegrals.Ci(kl), ci2 = SineCosineIntegrals.Ci(2 * kl);
        double eta = PhysicalConstants.Eta0;
        double r = eta / (2 * Math.PI) * (g + Math.Log(kl) - ci1 + 0.5 * s * (si2 - 2 * si1)
            + 0.5 * c * (g + Math.Log(kl / 2) + ci2 - 2 * ci1));
        double x = eta / (4 * Math.PI) * (2 * si1 + c * (2 * si1 - si2)
            - s * (2 * ci1 - ci2 - SineCosineIntegrals.Ci(2 * kRho2OverL)));
        return new Complex(r, x);
    }

    /// <summary>
    /// Analyses one slot: dipole and slot impedances, resonant length, feed offset for the target resistance and the
    /// VSWR ≤ 2 bandwidth. Throws <see cref="InfeasibleDesignException"/> when no feed position gives the target.
    /// </summary>
    /// <param name="length">Slot length L; 0 &lt; L &lt; λ (near λ/2 for the feed model).</param>
    /// <param name="width">Slot width w; 0 &lt; w &lt; L/2 (equivalent strip radius w/4).</param>
    /// <param name="f">Frequency.</param>
    /// <param name="targetResistance">Input resistance wanted at the feed, Ω; &gt; 0 (e.g. 50).</param>
    /// <param name="oneSided">True for a slot radiating into one half-space (cavity or guide behind it).</param>
    public static GroundPlaneSlotAnalysis Analyze(Length length, Length width, Frequency f, double targetResistance, bool oneSided)
    {
        if (!(width.Meters > 0) || !(width.Meters < length.Meters / 2))
            throw new ArgumentOutOfRangeException(nameof(width), width.ToString(), $"the slot width must be positive and below half the length {length}, got {width}");
        if (!(targetResistance > 0) || !double.IsFinite(targetResistance))
            throw new ArgumentOutOfRangeException(nameof(targetResistance), targetResistance, "the target resistance must be a positive number of ohms");
        var radius = StripEquivalentRadius.Of(width);
        var zd = DipoleImpedance(length, radius, f);
        var two = Babinet.SlotImpedance(zd, oneSided: false);
        var one = Babinet.SlotImpedance(zd, oneSided: true);
        var centre = oneSided ? one : two;
        double k = f.FreeSpaceWavenumber, l = length.Meters, lam = f.FreeSpaceWavelength.Meters;

        double sMax = Math.Min(l / 2, lam / 4), sin2Half = Math.Pow(Math.Sin(k * l / 2), 2);
        double rMax = centre.Real * Math.Pow(Math.Sin(k * sMax), 2) / sin2Half;
        if (targetResistance > rMax)
            throw new InfeasibleDesignException(FormattableString.Invariant(
                $"a {length.Millimeters:0.###} mm slot at {f} has at most {rMax:0.##} ohm at any feed position, below the {targetResistance:0.##} ohm target: choose a lower target, a one-sided (cavity-backed) slot or a matching network"));
        double s = Math.Asin(Math.Sqrt(targetResistance * sin2Half / centre.Real)) / k;
        var feed = FeedImpedance(length, width, Length.FromMeters(s), f, oneSided);

        var warnings = new List<DesignWarning>();
        if (l < 0.4 * lam || l > 0.6 * lam)
            warnings.Add(new DesignWarning("plane-slot-length-range", FormattableString.Invariant(
                $"the slot is {l / lam:0.###} wavelengths long; the feed-offset model is meant for slots near a half wavelength (0.4 to 0.6)")));
        if (width.Meters > l / 10)
            warnings.Add(new DesignWarning("plane-slot-wide", FormattableString.Invariant(
                $"the slot width {width.Millimeters:0.###} mm exceeds a tenth of its length: thin-dipole theory loses accuracy")));

        var band = VswrBand(length, width, Length.FromMeters(s), f, targetResistance, oneSided);
        if (band is null)
            warnings.Add(new DesignWarning("plane-slot-not-matched", FormattableString.Invariant(
                $"the VSWR at {f} is above {BandwidthVswr:0.#} even at the feed offset: the slot is far from resonance; resonant length is about {ResonantLength(width, f).Millimeters:0.###} mm")));

        return new GroundPlaneSlotAnalysis(length, width, f, oneSided, targetResistance, radius, zd, two, one,
            ResonantLength(width, f), Length.FromMeters(s), feed, band?.Low, band?.High, warnings);
    }

    /// <summary>Impedance Z(s) = Z_centre sin²(ks)/sin²(kL/2) at a feed s from one end (Ω; transmission-line model).</summary>
    /// <param name="length">Slot length L; 0 &lt; L &lt; λ.</param>
    /// <param name="width">Slot width w.</param>
    /// <param name="feedOffset">Feed distance s from one end; 0 &lt; s ≤ L/2.</param>
    /// <param name="f">Frequency.</param>
    /// <param name="oneSided">True for a slot radiating into one half-space.</param>
    public static Complex FeedImpedance(Length length, Length width, Length feedOffset, Frequency f, bool oneSided)
    {
        if (!(feedOffset.Meters > 0) || feedOffset.Meters > length.Meters / 2 * (1 + 1e-12))
            throw new ArgumentOutOfRangeException(nameof(feedOffset), feedOffset.ToString(), $"the feed offset must lie in (0, L/2], got {feedOffset}");
        double k = f.FreeSpaceWavenumber;
        var centre = Babinet.SlotImpedance(DipoleImpedance(length, StripEquivalentRadius.Of(width), f), oneSided);
        return centre * Math.Pow(Math.Sin(k * feedOffset.Meters), 2) / Math.Pow(Math.Sin(k * length.Meters / 2), 2);
    }

    /// <summary>Length at which the slot (and its complementary dipole of radius w/4) is resonant, X = 0, near 0.45–0.5 λ.</summary>
    /// <param name="width">Slot width w.</param>
    /// <param name="f">Frequency.</param>
    public static Length ResonantLength(Length width, Frequency f)
    {
        double lam = f.FreeSpaceWavelength.Meters, rho = StripEquivalentRadius.Of(width).Meters;
        double root = Brent.FindRoot(l => DipoleImpedance(Length.FromMeters(l), Length.FromMeters(rho), f).Imaginary,
            Math.Max(0.3 * lam, 2.5 * rho), 0.5 * lam, 1e-13, 200);
        return Length.FromMeters(root);
    }

    private static double Vswr(Complex z, double r0)
    {
        double gamma = ((z - r0) / (z + r0)).Magnitude;
        return gamma >= 1 ? double.PositiveInfinity : (1 + gamma) / (1 - gamma);
    }

    private static (Frequency Low, Frequency High)? VswrBand(Length length, Length width, Length s, Frequency f0, double r0, bool oneSided)
    {
        bool Ok(double hz) => hz * length.Meters < PhysicalConstants.SpeedOfLight * 0.999
            && Vswr(FeedImpedance(length, width, s, Frequency.FromHertz(hz), oneSided), r0) <= BandwidthVswr;
        if (!Ok(f0.Hertz)) return null;
        double Edge(int dir)
        {
            double inside = f0.Hertz, step = 1e-3 * f0.Hertz;
            for (int i = 1; i <= 400; i++)
            {
                double probe = f0.Hertz + dir * i * step;
                if (!Ok(probe))
                {
                    double lo = inside, hi = probe;
                    while (Math.Abs(hi - lo) > 1e-9 * f0.Hertz)
                    {
                        double mid = 0.5 * (lo + hi);
                        if (Ok(mid)) lo = mid; else hi = mid;
                    }
                    return 0.5 * (lo + hi);
                }
                inside = probe;
            }
            return inside;
        }
        return (Frequency.FromHertz(Edge(-1)), Frequency.FromHertz(Edge(+1)));
    }
}
