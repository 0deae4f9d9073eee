using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Series;
using SlotArray.Core.Patterns;
using SlotArray.Core.Planar;

namespace SlotArray.Reports.Planar;

/// <summary>The planar array's plots: the u-v pattern as a colour map, the principal and diagonal cuts, and S11 across the band.</summary>
internal static class PlanarPlots
{
    /// <summary>Points per axis of the u-v map.</summary>
    public const int UvPoints = 256;

    /// <summary>The u-v pattern (dB, floor −50 dB; outside the visible circle at the floor) as a PNG.</summary>
    public static byte[] UvMap(PlanarResult r)
    {
        var field = new PlanarArrayFactor(r.Positions.Select(p => p.X).ToArray(), r.Positions.Select(p => p.Y).ToArray(),
            r.AtDesign.Excitations, r.Design.DesignFrequency.FreeSpaceWavenumber);
        var g = field.PowerGrid(UvPoints);
        double peak = 0;
        foreach (double v in g) if (!double.IsNaN(v)) peak = Math.Max(peak, v);
        var data = new double[UvPoints, UvPoints];
        for (int i = 0; i < UvPoints; i++)
            for (int j = 0; j < UvPoints; j++)
                data[i, j] = double.IsNaN(g[i, j]) ? -50 : Math.Max(-50, 10 * Math.Log10(Math.Max(g[i, j], 1e-300) / peak));
        var model = Plots.PlotExport.NewModel($"{r.Design.Name}: pattern over u-v (dB)");
        model.Axes.Add(new LinearColorAxis { Position = AxisPosition.Right, Palette = OxyPalettes.Viridis(200), Minimum = -50, Maximum = 0, Title = "dB" });
        model.Axes.Add(new LinearAxis { Position = AxisPosition.Bottom, Title = "u = sin θ cos φ (along the branches)", Minimum = -1, Maximum = 1 });
        model.Axes.Add(new LinearAxis { Position = AxisPosition.Left, Title = "v = sin θ sin φ (across)", Minimum = -1, Maximum = 1 });
        model.Series.Add(new HeatMapSeries { X0 = -1, X1 = 1, Y0 = -1, Y1 = 1, Data = data, Interpolate = false });
        return Render(model, 760, 680);
    }

    /// <summary>The x-z (H-plane), y-z (E-plane) and 45° cuts, dB, with the design sidelobe level.</summary>
    public static byte[] Cuts(PlanarResult r, double? designDb)
    {
        var model = Plots.PlotExport.NewModel($"{r.Design.Name}: principal and diagonal cuts");
        model.Axes.Add(new LinearAxis { Position = AxisPosition.Bottom, Title = "θ (deg)", Minimum = -90, Maximum = 90 });
        model.Axes.Add(new LinearAxis { Position = AxisPosition.Left, Title = "dB", Minimum = -60, Maximum = 0 });
        void Add(Pattern p, string title)
        {
            var s = new LineSeries { Title = title };
            double peak = p.PeakPower;
            for (int i = 0; i < p.Grid.Count; i++)
                s.Points.Add(new DataPoint(p.Grid.Theta[i] * 180 / Math.PI, Math.Max(-60, 10 * Math.Log10(Math.Max(p.Power[i], 1e-300) / peak))));
            model.Series.Add(s);
        }
        Add(r.Figures.HPlaneCut, "x-z (along branches, H-plane)");
        Add(r.Figures.EPlaneCut, "y-z (across, E-plane)");
        Add(r.Figures.DiagonalCut, "diagonal φ = 45°");
        if (designDb is { } d)
            model.Series.Add(new LineSeries { Title = "design sidelobe level", LineStyle = LineStyle.Dash, Points = { new DataPoint(-90, d), new DataPoint(90, d) } });
        model.Legends.Add(new OxyPlot.Legends.Legend { LegendPosition = OxyPlot.Legends.LegendPosition.TopRight });
        return Render(model, 900, 520);
    }

    /// <summary>|S11| in dB across the band.</summary>
    public static byte[] Sweep(PlanarResult r)
    {
        var model = Plots.PlotExport.NewModel($"{r.Design.Name}: input match of the feed guide");
        model.Axes.Add(new LinearAxis { Position = AxisPosition.Bottom, Title = "frequency (GHz)" });
        model.Axes.Add(new LinearAxis { Position = AxisPosition.Left, Title = "|S11| (dB)", Maximum = 0 });
        var s = new LineSeries { Title = "S11" };
        foreach (var p in r.Sweep) s.Points.Add(new DataPoint(p.Frequency.Gigahertz, 20 * Math.Log10(Math.Max(p.S11.Magnitude, 1e-6))));
        model.Series.Add(s);
        return Render(model, 900, 520);
    }

    private static byte[] Render(PlotModel model, int width, int height)
    {
        using var ms = new MemoryStream();
        Plots.PlotExport.Write(model, ms, "png", width, height);
        return ms.ToArray();
    }
}
