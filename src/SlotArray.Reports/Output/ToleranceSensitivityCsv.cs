using SlotArray.Core.Tolerance;

namespace SlotArray.Reports;

/// <summary>
/// <c>sensitivity.csv</c> (RFC 4180: CRLF record ends, a header record, no field needs quoting): the ranked per-slot
/// sensitivities, the largest effect on the peak sidelobe first. Edge slots add the columns of the tilt, per degree
/// (its rows leave the per-mm columns empty, the other rows the per-degree ones).
/// </summary>
internal static class ToleranceSensitivityCsv
{
    /// <summary>The header fields.</summary>
    public static readonly IReadOnlyList<string> Columns = ["rank", "slot", "quantity", "dsll_db_per_mm", "ds11_db_per_mm"];

    /// <summary>The columns added when a tilt is among the quantities.</summary>
    public static readonly IReadOnlyList<string> TiltColumns = ["dsll_db_per_deg", "ds11_db_per_deg"];

    /// <summary>Writes the file.</summary>
    public static void Write(IReadOnlyList<SlotSensitivity> sensitivities, TextWriter writer)
    {
        ArgumentNullException.ThrowIfNull(sensitivities);
        ArgumentNullException.ThrowIfNull(writer);
        bool tilt = sensitivities.Any(s => s.Quantity == ToleranceQuantity.Tilt);
        writer.Write(string.Join(",", tilt ? [.. Columns, .. TiltColumns] : Columns));
        writer.Write("\r\n");
        for (int i = 0; i < sensitivities.Count; i++)
        {
            var s = sensitivities[i];
            string sll = Invariant.Fixed(s.DsllDbPerUnit, 4), s11 = Invariant.Fixed(s.Ds11DbPerUnit, 4);
            bool perDeg = s.Quantity == ToleranceQuantity.Tilt;
            var fields = new List<string> { Invariant.Int(i + 1), Invariant.Int(s.Slot), ToleranceJson.QuantityName(s.Quantity),
                perDeg ? "" : sll, perDeg ? "" : s11 };
            if (tilt) fields.AddRange(perDeg ? [sll, s11] : ["", ""]);
            writer.Write(string.Join(",", fields));
            writer.Write("\r\n");
        }
    }
}
