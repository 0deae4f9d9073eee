using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Legends;
using OxyPlot.Series;
using SlotArray.Reports.Model;

namespace SlotArray.Reports.Plots;

/// <summary>
/// <c>scan.png</c>: the frequency scan of the array over the analysis sweep, in two stacked panels sharing the
/// frequency axis: beam direction and half-power beamwidth (deg, upper panel); peak sidelobe (dB), gain (dBi) and,
/// for edge slots, the peak cross-polar level (dB) in the lower panel.
/// </summary>
public static class ScanPlot
{
    /// <summary>The scan plot of <paramref name="report"/> (an empty sweep gives empty panels).</summary>
    public static PlotModel Build(DesignReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        string rate = report.TravellingWave is { } tw ? $", {Invariant.Fixed(tw.ScanFromSweepDegPer100MHz, 3)} deg per 100 MHz" : "";
        var m = PlotExport.NewModel($"{report.Name}: frequency scan{rate}");
        m.Legends.Add(new Legend { LegendPosition = LegendPosition.BottomCenter, LegendPlacement = LegendPlacement.Outside, LegendOrientation = LegendOrientation.Horizontal });
        var grid = OxyColor.FromRgb(225, 225, 225);
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Bottom, Title = "Frequency (GHz)", MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = grid });
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Left, Key = "deg", Title = "Beam, HPBW (deg)", StartPosition = 0.53, EndPosition = 1, MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = grid });
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Left, Key = "db", Title = "Level (dB), gain (dBi)", StartPosition = 0, EndPosition = 0.47, MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = grid });
        var beam = new LineSeries { Title = "beam direction (deg)", YAxisKey = "deg", Color = OxyColors.Navy, StrokeThickness = 1.5 };
        var hpbw = new LineSeries { Title = "HPBW (deg)", YAxisKey = "deg", Color = OxyColors.SteelBlue, LineStyle = LineStyle.Dash, StrokeThickness = 1.2 };
        var psl = new LineSeries { Title = "peak sidelobe (dB)", YAxisKey = "db", Color = OxyColors.Firebrick, StrokeThickness = 1.5 };
        var gain = new LineSeries { Title = "gain (dBi)", YAxisKey = "db", Color = OxyColors.DarkGreen, StrokeThickness = 1.5 };
        var xpol = new LineSeries { Title = "cross-polar peak (dB)", YAxisKey = "db", Color = OxyColors.DarkOrange, LineStyle = LineStyle.Dash, StrokeThickness = 1.2 };
        foreach (var p in report.Sweep)
        {
            double f = p.FrequencyHz * 1e-9;
            Add(beam, f, p.BeamDeg);
            Add(hpbw, f, p.HpbwDeg);
            Add(psl, f, p.PeakSidelobeDb);
            Add(gain, f, p.GainDbi);
            if (p.CrossPolarDb is { } x) Add(xpol, f, x);
        }
        m.Series.Add(beam);
        m.Series.Add(hpbw);
        m.Series.Add(psl);
        m.Series.Add(gain);
        if (xpol.Points.Count > 0) m.Series.Add(xpol);
        return m;
    }

    private static void Add(LineSeries s, double x, double y)
    {
        if (double.IsFinite(y)) s.Points.Add(new DataPoint(x, y));
    }
}
