using System.Numerics;
using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Legends;
using OxyPlot.Series;
using SlotArray.Reports.Plots;

namespace SlotArray.Reports.Compare;

/// <summary>The overlays of <c>compare</c>: return loss, VSWR, and each pattern cut, measured against predicted.</summary>
internal static class ComparePlots
{
    private static readonly OxyColor[] Colors = [OxyColors.Black, OxyColors.Navy, OxyColors.DarkOrange, OxyColors.ForestGreen, OxyColors.Firebrick];

    /// <summary>Return loss (dB) against frequency, every curve.</summary>
    public static PlotModel ReturnLoss(ComparisonReport r) => Match(r, "return loss", "Return loss (dB)", m => -20 * Math.Log10(Math.Max(m, 1e-6)), 0, null);

    /// <summary>VSWR against frequency, every curve (clipped at 10).</summary>
    public static PlotModel Vswr(ComparisonReport r) => Match(r, "VSWR", "VSWR", m => Math.Min((1 + m) / (1 - Math.Min(m, 1 - 1e-12)), 10), 1, null);

    private static PlotModel Match(ComparisonReport r, string what, string axis, Func<double, double> map, double min, double? max)
    {
        var m = PlotExport.NewModel($"{r.Name}: {what}, measured and predicted");
        m.Legends.Add(new Legend { LegendPosition = LegendPosition.BottomCenter, LegendPlacement = LegendPlacement.Outside, LegendOrientation = LegendOrientation.Horizontal });
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Bottom, Title = "Frequency (GHz)", MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = OxyColor.FromRgb(225, 225, 225) });
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Left, Title = axis, Minimum = min, Maximum = max ?? double.NaN, MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = OxyColor.FromRgb(225, 225, 225) });
        for (int c = 0; c < r.MatchCurves.Count; c++)
        {
            var curve = r.MatchCurves[c];
            var s = new LineSeries { Title = curve.Label, Color = Colors[c % Colors.Length], StrokeThickness = c == 0 ? 2 : 1.3, LineStyle = c == 0 ? LineStyle.Solid : c == 1 ? LineStyle.Dash : LineStyle.Solid };
            for (int i = 0; i < curve.Frequencies.Count; i++) s.Points.Add(new DataPoint(curve.Frequencies[i] * 1e-9, map(Complex.Abs(curve.S11[i]))));
            m.Series.Add(s);
        }
        return m;
    }

    /// <summary>One cut: every curve in dB relative to its own peak, −50…0 dB.</summary>
    public static PlotModel Cut(CutOverlay cut)
    {
        ArgumentNullException.ThrowIfNull(cut);
        var m = PlotExport.NewModel(cut.Title);
        m.Legends.Add(new Legend { LegendPosition = LegendPosition.BottomCenter, LegendPlacement = LegendPlacement.Outside, LegendOrientation = LegendOrientation.Horizontal });
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Bottom, Title = "Angle from broadside (deg, + toward the datum end)", MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = OxyColor.FromRgb(225, 225, 225) });
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Left, Title = "Relative level (dB)", Minimum = -50, Maximum = 0, MajorStep = 10, MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = OxyColor.FromRgb(225, 225, 225) });
        for (int c = 0; c < cut.Curves.Count; c++)
        {
            var (label, levels) = cut.Curves[c];
            var s = new LineSeries { Title = label, Color = Colors[c % Colors.Length], StrokeThickness = c == 0 ? 2 : 1.2, LineStyle = c == 1 ? LineStyle.Dash : LineStyle.Solid };
            for (int i = 0; i < levels.Length; i++) s.Points.Add(new DataPoint(cut.AnglesDeg[i], Math.Max(levels[i], -200)));
            m.Series.Add(s);
        }
        return m;
    }
}
