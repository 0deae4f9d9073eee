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
        double throughput = store.MeasuredThroughput() ?? 10e6;
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
        var files = VerifyReport.WriteAll(outDir, design, plan, result, predicted, outcome);
        VerifyReport.PrintTable(output, design, result.Figures, predicted);
        output.WriteLine($"wrote {outDir}/: {string.Join(", ", files)}");
        return ExitCodes.Ok;
    }
}
