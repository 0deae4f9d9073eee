using SlotArray.Core.Fabrication;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Fabrication;

/// <summary>Machining sensitivities, derived from Stevenson 1948 and Pozar 2012 [D] and evaluated with numpy [N] to three digits (tolerance half a unit).</summary>
public class MachiningSensitivityTests
{
    private static readonly Frequency F = Frequency.FromGigahertz(9.375);
    private static RectangularWaveguide Wr90 => RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium);

    [Fact]
    public void Conductance_slope_is_0_927_per_mm_at_g_0_1()
    {
        double perMetre = MachiningSensitivity.ConductanceLogSlope(Length.FromMillimeters(2.098), Length.FromMillimeters(22.86));
        Check.Absolute(0.927, perMetre / 1e3, 5e-4, "(2π/a) cot(πx/a) from Stevenson 1948, numpy [N]: WR-90, x = 2.098 mm");
        // ±0.025 mm → ±2.3 % in g (numpy [N]).
        Check.Absolute(0.023, perMetre * 0.025e-3, 5e-4, "numpy [N]: ±2.3 % in g");
        // Finite-difference check on g ∝ sin²(πx/a) (Stevenson 1948).
        double a = 22.86e-3, x = 2.098e-3, h = 1e-9;
        double fd = (Math.Log(Math.Pow(Math.Sin(Math.PI * (x + h) / a), 2)) - Math.Log(Math.Pow(Math.Sin(Math.PI * (x - h) / a), 2))) / (2 * h);
        Check.Relative(fd, perMetre, 1e-6, "central difference of ln sin²(πx/a)");
    }

    [Fact]
    public void Guide_wavelength_sensitivity_is_minus_0_958()
    {
        double s = MachiningSensitivity.GuideWavelengthWidthSensitivity(Wr90, F);
        Check.Absolute(-0.958, s, 5e-4, "dλg/λg from Pozar 2012 Sec. 3.3, numpy [N]: WR-90 at 9.375 GHz");
        // Finite difference of λg(a) from the waveguide model (Pozar Sec. 3.3).
        double da = 1e-9;
        var wide = Wr90 with { BroadWall = Length.FromMeters(22.86e-3 + da) };
        var narrow = Wr90 with { BroadWall = Length.FromMeters(22.86e-3 - da) };
        double fd = (Math.Log(wide.GuideWavelength(F).Meters) - Math.Log(narrow.GuideWavelength(F).Meters)) / (Math.Log(22.86e-3 + da) - Math.Log(22.86e-3 - da));
        Check.Relative(fd, s, 1e-5, "central difference of ln λg against ln a");
    }

    [Fact]
    public void A_0_076_mm_wide_tube_costs_0_58_degrees_per_half_guide_wavelength()
    {
        var half = 0.5 * Wr90.GuideWavelength(F);
        var one = MachiningSensitivity.PhaseErrorFromWidthError(Wr90, F, Length.FromMillimeters(0.076), half);
        Check.Absolute(0.58, one.Degrees, 0.01, "numpy [N]: ∓0.58° per λg/2 section (0.32 % of 180°)");
        Check.Absolute(11.5, 20 * one.Degrees, 0.1, "numpy [N]: 11.5° after 20 slots");
        Check.Absolute(57, 100 * one.Degrees, 0.5, "numpy [N]: 57° after 100 slots");
    }

    [Fact]
    public void A_0_025_mm_length_error_on_15_mm_shifts_resonance_by_0_17_percent()
        => Check.Absolute(-0.0017, MachiningSensitivity.ResonanceShiftFromLengthError(Length.FromMillimeters(15), Length.FromMillimeters(0.025)), 5e-5,
            "Δf/f ≈ −ΔL/L [D]: ±0.17 %");
}
