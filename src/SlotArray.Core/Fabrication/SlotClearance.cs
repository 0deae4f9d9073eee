using System.Globalization;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Fabrication;

/// <summary>
/// Whether a designed array can be cut: no two slots meet, no broad-wall slot runs into a side wall, and no slot runs
/// past the terminations (the end short or load at the datum, the far short of a centre-fed array, the feed flange of a
/// travelling-wave array). Every pair of slots that can touch is compared, on both walls, not only neighbours.
/// </summary>
/// <remarks>
/// Footprints [D: this project, plane geometry of the cut]:
/// <list type="bullet">
/// <item>Broad-wall (offset) slot: the rectangle |x − x_n| &lt; w/2, |z − z_n| &lt; L_o/2 around its centre, L_o the
/// tip-to-tip length (<see cref="RoundEndedSlot.OverallLength"/> for round ends, the equivalent length for square
/// ends). Round ends are inside that rectangle, so the test errs on the safe side at the corners.</item>
/// <item>Edge (tilt) slot: on the outer narrow face of height h = b + 2t, the strip of width w about the line
/// z = z_n + y tan θ_n (|y| ≤ h/2), half-width w/(2 cos θ) along z; its cuts into the two broad walls lie at the strip's
/// ends (<see cref="Datums.EdgeSlotDepthOfCut"/>: plunged square to the narrow wall) and reach no further along z. The
/// along-z gap between two strips is linear in y, so its values at y = ±h/2 decide whether they meet.</item>
/// </list>
/// A gap of zero (slots touching) counts as a collision: no web of metal would be left between them.
/// </remarks>
internal static class SlotClearance
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Every collision of <paramref name="design"/>, each naming the slots, the numbers and what to change; empty when it can be cut.</summary>
    /// <param name="design">The designed array.</param>
    /// <param name="cutter">End-mill diameter of round-ended slots, or null for square ends.</param>
    public static IReadOnlyList<string> Problems(ArrayDesign design, Length? cutter)
    {
        ArgumentNullException.ThrowIfNull(design);
        var slots = design.Slots;
        var problems = new List<string>();
        if (slots.Count == 0) return problems;
        var shape = new Footprints(design, cutter);

        double far = design.FarTermination is { } ft ? slots[^1].Position.Meters + ft.Distance.Meters
            : design.NearTermination.Kind != TerminationKind.Short ? design.FeedPlane.Meters : double.PositiveInfinity;
        string nearName = design.NearTermination.Kind == TerminationKind.Short ? "the end short" : "the load flange";
        string farName = design.FarTermination is not null ? "the far end short" : "the feed flange";
        string endFix = design.NearTermination.Kind == TerminationKind.Short
            ? "move the short further out (feed.short, e.g. 0.75 guide-wavelength)"
            : "increase the spacing (feed.spacing): the load and feed flanges sit one spacing beyond the end slots";
        foreach (var s in slots)
        {
            double z = s.Position.Meters, reach = shape.Reach(s);
            if (reach >= z)
                problems.Add(F($"slot {s.Index} reaches {Mm(reach)} along the guide from its centre at {Mm(z)}, {Mm(reach - z)} past {nearName}: {endFix}"));
            if (z + reach >= far)
                problems.Add(F($"slot {s.Index} reaches {Mm(reach)} along the guide from its centre at {Mm(z)}, {Mm(z + reach - far)} past {farName}: {endFix}"));
            if (!shape.Edge && Math.Abs(s.Coupling) + s.Width.Meters / 2 >= design.Guide.BroadWall.Meters / 2)
                problems.Add(F($"slot {s.Index} at offset {Mm(s.Coupling)} and {Mm(s.Width.Meters)} wide runs into the side wall (a/2 = {Mm(design.Guide.BroadWall.Meters / 2)}): use narrower slots or more of them"));
        }

        double maxReach = slots.Max(shape.Reach);
        for (int i = 0; i < slots.Count; i++)
            for (int j = i + 1; j < slots.Count && slots[j].Position.Meters - slots[i].Position.Meters < shape.Reach(slots[i]) + maxReach; j++)
                if (shape.Meet(slots[i], slots[j]) is { } how)
                    problems.Add(F($"slots {slots[i].Index} and {slots[j].Index} {how}: increase the spacing (feed.spacing) or use narrower slots"));
        return problems;
    }

    /// <summary>Throws <see cref="InfeasibleDesignException"/> naming the first collision (and how many more) unless the design can be cut.</summary>
    /// <param name="design">The designed array.</param>
    /// <param name="cutter">End-mill diameter of round-ended slots, or null for square ends.</param>
    public static void Require(ArrayDesign design, Length? cutter)
    {
        var problems = Problems(design, cutter);
        if (problems.Count == 0) return;
        throw new InfeasibleDesignException(problems.Count == 1 ? $"the slots cannot be cut: {problems[0]}"
            : F($"the slots cannot be cut: {problems[0]} (and {problems.Count - 1} more collision(s) of this design)"));
    }

    private static string Mm(double meters) => string.Format(Inv, "{0:0.###} mm", meters * 1e3);

    private static string F(FormattableString s) => s.ToString(Inv);

    /// <summary>The footprints of one design's slots (see the remarks of <see cref="SlotClearance"/>).</summary>
    private sealed class Footprints(ArrayDesign design, Length? cutter)
    {
        private readonly double _roundEnd = cutter is { } c && design.Slots.Count > 0 ? RoundEndedSlot.LengthCorrection(design.Slots[0].Width, c).Meters : 0;
        private readonly double _height = design.Guide.NarrowWall.Meters + 2 * design.Guide.WallThickness.Meters;

        public bool Edge { get; } = design.CouplingKind == SlotCouplingKind.Tilt;

        /// <summary>Half-width along z of the cut: w/2 for a broad-wall slot, w/(2 cos θ) for an edge slot.</summary>
        private double HalfWidthAlong(SlotDesign s) => Edge ? s.Width.Meters / (2 * Math.Cos(s.Coupling)) : s.Width.Meters / 2;

        /// <summary>How far along z the cut reaches from the slot centre.</summary>
        public double Reach(SlotDesign s) => Edge
            ? _height / 2 * Math.Abs(Math.Tan(s.Coupling)) + HalfWidthAlong(s)
            : (s.Length.Meters + _roundEnd) / 2;

        /// <summary>How two slots meet, or null when metal is left between them.</summary>
        public string? Meet(SlotDesign p, SlotDesign q)
        {
            double dz = q.Position.Meters - p.Position.Meters;
            if (Edge)
            {
                double dt = Math.Tan(q.Coupling) - Math.Tan(p.Coupling);
                double low = dz - _height / 2 * dt, high = dz + _height / 2 * dt;
                double gap = Math.Sign(low) != Math.Sign(high) ? 0 : Math.Min(Math.Abs(low), Math.Abs(high));
                double need = HalfWidthAlong(p) + HalfWidthAlong(q);
                return gap > need ? null : F($"meet on the narrow wall: tilts {p.Coupling * 180 / Math.PI:0.##} and {q.Coupling * 180 / Math.PI:0.##} deg at centres {Mm(p.Position.Meters)} and {Mm(q.Position.Meters)} leave {Mm(gap - need)} of metal between the cuts across the {Mm(_height)} outer face");
            }
            double along = Math.Abs(dz) - (Reach(p) + Reach(q));
            double across = Math.Abs(q.Coupling - p.Coupling) - (HalfWidthAlong(p) + HalfWidthAlong(q));
            if (along > 0 || across > 0) return null;
            string side = Math.Sign(p.Coupling) == Math.Sign(q.Coupling) ? "on the same side of the centreline" : "across the centreline";
            return F($"overlap {side}: centres {Mm(p.Position.Meters)} and {Mm(q.Position.Meters)}, offsets {Mm(p.Coupling)} and {Mm(q.Coupling)}, {Mm(2 * Reach(p))} and {Mm(2 * Reach(q))} long tip to tip, {Mm(p.Width.Meters)} wide");
        }
    }
}
