using System.Globalization;
using System.Text.Json;
using SlotArray.Core;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray slot --guide G --frequency F --tilt A [--surround tube|ground-plane|flare] [--wall t] [--width w] [--json]</c>:
/// one edge slot from the full-wave calibration (<see cref="CalibratedEdgeSlot"/>): the resonant cut depth and
/// conductance, or where no depth is purely conductive the conductance peak; the design cut the designers use; y
/// against depth and against frequency. Takes already-parsed SI values; the command wiring lives with <c>slot</c>.
/// </summary>
internal static class SlotEdgeReport
{
    /// <summary>Slot width used when none is given: 1.5875 mm (1/16 in, the classic X-band slot width; common practice).</summary>
    public static Length DefaultWidth => Length.FromInches(1.0 / 16);

    /// <summary>Depth offsets from the design cut of the admittance table, mm.</summary>
    private static readonly double[] DepthSteps = [-0.3, -0.2, -0.1, -0.05, 0, 0.05, 0.1, 0.2, 0.3];

    /// <summary>
    /// Prints the report (text, or one JSON document: <c>frequency_hz</c>, <c>tilt_deg</c>, <c>surround</c>, <c>resonant</c>,
    /// <c>resonant_depth_mm</c> and <c>resonant_conductance</c> (null when no depth is purely conductive),
    /// <c>peak_conductance_depth_mm</c>, <c>peak_conductance</c>, <c>cut_depth_mm</c> and <c>design_admittance</c> (the
    /// design cut), <c>admittance</c> [{depth_mm, length_mm, g, b}], <c>frequency_response</c> [{frequency_hz, g, b}] of
    /// the design cut, <c>warnings</c>, <c>cross_polar_direction_deg</c>, <c>cross_polar_level_db</c>). Returns 0.
    /// </summary>
    /// <param name="guide">The guide (catalogue or custom a, b), with its wall thickness.</param>
    /// <param name="f">Frequency.</param>
    /// <param name="tilt">Signed slot tilt; |θ| ≤ 25°.</param>
    /// <param name="surround">What the slot radiates into.</param>
    /// <param name="width">Slot width; null gives <see cref="DefaultWidth"/>.</param>
    /// <param name="json">One JSON document on <paramref name="output"/> instead of text.</param>
    /// <param name="output">Where the report goes.</param>
    /// <param name="error">Unused (kept for the command wiring's symmetry).</param>
    public static int Run(RectangularWaveguide guide, Frequency f, Angle tilt, EdgeSlotSurround surround, Length? width, bool json, TextWriter output, TextWriter error)
    {
        ArgumentNullException.ThrowIfNull(guide);
        if (Math.Abs(tilt.Radians) > CalibratedEdgeSlot.MaximumTilt.Radians + 1e-12)
            throw new UserInputException(FormattableString.Invariant($"--tilt must lie within ±{CalibratedEdgeSlot.MaximumTilt.Degrees:0} deg for an edge slot (the full-wave calibration's range), got {tilt.Degrees:0.###} deg"));
        if (!(guide.WallThickness.Meters > 0)) throw new UserInputException("an edge slot is cut through a real wall: give --wall (e.g. 1.27mm)");
        var w = width ?? DefaultWidth;
        if (!(w.Meters > 0) || !(w < guide.NarrowWall)) throw new UserInputException($"--width must be positive and below the narrow wall b = {guide.NarrowWall}, got {w}");
        var model = CalibratedEdgeSlot.Create(guide, w, surround);
        double th = tilt.Radians;
        var cut = model.DesignCut(th, f);
        var warnings = model.Warnings(th, f);
        var rows = DepthSteps.Select(s => cut.DepthMm + s).Select(d => (Depth: d, Length: model.DevelopedLength(th, d), Y: model.Admittance(th, model.DevelopedLength(th, d), f))).ToList();
        var (lo, hi) = model.Surface.Family.Band;
        var response = Enumerable.Range(0, 13).Select(i => Frequency.FromHertz((lo + (hi - lo) * i / 12) / model.Surface.Scale))
            .Select(fr => (F: fr, Y: model.Admittance(th, model.DevelopedLength(th, cut.DepthMm), fr))).ToList();
        var psi = EdgeSlotCrossPolarization.LobeDirection(0.5 * guide.GuideWavelength(f), f);
        double? level = th == 0 ? null : EdgeSlotCrossPolarization.LobeLevelDecibels(tilt);
        if (json)
            output.WriteLine(JsonSerializer.Serialize(Document(guide, f, tilt, w, model, cut, rows, response, warnings, psi, level), new JsonSerializerOptions { WriteIndented = true }));
        else
            PrintText(output, guide, f, tilt, w, model, cut, rows, warnings, psi, level);
        return ExitCodes.Ok;
    }

