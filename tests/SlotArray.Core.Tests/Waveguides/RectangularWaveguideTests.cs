using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Waveguides;

/// <summary>
/// TE10 quantities against check values computed with
/// numpy [N] from Pozar, Microwave Engineering, 4th ed., 2012, Sec. 3.3 and eq. 3.96). Tolerance 1e-6 relative for
/// closed forms whose reference is quoted to 6–7 significant digits.
/// </summary>
public class RectangularWaveguideTests
{
    private const string Ref = "Pozar 2012 Sec. 3.3, numpy [N]";
    private static RectangularWaveguide Wr90(Metal metal) =>
        RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), metal);

    private static readonly Metal Cu58 = new("copper", 5.8e7, "test");

    [Fact]
    public void Wr90_at_9_375_GHz_matches_cutoff_guide_wavelength_beta_and_impedance()
    {
        var g = Wr90(Cu58);
        var f = Frequency.FromGigahertz(9.375);
        Check.Relative(6.557140e9, g.CutoffTe10.Hertz, 1e-6, Ref);
        Check.Relative(31.97786e-3, f.FreeSpaceWavelength.Meters, 1e-6, Ref);
        Check.Relative(44.74288e-3, g.GuideWavelength(f).Meters, 1e-6, Ref);
        Check.Relative(140.4287, g.PhaseConstant(f), 1e-6, Ref);
        Check.Relative(527.115, g.WaveImpedance(f), 1e-6, Ref);
    }

    [Fact]
    public void Wr90_copper_loss_at_9_375_and_10_GHz()
    {
        var g = Wr90(Cu58);
        var f = Frequency.FromGigahertz(9.375);
        Check.Relative(0.0252611, g.SurfaceResistance(f), 1e-5, Ref);
        Check.Relative(0.0132497, g.ConductorAttenuation(f), 1e-5, Ref);
        Check.Relative(0.115086, g.ConductorAttenuationDecibelsPerMeter(f), 1e-5, Ref);
        var f10 = Frequency.FromGigahertz(10);
        Check.Relative(39.70712e-3, g.GuideWavelength(f10).Meters, 1e-6, Ref);
        Check.Relative(498.974, g.WaveImpedance(f10), 1e-6, Ref);
        Check.Relative(0.0124783, g.ConductorAttenuation(f10), 1e-5, Ref);
        Check.Relative(0.108385, g.ConductorAttenuationDecibelsPerMeter(f10), 1e-5, Ref);
        // The commonly quoted figure for copper WR-90 at 10 GHz is about 0.11 dB/m (common practice, from memory).
        Check.Absolute(0.11, g.ConductorAttenuationDecibelsPerMeter(f10), 0.005, "commonly quoted ≈ 0.11 dB/m (from memory)");
    }

    [Fact]
    public void Wr90_aluminium_loss_at_9_375_GHz()
    {
        var g = Wr90(new Metal("al", 3.5e7, "test"));
        Check.Relative(0.0170564, g.ConductorAttenuation(Frequency.FromGigahertz(9.375)), 1e-5, Ref);
    }

    [Theory]
    [InlineData(9.375, 0.9914e6)]
    [InlineData(10.0, 1.0473e6)]
    public void Wr90_breakdown_power_with_3_MV_per_m_peak(double ghz, double watts)
        => Check.Relative(watts, Wr90(Cu58).BreakdownPower(Frequency.FromGigahertz(ghz)), 1e-4, Ref);

    [Fact]
    public void Wr28_at_35_GHz_and_Wr284_at_3_05_GHz()
    {
        var wr28 = RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-28")!, Length.Zero, Cu58);
        var f = Frequency.FromGigahertz(35);
        Check.Relative(10.7289e-3, wr28.GuideWavelength(f).Meters, 1e-5, Ref);
        Check.Relative(0.0621854, wr28.ConductorAttenuation(f), 1e-5, Ref);
        Check.Relative(0.54014, wr28.ConductorAttenuationDecibelsPerMeter(f), 1e-5, Ref);
        Check.Relative(120.6e3, wr28.BreakdownPower(f), 1e-3, Ref);

        var wr284 = RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-284")!, Length.Zero, Cu58);
        var f2 = Frequency.FromGigahertz(3.05);
        Check.Relative(134.279e-3, wr284.GuideWavelength(f2).Meters, 1e-5, Ref);
        Check.Relative(0.00220749, wr284.ConductorAttenuation(f2), 1e-5, Ref);
        Check.Relative(0.019174, wr284.ConductorAttenuationDecibelsPerMeter(f2), 1e-4, Ref);
        Check.Relative(10.73e6, wr284.BreakdownPower(f2), 1e-3, Ref);
    }

    [Fact]
    public void Single_mode_band_of_wr90_ends_at_te20()
    {
        var g = Wr90(Cu58);
        Check.Relative(2 * 6.557140e9, g.SingleModeBand.High.Hertz, 1e-6, "TE20 cutoff v/a (Pozar Sec. 3.3)");
        Assert.Equal("TE20", g.NextModeName);
        // TE01 of WR-90: c/(2b) = 14.7536 GHz, computed here from c exactly and b = 0.400 in.
        Check.Relative(299792458.0 / (2 * 0.4 * 0.0254), g.CutoffTe01.Hertz, 1e-12, "c/(2b), Pozar Sec. 3.3");
    }

    [Fact]
    public void Dielectric_fill_lowers_cutoff_by_root_epsilon()
    {
        var air = Wr90(Cu58);
        var filled = air with { RelativePermittivity = 2.25 };
        Check.Relative(air.CutoffTe10.Hertz / 1.5, filled.CutoffTe10.Hertz, 1e-12, "f_c = v/(2a), v = c/√εr (Pozar Sec. 3.3)");
    }

    [Fact]
    public void Roughness_raises_loss_and_tends_to_factor_two()
    {
        var smooth = Wr90(Cu58);
        var f = Frequency.FromGigahertz(10);
        var rough = smooth with { SurfaceRoughness = Length.FromMillimeters(0.1) };
        // Hammerstad factor saturates at 2 for Δ ≫ δ (Hammerstad & Jensen 1980, from memory).
        Check.Relative(2 * smooth.ConductorAttenuation(f), rough.ConductorAttenuation(f), 1e-3, "Hammerstad K → 2");
    }

    [Fact]
    public void Below_cutoff_is_an_error_that_names_the_cutoff()
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => Wr90(Cu58).PhaseConstant(Frequency.FromGigahertz(6)));
        Assert.Contains("6.55714", e.Message);
    }

    [Fact]
    public void Narrow_wall_not_below_broad_wall_is_rejected()
        => Assert.Throws<ArgumentOutOfRangeException>(() =>
            RectangularWaveguide.Create(Length.FromMillimeters(10), Length.FromMillimeters(10), Length.Zero, Metal.Copper));
}
