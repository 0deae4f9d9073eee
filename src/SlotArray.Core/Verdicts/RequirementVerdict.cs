using SlotArray.Core.Quantities;

namespace SlotArray.Core.Verdicts;

/// <summary>What a requirement verdict is about.</summary>
internal enum RequirementKind
{
    /// <summary>Peak sidelobe at the design frequency, dB (<see cref="SidelobeTarget"/>).</summary>
    SidelobesAtDesign,
    /// <summary>Peak sidelobe, worst over the analysis band, dB.</summary>
    SidelobesOverBand,
    /// <summary>VSWR, worst over the analysis band.</summary>
    Vswr,
    /// <summary>Peak cross-polar level, worst over the design frequency and the band, dB (edge slots).</summary>
    CrossPolar,
    /// <summary>Transmitter peak power against the guide's derated power handling, W.</summary>
    PowerHandling,
    /// <summary>Vertical half-power beamwidth of the flare at the design frequency, degrees, within ±1° of the asked value.</summary>
    VerticalBeamwidth,
}

/// <summary>
/// One requirement checked against the design, as data (the reports word it). Limits and achieved values are in the
/// kind's unit: dB for sidelobes and cross-polar level, a ratio for VSWR, W for power handling.
/// </summary>
/// <param name="Kind">What is checked.</param>
/// <param name="Limit">The largest acceptable value (sidelobes, cross-polar, VSWR: the spec's; power: the derated handling).</param>
/// <param name="Achieved">The design's value (worst over the frequencies checked; power: the transmitter's peak power).</param>
/// <param name="At">The frequency of <paramref name="Achieved"/>.</param>
/// <param name="Passed">Whether <paramref name="Achieved"/> is within <paramref name="Limit"/>, compared as printed (<see cref="RequirementChecks"/>).</param>
internal sealed record RequirementVerdict(RequirementKind Kind, double Limit, double Achieved, Frequency At, bool Passed)
{
    /// <summary>Sidelobe kinds: where the limit comes from.</summary>
    public SidelobeTargetOrigin? Origin { get; init; }

    /// <summary>Band kinds: how many frequencies of the analysis band were checked (0: the design frequency only).</summary>
    public int BandPoints { get; init; }

    /// <summary>Cross-polar: the level at the design frequency, dB, and where it peaks; power handling: the margin, dB.</summary>
    public double? DetailDb { get; init; }

    /// <summary>Cross-polar: direction of the peak at the design frequency.</summary>
    public Angle? Direction { get; init; }
}
