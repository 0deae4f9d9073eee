namespace SlotArray.Core.Slots;

/// <summary>Kind of radiating slot.</summary>
public enum SlotType
{
    /// <summary>Longitudinal shunt slot in the broad wall, displaced from the centreline by an offset.</summary>
    Longitudinal,
    /// <summary>Inclined shunt slot in the narrow wall, cut into both broad walls ("edge slot").</summary>
    Edge,
    /// <summary>Centred inclined series slot in the broad wall.</summary>
    InclinedSeries,
}
