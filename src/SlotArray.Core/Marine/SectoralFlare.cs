using System.Globalization;
using System.Numerics;
using MathNet.Numerics.Integration;
using MathNet.Numerics.RootFinding;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Marine;

/// <summary>
/// The flare in front of edge slots: two flat plates diverging from the edges of the slotted narrow-wall face (height
/// <see cref="Throat"/>) to an aperture <see cref="Aperture"/> tall, <see cref="Length"/> in front of the face. It sets
/// the antenna's vertical beam (in the plane normal to the guide axis).
/// </summary>
/// <remarks>
/// <para>Which horn. An edge slot in a horizontal guide radiates E along the guide axis (horizontal polarisation); the
/// plates lie above and below the slotted face, so that field is PARALLEL to the plates and the flare opens in the
/// plane normal to E: it is an H-plane sectoral horn (C. A. Balanis, <i>Antenna Theory</i>, 4th ed., Wiley 2016,
/// §13.2, H-plane sectoral horn). A field parallel to a conducting plate must vanish on it, so across the flare the
/// field is the parallel-plate TE1 distribution, cos(π y/A) on the aperture, with the quadratic phase of a cylindrical
/// wave from the plates' apex: E(y) = cos(π y/A) e^{−jk y²/(2R)} (Balanis 2016, eqs. (13-20b), (13-20d), R the apex
/// distance ρ2). Balanis's H-plane horn is fed by a TE10 guide; here the parallel plates play that guide's part.</para>
/// <para>Pattern. The vertical cut of the aperture field, F(φ) = (1 + cos φ)/2 · ∫ E(y) e^{jky sin φ} dy (Balanis 2016,
/// §12.3: aperture radiation with the Huygens obliquity factor; the integral (13-22b)), evaluated here by Gauss–Legendre
/// quadrature of order <see cref="QuadratureOrder"/> (MathNet.Numerics); φ is the elevation from the antenna's
/// boresight. Its half-power width and first sidelobe are found on it; the phase parameter t = A²/(8λR) (max phase
/// error 2πt at the aperture edge) is Balanis's universal-curve parameter. The vertical two-dimensional directivity is
/// d_V = 2π / ∫ |F/F_max|² dφ over the front half-plane.</para>
/// <para>Throat. The plates start b + 2t_wall apart (the slotted face of the guide), which in WR-90 at X band is under
/// λ/2: the TE1 field the slot needs is then below cutoff until the plates have opened to λ/2. That evanescent stretch
/// costs 20 log10(e) ∫ √((π/h(x))² − k²) dx dB (the parallel-plate TE1 decay, D. M. Pozar, <i>Microwave
/// Engineering</i>, 4th ed., Wiley 2012, §3.1, with the local height h(x) = T + (A − T)x/L: a slowly tapering guide,
/// reflections from the taper neglected). A flare whose aperture stays under λ/2 never lets the field out and is refused.</para>
/// <para>Limits: plates infinitely wide along the guide, perfectly conducting; no diffraction at the plate edges (the far
/// sidelobes and the back lobe are not modelled); the slots' own loading by the flare's throat (which detunes them) is
/// not modelled: a full-wave check of one slot in the throat is advised.</para>
/// </remarks>
/// <param name="Throat">Height of the slotted face where the plates start (b + 2 × wall); &gt; 0.</param>
/// <param name="Aperture">Height of the aperture between the plates' outer edges; ≥ <paramref name="Throat"/>.</param>
/// <param name="Length">Axial depth from the slotted face to the aperture; &gt; 0.</param>
internal sealed record SectoralFlare(Length Throat, Length Aperture, Length Length)
{
    /// <summary>Gauss–Legendre order of the aperture integral (256: the integrand has at most a few tens of phase turns).</summary>
    public const int QuadratureOrder = 256;

    /// <summary>20 log10(e): dB per neper of field.</summary>
    private const double DbPerNeper = 8.685889638065036;

    private static readonly GaussLegendreRule Rule = new(-0.5, 0.5, QuadratureOrder);

    /// <summary>
    /// Distance from the plates' (virtual) apex to the aperture along the axis, R = L·A/(A − T) (similar triangles);
    /// infinite for parallel plates.
    /// </summary>
    public Length ApexDistance => Aperture.Meters > Throat.Meters
        ? Length.FromMeters(Length.Meters * Aperture.Meters / (Aperture.Meters - Throat.Meters))
        : Length.FromMeters(double.PositiveInfinity);

