using System.CommandLine;
using System.Globalization;
using System.Text.Json;
using SlotArray.Core;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;
using SlotArray.Spec;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray slot --guide G --frequency F (--offset X | --tilt A) [--wall t] [--width w] [--table] [--json]</c> and
/// <c>slotarray slot --plane --length L --width W --frequency F [--target 50ohm]</c>: one slot — resonant length and
/// conductance (moment method beside Stevenson for a broad-wall slot), and y = Y/G0 against length.
/// </summary>
/// <remarks>
/// The action picks the slot kind from the coupling option given: <c>--offset</c> (longitudinal broad-wall slot),
/// <c>--tilt</c> (edge slot, <see cref="SlotEdgeReport"/>) or <c>--plane</c> (slot in a ground plane, <see cref="SlotPlaneReport"/>).
/// Quantities take units, with or without a space: <c>9.375GHz</c>, <c>9.375 GHz</c>, <c>2mm</c>, <c>0.05 in</c>.
/// </remarks>
internal static class SlotCommand
{
    private static readonly CultureInfo Ci = CultureInfo.InvariantCulture;

    /// <summary>Builds the command.</summary>
    public static Command Build(TextWriter output, TextWriter error)
    {
        var guide = new Option<string?>("--guide") { Description = "Standard waveguide, e.g. WR-90 (or give --a and --b)" };
        var a = new Option<string?>("--a") { Description = "Inside broad-wall width a, with unit (e.g. 22.86mm)" };
        var b = new Option<string?>("--b") { Description = "Inside narrow-wall height b, with unit" };
        var freq = new Option<string>("--frequency") { Description = "Frequency, with unit (e.g. 9.375GHz)", Required = true };
        var offset = new Option<string?>("--offset") { Description = "Longitudinal slot: offset of the slot centre line from the guide centre line, with unit" };
        var tilt = new Option<string?>("--tilt") { Description = "Edge slot in the narrow wall: tilt from the perpendicular to the guide axis, with unit (e.g. 15deg)" };
        var plane = new Option<bool>("--plane") { Description = "A single slot in an infinite ground plane (Babinet), with --length, --width and --frequency" };
        var length = new Option<string?>("--length") { Description = "--plane: slot length, with unit" };
        var target = new Option<string>("--target") { Description = "--plane: input resistance to feed at, e.g. 50ohm", DefaultValueFactory = _ => "50ohm" };
        var wall = new Option<string>("--wall") { Description = "Wall thickness where the slot is cut (0 = thin-wall model)", DefaultValueFactory = _ => "0mm" };
        var width = new Option<string>("--width") { Description = "Slot width", DefaultValueFactory = _ => "1.5875mm" };
        var table = new Option<string?>("--table")
        {
            Description = "Also tabulate g_r and L_r over the usable offsets (0 < x <= a/4); --table FILE writes the built-in model's slot table (the slots.data CSV format) to FILE",
            Arity = ArgumentArity.ZeroOrOne,
        };
        var surround = new Option<string>("--surround") { Description = "--tilt: what the edge slot radiates into (picks its full-wave calibration)", DefaultValueFactory = _ => "tube" }
            .AcceptOnlyFromAmong("tube", "ground-plane", "flare");
        var json = new Option<bool>("--json") { Description = "Print one JSON document on stdout" };
        var cmd = new Command("slot", "One slot: resonant length and conductance (moment method beside Stevenson) and y = Y/G0 against length")
        {
            guide, a, b, freq, offset, tilt, surround, plane, length, target, wall, width, table, json,
        };
        cmd.SetAction(pr =>
        {
            if (pr.GetValue(plane))
            {
                if (pr.GetValue(length) is not { } len) throw new UserInputException("slot --plane needs --length L (e.g. 15mm)");
                return SlotPlaneReport.Run(ParseLength(len, "--length"), ParseLength(pr.GetValue(width)!, "--width"),
                    ParseFrequency(pr.GetValue(freq)!, "--frequency"), ParseResistance(pr.GetValue(target)!), pr.GetValue(json), output, error);
            }
            var g = ResolveGuide(pr.GetValue(guide), pr.GetValue(a), pr.GetValue(b), ParseLength(pr.GetValue(wall)!, "--wall"));
            var f = ParseFrequency(pr.GetValue(freq)!, "--frequency");
            var w = ParseLength(pr.GetValue(width)!, "--width");
            if (pr.GetValue(offset) is not null && pr.GetValue(tilt) is not null)
                throw new UserInputException("slot: give --offset (broad-wall slot) or --tilt (edge slot), not both");
            bool withTable = pr.GetResult(table) is not null;
            string? tableFile = pr.GetValue(table);
            if (pr.GetValue(offset) is { } x)
            {
                int code = Longitudinal(g, f, ParseLength(x, "--offset"), w, withTable && tableFile is null, pr.GetValue(json), output, error);
                if (tableFile is not null)
                    error.WriteLine($"wrote {SlotTableExport.Longitudinal(new MomentMethodSlotModel(g, w), f, tableFile)} rows of the moment-method slot table to {tableFile}");
                return code;
            }
            if (pr.GetValue(tilt) is { } th)
            {
                var where = pr.GetValue(surround) switch { "flare" => EdgeSlotSurround.Flare, "ground-plane" => EdgeSlotSurround.GroundPlane, _ => EdgeSlotSurround.Tube };
                int code = SlotEdgeReport.Run(g, f, ParseAngle(th, "--tilt"), where, w, pr.GetValue(json), output, error);
                if (tableFile is not null)
                    error.WriteLine($"wrote {SlotTableExport.Edge(CalibratedEdgeSlot.Create(g, w, where), f, tableFile)} rows of the edge-slot table to {tableFile}");
                return code;
            }
            throw new UserInputException("slot: give the coupling of the slot: --offset X (longitudinal broad-wall slot), --tilt A (edge slot) or --plane");
        });
        return cmd;
    }

