using SlotArray.Core.Design;
using SlotArray.Core.Fabrication;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tests.DesignTests;
using static SlotArray.Core.Tests.DesignTests.TestArrays;

namespace SlotArray.Core.Tests.FabricationTests;

/// <summary>
/// Issue 11, geometry that designed (exit 0) but could not be cut. Footprints by plane geometry (rectangles of the slot
/// outline; edge-slot strips across the narrow face), every number below worked by hand from the slot centres, widths
/// and lengths given.
/// </summary>
public class SlotClearanceTests
{
    private static readonly Length W = Length.FromMillimeters(1.6);

    /// <summary>A hand-made design: slots at the given centres (mm), couplings (offsets in mm, or tilts in degrees) and lengths (mm).</summary>
    private static ArrayDesign Design(SlotCouplingKind kind, double[] zMm, double[] coupling, double lengthMm, Termination near,
        Termination? far = null, double? feedPlaneMm = null)
    {
        var slots = zMm.Select((z, i) => new SlotDesign(i + 1, Length.FromMillimeters(z),
            kind == SlotCouplingKind.Offset ? coupling[i] * 1e-3 : coupling[i] * Math.PI / 180, Length.FromMillimeters(lengthMm), W, 0.1, 1)).ToArray();
        return new ArrayDesign("t", F0, Wr90, Wr90.GuideWavelength(F0), Length.FromMillimeters(zMm[1] - zMm[0]), FeedPosition.End, kind, "test",
            slots, near, far, Length.FromMillimeters(feedPlaneMm ?? zMm[^1]), 1, []);
    }

