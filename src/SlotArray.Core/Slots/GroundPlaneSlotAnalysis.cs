using System.Numerics;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Slots;

/// <summary>Result of <see cref="GroundPlaneSlot.Analyze"/>: impedances in Ω, lengths, the feed and its VSWR ≤ 2 band.</summary>
/// <param name="Length">Slot length L.</param>
/// <param name="Width">Slot width w.</param>
/// <param name="Frequency">Analysis frequency.</param>
/// <param name="OneSided">Whether the slot radiates into one half-space only.</param>
/// <param name="TargetResistance">Target input resistance at the feed, Ω.</param>
/// <param name="EquivalentRadius">Radius w/4 of the complementary dipole (Butler 1982).</param>
/// <param name="DipoleImpedance">Centre impedance of the complementary strip dipole, Ω.</param>
/// <param name="SlotImpedanceTwoSided">Centre impedance of the slot radiating on both sides, η²/(4 Z_d), Ω.</param>
/// <param name="SlotImpedanceOneSided">Centre impedance of the slot radiating into one half-space, η²/(2 Z_d), Ω.</param>
/// <param name="ResonantLength">Length at which the slot's reactance vanishes (for this width and frequency).</param>
/// <param name="FeedOffset">Distance s of the feed from one slot end giving the target resistance.</param>
/// <param name="FeedImpedance">Impedance at the feed, Ω (its real part is the target).</param>
/// <param name="BandLow">Lower edge of the VSWR ≤ 2 band (against the target resistance); null when not matched at f.</param>
/// <param name="BandHigh">Upper edge of the VSWR ≤ 2 band; null when not matched at f.</param>
/// <param name="Warnings">Validity limits met.</param>
internal sealed record GroundPlaneSlotAnalysis(
    Length Length,
    Length Width,
    Frequency Frequency,
    bool OneSided,
    double TargetResistance,
    Length EquivalentRadius,
    Complex DipoleImpedance,
    Complex SlotImpedanceTwoSided,
    Complex SlotImpedanceOneSided,
    Length ResonantLength,
    Length FeedOffset,
    Complex FeedImpedance,
    Frequency? BandLow,
    Frequency? BandHigh,
    IReadOnlyList<DesignWarning> Warnings)
{
    /// <summary>Centre impedance of the slot for the chosen radiation (one- or two-sided), Ω.</summary>
    public Complex CentreImpedance => OneSided ? SlotImpedanceOneSided : SlotImpedanceTwoSided;

    /// <summary>Fractional VSWR ≤ 2 bandwidth (f_high − f_low)/f; 0 when not matched at f.</summary>
    public double FractionalBandwidth => BandLow is { } lo && BandHigh is { } hi ? (hi.Hertz - lo.Hertz) / Frequency.Hertz : 0;
}
