using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Axes;
using OxyPlot.Legends;
using OxyPlot.Series;
using SlotArray.Core.Tolerance;

namespace SlotArray.Reports.Plots;

/// <summary>
/// <c>tolerance.png</c>: on the left the histogram of the trials' peak sidelobe with the target marked, on the right the
/// envelope of the perturbed patterns (5–95 % band, median, highest level reached) over the nominal pattern.
/// </summary>
internal static class TolerancePlot
{
    private static readonly OxyColor Grid = OxyColor.FromRgb(225, 225, 225);

    /// <summary>The plot model (two panels side by side on one canvas).</summary>
    /// <param name="name">Array name, for the title.</param>
    /// <param name="result">The Monte Carlo result.</param>
    /// <param name="bins">Histogram bins; default 40.</param>
    public static PlotModel Build(string name, MonteCarloResult result, int bins = 40)
    {
        ArgumentNullException.ThrowIfNull(result);
        var m = PlotExport.NewModel($"{name}: machining tolerances, {Invariant.Int(result.Trials)} builds, {Invariant.Fixed(100 * result.ProbabilityMeetsTarget, 1)} % meet {Invariant.Fixed(result.TargetDb, 1)} dB");
        m.Legends.Add(new Legend { LegendPosition = LegendPosition.TopRight, LegendPlacement = LegendPlacement.Inside, LegendBackground = OxyColor.FromAColor(220, OxyColors.White) });

        var samples = result.PeakSidelobeSamples;
        double lo = Math.Min(samples.Min(), result.TargetDb), hi = Math.Max(samples.Max(), result.TargetDb);
        if (hi - lo < 0.1) { lo -= 0.05; hi += 0.05; }
        double pad = 0.02 * (hi - lo);
        lo -= pad; hi += pad;
        m.Axes.Add(new LinearAxis { Key = "hx", Position = AxisPosition.Bottom, EndPosition = 0.46, Title = "Peak sidelobe (dB)", Minimum = lo, Maximum = hi, MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = Grid });
        m.Axes.Add(new LinearAxis { Key = "hy", Position = AxisPosition.Left, Title = "Builds", Minimum = 0, MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = Grid });
        var counts = new int[bins];
        double width = (hi - lo) / bins;
        foreach (var v in samples) counts[Math.Clamp((int)((v - lo) / width), 0, bins - 1)]++;
        var bars = new RectangleBarSeries { XAxisKey = "hx", YAxisKey = "hy", FillColor = OxyColors.SteelBlue, StrokeColor = OxyColors.White, Title = "builds" };
        for (int i = 0; i < bins; i++)
            if (counts[i] > 0) bars.Items.Add(new RectangleBarItem(lo + i * width, 0, lo + (i + 1) * width, counts[i]));
        m.Series.Add(bars);
        m.Annotations.Add(new LineAnnotation
        {
            Type = LineAnnotationType.Vertical, X = result.TargetDb, XAxisKey = "hx", YAxisKey = "hy", Color = OxyColors.Firebrick, LineStyle = LineStyle.Dash,
            StrokeThickness = 1.5, Text = $"target {Invariant.Fixed(result.TargetDb, 1)} dB", TextColor = OxyColors.Firebrick,
        });
        m.Annotations.Add(new LineAnnotation
        {
            Type = LineAnnotationType.Vertical, X = result.Nominal.PeakSidelobeDb, XAxisKey = "hx", YAxisKey = "hy", Color = OxyColors.Black, LineStyle = LineStyle.Dot,
            StrokeThickness = 1.2, Text = "nominal", TextColor = OxyColors.Black, TextVerticalAlignment = VerticalAlignment.Bottom,
        });

        m.Axes.Add(new LinearAxis { Key = "px", Position = AxisPosition.Bottom, StartPosition = 0.54, Title = "Angle from broadside (deg)", Minimum = -90, Maximum = 90, MajorStep = 30, MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = Grid });
        m.Axes.Add(new LinearAxis { Key = "py", Position = AxisPosition.Right, Title = "Relative level (dB)", Minimum = -60, Maximum = 0, MajorStep = 10, MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = Grid });
        if (result.Envelope is { } e)
        {
            static double Clip(double v) => Math.Max(v, -200);
            var band = new AreaSeries { XAxisKey = "px", YAxisKey = "py", Title = "5–95 % of builds", Color = OxyColors.Transparent, Fill = OxyColor.FromAColor(90, OxyColors.DarkOrange), Color2 = OxyColors.Transparent };
            var median = new LineSeries { XAxisKey = "px", YAxisKey = "py", Title = "median build", Color = OxyColors.DarkOrange, StrokeThickness = 1.2 };
            var worst = new LineSeries { XAxisKey = "px", YAxisKey = "py", Title = "highest level reached", Color = OxyColors.Firebrick, StrokeThickness = 0.8, LineStyle = LineStyle.Dot };
            var nominal = new LineSeries { XAxisKey = "px", YAxisKey = "py", Title = "nominal", Color = OxyColors.Navy, StrokeThickness = 1.2 };
            for (int i = 0; i < e.AnglesDeg.Count; i++)
            {
                double t = e.AnglesDeg[i];
                band.Points.Add(new DataPoint(t, Clip(e.P95Db[i])));
                band.Points2.Add(new DataPoint(t, Clip(e.P5Db[i])));
                median.Points.Add(new DataPoint(t, Clip(e.P50Db[i])));
                worst.Points.Add(new DataPoint(t, Clip(e.MaximumDb[i])));
                nominal.Points.Add(new DataPoint(t, Clip(e.NominalDb[i])));
            }
            m.Series.Add(band);
            m.Series.Add(median);
            m.Series.Add(worst);
            m.Series.Add(nominal);
            m.Annotations.Add(new LineAnnotation { Type = LineAnnotationType.Horizontal, Y = result.TargetDb, XAxisKey = "px", YAxisKey = "py", Color = OxyColors.Firebrick, LineStyle = LineStyle.Dash, StrokeThickness = 1.2 });
        }
        return m;
    }
}