    [Fact]
    public void Broad_wall_slots_at_0_1_guide_wavelength_overlap_with_the_slot_two_along_on_the_same_side()
    {
        // λg = 44.74 mm at 9.375 GHz: spacing 4.474 mm; slots 15 mm long alternate ±1.2 mm. Neighbours are 2.4 mm apart
        // across (> 1.6 mm width: clear); slots 1 and 3 share a side and are 8.95 mm apart along (< 15 mm: overlap).
        double[] z = [11.2, 15.674, 20.148, 24.622];
        var d = Design(SlotCouplingKind.Offset, z, [1.2, -1.2, 1.2, -1.2], 15, Termination.ShortAt(Length.FromMillimeters(11.2)));
        var problems = SlotClearance.Problems(d, null);
        Assert.Contains(problems, p => p.StartsWith("slots 1 and 3 overlap on the same side", StringComparison.Ordinal));
        Assert.Contains(problems, p => p.StartsWith("slots 2 and 4 overlap on the same side", StringComparison.Ordinal));
        Assert.DoesNotContain(problems, p => p.StartsWith("slots 1 and 2", StringComparison.Ordinal));
        var e = Assert.Throws<InfeasibleDesignException>(() => SlotClearance.Require(d, null));
        Assert.Contains("increase the spacing (feed.spacing)", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Neighbours_across_the_centreline_overlap_when_their_offsets_are_closer_than_the_width()
    {
        // ±0.5 mm: 1.0 mm apart across (< 1.6 mm wide) and 10 mm apart along (< 15 mm long): the outlines overlap.
        var d = Design(SlotCouplingKind.Offset, [11.2, 21.2], [0.5, -0.5], 15, Termination.ShortAt(Length.FromMillimeters(11.2)));
        Assert.StartsWith("slots 1 and 2 overlap across the centreline", Assert.Single(SlotClearance.Problems(d, null)), StringComparison.Ordinal);
    }

    [Fact]
    public void Edge_slots_at_0_07_guide_wavelength_meet_on_the_narrow_wall()
    {
        // Outer narrow face h = b + 2t = 10.16 + 2.54 = 12.7 mm; tilts ±15°: each centre line runs h/2 tan 15° = 1.70 mm either
        // way along z, so at spacing 0.07 λg = 3.13 mm the V of slots 1 and 2 closes to 3.13 − 2 × 1.70 = −0.27 mm: they cross.
        var d = Design(SlotCouplingKind.Tilt, [10, 13.13, 16.26], [15, -15, 15], 16, Termination.MatchedLoadAt(Length.FromMillimeters(10)),
            feedPlaneMm: 26.26);
        var problems = SlotClearance.Problems(d, null);
        Assert.Contains(problems, p => p.StartsWith("slots 1 and 2 meet on the narrow wall", StringComparison.Ordinal));
        // Slots 1 and 3 are parallel, 6.26 mm apart along z, half-widths 1.6/(2 cos 15°) = 0.83 mm each: clear.
        Assert.DoesNotContain(problems, p => p.StartsWith("slots 1 and 3", StringComparison.Ordinal));
    }

    [Fact]
    public void Edge_slots_far_enough_apart_are_clear()
    {
        // Spacing 20 mm (the marine example): 20 − 2 × 1.70 = 16.6 mm > 2 × 0.83 mm.
        var d = Design(SlotCouplingKind.Tilt, [20, 40, 60], [15, -15, 15], 16, Termination.MatchedLoadAt(Length.FromMillimeters(20)), feedPlaneMm: 80);
        Assert.Empty(SlotClearance.Problems(d, null));
    }

    [Fact]
    public void The_standing_wave_designer_refuses_edge_slots_at_0_07_guide_wavelength()
    {
        // The old neighbour check compared a tilt in radians with a width in metres, so these designed (exit 0).
        var request = Request(8, spacing: 0.07) with { Slots = new SlotRequest(SlotType.Edge, 8, W, null, SlotModelKind.MomentMethod) };
        var slot = EdgeSlot.Create(Wr90, W);
        var e = Assert.Throws<InfeasibleDesignException>(() => StandingWaveDesigner.Design(StickRequest.Of(request, slot, Uniform(8))).Design);
        Assert.Contains("meet on the narrow wall", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_round_ended_slot_that_runs_past_the_short_is_refused_although_its_equivalent_length_fits()
    {
        // Equal-area rule (common practice, no source): a 3 mm slot with a 3 mm cutter is (4 − π)(1.5 mm)²/3 mm = 0.644 mm
        // longer tip to tip than its equivalent length, so each end reaches 0.322 mm further.
        var width = Length.FromMillimeters(3);
        var slot = new StevensonTestSlot(Wr90, width);
        var square = StandingWaveDesigner.Design(StickRequest.Of(Request(4) with { Slots = new SlotRequest(SlotType.Longitudinal, 4, width, null, SlotModelKind.Stevenson) }, slot, Uniform(4))).Design;
        double half = square.Slots[0].Length.Meters / 2;
        var shortDistance = GuideDistance.OfLength(Length.FromMeters(half + 0.15e-3));   // clear of the equivalent length, not of the round end
        var squareRequest = Request(4) with
        {
            Slots = new SlotRequest(SlotType.Longitudinal, 4, width, null, SlotModelKind.Stevenson),
            Feed = Request(4).Feed with { ShortDistance = shortDistance },
        };
        _ = StandingWaveDesigner.Design(StickRequest.Of(squareRequest, slot, Uniform(4)));   // square ends fit
        var round = squareRequest with { Slots = squareRequest.Slots with { Cutter = width } };
        var e = Assert.Throws<InfeasibleDesignException>(() => StandingWaveDesigner.Design(StickRequest.Of(round, slot, Uniform(4))).Design);
        Assert.Contains("past the end short", e.Message, StringComparison.Ordinal);
        Assert.Contains("feed.short", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_broad_wall_slot_whose_edge_reaches_the_side_wall_is_refused()
    {
        // a/2 = 11.43 mm; offset 10.7 mm + 0.8 mm half-width = 11.5 mm.
        var d = Design(SlotCouplingKind.Offset, [20, 42], [10.7, -1], 15, Termination.ShortAt(Length.FromMillimeters(20)));
        Assert.StartsWith("slot 1 at offset 10.7 mm", Assert.Single(SlotClearance.Problems(d, null)), StringComparison.Ordinal);
    }

    [Fact]
    public void Slots_must_stay_clear_of_the_far_short_of_a_centre_fed_array_and_of_a_travelling_wave_feed_flange()
    {
        // Far short 5 mm beyond the last centre, slot half-length 7.5 mm.
        var centre = Design(SlotCouplingKind.Offset, [10, 32], [1, -1], 15, Termination.ShortAt(Length.FromMillimeters(10)),
            Termination.ShortAt(Length.FromMillimeters(5)));
        Assert.Contains("past the far end short", Assert.Single(SlotClearance.Problems(centre, null)), StringComparison.Ordinal);
        // Travelling wave: load flange (the datum) 7 mm before slot 1, feed flange 6 mm after slot 2; half-length 7.5 mm.
        var travelling = Design(SlotCouplingKind.Offset, [7, 30], [1, -1], 15, Termination.MatchedLoadAt(Length.FromMillimeters(7)), feedPlaneMm: 36);
        var p = SlotClearance.Problems(travelling, null);
        Assert.Equal(2, p.Count);
        Assert.Contains("past the load flange", p[0], StringComparison.Ordinal);
        Assert.Contains("past the feed flange", p[1], StringComparison.Ordinal);
    }
}
