using SlotArray.Core.Design;
using SlotArray.Core.Marine;

namespace SlotArray.Reports.Model;

/// <summary>The polarisation filter in front of the slots and the cross-polar level before and after it.</summary>
public sealed record FilterReport
{
    /// <summary>Plate pitch along the guide axis, centre to centre, m.</summary>
    public required double SpacingM { get; init; }

    /// <summary>Plate depth out from the slotted face, m.</summary>
    public required double DepthM { get; init; }

    /// <summary>Plate thickness, m.</summary>
    public required double ThicknessM { get; init; }

    /// <summary>Which dimensions the tool chose ("spacing", "depth", "thickness"); empty when all were given.</summary>
    public required IReadOnlyList<string> Chosen { get; init; }

    /// <summary>TE1 cutoff of the clear gap, Hz.</summary>
    public required double CutoffTe1Hz { get; init; }

    /// <summary>TE1 attenuation per millimetre of depth at the design frequency, dB.</summary>
    public required double AttenuationDbPerMmAtDesign { get; init; }

    /// <summary>Cross-polar attenuation of the whole depth at the design frequency, dB.</summary>
    public required double AttenuationAtDesignDb { get; init; }

    /// <summary>Smallest cross-polar attenuation over the band, dB.</summary>
    public required double SmallestAttenuationDb { get; init; }

    /// <summary>Largest loss of the wanted polarisation over the band, dB (applied to the gain).</summary>
    public required double WantedLossDb { get; init; }

    /// <summary>Margin below the requirement the automatic depth was chosen for, dB (0 when the depth was given).</summary>
    public required double MarginDb { get; init; }

    /// <summary>Worst cross-polar peak over the band before the filter, dB relative to the co-polar beam.</summary>
    public required double BareWorstDb { get; init; }

    /// <summary>Frequency of that worst bare level, Hz.</summary>
    public required double BareWorstFrequencyHz { get; init; }

    /// <summary>Worst cross-polar peak over the band after the filter, dB.</summary>
    public required double FilteredWorstDb { get; init; }

    /// <summary>Frequency of that worst filtered level, Hz.</summary>
    public required double FilteredWorstFrequencyHz { get; init; }

    /// <summary><c>requirements.cross_polar</c>, dB; null when not given.</summary>
    public double? RequirementDb { get; init; }

    /// <summary>The bare cross-polarised cut at the design frequency on the pattern's angles, dB relative to the co-polar peak (for the plot).</summary>
    public IReadOnlyList<double> BareCrossCutLevelDb { get; init; } = [];

    /// <summary>The report of a filter outcome.</summary>
    /// <param name="outcome">What the filter did.</param>
    /// <param name="f0">Design frequency.</param>
    /// <param name="filteredCut">The filtered cross-polar cut at f0, dB (the pattern report's).</param>
    /// <param name="requirementDb"><c>requirements.cross_polar</c>, dB, or null.</param>
    internal static FilterReport Of(FilterOutcome outcome, Core.Quantities.Frequency f0, IReadOnlyList<double> filteredCut, double? requirementDb)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        ArgumentNullException.ThrowIfNull(filteredCut);
        var f = outcome.Filter;
        var chosen = new List<string>();
        if (outcome.Asked.Spacing is null) chosen.Add("spacing");
        if (outcome.Asked.Depth is null) chosen.Add("depth");
        if (outcome.Asked.Thickness is null) chosen.Add("thickness");
        return new FilterReport
        {
            SpacingM = f.Spacing.Meters,
            DepthM = f.Depth.Meters,
            ThicknessM = f.Thickness.Meters,
            Chosen = chosen.AsReadOnly(),
            CutoffTe1Hz = f.CutoffTe1.Hertz,
            AttenuationDbPerMmAtDesign = f.AttenuationDbPerMillimeter(f0),
            AttenuationAtDesignDb = outcome.AttenuationAtDesignDb,
            SmallestAttenuationDb = outcome.SmallestAttenuationDb,
            WantedLossDb = outcome.WantedLossDb,
            MarginDb = outcome.MarginDb,
            BareWorstDb = outcome.BareWorstDb,
            BareWorstFrequencyHz = outcome.BareWorstFrequency.Hertz,
            FilteredWorstDb = outcome.FilteredWorstDb,
            FilteredWorstFrequencyHz = outcome.FilteredWorstFrequency.Hertz,
            RequirementDb = requirementDb,
            BareCrossCutLevelDb = [.. filteredCut.Select(db => db + outcome.AttenuationAtDesignDb)],
        };
    }
}

