using System.Numerics;

namespace SlotArray.FullWave.Results;

/// <summary>
/// Incident and reflected TE10 wave voltages at a port from its modal voltage U and current I (current positive in
/// the port's direction, into the structure) and the mode's wave impedance Z:
/// u_inc = (U + Z I)/2, u_ref = U − u_inc (D. M. Pozar, Microwave Engineering, 4th ed., Wiley 2012, section 4.3,
/// eqs. 4.40–4.41 with U = V⁺ + V⁻ and Z I = V⁺ − V⁻, from memory).
/// </summary>
/// <param name="Incident">Wave travelling into the structure, V.</param>
/// <param name="Reflected">Wave travelling out of it, V.</param>
internal readonly record struct PortWaves(Complex Incident, Complex Reflected)
{
    /// <summary>Splits U and I into the two waves with the wave impedance <paramref name="waveImpedanceOhm"/>.</summary>
    public static PortWaves FromVoltageCurrent(Complex voltage, Complex current, double waveImpedanceOhm)
    {
        var inc = 0.5 * (voltage + waveImpedanceOhm * current);
        return new PortWaves(inc, voltage - inc);
    }

    /// <summary>
    /// The TE10 wave impedance of an air-filled guide of broad dimension a: Z = η0 k/β, β = √(k² − (π/a)²)
    /// (Pozar 2012, eq. 3.86, from memory); the same analytic impedance the engine's own port post-processing uses.
    /// </summary>
    public static double Te10WaveImpedance(double frequencyHz, double broadWallMeters) =>
        Core.Quantities.PhysicalConstants.Eta0 * 2 * Math.PI * frequencyHz / Core.Quantities.PhysicalConstants.SpeedOfLight / Te10PhaseConstant(frequencyHz, broadWallMeters);

    /// <summary>The TE10 phase constant of an air-filled guide, β = √(k² − (π/a)²), rad/m (Pozar 2012, eq. 3.84, from memory).</summary>
    public static double Te10PhaseConstant(double frequencyHz, double broadWallMeters)
    {
        double k = 2 * Math.PI * frequencyHz / Core.Quantities.PhysicalConstants.SpeedOfLight;
        double kc = Math.PI / broadWallMeters;
        if (k <= kc) throw new ArgumentOutOfRangeException(nameof(frequencyHz), frequencyHz, "below the TE10 cutoff");
        return Math.Sqrt(k * k - kc * kc);
    }
}