    /// <summary>Balanis's phase parameter t = A²/(8λR); the largest phase error at the aperture edge is 2πt rad.</summary>
    /// <param name="f">Frequency.</param>
    public double PhaseParameter(Frequency f) => Aperture.Meters * Aperture.Meters / (8 * f.FreeSpaceWavelength.Meters * ApexDistance.Meters);

    /// <summary>Largest phase error at the aperture edge, k A²/(8R).</summary>
    /// <param name="f">Frequency.</param>
    public Angle MaximumPhaseError(Frequency f) => Angle.FromRadians(2 * Math.PI * PhaseParameter(f));

    /// <summary>The aperture integral ∫ cos(πy/A) e^{−jky²/(2R)} e^{jky sin φ} dy over the aperture, metres (Gauss–Legendre).</summary>
    /// <param name="f">Frequency.</param>
    /// <param name="sinElevation">sin φ.</param>
    /// <param name="withPhaseError">False: the same integral without the quadratic phase (the ideal aperture).</param>
    public Complex ApertureIntegral(Frequency f, double sinElevation, bool withPhaseError = true)
    {
        double a = Aperture.Meters, k = f.FreeSpaceWavenumber, r = ApexDistance.Meters;
        double q = withPhaseError && double.IsFinite(r) ? k / (2 * r) : 0;
        Complex sum = 0;
        var x = Rule.Abscissas;
        var w = Rule.Weights;
        for (int i = 0; i < x.Length; i++)
        {
            double y = x[i] * a;
            sum += w[i] * Math.Cos(Math.PI * x[i]) * Complex.FromPolarCoordinates(1, -q * y * y + k * y * sinElevation);
        }
        return sum * a;
    }

    /// <summary>Vertical pattern power |F(φ)|² relative to broadside (where it peaks: the aperture field is symmetric).</summary>
    /// <param name="f">Frequency.</param>
    /// <param name="elevation">Elevation φ from boresight, |φ| ≤ 90°.</param>
    public double RelativePower(Frequency f, Angle elevation)
    {
        double c = 0.5 * (1 + Math.Cos(elevation.Radians));
        var v = c * ApertureIntegral(f, Math.Sin(elevation.Radians)) / ApertureIntegral(f, 0);
        return v.Real * v.Real + v.Imaginary * v.Imaginary;
    }

    /// <summary>The vertical cut on a grid of elevations from −90° to +90°, dB relative to broadside.</summary>
    /// <param name="f">Frequency.</param>
    /// <param name="points">Number of angles, ≥ 3, odd for broadside on the grid (default 721: 0.25° steps).</param>
    public (double[] ElevationDeg, double[] LevelDb) Cut(Frequency f, int points = 721)
    {
        if (points < 3) throw new ArgumentOutOfRangeException(nameof(points), points, "a cut needs at least 3 angles");
        var deg = new double[points];
        var db = new double[points];
        for (int i = 0; i < points; i++)
        {
            deg[i] = -90 + 180.0 * i / (points - 1);
            db[i] = 10 * Math.Log10(Math.Max(RelativePower(f, Angle.FromDegrees(deg[i])), 1e-30));
        }
        return (deg, db);
    }

