using System.CommandLine;
using System.Globalization;
using SlotArray.FullWave.Engine;
using SlotArray.FullWave.Model;
using SlotArray.FullWave.Runs;
using SlotArray.FullWave.Slots;
using SlotArray.Reports;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray calibrate-edge --guide G --wall t --width w --frequency F --tilts 5,10 --depths 2.9,3.3 [--surround tube|ground-plane|flare]
/// [--flare-length L --flare-aperture A] [--form saw|end-mill] -o DIR</c>: the full-wave runs behind the edge-slot model's
/// calibration (one pulse per tilt and depth gives the band; one plain-tube run per tilt de-embeds them). Writes
/// DIR/edge-calibration.csv (rows of y = Y/G0 against tilt, depth and frequency, with provenance).
/// </summary>
internal static class CalibrateEdgeCommand
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Builds the command.</summary>
    public static Command Build(TextWriter output, TextWriter error)
    {
        var guide = new Option<string>("--guide") { Description = "Standard waveguide, e.g. WR-90", Required = true };
        var wall = new Option<string>("--wall") { Description = "Wall thickness", DefaultValueFactory = _ => "1.27mm" };
        var width = new Option<string>("--width") { Description = "Saw kerf (or end-mill diameter)", DefaultValueFactory = _ => "1.6mm" };
        var freq = new Option<string>("--frequency") { Description = "Design frequency (the pulse's centre), with unit", Required = true };
        var span = new Option<string>("--span") { Description = "Table band around the design frequency, ± with unit", DefaultValueFactory = _ => "0.6GHz" };
        var step = new Option<string>("--step") { Description = "Table frequency step, with unit", DefaultValueFactory = _ => "0.025GHz" };
        var tilts = new Option<string>("--tilts") { Description = "Tilts in degrees, comma-separated (e.g. 5,10,15,20,25)", Required = true };
        var depths = new Option<string>("--depths") { Description = "Cut depths in mm from the outer narrow-wall face, comma-separated", Required = true };
        var surround = new Option<string>("--surround") { Description = "What the slot radiates into", DefaultValueFactory = _ => "tube" }.AcceptOnlyFromAmong("tube", "ground-plane", "flare");
        var flareLength = new Option<string?>("--flare-length") { Description = "--surround flare: length from the narrow-wall face to the aperture, with unit" };
        var flareAperture = new Option<string?>("--flare-aperture") { Description = "--surround flare: plate spacing at the aperture, with unit" };
        var form = new Option<string>("--form") { Description = "Cutter: saw (flat bottom) or end-mill (half-round ends)", DefaultValueFactory = _ => "saw" }.AcceptOnlyFromAmong("saw", "end-mill");
        var outDir = new Option<string>("--output", "-o") { Description = "Output folder: edge-calibration.csv and runs/ (the run cache)", Required = true };
        var mesh = CharacteriseCommand.MeshOption();
        var engine = CharacteriseCommand.EngineOption();
        var jobs = CharacteriseCommand.JobsOption();
        var cmd = new Command("calibrate-edge", "Full-wave runs of edge slots over tilts and cut depths (openEMS engine): the data the edge-slot model is calibrated on")
        {
            guide, wall, width, freq, span, step, tilts, depths, surround, flareLength, flareAperture, form, outDir, mesh, engine, jobs,
        };
        cmd.SetAction(pr =>
        {
            var g = SlotCommand.ResolveGuide(pr.GetValue(guide), null, null, SlotCommand.ParseLength(pr.GetValue(wall)!, "--wall"));
            var section = new GuideSection(g.BroadWall.Millimeters, g.NarrowWall.Millimeters, g.WallThickness.Millimeters);
            double f0 = SlotCommand.ParseFrequency(pr.GetValue(freq)!, "--frequency").Hertz;
            double half = SlotCommand.ParseFrequency(pr.GetValue(span)!, "--span").Hertz, df = SlotCommand.ParseFrequency(pr.GetValue(step)!, "--step").Hertz;
            int n = (int)Math.Round(2 * half / df);
            var freqs = Enumerable.Range(0, n + 1).Select(i => Math.Round(f0 - half + i * df)).ToList();
            var sur = pr.GetValue(surround) switch
            {
                "flare" => SlotSurround.Flare(
                    SlotCommand.ParseLength(pr.GetValue(flareLength) ?? throw new UserInputException("--surround flare needs --flare-length"), "--flare-length").Millimeters,
                    SlotCommand.ParseLength(pr.GetValue(flareAperture) ?? throw new UserInputException("--surround flare needs --flare-aperture"), "--flare-aperture").Millimeters),
                "ground-plane" => SlotSurround.GroundPlane,
                _ => SlotSurround.Tube,
            };
            var plan = new EdgeSlotCalibrationPlan(g.Designation, section, SlotCommand.ParseLength(pr.GetValue(width)!, "--width").Millimeters,
                pr.GetValue(form) == "end-mill" ? EdgeCutterForm.EndMill : EdgeCutterForm.FlatSaw, sur, Numbers(pr.GetValue(tilts)!, "--tilts"),
                Numbers(pr.GetValue(depths)!, "--depths"), f0, freqs, CharacteriseCommand.Density(pr.GetValue(mesh)!));
            return Run(plan, pr.GetValue(outDir)!, pr.GetValue(engine), pr.GetValue(jobs), output, error);
        });
        return cmd;
    }

    private static IReadOnlyList<double> Numbers(string text, string option)
    {
        try { return text.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries).Select(s => double.Parse(s, Inv)).ToList(); }
        catch (FormatException) { throw new UserInputException($"{option}: give numbers separated by commas, got '{text}'"); }
    }

    private static int Run(EdgeSlotCalibrationPlan plan, string outDir, string? enginePath, int jobs, TextWriter output, TextWriter error)
    {
        var engine = EngineRuns.Locate(enginePath);
        var runs = plan.Runs();
        var store = new RunStore(Path.Combine(outDir, "runs"));
        error.WriteLine(string.Format(Inv, "calibrate-edge: {0} runs, {1} mesh, {2:0.00} to {3:0.00} Mcells, {4} at a time; cache {5}", runs.Count,
            plan.Density.ToString().ToLowerInvariant(), runs.Min(r => r.Model.Mesh.Cells) / 1e6, runs.Max(r => r.Model.Mesh.Cells) / 1e6, jobs, store.Root));
        if (EngineRuns.RunOrStop(engine, store, runs, jobs, error) is not { } outcomes) return StopSignal.ExitCode;
        var rows = plan.Reduce(outcomes);
        var s = MeshSettings.Of(plan.Density);
        var provenance = new[]
        {
            $"produced by: slotarray calibrate-edge (full-wave FDTD, openEMS engine {store.EngineVersion(runs)}), {DateTime.UtcNow:yyyy-MM-dd}",
            string.Format(Inv, "geometry: {0} (a = {1:0.###} mm, b = {2:0.###} mm, wall {3:0.###} mm, PEC), {4} kerf {5:0.###} mm, depth D from the outer narrow-wall face; surroundings {6}",
                plan.Designation, plan.Guide.AMm, plan.Guide.BMm, plan.Guide.WallMm, plan.Form == EdgeCutterForm.FlatSaw ? "flat-bottomed saw" : "end mill", plan.WidthMm, plan.Surround.Label),
            string.Format(Inv, "mesh: {0} (largest cell lambda/{1}, slot region cells <= w/{2}, {3} cells through the wall), {4:0.00} to {5:0.00} Mcells; stop at {6:0} dB energy",
                plan.Density.ToString().ToLowerInvariant(), s.CellsPerWavelength, s.CellsAcrossSlot + 1, s.CellsThroughWall, runs.Min(r => r.Model.Mesh.Cells) / 1e6,
                runs.Max(r => r.Model.Mesh.Cells) / 1e6, 10 * Math.Log10(s.EndCriterion)),
            string.Format(Inv, "de-embedding: TE10 ports at +/-{0:0} mm, one plain-tube run per tilt on the tilt's shared mesh; y = -2 S11/(1 + S11) at the slot centre, normalised to G0", plan.PortZMm),
        };
        Directory.CreateDirectory(outDir);
        string path = Path.Combine(outDir, "edge-calibration.csv");
        AtomicFile.WriteText(path, plan.ToCsv(rows, provenance, header: true));
        foreach (var t in plan.TiltsDeg)
        {
            var at = rows.Where(r => r.TiltDeg == t && Math.Abs(r.FrequencyHz - plan.CentreHz) < 1).ToList();
            output.WriteLine(string.Join("  ", at.Select(r => string.Format(Inv, "t{0:0.#} D{1:0.###}: y = {2:0.0000}{3:+0.0000;-0.0000}j", r.TiltDeg, r.CutDepthMm, r.G, r.B))));
        }
        output.WriteLine($"wrote {path} ({rows.Count} rows)");
        return ExitCodes.Ok;
    }
}
