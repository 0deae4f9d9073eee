using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Slots.Tables;
using SlotArray.Tests.Shared;
using static SlotArray.Core.Tests.Slots.Tables.SyntheticSlotTables;

namespace SlotArray.Core.Tests.Slots.Tables;

/// <summary>The fits of a user's slot table (<see cref="SlotTableFit"/>), checked between the tabulated points against the closed forms the table was made from.</summary>
public class SlotTableFitTests
{
    private static readonly Core.Waveguides.RectangularWaveguide G = SlotTestGuides.Wr90(1.27);
    private const double F = 9.375e9;

    [Fact]
    public void Resonance_between_tabulated_offsets_follows_stevensons_conductance_and_the_resonant_length()
    {
        var fit = SlotTableFit.Fit(Longitudinal(G, Offsets(), [F]), G);
        foreach (double xmm in new[] { 0.75, 1.3, 2.25, 3.9, 5.2 })
        {
            double x = xmm * 1e-3;
            Check.Relative(StevensonLongitudinalSlot.Conductance(G, x, Frequency.FromHertz(F)), fit.ResonantConductance(x, Frequency.FromHertz(F)), 1e-9,
                "Stevenson 1948, longitudinal shunt slot g(x) (the table's source), between tabulated offsets");
            Check.Relative(ResonantLength(G, x, F), fit.ResonantLength(x, Frequency.FromHertz(F)), 2e-5,
                "the table's resonant length L_r(x), between tabulated offsets");
        }
    }

    [Fact]
    public void Resonance_at_a_tabulated_offset_is_where_the_single_pole_susceptance_vanishes()
    {
        var fit = SlotTableFit.Fit(Longitudinal(G, Offsets(), [F]), G);
        var (lr, gr) = fit.TabulatedResonance(0, 3);
        // Closed form: Im 1/(1 + jQ(ν − 1/ν)) = 0 exactly at ν = 1; the rows bracket it at ν = 0.98, 1.0, 1.02.
        Check.Relative(ResonantLength(G, 2e-3, F), lr, 1e-12, "single-pole response: Im y = 0 at ν = 1 (a tabulated row)");
        Check.Relative(StevensonLongitudinalSlot.Conductance(G, 2e-3, Frequency.FromHertz(F)), gr, 1e-12, "Stevenson 1948 at a tabulated offset");
    }

    [Fact]
    public void Admittance_between_tabulated_lengths_offsets_and_frequencies_follows_the_closed_form()
    {
        double[] freqs = [9.2e9, 9.375e9, 9.55e9];
        var fit = SlotTableFit.Fit(Longitudinal(G, Offsets(), freqs), G);
        foreach (double xmm in new[] { 1.1, 3.3 })
            foreach (double f in new[] { 9.3e9, 9.45e9 })
                foreach (double nu in new[] { 0.945, 0.99, 1.015, 1.06 })
                {
                    double x = xmm * 1e-3, len = nu * ResonantLength(G, x, f);
                    var expected = Y(G, x, len, f);
                    var actual = fit.Admittance(x, len, Frequency.FromHertz(f));
                    double err = (actual - expected).Magnitude / expected.Magnitude;
                    Assert.True(err < 0.02, $"x = {xmm} mm, f = {f / 1e9} GHz, ν = {nu}: |Δy|/|y| = {err:E2} (closed form: Stevenson 1948 g_r × single-pole response)");
                }
    }

    [Fact]
    public void Leave_one_out_residuals_are_small_for_a_fine_table_and_grow_for_a_coarse_one()
    {
        var fine = SlotTableFit.Fit(Longitudinal(G, Offsets(0.5, 5.5, 0.5), [F]), G).Residuals;
        var coarse = SlotTableFit.Fit(Longitudinal(G, Offsets(0.5, 5.5, 2.5), [F], [0.9, 1.0, 1.1]), G).Residuals;
        // Stevenson 1948: g_r/sin²(πx/a) is constant in x, so the fitted ratio predicts every left-out offset exactly.
        Assert.True(fine.ResonantConductanceMax < 1e-12, $"g_r leave-one-out max {fine.ResonantConductanceMax:E2}");
        Assert.True(fine.ResonantLengthMax < 1e-3, $"fine table: L_r leave-one-out max {fine.ResonantLengthMax:P3}");
        Assert.True(coarse.ResonantLengthMax > fine.ResonantLengthMax, "a coarser table predicts its own resonant lengths worse");
        Assert.True(coarse.AdmittanceMax > fine.AdmittanceMax, "three lengths resolve h(ν) worse than nine");
        Assert.True(fine.Points > 0);
    }

