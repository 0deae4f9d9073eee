using System.Globalization;
using SlotArray.Core.Design;
using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Safety;

/// <summary>
/// The safety screen of one designed array with its transmitter: the RF exposure estimate from the average power, the
/// power-handling margin of the guide at the peak power with the array's own standing-wave peak field, and the
/// cautions in words, in a fixed order. Screening estimates, not a compliance assessment.
/// </summary>
/// <param name="Exposure">The exposure screen; null without <c>transmitter.average_power</c>.</param>
/// <param name="Power">The power-handling check; null without <c>transmitter.peak_power</c>.</param>
/// <param name="StandingWavePeakFactor">The array's own peak-field factor k (<see cref="StandingWavePeak"/>); null without a peak power.</param>
/// <param name="Cautions">The standard caution, then the exposure and power cautions and their notes.</param>
internal sealed record ArraySafety(ExposureAssessment? Exposure, PowerHandling? Power, double? StandingWavePeakFactor, IReadOnlyList<DesignWarning> Cautions)
{
    /// <summary>EIRP at the peak power and the design frequency's gain, W (<see cref="EffectiveRadiatedPower"/>); null without a peak power.</summary>
    public double? PeakEirpWatts { get; init; }

    /// <summary>EIRP at the average power and the design frequency's gain, W; null without an average power.</summary>
    public double? AverageEirpWatts { get; init; }

    /// <summary>The cautions that report a limit exceeded (exposure or power handling), in order.</summary>
    public IEnumerable<DesignWarning> Exceedances => Cautions.Where(c => c.Code.EndsWith("-exceeded", StringComparison.Ordinal));

    /// <summary>The power-handling over-stress caution, if any (also a FAIL verdict; shown as a warning as it happens).</summary>
    public IEnumerable<DesignWarning> OverStress => Cautions.Where(c => c.Code == "power-handling-exceeded");

    /// <summary>
    /// The power-handling margin at the peak power, dB: <see cref="PowerHandling.MarginDecibels"/>, less
    /// 20 log10(k/2) when the array's own peak-field factor k exceeds 2, the largest the derating takes (breakdown power
    /// scales with the square of the peak field); null without a peak power. Negative: over-stressed.
    /// </summary>
    public double? PowerMarginDb => Power?.MarginDecibels is { } m
        ? m - 20 * Math.Log10(Math.Max(1, (StandingWavePeakFactor ?? 1) / PowerHandling.ResonantArrayFieldFactor))
        : null;

    /// <summary>
    /// The radiating face the slots are cut in, as the physical aperture of the near-field bound 4P/A (FCC OET
    /// Bulletin 65, Ed. 97-01, 1997): its length N × spacing and its outside width, the broad face a + 2t for
    /// broad-wall (longitudinal and inclined-series) slots and the narrow face b + 2t for edge slots.
    /// </summary>
    /// <param name="type">The slot type.</param>
    /// <param name="guide">The guide (inside a and b, wall thickness t).</param>
    /// <param name="count">Number of slots.</param>
    /// <param name="spacing">Slot spacing.</param>
    public static (Length Length, Length Width) Aperture(SlotType type, RectangularWaveguide guide, int count, Length spacing)
    {
        ArgumentNullException.ThrowIfNull(guide);
        var face = type == SlotType.Edge ? guide.NarrowWall : guide.BroadWall;
        return (count * spacing, face + 2 * guide.WallThickness);
    }

    /// <summary>
    /// The standing-wave peak-field factor used for the power-handling check: the largest of the network's peak mode
    /// voltage <see cref="NetworkSolution.PeakModeVoltage"/> (inside the slotted section) and 1 + |S11| (the feed line's
    /// own peak, D. M. Pozar, <i>Microwave Engineering</i>, 4th ed., Wiley 2012, Sec. 2.3: |V|max = |V+|(1 + |Γ|)) over the
    /// design frequency and every sweep frequency, with the frequency where it occurs. It includes the reflection at
    /// the feed, so the power check applies no separate VSWR factor. Never below 1: the feed guide carries the whole
    /// incident wave.
    /// </summary>
    /// <param name="result">The pipeline's result.</param>
    public static (double Factor, Frequency At) StandingWavePeak(ArrayResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        var all = result.SweepFigures.Select(p => p.Network).Prepend(result.AtDesign.Network);
        var worst = all.MaxBy(Peak)!;
        return (Math.Max(1, Peak(worst)), worst.Frequency);
        static double Peak(NetworkSolution n) => Math.Max(n.PeakModeVoltage, 1 + n.S11.Magnitude);
    }

    /// <summary>Screens one pipeline result with the request's transmitter (only the standard caution without one).</summary>
    /// <param name="result">The pipeline's result.</param>
    public static ArraySafety Assess(ArrayResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        var request = result.Request;
        var design = result.Design;
        if (request.Transmitter is not { } tx) return new ArraySafety(null, null, null, [SafetyCautions.Standard]);
        ExposureAssessment? exposure = null;
        if (tx.AveragePower is { } avg)
        {
            var (length, width) = Aperture(request.Slots.Type, design.Guide, design.Count, design.Spacing);
            exposure = ExposureAssessment.Assess(avg, result.AtDesign.GainDbi, design.DesignFrequency, length, width);
        }
        PowerHandling? power = null;
        double? factor = null;
        var notes = new List<DesignWarning>();
        if (tx.PeakPower is { } peak)
        {
            var (k, at) = StandingWavePeak(result);
            factor = k;
            power = PowerHandling.Assess(design.Guide, design.DesignFrequency, vswr: 1.0,
                standingWaveFieldFactor: Math.Min(k, PowerHandling.ResonantArrayFieldFactor), peakPower: peak);
            notes.Add(new DesignWarning("power-standing-wave-factor", string.Create(CultureInfo.InvariantCulture,
                $"The standing-wave peak-field factor {k:0.###} is this array's own: the largest mode voltage anywhere on the line (slotted section and feed), relative to the incident wave, over the design frequency and the sweep (worst at {at.Gigahertz:0.####} GHz); it includes the reflection at the feed, so no separate VSWR factor is applied, and it replaces the blanket factor 2 of a full standing wave.")
                + (k > PowerHandling.ResonantArrayFieldFactor ? " It exceeds 2, the largest factor the power check takes, so the margin above is optimistic: treat the design as over-stressed." : "")));
        }
        var cautions = SafetyCautions.For(exposure, power).Concat(notes).ToList();
        if (tx.AveragePower is null)
            cautions.Add(new DesignWarning("exposure-not-screened", "No average power was given (transmitter.average_power), so no RF exposure screen was made."));
        return new ArraySafety(exposure, power, factor, cautions)
        {
            PeakEirpWatts = tx.PeakPower is { } pk ? EffectiveRadiatedPower.Watts(pk, result.AtDesign.GainDbi) : null,
            AverageEirpWatts = tx.AveragePower is { } av ? EffectiveRadiatedPower.Watts(av, result.AtDesign.GainDbi) : null,
        };
    }
}
