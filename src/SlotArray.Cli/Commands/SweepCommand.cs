using System.CommandLine;
using System.Globalization;
using System.Numerics;
using System.Text;
using System.Text.Json;
using SlotArray.Core.Design;
using SlotArray.Core.Quantities;
using SlotArray.Reports;
using SlotArray.Reports.Model;
using SlotArray.Reports.Plots;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray sweep SPEC [-o DIR] [--from F] [--to F] [--points N] [--json]</c>: the input match of the designed
/// array over a span (default: wide enough to show the VSWR ≤ 2 band edges, <see cref="MatchSpan.Default"/>): writes
/// <c>sweep.png</c> and <c>input.s1p</c> (each atomically) into DIR (default <c>out/&lt;name&gt;</c>) and prints the
/// sweep as a table on stdout (frequency, |S11|, return loss, VSWR), or with <c>--json</c> as one JSON document.
/// Exit codes as for <c>design</c>; progress on stderr.
/// </summary>
internal static class SweepCommand
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Builds the command.</summary>
    public static Command Build(TextWriter output, TextWriter error)
    {
        var spec = new Argument<string>("spec") { Description = "The YAML spec, e.g. arrays/harbour-surveillance-16.yaml" };
        var outDir = DesignCommand.OutputOption();
        var (cacheDir, noCache) = DesignCommand.CacheOptions();
        var from = new Option<string?>("--from") { Description = "Lowest frequency of the sweep, with unit (default: wide enough to show the VSWR band edges)" };
        var to = new Option<string?>("--to") { Description = "Highest frequency of the sweep, with unit" };
        var points = new Option<int>("--points") { Description = "Frequencies in the sweep (2 to 100000)", DefaultValueFactory = _ => MatchSpan.DefaultPoints };
        points.Validators.Add(r =>
        {
            if (r.Tokens.Count == 1 && int.TryParse(r.Tokens[0].Value, NumberStyles.Integer, Inv, out int n) && n is < 2 or > 100_000)
                r.AddError($"--points must be 2 to 100000, got {n}");
        });
        var json = new Option<bool>("--json") { Description = "Print the sweep as one JSON document on stdout (messages stay on stderr)" };
        var cmd = new Command("sweep", "Input match of the designed array over a span: sweep.png, input.s1p and a table (or --json) on stdout")
        {
            spec, outDir, from, to, points, json, cacheDir, noCache,
        };
        cmd.SetAction(pr =>
        {
            var options = AnalysisOptions.Default with
            {
                MatchLow = pr.GetValue(from) is { } f ? SlotCommand.ParseFrequency(f, "--from") : null,
                MatchHigh = pr.GetValue(to) is { } t ? SlotCommand.ParseFrequency(t, "--to") : null,
                MatchPoints = pr.GetValue(points),
            };
            if (options.MatchLow is { } lo && options.MatchHigh is { } hi && !(hi > lo))
                throw new UserInputException($"--from {lo} --to {hi}: the match sweep needs its upper frequency above its lower one");
            return Run(pr.GetValue(spec)!, pr.GetValue(outDir), options, pr.GetValue(json), DesignCommand.CacheOf(pr, cacheDir, noCache), output, error,
                pr.GetValue(CommandLine.Quiet) || pr.GetValue(json));
        });
        return cmd;
    }

    private static int Run(string path, string? outDir, AnalysisOptions options, bool json, SlotCache? cache, TextWriter output, TextWriter error, bool quiet)
    {
        var request = DesignCommand.Load(path, error);
        string folder = OutputFolderCheck.Prepare(outDir ?? DesignCommand.DefaultFolder(request.Name), replacesWhole: false);
        ArrayResult result;
        try
        {
            result = DesignCommand.Analyse(request, cache, error, ProgressDisplay.Allowed(error, quiet), options);
        }
        catch (ArgumentOutOfRangeException e) when (e.ParamName == "options")
        {
            throw new UserInputException(e.Message.Split(" (Parameter", 2)[0]);
        }
        var report = DesignReportBuilder.Build(result);
        CommandLine.Cancellation.ThrowIfCancellationRequested();
        AtomicFile.Write(Path.Combine(folder, "sweep.png"), s => PlotExport.Write(DesignPlots.Sweep(report), s, "png", 900, DesignPlots.SweepHeight));
        AtomicFile.Write(Path.Combine(folder, "input.s1p"), s =>
        {
            using var w = new StreamWriter(s, new UTF8Encoding(false), 1 << 16, leaveOpen: true);
            TouchstoneWriter.Write(report, w);
        });
        error.WriteLine($"wrote {folder}/: sweep.png, input.s1p");
        if (json) WriteJson(output, report);
        else WriteTable(output, report);
        return ExitCodes.Ok;
    }

    /// <summary>The sweep table: one row per frequency, units in the header.</summary>
    internal static void WriteTable(TextWriter o, DesignReport r)
    {
        o.WriteLine(string.Format(Inv, "{0}: input match vs frequency (S11 normalised to the TE10 wave impedance, {1:0.00} ohm at the design frequency)",
            r.Name, r.Guide.WaveImpedanceOhm));
        o.WriteLine("  frequency_ghz  s11_mag  return_loss_db    vswr");
        foreach (var (f, s11) in TouchstoneWriter.Points(r))
        {
            double mag = Complex.Abs(s11);
            o.WriteLine(string.Format(Inv, "  {0,13:0.000000}  {1,7:0.0000}  {2,14:0.00}  {3,6:0.000}", f * 1e-9, mag, -20 * Math.Log10(mag), Vswr(mag)));
        }
        o.WriteLine(string.Format(Inv, "  VSWR <= 1.5 band {0:0.0} MHz, VSWR <= 2 band {1:0.0} MHz around {2:0.####} GHz",
            r.Match.BandwidthVswr15Hz * 1e-6, r.Match.BandwidthVswr2Hz * 1e-6, r.FrequencyHz * 1e-9));
    }

    /// <summary>The sweep as one JSON document: SI units with unit-suffixed keys.</summary>
    internal static void WriteJson(TextWriter o, DesignReport r)
    {
        using var ms = new MemoryStream();
        using (var w = new Utf8JsonWriter(ms, new JsonWriterOptions { Indented = true }))
        {
            w.WriteStartObject();
            w.WriteString("name", r.Name);
            w.WriteString("normalisation", "S11 normalised to the guide's TE10 wave impedance");
            w.WriteNumber("wave_impedance_ohm", r.Guide.WaveImpedanceOhm);
            w.WriteNumber("design_frequency_hz", r.FrequencyHz);
            w.WriteNumber("bandwidth_vswr_1_5_hz", r.Match.BandwidthVswr15Hz);
            w.WriteNumber("bandwidth_vswr_2_hz", r.Match.BandwidthVswr2Hz);
            w.WriteStartArray("points");
            foreach (var (f, s11) in TouchstoneWriter.Points(r))
            {
                double mag = Complex.Abs(s11);
                w.WriteStartObject();
                w.WriteNumber("frequency_hz", f);
                w.WriteNumber("s11_re", s11.Real);
                w.WriteNumber("s11_im", s11.Imaginary);
                w.WriteNumber("return_loss_db", -20 * Math.Log10(mag));
                w.WriteNumber("vswr", Vswr(mag));
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
        o.WriteLine(Encoding.UTF8.GetString(ms.ToArray()));
    }

    /// <summary>VSWR = (1 + |Γ|)/(1 − |Γ|); a total reflection reads as a very large finite number (JSON has no infinity).</summary>
    private static double Vswr(double mag) => mag >= 1 ? 1e9 : (1 + mag) / (1 - mag);
}
