namespace SlotArray.Core.Safety;

/// <summary>
/// Air pressure against altitude in the troposphere of the International Standard Atmosphere, used to scale the
/// breakdown field of air.
/// </summary>
/// <remarks>
/// Barometric formula for a constant lapse rate: p/p0 = (1 − L h/T0)^(g0 M/(R* L)) with T0 = 288.15 K,
/// L = 0.0065 K/m, g0 = 9.80665 m/s², M = 0.0289644 kg/mol, R* = 8.3144598 J/(mol K) (exponent 5.25588), valid
/// 0–11 km, h the geopotential altitude H = r0 z/(r0 + z) of the geometric altitude z, r0 = 6 356 766 m.
/// Source: ISO 2533:1975 "Standard Atmosphere" and U.S. Standard Atmosphere 1976 (NOAA/NASA/USAF), eqs. (18) and (33a)
/// (from memory). Without the geopotential conversion the pressure at 5 km geometric is 0.05 % low against the 1976 table.
/// </remarks>
internal static class StandardAtmosphere
{
    /// <summary>Sea-level standard pressure p0 = 101 325 Pa.</summary>
    public const double SeaLevelPressure = 101_325.0;
    /// <summary>Top of the troposphere layer the formula covers, 11 000 m.</summary>
    public const double TroposphereTop = 11_000.0;

    private const double T0 = 288.15, LapseRate = 0.0065, G0 = 9.80665, MolarMass = 0.0289644, GasConstant = 8.3144598, EarthRadius = 6_356_766.0;

    /// <summary>Pressure ratio p/p0 at a geometric altitude (height above mean sea level), 0–11 000 m.</summary>
    /// <param name="altitude">Geometric altitude above mean sea level, m; 0 ≤ z ≤ 11 000.</param>
    public static double PressureRatio(double altitude)
    {
        if (!(double.IsFinite(altitude) && altitude >= 0 && altitude <= TroposphereTop))
            throw new ArgumentOutOfRangeException(nameof(altitude), altitude,
                $"the altitude must be between 0 and {TroposphereTop:0} m (the troposphere of the standard atmosphere); got {altitude} m");
        double h = EarthRadius * altitude / (EarthRadius + altitude);
        return Math.Pow(1 - LapseRate * h / T0, G0 * MolarMass / (GasConstant * LapseRate));
    }
}
