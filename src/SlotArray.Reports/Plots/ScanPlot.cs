using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Series;
using SlotArray.Reports.Model;

namespace SlotArray.Reports.Plots;

/// <summary>
/// <c>scan.png</c>: the frequency scan of the array over the analysis sweep, one stacked panel per quantity sharing the
/// frequency axis, each with its own vertical axis and unit: beam direction (deg), half-power beamwidth (deg), peak
/// sidelobe (dB), gain (dBi) and, for edge slots, the peak cross-polar level (dB).
/// </summary>
internal static class ScanPlot
{
    /// <summary>Pixel height of <c>scan.png</c> for <paramref name="report"/>: 200 px per panel plus the title and axis.</summary>
    public static int Height(DesignReport report) => 120 + 200 * Panels(report).Count;

    /// <summary>The panels, top to bottom: vertical-axis key, axis title, series title, colour and the value per sweep point.</summary>
    internal static IReadOnlyList<(string Key, string Axis, OxyColor Colour, Func<SweepPoint, double> Value)> Panels(DesignReport report)
    {
        var list = new List<(string, string, OxyColor, Func<SweepPoint, double>)>
        {
            ("beam", "Beam direction (deg)", OxyColors.Navy, p => p.BeamDeg),
            ("hpbw", "HPBW (deg)", OxyColors.SteelBlue, p => p.HpbwDeg),
            ("psl", "Peak sidelobe (dB)", OxyColors.Firebrick, p => p.PeakSidelobeDb),
            ("gain", "Gain (dBi)", OxyColors.DarkGreen, p => p.GainDbi),
        };
        if (report.Sweep.Any(p => p.CrossPolarDb is not null))
            list.Add(("xpol", "Cross-polar peak (dB)", OxyColors.DarkOrange, p => p.CrossPolarDb ?? double.NaN));
        return list;
    }

    /// <summary>The scan plot of <paramref name="report"/> (an empty sweep gives empty panels).</summary>
    public static PlotModel Build(DesignReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        string rate = report.TravellingWave is { } tw ? $", {Invariant.Fixed(tw.ScanFromSweepDegPer100MHz, 3)} deg per 100 MHz" : "";
        var m = PlotExport.NewModel($"{report.Name}: frequency scan{rate}");
        var grid = OxyColor.FromRgb(225, 225, 225);
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Bottom, Title = "Frequency (GHz)", MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = grid });
        var panels = Panels(report);
        const double gap = 0.04;
        double h = (1 - gap * (panels.Count - 1)) / panels.Count;
        for (int k = 0; k < panels.Count; k++)
        {
            var (key, title, colour, value) = panels[k];
            double top = 1 - k * (h + gap);
            m.Axes.Add(new LinearAxis
            {
                Position = AxisPosition.Left, Key = key, Title = title, StartPosition = top - h, EndPosition = top,
                MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = grid, MinimumRange = 0.1,
            });
            var s = new LineSeries { Title = title, YAxisKey = key, Color = colour, StrokeThickness = 1.5 };
            foreach (var p in report.Sweep)
            {
                double y = value(p);
                if (double.IsFinite(y)) s.Points.Add(new DataPoint(p.FrequencyHz * 1e-9, y));
            }
            m.Series.Add(s);
        }
        return m;
    }
}
