using SlotArray.Core.Quantities;

namespace SlotArray.Core.Fabrication;

/// <summary>ISO 2768-1 tolerance class for general linear dimensions.</summary>
internal enum Iso2768Class
{
    /// <summary>Class f (fine).</summary>
    Fine,
    /// <summary>Class m (medium).</summary>
    Medium,
}

/// <summary>One row of a general-tolerance table: the size range (lower exclusive, upper inclusive) and the ± value.</summary>
/// <param name="Class">The tolerance class.</param>
/// <param name="Above">Nominal sizes above this length …</param>
/// <param name="UpTo">… up to and including this length.</param>
/// <param name="Tolerance">The permitted deviation ±.</param>
internal sealed record GeneralToleranceRow(Iso2768Class Class, Length Above, Length UpTo, Length Tolerance);

/// <summary>
/// Typical tolerances for slotted-waveguide work, as data with their provenance.
/// </summary>
/// <remarks>
/// ISO 2768-1:1989 "General tolerances — Part 1: Tolerances for linear and angular dimensions without individual
/// tolerance indications", Table 1, classes f and m, nominal sizes 0.5–2000 mm [M, Medium: values
/// from memory]. Class f is taken as as ±0.05 mm up to 6 mm (0.5–3 and 3–6 mm share it); for nominal sizes below
/// 0.5 mm ISO 2768-1 asks for the tolerance to be stated next to the dimension, so none is returned.
/// Slot-specific figures [C: common practice, no source]: ±0.025 mm (±0.001 in) on slot length, width and
/// position is routine precision CNC milling for X-band arrays; ±0.05 mm is commodity work.
/// </remarks>
internal static class GeneralTolerances
{
    /// <summary>Provenance of the ISO 2768-1 rows.</summary>
    public const string Iso2768Provenance = "ISO 2768-1:1989, Table 1 (from memory)";
    /// <summary>Provenance of the slot-milling figures.</summary>
    public const string MillingProvenance = "common practice, no source";

    /// <summary>Routine precision CNC milling of slots, ±0.025 mm [C].</summary>
    public static Length PrecisionMilling { get; } = Length.FromMillimeters(0.025);
    /// <summary>Commodity machining of slots, ±0.05 mm [C].</summary>
    public static Length CommodityMilling { get; } = Length.FromMillimeters(0.05);

    private static readonly double[] Edges = [0.5, 6, 30, 120, 400, 1000, 2000];
    private static readonly double[] FineMm = [0.05, 0.1, 0.15, 0.2, 0.3, 0.5];
    private static readonly double[] MediumMm = [0.1, 0.2, 0.3, 0.5, 0.8, 1.2];

    /// <summary>The table rows of both classes, class f first, sizes ascending.</summary>
    public static IReadOnlyList<GeneralToleranceRow> Rows { get; } =
    [
        .. Enumerable.Range(0, FineMm.Length).Select(i => RowOf(Iso2768Class.Fine, i)),
        .. Enumerable.Range(0, MediumMm.Length).Select(i => RowOf(Iso2768Class.Medium, i)),
    ];

    /// <summary>The ± general tolerance for a nominal size, or null outside 0.5–2000 mm.</summary>
    /// <param name="class">Class f or m.</param>
    /// <param name="nominalSize">The nominal dimension.</param>
    public static Length? For(Iso2768Class @class, Length nominalSize)
    {
        double mm = nominalSize.Millimeters;
        if (!(mm >= Edges[0] && mm <= Edges[^1])) return null;
        return Rows.First(r => r.Class == @class && mm <= r.UpTo.Millimeters).Tolerance;
    }

    private static GeneralToleranceRow RowOf(Iso2768Class c, int i) => new(c,
        Length.FromMillimeters(i == 0 ? 0.5 : Edges[i]), Length.FromMillimeters(Edges[i + 1]),
        Length.FromMillimeters((c == Iso2768Class.Fine ? FineMm : MediumMm)[i]));
}
