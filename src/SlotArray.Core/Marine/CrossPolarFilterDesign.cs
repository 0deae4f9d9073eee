using System.Collections.Immutable;
using System.Globalization;
using SlotArray.Core.Network;
using SlotArray.Core.Patterns;
using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Marine;

/// <summary>
/// <c>filter:</c> as asked: each dimension given, or null for the tool to choose (<c>filter: auto</c> leaves all three
/// to <see cref="CrossPolarFilterDesign"/>).
/// </summary>
/// <param name="Spacing">Plate pitch, or null: <see cref="CrossPolarFilterDesign.AutoSpacing"/>.</param>
/// <param name="Depth">Plate depth, or null: the depth that meets <c>requirements.cross_polar</c> with <see cref="CrossPolarFilterDesign.MarginDb"/>.</param>
/// <param name="Thickness">Plate thickness, or null: <see cref="CrossPolarFilterDesign.DefaultThickness"/>.</param>
public sealed record FilterRequest(Length? Spacing, Length? Depth, Length? Thickness)
{
    /// <summary><c>filter: auto</c>.</summary>
    public static FilterRequest Auto { get; } = new(null, null, null);
}

/// <summary>What the filter did: its plates, and the cross-polar level before and after it across the band.</summary>
/// <param name="Filter">The plates.</param>
/// <param name="Asked">What the spec asked (which dimensions were chosen by the tool).</param>
/// <param name="MarginDb">Margin below the requirement the automatic depth was chosen for, dB (0 when the depth was given).</param>
/// <param name="BareWorstDb">Worst cross-polar peak over the design frequency and the band before the filter, dB relative to the co-polar beam.</param>
/// <param name="BareWorstFrequency">Where that worst bare level lies.</param>
/// <param name="FilteredWorstDb">Worst cross-polar peak after the filter over the same frequencies, dB.</param>
/// <param name="FilteredWorstFrequency">Where that worst filtered level lies.</param>
/// <param name="AttenuationAtDesignDb">Cross-polar attenuation of the plates at the design frequency, dB.</param>
/// <param name="SmallestAttenuationDb">Smallest cross-polar attenuation over the band (at its top frequency), dB.</param>
/// <param name="WantedLossDb">Largest loss of the wanted polarisation over the band, dB (applied to the gain).</param>
/// <param name="Warnings">Validity limits met (cutoff inside the band, grating order in real space, the model's limits).</param>
internal sealed record FilterOutcome(
    CrossPolarFilter Filter,
    FilterRequest Asked,
    double MarginDb,
    double BareWorstDb,
    Frequency BareWorstFrequency,
    double FilteredWorstDb,
    Frequency FilteredWorstFrequency,
    double AttenuationAtDesignDb,
    double SmallestAttenuationDb,
    double WantedLossDb,
    IReadOnlyList<DesignWarning> Warnings);

/// <summary>
/// Chooses the polarisation filter's plates (<c>filter: auto</c>) and applies them to the analysed figures: the
/// cross-polarised cut of every frequency scaled down by the plates' TE1 attenuation, the gain by the wanted
/// polarisation's loss (<see cref="CrossPolarFilter"/>).
/// </summary>
internal static class CrossPolarFilterDesign
{
    /// <summary>Margin below <c>requirements.cross_polar</c> the automatic depth is chosen for, 3 dB (common practice, no source).</summary>
    public const double MarginDb = 3;

    /// <summary>Plate thickness when not given: 0.5 mm sheet (common practice, no source).</summary>
    public static Length DefaultThickness { get; } = Length.FromMillimeters(0.5);

    /// <summary>
    /// Clear gap of the automatic pitch in wavelengths at the top of the band, 0.35: the TE1 cutoff then lies 1/0.7 ≈ 1.43
    /// times above the band, so the attenuation per millimetre stays high across it, while the open fraction (and so the
    /// wanted polarisation's match) stays near 1 for thin plates (common practice, no source).
    /// </summary>
    public const double GapInWavelengths = 0.35;

    /// <summary>The automatic depth is rounded up to this step, 0.5 mm (a machinable figure).</summary>
    public const double StepMillimeters = 0.5;

