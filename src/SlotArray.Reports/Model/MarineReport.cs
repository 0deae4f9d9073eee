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
    public static FilterReport Of(FilterOutcome outcome, Core.Quantities.Frequency f0, IReadOnlyList<double> filteredCut, double? requirementDb)
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
