using System.Numerics;
using SlotArray.Core.Slots.Tables;
using static SlotArray.Core.Tests.Slots.Tables.SyntheticSlotTables;

namespace SlotArray.Core.Tests.Slots.Tables;

/// <summary>Tables the fit refuses, each with a message that names the rows and says what to change.</summary>
public class SlotTableErrorTests
{
    private static readonly Core.Waveguides.RectangularWaveguide G = SlotTestGuides.Wr90(1.27);
    private const double F = 9.375e9;

    [Fact]
    public void A_geometry_without_resonance_in_its_lengths_is_refused_naming_it()
    {
        var t = Longitudinal(G, [1e-3, 2e-3, 3e-3], [F], [0.9, 0.93, 0.96]);
        var e = Assert.Throws<SlotTableException>(() => SlotTableFit.Fit(t, G));
        Assert.Contains("offset 1 mm at 9.375 GHz", e.Message);
        Assert.Contains("both sides of resonance", e.Message);
        Assert.Equal(2, e.Line);
    }

    [Fact]
    public void A_table_in_the_other_phasor_convention_is_recognised()
    {
        var t = Longitudinal(G, [1e-3, 2e-3], [F]);
        t = t with { Rows = [.. t.Rows.Select(r => r with { Value = Complex.Conjugate(r.Value) })] };
        var e = Assert.Throws<SlotTableException>(() => SlotTableFit.Fit(t, G));
        Assert.Contains("conjugate", e.Message);
    }

    [Fact]
    public void A_missing_frequency_for_one_offset_is_refused()
    {
        var t = Longitudinal(G, [1e-3, 2e-3], [9.3e9, 9.4e9]);
        t = t with { Rows = [.. t.Rows.Where(r => !(r.Coupling == 2e-3 && r.Frequency == 9.4e9))] };
        var e = Assert.Throws<SlotTableException>(() => SlotTableFit.Fit(t, G));
        Assert.Contains("no rows for offset 2 mm at 9.4 GHz", e.Message);
    }

    [Fact]
    public void A_conductance_that_falls_with_offset_is_refused_naming_both_offsets()
    {
        var t = Longitudinal(G, [1e-3, 2e-3, 3e-3], [F]);
        t = t with { Rows = [.. t.Rows.Select(r => r.Coupling == 3e-3 ? r with { Value = r.Value * 0.1 } : r)] };
        var e = Assert.Throws<SlotTableException>(() => SlotTableFit.Fit(t, G));
        Assert.Contains("does not increase", e.Message);
        Assert.Contains("2 mm", e.Message);
        Assert.Contains("3 mm", e.Message);
    }

    [Fact]
    public void Too_few_lengths_and_an_inclined_series_table_are_refused()
    {
        var e = Assert.Throws<SlotTableException>(() => SlotTableFit.Fit(Longitudinal(G, [1e-3, 2e-3], [F], [0.95, 1.05]), G));
        Assert.Contains("at least three", e.Message);
        var series = Longitudinal(G, [1e-3, 2e-3], [F]) with { Geometry = SlotTableGeometry.InclinedSeries };
        Assert.Contains("no array designer", Assert.Throws<SlotTableException>(() => SlotTableFit.Fit(series, G)).Message);
    }
}
