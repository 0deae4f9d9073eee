using SlotArray.Core.Design;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Slots.Tables;
using SlotArray.Core.Tests.DesignTests;
using SlotArray.Tests.Shared;
using static SlotArray.Core.Tests.Slots.Tables.SyntheticSlotTables;

namespace SlotArray.Core.Tests.Slots.Tables;

/// <summary>Designs made from a user's slot table (<c>slots.data</c>): the slots match the closed forms the table was made from; range errors and extrapolation flags.</summary>
public class TableDesignTests
{
    private static ArrayRequest WithTable(ArrayRequest r, SlotTable t, bool extrapolate = false)
        => r with { Slots = r.Slots with { Data = t, Extrapolate = extrapolate } };

    [Fact]
    public void Uniform_standing_wave_design_from_a_stevenson_table_gives_stevensons_offset()
    {
        var req = TestArrays.Request(10, guide: TestArrays.Wr90Lossless);
        var g = req.Guide;
        var f0 = req.DesignFrequency;
        var table = Longitudinal(g, Offsets(0.5, 5.5, 0.5), [9.2e9, 9.375e9, 9.55e9]);
        var source = SlotSource.For(WithTable(req, table));
        var slot = ArrayPipeline.SlotModelFor(WithTable(req, table), source);
        Assert.IsType<TabulatedSlotModel>(slot);
        var design = StandingWaveDesigner.Design(StickRequest.Of(WithTable(req, table), slot, TestArrays.Uniform(10))).Design;
        // A uniform resonant array of N slots: g = 1/N each (Elliott 1981, ch. 8: the sum of the normalised conductances matches the guide).
        double x = StevensonLongitudinalSlot.Offset(g, 0.1, f0);
        foreach (var s in design.Slots)
        {
            Check.Relative(x, Math.Abs(s.Coupling), 2e-3, "Stevenson 1948 offset for g = 1/N (the table's source)");
            Check.Relative(ResonantLength(g, x, f0.Hertz), s.Length.Meters, 1e-4, "the table's L_r at that offset");
        }
        Assert.Empty(SlotTableRangeCheck.Check(design, slot));
    }

    [Fact]
    public void A_design_needing_a_slot_outside_the_table_exits_infeasible_naming_the_slot_and_the_range()
    {
        var req = TestArrays.Request(40, guide: TestArrays.Wr90Lossless);
        var table = Longitudinal(req.Guide, Offsets(2, 5, 0.5), [9.375e9]);   // g = 1/40 needs about 1.4 mm
        var e = Assert.Throws<InfeasibleDesignException>(() => ArrayPipeline.Run(WithTable(req, table), new AnalysisOptions(SweepPoints: 5)));
        Assert.Contains("slot 1 needs a slot outside the slot table synthetic.csv", e.Message);
        Assert.Contains("outside the table's 2 mm to 5 mm", e.Message);
        Assert.Contains("slots.extrapolate: true", e.Message);
    }

    [Fact]
    public void With_extrapolate_the_design_is_made_and_every_slot_outside_is_flagged()
    {
        var req = TestArrays.Request(40, guide: TestArrays.Wr90Lossless);
        var table = Longitudinal(req.Guide, Offsets(2, 5, 0.5), [9.3e9, 9.375e9, 9.45e9]);
        var result = ArrayPipeline.Run(WithTable(req, table, extrapolate: true), new AnalysisOptions(SweepPoints: 5));
        var flagged = result.Warnings.Where(w => w.Code == SlotTableRangeCheck.ExtrapolatedCode).ToList();
        Assert.Equal(40, flagged.Count);
        Assert.Contains("slot 1: outside the slot table", flagged[0].Message);
        var outside = SlotTableRangeCheck.Outside(result.Design, result.SlotModel);
        Assert.Equal(Enumerable.Range(1, 40), outside.Select(o => o.Index));
        // Below the table the conductance follows sin²(πx/a) (Stevenson 1948), so the offset is still Stevenson's.
        Check.Relative(StevensonLongitudinalSlot.Offset(req.Guide, 1.0 / 40, req.DesignFrequency), Math.Abs(result.Design.Slots[0].Coupling), 2e-3,
            "Stevenson 1948 offset for g = 1/40, extrapolated by the sin² law");
    }

    [Fact]
    public void Mutual_coupling_design_runs_on_the_table_self_admittance()
    {
        var req = TestArrays.Request(6, guide: TestArrays.Wr90Lossless) with { Coupling = CouplingMode.Mutual };
        var table = Longitudinal(req.Guide, Offsets(0.5, 5.5, 0.5), [9.2e9, 9.375e9, 9.55e9]);
        var result = ArrayPipeline.Run(WithTable(req, table), new AnalysisOptions(SweepPoints: 5));
        Assert.IsType<TabulatedSlotModel>(result.SlotModel);
        Assert.IsType<ElliottProcedure>(result.Procedure);
        // The coupled design still puts g ≈ 1/N into every slot's active admittance: the offsets stay near Stevenson's 1/N value.
        double x = StevensonLongitudinalSlot.Offset(req.Guide, 1.0 / 6, req.DesignFrequency);
        foreach (var s in result.Design.Slots)
            Assert.InRange(Math.Abs(s.Coupling), 0.7 * x, 1.3 * x);
    }
}
