using SlotArray.Core.Quantities;

namespace SlotArray.Core.Safety;

/// <summary>Region of an aperture's field at a distance, by the OET-65 boundaries (FCC OET Bulletin 65, Ed. 97-01, 1997 [M, Medium]).</summary>
internal enum FieldRegion
{
    /// <summary>Closer than D²/(4λ): radiating near field; the on-axis density is bounded by 4P/A.</summary>
    NearField,
    /// <summary>Between D²/(4λ) and 0.6 D²/λ: transition region.</summary>
    Transition,
    /// <summary>Beyond 0.6 D²/λ (OET-65) — the conventional far-field distance 2D²/λ is larger still.</summary>
    FarField,
}

/// <summary>The far-field power density on the beam axis at one distance.</summary>
/// <param name="Distance">Distance from the antenna.</param>
/// <param name="FarField">S = P G/(4π R²) for a stationary beam, W/m².</param>
/// <param name="TimeAveraged">FarField × the rotation factor (equal to FarField for a stationary beam), W/m².</param>
/// <param name="Region">Field region at this distance (OET-65 boundaries).</param>
/// <param name="InsideFarFieldDistance">True when the distance is below 2D²/λ: the far-field value is then a conservative screen only.</param>
internal sealed record OnAxisDensity(Length Distance, double FarField, double TimeAveraged, FieldRegion Region, bool InsideFarFieldDistance);

/// <summary>The on-axis distance within which one reference level is exceeded (by the far-field formula).</summary>
/// <param name="Level">The reference level.</param>
/// <param name="Stationary">Distance for a stationary beam, R = √(P G/(4π S_ref)).</param>
/// <param name="TimeAveraged">Distance with the rotation factor applied (equal to Stationary for a stationary beam).</param>
/// <param name="InsideFarFieldDistance">True when the stationary distance lies inside 2D²/λ: near-field caveat applies.</param>
/// <param name="NearFieldBoundBelowLevel">True when even the OET-65 near-field bound 4P/A is below the level,
/// so the level is not reached anywhere in front of the aperture by that bound.</param>
internal sealed record ReferenceDistance(ReferenceLevel Level, Length Stationary, Length TimeAveraged,
    bool InsideFarFieldDistance, bool NearFieldBoundBelowLevel);

