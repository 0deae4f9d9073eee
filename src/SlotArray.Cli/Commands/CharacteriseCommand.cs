using System.CommandLine;
using System.Globalization;
using SlotArray.Core.Design;
using SlotArray.Core.Slots;
using SlotArray.FullWave.Engine;
using SlotArray.FullWave.Model;
using SlotArray.FullWave.Runs;
using SlotArray.FullWave.Slots;
using SlotArray.Reports;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray characterise SPEC -o DIR [--mesh coarse|normal|fine] [--engine PATH] [--jobs N]</c>: full-wave
/// characterisation of the spec's exact slot with the openEMS engine (an external process). Plans the offsets
/// (tilts) the design needs and lengths around resonance, runs each slot and a plain-tube calibration in parallel
/// (finished runs are kept in DIR/runs: a rerun resumes), de-embeds to the slot plane and writes DIR/slots.csv in the
/// slot-table format of <c>slots.data</c>.
/// </summary>
internal static class CharacteriseCommand
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>The <c>--engine</c> option shared with <c>verify</c>.</summary>
    internal static Option<string?> EngineOption() => new("--engine") { Description = "Path of the openEMS executable (default: openEMS on PATH)" };

    /// <summary>The <c>--jobs</c> option shared with <c>verify</c>.</summary>
    internal static Option<int> JobsOption() => new("--jobs") { Description = "Engine runs at a time, one thread each (default: the number of cores)", DefaultValueFactory = _ => Environment.ProcessorCount };

    /// <summary>The <c>--mesh</c> option shared with <c>verify</c>.</summary>
    internal static Option<string> MeshOption() => new Option<string>("--mesh")
    {
        Description = "Mesh density: coarse (λ/15, 2 cells across the slot), normal (λ/20, 3), fine (λ/30, 4)",
        DefaultValueFactory = _ => "normal",
    }.AcceptOnlyFromAmong("coarse", "normal", "fine");

    /// <summary>Parses a <c>--mesh</c> value.</summary>
    internal static MeshDensity Density(string s) => s switch { "coarse" => MeshDensity.Coarse, "fine" => MeshDensity.Fine, _ => MeshDensity.Normal };

    /// <summary>Builds the command.</summary>
    public static Command Build(TextWriter output, TextWriter error)
    {
        var spec = new Argument<string>("spec") { Description = "The YAML spec whose slot is characterised" };
        var outDir = new Option<string>("--output", "-o") { Description = "Output folder: slots.csv and runs/ (the run cache)", Required = true };
        var mesh = MeshOption();
        var engine = EngineOption();
        var jobs = JobsOption();
        var couplings = new Option<int>("--offsets") { Description = "Offsets (or tilts) to run across the design's range", DefaultValueFactory = _ => 3 };
        var lengths = new Option<int>("--lengths") { Description = "Lengths per offset, 0.96 to 1.04 of the built-in resonant length", DefaultValueFactory = _ => 5 };
        var freqs = new Option<int>("--frequencies") { Description = "Frequencies across the band in the table (the design frequency is always one)", DefaultValueFactory = _ => 5 };
        var cmd = new Command("characterise", "Full-wave characterisation of the spec's exact slot with the openEMS engine: writes a slot table for slots.data")
        {
            spec, outDir, mesh, engine, jobs, couplings, lengths, freqs,
        };
        cmd.SetAction(pr => Run(pr.GetValue(spec)!, pr.GetValue(outDir)!, Density(pr.GetValue(mesh)!), pr.GetValue(engine), pr.GetValue(jobs),
            pr.GetValue(couplings), pr.GetValue(lengths), pr.GetValue(freqs), output, error));
        return cmd;
    }

    private static int Run(string specPath, string outDir, MeshDensity density, string? enginePath, int jobs, int couplings, int lengths, int freqs,
        TextWriter output, TextWriter error)
    {
        var request = DesignCommand.Load(specPath, error, "nothing characterised");
        if (request.Slots.Type == SlotType.InclinedSeries)
            throw new UserInputException($"{specPath}: characterise builds longitudinal and edge slots; inclined series slots are not built yet");
        if (couplings < 1 || lengths < 1 || freqs < 1) throw new UserInputException("--offsets, --lengths and --frequencies must be at least 1");
        var engine = EngineRuns.Locate(enginePath);

        error.WriteLine($"characterise '{request.Name}': designing with the built-in model to find the offsets (tilts) the design needs ...");
        var design = ArrayPipeline.Run(request).Design;
        var plan = SlotCharacterisation.Plan(request, design.Slots.Select(s => s.Coupling).ToList(), density, couplings, lengths, freqs);
        var runs = plan.Runs();
        var store = new RunStore(Path.Combine(outDir, "runs"));
        error.WriteLine(string.Format(Inv, "{0} runs ({1} geometries and their plain-tube calibrations), {2} mesh, {3:0.00} to {4:0.00} Mcells, {5} at a time; cache {6}",
            runs.Count, plan.Samples.Count, density.ToString().ToLowerInvariant(), runs.Min(r => r.Model.Mesh.Cells) / 1e6, runs.Max(r => r.Model.Mesh.Cells) / 1e6,
            jobs, store.Root));
        if (EngineRuns.RunOrStop(engine, store, runs, jobs, error) is not { } outcomes) return StopSignal.ExitCode;
        var results = plan.Reduce(outcomes);
        string table = SlotTableCsv.ToText(results, Provenance(plan, runs, results, store.EngineVersion(runs)), plan.IsEdge);
        Directory.CreateDirectory(outDir);
        string path = Path.Combine(outDir, "slots.csv");
        AtomicFile.WriteText(path, table);
        PrintResonances(output, plan, results);
        output.WriteLine($"wrote {path} ({results.Count} rows); use it with `slots: {{data: {Path.GetFullPath(path)}}}`");
        return ExitCodes.Ok;
    }

    private static IEnumerable<string> Provenance(SlotCharacterisation plan, IReadOnlyList<RunRequest> runs, IReadOnlyList<SlotSampleResult> results,
        string engineVersion)
    {
        var r = plan.Request;
        var g = plan.Guide;
        var s = MeshSettings.Of(plan.Density);
        yield return $"produced by: slotarray characterise (full-wave FDTD, openEMS engine {engineVersion}) from spec '{r.Name}'";
        yield return string.Format(Inv, "guide: {0}, inside a = {1:0.###} mm, b = {2:0.###} mm, wall {3:0.###} mm; walls modelled as perfect conductors ({4}'s conductivity is not in the runs)",
            r.Guide.Designation, g.AMm, g.BMm, g.WallMm, r.Guide.MetalName);
        yield return plan.IsEdge
            ? string.Format(Inv, "slot: edge (narrow wall), flat-bottomed saw cut {0:0.####} mm wide, cut depth from the outer narrow-wall face; length_mm = developed length b/cos(tilt) + 2(depth - wall)", r.Slots.Width.Millimeters)
            : string.Format(Inv, "slot: longitudinal (broad wall), width {0:0.####} mm, {1}; length_mm = rectangular-equivalent length", r.Slots.Width.Millimeters,
                r.Slots.Cutter is { } c ? string.Format(Inv, "round ends (cutter {0:0.####} mm)", c.Millimeters) : "square ends");
        yield return "surroundings: bare tube in free space (a quarter wavelength of air to a perfectly matched layer on every side)";
        yield return string.Format(Inv, "mesh: {0} (largest cell lambda/{1} at the top of the pulse band, {2} cells across the slot, {3} through the wall), {4:0.00} to {5:0.00} Mcells per run, stop at {6:0} dB energy",
            plan.Density.ToString().ToLowerInvariant(), s.CellsPerWavelength, s.CellsAcrossSlot, s.CellsThroughWall, runs.Min(x => x.Model.Mesh.Cells) / 1e6,
            runs.Max(x => x.Model.Mesh.Cells) / 1e6, 10 * Math.Log10(s.EndCriterion));
        yield return string.Format(Inv, "de-embedding: TE10 ports at +/-{0:0} mm from the slot centre, plain-tube calibration run on each slot's own mesh; S11 referred to the slot centre; y = -2 S11/(1 + S11); largest |1 + S11 - S21| = {1:0.0000}",
            plan.PortZMm, results.Max(x => x.ShuntResidual));
        yield return "normalisation: y = Y/G0 (G0: the guide's TE10 characteristic admittance); phasors e^(jwt)";
        yield return $"date: {DateTime.UtcNow:yyyy-MM-dd}";
    }

    private static void PrintResonances(TextWriter o, SlotCharacterisation plan, IReadOnlyList<SlotSampleResult> results)
    {
        double f0 = plan.Request.DesignFrequency.Hertz;
        o.WriteLine(string.Format(Inv, "{0} at {1:0.####} GHz (full-wave, {2} mesh):", plan.IsEdge ? "tilt_deg  resonant depth_mm  developed length_mm  g_r" : "offset_mm  resonant length_mm  g_r",
            f0 * 1e-9, plan.Density.ToString().ToLowerInvariant()));
        foreach (var r in SampledResonance.Find(results, f0))
        {
            string len = r.ResonantLengthMm is double l ? l.ToString("0.0000", Inv) : "not bracketed (peak g at " + r.PeakConductanceLengthMm.ToString("0.0000", Inv) + ")";
            o.WriteLine(plan.IsEdge
                ? string.Format(Inv, "  {0,8:0.###}  {1,18}  {2,19}  {3:0.0000}", r.Coupling, r.CutDepthMm?.ToString("0.0000", Inv) ?? "-", len, r.ResonantConductance)
                : string.Format(Inv, "  {0,9:0.###}  {1,18}  {2:0.0000}", r.Coupling, len, r.ResonantConductance));
        }
    }
}
