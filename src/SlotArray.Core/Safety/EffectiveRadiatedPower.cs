namespace SlotArray.Core.Safety;

/// <summary>
/// Equivalent isotropically radiated power on the beam axis: EIRP = P G, the power an isotropic radiator would need
/// to give the same power density on the beam axis (the definition of EIRP, IEEE Std 145-2013, "IEEE Standard for
/// Definitions of Terms for Antennas", from memory). P is the power accepted by the antenna; G the gain (which
/// already includes the mismatch and wall losses of this tool's gain figure, so P is the transmitter's forward power).
/// </summary>
internal static class EffectiveRadiatedPower
{
    /// <summary>EIRP in watts: P × 10^(G/10).</summary>
    /// <param name="power">Transmitter power, W; ≥ 0 and finite.</param>
    /// <param name="gainDbi">Gain on the beam axis, dBi; finite.</param>
    public static double Watts(double power, double gainDbi)
    {
        if (!(power >= 0 && double.IsFinite(power))) throw new ArgumentOutOfRangeException(nameof(power), power, "the power must be zero or positive and finite");
        if (!double.IsFinite(gainDbi)) throw new ArgumentOutOfRangeException(nameof(gainDbi), gainDbi, "the gain must be finite");
        return power * Math.Pow(10, gainDbi / 10);
    }

    /// <summary>EIRP in dBW: 10 log10(P / 1 W) + G.</summary>
    /// <param name="power">Transmitter power, W; &gt; 0 and finite.</param>
    /// <param name="gainDbi">Gain on the beam axis, dBi; finite.</param>
    public static double DecibelWatts(double power, double gainDbi)
    {
        if (!(power > 0 && double.IsFinite(power))) throw new ArgumentOutOfRangeException(nameof(power), power, "the power must be positive and finite");
        return 10 * Math.Log10(power) + gainDbi;
    }
}
