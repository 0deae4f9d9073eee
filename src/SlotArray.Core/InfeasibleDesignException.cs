namespace SlotArray.Core;

/// <summary>
/// The request cannot be realised (exit code 1): the message names the slot, the numbers and what to change,
/// e.g. "slot 7 needs g = 0.91, above the 0.62 this guide can give at 9.4 GHz: use more slots or a gentler taper".
/// </summary>
public sealed class InfeasibleDesignException(string message) : Exception(message);
