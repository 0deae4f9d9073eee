using System.Globalization;
using SlotArray.Core.Design;
using SlotArray.Core.Fabrication;
using SlotArray.Core.Tolerance;

namespace SlotArray.Reports;

/// <summary>The tolerance result in plain words, for <c>summary.md</c> and the terminal.</summary>
internal static class ToleranceSummary
{
    /// <summary>
    /// The lines: what was applied and how many builds meet the target ("with ±0.02 mm on offsets and lengths, 87 % of
    /// builds meet −26 dB"), the percentiles, gain, pointing and match, the analytic cross-check and the slots that matter most.
    /// </summary>
    /// <param name="result">The tolerance analysis.</param>
    /// <param name="top">How many ranked sensitivities to name; default 3.</param>
    public static IReadOnlyList<string> Lines(ToleranceResult result, int top = 3)
    {
        ArgumentNullException.ThrowIfNull(result);
        var mc = result.MonteCarlo;
        var lines = new List<string>
        {
            string.Format(CultureInfo.InvariantCulture, "With {0}, {1} % of builds meet {2} dB ({3} trials, seed {4}).",
                Applied(result.Tolerance), Invariant.Fixed(100 * mc.ProbabilityMeetsTarget, 1), Invariant.Fixed(mc.TargetDb, 1), Invariant.Int(mc.Trials), Invariant.Int(mc.Seed)),
            $"Peak sidelobe: nominal {Invariant.Fixed(mc.Nominal.PeakSidelobeDb, 2)} dB; over the builds mean {Invariant.Fixed(mc.PeakSidelobeDb.Mean, 2)} dB, median {Invariant.Fixed(mc.PeakSidelobeDb.P50, 2)} dB, 90 % {Invariant.Fixed(mc.PeakSidelobeDb.P90, 2)} dB, 95 % {Invariant.Fixed(mc.PeakSidelobeDb.P95, 2)} dB, 99 % {Invariant.Fixed(mc.PeakSidelobeDb.P99, 2)} dB.",
            $"Gain loss: mean {Invariant.Fixed(mc.GainLossDb.Mean, 3)} dB, 95 % of builds lose less than {Invariant.Fixed(mc.GainLossDb.P95, 3)} dB; beam pointing within {Invariant.Fixed(mc.PointingErrorDeg.P95, 3)} deg for 95 %.",
            $"Match at the design frequency: S11 median {Invariant.Fixed(mc.S11Db.P50, 1)} dB, 95 % of builds below {Invariant.Fixed(mc.S11Db.P95, 1)} dB (nominal {Invariant.Fixed(mc.Nominal.S11Db, 1)} dB).",
            $"Random-error floor (Ruze 1966): {Invariant.Fixed(mc.AnalyticFloorDb, 1)} dB from the excitation errors the trials produced (σ_a = {Invariant.Fixed(100 * mc.AmplitudeErrorRms, 2)} %, σ_φ = {Invariant.Fixed(mc.PhaseErrorRms * 180 / Math.PI, 2)} deg); the Monte Carlo mean floor is {Invariant.Fixed(mc.MonteCarloFloorDb, 1)} dB.",
        };
        var most = result.Sensitivities.Take(top).Select(s =>
            $"slot {Invariant.Int(s.Slot)} {ToleranceJson.QuantityName(s.Quantity)} ({Invariant.Fixed(s.DsllDbPerUnit, 2)} dB of sidelobe per {(s.Unit == "deg" ? "degree" : s.Unit)})").ToArray();
        if (most.Length > 0) lines.Add($"The dimensions that matter most: {string.Join(", ", most)}.");
        return lines;
    }

    /// <summary>"±0.02 mm on offsets and lengths, σ 0.05 mm on the wall" for the tolerances that are not zero.</summary>
    public static string Applied(ToleranceRequest t)
    {
        ArgumentNullException.ThrowIfNull(t);
        string[] nouns = ["offsets", "lengths", "positions", "widths", "the guide width", "the wall", "depths of cut"];
        var groups = ToleranceJson.Tolerances(t).Select((p, i) => (p.Value, Noun: nouns[i])).Where(p => p.Value.Value.Meters != 0)
            .GroupBy(p => (p.Value.Value.Meters, p.Value.Distribution))
            .Select(g => $"{(g.Key.Distribution == ErrorDistribution.Normal ? "σ " : "±")}{Invariant.Mm(g.Key.Meters, 3).TrimEnd('0').TrimEnd('.')} mm on {Join(g.Select(p => p.Noun).ToList())}")
            .ToList();
        if (t.Tilt.Value.Radians != 0)
            groups.Add($"{(t.Tilt.Distribution == ErrorDistribution.Normal ? "σ " : "±")}{Invariant.Fixed(t.Tilt.Value.Degrees, 3).TrimEnd('0').TrimEnd('.')} deg on tilts");
        if (t.SystematicLength.Meters != 0) groups.Add($"every slot {Invariant.Mm(t.SystematicLength.Meters)} mm {(t.SystematicLength.Meters > 0 ? "long" : "short")}");
        if (t.SystematicOffset.Meters != 0) groups.Add($"every slot shifted {Invariant.Mm(t.SystematicOffset.Meters)} mm in x");
        return groups.Count == 0 ? "no machining errors" : Join(groups);
    }

    private static string Join(IReadOnlyList<string> parts) => parts.Count switch
    {
        1 => parts[0],
        2 => $"{parts[0]} and {parts[1]}",
        _ => string.Join(", ", parts.Take(parts.Count - 1)) + " and " + parts[^1],
    };
}
