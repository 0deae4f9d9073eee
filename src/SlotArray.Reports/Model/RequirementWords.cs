using System.Globalization;
using SlotArray.Core.Design;
using SlotArray.Core.Verdicts;

namespace SlotArray.Reports.Model;

/// <summary>Words a Core <see cref="RequirementVerdict"/> for the reports: what, required, achieved; the verdict itself is Core's.</summary>
internal static class RequirementWords
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>The report line of one verdict.</summary>
    /// <param name="v">The verdict.</param>
    /// <param name="request">The request (analysis band, for the band kinds).</param>
    public static RequirementResult Of(RequirementVerdict v, ArrayRequest request)
    {
        ArgumentNullException.ThrowIfNull(v);
        ArgumentNullException.ThrowIfNull(request);
        string sweep = string.Create(Inv, $"({v.BandPoints} frequencies from {request.BandLow.Gigahertz:0.####} to {request.BandHigh.Gigahertz:0.####} GHz)");
        var (description, required, achieved) = v.Kind switch
        {
            RequirementKind.SidelobesAtDesign => ("peak sidelobe at the design frequency", Level(v),
                string.Create(Inv, $"{v.Achieved:0.00} dB at {v.At.Gigahertz:0.####} GHz")),
            RequirementKind.SidelobesOverBand => ("peak sidelobe, worst over the analysis band", Level(v),
                string.Create(Inv, $"{v.Achieved:0.00} dB at {v.At.Gigahertz:0.####} GHz {sweep}")),
            RequirementKind.Vswr => ("VSWR over the whole analysis band", string.Create(Inv, $"≤ {v.Limit:0.0##}"),
                string.Create(Inv, $"{v.Achieved:0.000} worst, at {v.At.Gigahertz:0.####} GHz {sweep}")),
            RequirementKind.CrossPolar => ("peak cross-polar level, worst over the analysis band", string.Create(Inv, $"≤ {v.Limit:0.0#} dB"),
                string.Create(Inv, $"{v.Achieved:0.00} dB worst; {v.DetailDb:0.00} dB at {v.Direction?.Degrees:0.#} deg at the design frequency {(request.Filter is null ? "(bare slots, no polarisation filter)" : "(behind the polarisation filter)")}")),
            RequirementKind.VerticalBeamwidth => ("vertical half-power beamwidth (flare) at the design frequency",
                string.Create(Inv, $"{v.Limit:0.0#} ± {RequirementChecks.VerticalBeamwidthToleranceDegrees:0.#} deg"),
                string.Create(Inv, $"{v.Achieved:0.00} deg at {v.At.Gigahertz:0.####} GHz")),
            RequirementKind.PowerHandling => ("peak power within the waveguide's derated power handling",
                string.Create(Inv, $"≤ {Kw(v.Limit)} kW peak (derated, at {v.At.Gigahertz:0.####} GHz)"),
                string.Create(Inv, $"{Kw(v.Achieved)} kW peak, margin {v.DetailDb:0.0} dB")),
            _ => throw new ArgumentOutOfRangeException(nameof(v), v.Kind, "unknown requirement kind"),
        };
        return new RequirementResult { Description = description, Required = required, Achieved = achieved, Passed = v.Passed };
    }

    private static string Level(RequirementVerdict v) => string.Create(Inv, $"≤ {v.Limit:0.0#} dB") + v.Origin switch
    {
        SidelobeTargetOrigin.TaperDesignLevel => " (the taper's design level)",
        SidelobeTargetOrigin.TaperOwnLevel => " (the taper's own level: peak sidelobe of its weights' array factor)",
        _ => "",
    };

    private static string Kw(double watts) => (watts / 1e3).ToString("0.###", Inv);
}
