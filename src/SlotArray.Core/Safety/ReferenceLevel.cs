using SlotArray.Core.Quantities;

namespace SlotArray.Core.Safety;

/// <summary>Who is exposed: the two tiers every exposure guideline distinguishes.</summary>
internal enum ExposureTier
{
    /// <summary>Members of the public (ICNIRP "general public"; IEEE "unrestricted"; FCC "general population/uncontrolled").</summary>
    GeneralPublic,
    /// <summary>Trained workers aware of the exposure (ICNIRP "occupational"; IEEE "restricted"; FCC "occupational/controlled").</summary>
    Occupational,
}

/// <summary>Whether a reference level applies to the whole body or to a local (partial-body) exposure.</summary>
internal enum ExposureExtent
{
    /// <summary>Averaged over the whole body (ICNIRP 2020 Table 5).</summary>
    WholeBody,
    /// <summary>Local exposure, spatially averaged over a small area (ICNIRP 2020 Table 6).</summary>
    Local,
}

/// <summary>
/// One reference level for incident (unperturbed, plane-wave equivalent) power density at one frequency, with
/// the guideline it comes from and how sure we are of it.
/// </summary>
/// <param name="Guideline">Short name of the guideline, e.g. "ICNIRP 2020".</param>
/// <param name="Table">The table and row the value comes from, e.g. "Table 6, >6–300 GHz".</param>
/// <param name="Tier">General public or occupational.</param>
/// <param name="Extent">Whole body or local.</param>
/// <param name="Frequency">The frequency the level was evaluated at.</param>
/// <param name="PowerDensity">The reference level, W/m²; &gt; 0.</param>
/// <param name="AveragingTimeSeconds">Averaging time of the level, s (30 min = 1800 s whole body, 6 min = 360 s local).</param>
/// <param name="Averaging">Spatial averaging in words ("whole body", "4 cm²").</param>
/// <param name="Provenance">Provenance tag (DEVELOPERS.md, "Provenance tags"), e.g. "[M, High]" or "[S: …]".</param>
/// <param name="Source">Full citation: document, year, table.</param>
internal sealed record ReferenceLevel(
    string Guideline,
    string Table,
    ExposureTier Tier,
    ExposureExtent Extent,
    Frequency Frequency,
    double PowerDensity,
    double AveragingTimeSeconds,
    string Averaging,
    string Provenance,
    string Source)
{
    /// <summary>A short label for reports, e.g. "ICNIRP 2020 occupational, local (Table 6, >6–300 GHz)".</summary>
    public string Label => $"{Guideline} {(Tier == ExposureTier.Occupational ? "occupational" : "general public")}, "
        + $"{(Extent == ExposureExtent.WholeBody ? "whole body" : "local")} ({Table})";
}
