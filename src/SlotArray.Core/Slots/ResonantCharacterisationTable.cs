namespace SlotArray.Core.Slots;

/// <summary>
/// Serialisable resonant characterisation of a longitudinal slot: for one guide, wall, slot width, frequency and set of
/// truncations, the resonant length and conductance at each tabulated offset. Core never stores it; a caller may (the
/// CLI could keep it on disk, keyed by <see cref="Key"/>).
/// </summary>
/// <param name="FormatVersion">Version of this layout and of the model that filled it; a stored table of another version is stale.</param>
/// <param name="Key">Every input that determines the table, as one invariant string.</param>
/// <param name="FrequencyHertz">Frequency, Hz.</param>
/// <param name="OffsetsMeters">Tabulated offsets x_i (m), increasing, positive.</param>
/// <param name="ResonantLengthsMeters">Resonant full lengths L_r(x_i) (m), where Im y = 0.</param>
/// <param name="Conductances">Resonant conductances g_r(x_i) = Re y at L_r (normalised to G0).</param>
/// <param name="ShuntAsymmetries">|B − C|/|B| at resonance (Stern and Elliott's validity measure of the shunt model).</param>
internal sealed record ResonantCharacterisationTable(
    int FormatVersion,
    string Key,
    double FrequencyHertz,
    IReadOnlyList<double> OffsetsMeters,
    IReadOnlyList<double> ResonantLengthsMeters,
    IReadOnlyList<double> Conductances,
    IReadOnlyList<double> ShuntAsymmetries)
{
    /// <summary>The current <see cref="FormatVersion"/>.</summary>
    public const int CurrentFormatVersion = 1;
}
