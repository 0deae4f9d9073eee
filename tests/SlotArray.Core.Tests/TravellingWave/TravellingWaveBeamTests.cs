using SlotArray.Core.Design;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.TravellingWave;

/// <summary>Beam squint and frequency scan of travelling-wave arrays (Elliott 1981, Ch. 8 check values [N]).</summary>
public class TravellingWaveBeamTests
{
    private static readonly RectangularWaveguide Wr90 =
        RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium);

    [Theory]
    [InlineData(9.000, -6.208)]
    [InlineData(9.375, -2.675)]
    [InlineData(9.750, 0.457)]
    public void Alternating_slots_at_21_mm_point_where_the_reference_says(double ghz, double degrees)
    {
        // Elliott 1981, Ch. 8 [N]: WR-90, alternating, d = 21.000 mm; negative = toward the feed. 3 decimals given.
        var theta = TravellingWaveBeam.Direction(Wr90, Length.FromMillimeters(21), Frequency.FromGigahertz(ghz))!.Value;
        Check.Absolute(degrees, theta.Degrees, 5.1e-4, "Elliott 1981, Ch. 8 [N]");
    }

    [Theory]
    [InlineData(9.000, -3.412)]
    [InlineData(9.375, 0.0)]
    [InlineData(9.750, 3.030)]
    public void Alternating_slots_at_half_the_design_guide_wavelength_scan_through_broadside(double ghz, double degrees)
    {
        // Elliott 1981, Ch. 8 [N]: d = λg0/2 = 22.3714 mm (λg0 at 9.375 GHz).
        var d = 0.5 * Wr90.GuideWavelength(Frequency.FromGigahertz(9.375));
        Check.Absolute(22.3714, d.Millimeters, 5.1e-5, "Elliott 1981, Ch. 8 [N]: λg/2 = 22.3714 mm");
        var theta = TravellingWaveBeam.Direction(Wr90, d, Frequency.FromGigahertz(ghz))!.Value;
        Check.Absolute(degrees, theta.Degrees, 5.1e-4, "Elliott 1981, Ch. 8 [N]");
    }

    [Fact]
    public void Scan_rate_at_21_mm_is_about_0_885_degrees_per_100_MHz()
    {
        // Elliott 1981, Ch. 8 [N]: "scan rate at 9.375 GHz ≈ 0.885° per 100 MHz" (3 digits given).
        double rate = TravellingWaveBeam.ScanRate(Wr90, Length.FromMillimeters(21), Frequency.FromGigahertz(9.375))!.Value;
        Check.Absolute(0.885, rate * 180 / Math.PI * 1e8, 5.1e-4, "Elliott 1981, Ch. 8 [N]");
    }

    [Fact]
    public void Same_side_slots_at_40_mm_squint_toward_the_feed()
    {
        // Elliott 1981, Ch. 8 [N]: same-side slots, d = 40 mm, 9.375 GHz: θ_b = −4.861°.
        var theta = TravellingWaveBeam.Direction(Wr90, Length.FromMillimeters(40), Frequency.FromGigahertz(9.375), alternating: false)!.Value;
        Check.Absolute(-4.861, theta.Degrees, 5.1e-4, "Elliott 1981, Ch. 8 [N]");
        // d = 40 mm > λ: the phase condition has a second real solution (Elliott 1981, Ch. 8: "needs d ≈ λg > λ → grating lobes").
        Assert.True(TravellingWaveBeam.HasGratingLobe(Wr90, Length.FromMillimeters(40), Frequency.FromGigahertz(9.375), alternating: false));
        Assert.False(TravellingWaveBeam.HasGratingLobe(Wr90, Length.FromMillimeters(21), Frequency.FromGigahertz(9.375)));
    }
}