    private static Dictionary<string, object?> Document(RectangularWaveguide guide, Frequency f, Angle tilt, Length w, CalibratedEdgeSlot model, EdgeSlotCut cut,
        List<(double Depth, Length Length, System.Numerics.Complex Y)> rows, List<(Frequency F, System.Numerics.Complex Y)> response, IReadOnlyList<DesignWarning> warnings,
        Angle? psi, double? level) => new()
    {
        ["guide"] = guide.Designation,
        ["frequency_hz"] = f.Hertz,
        ["tilt_deg"] = Math.Round(tilt.Degrees, 9),
        ["wall_mm"] = Math.Round(guide.WallThickness.Millimeters, 6),
        ["width_mm"] = Math.Round(w.Millimeters, 6),
        ["surround"] = CalibratedEdgeSlot.Word(model.Surround),
        ["model"] = model.Name,
        ["normalisation"] = "g and b are normalised to the TE10 characteristic admittance G0; depths from the outer narrow-wall face into each broad wall",
        ["resonant"] = cut.Resonant,
        ["resonant_depth_mm"] = cut.Resonant ? Math.Round(cut.DepthMm, 6) : null,
        ["resonant_conductance"] = cut.Resonant ? Math.Round(cut.Admittance.Real, 8) : null,
        ["peak_conductance_depth_mm"] = Math.Round(cut.PeakDepthMm, 6),
        ["peak_conductance"] = Math.Round(cut.PeakConductance, 8),
        ["cut_depth_mm"] = Math.Round(cut.DepthMm, 6),
        ["resonant_length_mm"] = Math.Round(model.DevelopedLength(cut.Tilt, cut.DepthMm).Millimeters, 6),
        ["design_admittance"] = new Dictionary<string, double> { ["g"] = Math.Round(cut.Admittance.Real, 8), ["b"] = Math.Round(cut.Admittance.Imaginary, 8) },
        ["cross_polar_direction_deg"] = psi is { } p ? Math.Round(p.Degrees, 4) : null,
        ["cross_polar_level_db"] = level is { } l ? Math.Round(l, 4) : null,
        ["admittance"] = rows.Select(r => new Dictionary<string, double>
        {
            ["depth_mm"] = Math.Round(r.Depth, 6),
            ["length_mm"] = Math.Round(r.Length.Millimeters, 6),
            ["g"] = Math.Round(r.Y.Real, 8),
            ["b"] = Math.Round(r.Y.Imaginary, 8),
        }).ToList(),
        ["frequency_response"] = response.Select(r => new Dictionary<string, double>
        {
            ["frequency_hz"] = Math.Round(r.F.Hertz),
            ["g"] = Math.Round(r.Y.Real, 8),
            ["b"] = Math.Round(r.Y.Imaginary, 8),
        }).ToList(),
        ["warnings"] = warnings.Select(x => new Dictionary<string, string> { ["code"] = x.Code, ["message"] = x.Message }).ToList(),
    };

    private static void PrintText(TextWriter output, RectangularWaveguide guide, Frequency f, Angle tilt, Length w, CalibratedEdgeSlot model, EdgeSlotCut cut,
        List<(double Depth, Length Length, System.Numerics.Complex Y)> rows, IReadOnlyList<DesignWarning> warnings, Angle? psi, double? level)
    {
        var ci = CultureInfo.InvariantCulture;
        output.WriteLine(string.Format(ci, "edge slot in {0} (a = {1:F3} mm, b = {2:F3} mm, wall {3:F3} mm), width {4:F4} mm, {5:F6} GHz, tilt {6:F3} deg, surroundings: {7}",
            guide.Designation, guide.BroadWall.Millimeters, guide.NarrowWall.Millimeters, guide.WallThickness.Millimeters, w.Millimeters, f.Gigahertz, tilt.Degrees, CalibratedEdgeSlot.Word(model.Surround)));
        output.WriteLine($"model: {model.Name}");
        output.WriteLine(cut.Resonant
            ? string.Format(ci, "resonant at cut depth {0:F4} mm (from the outer narrow-wall face into each broad wall): g_r = {1:F5}", cut.DepthMm, cut.Admittance.Real)
            : string.Format(ci, "no depth is purely conductive: design cut (least b/g) {0:F4} mm, y = {1:F5} {2:+0.00000;-0.00000}j", cut.DepthMm, cut.Admittance.Real, cut.Admittance.Imaginary));
        output.WriteLine(string.Format(ci, "conductance peak {0:F5} at cut depth {1:F4} mm", cut.PeakConductance, cut.PeakDepthMm));
        if (psi is { } p && level is { } lv)
            output.WriteLine(string.Format(ci, "cross-polar lobes (alternating tilts, lambda_g/2 spacing): +-{0:F1} deg, {1:F1} dB before element weighting", p.Degrees, lv));
        output.WriteLine("depth (mm)  length (mm)         g          b");
        foreach (var r in rows)
            output.WriteLine(string.Format(ci, "{0,10:F4}  {1,11:F4}  {2,9:F5}  {3,9:F5}", r.Depth, r.Length.Millimeters, r.Y.Real, r.Y.Imaginary));
        output.WriteLine("warnings:");
        foreach (var x in warnings) output.WriteLine($"  - {x.Message}");
    }
}
