using SlotArray.Core.Fabrication;
using SlotArray.Core.Quantities;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Fabrication;

/// <summary>Equal-area rule for round-ended slots (common practice, no source [C]; check value (1 − π/4) w by hand).</summary>
public class RoundEndedSlotTests
{
    private static readonly Length W = Length.FromMillimeters(1.5875);

    [Fact]
    public void Correction_for_a_1_5875_mm_cutter_is_0_3407_mm()
    {
        Check.Absolute(0.3407, RoundEndedSlot.LengthCorrection(W).Millimeters, 5e-5, "equal-area rule [C]: (1 − π/4)·1.5875 mm");
        var overall = RoundEndedSlot.OverallLength(Length.FromMillimeters(14.6), W);
        Check.Absolute(14.6 + 0.3407, overall.Millimeters, 5e-5, "equal-area rule [C]: L_o = L_eq + 0.3407 mm");
        Check.Relative(0.79375, RoundEndedSlot.EndRadius(W).Millimeters, 1e-12, "end radius w/2 (equal-area rule, common practice)");
    }

    [Theory]
    [InlineData(14.5993)]
    [InlineData(10.0)]
    [InlineData(1.3)]      // just above the shortest possible (the cutter diameter)
    public void Overall_and_equivalent_lengths_round_trip(double mm)
    {
        var leq = Length.FromMillimeters(mm);
        var back = RoundEndedSlot.EquivalentLength(RoundEndedSlot.OverallLength(leq, W), W);
        Check.Relative(mm, back.Millimeters, 1e-12, "inverse of the equal-area rule");
    }

    [Fact]
    public void A_narrower_cutter_leaves_corner_fillets_of_its_own_radius()
    {
        // w = 2 mm, D_t = 1 mm: four fillets of r = 0.5 mm remove (4 − π) r² = 0.21460 mm² → 0.10730 mm of length (python3).
        Check.Absolute(0.1073009, RoundEndedSlot.LengthCorrection(Length.FromMillimeters(2), Length.FromMillimeters(1)).Millimeters, 1e-7,
            "area of four corner fillets (4 − π) r² / w, computed with python3");
        // D_t = w reduces to (1 − π/4) w.
        Check.Relative((1 - Math.PI / 4) * 2, RoundEndedSlot.LengthCorrection(Length.FromMillimeters(2), Length.FromMillimeters(2)).Millimeters, 1e-12,
            " equal-area rule");
    }

    [Fact]
    public void Impossible_slots_are_refused()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => RoundEndedSlot.LengthCorrection(Length.FromMillimeters(1.5), Length.FromMillimeters(1.6)));
        Assert.Throws<ArgumentOutOfRangeException>(() => RoundEndedSlot.EquivalentLength(Length.FromMillimeters(1.0), W));
        Assert.Throws<ArgumentOutOfRangeException>(() => RoundEndedSlot.OverallLength(Length.FromMillimeters(1.0), W));
    }

    [Fact]
    public void End_form_text_and_square_end_note()
    {
        Assert.Equal("round Ø1.6", SlotEnd.From(Length.FromMillimeters(1.6)).Description);
        Assert.Equal("round Ø1.588", SlotEnd.From(W).Description);
        Assert.Equal("square", SlotEnd.From(null).Description);
        Assert.True(SlotEnd.Square.NeedsSpecialProcess);
        Assert.Contains("EDM, broaching or a punch", SlotEnd.SquareEndNote, StringComparison.Ordinal);
    }
}
