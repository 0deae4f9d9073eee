using SlotArray.Core.Quantities;

namespace SlotArray.Core.Safety;

/// <summary>
/// Power density in front of an antenna: far-field formula, the distances that bound the regions of an aperture's
/// field, and the near-field upper bound of FCC OET Bulletin 65. All powers are time-averaged (W), densities W/m².
/// </summary>
/// <remarks>
/// The far-field formula S = P G/(4π R²) is the Friis free-space power density (H. T. Friis, "A note on a simple
/// transmission formula", Proc. IRE 34, 254–256, 1946; from memory).
/// It holds beyond the far-field distance 2D²/λ; closer in it over-estimates the on-axis density of a focused
/// (in-phase) aperture and is used only as a conservative screen (FCC OET Bulletin 65, Ed. 97-01, 1997).
/// </remarks>
internal static class PowerDensity
{
    /// <summary>
    /// Far-field power density on the beam axis, S = P G/(4π R²) (W/m²) (Friis 1946).
    /// </summary>
    /// <param name="averagePower">Time-averaged power accepted by the antenna, W; ≥ 0 (P_avg = P_peak × duty cycle).</param>
    /// <param name="gainDbi">Antenna gain on the beam axis, dBi.</param>
    /// <param name="distance">Distance from the antenna, &gt; 0.</param>
    public static double FarFieldOnAxis(double averagePower, double gainDbi, Length distance)
    {
        RequirePower(averagePower);
        RequireFinite(gainDbi, nameof(gainDbi));
        RequirePositive(distance, nameof(distance));
        return averagePower * Linear(gainDbi) / (4 * Math.PI * distance.Meters * distance.Meters);
    }

    /// <summary>
    /// The on-axis distance at which the far-field density falls to <paramref name="powerDensity"/>:
    /// R = √(P G/(4π S)), the inverse of <see cref="FarFieldOnAxis"/>.
    /// </summary>
    /// <param name="averagePower">Time-averaged power, W; ≥ 0.</param>
    /// <param name="gainDbi">Gain, dBi.</param>
    /// <param name="powerDensity">The level, W/m²; &gt; 0.</param>
    public static Length DistanceToLevel(double averagePower, double gainDbi, double powerDensity)
    {
        RequirePower(averagePower);
        RequireFinite(gainDbi, nameof(gainDbi));
        if (!(double.IsFinite(powerDensity) && powerDensity > 0))
            throw new ArgumentOutOfRangeException(nameof(powerDensity), powerDensity, "powerDensity must be a positive density in W/m²");
        return Length.FromMeters(Math.Sqrt(averagePower * Linear(gainDbi) / (4 * Math.PI * powerDensity)));
    }

    /// <summary>
    /// Far-field (Fraunhofer) distance 2D²/λ, D the largest aperture dimension (
    /// the conventional 2D²/λ criterion, e.g. IEEE Std 145, from memory).
    /// </summary>
    /// <param name="largestDimension">Largest aperture dimension D, &gt; 0.</param>
    /// <param name="f">Frequency.</param>
    public static Length FarFieldDistance(Length largestDimension, Frequency f) => Scaled(largestDimension, f, 2.0);

    /// <summary>
    /// Near-field / transition boundary of OET-65, D²/(4λ) [M, Medium] (FCC OET Bulletin 65, Ed. 97-01, 1997).
    /// </summary>
    /// <param name="largestDimension">Largest aperture dimension D, &gt; 0.</param>
    /// <param name="f">Frequency.</param>
    public static Length NearFieldBoundary(Length largestDimension, Frequency f) => Scaled(largestDimension, f, 0.25);

    /// <summary>
    /// Start of the far field as OET-65 places it, 0.6 D²/λ [M, Medium] (FCC OET Bulletin 65, Ed. 97-01, 1997).
    /// </summary>
    /// <param name="largestDimension">Largest aperture dimension D, &gt; 0.</param>
    /// <param name="f">Frequency.</param>
    public static Length FarFieldStart(Length largestDimension, Frequency f) => Scaled(largestDimension, f, 0.6);

    /// <summary>
    /// Upper bound of the on-axis power density in the near field of an aperture, S_max ≈ 4P/A (W/m²), A the physical
    /// aperture area [M] (FCC OET Bulletin 65, Ed. 97-01, 1997, near-field formula with aperture efficiency 1).
    /// </summary>
    /// <param name="averagePower">Time-averaged power, W; ≥ 0.</param>
    /// <param name="apertureLength">Aperture length, &gt; 0.</param>
    /// <param name="apertureWidth">Aperture width, &gt; 0.</param>
    public static double NearFieldUpperBound(double averagePower, Length apertureLength, Length apertureWidth)
    {
        RequirePower(averagePower);
        RequirePositive(apertureLength, nameof(apertureLength));
        RequirePositive(apertureWidth, nameof(apertureWidth));
        return 4 * averagePower / (apertureLength.Meters * apertureWidth.Meters);
    }

    /// <summary>
    /// Time-averaging factor for a rotating antenna, θ_3dB/360° (the fraction of each turn a point spends in the
    /// main beam) [C: common practice, no source].
    /// </summary>
    /// <param name="azimuthBeamwidth">Half-power beamwidth in the plane of rotation; 0 &lt; θ ≤ 360°.</param>
    public static double RotationFactor(Angle azimuthBeamwidth)
    {
        double deg = azimuthBeamwidth.Degrees;
        if (!(double.IsFinite(deg) && deg > 0 && deg <= 360))
            throw new ArgumentOutOfRangeException(nameof(azimuthBeamwidth), azimuthBeamwidth.ToString(), "the beamwidth must be above 0° and at most 360°");
        return deg / 360.0;
    }

    /// <summary>Linear gain from dBi, 10^(G/10).</summary>
    internal static double Linear(double gainDbi) => Math.Pow(10, gainDbi / 10);

    private static Length Scaled(Length d, Frequency f, double k)
    {
        RequirePositive(d, nameof(d));
        if (!(double.IsFinite(f.Hertz) && f.Hertz > 0)) throw new ArgumentOutOfRangeException(nameof(f), f.ToString(), "the frequency must be positive");
        return Length.FromMeters(k * d.Meters * d.Meters / f.FreeSpaceWavelength.Meters);
    }

    private static void RequirePower(double p)
    {
        if (!(double.IsFinite(p) && p >= 0)) throw new ArgumentOutOfRangeException(nameof(p), p, "the average power must be zero or a positive number of watts");
    }

    private static void RequireFinite(double v, string name)
    {
        if (!double.IsFinite(v)) throw new ArgumentOutOfRangeException(name, v, $"{name} must be a finite number");
    }

    private static void RequirePositive(Length l, string name)
    {
        if (!(double.IsFinite(l.Meters) && l.Meters > 0)) throw new ArgumentOutOfRangeException(name, l.ToString(), $"{name} must be a positive length");
    }
}
