namespace SlotArray.Core.Slots;

/// <summary>Which slot-admittance model the designer uses.</summary>
public enum SlotModelKind
{
    /// <summary>Galerkin moment method with finite wall thickness (default).</summary>
    MomentMethod,
    /// <summary>Stevenson's closed-form resonant conductance (thin wall, resonant half-wave slot).</summary>
    Stevenson,
}
