using SlotArray.Core.Quantities;

namespace SlotArray.Core.Fabrication;

/// <summary>
/// What the designer hands the cut-list builder for one slot. Plain inputs, independent of the designer's types.
/// Give exactly one of <paramref name="Offset"/> (broad-wall longitudinal slot) and <paramref name="Tilt"/> (edge slot).
/// </summary>
/// <param name="Index">Slot number as the drawing shows it, ≥ 1, unique.</param>
/// <param name="Position">Slot centre along the guide from the longitudinal datum (baseline), ≥ 0.</param>
/// <param name="Offset">Signed offset x from the broad-wall centreline (positive toward the +x side wall), or null.</param>
/// <param name="Tilt">Signed tilt of an edge slot from the perpendicular to the guide axis, or null. Sign as the
/// designer gives it: + when the slot's end in the upper broad wall (as drawn) lies farther from the datum than its end
/// in the lower broad wall.</param>
/// <param name="EquivalentLength">Equivalent rectangular (electrical) length of the slot, &gt; 0.</param>
/// <param name="Width">Slot width, &gt; 0.</param>
/// <param name="CutterDiameter">End-mill diameter (round ends), ≤ width; null for square ends.</param>
/// <param name="Tolerance">± tolerance to put on the slot's dimensions, ≥ 0.</param>
internal sealed record SlotCutInput(int Index, Length Position, Length? Offset, Angle? Tilt, Length EquivalentLength,
    Length Width, Length? CutterDiameter, Length Tolerance);

/// <summary>The guide the slots are cut in, as far as the cut list needs it.</summary>
/// <param name="BroadWall">Inside broad dimension a.</param>
/// <param name="NarrowWall">Inside narrow dimension b.</param>
/// <param name="WallThickness">Wall thickness t (taken the same for the broad and the narrow walls).</param>
public sealed record CutListGuide(Length BroadWall, Length NarrowWall, Length WallThickness);

/// <summary>One row of the cut list: everything a machinist needs for one slot, SI inside; the writer only formats.</summary>
/// <param name="Slot">Slot number.</param>
/// <param name="Position">Slot centre from the longitudinal datum (baseline dimensioning).</param>
/// <param name="Offset">Signed offset from the broad-wall centreline (broad-wall slots), or null.</param>
/// <param name="Tilt">Signed tilt (edge slots), or null.</param>
/// <param name="Side">"+x" or "-x" (ASCII hyphen) for the offset's side, "centre" at zero offset; "+" or "-" for an
/// edge slot's tilt sign.</param>
/// <param name="TransversePosition">Broad-wall slots: centre from the outside of the datum side wall, t + a/2 ± x; else null.</param>
/// <param name="DepthOfCut">Edge slots: depth of cut into each broad wall from the outer narrow-wall face, or null
/// (broad-wall slots, or an edge slot that does not wrap).</param>
/// <param name="OverallLength">Overall tip-to-tip length to cut (round ends by the equal-area rule; edge slots: the path length).</param>
/// <param name="EquivalentLength">Equivalent rectangular length the design assumed.</param>
/// <param name="Width">Slot width.</param>
/// <param name="End">End form ("round Ø1.6" / "square").</param>
/// <param name="EndRadius">End radius for round ends, or null.</param>
/// <param name="Tolerance">± tolerance.</param>
public sealed record CutListRow(int Slot, Length Position, Length? Offset, Angle? Tilt, string Side,
    Length? TransversePosition, Length? DepthOfCut, Length OverallLength, Length EquivalentLength, Length Width,
    SlotEnd End, Length? EndRadius, Length Tolerance);

