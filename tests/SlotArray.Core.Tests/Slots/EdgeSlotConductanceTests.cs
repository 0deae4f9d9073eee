using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Slots;

/// <summary>
/// Edge-slot closed form and cross-polar lobes against numpy values [N] of the edge-slot formula (Stevenson 1948; Silver 1949) in its
/// dimensionally consistent λ³λg/(a³b) form, R_d = 73 Ω). Tolerances: half a unit in the last digit quoted.
/// </summary>
public class EdgeSlotConductanceTests
{
    private const string Ref = "edge-slot formula (Stevenson 1948; Silver 1949), numpy [N]";
    private static readonly Frequency F = Frequency.FromGigahertz(9.375);
    private static readonly RectangularWaveguide Wr90 =
        RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.Zero, new Metal("copper", 5.8e7, "test"));

    [Theory]
    [InlineData(5, 0.01196)]
    [InlineData(10, 0.04721)]
    [InlineData(15, 0.10395)]
    [InlineData(20, 0.17937)]
    [InlineData(25, 0.26985)]
    [InlineData(30, 0.37129)]
    public void Conductance_matches_the_reference_table(double degrees, double expected)
        => Check.Absolute(expected, EdgeSlotConductance.Conductance(Wr90, Angle.FromDegrees(degrees), F), 0.5e-5, Ref);

    [Fact]
    public void Prefactor_is_the_dimensionless_lambda_cubed_lambda_g_over_a_cubed_b()
    {
        double a = Wr90.BroadWall.Meters, b = Wr90.NarrowWall.Meters, lam = F.FreeSpaceWavelength.Meters, lg = Wr90.GuideWavelength(F).Meters;
        Check.Relative(12.0545, lam * lam * lam * lg / (a * a * a * b), 5e-6, Ref + ": λ³λg/(a³b) = 12.0545");
        // Small-angle limit: g → 0.13081 · 12.0545 · θ² (the bracket → sin θ).
        double th = 1e-4;
        Check.Relative(30 / (Math.PI * 73) * 12.0545 * th * th, EdgeSlotConductance.Conductance(Wr90, Angle.FromRadians(th), F), 1e-5, "small-angle limit of the edge-slot formula");
    }

    [Theory]
    [InlineData(0.05, 10.297)]
    [InlineData(0.10, 14.701)]
    [InlineData(0.20, 21.208)]
    public void Inverse_gives_the_reference_tilts(double g, double degrees)
    {
        var th = EdgeSlotConductance.TiltForConductance(Wr90, g, F, Angle.FromDegrees(30));
        Check.Absolute(degrees, th.Degrees, 0.5e-3, Ref + " inverse");
        Check.Relative(g, EdgeSlotConductance.Conductance(Wr90, th, F), 1e-10, "residual of the inverse");
    }

    [Fact]
    public void A_conductance_beyond_the_tilt_limit_is_infeasible_and_states_the_maximum()
    {
        var e = Assert.Throws<InfeasibleDesignException>(() => EdgeSlotConductance.TiltForConductance(Wr90, 0.5, F, Angle.FromDegrees(30)));
        Assert.Contains("0.37129", e.Message); // g(30°), edge-slot formula (Stevenson 1948; Silver 1949)
    }

    [Fact]
    public void Cross_polar_lobes_of_half_guide_wavelength_spacing_in_Wr90()
    {
        var d = 0.5 * Wr90.GuideWavelength(F);
        var psi = EdgeSlotCrossPolarization.LobeDirection(d, F);
        Assert.NotNull(psi);
        Check.Absolute(45.6, psi!.Value.Degrees, 0.05, Ref + ": ψ = ±45.6° for d = λg/2");
        Check.Relative(0.714703, Math.Sin(psi.Value.Radians), 1e-6, "sin ψ = λ/λg, WR-90 reference case reference case");
        Check.Absolute(-11.4, EdgeSlotCrossPolarization.LobeLevelDecibels(Angle.FromDegrees(15)), 0.05, Ref + ": tan 15° → −11.4 dB");
        Check.Absolute(-11.4, EdgeSlotCrossPolarization.LobeLevelDecibels(Angle.FromDegrees(-15)), 0.05, "alternating sign: same level");
    }

    [Fact]
    public void No_cross_polar_lobe_in_real_space_when_spacing_is_below_half_a_wavelength()
        => Assert.Null(EdgeSlotCrossPolarization.LobeDirection(Length.FromMillimeters(15), F)); // λ/(2d) = 1.066 > 1
}
