namespace SlotArray.Core.Slots;

/// <summary>What sets a shunt slot's coupling to the guide.</summary>
internal enum SlotCouplingKind
{
    /// <summary>Longitudinal broad-wall slot: the coupling parameter is the signed offset from the centreline, metres.</summary>
    Offset,
    /// <summary>Inclined narrow-wall (edge) slot: the coupling parameter is the signed tilt, radians.</summary>
    Tilt,
}
