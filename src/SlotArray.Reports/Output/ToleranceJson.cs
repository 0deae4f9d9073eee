using System.Text.Encodings.Web;
using System.Text.Json;
using SlotArray.Core.Design;
using SlotArray.Core.Fabrication;
using SlotArray.Core.Tolerance;

namespace SlotArray.Reports;

/// <summary>
/// <c>tolerance.json</c>: the Monte Carlo statistics and the ranked sensitivities, keys with unit suffixes, numbers
/// rounded to 6 decimals so that the same spec and seed give byte-identical files.
/// </summary>
internal static class ToleranceJson
{
    /// <summary>Writes the document (UTF-8, indented, '\n' line ends).</summary>
    /// <param name="name">Array name.</param>
    /// <param name="frequencyHz">Design frequency, Hz.</param>
    /// <param name="result">The tolerance analysis.</param>
    /// <param name="stream">Target.</param>
    public static void Write(string name, double frequencyHz, ToleranceResult result, Stream stream)
    {
        ArgumentNullException.ThrowIfNull(result);
        var mc = result.MonteCarlo;
        var t = result.Tolerance;
        using var w = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping, NewLine = "\n" });
        w.WriteStartObject();
        w.WriteString("name", name);
        w.WriteNumber("frequency_hz", frequencyHz);
        w.WriteNumber("trials", mc.Trials);
        w.WriteNumber("seed", mc.Seed);
        w.WriteNumber("target_db", R(mc.TargetDb));
        w.WriteStartObject("tolerances_mm");
        foreach (var (key, tol) in Tolerances(t))
        {
            w.WriteStartObject(key);
            w.WriteNumber("value_mm", R(tol.Value.Millimeters));
            w.WriteString("law", tol.Distribution == ErrorDistribution.Normal ? "normal sigma" : "uniform +/-");
            w.WriteEndObject();
        }
        if (t.Tilt.Value.Radians != 0)
        {
            w.WriteStartObject("tilt");
            w.WriteNumber("value_deg", R(t.Tilt.Value.Degrees));
            w.WriteString("law", t.Tilt.Distribution == ErrorDistribution.Normal ? "normal sigma" : "uniform +/-");
            w.WriteEndObject();
        }
        w.WriteNumber("systematic_length_mm", R(t.SystematicLength.Millimeters));
        w.WriteNumber("systematic_offset_mm", R(t.SystematicOffset.Millimeters));
        w.WriteEndObject();
        w.WriteStartObject("nominal");
        w.WriteNumber("peak_sidelobe_db", R(mc.Nominal.PeakSidelobeDb));
        w.WriteNumber("beam_direction_deg", R(mc.Nominal.BeamDirectionDeg));
        w.WriteNumber("s11_db", R(mc.Nominal.S11Db));
        w.WriteNumber("gain_dbi", R(10 * Math.Log10(mc.Nominal.Gain)));
        w.WriteEndObject();
        Summary(w, "peak_sidelobe_db", mc.PeakSidelobeDb, true, true, true, true, true);
        w.WriteNumber("probability_meets_target", R(mc.ProbabilityMeetsTarget));
        Summary(w, "gain_loss_db", mc.GainLossDb, true, false, false, true, false);
        Summary(w, "pointing_error_deg", mc.PointingErrorDeg, false, false, false, true, false);
        Summary(w, "s11_db_at_design", mc.S11Db, false, true, false, true, false);
        w.WriteNumber("analytic_floor_db", R(mc.AnalyticFloorDb));
        w.WriteNumber("monte_carlo_floor_db", R(mc.MonteCarloFloorDb));
        w.WriteNumber("amplitude_error_rms", R(mc.AmplitudeErrorRms));
        w.WriteNumber("phase_error_rms_deg", R(mc.PhaseErrorRms * 180 / Math.PI));
        w.WriteNumber("taper_efficiency", R(mc.TaperEfficiency));
        w.WriteNumber("surrogate_samples", result.SurrogateSamples);
        w.WriteStartArray("sensitivities");
        foreach (var s in result.Sensitivities)
        {
            w.WriteStartObject();
            w.WriteNumber("slot", s.Slot);
            w.WriteString("quantity", QuantityName(s.Quantity));
            w.WriteNumber("dsll_db_per_" + s.Unit, R(s.DsllDbPerUnit));
            w.WriteNumber("ds11_db_per_" + s.Unit, R(s.Ds11DbPerUnit));
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteString("notes", "offset errors count positive away from the centreline, position errors toward +z; S11 at the design frequency; "
            + "sensitivities by central differences of 0.01 mm on the nominal design with the slot model (edge slots: tilt per degree, "
            + "stepped by the angle that moves the slot's end 0.01 mm; depth of cut into each broad wall per mm); " + Invariant.Normalisation);
        w.WriteEndObject();
        w.Flush();
        stream.WriteByte((byte)'\n');
    }

    /// <summary>The document as a string.</summary>
    public static string ToText(string name, double frequencyHz, ToleranceResult result)
    {
        using var ms = new MemoryStream();
        Write(name, frequencyHz, result, ms);
        return System.Text.Encoding.UTF8.GetString(ms.ToArray());
    }

    /// <summary>The spec's key of each random length tolerance, in the spec's order (the edge slots' depth only when given; the tilt, an angle, apart).</summary>
    internal static IEnumerable<(string Key, MachiningTolerance Value)> Tolerances(ToleranceRequest t) =>
    [
        ("offset", t.Offset), ("length", t.Length), ("position", t.Position), ("width", t.Width), ("guide_width", t.GuideWidth), ("wall", t.Wall),
        .. t.Depth.Value.Meters != 0 ? [("depth", t.Depth)] : Array.Empty<(string, MachiningTolerance)>(),
    ];

    /// <summary>The report name of a quantity.</summary>
    public static string QuantityName(ToleranceQuantity q) => q switch
    {
        ToleranceQuantity.Offset => "offset",
        ToleranceQuantity.Length => "length",
        ToleranceQuantity.Position => "position",
        ToleranceQuantity.Tilt => "tilt",
        ToleranceQuantity.Depth => "depth",
        _ => "width",
    };

    private static void Summary(Utf8JsonWriter w, string key, SampleSummary s, bool mean, bool p50, bool p90, bool p95, bool p99)
    {
        w.WriteStartObject(key);
        if (mean) w.WriteNumber("mean", R(s.Mean));
        if (p50) w.WriteNumber("p50", R(s.P50));
        if (p90) w.WriteNumber("p90", R(s.P90));
        if (p95) w.WriteNumber("p95", R(s.P95));
        if (p99) w.WriteNumber("p99", R(s.P99));
        w.WriteNumber("max", R(s.Maximum));
        w.WriteEndObject();
    }

    private static double R(double v) => double.IsFinite(v) ? Math.Round(v, 6) + 0.0 : 0.0;
}
