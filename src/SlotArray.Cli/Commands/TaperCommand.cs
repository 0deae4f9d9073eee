using System.CommandLine;
using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;
using SlotArray.Core;
using SlotArray.Core.Design;
using SlotArray.Core.Patterns;
using SlotArray.Core.Tapers;
using SlotArray.Reports.Plots;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray taper --type T --count N [--sidelobes dB] [--nbar n] [--spacing 0.5] [--edge dB] [--exponent q]
/// [--weights list] [--json] [--plot FILE]</c>: weights of an aperture taper and the metrics of its pattern
/// (isotropic elements, broadside, spacing in free-space wavelengths).
/// </summary>
internal static class TaperCommand
{
    /// <summary>Type names accepted by <c>--type</c>, as in the spec's <c>taper: type:</c>.</summary>
    public static readonly IReadOnlyDictionary<string, TaperType> Types = new Dictionary<string, TaperType>
    {
        ["uniform"] = TaperType.Uniform,
        ["chebyshev"] = TaperType.Chebyshev,
        ["taylor"] = TaperType.Taylor,
        ["villeneuve"] = TaperType.Villeneuve,
        ["taylor-one-parameter"] = TaperType.TaylorOneParameter,
        ["cosine-pedestal"] = TaperType.CosinePedestal,
        ["bayliss"] = TaperType.Bayliss,
        ["given"] = TaperType.Given,
    };

    /// <summary>Builds the command.</summary>
    public static Command Build(TextWriter output, TextWriter error)
    {
        var type = new Option<string>("--type") { Description = "Taper: " + string.Join(", ", Types.Keys), Required = true };
        var count = new Option<int>("--count") { Description = "Number of elements (2 … 100000)", Required = true };
        var sidelobes = new Option<string>("--sidelobes") { Description = "Design sidelobe level, negative dB (e.g. -30 or -30dB)", DefaultValueFactory = _ => "-30" };
        var nbar = new Option<int>("--nbar") { Description = "n-bar for taylor, villeneuve and bayliss", DefaultValueFactory = _ => 4 };
        var spacing = new Option<double>("--spacing") { Description = "Element spacing in free-space wavelengths", DefaultValueFactory = _ => 0.5 };
        var edge = new Option<string>("--edge") { Description = "cosine-pedestal: aperture-edge level, dB (e.g. -20)", DefaultValueFactory = _ => "-20" };
        var exponent = new Option<double>("--exponent") { Description = "cosine-pedestal: exponent q ≥ 1", DefaultValueFactory = _ => 2 };
        var weights = new Option<string?>("--weights") { Description = "given: comma-separated weights, one per element" };
        var json = new Option<bool>("--json") { Description = "Print one JSON object on stdout" };
        var plot = new Option<string?>("--plot") { Description = "Write the pattern to FILE (.png or .svg) and the taper to FILE-taper" };
        var cmd = new Command("taper", "Weights of an aperture taper and the metrics of its pattern (isotropic elements, broadside)")
        {
            type, count, sidelobes, nbar, spacing, edge, exponent, weights, json, plot,
        };
        cmd.SetAction(pr =>
        {
            string typeName = pr.GetValue(type)!.Trim().ToLowerInvariant();
            if (!Types.TryGetValue(typeName, out var t))
                throw new UserInputException($"unknown --type '{typeName}': use one of {string.Join(", ", Types.Keys)}");
            int n = pr.GetValue(count);
            double d = pr.GetValue(spacing);
            if (!(d > 0 && d <= 10)) throw new UserInputException($"--spacing must be between 0 and 10 wavelengths, got {d}");
            string? plotPath = pr.GetValue(plot);
            if (plotPath is not null && Path.GetExtension(plotPath).ToLowerInvariant() is not (".png" or ".svg"))
                throw new UserInputException($"--plot must name a .png or .svg file, got '{plotPath}'");
            var request = new TaperRequest(t, ParseDb(pr.GetValue(sidelobes)!, "--sidelobes"), pr.GetValue(nbar),
                ParseDb(pr.GetValue(edge)!, "--edge"), pr.GetValue(exponent), ParseWeights(pr.GetValue(weights)));
            TaperResult taper;
            try { taper = TaperSynthesis.Synthesize(request, n); }
            catch (ArgumentException e) { throw new UserInputException(OneLine(e)); }
            var report = Analyse(taper, d);
            if (pr.GetValue(json)) output.WriteLine(ToJson(typeName, request, taper, report, d));
            else WriteText(output, typeName, taper, report, d);
            foreach (var w in taper.Warnings) error.WriteLine($"warning: {w.Message}");
            if (plotPath is not null)
            {
                bool hasLevel = t is not (TaperType.Uniform or TaperType.Given or TaperType.CosinePedestal);
                var written = TaperPlots.Write(plotPath,
                    TaperPlots.Pattern($"{typeName}, N = {n}, d = {d.ToString(CultureInfo.InvariantCulture)} λ", report.AngleDegrees, report.LevelDb, hasLevel ? request.SidelobeLevelDb : null),
                    TaperPlots.Taper($"{typeName} taper, N = {n}", taper.Weights));
                foreach (var f in written) error.WriteLine($"wrote {f}");
            }
            return ExitCodes.Ok;
        });
        return cmd;
    }

