using System.Buffers.Binary;
using SlotArray.Reports.Plots;

namespace SlotArray.Reports.Tests;

public class PlotTests
{
    // PNG signature and IHDR layout: W3C/ISO 15948 "Portable Network Graphics (PNG) Specification", §5.2 and §11.2.2.
    private static (int Width, int Height) PngSize(byte[] png)
    {
        Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A }, png[..8]);
        Assert.Equal("IHDR"u8.ToArray(), png[12..16]);
        return (BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(16)), BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(20)));
    }

    private static byte[] Png(OxyPlot.PlotModel m, int height = 520)
    {
        using var ms = new MemoryStream();
        PlotExport.Write(m, ms, "png", 900, height);
        return ms.ToArray();
    }

    [Fact]
    public void Every_png_plot_decodes_at_the_export_size()
    {
        var r = ReportFixture.Eight();
        foreach (var m in new[] { DesignPlots.Pattern(r), DesignPlots.Taper(r), DesignPlots.Slots(r) })
        {
            var png = Png(m);
            Assert.Equal((900, 520), PngSize(png));
            Assert.True(png.Length > 10_000, "a plot with text and lines, not an empty image");
        }
    }

    [Fact]
    public void Pattern_svg_has_the_house_font_and_axis_titles_as_text()
    {
        using var ms = new MemoryStream();
        PlotExport.Write(DesignPlots.Pattern(ReportFixture.Eight()), ms, "svg");
        string svg = System.Text.Encoding.UTF8.GetString(ms.ToArray());
        System.Xml.Linq.XDocument.Parse(svg);
        Assert.Contains("font-family=\"DejaVu Sans\"", svg);
        Assert.Contains("Angle from broadside (deg)", svg);
        Assert.Contains("Relative level (dB)", svg);
        // The bold title and the coloured annotation label come out of the Skia SVG canvas as glyph outlines
        // (<path>), not <text>, so only the axis titles can be checked as text here; Plot_models_carry_titles...
        // checks the title and the label on the model.
    }

    [Fact]
    public void Plot_models_carry_titles_axes_and_series()
    {
        var r = ReportFixture.Eight();
        var pattern = DesignPlots.Pattern(r);
        Assert.StartsWith(r.Name, pattern.Title);
        Assert.Equal(-60, pattern.Axes[1].Minimum);
        Assert.Equal(0, pattern.Axes[1].Maximum);
        var dash = Assert.IsType<OxyPlot.Annotations.LineAnnotation>(pattern.Annotations[0]);
        Assert.Equal(-25, dash.Y);
        Assert.Equal(OxyPlot.LineStyle.Dash, dash.LineStyle);
        Assert.Equal("design sidelobe level -25.0 dB", dash.Text);

        var slots = DesignPlots.Slots(r);
        Assert.Contains(slots.Axes, a => a.Title == "Offset from centreline (mm, signed)");
        Assert.Contains(slots.Axes, a => a.Title == "Overall length (mm)");

        var sweep = DesignPlots.Sweep(r);
        Assert.Contains(sweep.Axes, a => a.Title == "Frequency (GHz)");
        var band = sweep.Annotations.OfType<OxyPlot.Annotations.RectangleAnnotation>().First();
        Assert.Equal(9.3, band.MinimumX, 12);
        Assert.Equal(9.45, band.MaximumX, 12);
        // VSWR = (1 + |Γ|)/(1 − |Γ|) (standard definition, e.g. Pozar, Microwave Engineering, eq. 2.41, from memory)
        var vswr = (OxyPlot.Series.LineSeries)sweep.Series[1];
        double g = System.Numerics.Complex.Abs(r.Sweep[0].S11);
        Check.Relative((1 + g) / (1 - g), vswr.Points[0].Y, 1e-12, "VSWR from |S11|, closed form");

        var taper = DesignPlots.Taper(r);
        var designed = (OxyPlot.Series.LineSeries)taper.Series[0];
        Check.Absolute(20 * Math.Log10(0.55), designed.Points[0].Y, 1e-12, "20·log10(a1/a_max) of the fixture taper");
    }

    // Issue 13: return loss and VSWR in separate panels, each with its own limit lines.
    [Fact]
    public void Sweep_plot_has_a_return_loss_panel_and_a_vswr_panel_each_with_its_own_limit_lines()
    {
        var r = ReportFixture.Eight();
        var sweep = DesignPlots.Sweep(r);
        var rl = sweep.Axes.Single(a => a.Key == "rl");
        var vswr = sweep.Axes.Single(a => a.Key == "vswr");
        Assert.Equal("Return loss (dB)", rl.Title);
        Assert.Equal("VSWR", vswr.Title);
        Assert.True(vswr.EndPosition <= rl.StartPosition, "the panels do not overlap");
        Assert.All(sweep.Axes.Where(a => a.IsVertical()), a => Assert.Equal(OxyPlot.Axes.AxisPosition.Left, a.Position));
        var lines = sweep.Annotations.OfType<OxyPlot.Annotations.LineAnnotation>().ToList();
        Assert.Equal([1.5, 2.0], lines.Where(a => a.YAxisKey == "vswr").Select(a => a.Y));
        // Return loss of a VSWR limit: −20 log10((S − 1)/(S + 1)), closed form (Pozar, Microwave Engineering, eqs. 2.39, 2.41, from memory):
        // VSWR 1.5 → |Γ| = 0.2 → 13.979 dB; VSWR 2 → |Γ| = 1/3 → 9.542 dB.
        var rlLines = lines.Where(a => a.YAxisKey == "rl").Select(a => a.Y).ToList();
        Assert.Equal(2, rlLines.Count);
        Check.Absolute(-20 * Math.Log10(0.2), rlLines[0], 1e-12, "return loss at VSWR 1.5, closed form");
        Check.Absolute(-20 * Math.Log10(1.0 / 3), rlLines[1], 1e-12, "return loss at VSWR 2, closed form");
        var rlSeries = (OxyPlot.Series.LineSeries)sweep.Series.Single(x => ((OxyPlot.Series.LineSeries)x).YAxisKey == "rl");
        double g0 = System.Numerics.Complex.Abs(r.Sweep[0].S11);
        Check.Absolute(-20 * Math.Log10(g0), rlSeries.Points[0].Y, 1e-12, "return loss of the first point, closed form");
        Assert.Equal((900, DesignPlots.SweepHeight), PngSize(Png(sweep, DesignPlots.SweepHeight)));
    }

    [Fact]
    public void Sweep_plot_spans_the_match_sweep_when_the_report_has_one()
    {
        var r = ReportFixture.Eight() with
        {
            MatchSweep = [.. Enumerable.Range(0, 11).Select(k => new SlotArray.Reports.Model.MatchPoint { FrequencyHz = 9.0e9 + k * 0.08e9, S11 = new System.Numerics.Complex(0.1 * (k - 5) / 5.0, 0) + 0.01 })],
        };
        var rlSeries = (OxyPlot.Series.LineSeries)DesignPlots.Sweep(r).Series[0];
        Assert.Equal(11, rlSeries.Points.Count);
        Assert.Equal(9.0, rlSeries.Points[0].X, 12);
        Assert.Equal(9.8, rlSeries.Points[^1].X, 12);
    }

    // Issue 13: one panel per quantity, no shared y-axis.
    [Fact]
    public void Scan_plot_has_one_panel_per_quantity()
    {
        var r = ReportFixture.Eight();
        var scan = ScanPlot.Build(r);
        var vertical = scan.Axes.Where(a => a.IsVertical()).OrderByDescending(a => a.EndPosition).ToList();
        Assert.Equal(["Beam direction (deg)", "HPBW (deg)", "Peak sidelobe (dB)", "Gain (dBi)"], vertical.Select(a => a.Title));
        for (int k = 1; k < vertical.Count; k++) Assert.True(vertical[k].EndPosition < vertical[k - 1].StartPosition, "panels do not overlap");
        Assert.Equal(vertical.Count, scan.Series.Count);
        Assert.Equal(vertical.Select(a => a.Key), scan.Series.Cast<OxyPlot.Series.LineSeries>().Select(s => s.YAxisKey));
        Assert.Equal((900, ScanPlot.Height(r)), PngSize(Png(scan, ScanPlot.Height(r))));
    }
}
