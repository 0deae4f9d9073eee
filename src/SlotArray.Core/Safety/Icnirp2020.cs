using SlotArray.Core.Quantities;

namespace SlotArray.Core.Safety;

/// <summary>
/// ICNIRP 2020 reference levels for incident power density between 2 GHz and 300 GHz.
/// </summary>
/// <remarks>
/// Source: International Commission on Non-Ionizing Radiation Protection (ICNIRP), "Guidelines for limiting
/// exposure to electromagnetic fields (100 kHz to 300 GHz)", Health Physics 118(5):483–524, 2020, Tables 5 and 6,
/// with the provenance of each value:
/// <list type="bullet">
/// <item>Table 5, whole body, &gt;2–300 GHz, 30 min: 10 W/m² general public, 50 W/m² occupational [M, High].</item>
/// <item>Table 6, local, &gt;2–6 GHz, 6 min: 40 W/m² general public, 200 W/m² occupational [S: the table as
/// reproduced in a bioelectromagnetism handbook chapter].</item>
/// <item>Table 6, local, &gt;6 to &lt;300 GHz, 6 min over 4 cm²: 55/f_G^0.177 general public, 275/f_G^0.177
/// occupational W/m², f_G in GHz [S: same].</item>
/// <item>Table 6, local, 300 GHz: 20 W/m² general public, 100 W/m² occupational [S: same].</item>
/// </list>
/// Below 2 GHz the guideline gives other rows (not tabulated here): <see cref="Covers"/> is false and
/// <see cref="WholeBody"/> and <see cref="Local"/> throw. Above 30 GHz the guideline adds a 1 cm² peak rule
/// [M, Medium] and short exposures are governed by the energy densities of Table 7; neither is modelled here.
/// </remarks>
internal static class Icnirp2020
{
    /// <summary>Lowest frequency covered here (exclusive in the guideline's tables: "&gt;2 GHz"), 2 GHz.</summary>
    public static Frequency LowestFrequency { get; } = Frequency.FromGigahertz(2);
    /// <summary>Highest frequency covered, 300 GHz.</summary>
    public static Frequency HighestFrequency { get; } = Frequency.FromGigahertz(300);

    private const string Name = "ICNIRP 2020";
    private const string Citation = "ICNIRP, \"Guidelines for limiting exposure to electromagnetic fields (100 kHz to 300 GHz)\", "
        + "Health Physics 118(5):483–524, 2020";
    private const string Table6Tag = "[S: Table 6 as reproduced in a bioelectromagnetism handbook chapter]";

    /// <summary>Whether the tables held here cover f (2 GHz ≤ f ≤ 300 GHz; at exactly 2 GHz the "&gt;2 GHz" rows are used).</summary>
    public static bool Covers(Frequency f) => f >= LowestFrequency && f <= HighestFrequency;

    /// <summary>
    /// Whole-body reference level (Table 5, &gt;2–300 GHz, 30 min): 10 W/m² general public, 50 W/m² occupational [M, High].
    /// </summary>
    /// <param name="f">Frequency; 2 GHz ≤ f ≤ 300 GHz.</param>
    /// <param name="tier">General public or occupational.</param>
    public static ReferenceLevel WholeBody(Frequency f, ExposureTier tier)
    {
        RequireCovered(f);
        double s = tier == ExposureTier.Occupational ? 50.0 : 10.0;
        return new ReferenceLevel(Name, "Table 5, >2–300 GHz", tier, ExposureExtent.WholeBody, f, s, 1800,
            "whole body", "[M, High]", Citation + ", Table 5");
    }

    /// <summary>
    /// Local reference level (Table 6, 6 min): &gt;2–6 GHz 40 / 200 W/m²; &gt;6 to &lt;300 GHz 55/f_G^0.177 and
    /// 275/f_G^0.177 W/m² (4 cm² averaging); 300 GHz 20 / 100 W/m² (general public / occupational).
    /// </summary>
    /// <param name="f">Frequency; 2 GHz ≤ f ≤ 300 GHz.</param>
    /// <param name="tier">General public or occupational.</param>
    public static ReferenceLevel Local(Frequency f, ExposureTier tier)
    {
        RequireCovered(f);
        double k = tier == ExposureTier.Occupational ? 5.0 : 1.0;   // occupational = 5 × general public in every row
        double fg = f.Gigahertz;
        (string row, double gp, string averaging) = fg switch
        {
            <= 6 => ("Table 6, >2–6 GHz", 40.0, "4 cm²"),
            < 300 => ("Table 6, >6–300 GHz", 55.0 / Math.Pow(fg, 0.177), fg > 30 ? "4 cm² (1 cm² peak rule above 30 GHz not modelled)" : "4 cm²"),
            _ => ("Table 6, 300 GHz", 20.0, "4 cm² (1 cm² peak rule above 30 GHz not modelled)"),
        };
        return new ReferenceLevel(Name, row, tier, ExposureExtent.Local, f, k * gp, 360, averaging, Table6Tag, Citation + ", Table 6");
    }

    /// <summary>The four levels at f, in a fixed order: general public whole body, general public local,
    /// occupational whole body, occupational local.</summary>
    /// <param name="f">Frequency; 2 GHz ≤ f ≤ 300 GHz.</param>
    public static IReadOnlyList<ReferenceLevel> All(Frequency f) =>
    [
        WholeBody(f, ExposureTier.GeneralPublic), Local(f, ExposureTier.GeneralPublic),
        WholeBody(f, ExposureTier.Occupational), Local(f, ExposureTier.Occupational),
    ];

    private static void RequireCovered(Frequency f)
    {
        if (!Covers(f))
            throw new ArgumentOutOfRangeException(nameof(f), f.ToString(),
                $"the ICNIRP 2020 power-density rows held here cover 2–300 GHz; {f} is outside: consult the guideline's tables for this frequency");
    }
}
