using System.Diagnostics;
using System.Globalization;
using SlotArray.Core.Design;
using SlotArray.Core.Planar;
using SlotArray.Reports;
using SlotArray.Reports.Planar;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray design</c> for a planar spec (<c>array: {type: planar}</c>): composes the slot source, runs
/// <see cref="PlanarPipeline"/>, writes <see cref="PlanarOutputs"/> and prints the key figures. Infeasible designs exit 1
/// (the reason names the branch and slot); a non-converging coupled iteration exits 1 as well.
/// </summary>
internal static class PlanarDesignRun
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Designs, writes and prints; returns the exit code.</summary>
    public static int Run(ArrayRequest request, string? outDir, SlotCache? cache, TextWriter output, TextWriter error)
    {
        string folder = OutputFolderCheck.Prepare(outDir ?? DesignCommand.DefaultFolder(request.Name), replacesWhole: true, PlanarOutputs.PossibleNames);
        var clock = Stopwatch.StartNew();
        var p = request.Planar!;
        var source = DesignCommand.SourceFor(request, cache, error, out _);
        error.WriteLine(string.Format(Inv, "designing planar '{0}': {1} branches x {2} slots (bounding), {3} outline, {4} at {5:0.####} GHz ...",
            request.Name, p.Branches, request.Slots.Count, p.Outline.ToString().ToLowerInvariant(),
            request.Coupling == CouplingMode.Mutual ? "coupled design over all slots" : "isolated slots", request.DesignFrequency.Gigahertz));
        var result = PlanarPipeline.Run(request, source);
        cache?.Save(request, source.Cache, error);
        double? design = p.CircularSidelobesDb ?? (TaperLevel(request.Taper));
        var names = PlanarOutputs.WriteAll(result, design, folder);
        foreach (var w in result.Design.Warnings) error.WriteLine($"warning: {w.Message}");
        var unused = new List<string>();
        if (request.Tolerance is not null) unused.Add("tolerance (Monte Carlo)");
        if (request.Requirements != Requirements.None) unused.Add("requirements (pass/fail verdicts)");
        if (request.Transmitter is not null) unused.Add("transmitter (exposure and power screening)");
        if (unused.Count > 0)
            error.WriteLine($"warning: not evaluated for planar arrays yet: {string.Join(", ", unused)}; the figures below are the design's, not verdicts");
        var f = result.Figures;
        string Db(double? v) => v is { } x ? x.ToString("0.00", Inv) + " dB" : "none";
        output.WriteLine($"{request.Name}: planar, {result.Design.Layout.Count} slots on {result.Design.Branches.Count} branches, {result.Design.TaperMethod}");
        output.WriteLine(string.Format(Inv, "  S11 at {0:0.####} GHz     {1:0.00} dB (worst over the band {2:0.00} dB)", request.DesignFrequency.Gigahertz,
            20 * Math.Log10(Math.Max(result.AtDesign.S11.Magnitude, 1e-15)), result.Sweep.Max(q => 20 * Math.Log10(Math.Max(q.S11.Magnitude, 1e-15)))));
        output.WriteLine($"  peak sidelobe x-z, y-z {Db(f.HPlane.PeakSidelobeDb)}, {Db(f.EPlane.PeakSidelobeDb)} (design {Db(design)}); 45° cut {Db(f.Diagonal.PeakSidelobeDb)}; whole visible region {Db(f.PeakSidelobe?.LevelDb)}");
        output.WriteLine(string.Format(Inv, "  HPBW x-z, y-z           {0:0.00} deg, {1:0.00} deg", f.HPlane.HalfPowerBeamwidth.Degrees, f.EPlane.HalfPowerBeamwidth.Degrees));
        output.WriteLine(string.Format(Inv, "  directivity, gain       {0:0.00} dBi (4πA/λ² η_t {1:0.00} dBi), {2:0.00} dBi", f.DirectivityDbi, f.ApertureDirectivityDbi, f.GainDbi));
        output.WriteLine(string.Format(Inv, "  pitch {0:0.###} mm{1}; feed guide a = {2:0.###} mm{3}", result.Design.Layout.Pitch.Millimeters, result.PitchAuto ? " (auto)" : "",
            result.Design.FeedGuide.BroadWall.Millimeters, result.FeedWidthSolved ? " (solved for the pitch)" : ""));
        if (result.Design.Coupled)
            output.WriteLine(string.Format(Inv, "  coupled iteration       {0} sweeps; last: offsets move ≤ {1:0.000000} mm, lengths ≤ {2:0.000000} mm",
                result.Design.Iterations.Count, result.Design.Iterations[^1].MaximumOffsetChange * 1e3, result.Design.Iterations[^1].MaximumLengthChange * 1e3));
        output.WriteLine($"  wrote {folder}/: {string.Join(", ", names)}");
        error.WriteLine(string.Format(Inv, "done in {0:0.0} s", clock.Elapsed.TotalSeconds));
        return ExitCodes.Ok;
    }

    private static double? TaperLevel(Core.Tapers.TaperRequest t) => Core.Tapers.TaperSynthesis.LevelRange(t.Type) is null ? null : t.SidelobeLevelDb;
}