    internal static RectangularWaveguide ResolveGuide(string? name, string? a, string? b, Length wall)
    {
        if (!(wall.Meters >= 0)) throw new UserInputException($"--wall must be zero or positive, got {wall}");
        if (name is not null)
        {
            if (a is not null || b is not null) throw new UserInputException("give either --guide or --a and --b, not both");
            var std = WaveguideCatalogue.Find(name)
                ?? throw new UserInputException($"--guide: unknown waveguide '{name}' (see `slotarray guides` for the catalogue)");
            return RectangularWaveguide.FromStandard(std, wall, Metal.Copper);
        }
        if (a is null || b is null) throw new UserInputException("give --guide (e.g. WR-90) or both --a and --b");
        try { return RectangularWaveguide.Create(ParseLength(a, "--a"), ParseLength(b, "--b"), wall, Metal.Copper); }
        catch (ArgumentOutOfRangeException e) { throw new UserInputException($"guide: {e.Message}"); }
    }

    private static int Longitudinal(RectangularWaveguide g, Frequency f, Length offset, Length width, bool withTable, bool json,
        TextWriter o, TextWriter err)
    {
        var (low, high) = g.SingleModeBand;
        if (f <= low) throw new UserInputException($"--frequency {f} is at or below the TE10 cutoff {low} of {g.Designation}");
        double x = offset.Meters, aHalf = g.BroadWall.Meters / 2;
        if (Math.Abs(x) + width.Meters / 2 >= aHalf)
            throw new UserInputException(FormattableString.Invariant($"--offset {offset} puts the slot edge beyond the side wall (a/2 = {aHalf * 1e3:0.###} mm)"));
        if (!(width.Meters > 0) || width.Meters > aHalf / 2) throw new UserInputException($"--width {width} must be positive and narrow compared with a");

        var model = new MomentMethodSlotModel(g, width);
        var (lr, atRes) = ResonantCharacterisation.FindResonance(model.Solver, x, f);
        double gr = atRes.Admittance.Real, gs = StevensonLongitudinalSlot.Conductance(g, x, f);
        var warnings = new List<DesignWarning>(StevensonLongitudinalSlot.Warnings(g, x, f).Where(w => w.Code != "stevenson-thin-wall"));
        if (g.WallThickness.Meters == 0)
            warnings.Add(new DesignWarning("slot-thin-wall", "wall thickness 0 (thin-wall model, about 1 % uncertain in resonant length): give --wall for the tube's real wall, which lengthens the resonant slot"));
        if (Math.Abs(x) > model.MaximumCoupling)
            warnings.Add(new DesignWarning("slot-offset-range", FormattableString.Invariant($"offset {Math.Abs(x) * 1e3:0.###} mm is beyond the usable a/4 = {model.MaximumCoupling * 1e3:0.###} mm")));
        if (atRes.ShuntAsymmetry > MomentMethodSlotModel.ShuntAsymmetryLimit)
            warnings.Add(new DesignWarning("slot-shunt-validity", FormattableString.Invariant($"|B - C|/|B| = {atRes.ShuntAsymmetry * 100:0.#} % > 10 % at resonance: the slot is not a pure shunt element")));
        var sweep = Enumerable.Range(0, 11).Select(i =>
        {
            double len = lr * (0.90 + 0.02 * i);
            var y = model.Solver.Solve(offset, Length.FromMeters(len), f).Admittance;
            return (LengthMm: len * 1e3, G: y.Real, B: y.Imaginary);
        }).ToList();
        var tab = withTable ? model.Characterisation(f) : null;

        if (json)
        {
            var doc = new Dictionary<string, object?>
            {
                ["guide"] = g.Designation,
                ["a_mm"] = g.BroadWall.Millimeters,
                ["b_mm"] = g.NarrowWall.Millimeters,
                ["frequency_hz"] = f.Hertz,
                ["offset_mm"] = offset.Millimeters,
                ["wall_mm"] = g.WallThickness.Millimeters,
                ["width_mm"] = width.Millimeters,
                ["model"] = model.Name,
                ["normalisation"] = "y = Y/G0 (TE10 characteristic admittance); lengths are rectangular-equivalent",
                ["resonant_length_mm"] = lr * 1e3,
                ["resonant_conductance"] = gr,
                ["stevenson_conductance"] = gs,
                ["shunt_asymmetry"] = atRes.ShuntAsymmetry,
                ["admittance"] = sweep.Select(s => new Dictionary<string, double> { ["length_mm"] = s.LengthMm, ["g"] = s.G, ["b"] = s.B }).ToList(),
                ["warnings"] = warnings.Select(w => new Dictionary<string, string> { ["code"] = w.Code, ["message"] = w.Message }).ToList(),
            };
            if (tab is not null) doc["table"] = TableRows(tab, g, f).Select(r => new Dictionary<string, double>
            {
                ["offset_mm"] = r.X * 1e3, ["resonant_length_mm"] = r.L * 1e3, ["resonant_conductance"] = r.G, ["stevenson_conductance"] = r.S,
            }).ToList();
            o.WriteLine(JsonSerializer.Serialize(doc, new JsonSerializerOptions { WriteIndented = true }));
        }
        else
        {
            o.WriteLine(string.Format(Ci, "Longitudinal shunt slot in {0} (a = {1:0.###} mm, b = {2:0.###} mm), wall {3:0.###} mm, width {4:0.####} mm, {5}, offset {6:0.###} mm",
                g.Designation, g.BroadWall.Millimeters, g.NarrowWall.Millimeters, g.WallThickness.Millimeters, width.Millimeters, f, offset.Millimeters));
            o.WriteLine("                              moment method   Stevenson");
            o.WriteLine(string.Format(Ci, "resonant length (mm)          {0,13:F4}   (not given by the formula)", lr * 1e3));
            o.WriteLine(string.Format(Ci, "resonant conductance g_r      {0,13:F5}   {1:F5}", gr, gs));
            o.WriteLine(string.Format(Ci, "|B - C|/|B| at resonance      {0,12:F1} %", atRes.ShuntAsymmetry * 100));
            o.WriteLine();
            o.WriteLine("y = Y/G0 against length (moment method, finite wall):");
            o.WriteLine("  length (mm)   L/L_r        g          b");
            foreach (var s in sweep)
                o.WriteLine(string.Format(Ci, "  {0,11:F4}  {1,6:F3}  {2,9:F5}  {3,9:F5}", s.LengthMm, s.LengthMm / (lr * 1e3), s.G, s.B));
            if (tab is not null)
            {
                o.WriteLine();
                o.WriteLine("Resonant characterisation (moment method) over the usable offsets:");
                o.WriteLine("  offset (mm)  L_r (mm)      g_r    Stevenson g");
                foreach (var r in TableRows(tab, g, f))
                    o.WriteLine(string.Format(Ci, "  {0,11:F3}  {1,8:F4}  {2,7:F5}  {3,13:F5}", r.X * 1e3, r.L * 1e3, r.G, r.S));
            }
            o.WriteLine("Lengths are rectangular-equivalent; for round ends cut L_o = L + 0.2146 w (equal-area rule, common practice).");
            foreach (var w in warnings) err.WriteLine($"warning: {w.Message}");
        }
        return ExitCodes.Ok;
    }

