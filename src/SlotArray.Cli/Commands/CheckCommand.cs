using System.CommandLine;
using System.Globalization;
using System.Text.Json;
using SlotArray.Core.Design;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;
using SlotArray.Spec;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray check SPEC [--json]</c>: validates a spec and prints what would be designed (guide, TE10 cutoff,
/// single-mode band, λg at the design frequency, slots, feed, taper). Exit 0, or 2 with the positioned errors on stderr;
/// warnings always go to stderr.
/// </summary>
internal static class CheckCommand
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Builds the command.</summary>
    public static Command Build(TextWriter output, TextWriter error)
    {
        var spec = new Argument<string>("spec") { Description = "The YAML spec to check, e.g. arrays/harbour-surveillance-16.yaml" };
        var json = new Option<bool>("--json") { Description = "Print one JSON object on stdout" };
        var cmd = new Command("check", "Validate a spec and print what would be designed (exit 0, or 2 with positioned errors)") { spec, json };
        cmd.SetAction(pr => Run(pr.GetValue(spec)!, pr.GetValue(json), output, error));
        return cmd;
    }

    private static int Run(string path, bool json, TextWriter output, TextWriter error)
    {
        var r = DesignCommand.Load(path, error, out var warnings);
        if (json) WriteJson(output, r, warnings); else WriteText(output, r, path);
        return ExitCodes.Ok;
    }

    private static void WriteText(TextWriter o, ArrayRequest r, string path)
    {
        var g = r.Guide;
        var (lo, hi) = g.SingleModeBand;
        var lg = g.GuideWavelength(r.DesignFrequency);
        o.WriteLine($"{path}: valid; '{r.Name}' would be designed as:");
        o.WriteLine(string.Format(Inv, "  guide            {0}, a = {1:F3} mm, b = {2:F3} mm, wall {3:F3} mm, {4} (σ = {5:0.###e0} S/m){6}",
            g.Designation, g.BroadWall.Millimeters, g.NarrowWall.Millimeters, g.WallThickness.Millimeters, g.MetalName, g.Conductivity,
            g.RelativePermittivity == 1 ? "" : string.Format(Inv, ", εr = {0:G4}", g.RelativePermittivity)));
        o.WriteLine(string.Format(Inv, "  TE10 cutoff      {0:F4} GHz", g.CutoffTe10.Gigahertz));
        o.WriteLine(string.Format(Inv, "  single-mode band {0:F4} to {1:F4} GHz (then {2})", lo.Gigahertz, hi.Gigahertz,
            Math.Abs(g.CutoffTe20.Hertz - g.CutoffTe01.Hertz) <= 1e-9 * hi.Hertz ? "TE20 and TE01" : g.NextModeName));
        o.WriteLine(string.Format(Inv, "  frequency        {0:F4} GHz, band {1:F4} to {2:F4} GHz", r.DesignFrequency.Gigahertz, r.BandLow.Gigahertz, r.BandHigh.Gigahertz));
        o.WriteLine(string.Format(Inv, "  λg               {0:F3} mm at {1:F4} GHz", lg.Millimeters, r.DesignFrequency.Gigahertz));
        var s = r.Slots;
        o.WriteLine(string.Format(Inv, "  slots            {0} {1}, width {2:F3} mm, {3}, model {4}", s.Count, SpecNames.Of(s.Type), s.Width.Millimeters,
            s.Cutter is { } c ? string.Format(Inv, "cutter {0:F3} mm (round ends)", c.Millimeters) : "square ends",
            s.Data is { } table ? string.Format(Inv, "slot table {0} ({1} rows, SHA-256 {2}){3}", table.Source, table.Rows.Count, table.Sha256, s.Extrapolate ? ", extrapolate" : "") : SpecNames.Of(s.Model)));
        if (EdgeConductanceRange(r) is { } range) o.WriteLine(range);
        var f = r.Feed;
        string fed = f.Type == FeedType.StandingWave
            ? string.Format(Inv, "{0}-fed, short {1}", SpecNames.Of(f.Position), Distance(f.ShortDistance, lg))
            : string.Format(Inv, "load {0:0.##} %", f.LoadFraction * 100);
        o.WriteLine($"  feed             {SpecNames.Of(f.Type)}, spacing {Distance(f.Spacing, lg)}, {fed}");
        o.WriteLine($"  taper            {(r.Planar?.CircularSidelobesDb is { } cs ? string.Format(Inv, "circular-taylor (whole aperture), sidelobes {0:G4} dB, n̄ {1}", cs, r.Planar.CircularNbar) : Taper(r.Taper))}");
        if (r.Planar is { CircularSidelobesDb: null } pl) o.WriteLine($"  taper_across     {Taper(pl.Across ?? r.Taper)}");
        o.WriteLine($"  coupling         {SpecNames.Of(r.Coupling)}");
        if (r.Tolerance is { } t) o.WriteLine(string.Format(Inv, "  tolerance        Monte Carlo, {0} trials, seed {1}", t.Trials, t.Seed));
        foreach (string line in PlanarCheck.Of(r).Lines) o.WriteLine(line);
    }

    /// <summary>
    /// Edge slots with the built-in model: the smallest and largest conductance the cut and its surroundings can give at
    /// the design frequency (the design cut at the smallest calibrated tilt and at the largest tilt), or null.
    /// </summary>
    private static string? EdgeConductanceRange(ArrayRequest r)
    {
        if (r.Slots.Type != SlotType.Edge || r.Slots.Data is not null) return null;
        var model = CalibratedEdgeSlot.Create(r.Guide, r.Slots.Width, r.Slots.Surround);
        var f0 = r.DesignFrequency;
        double lowTilt = model.Surface.Family.TiltsDeg[0];
        return string.Format(Inv, "  edge slots       {0}: g = {1:0.#####} at {2:0.#} deg to {3:0.#####} at {4:0} deg ({5} calibration, {6:F4} GHz)",
            CalibratedEdgeSlot.Word(r.Slots.Surround), model.MinimumCalibratedConductance(f0), lowTilt, model.MaximumConductance(f0),
            CalibratedEdgeSlot.MaximumTilt.Degrees, model.Surface.Family.Guide, f0.Gigahertz);
    }

    private static string Distance(GuideDistance d, Core.Quantities.Length lg) => d.GuideWavelengths is { } n
        ? string.Format(Inv, "{0:G4} λg ({1:F3} mm)", n, d.Resolve(lg).Millimeters)
        : string.Format(Inv, "{0:F3} mm ({1:G4} λg)", d.Fixed!.Value.Millimeters, d.Fixed!.Value / lg);

    private static string Taper(TaperRequest t) => t.Type switch
    {
        TaperType.Uniform => "uniform",
        TaperType.Given => string.Format(Inv, "given ({0} weights)", t.Weights!.Count),
        TaperType.CosinePedestal => string.Format(Inv, "cosine-pedestal, edge {0:G4} dB, exponent {1:G4}", t.EdgeLevelDb, t.Exponent),
        TaperType.Taylor or TaperType.Villeneuve or TaperType.Bayliss => string.Format(Inv, "{0}, sidelobes {1:G4} dB, n̄ {2}", SpecNames.Of(t.Type), t.SidelobeLevelDb, t.Nbar),
        _ => string.Format(Inv, "{0}, sidelobes {1:G4} dB", SpecNames.Of(t.Type), t.SidelobeLevelDb),
    };

    private static void WriteJson(TextWriter o, ArrayRequest r, IReadOnlyList<SpecWarning> warnings)
    {
        var g = r.Guide;
        var (lo, hi) = g.SingleModeBand;
        var doc = new Dictionary<string, object?>
        {
            ["name"] = r.Name,
            ["frequency_hz"] = r.DesignFrequency.Hertz,
            ["band_hz"] = new[] { r.BandLow.Hertz, r.BandHigh.Hertz },
            ["guide"] = new Dictionary<string, object?>
            {
                ["designation"] = g.Designation,
                ["a_mm"] = Math.Round(g.BroadWall.Millimeters, 6),
                ["b_mm"] = Math.Round(g.NarrowWall.Millimeters, 6),
                ["wall_mm"] = Math.Round(g.WallThickness.Millimeters, 6),
                ["metal"] = g.MetalName,
                ["conductivity_s_per_m"] = g.Conductivity,
                ["relative_permittivity"] = g.RelativePermittivity,
            },
            ["cutoff_te10_hz"] = Math.Round(g.CutoffTe10.Hertz, 1),
            ["single_mode_band_hz"] = new[] { Math.Round(lo.Hertz, 1), Math.Round(hi.Hertz, 1) },
            ["guide_wavelength_mm"] = Math.Round(g.GuideWavelength(r.DesignFrequency).Millimeters, 6),
            ["slots"] = new Dictionary<string, object?>
            {
                ["type"] = SpecNames.Of(r.Slots.Type),
                ["count"] = r.Slots.Count,
                ["width_mm"] = Math.Round(r.Slots.Width.Millimeters, 6),
                ["cutter_mm"] = r.Slots.Cutter is { } c ? Math.Round(c.Millimeters, 6) : null,
                ["model"] = SpecNames.Of(r.Slots.Model),
            },
            ["feed"] = new Dictionary<string, object?> { ["type"] = SpecNames.Of(r.Feed.Type), ["position"] = SpecNames.Of(r.Feed.Position) },
            ["taper"] = new Dictionary<string, object?> { ["type"] = SpecNames.Of(r.Taper.Type), ["sidelobes_db"] = r.Taper.SidelobeLevelDb },
            ["coupling"] = SpecNames.Of(r.Coupling),
            ["warnings"] = warnings.Select(w => w.ToString()).ToArray(),
        };
        if (PlanarCheck.Of(r).Json is { } planar) doc["planar"] = planar;
        if (r.Slots.Data is { } data && doc["slots"] is Dictionary<string, object?> slots)
        {
            slots.Remove("model");
            slots["data"] = new Dictionary<string, object?> { ["file"] = data.Source, ["sha256"] = data.Sha256, ["rows"] = data.Rows.Count, ["extrapolate"] = r.Slots.Extrapolate };
        }
        o.WriteLine(JsonSerializer.Serialize(doc, new JsonSerializerOptions { WriteIndented = true }));
    }
}
