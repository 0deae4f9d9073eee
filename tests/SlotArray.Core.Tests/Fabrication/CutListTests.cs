using SlotArray.Core;
using SlotArray.Core.Fabrication;
using SlotArray.Core.Quantities;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Fabrication;

/// <summary>The cut-list builder: plain per-slot inputs to rows (equal-area rule and baseline dimensioning, common practice [C]).</summary>
public class CutListTests
{
    private static readonly CutListGuide Wr90 = new(Length.FromMillimeters(22.86), Length.FromMillimeters(10.16), Length.FromMillimeters(1.27));
    private static Length Mm(double v) => Length.FromMillimeters(v);

    private static SlotCutInput Longitudinal(int i, double zMm, double xMm, Length? cutter = null) =>
        new(i, Mm(zMm), Mm(xMm), null, Mm(14.6), Mm(1.5875), cutter ?? Mm(1.5875), Mm(0.025));

    [Fact]
    public void Rows_carry_position_side_overall_length_end_and_transverse_position()
    {
        var list = CutList.Build(Wr90, [Longitudinal(2, 33.5571, -2.098), Longitudinal(1, 11.1857, 2.098)]);
        Assert.Equal([1, 2], list.Rows.Select(r => r.Slot));
        var r1 = list.Rows[0];
        Assert.Equal("+x", r1.Side);
        Assert.Equal("-x", list.Rows[1].Side);
        Check.Absolute(14.6 + 0.3407, r1.OverallLength.Millimeters, 5e-5, "equal-area rule [C]: +0.3407 mm for w = 1.5875 mm");
        Check.Relative(14.798, r1.TransversePosition!.Value.Millimeters, 1e-12, "baseline dimensioning, ASME Y14.5: 1.27 + 11.43 + 2.098");
        Check.Relative(10.602, list.Rows[1].TransversePosition!.Value.Millimeters, 1e-12, "baseline dimensioning, ASME Y14.5: 1.27 + 11.43 − 2.098");
        Assert.Equal("round Ø1.588", r1.End.Description);
        Assert.Null(r1.DepthOfCut);
        Assert.Contains(list.Notes, n => n.Code == "cutlist-datum");
        Assert.Contains(list.Notes, n => n.Code == "cutlist-round-ends");
        Assert.DoesNotContain(list.Notes, n => n.Code == "cutlist-square-ends");
    }

    [Fact]
    public void Square_ends_keep_the_length_and_add_the_machining_note()
    {
        var s = new SlotCutInput(1, Mm(11.2), Mm(2), null, Mm(14.6), Mm(1.6), null, Mm(0.025));
        var list = CutList.Build(Wr90, [s]);
        Assert.Equal(Mm(14.6), list.Rows[0].OverallLength);
        Assert.Equal("square", list.Rows[0].End.Description);
        Assert.Contains(list.Notes, n => n.Code == "cutlist-square-ends" && n.Message.Contains("EDM", StringComparison.Ordinal));
    }

    [Fact]
    public void Edge_slots_get_tilt_sign_and_depth_of_cut()
    {
        var s = new SlotCutInput(1, Mm(20), null, Angle.FromDegrees(-15), Mm(15.6), Mm(1.6), Mm(1.6), Mm(0.025));
        var row = CutList.Build(Wr90, [s]).Rows[0];
        Assert.Equal("-", row.Side);
        Check.Relative(3.810797, row.DepthOfCut!.Value.Millimeters, 1e-6, "t + (L − b/cos θ)/2, python3");
        Assert.Null(row.TransversePosition);
    }

    [Fact]
    public void Infeasible_and_malformed_slots_name_the_slot()
    {
        var wide = Assert.Throws<InfeasibleDesignException>(() => CutList.Build(Wr90, [Longitudinal(3, 10, 11.0)]));
        Assert.Contains("slot 3", wide.Message, StringComparison.Ordinal);
        var cutter = Assert.Throws<InfeasibleDesignException>(() => CutList.Build(Wr90, [Longitudinal(4, 10, 2, Mm(2))]));
        Assert.Contains("slot 4", cutter.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentException>(() => CutList.Build(Wr90, [Longitudinal(1, 10, 2), Longitudinal(1, 30, -2)]));
        Assert.Throws<ArgumentException>(() => CutList.Build(Wr90, [new SlotCutInput(1, Mm(1), Mm(2), Angle.FromDegrees(10), Mm(14), Mm(1.6), null, Mm(0.02))]));
        Assert.Throws<ArgumentOutOfRangeException>(() => CutList.Build(Wr90, [Longitudinal(1, -1, 2)]));
    }
}
