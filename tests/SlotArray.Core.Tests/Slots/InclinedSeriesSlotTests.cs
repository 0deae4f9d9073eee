using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Slots;

/// <summary>
/// Centred inclined series slot against values computed with numpy [N] from
/// Stevenson 1948's form, R_d = 73 Ω). The table is quoted to 4–5 significant digits, so the tolerance is half a unit
/// in the last digit given, relative.
/// </summary>
public class InclinedSeriesSlotTests
{
    private const string Ref = "Stevenson 1948 form, numpy [N]";
    private static readonly Frequency F = Frequency.FromGigahertz(9.375);
    private static RectangularWaveguide Wr90(double wallMm = 0) =>
        RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(wallMm), new Metal("copper", 5.8e7, "test"));

    [Theory]
    [InlineData(5, 0.01496)]
    [InlineData(10, 0.05893)]
    [InlineData(15, 0.12928)]
    [InlineData(20, 0.22184)]
    [InlineData(30, 0.45180)]
    [InlineData(45, 0.81944)]
    [InlineData(90, 1.30522)]
    public void Resistance_matches_the_reference_table(double degrees, double expected)
        => Check.Absolute(expected, InclinedSeriesSlot.Resistance(Wr90(), Angle.FromDegrees(degrees), F), 0.5e-5, Ref);

    [Fact]
    public void At_90_degrees_it_is_the_transverse_series_slot_closed_form()
    {
        // Stevenson's transverse series slot, centred: r = (120/(π R_d)) (λg/λ)³ (λ²/(ab)) cos²(πλ/(4a)) ( consistency check [D]).
        var g = Wr90();
        double a = g.BroadWall.Meters, b = g.NarrowWall.Meters, lam = F.FreeSpaceWavelength.Meters, lg = g.GuideWavelength(F).Meters;
        double transverse = 120 / (Math.PI * 73) * Math.Pow(lg / lam, 3) * lam * lam / (a * b) * Math.Pow(Math.Cos(Math.PI * lam / (4 * a)), 2);
        Check.Relative(transverse, InclinedSeriesSlot.Resistance(g, Angle.FromDegrees(90), F), 1e-12, "Stevenson 1948 transverse series slot");
        Check.Relative(1.30522, transverse, 5e-6, "Stevenson 1948");
    }

    [Theory]
    [InlineData(0.05)]
    [InlineData(0.12928)]
    [InlineData(0.5)]
    [InlineData(1.2)]
    public void Inverse_returns_a_rotation_that_reproduces_r(double r)
    {
        var g = Wr90();
        var th = InclinedSeriesSlot.TiltForResistance(g, r, F);
        Check.Relative(r, InclinedSeriesSlot.Resistance(g, th, F), 1e-10, "round trip r → θ → r");
        if (r == 0.12928) Check.Absolute(15.0, th.Degrees, 1e-3, Ref + ": r(15°) = 0.12928");
    }

    [Fact]
    public void Resistance_is_even_in_the_rotation_and_zero_along_the_axis()
    {
        var g = Wr90();
        Assert.Equal(0.0, InclinedSeriesSlot.Resistance(g, Angle.FromDegrees(0), F), 15);
        for (double d = 1; d <= 89; d += 4)
            Check.Relative(InclinedSeriesSlot.Resistance(g, Angle.FromDegrees(d), F), InclinedSeriesSlot.Resistance(g, Angle.FromDegrees(-d), F), 1e-14, "symmetry of the coupling integral");
    }

    [Fact]
    public void A_resistance_above_the_transverse_slot_is_infeasible_and_states_the_maximum()
    {
        var e = Assert.Throws<InfeasibleDesignException>(() => InclinedSeriesSlot.TiltForResistance(Wr90(), 1.5, F));
        Assert.Contains("1.30522", e.Message);
    }

    [Fact]
    public void Removable_point_of_c_at_one_is_pi_over_four_and_continuous()
    {
        Check.Relative(Math.PI / 4, InclinedSeriesSlot.C(1), 1e-15, "limit of cos(πu/2)/(1 − u²) at u = 1");
        Check.Relative(Math.Cos(Math.PI * 0.9998 / 2) / (1 - 0.9998 * 0.9998), InclinedSeriesSlot.C(0.9998), 1e-9, "direct form just outside the series band");
        Check.Relative(Math.Cos(Math.PI * 1.00009 / 2) / (1 - 1.00009 * 1.00009), InclinedSeriesSlot.C(1.00009), 1e-7, "series form inside the band vs direct form");
    }

    [Fact]
    public void A_thick_wall_is_flagged()
    {
        var w = InclinedSeriesSlot.Warnings(Wr90(1.27), Angle.FromDegrees(15), Length.FromMillimeters(1.5875), F);
        Assert.Contains(w, x => x.Code == "series-slot-thin-wall-formula");
        Assert.Empty(InclinedSeriesSlot.Warnings(Wr90(), Angle.FromDegrees(15), Length.FromMillimeters(1.5875), F));
    }

    [Fact]
    public void Near_cutoff_the_peak_is_below_90_degrees_and_the_inverse_takes_the_smallest_rotation()
    {
        // WR-90 at 7 GHz (below the 8.2 GHz recommended band): r(θ) peaks before 90° (checked with an independent
        // python evaluation of the Stevenson 1948 formula). Properties: the maximum bounds every grid value, the inverse has zero
        // residual and no smaller rotation reaches r.
        var g = Wr90();
        var f = Frequency.FromGigahertz(7);
        double max = InclinedSeriesSlot.MaximumResistance(g, f);
        Assert.True(max > InclinedSeriesSlot.Resistance(g, Angle.FromDegrees(90), f), "peak should lie below 90° near cutoff");
        for (double d = 0; d <= 90; d += 0.1)
            Assert.True(InclinedSeriesSlot.Resistance(g, Angle.FromDegrees(d), f) <= max * (1 + 1e-12), $"r({d}°) above the maximum");
        double target = InclinedSeriesSlot.Resistance(g, Angle.FromDegrees(90), f);
        var th = InclinedSeriesSlot.TiltForResistance(g, target, f);
        Check.Relative(target, InclinedSeriesSlot.Resistance(g, th, f), 1e-10, "residual of the inverse");
        Assert.True(th.Degrees < 90, $"smallest rotation expected, got {th}");
        for (double d = 0; d < th.Degrees - 1e-6; d += 0.05)
            Assert.True(InclinedSeriesSlot.Resistance(g, Angle.FromDegrees(d), f) < target, $"r({d}°) already reaches the target");
    }
}
