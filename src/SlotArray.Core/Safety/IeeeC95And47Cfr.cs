using SlotArray.Core.Quantities;

namespace SlotArray.Core.Safety;

/// <summary>
/// IEEE C95.1-2019 power-density reference levels, for comparison with ICNIRP 2020. [M, Medium]: the tables could not be
/// retrieved when this was written; verify against the standard before relying on them.
/// </summary>
/// <remarks>
/// Source: IEEE Std C95.1-2019, "IEEE Standard for Safety Levels with Respect to Human Exposure to Electric, Magnetic,
/// and Electromagnetic Fields, 0 Hz to 300 GHz", 2019 (title [S], values [M, Medium]).
/// "Unrestricted environment" maps to <see cref="ExposureTier.GeneralPublic"/>, "restricted" to
/// <see cref="ExposureTier.Occupational"/>. Whole body 2–300 GHz: 10 / 50 W/m² (30 min); local above 6 GHz:
/// 55 f_G^−0.177 / 275 f_G^−0.177 W/m² over 4 cm², harmonised with ICNIRP 2020.
/// </remarks>
internal static class IeeeC95_1_2019
{
    private const string Name = "IEEE C95.1-2019";
    private const string Tag = "[M, Medium: tables not retrieved; verify before release]";
    private const string Citation = "IEEE Std C95.1-2019, Safety Levels with Respect to Human Exposure to Electric, Magnetic, and "
        + "Electromagnetic Fields, 0 Hz to 300 GHz";

    /// <summary>Whole-body reference level, 2–300 GHz: 10 W/m² unrestricted, 50 W/m² restricted [M, Medium].</summary>
    /// <param name="f">Frequency; 2 GHz ≤ f ≤ 300 GHz.</param>
    /// <param name="tier">Tier.</param>
    public static ReferenceLevel WholeBody(Frequency f, ExposureTier tier)
    {
        Require(f, 2, nameof(f));
        return new ReferenceLevel(Name, "whole body, 2–300 GHz", tier, ExposureExtent.WholeBody, f,
            tier == ExposureTier.Occupational ? 50.0 : 10.0, 1800, "whole body", Tag, Citation);
    }

    /// <summary>Local reference level above 6 GHz: 55 f_G^−0.177 unrestricted, 275 f_G^−0.177 restricted (W/m², 4 cm²) [M, Medium].</summary>
    /// <param name="f">Frequency; 6 GHz &lt; f ≤ 300 GHz.</param>
    /// <param name="tier">Tier.</param>
    public static ReferenceLevel Local(Frequency f, ExposureTier tier)
    {
        Require(f, 6, nameof(f));
        if (f.Gigahertz <= 6) throw new ArgumentOutOfRangeException(nameof(f), f.ToString(), "the local level held here applies above 6 GHz");
        double gp = 55.0 / Math.Pow(f.Gigahertz, 0.177);
        return new ReferenceLevel(Name, "local, >6–300 GHz", tier, ExposureExtent.Local, f,
            tier == ExposureTier.Occupational ? 5 * gp : gp, 360, "4 cm²", Tag, Citation);
    }

    private static void Require(Frequency f, double lowGhz, string name)
    {
        if (!(f.Gigahertz >= lowGhz && f.Gigahertz <= 300))
            throw new ArgumentOutOfRangeException(name, f.ToString(), $"the IEEE C95.1-2019 level held here covers {lowGhz}–300 GHz; {f} is outside");
    }
}

/// <summary>
/// US regulatory limits for comparison: FCC 47 CFR §1.1310 Table 1, 1.5–100 GHz: 1 mW/cm² = 10 W/m² general
/// population/uncontrolled (30 min), 5 mW/cm² = 50 W/m² occupational/controlled (6 min) [M, High].
/// </summary>
internal static class Fcc47Cfr1310
{
    /// <summary>Maximum permissible exposure (power density), 1.5–100 GHz.</summary>
    /// <param name="f">Frequency; 1.5 GHz ≤ f ≤ 100 GHz.</param>
    /// <param name="tier">Tier (general population/uncontrolled or occupational/controlled).</param>
    public static ReferenceLevel MaximumPermissibleExposure(Frequency f, ExposureTier tier)
    {
        if (!(f.Gigahertz >= 1.5 && f.Gigahertz <= 100))
            throw new ArgumentOutOfRangeException(nameof(f), f.ToString(), $"the FCC row held here covers 1.5–100 GHz; {f} is outside");
        bool occ = tier == ExposureTier.Occupational;
        return new ReferenceLevel("FCC 47 CFR 1.1310", "Table 1, 1.5–100 GHz", tier, ExposureExtent.WholeBody, f,
            occ ? 50.0 : 10.0, occ ? 360 : 1800, "whole body", "[M, High]",
            "US Code of Federal Regulations, Title 47, §1.1310, Table 1 (limits for maximum permissible exposure)");
    }
}