    /// <summary>Pattern metrics of a taper at spacing d (wavelengths), isotropic elements, broadside.</summary>
    private sealed record Analysis(PatternMetrics? Sum, DifferencePatternMetrics? Difference, double Directivity, double Efficiency,
        double[] AngleDegrees, double[] LevelDb);

    private static Analysis Analyse(TaperResult taper, double spacing)
    {
        int n = taper.Count;
        var z = ArrayGeometry.Uniform(n, spacing);
        const double k = 2 * Math.PI;                              // λ = 1: positions in wavelengths
        var grid = AngleGrid.VisibleInSine(Math.Min(262_145, Math.Max(4097, 32 * n + 1)));
        var p = ArrayFactor.Compute(z, taper.Weights, k, grid);
        double eff = PatternMetrics.TaperEfficiency(taper.Weights);
        var deg = p.Theta.Select(x => x * 180 / Math.PI).ToArray();
        var db = p.RelativeDecibels(-300);
        if (taper.IsDifference)
        {
            var m = DifferencePatternMetrics.Measure(p);
            double dir = Directivity.Isotropic(z, taper.Weights, k, m.DifferencePeakDirections.Right.Radians);
            return new Analysis(null, m, dir, eff, deg, db);
        }
        var s = PatternMetrics.Measure(p);
        return new Analysis(s, null, Directivity.Isotropic(z, taper.Weights, k, s.BeamDirection.Radians), eff, deg, db);
    }

    private static string ToJson(string typeName, TaperRequest request, TaperResult taper, Analysis a, double spacing)
    {
        static JsonNode? Num(double? v) => v is double x && double.IsFinite(x) ? JsonValue.Create(Math.Round(x, 12)) : null;
        var o = new JsonObject
        {
            ["type"] = typeName,
            ["method"] = taper.Method,
            ["count"] = taper.Count,
            ["spacing_wavelengths"] = spacing,
            ["weights"] = new JsonArray(taper.Weights.Select(w => (JsonNode?)JsonValue.Create(w)).ToArray()),
            ["taper_efficiency"] = Num(a.Efficiency),
            ["directivity_dbi"] = Num(Directivity.ToDbi(a.Directivity)),
        };
        if (a.Sum is { } s)
        {
            o["peak_sidelobe_db"] = Num(s.PeakSidelobeDb);
            o["first_sidelobe_db"] = Num(s.FirstSidelobeDb);
            o["hpbw_deg"] = Num(s.HalfPowerBeamwidth.Degrees);
            o["null_to_null_deg"] = Num(s.NullToNullWidth.Degrees);
        }
        else if (a.Difference is { } d)
        {
            o["peak_sidelobe_db"] = Num(d.PeakSidelobeDb);
            o["first_sidelobe_db"] = null;
            o["hpbw_deg"] = null;
            o["null_to_null_deg"] = Num(d.LobeSeparationNulls.Degrees);
            o["difference_peak_sidelobe_db"] = Num(d.PeakSidelobeDb);
            o["null_depth_db"] = Num(d.NullDepthDb);
            o["difference_slope_per_rad"] = Num(d.NormalizedSlope);
        }
        if (request.Type is TaperType.Chebyshev or TaperType.Taylor or TaperType.Villeneuve or TaperType.TaylorOneParameter or TaperType.Bayliss)
            o["design_sidelobes_db"] = request.SidelobeLevelDb;
        if (request.Type is TaperType.Taylor or TaperType.Villeneuve or TaperType.Bayliss) o["nbar"] = request.Nbar;
        o["warnings"] = new JsonArray(taper.Warnings.Select(w => (JsonNode?)new JsonObject { ["code"] = w.Code, ["message"] = w.Message }).ToArray());
        return o.ToJsonString(new JsonSerializerOptions { WriteIndented = true, Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping });
    }

