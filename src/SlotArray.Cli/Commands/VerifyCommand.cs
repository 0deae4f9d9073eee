using System.CommandLine;
using System.Globalization;
using SlotArray.FullWave.Arrays;
using SlotArray.FullWave.Engine;
using SlotArray.FullWave.Runs;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray verify DESIGN_DIR [--mesh coarse|normal|fine] [--engine PATH] [--jobs N]</c>: builds the designed array
/// exactly as its cut list gives it, runs it in the openEMS engine (one run, N threads), and writes the full-wave S11
/// across the band and the principal-plane pattern beside the tool's own prediction into DESIGN_DIR/verify/. The run
/// is cached in DESIGN_DIR/verify/runs: killed, a rerun starts it again; finished, a rerun only re-reports.
/// </summary>
internal static class VerifyCommand
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Above this many slots the run is long: a warning says so before it starts.</summary>
    public const int LargeArraySlots = 16;

    /// <summary>
    /// Engine throughput assumed before any run in the store, cell updates per second per thread: coarse 6-slot array runs
    /// on a shared 2-core machine measured 40–70 M (one thread, load average 7–13; 2026-12-05); 10 M overstated the time 20-fold.
    /// </summary>
    public const double AssumedThroughput = 40e6;

    /// <summary>Builds the command.</summary>
    public static Command Build(TextWriter output, TextWriter error)
    {
        var dir = new Argument<string>("design-dir") { Description = "A folder written by `slotarray design` (design.json and cutlist.csv)" };
        var mesh = CharacteriseCommand.MeshOption();
        var engine = CharacteriseCommand.EngineOption();
        var jobs = CharacteriseCommand.JobsOption();
        var cmd = new Command("verify", "Full-wave check of the whole designed array (openEMS engine) against the tool's own prediction") { dir, mesh, engine, jobs };
        cmd.SetAction(pr => Run(pr.GetValue(dir)!, CharacteriseCommand.Density(pr.GetValue(mesh)!), pr.GetValue(engine), pr.GetValue(jobs), output, error));
        return cmd;
    }

    private static int Run(string dir, FullWave.Model.MeshDensity density, string? enginePath, int jobs, TextWriter output, TextWriter error)
    {
        DesignFolder design;
        ArrayVerification plan;
        try
        {
            design = DesignFolder.Read(dir);
            plan = ArrayVerification.Plan(design, density);
        }
        catch (Exception e) when (e is InvalidDataException or NotSupportedException)
        {
            throw new UserInputException(e.Message);
        }
        var engine = EngineRuns.Locate(enginePath);
        string outDir = Path.Combine(dir, "verify");
        var store = new RunStore(Path.Combine(outDir, "runs"));
        if (design.Slots.Count > LargeArraySlots)
            error.WriteLine($"warning: {design.Slots.Count} slots (more than {LargeArraySlots}): a full-wave run of the whole array takes long and much memory; consider --mesh coarse first");
        double throughput = store.MeasuredThroughput() ?? AssumedThroughput;
        double estimate = plan.EstimateSeconds(throughput, jobs);
        var m = plan.Run.Model;
        error.WriteLine(string.Format(Inv, "verify '{0}': {1} slots, {2} mesh, {3:0.00} Mcells; estimated run time about {4} ({5} threads at {6:0} Mcells/s each{7}; a rough guide)",
            design.Name, design.Slots.Count, density.ToString().ToLowerInvariant(), m.Mesh.Cells / 1e6, RunProgressPrinter.Duration(estimate), jobs, throughput / 1e6,
            store.MeasuredThroughput() is null ? ", assumed" : ", measured here before"));
        var outcome = store.TryLoad(plan.Run);
        if (outcome is null)
        {
            error.WriteLine($"running the engine in {store.FolderOf(plan.Run)} ...");
            var progress = new RunProgressPrinter(error, RunProgressPrinter.StderrIsTerminal(error));
            progress.Report(new RunProgress(0, 1, estimate, null));
            using var stop = new StopSignal();
            try
            {
                outcome = store.RunAsync(engine, plan.Run, stop.Token, jobs).GetAwaiter().GetResult();
            }
            catch (OperationCanceledException)
            {
                error.WriteLine("stopped: the unfinished run is started again by the next verify");
                return StopSignal.ExitCode;
            }
            progress.Report(new RunProgress(1, 1, 0, outcome));
        }
        else error.WriteLine($"using the finished run in {store.FolderOf(plan.Run)}");
        var result = plan.Reduce(outcome);
        var predicted = plan.PredictedFigures();
        var calibration = CouplingCalibration(dir, result, error);
        var files = VerifyReport.WriteAll(outDir, design, plan, result, predicted, outcome, calibration);
        VerifyReport.PrintTable(output, design, result.Figures, predicted);
        if (calibration is not null) output.WriteLine(VerifyReport.CalibrationText(calibration));
        output.WriteLine($"wrote {outDir}/: {string.Join(", ", files)}");
        return ExitCodes.Ok;
    }

    /// <summary>
    /// The exterior coupling calibration fitted to this run (<see cref="Core.Network.ExteriorCouplingCalibration"/>): the
    /// design rebuilt from the folder's spec.yaml (as <c>compare</c> does), its own slot model for the self admittances;
    /// null (with a note) when the folder has no spec or the design cannot be rebuilt.
    /// </summary>
    private static Core.Network.ExteriorCouplingFit? CouplingCalibration(string dir, FullWaveArrayResult result, TextWriter error)
    {
        string spec = Path.Combine(dir, "spec.yaml");
        if (!File.Exists(spec)) return null;
        try
        {
            var request = DesignCommand.Load(spec, TextWriter.Null, "no coupling calibration");
            if (request.Slots.Type != Core.Slots.SlotType.Longitudinal) return null;
            var analysed = DesignCommand.Analyse(request, new SlotCache(SlotCache.DefaultDirectory()), TextWriter.Null, false);
            return Core.Network.ExteriorCouplingCalibration.Fit(analysed.Design, analysed.SlotModel, result.FrequenciesHz, result.S11);
        }
        catch (Exception e) when (e is UserInputException or Core.InfeasibleDesignException or Core.Slots.Tables.SlotTableException or ArgumentException)
        {
            error.WriteLine($"note: no exterior coupling calibration: {e.Message}");
            return null;
        }
    }
}
