using System.Globalization;
using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Slots.Tables;
using SlotArray.Core.Waveguides;
using SlotArray.Reports;
using SlotArray.Spec;

namespace SlotArray.Cli.Commands;

/// <summary>
/// <c>slotarray slot … --table FILE</c>: the built-in model's slot table in the <c>slots.data</c> format (README, "Your own
/// slot table"), so it can be compared, edited or replaced. One frequency (the command's), L/L_r = 0.90 … 1.10 in 0.02
/// steps around each resonance; longitudinal slots at the moment method's 30 tabulated offsets (a/120 … a/4), edge slots at
/// tilts 2° … 30° in 2° steps (cut depth and developed length both given).
/// </summary>
internal static class SlotTableExport
{
    private static readonly CultureInfo Ci = CultureInfo.InvariantCulture;

    /// <summary>The L/L_r of every row, 0.90 … 1.10.</summary>
    internal static readonly double[] Ratios = [.. Enumerable.Range(0, 11).Select(i => 0.90 + 0.02 * i)];

    /// <summary>Writes the longitudinal moment-method table to <paramref name="file"/> (atomically); returns the row count.</summary>
    public static int Longitudinal(MomentMethodSlotModel model, Frequency f, string file)
    {
        var c = model.Characterisation(f);
        var rows = new (double, double, double, double, Complex)[c.Table.OffsetsMeters.Count * Ratios.Length];
        Parallel.For(0, c.Table.OffsetsMeters.Count, i =>
        {
            double x = c.Table.OffsetsMeters[i], lr = c.Table.ResonantLengthsMeters[i];
            for (int j = 0; j < Ratios.Length; j++)
            {
                double len = Ratios[j] * lr;
                rows[i * Ratios.Length + j] = (x, double.NaN, len, f.Hertz, model.Admittance(x, Length.FromMeters(len), f));
            }
        });
        AtomicFile.WriteText(file, SlotTableCsv.Format(SlotTableGeometry.Longitudinal, Provenance(model.Guide, model.Width, model.Name, f), rows));
        return rows.Length;
    }

    /// <summary>Writes the calibrated edge-slot model's table to <paramref name="file"/> (atomically); returns the row count.</summary>
    public static int Edge(CalibratedEdgeSlot model, Frequency f, string file)
    {
        var rows = new List<(double, double, double, double, Complex)>();
        for (int deg = 5; deg <= 25; deg += 2)
        {
            double tilt = Angle.FromDegrees(deg).Radians;
            var design = model.Resonance(tilt, f).ResonantLength;
            foreach (double nu in Ratios)
            {
                var len = nu * design;
                rows.Add((tilt, model.DepthMm(tilt, len) * 1e-3, len.Meters, f.Hertz, model.Admittance(tilt, len, f)));
            }
        }
        AtomicFile.WriteText(file, SlotTableCsv.Format(SlotTableGeometry.Edge, Provenance(model.Guide, model.Width, model.Name, f), rows));
        return rows.Count;
    }

    private static IEnumerable<string> Provenance(RectangularWaveguide g, Length width, string model, Frequency f) =>
    [
        $"produced by: slotarray slot --table (built-in model: {model})",
        string.Format(Ci, "guide: {0}, inside a = {1:0.####} mm, b = {2:0.####} mm, wall {3:0.####} mm, relative permittivity {4:0.####}",
            g.Designation, g.BroadWall.Millimeters, g.NarrowWall.Millimeters, g.WallThickness.Millimeters, g.RelativePermittivity),
        string.Format(Ci, "slot width {0:0.####} mm; lengths are rectangular-equivalent (square ends)", width.Millimeters),
        string.Format(Ci, "frequency {0:0.#########} GHz; y = Y/G0 normalised to the TE10 characteristic admittance; phasors e^(jwt)", f.Gigahertz),
    ];
}
