using SlotArray.Core.Design;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;
using SlotArray.Core.Waveguides;
using SlotArray.Spec.Schema;

namespace SlotArray.Spec.Yaml;

internal sealed partial class SpecBuilder
{
    private static IReadOnlyList<string> ArrayKeys => SpecKeys.ArrayLayout.Names;

    private static readonly KeyValuePair<string, PlanarOutline>[] Outlines =
        [new("rectangle", PlanarOutline.Rectangle), new("circle", PlanarOutline.Circle), new("ellipse", PlanarOutline.Ellipse)];

    private enum ArrayKind { Linear, Planar }

    private static readonly KeyValuePair<string, ArrayKind>[] ArrayKinds = [new("linear", ArrayKind.Linear), new("planar", ArrayKind.Planar)];

    /// <summary>The feed guide read from <c>feed.guide</c> (planar arrays), and where its key is.</summary>
    private RectangularWaveguide? feedGuide;
    private SpecNode? feedGuideNode;

    /// <summary>The circular Taylor taper read from <c>taper</c> (level, n̄), and where its type is.</summary>
    private (double SidelobesDb, int Nbar)? circular;
    private SpecNode? circularNode;

    /// <summary><c>type: circular-taylor</c> with its sidelobes (−17.6 … −60 dB) and n̄ (2 … 20, default 5).</summary>
    private TaperRequest? CircularTaper(Section s, string key)
    {
        circularNode = s["type"];
        bool ok = true;
        foreach (var k in new[] { "edge", "exponent", "weights" })
            if (s.Has(k)) ok &= Require(s, k, false, $"'{k}' does not apply to a circular-taylor taper; remove it");
        if (key != "taper") ok &= Require(s, "type", false, "circular-taylor is a taper of the whole aperture: give it as 'taper' and leave out 'taper_across'");
        double? sll = Quantity(s, "sidelobes", QuantityKind.Decibels, true, "-30 dB");
        if (sll is not null && !Require(s, "sidelobes", sll >= -60 && sll <= -17.6,
                $"'sidelobes' for a circular-taylor taper must be between -60 dB and -17.6 dB (the uniform circular aperture's first sidelobe), got {Num(sll.Value)} dB")) sll = null;
        int? nbar = s.Has("nbar") ? Integer(s, "nbar", false, 2, 20, "5") : 5;
        if (!ok || sll is null || nbar is null) return null;
        circular = (sll.Value, nbar.Value);
        return TaperRequest.Uniform;
    }

    /// <summary>
    /// <c>array</c>: linear (default) or planar with branches (required), pitch (auto or a length), common_wall (default
    /// 1 mm) and outline (default rectangle); with the planar-only keys elsewhere (<c>taper_across</c>, <c>feed.guide</c>,
    /// a circular-taylor taper) refused for a linear array. Planar needs longitudinal slots, a standing-wave feed and an
    /// even slots.count (each branch is fed at its centre, between its middle two slots).
    /// </summary>
    private PlanarArrayRequest? Planar(Section root, SlotRequest? slots, FeedRequest? feed, RectangularWaveguide? guide, out bool ok)
    {
        ok = true;
        Section? s = root.Has("array") ? Sub(root, "array", ArrayKeys, false) : null;
        if (root.Has("array") && s is null) { ok = false; return null; }
        var kind = s is not null && s.Has("type") ? Choice(s, "type", ArrayKinds, false) : ArrayKind.Linear;
        if (kind is null) { ok = false; return null; }
        if (kind == ArrayKind.Linear)
        {
            if (s is not null)
                foreach (var k in ArrayKeys.Where(k => k != "type" && s.Has(k)))
                    ok &= Require(s, k, false, $"'{k}' applies to planar arrays only (array: {{type: planar}}); remove it");
            if (root.Has("taper_across")) ok &= Require(root, "taper_across", false, "'taper_across' applies to planar arrays only (array: {type: planar}); remove it");
            if (feedGuideNode is not null) { D.Error(feedGuideNode, "'feed.guide' (the feed guide) applies to planar arrays only (array: {type: planar}); remove it"); ok = false; }
            if (circularNode is not null) { D.Error(circularNode, "circular-taylor is a 2-D taper: it needs array: {type: planar, outline: circle} (or ellipse)"); ok = false; }
            return null;
        }
        int? branches = Integer(s!, "branches", true, 1, 200, "12");
        double? pitch = null;
        if (s!.Has("pitch") && !(s["pitch"] is ScalarNode { IsNull: false } pn && pn.Value.Trim().Equals("auto", StringComparison.OrdinalIgnoreCase)))
        {
            pitch = Quantity(s, "pitch", QuantityKind.Length, false, "23.9 mm");
            ok &= pitch is not null && Require(s, "pitch", pitch > 0 && pitch <= 1, $"'pitch' must be a positive length up to 1 m (or auto), got {Mm(pitch ?? 0)}");
        }
        double? wall = s.Has("common_wall") ? Quantity(s, "common_wall", QuantityKind.Length, false, "1 mm") : 1e-3;
        ok &= wall is not null && Require(s, "common_wall", wall >= 0 && wall <= 0.02, $"'common_wall' must be 0 to 20 mm, got {Mm(wall ?? 0)}");
        var outline = s.Has("outline") ? Choice(s, "outline", Outlines, false) : PlanarOutline.Rectangle;
        ok &= outline is not null && branches is not null;
        if (guide is not null && pitch is not null && wall is not null && pitch < guide.BroadWall.Meters + wall)
            ok &= Require(s, "pitch", false, $"'pitch' {Mm(pitch.Value)} is less than the branch guide's a + common_wall = {Mm(guide.BroadWall.Meters + wall.Value)}: the branches would overlap; widen the pitch or write 'pitch: auto'");
        if (slots is not null && slots.Count % 2 != 0)
        {
            D.Error(root.KeyNode("slots")!, $"a planar array's branches are fed at their centre, between two slots: 'slots.count' ({slots.Count}) must be even; use {slots.Count + 1} or {slots.Count - 1}");
            ok = false;
        }
        if (slots is not null && slots.Type != SlotType.Longitudinal)
        {
            D.Error(root.KeyNode("slots")!, $"planar arrays are designed for longitudinal broad-wall slots only; write 'slots.type: longitudinal'");
            ok = false;
        }
        if (feed is not null && feed.Type != FeedType.StandingWave)
        {
            D.Error(root.KeyNode("feed")!, "planar arrays are designed with standing-wave branches and feed guide only; write 'feed.type: standing-wave'");
            ok = false;
        }
        if (circular is not null && outline == PlanarOutline.Rectangle)
        {
            D.Error(circularNode!, "a circular-taylor taper needs 'array.outline: circle' (or ellipse); a rectangle takes a separable taper (taper and taper_across)");
            ok = false;
        }
        TaperRequest? across = null;
        if (circular is null)
        {
            if (!root.Has("taper_across"))
                D.Warn(s.Anchor, "no 'taper_across' given: the taper across the branches is the same as 'taper'; write e.g. 'taper_across: {type: taylor, sidelobes: -25 dB}'");
            else
            {
                across = Taper(root, branches, "taper_across");
                ok &= across is not null;
            }
        }
        else if (root.Has("taper_across")) ok &= Require(root, "taper_across", false, "'taper_across' does not apply with a circular-taylor taper (it tapers the whole aperture); remove it");
        if (!ok) return null;
        return new PlanarArrayRequest(branches!.Value, pitch is null ? null : Length.FromMeters(pitch.Value), Length.FromMeters(wall!.Value),
            outline!.Value, across, circular?.SidelobesDb, circular?.Nbar ?? 5, feedGuide);
    }
}
