using System.CommandLine;
using System.Globalization;
using SlotArray.Core.Design;
using SlotArray.Core.Network;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.FullWave.Engine;
using SlotArray.FullWave.Model;
using SlotArray.FullWave.Runs;
using SlotArray.FullWave.Slots;
using SlotArray.Reports;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray verify-edge SPEC -o DIR [--mesh coarse|normal|fine] [--engine PATH]</c>: a travelling-wave edge-slot
/// stick as designed, built whole in the full-wave engine (every slot at its tilt and cut depth, the feed port beyond the
/// feed end, a matched port beyond the load end; bare tube or the spec's flare), and the power that reaches the load,
/// |S21|², beside the design's load fraction. Writes DIR/verify-edge.csv (frequency, |S11|², |S21|²).
/// </summary>
internal static class VerifyEdgeCommand
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Depths of neighbouring slots closer than this share one mesh line, mm (each cut then lies within half of it of its depth).</summary>
    public const double DepthMergeMm = 0.06;

    /// <summary>Builds the command.</summary>
    public static Command Build(TextWriter output, TextWriter error)
    {
        var spec = new Argument<string>("spec") { Description = "The YAML spec of a travelling-wave edge-slot array" };
        var outDir = new Option<string>("--output", "-o") { Description = "Output folder: verify-edge.csv and runs/ (the run cache)", Required = true };
        var mesh = CharacteriseCommand.MeshOption();
        var engine = CharacteriseCommand.EngineOption();
        var cmd = new Command("verify-edge", "Full-wave run of a designed travelling-wave edge-slot stick (openEMS engine): the power reaching the load beside the design's")
        {
            spec, outDir, mesh, engine,
        };
        cmd.SetAction(pr => Run(pr.GetValue(spec)!, pr.GetValue(outDir)!, CharacteriseCommand.Density(pr.GetValue(mesh)!), pr.GetValue(engine), output, error));
        return cmd;
    }

    private static int Run(string specPath, string outDir, MeshDensity density, string? enginePath, TextWriter output, TextWriter error)
    {
        var request = DesignCommand.Load(specPath, error, "nothing verified");
        if (request.Slots.Type != SlotType.Edge || request.Feed.Type != FeedType.TravellingWave)
            throw new UserInputException($"{specPath}: verify-edge builds travelling-wave edge-slot arrays");
        var engine = EngineRuns.Locate(enginePath);
        var result = ArrayPipeline.Run(request);
        var d = result.Design;
        var g = request.Guide;
        var section = new GuideSection(g.BroadWall.Millimeters, g.NarrowWall.Millimeters, g.WallThickness.Millimeters);
        var slots = d.Slots.Select(s =>
        {
            double depth = (Core.Fabrication.Datums.EdgeSlotDepthOfCut(s.Length, Core.Quantities.Angle.FromRadians(s.Coupling), g.NarrowWall, g.WallThickness)
                ?? throw new UserInputException($"slot {s.Index}: its length does not reach across the narrow wall, so it has no cut depth to build")).Millimeters;
            return new PlacedSlot(new EdgeCut(s.Coupling * 180 / Math.PI, depth, s.Width.Millimeters), s.Position.Millimeters);
        }).ToList();
        double clearance = SlotCharacterisation.PortClearanceMm + (g.NarrowWall.Millimeters + 2 * g.WallThickness.Millimeters) / 2;
        double feedZ = Math.Ceiling(d.FeedPlane!.Millimeters + clearance), loadZ = -Math.Ceiling(clearance);
        var (f0, fc) = TubeModel.Pulse(section, d.DesignFrequency.Hertz, request.BandLow.Hertz, request.BandHigh.Hertz);
        var surround = result.AddOns.Flare is { } outcome
            ? SlotSurround.Flare(outcome.Flare.Length.Millimeters, outcome.Flare.Aperture.Millimeters)
            : SlotSurround.Tube;
        var layout = new TubeLayout(section, slots, true, null, feedZ, loadZ, f0, fc, density, SlotVoltageProbes: false) { Surround = surround, XMergeMm = DepthMergeMm };
        var freqs = Enumerable.Range(0, 21).Select(i => request.BandLow.Hertz + (request.BandHigh.Hertz - request.BandLow.Hertz) * i / 20).Append(d.DesignFrequency.Hertz).Distinct().Order().ToList();
        var run = new RunRequest("edge-array", TubeModel.Build(layout, $"edge-slot stick {d.Name}: {d.Count} slots as the cut list gives them"), g.BroadWall.Meters, freqs);
        var store = new RunStore(Path.Combine(outDir, "runs"));
        error.WriteLine(string.Format(Inv, "verify-edge '{0}': {1} slots, {2} mesh, {3:0.00} Mcells, surroundings {4}; cache {5}", d.Name, d.Count,
            density.ToString().ToLowerInvariant(), run.Model.Mesh.Cells / 1e6, surround.Label, store.Root));
        if (EngineRuns.RunOrStop(engine, store, [run], 1, error) is not { } outcomes) return StopSignal.ExitCode;
        var outcome1 = outcomes[0];
        var predicted = ArrayNetwork.Solve(d, ArrayPipeline.SlotModelFor(request), d.DesignFrequency);
        var lines = new List<string> { "# verify-edge: full-wave stick (ports: feed beyond the feed end, matched beyond the load end; PEC walls)", "frequency_ghz,s11_power,s21_power" };
        lines.AddRange(outcome1.Response.Points.Select(p => string.Format(Inv, "{0:0.#####},{1:0.######},{2:0.######}", p.FrequencyHz * 1e-9, p.S11.Magnitude * p.S11.Magnitude, p.S21.Magnitude * p.S21.Magnitude)));
        Directory.CreateDirectory(outDir);
        AtomicFile.WriteText(Path.Combine(outDir, "verify-edge.csv"), string.Join("\n", lines) + "\n");
        var at = outcome1.Response.Points.First(p => Math.Abs(p.FrequencyHz - d.DesignFrequency.Hertz) < 1);
        output.WriteLine(string.Format(Inv, "at {0:0.####} GHz: power to the load {1:0.0000} (full wave), {2:0.0000} (design network), asked {3:0.0000}; |S11|^2 {4:0.0000} (full wave), {5:0.0000} (design)",
            d.DesignFrequency.Gigahertz, at.S21.Magnitude * at.S21.Magnitude, predicted.LoadPower, request.Feed.LoadFraction, at.S11.Magnitude * at.S11.Magnitude, predicted.ReflectedPower));
        return 0;
    }
}
