namespace SlotArray.Core.Safety;

/// <summary>
/// The cautions every summary carries, as data: one standard caution always, and specific ones derived from an
/// exposure assessment and a power-handling check when a transmitter is given. Wording is the project's own.
/// </summary>
internal static class SafetyCautions
{
    /// <summary>The standard caution present in every summary.</summary>
    public static DesignWarning Standard { get; } = new("safety-general",
        "RF exposure and high power can hurt: keep out of the beam while transmitting. Local regulations and licensed "
        + "practice govern installation and operation. The figures here are screening estimates, not a compliance assessment.");

    /// <summary>
    /// The standard caution, then (when given) the exposure and power-handling cautions, in a fixed order.
    /// </summary>
    /// <param name="exposure">The exposure screen, or null when no transmitter was given.</param>
    /// <param name="power">The power-handling check, or null.</param>
    public static IReadOnlyList<DesignWarning> For(ExposureAssessment? exposure = null, PowerHandling? power = null)
    {
        var list = new List<DesignWarning> { Standard };
        if (exposure is not null) list.AddRange(Exposure(exposure));
        if (power is not null) list.AddRange(Power(power));
        return list;
    }

    private static IEnumerable<DesignWarning> Exposure(ExposureAssessment e)
    {
        string rotating = e.RotationFactor < 1 ? " (stationary beam; time-averaged while rotating: within " : "";
        foreach (var d in e.Distances)
        {
            string tier = d.Level.Tier == ExposureTier.Occupational ? "occupational" : "general-public";
            string extent = d.Level.Extent == ExposureExtent.WholeBody ? "whole-body" : "local";
            string avg = e.RotationFactor < 1 ? rotating + SafetyText.Metres(d.TimeAveraged) + ")" : "";
            yield return new DesignWarning($"exposure-{tier}-{extent}",
                $"{Capital(tier)} {extent} reference level ({d.Level.Guideline}, {SafetyText.Sig3(d.Level.PowerDensity)} W/m²) "
                + $"reached within {SafetyText.Metres(d.Stationary)} on the beam axis{avg}"
                + (d.NearFieldBoundBelowLevel ? $"; the near-field bound 4P/A = {SafetyText.Sig3(e.NearFieldBound)} W/m² stays below this level" : "")
                + ".");
        }
        if (NearFieldNote(e) is { } note)
            yield return new DesignWarning("exposure-near-field", note + $" The near-field bound 4P/A is {SafetyText.Sig3(e.NearFieldBound)} W/m².");
        foreach (var w in e.Warnings.Where(w => w.Code != "exposure-near-field"))
            yield return w;
    }

    /// <summary>
    /// Which of the reference-level distances lie inside the far-field distance 2D²/λ, where the far-field formula is a
    /// conservative screen and not a field prediction, named so that a distance beyond it is never said to lie inside;
    /// null when none does.
    /// </summary>
    /// <param name="e">The exposure screen.</param>
    public static string? NearFieldNote(ExposureAssessment e)
    {
        ArgumentNullException.ThrowIfNull(e);
        var inside = e.Distances.Where(d => d.InsideFarFieldDistance).ToList();
        if (inside.Count == 0) return null;
        string ff = SafetyText.Metres(e.FarFieldDistance);
        if (inside.Count == e.Distances.Count)
            return (inside.Count == 1 ? "This distance lies" : "These distances all lie")
                + $" inside the far-field distance 2D²/λ = {ff}: the far-field formula is a conservative screen there, not a field prediction.";
        var beyond = e.Distances.Where(d => !d.InsideFarFieldDistance);
        return $"Of these distances, {string.Join(", ", inside.Select(d => SafetyText.Metres(d.Stationary)))} lie inside the far-field distance 2D²/λ = {ff} "
            + $"(the far-field formula is a conservative screen there, not a field prediction); {string.Join(", ", beyond.Select(d => SafetyText.Metres(d.Stationary)))} lie beyond it, where the formula applies.";
    }

    private static string Capital(string s) => char.ToUpperInvariant(s[0]) + s[1..];

    private static IEnumerable<DesignWarning> Power(PowerHandling p)
    {
        string basis = $"{SafetyText.Sig3(p.TheoreticalMaximum / 1e3)} kW theoretical at {p.Frequency} divided by {SafetyText.Sig3(p.TotalDerating)}: "
            + $"VSWR {SafetyText.Sig3(p.Vswr)} (×{SafetyText.Sig3(p.MismatchFactor)}), standing-wave peak field ×{SafetyText.Sig3(p.StandingWaveFieldFactor)} "
            + $"(×{SafetyText.Sig3(p.StandingWaveFactor)} in power), safety factor {SafetyText.Sig3(p.SafetyFactor)}"
            + (p.Altitude > 0 ? $", altitude {SafetyText.Sig3(p.Altitude)} m (×{SafetyText.Sig3(p.AltitudeFactor)})" : "");
        if (p.PeakPower is not { } peak || p.MarginDecibels is not { } margin)
        {
            yield return new DesignWarning("power-handling",
                $"Waveguide power handling {SafetyText.Sig3(p.AllowedPeakPower / 1e3)} kW peak ({basis}).");
            yield break;
        }
        string verdict = margin >= 0
            ? $"margin {margin:0.0} dB"
            : $"exceeds the derated handling by {-margin:0.0} dB: reduce the peak power, pressurise or use a larger guide";
        yield return new DesignWarning(margin >= 0 ? "power-handling" : "power-handling-exceeded",
            $"Peak power {SafetyText.Sig3(peak / 1e3)} kW against a derated waveguide handling of "
            + $"{SafetyText.Sig3(p.AllowedPeakPower / 1e3)} kW ({basis}): {verdict}.");
    }
}
