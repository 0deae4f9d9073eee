using SlotArray.Core.Tolerance;

namespace SlotArray.Reports;

/// <summary>
/// <c>sensitivity.csv</c> (RFC 4180: CRLF record ends, a header record, no field needs quoting): the ranked per-slot
/// sensitivities, the largest effect on the peak sidelobe first.
/// </summary>
internal static class ToleranceSensitivityCsv
{
    /// <summary>The header fields.</summary>
    public static readonly IReadOnlyList<string> Columns = ["rank", "slot", "quantity", "dsll_db_per_mm", "ds11_db_per_mm"];

    /// <summary>Writes the file.</summary>
    public static void Write(IReadOnlyList<SlotSensitivity> sensitivities, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(sensitivities);
        ArgumentNullException.ThrowIfNull(writer);
        writer.Write(string.Join(",", Columns));
        writer.Write("\r\n");
        for (int i = 0; i < sensitivities.Count; i++)
        {
            var s = sensitivities[i];
            writer.Write(string.Join(",", Invariant.Int(i + 1), Invariant.Int(s.Slot), ToleranceJson.QuantityName(s.Quantity),
                Invariant.Fixed(s.DsllDbPerMm, 4), Invariant.Fixed(s.Ds11DbPerMm, 4)));
            writer.Write("\r\n");
        }
    }
}
