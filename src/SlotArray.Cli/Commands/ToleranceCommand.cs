using System.CommandLine;
using System.Globalization;
using SlotArray.Core.Design;
using SlotArray.Core.Tolerance;
using SlotArray.Reports;
using SlotArray.Reports.Plots;
using SlotArray.Spec;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray tolerance SPEC [-o DIR] [--trials N] [--seed S] [--json] [--cache-dir DIR] [--no-cache]</c>: designs the
/// array (with the slot characterisation cache of <c>design</c>), runs the Monte Carlo of
/// the spec's <c>tolerance:</c> block and writes <c>tolerance.json</c>, <c>tolerance.png</c> and <c>sensitivity.csv</c>
/// (each atomically) into DIR. Prints the percentiles, the probability of meeting the target and the most sensitive
/// dimensions; with <c>--json</c> the JSON document instead. A progress bar shows on stderr when it is a terminal (not with --json or --quiet); Ctrl-C ends with exit 130 and writes nothing.
/// </summary>
internal static class ToleranceCommand
{
    /// <summary>The files the command writes.</summary>
    public static IReadOnlyList<string> Files => OutputFolderCheck.ToleranceFiles;

    /// <summary>Builds the command.</summary>
    public static Command Build(TextWriter output, TextWriter error)
    {
        var spec = new Argument<string>("spec") { Description = "The YAML spec, with a tolerance: block, e.g. arrays/harbour-surveillance-16.yaml" };
        var outDir = new Option<string>("--out", "-o") { Description = "Output folder", DefaultValueFactory = _ => "tolerance" };
        var trials = new Option<int?>("--trials") { Description = "Number of trials (overrides tolerance.trials)" };
        trials.Validators.Add(r =>
        {
            if (r.Tokens.Count == 1 && int.TryParse(r.Tokens[0].Value, NumberStyles.Integer, CultureInfo.InvariantCulture, out int n) && n is < 1 or > 1_000_000)
                r.AddError($"--trials must be 1 to 1000000, got {n}");
        });
        var seed = new Option<int?>("--seed") { Description = "Random seed (overrides tolerance.seed)" };
        var json = new Option<bool>("--json") { Description = "Print tolerance.json on stdout" };
        var (cacheDir, noCache) = DesignCommand.CacheOptions();
        var cmd = new Command("tolerance", "Monte Carlo of machining errors: sidelobes, gain, pointing and match; ranked per-slot sensitivities")
        {
            spec, outDir, trials, seed, json, cacheDir, noCache,
        };
        cmd.SetAction(pr => Run(pr.GetValue(spec)!, pr.GetValue(outDir)!, pr.GetValue(trials), pr.GetValue(seed), pr.GetValue(json),
            DesignCommand.CacheOf(pr, cacheDir, noCache), output, error, ProgressDisplay.Allowed(error, pr.GetValue(json) || pr.GetValue(CommandLine.Quiet))));
        return cmd;
    }

    private static int Run(string path, string dir, int? trials, int? seed, bool json, SlotCache? cache, TextWriter output, TextWriter error,
        bool progress)
    {
        var request = DesignCommand.Load(path, error, "nothing analysed");
        var tol = request.Tolerance ?? throw new UserInputException(
            $"{path}: the spec has no tolerance: block; add one, e.g. 'tolerance: {{offset: 0.02 mm, length: 0.02 mm, trials: 2000, seed: 1}}'");
        tol = tol with { Trials = trials ?? tol.Trials, Seed = seed ?? tol.Seed };
        dir = OutputFolderCheck.Prepare(dir, replacesWhole: false);

        var source = DesignCommand.SourceFor(request, cache, error, out _);
        var (design, slot) = ToleranceAnalysis.Design(request, source);
        foreach (var w in design.Warnings) error.WriteLine($"warning: {w.Message}");
        var options = ToleranceOptions.Default with { Cancellation = CommandLine.Cancellation };
        error.WriteLine(string.Format(CultureInfo.InvariantCulture, "tolerance: {0} Monte Carlo trials, seed {1} ...", tol.Trials, tol.Seed));
        var result = ProgressDisplay.Run(progress, sink => ToleranceAnalysis.Run(request, design, slot, tol, options,
            sink is null ? null : done => sink.Report(new Core.WorkProgress("Monte Carlo trials", done, tol.Trials)), source));
        CommandLine.Cancellation.ThrowIfCancellationRequested();

        cache?.Save(request, source.Cache, error);
        Write(dir, request, result);
        if (json) output.Write(ToleranceJson.ToText(request.Name, request.DesignFrequency.Hertz, result));
        else
        {
            foreach (var line in ToleranceSummary.Lines(result, 5)) output.WriteLine(line);
            output.WriteLine($"wrote {string.Join(", ", Files)} to {Path.GetFullPath(dir)}");
        }
        return ExitCodes.Ok;
    }

    /// <summary>Writes the three files, each through a temporary file renamed into place.</summary>
    internal static void Write(string dir, ArrayRequest request, ToleranceResult result)
    {
        Directory.CreateDirectory(dir);
        AtomicFile.Write(Path.Combine(dir, "tolerance.json"), s => ToleranceJson.Write(request.Name, request.DesignFrequency.Hertz, result, s));
        PlotExport.WriteFile(TolerancePlot.Build(request.Name, result.MonteCarlo), Path.Combine(dir, "tolerance.png"), 1200, 520);
        AtomicFile.Write(Path.Combine(dir, "sensitivity.csv"), s =>
        {
            using var w = new StreamWriter(s, new System.Text.UTF8Encoding(false), 1 << 16, leaveOpen: true);
            ToleranceSensitivityCsv.Write(result.Sensitivities, w);
        });
    }
}