/// <summary>A cut list: datums, guide, one row per slot in slot order, and the notes the drawing must carry.</summary>
/// <param name="Datums">The datums every position refers to.</param>
/// <param name="Guide">The guide.</param>
/// <param name="Rows">One row per slot, ordered by slot number.</param>
/// <param name="Notes">Notes for the header and the drawing (datum, length rule, square ends).</param>
internal sealed record CutList(Datums Datums, CutListGuide Guide, IReadOnlyList<CutListRow> Rows, IReadOnlyList<DesignWarning> Notes)
{
    /// <summary>
    /// Builds the rows from generic per-slot inputs: overall length by the equal-area rule (<see cref="RoundEndedSlot"/>,
    /// common practice [C]), transverse position and depth of cut by <see cref="Fabrication.Datums"/> (ASME Y14.5 baseline
    /// dimensioning [C]).
    /// </summary>
    /// <param name="guide">The guide.</param>
    /// <param name="slots">The slots (any order; numbers unique).</param>
    /// <param name="datums">The datums; default <see cref="Fabrication.Datums.Default"/>.</param>
    /// <exception cref="InfeasibleDesignException">A slot does not fit the broad wall, or its cutter is wider than the slot.</exception>
    internal static CutList Build(CutListGuide guide, IReadOnlyList<SlotCutInput> slots, Datums? datums = null)
    {
        ArgumentNullException.ThrowIfNull(guide);
        ArgumentNullException.ThrowIfNull(slots);
        datums ??= Datums.Default;
        var dup = slots.GroupBy(s => s.Index).FirstOrDefault(g => g.Count() > 1);
        if (dup is not null) throw new ArgumentException($"slot number {dup.Key} appears {dup.Count()} times", nameof(slots));
        var rows = slots.OrderBy(s => s.Index).Select(s => Row(guide, datums, s)).ToList();

        var notes = new List<DesignWarning>
        {
            new("cutlist-datum", "datum: " + datums.Description + "."),
        };
        if (rows.Any(r => r.End.Form == SlotEndForm.Round && r.Offset is not null))
            notes.Add(new DesignWarning("cutlist-round-ends",
                "round-ended slots: overall length = equivalent rectangular length + (4 − π) r²/w (equal-area rule, = (1 − π/4) w "
                + "for a cutter as wide as the slot); common practice, no source: calibrate if it matters."));
        if (rows.Any(r => r.End.NeedsSpecialProcess))
            notes.Add(new DesignWarning("cutlist-square-ends", SlotEnd.SquareEndNote + "."));
        if (rows.Any(r => r.Tilt is not null))
            notes.Add(new DesignWarning("cutlist-edge-slots",
                "edge slots: length is the path along the cut on the inner surfaces (a geometric path); depth of cut into each broad "
                + "wall is measured from the outer narrow-wall face and comes from the slot model named in summary.md: check the "
                + "resonance on a test cut before cutting the series."));
        return new CutList(datums, guide, rows, notes);
    }

    private static CutListRow Row(CutListGuide g, Datums datums, SlotCutInput s)
    {
        if (s.Index < 1) throw new ArgumentOutOfRangeException(nameof(s), s.Index, $"slot numbers start at 1; got {s.Index}");
        if ((s.Offset is null) == (s.Tilt is null))
            throw new ArgumentException($"slot {s.Index}: give exactly one of an offset (broad-wall slot) or a tilt (edge slot)", nameof(s));
        if (!(s.Position.Meters >= 0))
            throw new ArgumentOutOfRangeException(nameof(s), s.Position.ToString(),
                $"slot {s.Index}: position {s.Position} from the datum is negative; baseline dimensions run one way from the datum");
        if (!(s.Width.Meters > 0)) throw new ArgumentOutOfRangeException(nameof(s), s.Width.ToString(), $"slot {s.Index}: width must be positive");
        if (!(s.Tolerance.Meters >= 0)) throw new ArgumentOutOfRangeException(nameof(s), s.Tolerance.ToString(), $"slot {s.Index}: tolerance must be zero or positive");
        if (s.CutterDiameter is { } c && c > s.Width)
            throw new InfeasibleDesignException(
                $"slot {s.Index}: the cutter {c} is wider than the slot {s.Width}: use a cutter no wider than the slot, or widen the slot");
        var end = SlotEnd.From(s.CutterDiameter);

        if (s.Offset is { } x)
        {
            if (Math.Abs(x.Meters) + s.Width.Meters / 2 >= g.BroadWall.Meters / 2)
                throw new InfeasibleDesignException(
                    $"slot {s.Index}: offset {x} with width {s.Width} reaches the side wall (a/2 = {0.5 * g.BroadWall}): reduce the offset or the width");
            var overall = s.CutterDiameter is { } d ? RoundEndedSlot.OverallLength(s.EquivalentLength, s.Width, d) : s.EquivalentLength;
            string side = x.Meters > 0 ? "+x" : x.Meters < 0 ? "-x" : "centre";
            return new CutListRow(s.Index, s.Position, x, null, side,
                Datums.TransversePosition(g.WallThickness, g.BroadWall, x, datums.Transverse), null,
                overall, s.EquivalentLength, s.Width, end, s.CutterDiameter is { } d2 ? RoundEndedSlot.EndRadius(s.Width, d2) : null, s.Tolerance);
        }

        var tilt = s.Tilt!.Value;
        var depth = Datums.EdgeSlotDepthOfCut(s.EquivalentLength, tilt, g.NarrowWall, g.WallThickness);
        return new CutListRow(s.Index, s.Position, null, tilt, tilt.Radians >= 0 ? "+" : "-", null, depth,
            s.EquivalentLength, s.EquivalentLength, s.Width, end, s.CutterDiameter is { } d3 ? 0.5 * d3 : null, s.Tolerance);
    }
}
