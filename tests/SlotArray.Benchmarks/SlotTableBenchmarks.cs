using System.Numerics;
using BenchmarkDotNet.Attributes;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Slots.Tables;
using SlotArray.Core.Waveguides;

namespace SlotArray.Benchmarks;

/// <summary>
/// Fitting a user's slot table (<c>slots.data</c>; issue 15). Target: a 200-row table fitted (resonances, monotone curves,
/// leave-one-out residuals) in ≤ 20 ms. The table: WR-90, 1.27 mm wall, 10 offsets (0.5 … 5 mm) × 2 frequencies
/// (9.3, 9.45 GHz) × 10 lengths (L/L_r 0.90 … 1.10), y from Stevenson's conductance and a single-pole length response.
/// </summary>
[MemoryDiagnoser]
public class SlotTableBenchmarks
{
    private static readonly RectangularWaveguide Guide =
        RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Copper);
    private SlotTable _table = null!;
    private SlotTableFit _fit = null!;

    /// <summary>Builds the 200-row table.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var rows = new List<SlotTableRow>();
        int line = 2;
        for (int i = 1; i <= 10; i++)
            foreach (double f in new[] { 9.3e9, 9.45e9 })
                for (int j = 0; j < 10; j++)
                {
                    double x = 0.5e-3 * i, lr = (0.46 + 0.02 * Math.Pow(4 * x / Guide.BroadWall.Meters, 2)) * PhysicalConstants.SpeedOfLight / f;
                    double nu = 0.90 + 0.2 * j / 9, g = StevensonLongitudinalSlot.Conductance(Guide, x, Frequency.FromHertz(f));
                    rows.Add(new SlotTableRow(line++, x, nu * lr, double.NaN, f, g / new Complex(1, EdgeSlot.SeriesResonanceQ * (nu - 1 / nu))));
                }
        _table = new SlotTable("bench.csv", new string('0', 64), [], SlotTableGeometry.Longitudinal, SlotTableResponse.Admittance, rows);
        _fit = SlotTableFit.Fit(_table, Guide);
    }

    /// <summary>Fits the 200-row table (target ≤ 20 ms).</summary>
    [Benchmark]
    public double Fit200Rows() => SlotTableFit.Fit(_table, Guide).Residuals.AdmittanceMax;

    /// <summary>One admittance from the fitted table between tabulated offsets and frequencies.</summary>
    [Benchmark]
    public Complex AdmittanceFromFit() => _fit.Admittance(2.3e-3, 15.1e-3, Frequency.FromGigahertz(9.4));
}