/// <summary>The flare: its plates, the vertical beam and the antenna's total gain.</summary>
public sealed record FlareReport
{
    /// <summary>Throat height (the slotted face, b + 2 × wall), m.</summary>
    public required double ThroatM { get; init; }

    /// <summary>Aperture height, m.</summary>
    public required double ApertureM { get; init; }

    /// <summary>Axial depth from the slotted face to the aperture, m.</summary>
    public required double LengthM { get; init; }

    /// <summary>Which dimensions the tool chose ("length", "aperture"); empty when both were given.</summary>
    public required IReadOnlyList<string> Chosen { get; init; }

    /// <summary>Vertical half-power beamwidth at the design frequency, degrees.</summary>
    public required double VerticalHpbwDeg { get; init; }

    /// <summary>First vertical sidelobe, dB; NaN when none.</summary>
    public required double FirstSidelobeDb { get; init; }

    /// <summary>Largest phase error at the aperture edge, degrees.</summary>
    public required double PhaseErrorDeg { get; init; }

    /// <summary>Broadside gain lost to the phase error, dB.</summary>
    public required double PhaseErrorLossDb { get; init; }

    /// <summary>Field decay through the evanescent throat stretch, dB (reactive; not in the gain).</summary>
    public required double ThroatLossDb { get; init; }

    /// <summary>Where the plates reach λ/2 apart, from the slotted face, m.</summary>
    public required double CutoffPlaneM { get; init; }

    /// <summary>The antenna's total directivity (array × flare), dBi.</summary>
    public required double TotalDirectivityDbi { get; init; }

    /// <summary>The antenna's total gain, dBi.</summary>
    public required double TotalGainDbi { get; init; }

    /// <summary>requirements.vertical_beamwidth, degrees; null when not given.</summary>
    public double? RequiredVerticalHpbwDeg { get; init; }

    /// <summary>Elevations of the vertical cut, degrees.</summary>
    public IReadOnlyList<double> CutElevationDeg { get; init; } = [];

    /// <summary>The vertical cut, dB relative to boresight.</summary>
    public IReadOnlyList<double> CutLevelDb { get; init; } = [];

    /// <summary>The report of a flare outcome.</summary>
    /// <param name="o">What the flare does.</param>
    /// <param name="required">requirements.vertical_beamwidth, or null.</param>
    internal static FlareReport Of(FlareOutcome o, Core.Quantities.Angle? required)
    {
        ArgumentNullException.ThrowIfNull(o);
        var chosen = new List<string>();
        if (o.Asked.Length is null) chosen.Add("length");
        if (o.Asked.Aperture is null) chosen.Add("aperture");
        return new FlareReport
        {
            ThroatM = o.Flare.Throat.Meters,
            ApertureM = o.Flare.Aperture.Meters,
            LengthM = o.Flare.Length.Meters,
            Chosen = chosen.AsReadOnly(),
            VerticalHpbwDeg = o.VerticalBeamwidth.Degrees,
            FirstSidelobeDb = o.FirstSidelobeDb ?? double.NaN,
            PhaseErrorDeg = o.PhaseError.Degrees,
            PhaseErrorLossDb = o.PhaseErrorLossDb,
            ThroatLossDb = o.ThroatLossDb,
            CutoffPlaneM = o.CutoffPlane.Meters,
            TotalDirectivityDbi = o.TotalDirectivityDbi,
            TotalGainDbi = o.TotalGainDbi,
            RequiredVerticalHpbwDeg = required?.Degrees,
            CutElevationDeg = o.CutElevationDeg,
            CutLevelDb = o.CutLevelDb,
        };
    }
}

/// <summary>One row of the pointing table.</summary>
public sealed record PointingRow
{
    /// <summary>Guide temperature, °C.</summary>
    public required double TemperatureC { get; init; }

    /// <summary>Transmitter frequency, Hz.</summary>
    public required double FrequencyHz { get; init; }

    /// <summary>Equivalent frequency of the antenna as built, Hz.</summary>
    public required double EquivalentFrequencyHz { get; init; }

    /// <summary>Beam direction, degrees (+ toward the load end).</summary>
    public required double BeamDeg { get; init; }

    /// <summary>Beam minus the nominal beam, degrees.</summary>
    public required double ErrorDeg { get; init; }

    /// <summary>True when read off the analysed sweep; false from the phase condition.</summary>
    public required bool FromSweep { get; init; }
}

