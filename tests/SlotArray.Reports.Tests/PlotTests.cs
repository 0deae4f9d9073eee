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

    private static byte[] Png(OxyPlot.PlotModel m)
    {
        using var ms = new MemoryStream();
        PlotExport.Write(m, ms, "png");
        return ms.ToArray();
    }

    [Fact]
    public void Every_png_plot_decodes_at_the_export_size()
    {
        var r = ReportFixture.Eight();
        foreach (var m in new[] { DesignPlots.Pattern(r), DesignPlots.Taper(r), DesignPlots.Slots(r), DesignPlots.Sweep(r) })
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
        Assert.Equal([1.5, 2.0], sweep.Annotations.OfType<OxyPlot.Annotations.LineAnnotation>().Select(a => a.Y));
        var band = sweep.Annotations.OfType<OxyPlot.Annotations.RectangleAnnotation>().Single();
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
}