/// <summary>
/// RF exposure screen of a transmitting array: on-axis power density at a few distances, the distances to the
/// ICNIRP 2020 reference levels, the field-region boundaries and the OET-65 near-field bound. A screening estimate,
/// not a compliance assessment.
/// </summary>
/// <param name="AveragePower">Time-averaged power accepted by the antenna, W.</param>
/// <param name="GainDbi">Gain on the beam axis, dBi.</param>
/// <param name="Frequency">Frequency.</param>
/// <param name="ApertureLength">Aperture length (the largest dimension D).</param>
/// <param name="ApertureWidth">Aperture width.</param>
/// <param name="RotationFactor">θ_3dB/360 for a rotating antenna, 1 for a stationary beam.</param>
/// <param name="FarFieldDistance">2D²/λ.</param>
/// <param name="NearFieldBoundary">OET-65 near-field / transition boundary D²/(4λ) [M, Medium].</param>
/// <param name="FarFieldStart">OET-65 start of the far field 0.6 D²/λ [M, Medium].</param>
/// <param name="NearFieldBound">OET-65 near-field upper bound 4P/A, W/m² (stationary).</param>
/// <param name="OnAxis">Densities at the requested distances, nearest first.</param>
/// <param name="Distances">Distances to each reference level (empty when the frequency is outside the tables).</param>
/// <param name="Warnings">Validity limits met in this assessment.</param>
internal sealed record ExposureAssessment(
    double AveragePower,
    double GainDbi,
    Frequency Frequency,
    Length ApertureLength,
    Length ApertureWidth,
    double RotationFactor,
    Length FarFieldDistance,
    Length NearFieldBoundary,
    Length FarFieldStart,
    double NearFieldBound,
    IReadOnlyList<OnAxisDensity> OnAxis,
    IReadOnlyList<ReferenceDistance> Distances,
    IReadOnlyList<DesignWarning> Warnings)
{
    /// <summary>Distances used when none are given: 1, 2, 5, 10, 20, 50 and 100 m.</summary>
    public static IReadOnlyList<Length> DefaultDistances { get; } =
        [.. new[] { 1.0, 2, 5, 10, 20, 50, 100 }.Select(Length.FromMeters)];

    /// <summary>
    /// Builds the assessment. Formulas: <see cref="PowerDensity"/> (Friis 1946; FCC OET Bulletin 65, 1997); levels:
    /// <see cref="Icnirp2020"/> (ICNIRP 2020). The larger of the two aperture dimensions is taken as D.
    /// </summary>
    /// <param name="averagePower">Time-averaged power accepted by the antenna, W; ≥ 0.</param>
    /// <param name="gainDbi">Gain on the beam axis, dBi.</param>
    /// <param name="frequency">Frequency; reference levels are found for 2–300 GHz (a warning otherwise).</param>
    /// <param name="apertureLength">Aperture length (largest dimension), &gt; 0.</param>
    /// <param name="apertureWidth">Aperture width, &gt; 0.</param>
    /// <param name="distances">Distances at which to give S; default <see cref="DefaultDistances"/>.</param>
    /// <param name="rotatingBeamwidth">For a rotating antenna, its half-power beamwidth in the plane of rotation; null: stationary.</param>
    public static ExposureAssessment Assess(double averagePower, double gainDbi, Frequency frequency,
        Length apertureLength, Length apertureWidth, IReadOnlyList<Length>? distances = null, Angle? rotatingBeamwidth = null)
    {
        if (apertureWidth > apertureLength)
            (apertureLength, apertureWidth) = (apertureWidth, apertureLength);   // D is the largest dimension
        double rotation = rotatingBeamwidth is { } bw ? PowerDensity.RotationFactor(bw) : 1.0;
        var ff = PowerDensity.FarFieldDistance(apertureLength, frequency);
        var nfb = PowerDensity.NearFieldBoundary(apertureLength, frequency);
        var ffs = PowerDensity.FarFieldStart(apertureLength, frequency);
        double bound = PowerDensity.NearFieldUpperBound(averagePower, apertureLength, apertureWidth);

        var onAxis = (distances ?? DefaultDistances).OrderBy(d => d.Meters).Select(r =>
        {
            double s = PowerDensity.FarFieldOnAxis(averagePower, gainDbi, r);
            var region = r < nfb ? FieldRegion.NearField : r < ffs ? FieldRegion.Transition : FieldRegion.FarField;
            return new OnAxisDensity(r, s, s * rotation, region, r < ff);
        }).ToList();

        var warnings = new List<DesignWarning>();
        var levels = new List<ReferenceDistance>();
        if (Icnirp2020.Covers(frequency))
        {
            foreach (var level in Icnirp2020.All(frequency))
            {
                var r = PowerDensity.DistanceToLevel(averagePower, gainDbi, level.PowerDensity);
                var rAvg = PowerDensity.DistanceToLevel(averagePower * rotation, gainDbi, level.PowerDensity);
                levels.Add(new ReferenceDistance(level, r, rAvg, r < ff, bound < level.PowerDensity));
            }
        }
        else
        {
            warnings.Add(new DesignWarning("exposure-frequency-range",
                FormattableString.Invariant($"no ICNIRP 2020 reference level is held here for {frequency} (covered: 2–300 GHz); the distances to the reference levels are not given: consult the guideline's tables")));
        }
        int inside = levels.Count(l => l.InsideFarFieldDistance);
        if (inside > 0)
            warnings.Add(new DesignWarning("exposure-near-field", inside == levels.Count
                ? FormattableString.Invariant($"the reference-level distances all lie inside the far-field distance 2D²/λ = {SafetyText.Metres(ff)}: the far-field formula is a conservative screen only there")
                : FormattableString.Invariant($"{inside} of the {levels.Count} reference-level distances lie inside the far-field distance 2D²/λ = {SafetyText.Metres(ff)}: the far-field formula is a conservative screen only for those")));
        return new ExposureAssessment(averagePower, gainDbi, frequency, apertureLength, apertureWidth, rotation,
            ff, nfb, ffs, bound, onAxis, levels, warnings);
    }
}
