namespace SlotArray.Core.Quantities;

/// <summary>Physical constants, SI.</summary>
/// <remarks>
/// c is exact by the SI definition of the metre (BIPM, SI Brochure, 9th ed., 2019).
/// μ0 is taken as 4π×10⁻⁷ H/m, the pre-2019 defined value; the 2019 SI makes it a measured
/// quantity differing by about 1e-10 relative (CODATA 2018), far below any tolerance used here.
/// </remarks>
internal static class PhysicalConstants
{
    /// <summary>Speed of light in vacuum c, m/s (exact).</summary>
    public const double SpeedOfLight = 299_792_458.0;
    /// <summary>Permeability of free space μ0 = 4π×10⁻⁷ H/m.</summary>
    public const double Mu0 = 4e-7 * Math.PI;
    /// <summary>Permittivity of free space ε0 = 1/(μ0 c²), F/m.</summary>
    public const double Epsilon0 = 1.0 / (Mu0 * SpeedOfLight * SpeedOfLight);
    /// <summary>Impedance of free space η0 = μ0 c ≈ 376.730 Ω.</summary>
    public const double Eta0 = Mu0 * SpeedOfLight;
    /// <summary>The "classical" η = 120π Ω used inside Stevenson-type constants (Stevenson 1948).</summary>
    public const double EtaClassical = 120 * Math.PI;
    /// <summary>Radiation resistance of a half-wave dipole as used in Stevenson's constants, 73 Ω.</summary>
    public const double HalfWaveDipoleResistance = 73.0;
}
