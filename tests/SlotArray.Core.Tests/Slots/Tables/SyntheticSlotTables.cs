using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Slots.Tables;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Tests.Slots.Tables;

/// <summary>
/// Slot tables made from closed forms, so a fit can be checked against the formula between the tabulated points:
/// g_r(x, f) = Stevenson's longitudinal-slot conductance (A. F. Stevenson, "Theory of slots in rectangular wave-guides",
/// J. Appl. Phys. 19, 24–38, 1948); y = g_r / (1 + jQ(ν − 1/ν)), ν = L/L_r, the single-pole response of a
/// series-resonant branch (Im y = 0 exactly at ν = 1; Q = 6.109 as <see cref="EdgeSlot.SeriesResonanceQ"/>); and an
/// invented smooth resonant length L_r(x, f) = (0.46 + 0.02 (4x/a)²) c/f.
/// </summary>
internal static class SyntheticSlotTables
{
    public const double Q = EdgeSlot.SeriesResonanceQ;

    public static double ResonantLength(RectangularWaveguide g, double x, double f)
        => (0.46 + 0.02 * Math.Pow(4 * x / g.BroadWall.Meters, 2)) * PhysicalConstants.SpeedOfLight / f;

    public static Complex Y(RectangularWaveguide g, double x, double length, double f)
    {
        double nu = length / ResonantLength(g, x, f);
        return StevensonLongitudinalSlot.Conductance(g, x, Frequency.FromHertz(f)) / new Complex(1, Q * (nu - 1 / nu));
    }

    public static readonly double[] Ratios = [0.90, 0.93, 0.96, 0.98, 1.0, 1.02, 1.04, 1.07, 1.10];

    /// <summary>A longitudinal table: every offset (m) × frequency (Hz) × ratio L/L_r, response g, b.</summary>
    public static SlotTable Longitudinal(RectangularWaveguide g, double[] offsets, double[] frequencies, double[]? ratios = null,
        string source = "synthetic.csv")
    {
        var rows = new List<SlotTableRow>();
        int line = 2;
        foreach (double x in offsets)
            foreach (double f in frequencies)
                foreach (double r in ratios ?? Ratios)
                {
                    double len = r * ResonantLength(g, x, f);
                    rows.Add(new SlotTableRow(line++, x, len, double.NaN, f, Y(g, x, len, f)));
                }
        return new SlotTable(source, new string('0', 64), ["synthetic: Stevenson conductance, single-pole response"], SlotTableGeometry.Longitudinal,
            SlotTableResponse.Admittance, rows);
    }

    /// <summary>Offsets 0.5 … 5.5 mm in 0.5 mm steps.</summary>
    public static double[] Offsets(double fromMm = 0.5, double toMm = 5.5, double stepMm = 0.5)
        => [.. Enumerable.Range(0, (int)Math.Round((toMm - fromMm) / stepMm) + 1).Select(i => (fromMm + i * stepMm) * 1e-3)];
}
