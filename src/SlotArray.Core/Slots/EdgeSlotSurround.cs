namespace SlotArray.Core.Slots;

/// <summary>What an edge slot radiates into (<c>slots.surround</c>).</summary>
public enum EdgeSlotSurround
{
    /// <summary>A bare tube in free space.</summary>
    Tube,

    /// <summary>The slotted narrow-wall face flush in a large metal plane.</summary>
    GroundPlane,

    /// <summary>Two plates diverging from the narrow wall's outer edges (a sectoral flare along the guide).</summary>
    Flare,
}
