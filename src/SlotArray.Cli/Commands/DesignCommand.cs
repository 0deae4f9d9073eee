using System.CommandLine;
using System.Diagnostics;
using System.Globalization;
using SlotArray.Core.Design;
using SlotArray.Core.Slots;
using SlotArray.Reports;
using SlotArray.Reports.Model;
using SlotArray.Spec;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray design SPEC [-o DIR] [--json]</c>: the main job. Loads the spec (exit 2 with positioned errors), runs
/// the pipeline (synthesis, network analysis across the band, pattern and figures), writes every output file
/// atomically into DIR (default <c>out/&lt;name&gt;</c>, the spec's name) and prints a short summary. An infeasible
/// design exits 1 with the reason and writes nothing; a design that misses a stated requirement (a FAIL verdict) is
/// written and exits 4. Progress, warnings and errors go to stderr; with
/// <c>--json</c> stdout carries the content of design.json and nothing else.
/// </summary>
internal static class DesignCommand
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Builds the command.</summary>
    public static Command Build(TextWriter output, TextWriter error)
    {
        var spec = new Argument<string>("spec") { Description = "The YAML spec, e.g. arrays/harbour-surveillance-16.yaml" };
        var outDir = OutputOption();
        var json = new Option<bool>("--json") { Description = "Print design.json on stdout (messages stay on stderr)" };
        var (cacheDir, noCache) = CacheOptions();
        var (drawing, revision, date, sheet) = DocumentOptions();
        var cmd = new Command("design", "Synthesise the array, analyse it across the band and write every output file")
        {
            spec, outDir, json, cacheDir, noCache, drawing, revision, date, sheet,
        };
        cmd.SetAction(pr => Run(pr.GetValue(spec)!, pr.GetValue(outDir), pr.GetValue(json), CacheOf(pr, cacheDir, noCache),
            DocumentOf(pr, pr.GetValue(spec)!, drawing, revision, date, sheet), output, error,
            ProgressDisplay.Allowed(error, pr.GetValue(json) || pr.GetValue(CommandLine.Quiet))));
        return cmd;
    }

    /// <summary>The fabrication-document options: <c>--drawing-number</c>, <c>--revision</c>, <c>--date</c>, <c>--sheet</c>.</summary>
    internal static (Option<string?> Drawing, Option<string> Revision, Option<string?> Date, Option<string> Sheet) DocumentOptions()
    {
        var drawing = new Option<string?>("--drawing-number") { Description = "Drawing number on the cut list, drawing and DXF files (default: the spec's name)" };
        var revision = new Option<string>("--revision") { Description = "Revision letter(s), A to ZZ (default A)", DefaultValueFactory = _ => "A" };
        revision.Validators.Add(r =>
        {
            if (r.Tokens.Count == 1 && !System.Text.RegularExpressions.Regex.IsMatch(r.Tokens[0].Value, "^[A-Z]{1,2}$"))
                r.AddError($"--revision must be one or two capital letters (A, B, ... AA), got '{r.Tokens[0].Value}'");
        });
        var date = new Option<string?>("--date") { Description = "Issue date printed on the documents, YYYY-MM-DD (never read from the clock: runs stay byte-identical)" };
        date.Validators.Add(r =>
        {
            if (r.Tokens.Count == 1 && !DateOnly.TryParseExact(r.Tokens[0].Value, "yyyy-MM-dd", Inv, DateTimeStyles.None, out _))
                r.AddError($"--date must be a date YYYY-MM-DD, got '{r.Tokens[0].Value}'");
        });
        var sheet = new Option<string>("--sheet") { Description = "Drawing sheet size (ISO 216, landscape)", DefaultValueFactory = _ => "A3" };
        sheet.AcceptOnlyFromAmong("A4", "A3", "A1", "A0");
        return (drawing, revision, date, sheet);
    }

    /// <summary>The document details the options give, with the spec file's SHA-256 (none when the file is missing).</summary>
    internal static DocumentInfo DocumentOf(ParseResult pr, string specPath, Option<string?> drawing, Option<string> revision, Option<string?> date, Option<string> sheet) => new()
    {
        DrawingNumber = pr.GetValue(drawing),
        Revision = pr.GetValue(revision) ?? "A",
        Date = pr.GetValue(date),
        Sheet = pr.GetValue(sheet) ?? "A3",
        SpecSha256 = File.Exists(specPath) ? Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(File.ReadAllBytes(specPath))) : null,
    };

    /// <summary>The slot-cache options shared with <c>sweep</c>: <c>--cache-dir DIR</c> and <c>--no-cache</c>.</summary>
    internal static (Option<string?> Dir, Option<bool> Off) CacheOptions() => (
        new Option<string?>("--cache-dir") { Description = "Folder of the slot characterisation cache (default $XDG_CACHE_HOME/slotarray or ~/.cache/slotarray)" },
        new Option<bool>("--no-cache") { Description = "Neither read nor write the slot characterisation cache" });

    /// <summary>The cache the options select, or null with <c>--no-cache</c>.</summary>
    internal static SlotCache? CacheOf(ParseResult pr, Option<string?> dir, Option<bool> off) =>
        pr.GetValue(off) ? null : new SlotCache(pr.GetValue(dir) ?? SlotCache.DefaultDirectory());

    /// <summary>The <c>-o</c> option shared with <c>sweep</c>: the output folder, default <c>out/&lt;name&gt;</c>.</summary>
    internal static Option<string?> OutputOption() => new("--output", "-o")
    {
        Description = "Output folder (default out/<name>, <name> from the spec); replaced whole on success, untouched on failure",
    };

    /// <summary>The default output folder of a spec named <paramref name="name"/>: <c>out/&lt;name&gt;</c>.</summary>
    internal static string DefaultFolder(string name) => Path.Combine("out", name);

    private static int Run(string path, string? outDir, bool json, SlotCache? cache, DocumentInfo document, TextWriter output, TextWriter error, bool progress)
    {
        var request = Load(path, error);
        if (request.Planar is not null) return PlanarDesignRun.Run(request, outDir, cache, output, error);
        string folder = OutputFolderCheck.Prepare(outDir ?? DefaultFolder(request.Name), replacesWhole: true);
        var clock = Stopwatch.StartNew();
        var result = Analyse(request, cache, error, progress, out var source);
        var (specText, table) = SlotTableCopy.For(path, File.ReadAllText(path), request, error);
        var report = DesignReportBuilder.Build(result, document) with { SpecText = specText, SlotTableBytes = table };
        if (request.Tolerance is { } tol)
        {
            // The short tolerance summary of issue 7 (the full output is the tolerance command's), with the run's slot
            // source: the surrogates' perturbed-guide solves come from (and go to) the same cache as the design's.
            error.WriteLine(string.Format(Inv, "tolerance: {0} Monte Carlo trials, seed {1} ...", tol.Trials, tol.Seed));
            var options = Core.Tolerance.ToleranceOptions.Default with { Cancellation = CommandLine.Cancellation };
            var mc = ProgressDisplay.Run(progress, sink => Core.Tolerance.ToleranceAnalysis.Run(result.Request, result.Design, result.SlotModel,
                options: options, progress: sink is null ? null : done => sink.Report(new Core.WorkProgress("Monte Carlo trials", done, tol.Trials)),
                source: source));
            cache?.Save(request, source.Cache, error);
            report = report with { Tolerance = Reports.ToleranceSummary.Lines(mc) };
        }
        CommandLine.Cancellation.ThrowIfCancellationRequested();
        error.WriteLine($"writing {OutputFolder.NamesFor(report).Count} files to {folder}/ ...");
        OutputFolder.WriteAll(report, folder);
        foreach (string w in report.Warnings) error.WriteLine($"warning: {w}");
        if (json)
        {
            output.Write(DesignJson.ToText(report));
            foreach (string c in report.Cautions) error.WriteLine($"caution: {c}");
        }
        else
        {
            PrintSummary(output, report, folder);
        }
        error.WriteLine(string.Format(Inv, "done in {0:0.0} s", clock.Elapsed.TotalSeconds));
        var failed = report.Requirements.Where(q => !q.Passed).ToList();
        if (failed.Count == 0) return ExitCodes.Ok;
        error.WriteLine($"requirements not met ({failed.Count} of {report.Requirements.Count}): {string.Join("; ", failed.Select(q => $"{q.Description}: required {q.Required}, achieved {q.Achieved}"))}. The design was written; exit code {ExitCodes.RequirementsNotMet}.");
        return ExitCodes.RequirementsNotMet;
    }

    /// <summary>Loads and validates a spec; prints its warnings to <paramref name="error"/>.</summary>
    /// <param name="path">The spec file.</param>
    /// <param name="error">Where the warnings go.</param>
    /// <param name="nothing">The end of the failure message: what was not done, e.g. "nothing designed".</param>
    /// <exception cref="SpecErrorsException">The file is missing or the spec has errors (exit 2; printed by <see cref="CommandLine.Run"/>).</exception>
    internal static ArrayRequest Load(string path, TextWriter error, string nothing = "nothing designed") => Load(path, error, out _, nothing);

    /// <summary>As <see cref="Load(string, TextWriter, string)"/>, also returning the spec's warnings.</summary>
    internal static ArrayRequest Load(string path, TextWriter error, out IReadOnlyList<SpecWarning> warnings, string nothing = "nothing designed")
    {
        if (!File.Exists(path)) throw new UserInputException($"spec file not found: {path}");
        var result = SpecLoader.LoadFile(path);
        warnings = result.Warnings;
        foreach (var w in result.Warnings) error.WriteLine(w);
        if (result.IsValid) return result.Request!;
        throw new SpecErrorsException(string.Format(Inv, "{0}: {1} error(s); {2}", path, result.Errors.Count, nothing), result.Errors);
    }

    /// <summary>
    /// The composition root of a run: the slot source the spec asks for (its <c>slots.data</c> table, fitted, or the
    /// built-in models) with the run's characterisation cache, preloaded from the disk cache when given. Prints the
    /// table's fit residuals to <paramref name="error"/>.
    /// </summary>
    internal static SlotSource SourceFor(ArrayRequest request, SlotCache? cache, TextWriter error, out int loaded)
    {
        var memory = new ResonantCharacterisationCache();
        loaded = cache?.Load(request, memory, error) ?? 0;
        var source = SlotSource.For(request, memory);
        if (source.Table is { } t)
        {
            var r = t.Residuals;
            error.WriteLine(string.Format(Inv, "slot table {0} (SHA-256 {1}): {2} rows, {3} {4}(s), {5} frequenc{6}; fit residuals (leave-one-out, {7} points): L_r rms {8:0.####} % max {9:0.####} %, g_r rms {10:0.####} % max {11:0.####} %, y/g_r rms {12:0.####} max {13:0.####}",
                t.Table.Source, t.Table.Sha256, t.Table.Rows.Count, t.Couplings.Count, t.CouplingKind == Core.Slots.SlotCouplingKind.Offset ? "offset" : "tilt",
                t.Frequencies.Count, t.Frequencies.Count == 1 ? "y" : "ies", r.Points, r.ResonantLengthRms * 100, r.ResonantLengthMax * 100,
                r.ResonantConductanceRms * 100, r.ResonantConductanceMax * 100, r.AdmittanceRms, r.AdmittanceMax));
        }
        return source;
    }

    /// <summary>
    /// Composition-root seam for the command-line tests: Elliott's iteration limits for the runs started in the current
    /// asynchronous flow (null: the defaults). Lets a test drive a real spec into a non-converging iteration and check the
    /// command's exit code and message, without touching other runs in the same process.
    /// </summary>
    internal static readonly AsyncLocal<ElliottOptions?> ElliottLimits = new();

    /// <summary>
    /// Runs the pipeline with the slot cache (when given), printing what it does to <paramref name="error"/>, with a
    /// progress bar when <paramref name="progress"/>; Ctrl-C stops it (<see cref="CommandLine.Cancellation"/>).
    /// </summary>
    internal static ArrayResult Analyse(ArrayRequest request, SlotCache? cache, TextWriter error, bool progress, AnalysisOptions? options = null)
        => Analyse(request, cache, error, progress, out _, options);

    /// <summary>As <see cref="Analyse(ArrayRequest, SlotCache?, TextWriter, bool, AnalysisOptions?)"/>, also returning the run's slot source (its cache holds the run's solves).</summary>
    internal static ArrayResult Analyse(ArrayRequest request, SlotCache? cache, TextWriter error, bool progress, out SlotSource slotSource,
        AnalysisOptions? options = null)
    {
        if (ElliottLimits.Value is { } limits) options = (options ?? AnalysisOptions.Default) with { Elliott = limits };
        var source = SourceFor(request, cache, error, out int loaded);
        slotSource = source;
        error.WriteLine(string.Format(Inv, "designing '{0}': {1} slots at {2:0.####} GHz, analysing {3:0.####} to {4:0.####} GHz{5} ...",
            request.Name, request.Slots.Count, request.DesignFrequency.Gigahertz, request.BandLow.Gigahertz, request.BandHigh.Gigahertz,
            cache is null ? "" : string.Format(Inv, " ({0} slot table(s) from the cache)", loaded)));
        var result = ProgressDisplay.Run(progress, sink => ArrayPipeline.Run(request,
            (options ?? AnalysisOptions.Default) with { Progress = sink, Cancellation = CommandLine.Cancellation }, source));
        cache?.Save(request, source.Cache, error);
        return result;
    }

    private static void PrintSummary(TextWriter o, DesignReport r, string folder)
    {
        var p = r.Pattern;
        var m = r.Match;
        o.WriteLine($"{r.Name}: {r.Slots.Count} slots, {r.Inputs.FeedType}, {r.Inputs.TaperDescription}, {r.Inputs.SlotModelName}");
        o.WriteLine("  " + SummaryMarkdown.VerdictLine(r).Replace("**", "", StringComparison.Ordinal));
        foreach (string x in r.SafetyExceedances) o.WriteLine($"  SAFETY LIMIT EXCEEDED: {x}");
        o.WriteLine(string.Format(Inv, "  S11 at {0:0.####} GHz     {1:0.00} dB (VSWR {2:0.000})", r.FrequencyHz * 1e-9, m.S11DbAtDesign, m.VswrAtDesign));
        o.WriteLine(string.Format(Inv, "  VSWR <= 1.5 / 2 band   {0:0.0} / {1:0.0} MHz", m.BandwidthVswr15Hz * 1e-6, m.BandwidthVswr2Hz * 1e-6));
        o.WriteLine(string.Format(Inv, "  beam, HPBW             {0:0.00} deg, {1:0.00} deg", Math.Round(p.BeamDeg, 2) + 0.0, p.HpbwDeg));
        o.WriteLine(string.Format(Inv, "  peak sidelobe          {0:0.00} dB (design {1:0.0} dB)", p.PeakSidelobeDb, p.DesignSidelobeDb));
        o.WriteLine(string.Format(Inv, "  directivity, gain      {0:0.00} dBi, {1:0.00} dBi", p.DirectivityDbi, p.GainDbi));
        if (r.TravellingWave is { } tw && r.Load is { } load)
        {
            o.WriteLine(string.Format(Inv, "  squint, scan rate      {0:0.00} deg (+ toward the load), {1:0.000} deg per 100 MHz", tw.SquintDeg, tw.ScanFromSweepDegPer100MHz));
            o.WriteLine(string.Format(Inv, "  beam asked, residual   {0:0.000} deg, {1:+0.000;-0.000} deg (correction: {2}; spacing {3:0.000} mm{4})",
                tw.BeamAskedDeg, Math.Round(tw.BeamResidualDeg, 3) + 0.0, tw.PointingCorrection, tw.SpacingM * 1e3, tw.LoadAuto ? $", load {load.Fraction * 100:0.##} % by load: auto" : ""));
            o.WriteLine(string.Format(Inv, "  load power, efficiency {0:0.00} % of input (asked {1:0.##} %), {2:0.0} % radiated", load.PowerWPerWIn * 100, load.Fraction * 100, tw.Efficiency * 100));
        }
        if (r.Coupling is { } c)
        {
            if (c.TravellingWaveResidualsDb is { } res)
            {
                o.WriteLine("  travelling-wave design with mutual coupling (coupled network, matched load):");
                for (int i = 0; i < res.Count; i++)
                    o.WriteLine(string.Format(Inv, "    iteration {0,2}: largest slot-power error {1:0.000000} dB", i + 1, res[i]));
            }
            else o.WriteLine("  Elliott's design with mutual coupling:");
            foreach (var it in c.Iterations)
                o.WriteLine(string.Format(Inv, "    iteration {0,2}: offsets move ≤ {1:0.00000} mm, lengths ≤ {2:0.00000} mm (slot {3}), match error {4:0.000000}",
                    it.Index, it.MaximumOffsetChange * 1e3, it.MaximumLengthChange * 1e3, it.WorstSlot, it.MatchError));
            o.WriteLine("                         coupled design   isolated-slot design (both with coupling in the analysis)");
            o.WriteLine(string.Format(Inv, "  S11 at design         {0,10:0.00} dB    {1,10:0.00} dB", c.Coupled.S11DbAtDesign, c.Uncoupled.S11DbAtDesign));
            o.WriteLine(string.Format(Inv, "  best match at         {0,10:0.0000} GHz   {1,10:0.0000} GHz", c.Coupled.BestMatchHz * 1e-9, c.Uncoupled.BestMatchHz * 1e-9));
            o.WriteLine(string.Format(Inv, "  peak sidelobe         {0,10:0.00} dB    {1,10:0.00} dB", c.Coupled.PeakSidelobeDb, c.Uncoupled.PeakSidelobeDb));
        }
        if (p.CrossPolarDb is { } xpol)
            o.WriteLine(string.Format(Inv, "  cross-polar peak       {0:0.00} dB at {1:0.0} deg", xpol, p.CrossPolarDirectionDeg ?? double.NaN));
        if (r.Flare is { } fl)
            o.WriteLine(string.Format(Inv, "  flare (vertical beam)  HPBW {0:0.00} deg, aperture {1:0.0} mm, depth {2:0.0} mm, phase error {3:0} deg; antenna gain {4:0.00} dBi",
                fl.VerticalHpbwDeg, fl.ApertureM * 1e3, fl.LengthM * 1e3, fl.PhaseErrorDeg, fl.TotalGainDbi));
        if (r.Pointing is { } pt)
            o.WriteLine(string.Format(Inv, "  pointing budget        worst bearing error {0:0.000} deg over {1:0} to {2:0} degC and ±{3:0.#} MHz",
                pt.WorstErrorDeg, pt.LowC, pt.HighC, pt.FrequencyToleranceHz * 1e-6));
        if (r.Filter is { } flt)
            o.WriteLine(string.Format(Inv, "  polarisation filter    plates {0:0.0} mm pitch, {1:0.0} mm deep, {2:0.0} mm thick: cross-polar {3:0.00} dB bare, {4:0.00} dB behind it (worst over the band)",
                flt.SpacingM * 1e3, flt.DepthM * 1e3, flt.ThicknessM * 1e3, flt.BareWorstDb, flt.FilteredWorstDb));
        foreach (var q in r.Requirements)
            o.WriteLine($"  {(q.Passed ? "PASS" : "FAIL")}  {q.Description}: required {q.Required}, achieved {q.Achieved}");
        if (r.Tolerance.Count > 0) o.WriteLine($"  tolerance              {r.Tolerance[0]}");
        if (r.Eirp is { } eirp)
        {
            if (eirp.PeakW is { } pk) o.WriteLine(string.Format(Inv, "  EIRP peak, beam axis   {0:0.00} dBW", 10 * Math.Log10(pk)));
            if (eirp.AverageW is { } av) o.WriteLine(string.Format(Inv, "  EIRP average           {0:0.00} dBW", 10 * Math.Log10(av)));
        }
        foreach (string caution in r.Cautions) o.WriteLine($"  caution: {caution}");
        o.WriteLine($"  wrote {folder}/: {string.Join(", ", OutputFolder.NamesFor(r))}");
    }
}
