using MathNet.Numerics.RootFinding;
using SlotArray.Core.Patterns;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Patterns;

/// <summary>Issue 13: the transverse-plane (E-plane) beamwidth bound of slots on a face of finite width.</summary>
public class FiniteFaceBeamwidthTests
{
    private static readonly Frequency F = Frequency.FromGigahertz(10);

    [Fact]
    public void The_half_power_argument_is_the_root_of_sinc_equal_to_one_over_root_two()
    {
        // Definition of the uniform line source's half-power point, sin x / x = 1/√2, solved here by MathNet's Brent root finder.
        double x = Brent.FindRoot(t => Math.Sin(t) / t - 1 / Math.Sqrt(2), 1, 2, 1e-15);
        Check.Absolute(x, FiniteFaceBeamwidth.HalfPowerArgument, 1e-12, "root of sin x/x = 1/√2 (uniform line source, half power)");
    }

    [Theory]
    [InlineData(10)]
    [InlineData(20)]
    [InlineData(50)]
    public void A_wide_face_gives_the_published_uniform_aperture_beamwidth(double widthWavelengths)
    {
        var w = widthWavelengths * F.FreeSpaceWavelength;
        double hpbw = FiniteFaceBeamwidth.LowerBound(w, F)!.Value.Degrees;
        // C. A. Balanis, Antenna Theory, 3rd ed., Wiley 2005, Table 12.1: uniform aperture on a ground plane,
        // E-plane HPBW ≈ 50.6°/(b/λ) for b ≫ λ (from memory). The exact 2 asin(0.44295 λ/w) is 50.76°/(w/λ) in that limit: 0.5 %.
        Check.Relative(50.6 / widthWavelengths, hpbw, 0.005, "Balanis 2005, Table 12.1, uniform aperture, E-plane HPBW 50.6 λ/b deg");
    }

    [Fact]
    public void A_face_narrower_than_0_443_wavelength_forms_no_beam_and_the_slotted_face_is_the_outside_width()
    {
        var guide = RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium);
        var f = Frequency.FromGigahertz(9.41);
        Check.Absolute(22.86 + 2.54, FiniteFaceBeamwidth.SlottedFaceWidth(guide, false).Millimeters, 1e-9, "broad face a + 2t");
        Check.Absolute(10.16 + 2.54, FiniteFaceBeamwidth.SlottedFaceWidth(guide, true).Millimeters, 1e-9, "narrow face b + 2t");
        // Narrow face 12.7 mm at 9.41 GHz (λ = 31.86 mm): 0.443 λ/w = 1.11 > 1, no half-power points in front.
        Assert.Null(FiniteFaceBeamwidth.LowerBound(FiniteFaceBeamwidth.SlottedFaceWidth(guide, true), f));
        // Broad face 25.4 mm: 2 asin(0.44295 × 31.859/25.4) = 67.5° (hand arithmetic).
        Check.Absolute(67.5, FiniteFaceBeamwidth.LowerBound(FiniteFaceBeamwidth.SlottedFaceWidth(guide, false), f)!.Value.Degrees, 0.1, "hand arithmetic");
        // At w = x½ λ/π (0.443 λ) the half-power points reach grazing: just narrower, no beam; just wider, nearly 180°.
        double edge = FiniteFaceBeamwidth.HalfPowerArgument / Math.PI;
        Assert.Null(FiniteFaceBeamwidth.LowerBound(0.999 * edge * F.FreeSpaceWavelength, F));
        Assert.InRange(FiniteFaceBeamwidth.LowerBound(1.001 * edge * F.FreeSpaceWavelength, F)!.Value.Degrees, 170, 180);
    }
}
