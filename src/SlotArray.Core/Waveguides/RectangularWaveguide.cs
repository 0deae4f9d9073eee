using System.Numerics;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Waveguides;

/// <summary>
/// A rectangular metal waveguide operated in the TE10 mode: inside dimensions, wall thickness where the
/// slots are cut, wall conductivity, optional dielectric fill and surface roughness. Immutable; build it
/// with <c>Create</c> (which validates) and vary it with <c>with</c>.
/// </summary>
/// <remarks>
/// Formulas: D. M. Pozar, <i>Microwave Engineering</i>, 4th ed., Wiley 2012, Sec. 3.3 (TE_mn cutoff,
/// β, λg, Z_TE; conductor attenuation of TE10, eq. 3.96).
/// Walls are non-magnetic (μ = μ0); the filling is lossless with relative permittivity εr ≥ 1.
/// Surface roughness raises conductor loss by the Hammerstad factor
/// K = 1 + (2/π) atan(1.4 (Δ/δ)²) (E. Hammerstad and Ø. Jensen, "Accurate models for microstrip
/// computer-aided design", IEEE MTT-S Int. Microwave Symp. Digest, 1980, pp. 407–409; from memory).
/// </remarks>
/// <param name="Designation">"WR-90" for a catalogue size, or "custom".</param>
/// <param name="BroadWall">Inside broad dimension a; a &gt; b &gt; 0.</param>
/// <param name="NarrowWall">Inside narrow dimension b.</param>
/// <param name="WallThickness">Thickness of the broad wall where slots are cut; ≥ 0.</param>
/// <param name="Conductivity">Wall conductivity σ, S/m; &gt; 0.</param>
/// <param name="MetalName">Name of the wall metal, for reports ("aluminium", or "σ = … S/m").</param>
/// <param name="RelativePermittivity">Relative permittivity εr of the filling; ≥ 1 (air: 1).</param>
/// <param name="SurfaceRoughness">RMS surface roughness Δ of the inside walls; ≥ 0 (smooth: 0).</param>
public sealed record RectangularWaveguide(
    string Designation,
    Length BroadWall,
    Length NarrowWall,
    Length WallThickness,
    double Conductivity,
    string MetalName,
    double RelativePermittivity,
    Length SurfaceRoughness) : IGuideMode
{
    /// <summary>Default breakdown field of dry air at sea level, 3 MV/m, read as a peak value (Pozar, Sec. 3.3, from memory).</summary>
    public const double AirBreakdownField = 3.0e6;

    /// <summary>Validated construction. Throws <see cref="ArgumentOutOfRangeException"/> naming the bad value.</summary>
    public static RectangularWaveguide Create(Length broadWall, Length narrowWall, Length wallThickness, Metal metal,
        string designation = "custom", double relativePermittivity = 1.0, Length surfaceRoughness = default)
        => Create(broadWall, narrowWall, wallThickness, metal.Conductivity, metal.Name, designation, relativePermittivity, surfaceRoughness);

    /// <summary>Validated construction from a conductivity. Throws <see cref="ArgumentOutOfRangeException"/> naming the bad value.</summary>
    public static RectangularWaveguide Create(Length broadWall, Length narrowWall, Length wallThickness, double conductivity,
        string metalName, string designation = "custom", double relativePermittivity = 1.0, Length surfaceRoughness = default)
    {
        Require(broadWall.Meters, nameof(broadWall), v => v > 0, "must be a positive length");
        Require(narrowWall.Meters, nameof(narrowWall), v => v > 0, "must be a positive length");
        if (narrowWall >= broadWall)
            throw new ArgumentOutOfRangeException(nameof(narrowWall), narrowWall.ToString(),
                $"the narrow wall b = {narrowWall} must be smaller than the broad wall a = {broadWall}");
        Require(wallThickness.Meters, nameof(wallThickness), v => v >= 0, "must be zero or positive");
        Require(conductivity, nameof(conductivity), v => v > 0, "must be a positive conductivity in S/m");
        Require(relativePermittivity, nameof(relativePermittivity), v => v >= 1, "must be at least 1");
        Require(surfaceRoughness.Meters, nameof(surfaceRoughness), v => v >= 0, "must be zero or positive");
        return new RectangularWaveguide(designation, broadWall, narrowWall, wallThickness, conductivity, metalName,
            relativePermittivity, surfaceRoughness);
    }

    /// <summary>A catalogue guide with the given wall and metal.</summary>
    public static RectangularWaveguide FromStandard(StandardWaveguide standard, Length wallThickness, Metal metal)
        => Create(standard.BroadWall, standard.NarrowWall, wallThickness, metal, standard.Designation);

    private static void Require(double v, string name, Func<double, bool> ok, string what)
    {
        if (!double.IsFinite(v) || !ok(v)) throw new ArgumentOutOfRangeException(name, v, $"{name} {what}");
    }

    /// <summary>Phase velocity of a plane wave in the filling, c/√εr (m/s).</summary>
    public double MediumVelocity => PhysicalConstants.SpeedOfLight / Math.Sqrt(RelativePermittivity);

    /// <summary>Intrinsic impedance of the filling, η0/√εr (Ω).</summary>
    public double MediumImpedance => PhysicalConstants.Eta0 / Math.Sqrt(RelativePermittivity);

    /// <summary>Cutoff of the TE_mn (or TM_mn) mode: f_c = (v/2) √((m/a)² + (n/b)²). Pozar Sec. 3.3.</summary>
    public Frequency CutoffFrequency(int m, int n)
    {
        if (m < 0 || n < 0 || (m == 0 && n == 0)) throw new ArgumentOutOfRangeException(nameof(m), $"mode ({m},{n}) does not exist");
        double a = BroadWall.Meters, b = NarrowWall.Meters;
        return Frequency.FromHertz(MediumVelocity / 2 * Math.Sqrt((m / a) * (m / a) + (n / b) * (n / b)));
    }

    /// <summary>TE10 cutoff, v/(2a).</summary>
    public Frequency CutoffTe10 => CutoffFrequency(1, 0);
    /// <summary>TE20 cutoff, v/a.</summary>
    public Frequency CutoffTe20 => CutoffFrequency(2, 0);
    /// <summary>TE01 cutoff, v/(2b).</summary>
    public Frequency CutoffTe01 => CutoffFrequency(0, 1);

    /// <summary>The single-mode (TE10 only) band: from the TE10 cutoff to the lower of the TE20 and TE01 cutoffs.</summary>
    public (Frequency Low, Frequency High) SingleModeBand =>
        (CutoffTe10, CutoffTe20 < CutoffTe01 ? CutoffTe20 : CutoffTe01);

    /// <summary>Name of the mode that ends the single-mode band ("TE20" or "TE01").</summary>
    public string NextModeName => CutoffTe20 < CutoffTe01 ? "TE20" : "TE01";

    /// <summary>Wavenumber in the filling k = 2πf/v (rad/m).</summary>
    public double MediumWavenumber(Frequency f) => 2 * Math.PI * f.Hertz / MediumVelocity;

    /// <summary>TE10 phase constant β = √(k² − (π/a)²) (rad/m). Pozar Sec. 3.3. Throws below cutoff.</summary>
    public double PhaseConstant(Frequency f)
    {
        double k = MediumWavenumber(f), kc = Math.PI / BroadWall.Meters;
        if (!(k > kc))
            throw new ArgumentOutOfRangeException(nameof(f), f.ToString(),
                $"{f} is at or below the TE10 cutoff {CutoffTe10} of this guide: the mode does not propagate");
        return Math.Sqrt(k * k - kc * kc);
    }

    /// <summary>TE10 guide wavelength λg = 2π/β. Pozar Sec. 3.3.</summary>
    public Length GuideWavelength(Frequency f) => Length.FromMeters(2 * Math.PI / PhaseConstant(f));

    /// <summary>TE10 wave impedance Z_TE = η k/β (Ω). Pozar Sec. 3.3.</summary>
    public double WaveImpedance(Frequency f) => MediumImpedance * MediumWavenumber(f) / PhaseConstant(f);

    /// <summary>Surface resistance R_s = √(π f μ0/σ) (Ω). Pozar Sec. 1.7.</summary>
    public double SurfaceResistance(Frequency f) => Math.Sqrt(Math.PI * f.Hertz * PhysicalConstants.Mu0 / Conductivity);

    /// <summary>Skin depth δ = 1/√(π f μ0 σ) of the walls.</summary>
    public Length SkinDepth(Frequency f) => Length.FromMeters(1.0 / Math.Sqrt(Math.PI * f.Hertz * PhysicalConstants.Mu0 * Conductivity));

    /// <summary>Hammerstad roughness factor K = 1 + (2/π) atan(1.4 (Δ/δ)²); 1 for smooth walls.</summary>
    public double RoughnessFactor(Frequency f)
    {
        double r = SurfaceRoughness.Meters / SkinDepth(f).Meters;
        return 1 + 2 / Math.PI * Math.Atan(1.4 * r * r);
    }

    /// <summary>
    /// TE10 conductor attenuation α_c = R_s (2bπ² + a³k²)/(a³ b β k η) × K (Np/m).
    /// Pozar, <i>Microwave Engineering</i>, 4th ed., eq. (3.96); K the roughness factor.
    /// </summary>
    public double ConductorAttenuation(Frequency f)
    {
        double a = BroadWall.Meters, b = NarrowWall.Meters, k = MediumWavenumber(f), beta = PhaseConstant(f);
        return SurfaceResistance(f) * (2 * b * Math.PI * Math.PI + a * a * a * k * k)
            / (a * a * a * b * beta * k * MediumImpedance) * RoughnessFactor(f);
    }

    /// <summary>Conductor attenuation in dB/m (8.6859 × Np/m).</summary>
    public double ConductorAttenuationDecibelsPerMeter(Frequency f) => 20 / Math.Log(10) * ConductorAttenuation(f);

    /// <summary>Complex propagation constant γ = α_c + jβ (1/m); the filling is lossless.</summary>
    public Complex PropagationConstant(Frequency f) => new(ConductorAttenuation(f), PhaseConstant(f));

    /// <summary>
    /// Theoretical breakdown-limited power of a matched line, P_max = a b E_bd²/(4 Z_TE) (W), with E_bd the peak
    /// breakdown field (default 3 MV/m, dry air at sea level). Pozar Sec. 3.3. Never design to this figure:
    /// the Safety namespace applies the usual derating.
    /// </summary>
    public double BreakdownPower(Frequency f, double breakdownField = AirBreakdownField)
        => BroadWall.Meters * NarrowWall.Meters * breakdownField * breakdownField / (4 * WaveImpedance(f));
}
