using System.Globalization;
using System.Text.Json;
using SlotArray.Core;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray slot --guide G --frequency F --tilt A [--wall t] [--width w] [--json]</c>: one edge slot — conductance
/// from the closed form, resonant developed length and cut depth of the first-order model, y against length.
/// Takes already-parsed SI values; the command wiring lives with the <c>slot</c> command.
/// </summary>
internal static class SlotEdgeReport
{
    /// <summary>Slot width used when none is given: 1.5875 mm (1/16 in, the classic X-band slot width; common practice).</summary>
    public static Length DefaultWidth => Length.FromInches(1.0 / 16);

    /// <summary>Ratios L/L_r of the admittance table.</summary>
    private static readonly double[] Ratios = [0.90, 0.92, 0.94, 0.96, 0.98, 1.00, 1.02, 1.04, 1.06, 1.08, 1.10];

    /// <summary>
    /// Prints the report (text, or one JSON document with keys <c>frequency_hz</c>, <c>tilt_deg</c>, <c>wall_mm</c>,
    /// <c>width_mm</c>, <c>resonant_length_mm</c>, <c>resonant_conductance</c>, <c>cut_depth_mm</c>, <c>admittance</c>
    /// [{length_mm, g, b}], <c>warnings</c>, plus <c>cross_polar_direction_deg</c> and <c>cross_polar_level_db</c>).
    /// Returns 0, or 1 (infeasible, reason on <paramref name="error"/>) when the model gives no cut that opens the guide;
    /// the rest of the report is printed either way.
    /// </summary>
    /// <param name="guide">The guide (catalogue or custom a, b), with its wall thickness.</param>
    /// <param name="f">Frequency.</param>
    /// <param name="tilt">Signed slot tilt; |θ| ≤ 30°.</param>
    /// <param name="wall">Wall thickness overriding the guide's; null keeps the guide's.</param>
    /// <param name="width">Slot width; null gives <see cref="DefaultWidth"/>.</param>
    /// <param name="json">One JSON document on <paramref name="output"/> instead of text.</param>
    /// <param name="output">Where the report goes.</param>
    /// <param name="error">Where the infeasibility reason goes.</param>
    public static int Run(RectangularWaveguide guide, Frequency f, Angle tilt, Length? wall, Length? width, bool json, TextWriter output, TextWriter error)
    {
        ArgumentNullException.ThrowIfNull(guide);
        if (Math.Abs(tilt.Radians) > EdgeSlot.MaximumTilt.Radians + 1e-12)
            throw new UserInputException(FormattableString.Invariant($"--tilt must lie within ±{EdgeSlot.MaximumTilt.Degrees:0} deg for an edge slot, got {tilt.Degrees:0.###} deg"));
        if (wall is { } t)
        {
            if (!(t.Meters >= 0)) throw new UserInputException($"--wall must be zero or positive, got {t}");
            guide = guide with { WallThickness = t };
        }
        var w = width ?? DefaultWidth;
        if (!(w.Meters > 0) || !(w < guide.NarrowWall)) throw new UserInputException($"--width must be positive and below the narrow wall b = {guide.NarrowWall}, got {w}");
        var model = EdgeSlot.Create(guide, w);

        var resonance = model.Resonance(tilt.Radians, f);
        var warnings = model.Warnings(tilt.Radians, f);
        Length? depth = null;
        string? infeasible = null;
        try { depth = model.ResonantCutDepth(tilt, f); }
        catch (InfeasibleDesignException e) { infeasible = e.Message; }
        var rows = Ratios.Select(r => (Length: r * resonance.ResonantLength, Y: model.Admittance(tilt.Radians, r * resonance.ResonantLength, f))).ToList();
        // Rounding noise at the resonance row (|Im y| ~ 1e-17) must not print as "-0".
        static double Clean(double v) => Math.Abs(v) < 1e-12 ? 0.0 : v;
        var psi = EdgeSlotCrossPolarization.LobeDirection(0.5 * guide.GuideWavelength(f), f);
        double? level = tilt.Radians == 0 ? null : EdgeSlotCrossPolarization.LobeLevelDecibels(tilt);

        if (json)
        {
            var doc = new Dictionary<string, object?>
            {
                ["guide"] = guide.Designation,
                ["frequency_hz"] = f.Hertz,
                ["tilt_deg"] = Math.Round(tilt.Degrees, 9),
                ["wall_mm"] = Math.Round(guide.WallThickness.Millimeters, 6),
                ["width_mm"] = Math.Round(w.Millimeters, 6),
                ["model"] = model.Name,
                ["normalisation"] = "g and b are normalised to the TE10 characteristic admittance G0",
                ["resonant_length_mm"] = Math.Round(resonance.ResonantLength.Millimeters, 6),
                ["resonant_conductance"] = Math.Round(resonance.Conductance, 8),
                ["cut_depth_mm"] = depth is { } d ? Math.Round(d.Millimeters, 6) : null,
                ["cross_polar_direction_deg"] = psi is { } p ? Math.Round(p.Degrees, 4) : null,
                ["cross_polar_level_db"] = level is { } l ? Math.Round(l, 4) : null,
                ["admittance"] = rows.Select(r => new Dictionary<string, double>
                {
                    ["length_mm"] = Math.Round(r.Length.Millimeters, 6),
                    ["g"] = Math.Round(Clean(r.Y.Real), 8),
                    ["b"] = Math.Round(Clean(r.Y.Imaginary), 8),
                }).ToList(),
                ["warnings"] = warnings.Select(x => new Dictionary<string, string> { ["code"] = x.Code, ["message"] = x.Message }).ToList(),
            };
            output.WriteLine(JsonSerializer.Serialize(doc, new JsonSerializerOptions { WriteIndented = true }));
        }
        else
        {
            var ci = CultureInfo.InvariantCulture;
            output.WriteLine(string.Format(ci, "edge slot in {0} (a = {1:F3} mm, b = {2:F3} mm, wall {3:F3} mm), width {4:F4} mm, {5:F6} GHz, tilt {6:F3} deg",
                guide.Designation, guide.BroadWall.Millimeters, guide.NarrowWall.Millimeters, guide.WallThickness.Millimeters, w.Millimeters, f.Gigahertz, tilt.Degrees));
            output.WriteLine($"model: {model.Name}");
            output.WriteLine(string.Format(ci, "resonant conductance g_r = {0:F5} (closed form, normalised to the TE10 admittance G0)", resonance.Conductance));
            output.WriteLine(string.Format(ci, "resonant developed length {0:F4} mm ({1:F2} x lambda/2)", resonance.ResonantLength.Millimeters, EdgeSlot.ResonanceFraction));
            output.WriteLine(depth is { } d
                ? string.Format(ci, "cut depth into each broad wall, from the outer narrow-wall face: {0:F4} mm", d.Millimeters)
                : "cut depth into each broad wall: none that opens the guide (see warnings)");
            if (psi is { } p && level is { } lv)
                output.WriteLine(string.Format(ci, "cross-polar lobes (alternating tilts, lambda_g/2 spacing): +-{0:F1} deg, {1:F1} dB before element weighting", p.Degrees, lv));
            output.WriteLine("length (mm)         g          b");
            foreach (var r in rows)
                output.WriteLine(string.Format(ci, "{0,11:F4}  {1,9:F5}  {2,9:F5}", r.Length.Millimeters, Clean(r.Y.Real), Clean(r.Y.Imaginary)));
            output.WriteLine("warnings:");
            foreach (var x in warnings) output.WriteLine($"  - {x.Message}");
        }
        if (infeasible is null) return ExitCodes.Ok;
        error.WriteLine($"infeasible: {infeasible}");
        return ExitCodes.Infeasible;
    }
}