    /// <summary>
    /// The automatic pitch: the slot spacing divided by the smallest whole number k that brings the pitch to at most a
    /// clear gap of <see cref="GapInWavelengths"/> λ at the band's top plus the plate thickness. A whole number of plates
    /// per slot spacing lets every plate stand between two slots (<see cref="MarineParts"/> puts them at z_slot + s/2 +
    /// j s), never over a slot's opening.
    /// </summary>
    /// <param name="top">Highest analysis frequency.</param>
    /// <param name="thickness">Plate thickness.</param>
    /// <param name="slotSpacing">The array's slot spacing d.</param>
    public static Length AutoSpacing(Frequency top, Length thickness, Length slotSpacing)
    {
        double most = GapInWavelengths * top.FreeSpaceWavelength.Meters + thickness.Meters;
        int k = Math.Max(1, (int)Math.Ceiling(slotSpacing.Meters / most - 1e-12));
        return Length.FromMeters(slotSpacing.Meters / k);
    }

    /// <summary>
    /// The depth that brings every bare cross-polar level <paramref name="bare"/> (dB, at its frequency) to
    /// <paramref name="requirementDb"/> − <paramref name="marginDb"/>: max over f of (bare(f) − requirement + margin) /
    /// (dB per mm at f), rounded up to 0.5 mm, at least 0.5 mm.
    /// </summary>
    /// <param name="spacing">Plate pitch.</param>
    /// <param name="thickness">Plate thickness.</param>
    /// <param name="bare">Bare cross-polar peaks and their frequencies.</param>
    /// <param name="requirementDb">Required cross-polar level, dB (negative).</param>
    /// <param name="marginDb">Margin, dB.</param>
    /// <exception cref="InfeasibleDesignException">The gap is not below cutoff at some frequency (names it and the pitch to use).</exception>
    public static Length AutoDepth(Length spacing, Length thickness, IEnumerable<(Frequency F, double Db)> bare, double requirementDb, double marginDb)
    {
        ArgumentNullException.ThrowIfNull(bare);
        var unit = new CrossPolarFilter(spacing, Length.FromMillimeters(1), thickness).Validated();
        double mm = StepMillimeters;
        foreach (var (f, db) in bare)
        {
            double perMm = unit.AttenuationDbPerMillimeter(f);
            if (!(perMm > 0))
                throw new InfeasibleDesignException(string.Create(CultureInfo.InvariantCulture,
                    $"filter plates {spacing.Millimeters:0.###} mm apart ({unit.Gap.Millimeters:0.###} mm clear) pass the cross-polarised TE1 mode at {f} (cutoff {unit.CutoffTe1}): use a pitch below {f.FreeSpaceWavelength.Millimeters / 2 + thickness.Millimeters:0.##} mm"));
            mm = Math.Max(mm, (db - requirementDb + marginDb) / perMm);
        }
        return Length.FromMillimeters(Math.Ceiling(mm / StepMillimeters - 1e-9) * StepMillimeters);
    }

