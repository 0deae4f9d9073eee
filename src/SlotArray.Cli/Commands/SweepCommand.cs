using System.CommandLine;
using System.Globalization;
using System.Numerics;
using System.Text;
using SlotArray.Reports;
using SlotArray.Reports.Model;
using SlotArray.Reports.Plots;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray sweep SPEC [-o DIR]</c>: the frequency response of the designed array only: writes <c>sweep.png</c>
/// and <c>input.s1p</c> (each atomically) into DIR (default <c>out/&lt;name&gt;</c>) and prints the sweep as a table
/// on stdout: frequency, |S11|, return loss, VSWR, beam direction, peak sidelobe, gain. Exit codes as for
/// <c>design</c>; progress on stderr.
/// </summary>
public static class SweepCommand
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Builds the command.</summary>
    public static Command Build(TextWriter output, TextWriter error)
    {
        var spec = new Argument<string>("spec") { Description = "The YAML spec, e.g. arrays/harbour-surveillance-16.yaml" };
        var outDir = DesignCommand.OutputOption();
        var (cacheDir, noCache) = DesignCommand.CacheOptions();
        var cmd = new Command("sweep", "Frequency response of the designed array: sweep.png, input.s1p and a table on stdout") { spec, outDir, cacheDir, noCache };
        cmd.SetAction(pr => Run(pr.GetValue(spec)!, pr.GetValue(outDir), DesignCommand.CacheOf(pr, cacheDir, noCache), output, error,
            pr.GetValue(CommandLine.Quiet)));
        return cmd;
    }

    private static int Run(string path, string? outDir, SlotCache? cache, TextWriter output, TextWriter error, bool quiet)
    {
        var request = DesignCommand.Load(path, error);
        string folder = OutputFolderCheck.Prepare(outDir ?? DesignCommand.DefaultFolder(request.Name), replacesWhole: false);
        var report = DesignReportBuilder.Build(DesignCommand.Analyse(request, cache, error, ProgressDisplay.Allowed(error, quiet)));
        CommandLine.Cancellation.ThrowIfCancellationRequested();
        AtomicFile.Write(Path.Combine(folder, "sweep.png"), s => PlotExport.Write(DesignPlots.Sweep(report), s, "png"));
        AtomicFile.Write(Path.Combine(folder, "input.s1p"), s =>
        {
            using var w = new StreamWriter(s, new UTF8Encoding(false), 1 << 16, leaveOpen: true);
            TouchstoneWriter.Write(report, w);
        });
        error.WriteLine($"wrote {folder}/: sweep.png, input.s1p");
        WriteTable(output, report);
        return ExitCodes.Ok;
    }

    /// <summary>The sweep table: one row per frequency, units in the header.</summary>
    internal static void WriteTable(TextWriter o, DesignReport r)
    {
        o.WriteLine(string.Format(Inv, "{0}: input match and beam vs frequency (S11 normalised to the TE10 wave impedance {1:0.00} ohm at the design frequency)",
            r.Name, r.Guide.WaveImpedanceOhm));
        o.WriteLine("  frequency_ghz  s11_mag  return_loss_db   vswr  beam_deg  peak_sidelobe_db  gain_dbi");
        foreach (var p in r.Sweep)
        {
            double mag = Complex.Abs(p.S11);
            double vswr = mag >= 1 ? double.PositiveInfinity : (1 + mag) / (1 - mag);
            o.WriteLine(string.Format(Inv, "  {0,13:0.000000}  {1,7:0.0000}  {2,14:0.00}  {3,5:0.000}  {4,8:0.00}  {5,16:0.00}  {6,8:0.00}",
                p.FrequencyHz * 1e-9, mag, -20 * Math.Log10(mag), vswr, p.BeamDeg, p.PeakSidelobeDb, p.GainDbi));
        }
        o.WriteLine(string.Format(Inv, "  VSWR <= 1.5 band {0:0.0} MHz, VSWR <= 2 band {1:0.0} MHz around {2:0.####} GHz",
            r.Match.BandwidthVswr15Hz * 1e-6, r.Match.BandwidthVswr2Hz * 1e-6, r.FrequencyHz * 1e-9));
    }
}
