using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Safety;

/// <summary>
/// Power handling of the feed waveguide: the theoretical breakdown-limited power and its derating, and the margin
/// for a given peak power. All powers in W (peak, since breakdown is set by the peak field).
/// </summary>
/// <remarks>
/// P_allowed = P_max × AltitudeFactor / (MismatchFactor × StandingWaveFactor × SafetyFactor), with
/// <list type="bullet">
/// <item>P_max = a b E_bd²/(4 Z_TE), E_bd = 3 MV/m read as a peak field (D. M. Pozar, <i>Microwave Engineering</i>,
/// 4th ed., Wiley 2012, Sec. 3.3; 0.9914 MW for WR-90 at 9.375 GHz [N]);</item>
/// <item>MismatchFactor = (1 + |Γ|)², |Γ| = (VSWR − 1)/(VSWR + 1): the peak field of a line with a reflection grows
/// by 1 + |Γ| [C: common practice, no source];</item>
/// <item>StandingWaveFactor = k², k the peak field of the standing wave inside a resonant array relative to the
/// travelling wave, default k = 2 (power factor 4): a full standing wave, as near the end short, has a peak field twice
/// its forward wave [C: common practice, no source]. For an ideal matched resonant array at its design frequency this project's
/// line model finds the peak field in the array equal to the input travelling wave (k = 1, the slots sit at voltage
/// maxima and λg/2 sections keep |V|); off resonance it rose to about 1.2–1.25. The default 2 is therefore conservative;
/// 1 is the figure for a travelling-wave array;</item>
/// <item>SafetyFactor, default 2 (design to 25–50 % of P_max) for humidity, surface finish, dust and pulse length
/// [C: common practice, no source];</item>
/// <item>AltitudeFactor = (p/p0)²: the breakdown field of air scales roughly with pressure, power with its square
/// [C: common practice, no source], p/p0 from <see cref="StandardAtmosphere"/>.</item>
/// </list>
/// The factors are multiplied, which is conservative: the input mismatch and the standing wave in the array are not
/// independent.
/// </remarks>
/// <param name="Frequency">Frequency.</param>
/// <param name="BreakdownField">Peak breakdown field of air at sea level used, V/m.</param>
/// <param name="TheoreticalMaximum">P_max of a matched line at sea level, W.</param>
/// <param name="Vswr">VSWR of the feed line, ≥ 1.</param>
/// <param name="ReflectionMagnitude">|Γ| = (VSWR − 1)/(VSWR + 1).</param>
/// <param name="MismatchFactor">(1 + |Γ|)².</param>
/// <param name="StandingWaveFieldFactor">Peak-field factor k of the standing wave in the array (1: none).</param>
/// <param name="StandingWaveFactor">k², the power derating for the standing wave.</param>
/// <param name="SafetyFactor">Safety factor on power, ≥ 1.</param>
/// <param name="Altitude">Altitude above sea level, m.</param>
/// <param name="AltitudeFactor">(p/p0)² at that altitude, ≤ 1.</param>
/// <param name="AllowedPeakPower">The derated power handling, W.</param>
/// <param name="PeakPower">The transmitter's peak power, W, or null when none was given.</param>
/// <param name="MarginDecibels">10 log10(AllowedPeakPower / PeakPower), dB; negative when the peak power exceeds the
/// derated handling; null without a peak power.</param>
internal sealed record PowerHandling(
    Frequency Frequency,
    double BreakdownField,
    double TheoreticalMaximum,
    double Vswr,
    double ReflectionMagnitude,
    double MismatchFactor,
    double StandingWaveFieldFactor,
    double StandingWaveFactor,
    double SafetyFactor,
    double Altitude,
    double AltitudeFactor,
    double AllowedPeakPower,
    double? PeakPower,
    double? MarginDecibels)
{
    /// <summary>Default safety factor on power, 2 [C: common practice, no source].</summary>
    public const double DefaultSafetyFactor = 2.0;
    /// <summary>Default peak-field factor of the standing wave in a resonant array, 2 [C: common practice, no source].</summary>
    public const double ResonantArrayFieldFactor = 2.0;

    /// <summary>The product of all derating factors, P_max / P_allowed.</summary>
    public double TotalDerating => TheoreticalMaximum / AllowedPeakPower;

    /// <summary>Whether a peak power was given and lies within the derated handling (margin ≥ 0 dB).</summary>
    public bool WithinRating => MarginDecibels is >= 0;

    /// <summary>Reflection magnitude from VSWR, |Γ| = (S − 1)/(S + 1) (Pozar 2012, Sec. 2.3, from memory).</summary>
    /// <param name="vswr">Voltage standing-wave ratio, ≥ 1.</param>
    public static double ReflectionFromVswr(double vswr)
    {
        if (!(double.IsFinite(vswr) && vswr >= 1)) throw new ArgumentOutOfRangeException(nameof(vswr), vswr, "the VSWR must be at least 1");
        return (vswr - 1) / (vswr + 1);
    }

    /// <summary>Derates the breakdown power of <paramref name="guide"/> at <paramref name="frequency"/>; see the type's remarks.</summary>
    /// <param name="guide">The feed waveguide.</param>
    /// <param name="frequency">Frequency (above the TE10 cutoff).</param>
    /// <param name="vswr">VSWR of the feed line, ≥ 1; default 1 (matched).</param>
    /// <param name="standingWaveFieldFactor">Peak-field factor k of a standing wave in the array, 1 ≤ k ≤ 2; default 2
    /// (resonant array); 1 for a travelling-wave array.</param>
    /// <param name="safetyFactor">Safety factor on power, ≥ 1; default 2.</param>
    /// <param name="altitude">Altitude above sea level, m, 0–11 000; default 0.</param>
    /// <param name="peakPower">Transmitter peak power, W, &gt; 0; null for none.</param>
    /// <param name="breakdownField">Peak breakdown field of air at sea level, V/m; default 3 MV/m.</param>
    public static PowerHandling Assess(RectangularWaveguide guide, Frequency frequency, double vswr = 1.0,
        double standingWaveFieldFactor = ResonantArrayFieldFactor, double safetyFactor = DefaultSafetyFactor,
        double altitude = 0.0, double? peakPower = null, double breakdownField = RectangularWaveguide.AirBreakdownField)
    {
        ArgumentNullException.ThrowIfNull(guide);
        double gamma = ReflectionFromVswr(vswr);
        if (!(double.IsFinite(standingWaveFieldFactor) && standingWaveFieldFactor >= 1 && standingWaveFieldFactor <= 2))
            throw new ArgumentOutOfRangeException(nameof(standingWaveFieldFactor), standingWaveFieldFactor, "the standing-wave field factor must lie between 1 and 2");
        if (!(double.IsFinite(safetyFactor) && safetyFactor >= 1))
            throw new ArgumentOutOfRangeException(nameof(safetyFactor), safetyFactor, "the safety factor must be at least 1");
        if (!(double.IsFinite(breakdownField) && breakdownField > 0))
            throw new ArgumentOutOfRangeException(nameof(breakdownField), breakdownField, "the breakdown field must be a positive number of V/m");
        if (peakPower is { } pk && !(double.IsFinite(pk) && pk > 0))
            throw new ArgumentOutOfRangeException(nameof(peakPower), pk, "the peak power must be a positive number of watts");

        double pMax = guide.BreakdownPower(frequency, breakdownField);
        double mismatch = (1 + gamma) * (1 + gamma);
        double sw = standingWaveFieldFactor * standingWaveFieldFactor;
        double pr = StandardAtmosphere.PressureRatio(altitude);
        double alt = pr * pr;
        double allowed = pMax * alt / (mismatch * sw * safetyFactor);
        double? margin = peakPower is { } p ? 10 * Math.Log10(allowed / p) : null;
        return new PowerHandling(frequency, breakdownField, pMax, vswr, gamma, mismatch, standingWaveFieldFactor, sw,
            safetyFactor, altitude, alt, allowed, peakPower, margin);
    }
}