    private static void WriteText(TextWriter o, string typeName, TaperResult taper, Analysis a, double spacing)
    {
        var ci = CultureInfo.InvariantCulture;
        o.WriteLine(string.Format(ci, "{0} taper ({1}), N = {2}, spacing {3} wavelengths, isotropic elements", typeName, taper.Method, taper.Count, spacing));
        o.WriteLine("element  weight (max 1)");
        for (int i = 0; i < taper.Count; i++) o.WriteLine(string.Format(ci, "{0,7}  {1,14:F9}", i + 1, taper.Weights[i]));
        static string Db(double? v) => v is double x ? x.ToString("F2", CultureInfo.InvariantCulture) + " dB" : "none";
        if (a.Sum is { } s)
        {
            o.WriteLine(string.Format(ci, "peak sidelobe        {0}", Db(s.PeakSidelobeDb)));
            o.WriteLine(string.Format(ci, "first sidelobe       {0}", Db(s.FirstSidelobeDb)));
            o.WriteLine(string.Format(ci, "half-power beamwidth {0:F4} deg", s.HalfPowerBeamwidth.Degrees));
            o.WriteLine(string.Format(ci, "null-to-null width   {0:F4} deg", s.NullToNullWidth.Degrees));
            o.WriteLine(string.Format(ci, "integrated sidelobes {0}", Db(s.IntegratedSidelobeRatioDb)));
        }
        else if (a.Difference is { } d)
        {
            o.WriteLine(string.Format(ci, "difference peak sidelobe {0}", Db(d.PeakSidelobeDb)));
            o.WriteLine(string.Format(ci, "boresight null depth     {0}", Db(d.NullDepthDb)));
            o.WriteLine(string.Format(ci, "difference peaks at      {0:F4} / {1:F4} deg", d.DifferencePeakDirections.Left.Degrees, d.DifferencePeakDirections.Right.Degrees));
            o.WriteLine(string.Format(ci, "normalised slope         {0:F4} per rad", d.NormalizedSlope));
        }
        o.WriteLine(string.Format(ci, "taper efficiency     {0:F5}", a.Efficiency));
        o.WriteLine(string.Format(ci, "directivity          {0:F3} dBi (isotropic elements, full sphere)", Directivity.ToDbi(a.Directivity)));
    }

    /// <summary>Parses "-30", "-30dB" or "-30 dB" (invariant culture).</summary>
    internal static double ParseDb(string text, string option)
    {
        string s = text.Trim();
        if (s.EndsWith("db", StringComparison.OrdinalIgnoreCase)) s = s[..^2].TrimEnd();
        if (!double.TryParse(s, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) || !double.IsFinite(v))
            throw new UserInputException($"{option} must be a level in dB such as -30 or -30dB, got '{text}'");
        return v;
    }

    private static double[]? ParseWeights(string? text)
    {
        if (text is null) return null;
        var parts = text.Split([',', ' ', ';'], StringSplitOptions.RemoveEmptyEntries);
        var w = new double[parts.Length];
        for (int i = 0; i < parts.Length; i++)
            if (!double.TryParse(parts[i], NumberStyles.Float, CultureInfo.InvariantCulture, out w[i]))
                throw new UserInputException($"--weights: '{parts[i]}' is not a number (give comma-separated numbers)");
        return w;
    }

    private static string OneLine(ArgumentException e)
    {
        string m = e.Message;
        int i = m.IndexOf(" (Parameter '", StringComparison.Ordinal);
        if (i > 0) m = m[..i];
        return m.Replace('\n', ' ').Replace('\r', ' ').Trim();
    }
}
