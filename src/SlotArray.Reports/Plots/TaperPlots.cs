using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Axes;
using OxyPlot.Series;

namespace SlotArray.Reports.Plots;

/// <summary>
/// Plots of an aperture taper: the far-field pattern in dB against angle with the design sidelobe level drawn, and
/// the element amplitudes. Exported through <see cref="PlotExport"/>.
/// </summary>
internal static class TaperPlots
{
    /// <summary>Pattern cut: relative level (dB, floored) against θ (deg from broadside), with the design level as a dashed line.</summary>
    /// <param name="title">Plot title.</param>
    /// <param name="angleDegrees">θ of each sample, deg, increasing.</param>
    /// <param name="levelDb">Relative level of each sample, dB (0 at the peak).</param>
    /// <param name="designLevelDb">Design sidelobe level, dB (negative), or null for none.</param>
    /// <param name="floorDb">Lowest level shown, dB (default −80).</param>
    public static PlotModel Pattern(string title, IReadOnlyList<double> angleDegrees, IReadOnlyList<double> levelDb, double? designLevelDb, double floorDb = -80)
    {
        ArgumentNullException.ThrowIfNull(angleDegrees);
        ArgumentNullException.ThrowIfNull(levelDb);
        var model = PlotExport.NewModel(title);
        model.Axes.Add(new LinearAxis { Position = AxisPosition.Bottom, Title = "θ from broadside (deg)", Minimum = angleDegrees[0], Maximum = angleDegrees[^1], MajorGridlineStyle = LineStyle.Dot });
        model.Axes.Add(new LinearAxis { Position = AxisPosition.Left, Title = "relative level (dB)", Minimum = floorDb, Maximum = 3, MajorGridlineStyle = LineStyle.Dot });
        var line = new LineSeries { Title = "pattern", Color = OxyColors.SteelBlue, StrokeThickness = 1.2 };
        for (int i = 0; i < angleDegrees.Count; i++) line.Points.Add(new DataPoint(angleDegrees[i], Math.Max(floorDb, levelDb[i])));
        model.Series.Add(line);
        if (designLevelDb is double sll)
            model.Annotations.Add(new LineAnnotation
            {
                Type = LineAnnotationType.Horizontal, Y = sll, Color = OxyColors.Firebrick, LineStyle = LineStyle.Dash,
                Text = FormattableString.Invariant($"design {sll:0.#} dB"),
            });
        return model;
    }

    /// <summary>Element amplitudes as stems against element number (1 … N).</summary>
    /// <param name="title">Plot title.</param>
    /// <param name="weights">Normalised amplitudes (max |a| = 1), any signs.</param>
    public static PlotModel Taper(string title, IReadOnlyList<double> weights)
    {
        ArgumentNullException.ThrowIfNull(weights);
        var model = PlotExport.NewModel(title);
        double min = Math.Min(0, weights.Min());
        model.Axes.Add(new LinearAxis { Position = AxisPosition.Bottom, Title = "element", Minimum = 0.5, Maximum = weights.Count + 0.5, MajorGridlineStyle = LineStyle.Dot });
        model.Axes.Add(new LinearAxis { Position = AxisPosition.Left, Title = "amplitude (max 1)", Minimum = min - 0.05, Maximum = 1.05, MajorGridlineStyle = LineStyle.Dot });
        var stems = new StemSeries { Color = OxyColors.SteelBlue, MarkerType = MarkerType.Circle, MarkerSize = weights.Count > 64 ? 1.5 : 3, MarkerFill = OxyColors.SteelBlue };
        for (int i = 0; i < weights.Count; i++) stems.Points.Add(new DataPoint(i + 1, weights[i]));
        model.Series.Add(stems);
        return model;
    }

    /// <summary>
    /// Writes the pattern to <paramref name="path"/> and the taper beside it as <c>&lt;name&gt;-taper.&lt;ext&gt;</c>
    /// (PNG or SVG by the extension, atomically). Returns the two paths written.
    /// </summary>
    /// <param name="path">Pattern file, .png or .svg.</param>
    /// <param name="pattern">The pattern plot.</param>
    /// <param name="taper">The taper plot.</param>
    public static IReadOnlyList<string> Write(string path, PlotModel pattern, PlotModel taper)
    {
        ArgumentNullException.ThrowIfNull(path);
        string ext = Path.GetExtension(path);
        string taperPath = Path.Combine(Path.GetDirectoryName(Path.GetFullPath(path))!, Path.GetFileNameWithoutExtension(path) + "-taper" + ext);
        PlotExport.WriteFile(pattern, path);
        PlotExport.WriteFile(taper, taperPath);
        return [path, taperPath];
    }
}