    /// <summary>Full vertical half-power beamwidth: twice the elevation where |F|² falls to ½ (bracketed on a 0.1° scan, then Brent).</summary>
    /// <param name="f">Frequency.</param>
    /// <exception cref="InfeasibleDesignException">The pattern stays above half power to ±90° (an aperture too small for a beam).</exception>
    public Angle HalfPowerBeamwidth(Frequency f)
    {
        double Excess(double deg) => RelativePower(f, Angle.FromDegrees(deg)) - 0.5;
        for (double d = 0.1; d <= 90; d += 0.1)
            if (Excess(d) < 0) return Angle.FromDegrees(2 * Brent.FindRoot(Excess, d - 0.1, d, 1e-9, 200));
        throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
            $"a flare aperture of {Aperture.Millimeters:0.#} mm has no vertical half-power beam at {f}: make the aperture taller"));
    }

    /// <summary>
    /// The first vertical sidelobe relative to broadside, dB, and its elevation: the highest point between the first
    /// minimum and the next minimum (0.05° scan); null when the pattern has no minimum before 90°.
    /// </summary>
    /// <param name="f">Frequency.</param>
    public (double LevelDb, Angle Elevation)? FirstSidelobe(Frequency f)
    {
        const double step = 0.05;
        double prev = RelativePower(f, Angle.FromRadians(0)), d = step;
        double cur = RelativePower(f, Angle.FromDegrees(d));
        while (d < 90 && cur <= prev) { prev = cur; d += step; cur = RelativePower(f, Angle.FromDegrees(d)); }
        if (d >= 90) return null;
        double best = cur, at = d;
        while (d < 90)
        {
            d += step;
            double next = RelativePower(f, Angle.FromDegrees(d));
            if (next > best) { best = next; at = d; }
            else if (next < cur) break;
            cur = next;
        }
        return (10 * Math.Log10(best), Angle.FromDegrees(at));
    }

    /// <summary>
    /// Loss of broadside gain from the quadratic phase error, dB (positive): 10 log10 of |∫E_ideal|² / |∫E|²
    /// (Balanis 2016, §13.2: the phase error's reduction of the H-plane horn's directivity).
    /// </summary>
    /// <param name="f">Frequency.</param>
    public double PhaseErrorLossDb(Frequency f)
    {
        var ideal = ApertureIntegral(f, 0, false).Magnitude;
        var real = ApertureIntegral(f, 0).Magnitude;
        return 20 * Math.Log10(ideal / real);
    }

    /// <summary>Two-dimensional vertical directivity d_V = 2π / ∫ |F/F(0)|² dφ over the front half-plane (Gauss–Legendre, 512 points).</summary>
    /// <param name="f">Frequency.</param>
    public double VerticalDirectivity(Frequency f)
        => 2 * Math.PI / GaussLegendreRule.Integrate(p => RelativePower(f, Angle.FromRadians(p)), -Math.PI / 2, Math.PI / 2, 512);

    /// <summary>
    /// Attenuation of the evanescent stretch where the plates are closer than λ/2, dB (0 when the throat is already
    /// λ/2 or taller); see remarks.
    /// </summary>
    /// <param name="f">Frequency.</param>
    /// <exception cref="InfeasibleDesignException">The aperture is not taller than λ/2: the field never propagates.</exception>
    public double ThroatLossDb(Frequency f)
    {
        double half = f.FreeSpaceWavelength.Meters / 2, t = Throat.Meters, a = Aperture.Meters, l = Length.Meters;
        if (!(a > half))
            throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
                $"the flare's aperture {a * 1e3:0.#} mm is not taller than half a wavelength ({half * 1e3:0.#} mm at {f}): the slots' field (E along the guide, parallel to the plates) is cut off all the way out; make the aperture taller than {half * 1e3:0.#} mm"));
        if (t >= half) return 0;
        double xc = (half - t) * l / (a - t), k = f.FreeSpaceWavenumber;
        double integral = GaussLegendreRule.Integrate(x =>
        {
            double h = t + (a - t) * x / l, kc = Math.PI / h;
            return kc > k ? Math.Sqrt(kc * kc - k * k) : 0;
        }, 0, xc, 64);
        return DbPerNeper * integral;
    }

    /// <summary>Where the plates reach λ/2 apart, measured from the slotted face (0 when the throat is already that tall).</summary>
    /// <param name="f">Frequency.</param>
    public Length CutoffPlane(Frequency f)
    {
        double half = f.FreeSpaceWavelength.Meters / 2, t = Throat.Meters;
        return t >= half ? Length.FromMeters(0) : Length.FromMeters((half - t) * Length.Meters / (Aperture.Meters - t));
    }

    /// <summary>Validates the geometry (throat and length positive, aperture at least the throat).</summary>
    /// <exception cref="ArgumentException">A dimension is out of range (the message names it).</exception>
    public SectoralFlare Validated()
    {
        if (!(Throat.Meters > 0) || !(Length.Meters > 0) || !(Aperture.Meters >= Throat.Meters))
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                $"flare {Length.Millimeters:0.###} mm long from a {Throat.Millimeters:0.###} mm throat to a {Aperture.Millimeters:0.###} mm aperture: the length must be positive and the aperture at least the throat"));
        return this;
    }
}