    /// <summary>
    /// The filter as asked (automatic dimensions chosen) applied to the figures at the design frequency and across the
    /// band. Returns the figures unchanged and null when there is no cross-polarised cut (untilted slots).
    /// </summary>
    /// <param name="asked">The spec's filter.</param>
    /// <param name="requirementDb">requirements.cross_polar, dB; needed when the depth is automatic.</param>
    /// <param name="atDesign">Figures at the design frequency.</param>
    /// <param name="band">Figures across the band.</param>
    /// <param name="beam">Main-beam direction (for the grating check).</param>
    /// <param name="slotSpacing">The array's slot spacing (the automatic pitch divides it).</param>
    /// <exception cref="InfeasibleDesignException">Automatic depth without a requirement, or a pitch that does not cut the cross-polarised field off.</exception>
    public static (FrequencyFigures AtDesign, IReadOnlyList<FrequencyFigures> Band, FilterOutcome? Outcome) Apply(FilterRequest asked, double? requirementDb,
        FrequencyFigures atDesign, IReadOnlyList<FrequencyFigures> band, Angle beam, Length slotSpacing)
    {
        ArgumentNullException.ThrowIfNull(asked);
        ArgumentNullException.ThrowIfNull(atDesign);
        ArgumentNullException.ThrowIfNull(band);
        if (atDesign.CrossPolar is null) return (atDesign, band, null);
        var all = band.Append(atDesign).Where(p => p.CrossPolar is not null).ToList();
        var top = all.MaxBy(p => p.Frequency.Hertz)!.Frequency;
        var thickness = asked.Thickness ?? DefaultThickness;
        var spacing = asked.Spacing ?? AutoSpacing(top, thickness, slotSpacing);
        double margin = 0;
        Length depth;
        if (asked.Depth is { } d) depth = d;
        else
        {
            if (requirementDb is not { } req)
                throw new InfeasibleDesignException("filter: the depth is chosen from requirements.cross_polar: give 'requirements: {cross_polar: -25 dB}' or 'filter.depth'");
            margin = MarginDb;
            depth = AutoDepth(spacing, thickness, all.Select(p => (p.Frequency, p.CrossPolar!.PeakLevelDb)), req, margin);
        }
        var filter = new CrossPolarFilter(spacing, depth, thickness).Validated();
        var bareWorst = all.MaxBy(p => p.CrossPolar!.PeakLevelDb)!;
        var filteredAt = Filtered(atDesign, filter);
        var filteredBand = band.Select(p => Filtered(p, filter)).ToList();
        var filteredWorst = filteredBand.Append(filteredAt).Where(p => p.CrossPolar is not null).MaxBy(p => p.CrossPolar!.PeakLevelDb)!;
        var warnings = new List<DesignWarning>
        {
            new("filter-model", "polarisation filter: infinitely wide perfect plates; the cross-polarised cut is scaled by the TE1 mode's decay through the depth (coupling into the mode at the entrance taken as lossless; higher modes decay faster), edge diffraction and the plates' loading of the slots are not modelled"),
        };
        if (all.Any(p => filter.AttenuationNeperPerMeter(p.Frequency) == 0))
            warnings.Add(new("filter-above-cutoff", string.Create(CultureInfo.InvariantCulture,
                $"the filter's TE1 cutoff {filter.CutoffTe1} lies inside the band: above it the plates pass the cross-polarised field; reduce the pitch below {top.FreeSpaceWavelength.Millimeters / 2 + thickness.Millimeters:0.##} mm")));
        if (all.Any(p => filter.HasGratingLobe(p.Frequency, beam)))
            warnings.Add(new("filter-grating", string.Create(CultureInfo.InvariantCulture,
                $"the filter's plate pitch {spacing.Millimeters:0.###} mm lets a grating order of the plates into real space (s (1 + |sin θ|) ≥ λ): reduce the pitch")));
        var outcome = new FilterOutcome(filter, asked, margin, bareWorst.CrossPolar!.PeakLevelDb, bareWorst.Frequency,
            filteredWorst.CrossPolar!.PeakLevelDb, filteredWorst.Frequency, filter.CrossPolarAttenuationDb(atDesign.Frequency),
            all.Min(p => filter.CrossPolarAttenuationDb(p.Frequency)), all.Max(p => filter.WantedLossDb(p.Frequency)), warnings.AsReadOnly());
        return (filteredAt, filteredBand.AsReadOnly(), outcome);
    }

    /// <summary>
    /// One frequency's figures behind the filter: the cross-polarised field scaled by 10^(−A/20) (A the TE1 attenuation),
    /// its peak level down by A dB and its power ratio by 10^(−A/10); the gain down by the wanted polarisation's loss.
    /// </summary>
    /// <param name="figures">The bare figures.</param>
    /// <param name="filter">The plates.</param>
    public static FrequencyFigures Filtered(FrequencyFigures figures, CrossPolarFilter filter)
    {
        ArgumentNullException.ThrowIfNull(figures);
        ArgumentNullException.ThrowIfNull(filter);
        var f = figures.Frequency;
        double wanted = Math.Pow(10, -filter.WantedLossDb(f) / 10);
        if (figures.CrossPolar is not { } cross) return figures with { Gain = figures.Gain * wanted };
        double a = filter.CrossPolarAttenuationDb(f), scale = Math.Pow(10, -a / 20);
        var field = cross.Pattern.Field.Select(x => x * scale).ToImmutableArray();
        var filtered = new CrossPolarFigures(new Pattern(cross.Pattern.Grid, field), cross.PeakLevelDb - a, cross.PeakDirection, cross.PowerRatio * scale * scale);
        return figures with { Gain = figures.Gain * wanted, CrossPolar = filtered };
    }
}
