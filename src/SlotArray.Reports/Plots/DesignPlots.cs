using System.Numerics;
using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Axes;
using OxyPlot.Legends;
using OxyPlot.Series;
using SlotArray.Reports.Model;

namespace SlotArray.Reports.Plots;

/// <summary>
/// The plots of the <c>design</c> output folder as OxyPlot models (exported by <see cref="PlotExport"/>):
/// pattern, taper (designed vs achieved), slot dimensions, and the match sweep. Titles carry the array name.
/// </summary>
internal static class DesignPlots
{
    /// <summary>Far-field pattern cut in dB (−60…0 dB) vs angle from broadside, with the design sidelobe level dashed.</summary>
    public static PlotModel Pattern(DesignReport report)
    {
        var m = PlotExport.NewModel($"{report.Name}: far-field pattern at {Invariant.Ghz(report.FrequencyHz)} GHz");
        var angles = report.Pattern.CutAngleDeg;
        double lo = angles.Count > 0 ? angles.Min() : -90, hi = angles.Count > 0 ? angles.Max() : 90;
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Bottom, Title = "Angle from broadside (deg)", Minimum = lo, Maximum = hi, MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = OxyColor.FromRgb(225, 225, 225) });
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Left, Title = "Relative level (dB)", Minimum = -60, Maximum = 0, MajorStep = 10, MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = OxyColor.FromRgb(225, 225, 225) });
        var s = new LineSeries { Title = "pattern", Color = OxyColors.Navy, StrokeThickness = 1.5 };
        for (int i = 0; i < angles.Count; i++)
        {
            double db = report.Pattern.CutLevelDb[i];
            s.Points.Add(new DataPoint(angles[i], double.IsFinite(db) ? Math.Max(db, -200) : -200));
        }
        m.Series.Add(s);
        if (report.Pattern.CrossCutLevelDb.Count == angles.Count && angles.Count > 0)
        {
            // Edge slots: the cross-polarised cut on the same scale (relative to the co-polar peak).
            m.Legends.Add(new Legend { LegendPosition = LegendPosition.TopRight });
            s.Title = "co-polar";
            bool filtered = report.Filter is { } f && f.BareCrossCutLevelDb.Count == angles.Count;
            if (filtered)
            {
                var bare = new LineSeries { Title = "cross-polar, bare slots", Color = OxyColors.DarkOrange, LineStyle = LineStyle.Dot, StrokeThickness = 1.0 };
                for (int i = 0; i < angles.Count; i++) bare.Points.Add(new DataPoint(angles[i], Math.Max(report.Filter!.BareCrossCutLevelDb[i], -200)));
                m.Series.Add(bare);
            }
            var x = new LineSeries { Title = filtered ? "cross-polar, behind the filter" : "cross-polar", Color = OxyColors.DarkOrange, StrokeThickness = 1.2 };
            for (int i = 0; i < angles.Count; i++) x.Points.Add(new DataPoint(angles[i], Math.Max(report.Pattern.CrossCutLevelDb[i], -200)));
            m.Series.Add(x);
            if (report.Filter?.RequirementDb is { } xreq)
                m.Annotations.Add(new LineAnnotation
                {
                    Type = LineAnnotationType.Horizontal, Y = xreq, LineStyle = LineStyle.DashDot, Color = OxyColors.DarkOrange, StrokeThickness = 1.0,
                    Text = $"cross-polar requirement {Invariant.Fixed(xreq, 1)} dB", TextColor = OxyColors.DarkOrange, TextHorizontalAlignment = HorizontalAlignment.Left, TextLinePosition = 0,
                });
        }
        m.Annotations.Add(new LineAnnotation
        {
            Type = LineAnnotationType.Horizontal,
            Y = report.Pattern.DesignSidelobeDb,
            LineStyle = LineStyle.Dash,
            Color = OxyColors.Firebrick,
            StrokeThickness = 1.2,
            Text = $"design sidelobe level {Invariant.Fixed(report.Pattern.DesignSidelobeDb, 1)} dB",
            TextColor = OxyColors.Firebrick,
        });
        return m;
    }

    /// <summary>The flare's vertical pattern cut (dB, −40…0) against elevation, with the required beamwidth's half-power points marked.</summary>
    public static PlotModel Vertical(DesignReport report)
    {
        var m = PlotExport.NewModel($"{report.Name}: vertical pattern of the flare at {Invariant.Ghz(report.FrequencyHz)} GHz");
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Bottom, Title = "Elevation from boresight (deg)", Minimum = -90, Maximum = 90, MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = OxyColor.FromRgb(225, 225, 225) });
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Left, Title = "Relative level (dB)", Minimum = -40, Maximum = 0, MajorStep = 10, MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = OxyColor.FromRgb(225, 225, 225) });
        if (report.Flare is not { } f) return m;
        var s = new LineSeries { Title = "vertical cut (H-plane sectoral horn)", Color = OxyColors.Navy, StrokeThickness = 1.5 };
        for (int i = 0; i < f.CutElevationDeg.Count; i++) s.Points.Add(new DataPoint(f.CutElevationDeg[i], Math.Max(f.CutLevelDb[i], -200)));
        m.Series.Add(s);
        m.Annotations.Add(new LineAnnotation
        {
            Type = LineAnnotationType.Horizontal, Y = -3.0103, LineStyle = LineStyle.Dash, Color = OxyColors.Firebrick, StrokeThickness = 1.0,
            Text = $"HPBW {Invariant.Fixed(f.VerticalHpbwDeg, 2)} deg" + (f.RequiredVerticalHpbwDeg is { } q ? $" (required {Invariant.Fixed(q, 2)} deg)" : ""),
            TextColor = OxyColors.Firebrick,
        });
        return m;
    }

    /// <summary>
    /// Aperture amplitude per slot, designed (taper) and achieved, in dB, each normalised to its own peak so the
    /// shapes compare.
    /// </summary>
    public static PlotModel Taper(DesignReport report)
    {
        var m = PlotExport.NewModel($"{report.Name}: aperture amplitude per slot");
        AddLegend(m);
        m.Axes.Add(SlotAxis(report));
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Left, Title = "Relative amplitude (dB, each curve normalised to its peak)", MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = OxyColor.FromRgb(225, 225, 225) });
        double tMax = report.Slots.Count > 0 ? report.Slots.Max(s => Math.Abs(s.TargetAmplitude)) : 1;
        double aMax = report.Slots.Count > 0 ? report.Slots.Max(s => Math.Abs(s.AchievedAmplitude)) : 1;
        var designed = new LineSeries { Title = "designed (taper)", Color = OxyColors.Navy, MarkerType = MarkerType.Circle, MarkerSize = 4, MarkerFill = OxyColors.Navy };
        var achieved = new LineSeries { Title = "achieved (network analysis)", Color = OxyColors.DarkOrange, LineStyle = LineStyle.Dash, MarkerType = MarkerType.Square, MarkerSize = 3, MarkerFill = OxyColors.DarkOrange };
        foreach (var s in report.Slots)
        {
            designed.Points.Add(new DataPoint(s.Index, Db20(s.TargetAmplitude / tMax)));
            achieved.Points.Add(new DataPoint(s.Index, Db20(s.AchievedAmplitude / aMax)));
        }
        m.Series.Add(designed);
        m.Series.Add(achieved);
        return m;
    }

    /// <summary>Offset (mm, signed) or tilt (deg) on the left axis and overall length (mm) on the right axis, per slot.</summary>
    public static PlotModel Slots(DesignReport report)
    {
        bool tilt = CutListCsv.UsesTilt(report);
        var m = PlotExport.NewModel($"{report.Name}: slot {(tilt ? "tilt" : "offset")} and length");
        AddLegend(m);
        m.Axes.Add(SlotAxis(report));
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Left, Key = "x", Title = tilt ? "Tilt (deg, signed)" : "Offset from centreline (mm, signed)", MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = OxyColor.FromRgb(225, 225, 225) });
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Right, Key = "l", Title = "Overall length (mm)" });
        var first = new LineSeries { Title = tilt ? "tilt" : "offset", YAxisKey = "x", Color = OxyColors.Navy, MarkerType = MarkerType.Circle, MarkerSize = 4, MarkerFill = OxyColors.Navy };
        var length = new LineSeries { Title = "overall length", YAxisKey = "l", Color = OxyColors.DarkGreen, LineStyle = LineStyle.Dash, MarkerType = MarkerType.Diamond, MarkerSize = 4, MarkerFill = OxyColors.DarkGreen };
        foreach (var s in report.Slots)
        {
            first.Points.Add(new DataPoint(s.Index, tilt ? s.TiltDeg!.Value : s.Offset!.Value * 1e3));
            length.Points.Add(new DataPoint(s.Index, s.OverallLength * 1e3));
        }
        m.Series.Add(first);
        m.Series.Add(length);
        return m;
    }

    /// <summary>Pixel height of <c>sweep.png</c> (two panels).</summary>
    public const int SweepHeight = 760;

    /// <summary>The VSWR limits drawn on the sweep plot: 1.5 and 2.</summary>
    public static readonly IReadOnlyList<double> VswrLimits = [1.5, 2.0];

    /// <summary>
    /// The input match in two panels sharing the frequency axis (GHz): return loss (dB, upper panel) with the return
    /// losses of the VSWR limits drawn as its limit lines, and VSWR (lower panel, 1 to 3) with VSWR 1.5 and 2 drawn;
    /// the analysis band shaded in both. Over the report's match sweep (wide enough to show the VSWR band edges), else
    /// its analysis sweep. Return loss = −20 log10 |Γ| and VSWR = (1 + |Γ|)/(1 − |Γ|) (standard definitions, e.g. D. M.
    /// Pozar, <i>Microwave Engineering</i>, 4th ed., 2012, eqs. 2.39 and 2.41, from memory).
    /// </summary>
    public static PlotModel Sweep(DesignReport report)
    {
        var m = PlotExport.NewModel($"{report.Name}: input match (S11 normalised to the TE10 wave impedance)");
        var grid = OxyColor.FromRgb(225, 225, 225);
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Bottom, Title = "Frequency (GHz)", MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = grid });
        var rlAxis = new LinearAxis { Position = AxisPosition.Left, Key = "rl", Title = "Return loss (dB)", Minimum = 0, StartPosition = 0.54, EndPosition = 1, MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = grid };
        m.Axes.Add(rlAxis);
        m.Axes.Add(new LinearAxis { Position = AxisPosition.Left, Key = "vswr", Title = "VSWR", Minimum = 1, Maximum = 3, StartPosition = 0, EndPosition = 0.46, MajorGridlineStyle = LineStyle.Solid, MajorGridlineColor = grid });
        foreach (string key in (string[])["rl", "vswr"])
        {
            m.Annotations.Add(new RectangleAnnotation
            {
                MinimumX = report.BandLowHz * 1e-9,
                MaximumX = report.BandHighHz * 1e-9,
                Fill = OxyColor.FromAColor(40, OxyColors.SteelBlue),
                Text = "analysis band",
                TextVerticalAlignment = VerticalAlignment.Top,
                YAxisKey = key,
            });
        }
        foreach (double v in VswrLimits)
        {
            double rl = -Db20((v - 1) / (v + 1));
            m.Annotations.Add(new LineAnnotation
            {
                Type = LineAnnotationType.Horizontal, Y = rl, YAxisKey = "rl", LineStyle = LineStyle.Dash, Color = OxyColors.Gray,
                Text = $"return loss {Invariant.Fixed(rl, 2)} dB (VSWR {Invariant.Fixed(v, 1)})",
            });
            m.Annotations.Add(new LineAnnotation
            {
                Type = LineAnnotationType.Horizontal, Y = v, YAxisKey = "vswr", LineStyle = LineStyle.Dash, Color = OxyColors.Gray,
                Text = $"VSWR {Invariant.Fixed(v, 1)}",
            });
        }
        var rlSeries = new LineSeries { Title = "return loss (dB)", YAxisKey = "rl", Color = OxyColors.Navy, StrokeThickness = 1.5 };
        var vswr = new LineSeries { Title = "VSWR", YAxisKey = "vswr", Color = OxyColors.Firebrick, StrokeThickness = 1.5 };
        double rlMax = 0;
        foreach (var (fHz, s11) in TouchstoneWriter.Points(report))
        {
            double mag = Math.Min(Complex.Abs(s11), 1 - 1e-12);
            double f = fHz * 1e-9;
            double rl = -Db20(Math.Max(mag, 1e-6));
            rlMax = Math.Max(rlMax, rl);
            rlSeries.Points.Add(new DataPoint(f, rl));
            vswr.Points.Add(new DataPoint(f, Math.Min((1 + mag) / (1 - mag), 100)));
        }
        rlAxis.Maximum = Math.Max(20, Math.Min(60, 5 * Math.Ceiling(rlMax / 5)));
        m.Series.Add(rlSeries);
        m.Series.Add(vswr);
        return m;
    }

    private static double Db20(double ratio) => ratio > 0 ? 20 * Math.Log10(ratio) : -200;

    private static LinearAxis SlotAxis(DesignReport report) => new()
    {
        Position = AxisPosition.Bottom,
        Title = "Slot number",
        Minimum = 0.5,
        Maximum = report.Slots.Count + 0.5,
        MajorStep = Math.Max(1, Math.Ceiling(report.Slots.Count / 16.0)),
        MinorStep = 1,
        MajorGridlineStyle = LineStyle.Solid,
        MajorGridlineColor = OxyColor.FromRgb(225, 225, 225),
    };

    private static void AddLegend(PlotModel m) =>
        m.Legends.Add(new Legend { LegendPosition = LegendPosition.BottomCenter, LegendPlacement = LegendPlacement.Outside, LegendOrientation = LegendOrientation.Horizontal });
}
