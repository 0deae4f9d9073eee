using System.Globalization;
using SlotArray.Core.Design;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;

namespace SlotArray.Spec.Tests;

/// <summary>
/// The test's own, deliberately plain, statement of "this design can be cut": written apart from the pipeline's
/// clearance check so that the fuzz does not grade that check with itself.
/// </summary>
/// <remarks>
/// Footprints (every pair compared, no neighbour shortcut):
/// <list type="bullet">
/// <item>A broad-wall slot is the rectangle |x − x_n| ≤ w/2, |z − z_n| ≤ L_o/2, with L_o the tip-to-tip length: the
/// equivalent length plus (4 − π) r²/w for round ends of radius r (equal-area rule, common practice, no source). It must
/// stay inside the broad wall (|x_n| + w/2 ≤ a/2) and between the terminations.</item>
/// <item>An edge slot is, on the outer narrow face of height h = b + 2t, the strip of width w about the line
/// z = z_n + y tan θ_n, |y| ≤ h/2, whose half-width along z is w/(2 cos θ); its cuts into the broad walls lie at the
/// strip's ends and add nothing along z. Two strips are clear when their centre lines stay further apart along z than
/// the sum of the half-widths at every height (the gap is linear in y, so its two ends decide).</item>
/// </list>
/// </remarks>
internal static class CuttableGeometry
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Every overlap or protrusion of <paramref name="design"/>, as readable lines; empty when it can be cut.</summary>
    public static IReadOnlyList<string> Problems(ArrayRequest request, ArrayDesign design)
    {
        var problems = new List<string>();
        var slots = design.Slots;
        double a = design.Guide.BroadWall.Meters, h = design.Guide.NarrowWall.Meters + 2 * design.Guide.WallThickness.Meters;
        bool edge = design.CouplingKind == SlotCouplingKind.Tilt;
        double roundEnd = request.Slots.Cutter is { } c ? (4 - Math.PI) * Math.Pow(c.Meters / 2, 2) / request.Slots.Width.Meters : 0;

        // (z at y = -h/2, z at y = +h/2, half-width along z) of an edge slot; (z_min, z_max, x_min, x_max) of a broad-wall slot.
        double HalfWidth(SlotDesign s) => edge ? s.Width.Meters / (2 * Math.Cos(s.Coupling)) : s.Width.Meters / 2;
        double ReachAlong(SlotDesign s) => edge ? h / 2 * Math.Abs(Math.Tan(s.Coupling)) + HalfWidth(s) : (s.Length.Meters + roundEnd) / 2;

        double farEnd = design.FarTermination is { } far ? slots[^1].Position.Meters + far.Distance.Meters
            : design.NearTermination.Kind != TerminationKind.Short ? design.FeedPlane.Meters : double.PositiveInfinity;
        foreach (var s in slots)
        {
            double z = s.Position.Meters, r = ReachAlong(s);
            if (z - r < -1e-12) problems.Add(F($"slot {s.Index} reaches {(r - z) * 1e3:0.###} mm past the near termination (centre {z * 1e3:0.###} mm, reach {r * 1e3:0.###} mm)"));
            if (z + r > farEnd + 1e-12) problems.Add(F($"slot {s.Index} reaches {(z + r - farEnd) * 1e3:0.###} mm past the far termination or flange at {farEnd * 1e3:0.###} mm"));
            if (!edge && Math.Abs(s.Coupling) + s.Width.Meters / 2 > a / 2 + 1e-12)
                problems.Add(F($"slot {s.Index} (offset {s.Coupling * 1e3:0.###} mm, width {s.Width.Millimeters:0.###} mm) runs into the side wall at a/2 = {a / 2 * 1e3:0.###} mm"));
        }
        for (int i = 0; i < slots.Count; i++)
            for (int j = i + 1; j < slots.Count; j++)
            {
                var p = slots[i];
                var q = slots[j];
                bool overlap;
                if (edge)
                {
                    double dz = q.Position.Meters - p.Position.Meters, dt = Math.Tan(q.Coupling) - Math.Tan(p.Coupling);
                    double low = dz - h / 2 * dt, high = dz + h / 2 * dt;
                    double gap = Math.Sign(low) != Math.Sign(high) ? 0 : Math.Min(Math.Abs(low), Math.Abs(high));
                    overlap = gap < HalfWidth(p) + HalfWidth(q) - 1e-12;
                }
                else
                {
                    overlap = Math.Abs(q.Position.Meters - p.Position.Meters) < ReachAlong(p) + ReachAlong(q) - 1e-12
                        && Math.Abs(q.Coupling - p.Coupling) < HalfWidth(p) + HalfWidth(q) - 1e-12;
                }
                if (overlap)
                    problems.Add(F($"slots {p.Index} and {q.Index} overlap (centres {p.Position.Millimeters:0.###} and {q.Position.Millimeters:0.###} mm, couplings {p.Coupling:G4} and {q.Coupling:G4}, lengths {p.Length.Millimeters:0.###} and {q.Length.Millimeters:0.###} mm)"));
            }
        return problems;
    }

    private static string F(FormattableString s) => s.ToString(Inv);
}
