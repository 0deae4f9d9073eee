using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Marine;

/// <summary>A sheet-metal part of the flare or the filter for the shop.</summary>
/// <param name="Name">What it is, e.g. "flare plate, upper".</param>
/// <param name="Quantity">How many.</param>
/// <param name="AlongGuide">Its length along the guide axis (flare plates) or its thickness direction (filter plates: the plate thickness).</param>
/// <param name="Width">Flare plate: its slant width from the throat edge to the aperture edge; filter plate: its depth out from the slotted face.</param>
/// <param name="Height">Filter plate: its height across the aperture at its outer edge; flare plate: 0.</param>
/// <param name="FirstFromA">Position of the first (or only) part's start (flare) or centre (filter plate) from datum A, along the guide.</param>
/// <param name="Pitch">Filter plates: centre-to-centre pitch; flare plates: 0.</param>
/// <param name="AngleDegrees">Flare plates: the half-flare angle from the slotted face's normal, degrees; filter plates: 0 (normal to the guide axis).</param>
internal sealed record MarinePart(string Name, int Quantity, Length AlongGuide, Length Width, Length Height, Length FirstFromA, Length Pitch, double AngleDegrees);

/// <summary>
/// The flare's two plates and the filter's plates as parts, positioned from datum A (the cut list's datum): the plates
/// span the slotted section from one slot spacing before the first slot to one after the last (the travelling-wave
/// layout's flange-to-flange span); filter plates stand between the slots at z_slot1 + s/2 + j s (the automatic pitch
/// divides the slot spacing, so none stands over a slot's opening).
/// </summary>
internal static class MarineParts
{
    /// <summary>The parts of a design's flare and filter; empty when it has neither.</summary>
    /// <param name="design">The designed array.</param>
    /// <param name="designOrigin">Distance from datum A to the design's z = 0 (the cut list's <c>DesignOrigin</c>).</param>
    /// <param name="flare">The flare, or null.</param>
    /// <param name="filter">The filter, or null.</param>
    public static IReadOnlyList<MarinePart> Of(ArrayDesign design, Length designOrigin, SectoralFlare? flare, CrossPolarFilter? filter)
    {
        ArgumentNullException.ThrowIfNull(design);
        var parts = new List<MarinePart>();
        double first = design.Slots.Min(s => s.Position.Meters), last = design.Slots.Max(s => s.Position.Meters), d = design.Spacing.Meters;
        double start = first - d, span = last - first + 2 * d;
        if (flare is not null)
        {
            double rise = (flare.Aperture.Meters - flare.Throat.Meters) / 2, slant = Math.Sqrt(flare.Length.Meters * flare.Length.Meters + rise * rise);
            double angle = Math.Atan2(rise, flare.Length.Meters) * 180 / Math.PI;
            parts.Add(new MarinePart("flare plate (upper and lower, from the edges of the slotted face)", 2, Length.FromMeters(span), Length.FromMeters(slant),
                Length.FromMeters(0), Length.FromMeters(designOrigin.Meters + start), Length.FromMeters(0), angle));
        }
        if (filter is not null)
        {
            double s = filter.Spacing.Meters, z0 = first + s / 2;
            int count = (int)Math.Floor((last - z0) / s + 1e-9) + 1;
            // Height at the filter's outer edge: the flare's height there, or the slotted face's without a flare.
            double height = flare is null
                ? (design.Guide.NarrowWall + 2.0 * design.Guide.WallThickness).Meters
                : flare.Throat.Meters + (flare.Aperture.Meters - flare.Throat.Meters) * Math.Min(1, filter.Depth.Meters / flare.Length.Meters);
            parts.Add(new MarinePart("filter plate (across the aperture, normal to the guide axis, between the slots)", count, filter.Thickness, filter.Depth,
                Length.FromMeters(height), Length.FromMeters(designOrigin.Meters + z0), filter.Spacing, 0));
        }
        return parts.AsReadOnly();
    }
}
