using System.Globalization;
using System.Numerics;
using System.Text.Json;
using SlotArray.Core;
using SlotArray.Core.Coupling;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray slot --plane --length L --width W --frequency F [--target 50ohm] [--json]</c>: a single slot in a
/// ground plane — complementary dipole, slot impedance two- and one-sided (Babinet/Booker), feed offset for the
/// target resistance and the VSWR ≤ 2 bandwidth. Takes already-parsed SI values.
/// </summary>
internal static class SlotPlaneReport
{
    /// <summary>Target input resistance when none is given, 50 Ω.</summary>
    public const double DefaultTargetResistance = 50.0;

    /// <summary>
    /// Prints the report (text, or one JSON document: <c>frequency_hz</c>, <c>length_mm</c>, <c>width_mm</c>,
    /// <c>target_ohm</c>, <c>equivalent_radius_mm</c>, <c>resonant_length_mm</c>, <c>dipole_impedance_ohm</c> {re, im},
    /// and for <c>two_sided</c> and <c>one_sided</c>: <c>slot_impedance_ohm</c>, <c>feed_offset_mm</c>,
    /// <c>feed_impedance_ohm</c>, <c>band_low_hz</c>, <c>band_high_hz</c>, <c>bandwidth_percent</c>, <c>infeasible</c>;
    /// then <c>warnings</c>). Returns 0, or 1 when neither case can reach the target (reasons on <paramref name="error"/>).
    /// </summary>
    /// <param name="length">Slot length.</param>
    /// <param name="width">Slot width.</param>
    /// <param name="f">Frequency.</param>
    /// <param name="targetResistance">Target input resistance, Ω; &gt; 0.</param>
    /// <param name="json">One JSON document instead of text.</param>
    /// <param name="output">Where the report goes.</param>
    /// <param name="error">Where infeasibility reasons go.</param>
    public static int Run(Length length, Length width, Frequency f, double targetResistance, bool json, TextWriter output, TextWriter error)
    {
        if (!(targetResistance > 0)) throw new UserInputException($"--target must be a positive resistance, got {targetResistance} ohm");
        if (!(length.Meters > 0) || !(length < f.FreeSpaceWavelength))
            throw new UserInputException($"--length must lie between 0 and one wavelength ({f.FreeSpaceWavelength}), got {length}");
        if (!(width.Meters > 0) || !(width.Meters < length.Meters / 2))
            throw new UserInputException($"--width must be positive and below half the slot length, got {width}");

        var zd = GroundPlaneSlot.DipoleImpedance(length, StripEquivalentRadius.Of(width), f);
        var resonant = GroundPlaneSlot.ResonantLength(width, f);
        var cases = new[] { false, true }.Select(oneSided =>
        {
            try { return (OneSided: oneSided, Analysis: (GroundPlaneSlotAnalysis?)GroundPlaneSlot.Analyze(length, width, f, targetResistance, oneSided), Reason: (string?)null); }
            catch (InfeasibleDesignException e) { return (OneSided: oneSided, Analysis: null, Reason: e.Message); }
        }).ToList();
        var warnings = cases.Where(c => c.Analysis is not null).SelectMany(c => c.Analysis!.Warnings)
            .GroupBy(w => w.Code).Select(g => g.First()).OrderBy(w => w.Code, StringComparer.Ordinal).ToList();

        if (json)
        {
            static Dictionary<string, double> Z(Complex z) => new() { ["re"] = Math.Round(z.Real, 6), ["im"] = Math.Round(z.Imaginary, 6) };
            Dictionary<string, object?> Case(bool oneSided, GroundPlaneSlotAnalysis? a, string? reason) => new()
            {
                ["slot_impedance_ohm"] = Z(Babinet.SlotImpedance(zd, oneSided)),
                ["feed_offset_mm"] = a is null ? null : Math.Round(a.FeedOffset.Millimeters, 6),
                ["feed_impedance_ohm"] = a is null ? null : Z(a.FeedImpedance),
                ["band_low_hz"] = a?.BandLow is { } lo ? Math.Round(lo.Hertz, 0) : null,
                ["band_high_hz"] = a?.BandHigh is { } hi ? Math.Round(hi.Hertz, 0) : null,
                ["bandwidth_percent"] = a is null ? null : Math.Round(100 * a.FractionalBandwidth, 4),
                ["infeasible"] = reason,
            };
            var doc = new Dictionary<string, object?>
            {
                ["frequency_hz"] = f.Hertz,
                ["length_mm"] = Math.Round(length.Millimeters, 6),
                ["width_mm"] = Math.Round(width.Millimeters, 6),
                ["target_ohm"] = targetResistance,
                ["equivalent_radius_mm"] = Math.Round(StripEquivalentRadius.Of(width).Millimeters, 6),
                ["resonant_length_mm"] = Math.Round(resonant.Millimeters, 6),
                ["dipole_impedance_ohm"] = Z(zd),
                ["two_sided"] = Case(false, cases[0].Analysis, cases[0].Reason),
                ["one_sided"] = Case(true, cases[1].Analysis, cases[1].Reason),
                ["warnings"] = warnings.Select(x => new Dictionary<string, string> { ["code"] = x.Code, ["message"] = x.Message }).ToList(),
            };
            output.WriteLine(JsonSerializer.Serialize(doc, new JsonSerializerOptions { WriteIndented = true }));
        }
        else
        {
            var ci = CultureInfo.InvariantCulture;
            output.WriteLine(string.Format(ci, "slot in a ground plane: length {0:F4} mm, width {1:F4} mm, {2:F6} GHz, target {3:G6} ohm",
                length.Millimeters, width.Millimeters, f.Gigahertz, targetResistance));
            output.WriteLine(string.Format(ci, "complementary strip dipole (radius w/4 = {0:F4} mm): Z_d = {1}", StripEquivalentRadius.Of(width).Millimeters, Ohms(zd)));
            output.WriteLine(string.Format(ci, "resonant slot length for this width: {0:F4} mm", resonant.Millimeters));
            foreach (var c in cases)
            {
                string side = c.OneSided ? "one-sided (cavity-backed), eta^2/(2 Z_d)" : "two-sided, eta^2/(4 Z_d)";
                output.WriteLine($"{side}: Z_slot = {Ohms(Babinet.SlotImpedance(zd, c.OneSided))}");
                if (c.Analysis is { } a)
                {
                    output.WriteLine(string.Format(ci, "  feed offset from the slot end: {0:F4} mm (Z = {1})", a.FeedOffset.Millimeters, Ohms(a.FeedImpedance)));
                    output.WriteLine(a.BandLow is { } lo && a.BandHigh is { } hi
                        ? string.Format(ci, "  VSWR <= 2 band: {0:F4} to {1:F4} GHz ({2:F2} %)", lo.Gigahertz, hi.Gigahertz, 100 * a.FractionalBandwidth)
                        : "  VSWR <= 2 band: none at this frequency");
                }
                else output.WriteLine($"  no feed offset: {c.Reason}");
            }
            output.WriteLine("warnings:");
            foreach (var x in warnings) output.WriteLine($"  - {x.Message}");
        }
        if (cases.Any(c => c.Analysis is not null)) return ExitCodes.Ok;
        foreach (var c in cases) error.WriteLine($"infeasible: {c.Reason}");
        return ExitCodes.Infeasible;
    }

    private static string Ohms(Complex z) => string.Format(CultureInfo.InvariantCulture, "{0:F2} {1} j{2:F2} ohm",
        z.Real, z.Imaginary < 0 ? "-" : "+", Math.Abs(z.Imaginary));
}
