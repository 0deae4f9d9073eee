using SlotArray.Core.Fabrication;
using SlotArray.Core.Quantities;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Fabrication;

/// <summary>Datums and baseline dimensioning (common practice after ASME Y14.5 [C]); expected values by hand arithmetic (closed forms).</summary>
public class DatumsTests
{
    private static readonly Length T = Length.FromMillimeters(1.27), A = Length.FromMillimeters(22.86);

    [Fact]
    public void Transverse_position_is_wall_plus_half_a_plus_or_minus_x()
    {
        var x = Length.FromMillimeters(2.098);
        // 1.27 + 11.43 + 2.098 = 14.798 mm from the −x wall; 1.27 + 11.43 − 2.098 = 10.602 mm from the +x wall.
        Check.Relative(14.798, Datums.TransversePosition(T, A, x, TransverseDatumSide.MinusXWall).Millimeters, 1e-12, "baseline dimensioning, ASME Y14.5: t + a/2 + x");
        Check.Relative(10.602, Datums.TransversePosition(T, A, x, TransverseDatumSide.PlusXWall).Millimeters, 1e-12, "baseline dimensioning, ASME Y14.5: t + a/2 − x");
        Check.Relative(10.602, Datums.TransversePosition(T, A, Length.FromMillimeters(-2.098), TransverseDatumSide.MinusXWall).Millimeters, 1e-12,
            "a −x slot measured from the −x wall");
        Assert.Throws<ArgumentOutOfRangeException>(() => Datums.TransversePosition(T, A, Length.FromMillimeters(11.43), TransverseDatumSide.MinusXWall));
    }

    [Fact]
    public void Rebase_moves_baseline_positions_to_the_flange_face()
    {
        // Flange face 300 mm from the short's inner face: a slot 11.1857 mm from the short is 288.8143 mm from the flange.
        Check.Relative(288.8143, Datums.Rebase(Length.FromMillimeters(11.1857), Length.FromMillimeters(300)).Millimeters, 1e-12, "300 − 11.1857");
    }

    [Fact]
    public void Edge_slot_depth_of_cut_from_the_outer_narrow_wall_face()
    {
        // WR-90 b = 10.16 mm, t = 1.27 mm, θ = 15°, L = 15.6 mm: 1.27 + (15.6 − 10.16/cos 15°)/2 = 3.810797 mm (python3).
        var d = Datums.EdgeSlotDepthOfCut(Length.FromMillimeters(15.6), Angle.FromDegrees(15), Length.FromMillimeters(10.16), T);
        Check.Relative(3.810797, d!.Value.Millimeters, 1e-6, "plane-cut geometry t + (L − b/cos θ)/2, python3");
        Assert.Equal(d, Datums.EdgeSlotDepthOfCut(Length.FromMillimeters(15.6), Angle.FromDegrees(-15), Length.FromMillimeters(10.16), T));
        Assert.Null(Datums.EdgeSlotDepthOfCut(Length.FromMillimeters(9), Angle.FromDegrees(15), Length.FromMillimeters(10.16), T));
    }

    [Fact]
    public void Default_datum_description_names_the_short_and_baseline_dimensioning()
    {
        Assert.Contains("inner face of the end short", Datums.Default.Description, StringComparison.Ordinal);
        Assert.Contains("baseline dimensioning", Datums.Default.Description, StringComparison.Ordinal);
    }
}