    [Fact]
    public void Range_is_what_the_table_holds()
    {
        var fit = SlotTableFit.Fit(Longitudinal(G, Offsets(1, 5, 0.5), [9.3e9, 9.45e9]), G);
        Assert.Equal(1e-3, fit.Range.CouplingLow, 15);
        Assert.Equal(5e-3, fit.Range.CouplingHigh, 15);
        Assert.Equal(9.3e9, fit.Range.FrequencyLow);
        Assert.Equal(9.45e9, fit.Range.FrequencyHigh);
        Check.Relative(0.90, fit.Range.LengthRatioLow, 1e-9, "smallest tabulated L/L_r");
        Check.Relative(1.10, fit.Range.LengthRatioHigh, 1e-9, "largest tabulated L/L_r");
        Assert.Empty(fit.OutsideRange(3e-3, ResonantLength(G, 3e-3, 9.4e9), Frequency.FromHertz(9.4e9)));
        var why = fit.OutsideRange(0.5e-3, ResonantLength(G, 0.5e-3, 9.5e9), Frequency.FromHertz(9.5e9));
        Assert.Equal(2, why.Count);
        Assert.Contains("offset 0.5 mm is outside the table's 1 mm to 5 mm", why[0]);
        Assert.Contains("9.5 GHz is outside the table's 9.3 to 9.45 GHz", why[1]);
    }

    [Fact]
    public void Conductance_outside_the_table_follows_the_sin_squared_law_from_the_nearest_end()
    {
        var fit = SlotTableFit.Fit(Longitudinal(G, Offsets(2, 4, 0.5), [F]), G);
        var f = Frequency.FromHertz(F);
        // Stevenson 1948: g ∝ sin²(πx/a) at fixed frequency, so the extrapolation reproduces the formula itself.
        foreach (double x in new[] { 0.6e-3, 1.5e-3, 4.8e-3, 5.7e-3 })
            Check.Relative(StevensonLongitudinalSlot.Conductance(G, x, f), fit.ResonantConductance(x, f), 1e-9, "Stevenson 1948: g ∝ sin²(πx/a)");
    }

    [Fact]
    public void Edge_table_by_cut_depth_gives_the_developed_length_of_the_cut_list_convention()
    {
        var edge = EdgeSlot.Create(G, SlotTestGuides.Width);
        var f = Frequency.FromHertz(F);
        var rows = new List<SlotTableRow>();
        int line = 2;
        foreach (double deg in new[] { 5.0, 10, 15, 20, 25 })
            foreach (double nu in Ratios)
            {
                double t = deg * Math.PI / 180, len = nu * edge.ResonantLength(f).Meters;
                double depth = edge.CutDepth(Angle.FromRadians(t), Length.FromMeters(len)).Meters;
                rows.Add(new SlotTableRow(line++, t, double.NaN, depth, F, edge.Admittance(t, Length.FromMeters(len), f)));
            }
        var fit = SlotTableFit.Fit(new SlotTable("edge.csv", new string('0', 64), [], SlotTableGeometry.Edge, SlotTableResponse.Admittance, rows), G);
        Assert.Equal(SlotCouplingKind.Tilt, fit.CouplingKind);
        double th = 12.5 * Math.PI / 180;
        Check.Relative(edge.ResonantLength(f).Meters, fit.ResonantLength(th, f), 1e-9, "single-pole response: resonance at L = κλ/2 for every tilt");
        Check.Relative(EdgeSlotConductance.Conductance(G, Angle.FromRadians(th), f), fit.ResonantConductance(th, f), 5e-3,
            "edge-slot closed form between tabulated tilts");
    }

    [Fact]
    public void Two_slot_geometries_are_enough_and_one_is_refused()
    {
        var two = SlotTableFit.Fit(Longitudinal(G, [1e-3, 3e-3], [F]), G);
        Check.Relative(ResonantLength(G, 2e-3, F), two.ResonantLength(2e-3, Frequency.FromHertz(F)), 2e-3, "straight line between two offsets");
        var e = Assert.Throws<SlotTableException>(() => SlotTableFit.Fit(Longitudinal(G, [1e-3], [F]), G));
        Assert.Contains("at least two", e.Message);
    }
}