    private static IEnumerable<(double X, double L, double G, double S)> TableRows(ResonantCharacterisation c, RectangularWaveguide g, Frequency f)
        => c.Table.OffsetsMeters.Select((x, i) => (x, c.Table.ResonantLengthsMeters[i], c.Table.Conductances[i], StevensonLongitudinalSlot.Conductance(g, x, f)));

    /// <summary>A length with its unit (m, cm, mm, um, in, mil), space optional. Bad input throws <see cref="UserInputException"/>.</summary>
    internal static Length ParseLength(string text, string option)
        => QuantityParser.TryParseLength(text, out var v, out string e) ? v : throw new UserInputException($"{option}: {e}");

    /// <summary>A frequency with its unit (Hz, kHz, MHz, GHz), space optional.</summary>
    internal static Frequency ParseFrequency(string text, string option)
        => QuantityParser.TryParseFrequency(text, out var v, out string e) ? v : throw new UserInputException($"{option}: {e}");

    /// <summary>An angle with its unit (deg, rad), space optional.</summary>
    internal static Angle ParseAngle(string text, string option)
        => QuantityParser.TryParseAngle(text, out var v, out string e) ? v : throw new UserInputException($"{option}: {e}");

    /// <summary>A resistance such as 50ohm, 50 ohm or 50 Ω.</summary>
    internal static double ParseResistance(string text)
    {
        string s = text.Trim();
        foreach (var unit in new[] { "ohms", "ohm", "Ω" })
            if (s.EndsWith(unit, StringComparison.OrdinalIgnoreCase)) { s = s[..^unit.Length].Trim(); break; }
        return double.TryParse(s, NumberStyles.Float, Ci, out double r) && double.IsFinite(r) && r > 0
            ? r : throw new UserInputException($"--target: '{text}' needs a positive resistance such as '50ohm'");
    }
}
