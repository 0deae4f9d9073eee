using SlotArray.Core.Quantities;

namespace SlotArray.Core.Slots;

/// <summary>
/// Equivalent rectangular length of a round-ended slot cut by an end mill (end radius w/2), by the equal-area rule
/// L_eq = L_o − (1 − π/4) w. Common practice, no source (physics-reference §9.1 [C]); the slot models work in
/// rectangular lengths.
/// </summary>
public static class RoundEndedSlot
{
    /// <summary>(1 − π/4) ≈ 0.2146: the length lost per unit width by the two semicircular ends of equal area.</summary>
    public const double EqualAreaFactor = 1 - Math.PI / 4;

    /// <summary>The rectangular length of equal area to a round-ended slot of overall (tip-to-tip) length L_o and width w.</summary>
    public static Length EquivalentLength(Length overallLength, Length width)
    {
        if (!(overallLength.Meters >= width.Meters) || !(width.Meters > 0))
            throw new ArgumentOutOfRangeException(nameof(overallLength), overallLength.ToString(), $"a round-ended slot of width {width} needs an overall length of at least its width");
        return overallLength - EqualAreaFactor * width;
    }

    /// <summary>The overall (tip-to-tip) length L_o = L_eq + (1 − π/4) w to cut for a rectangular-equivalent length L_eq.</summary>
    public static Length OverallLength(Length equivalentLength, Length width) => equivalentLength + EqualAreaFactor * width;
}