/// <summary>The beam over the operating range and the worst bearing error.</summary>
public sealed record PointingReport
{
    /// <summary>Lowest and highest operating temperature, °C.</summary>
    public required double LowC { get; init; }

    /// <summary>Highest operating temperature, °C.</summary>
    public required double HighC { get; init; }

    /// <summary>± transmitter frequency tolerance, Hz.</summary>
    public required double FrequencyToleranceHz { get; init; }

    /// <summary>Linear expansion coefficient of the wall metal, 1/K (NaN when unknown).</summary>
    public required double ExpansionPerKelvin { get; init; }

    /// <summary>Where that coefficient comes from ("" when unknown).</summary>
    public required string ExpansionSource { get; init; }

    /// <summary>The nominal beam (design frequency, 20 °C), degrees.</summary>
    public required double NominalBeamDeg { get; init; }

    /// <summary>Beam drift per kelvin, degrees.</summary>
    public required double DegPerKelvin { get; init; }

    /// <summary>Beam drift per MHz, degrees.</summary>
    public required double DegPerMhz { get; init; }

    /// <summary>Largest |beam − nominal| over the operating range, degrees.</summary>
    public required double WorstErrorDeg { get; init; }

    /// <summary>The table: temperatures × frequencies.</summary>
    public required IReadOnlyList<PointingRow> Rows { get; init; }

    /// <summary>The report of a pointing budget.</summary>
    /// <param name="b">The budget.</param>
    internal static PointingReport Of(PointingBudget b)
    {
        ArgumentNullException.ThrowIfNull(b);
        return new PointingReport
        {
            LowC = b.Range.LowCelsius,
            HighC = b.Range.HighCelsius,
            FrequencyToleranceHz = b.Range.FrequencyTolerance.Hertz,
            ExpansionPerKelvin = b.Expansion?.Coefficient ?? double.NaN,
            ExpansionSource = b.Expansion?.Source ?? "",
            NominalBeamDeg = b.Nominal.Degrees,
            DegPerKelvin = b.DegreesPerKelvin,
            DegPerMhz = b.DegreesPerMegahertz,
            WorstErrorDeg = b.WorstErrorDegrees,
            Rows = [.. b.Cases.Select(c => new PointingRow
            {
                TemperatureC = c.TemperatureCelsius,
                FrequencyHz = c.Transmit.Hertz,
                EquivalentFrequencyHz = c.Equivalent.Hertz,
                BeamDeg = c.Beam.Degrees,
                ErrorDeg = c.ErrorDegrees,
                FromSweep = c.FromSweep,
            })],
        };
    }
}

/// <summary>A flare or filter part for the shop, in mm and degrees (<see cref="MarinePart"/>).</summary>
public sealed record PartRow
{
    /// <summary>What it is.</summary>
    public required string Name { get; init; }

    /// <summary>How many.</summary>
    public required int Quantity { get; init; }

    /// <summary>Length along the guide (flare plates) or thickness (filter plates), mm.</summary>
    public required double AlongGuideMm { get; init; }

    /// <summary>Slant width (flare plates) or depth from the slotted face (filter plates), mm.</summary>
    public required double WidthMm { get; init; }

    /// <summary>Height across the aperture (filter plates), mm; 0 for flare plates.</summary>
    public required double HeightMm { get; init; }

    /// <summary>First part's start (flare) or centre (filter) from datum A, mm.</summary>
    public required double FirstFromAMm { get; init; }

    /// <summary>Pitch (filter plates), mm; 0 for flare plates.</summary>
    public required double PitchMm { get; init; }

    /// <summary>Half-flare angle from the face normal (flare plates), degrees; 0 for filter plates.</summary>
    public required double AngleDeg { get; init; }

    /// <summary>The rows of the Core parts.</summary>
    /// <param name="parts">The parts.</param>
    internal static IReadOnlyList<PartRow> Of(IReadOnlyList<MarinePart> parts)
    {
        ArgumentNullException.ThrowIfNull(parts);
        return [.. parts.Select(p => new PartRow
        {
            Name = p.Name,
            Quantity = p.Quantity,
            AlongGuideMm = p.AlongGuide.Millimeters,
            WidthMm = p.Width.Millimeters,
            HeightMm = p.Height.Millimeters,
            FirstFromAMm = p.FirstFromA.Millimeters,
            PitchMm = p.Pitch.Millimeters,
            AngleDeg = p.AngleDegrees,
        })];
    }
}
