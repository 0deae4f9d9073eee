using System.Globalization;
using SlotArray.Core.Design;
using SlotArray.Core.Safety;
using SlotArray.Core.Slots;

namespace SlotArray.Core.Verdicts;

/// <summary>The verdicts of one run and the notes on requirements that could not be checked.</summary>
/// <param name="Verdicts">One per requirement checked, in a fixed order: sidelobes at the design frequency and over the
/// band, VSWR, cross-polar level, power handling.</param>
/// <param name="Notes">Requirements given but not checkable by this analysis (e.g. cross-polar level of broad-wall slots).</param>
internal sealed record RequirementVerdicts(IReadOnlyList<RequirementVerdict> Verdicts, IReadOnlyList<DesignWarning> Notes)
{
    /// <summary>True when every verdict passed (exit code 0; otherwise 4, "a stated requirement is not met").</summary>
    public bool AllMet => Verdicts.All(v => v.Passed);
}

/// <summary>
/// Checks what the antenna must meet against a pipeline result: the sidelobe target (<see cref="SidelobeTarget"/>, the
/// same rule the tolerance analysis uses) at the design frequency and as the worst over the band sweep; the VSWR as
/// the worst over the band sweep; the cross-polar level (edge slots) as the worst over the design frequency and the
/// sweep; and, with a transmitter peak power, the guide's derated power handling (<see cref="ArraySafety"/>).
/// </summary>
/// <remarks>
/// Levels are compared as printed, rounded to 0.01 dB (VSWR to 0.001): a verdict never reads "required ≤ −13.15 dB,
/// achieved −13.15 dB: FAIL" over a difference the report does not show. The margin this allows (half the last
/// printed digit) is far below the accuracy of any of the models behind the figures.
/// </remarks>
internal static class RequirementChecks
{
    /// <summary>Checks every stated requirement of <paramref name="result"/>'s request.</summary>
    /// <param name="result">The pipeline's result.</param>
    /// <param name="safety">Its safety screen (<see cref="ArraySafety.Assess"/>), for the power-handling verdict.</param>
    public static RequirementVerdicts Evaluate(ArrayResult result, ArraySafety safety)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(safety);
        var request = result.Request;
        var band = result.SweepFigures;
        var f0 = result.Design.DesignFrequency;
        var list = new List<RequirementVerdict>();
        var notes = new List<DesignWarning>();

        if (SidelobeTarget.Of(request, result.Taper) is { } target)
        {
            double atDesign = result.AtDesign.Metrics.PeakSidelobeDb ?? double.NegativeInfinity;
            list.Add(new RequirementVerdict(RequirementKind.SidelobesAtDesign, target.LevelDb, atDesign, f0, WithinDb(atDesign, target.LevelDb))
                { Origin = target.Origin });
            if (band.Count > 0)
            {
                var worst = band.MaxBy(p => p.Metrics.PeakSidelobeDb ?? double.NegativeInfinity)!;
                double w = worst.Metrics.PeakSidelobeDb ?? double.NegativeInfinity;
                list.Add(new RequirementVerdict(RequirementKind.SidelobesOverBand, target.LevelDb, w, worst.Frequency, WithinDb(w, target.LevelDb))
                    { Origin = target.Origin, BandPoints = band.Count });
            }
        }
        if (request.Requirements.Vswr is { } vswr && band.Count > 0)
        {
            var worst = band.MaxBy(p => p.Network.S11.Magnitude)!;
            double v = worst.Network.Vswr;
            list.Add(new RequirementVerdict(RequirementKind.Vswr, vswr, v, worst.Frequency, Math.Round(v, 3) <= Math.Round(vswr, 3)) { BandPoints = band.Count });
        }
        if (request.Requirements.CrossPolarDb is { } xpol && result.AtDesign.CrossPolar is { } cross)
        {
            var worst = band.Count > 0 ? band.MaxBy(p => p.CrossPolar?.PeakLevelDb ?? double.NegativeInfinity)! : result.AtDesign;
            bool bandWorse = (worst.CrossPolar?.PeakLevelDb ?? double.NegativeInfinity) > cross.PeakLevelDb;
            double w = bandWorse ? worst.CrossPolar!.PeakLevelDb : cross.PeakLevelDb;
            list.Add(new RequirementVerdict(RequirementKind.CrossPolar, xpol, w, bandWorse ? worst.Frequency : f0, WithinDb(w, xpol))
                { BandPoints = band.Count, DetailDb = cross.PeakLevelDb, Direction = cross.PeakDirection });
        }
        else if (request.Requirements.CrossPolarDb is { } xp)
        {
            notes.Add(new DesignWarning("cross-polar-not-checked", string.Create(CultureInfo.InvariantCulture,
                $"requirements.cross_polar ({xp:0.0#} dB) is not checked: this analysis has no cross-polar prediction for {SlotTypeName(request.Slots.Type)} slots")));
        }
        if (safety.Power is { PeakPower: { } peak } power && safety.PowerMarginDb is { } margin)
        {
            list.Add(new RequirementVerdict(RequirementKind.PowerHandling, power.AllowedPeakPower, peak, power.Frequency, Math.Round(margin, 1) >= 0)
                { DetailDb = margin });
        }
        if (request.Requirements.VerticalBeamwidth is { } vbw)
        {
            if (result.AddOns.Flare is { } flare)
            {
                double got = flare.VerticalBeamwidth.Degrees;
                list.Add(new RequirementVerdict(RequirementKind.VerticalBeamwidth, vbw.Degrees, got, f0,
                    Math.Round(Math.Abs(got - vbw.Degrees), 2) <= VerticalBeamwidthToleranceDegrees));
            }
            else
                notes.Add(new DesignWarning("vertical-beamwidth-not-checked", string.Create(CultureInfo.InvariantCulture,
                    $"requirements.vertical_beamwidth ({vbw.Degrees:0.##} deg) is not checked: the vertical beam is set by a flare, and the spec has none (add 'flare: auto')")));
        }
        return new RequirementVerdicts(list, notes);
    }

    /// <summary>How far the flare's vertical beamwidth may lie from <c>requirements.vertical_beamwidth</c>, ±1° (issue 18: "within 1° of its requirement").</summary>
    public const double VerticalBeamwidthToleranceDegrees = 1.0;

    /// <summary>achieved ≤ limit, both rounded to 0.01 dB as printed.</summary>
    private static bool WithinDb(double achieved, double limit) => Math.Round(achieved, 2) <= Math.Round(limit, 2);

    private static string SlotTypeName(SlotType t) => t switch
    {
        SlotType.Longitudinal => "longitudinal",
        SlotType.Edge => "edge",
        _ => "inclined-series",
    };
}
