using System.Globalization;
using SlotArray.Core;
using SlotArray.Core.Design;
using SlotArray.Core.Planar;
using SlotArray.Spec;

namespace SlotArray.Cli.Commands;

/// <summary>
/// What <c>check</c> says about a planar spec: the pitch the feed guide's λg/2 requires against the branch guide's outer
/// width and a + common wall, the feed guide's broad wall, and the scan range free of grating lobes in both planes.
/// </summary>
internal static class PlanarCheck
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>The lines (text) and values (JSON) of a planar request; empty for a linear one.</summary>
    public static (IReadOnlyList<string> Lines, Dictionary<string, object?>? Json) Of(ArrayRequest r)
    {
        if (r.Planar is not { } p) return ([], null);
        var f0 = r.DesignFrequency;
        var g = r.Guide;
        double outer = g.BroadWall.Millimeters + 2 * g.WallThickness.Millimeters, shared = FeedGuideSizing.MinimumPitch(g, p.CommonWall).Millimeters;
        double dx = 0.5 * g.GuideWavelength(f0).Millimeters;
        var lines = new List<string>();
        var json = new Dictionary<string, object?>
        {
            ["branches"] = p.Branches, ["outline"] = p.Outline.ToString().ToLowerInvariant(), ["slot_spacing_mm"] = Math.Round(dx, 6),
            ["branch_outer_width_mm"] = Math.Round(outer, 6), ["a_plus_common_wall_mm"] = Math.Round(shared, 6),
        };
        lines.Add(string.Format(Inv, "  array            planar, {0} branches x {1} slots (bounding), {2} outline; slot spacing {3:F3} mm (λg/2)",
            p.Branches, r.Slots.Count, p.Outline.ToString().ToLowerInvariant(), dx));
        try
        {
            var (pitch, feed, solved) = PlanarPipeline.Geometry(r);
            double need = FeedGuideSizing.RequiredPitch(feed, f0).Millimeters;
            lines.Add(string.Format(Inv, "  pitch            {0:F3} mm{1}; the feed guide's λg/2 requires {2:F3} mm; branch guide outer width {3:F3} mm, a + common wall {4:F3} mm",
                pitch.Millimeters, p.Pitch is null ? " (auto)" : "", need, outer, shared));
            lines.Add(string.Format(Inv, "  feed guide       a = {0:F3} mm{1}, b = {2:F3} mm, fed at its {3}", feed.BroadWall.Millimeters, solved ? " (solved for the pitch)" : "",
                feed.NarrowWall.Millimeters, SpecNames.Of(r.Feed.Position)));
            double gx = FeedGuideSizing.GratingLobeFreeSine(Core.Quantities.Length.FromMillimeters(dx), f0);
            double gy = FeedGuideSizing.GratingLobeFreeSine(pitch, f0);
            lines.Add(string.Format(Inv, "  grating lobes    none in real space for scans up to {0} along the branches (x-z) and {1} across (y-z); the fixed beam is broadside",
                Scan(gx), Scan(gy)));
            var (along, across) = PlanarPipeline.TaperSkirts(r, pitch);
            lines.Add(string.Format(Inv, "  grating skirts   at broadside each grating lobe stays out of real space out to its first null (taper included) up to a slot spacing of {0:F3} mm (now {1:F3}) and a pitch of {2:F3} mm (now {3:F3})",
                along.LargestSpacing * 1e3, dx, across.LargestSpacing * 1e3, pitch.Millimeters));
            foreach (var w in PlanarPatternWarnings.Grating(along, across, f0)) lines.Add("  warning          " + w.Message);
            json["largest_slot_spacing_skirt_free_mm"] = Math.Round(along.LargestSpacing * 1e3, 6);
            json["largest_pitch_skirt_free_mm"] = Math.Round(across.LargestSpacing * 1e3, 6);
            json["pitch_mm"] = Math.Round(pitch.Millimeters, 6);
            json["pitch_required_by_feed_mm"] = Math.Round(need, 6);
            json["feed_a_mm"] = Math.Round(feed.BroadWall.Millimeters, 6);
            json["feed_a_solved"] = solved;
            json["grating_lobe_free_sine_x"] = Math.Round(gx, 6);
            json["grating_lobe_free_sine_y"] = Math.Round(gy, 6);
        }
        catch (InfeasibleDesignException e)
        {
            lines.Add("  pitch            cannot be met: " + e.Message);
            json["pitch_problem"] = e.Message;
        }
        return (lines, json);
    }

    private static string Scan(double sine) => sine <= 0 ? "none (a grating lobe already at broadside)"
        : sine >= 1 ? "any angle" : string.Format(Inv, "{0:0.0} deg", Math.Asin(sine) * 180 / Math.PI);
}
