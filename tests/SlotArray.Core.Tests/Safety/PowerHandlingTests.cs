using SlotArray.Core.Quantities;
using SlotArray.Core.Safety;
using SlotArray.Core.Waveguides;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Safety;

/// <summary>
/// Power-handling derating (common practice [C]) on the check value P_max = 0.9914 MW (WR-90,
/// 9.375 GHz, E_bd = 3 MV/m peak [N]). Derated values are that figure divided by the stated factors (closed form).
/// </summary>
public class PowerHandlingTests
{
    private const string Pmax = "Pozar 2012, Sec. 3.3 [N]: WR-90 9.375 GHz P_max = 0.9914 MW";
    private static readonly Frequency F = Frequency.FromGigahertz(9.375);
    private static RectangularWaveguide Wr90 => RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium);

    [Fact]
    public void Vswr_1_5_gives_gamma_0_2_and_divides_by_1_44()
    {
        var p = PowerHandling.Assess(Wr90, F, vswr: 1.5, standingWaveFieldFactor: 1, safetyFactor: 1);
        Check.Relative(0.2, p.ReflectionMagnitude, 1e-12, "|Γ| = (S−1)/(S+1) for S = 1.5");
        Check.Relative(1.44, p.MismatchFactor, 1e-12, "(1 + 0.2)², common practice [C]");
        Check.Relative(0.9914e6, p.TheoreticalMaximum, 1e-4, Pmax);
        Check.Relative(0.9914e6 / 1.44, p.AllowedPeakPower, 1e-4, Pmax + " ÷ 1.44");
    }

    [Fact]
    public void Resonant_array_defaults_divide_by_4_for_the_standing_wave_and_2_for_safety()
    {
        var p = PowerHandling.Assess(Wr90, F, vswr: 1.5, peakPower: 25e3);
        Assert.Equal(4, p.StandingWaveFactor);     // field ×2 near the short → power ×4 (common practice [C])
        Assert.Equal(2, p.SafetyFactor);
        Check.Relative(0.9914e6 / (1.44 * 4 * 2), p.AllowedPeakPower, 1e-4, Pmax + " ÷ (1.44·4·2) = 86.06 kW");
        Check.Absolute(10 * Math.Log10(0.9914e6 / 11.52 / 25e3), p.MarginDecibels!.Value, 5e-4, "10 log10(86.06 kW / 25 kW) = 5.37 dB");
        Assert.True(p.WithinRating);
    }

    [Fact]
    public void A_peak_power_above_the_rating_gives_a_negative_margin()
    {
        var p = PowerHandling.Assess(Wr90, F, peakPower: 200e3);   // allowed 0.9914 MW / 8 = 123.9 kW
        Check.Absolute(10 * Math.Log10(0.9914e6 / 8 / 200e3), p.MarginDecibels!.Value, 5e-4, Pmax + " ÷ 8 against 200 kW");
        Assert.False(p.WithinRating);
    }

    [Theory]
    [InlineData(1000, 89.876)]
    [InlineData(3000, 70.121)]
    [InlineData(5000, 54.048)]
    public void Standard_atmosphere_pressure(double metres, double kilopascal)
        => Check.Relative(kilopascal * 1e3 / 101_325, StandardAtmosphere.PressureRatio(metres), 5e-5,
            "U.S. Standard Atmosphere 1976 table, pressure at geometric altitude, 5 digits (from memory)");

    [Fact]
    public void Altitude_scales_power_with_the_square_of_pressure()
    {
        var sea = PowerHandling.Assess(Wr90, F);
        var high = PowerHandling.Assess(Wr90, F, altitude: 3000);
        double pr = 70.121 / 101.325;
        Check.Relative(pr * pr, high.AltitudeFactor, 4e-4, "(p/p0)² with p(3000 m) = 70.121 kPa (US Std Atm 1976, from memory)");
        Check.Relative(high.AltitudeFactor, high.AllowedPeakPower / sea.AllowedPeakPower, 1e-12, "definition");
        Assert.Throws<ArgumentOutOfRangeException>(() => PowerHandling.Assess(Wr90, F, altitude: 12_000));
    }

    [Fact]
    public void Bad_factors_are_refused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => PowerHandling.Assess(Wr90, F, vswr: 0.9));
        Assert.Throws<ArgumentOutOfRangeException>(() => PowerHandling.Assess(Wr90, F, safetyFactor: 0.5));
        Assert.Throws<ArgumentOutOfRangeException>(() => PowerHandling.Assess(Wr90, F, standingWaveFieldFactor: 3));
        Assert.Throws<ArgumentOutOfRangeException>(() => PowerHandling.Assess(Wr90, F, peakPower: 0));
    }
}
