using System.Numerics;
using System.Text;
using SlotArray.Core.Slots.Tables;
using SlotArray.Spec;

namespace SlotArray.Spec.Tests;

/// <summary>The slot-table CSV reader and writer (README, "Your own slot table").</summary>
public class SlotTableCsvTests
{
    private static SlotTable Parse(string text, SlotTableGeometry g = SlotTableGeometry.Longitudinal)
        => SlotTableCsv.Parse(Encoding.UTF8.GetBytes(text), "my-slots.csv", g);

    [Fact]
    public void Sha256_is_the_published_test_vector()
    {
        // FIPS 180-2 (NIST 2002), Appendix B.1: SHA-256("abc").
        Assert.Equal("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", SlotTableCsv.Sha256(Encoding.ASCII.GetBytes("abc")));
    }

    [Fact]
    public void Units_come_from_the_column_names_and_comment_lines_are_provenance()
    {
        string text = "# made by: bench, slotted-line, 2026-11-30\r\n#   operator: J. Doe\n\noffset_mil,length_in,frequency_MHz,g,b\n40,0.59,9375,0.02,0.008\n";
        var t = Parse(text);
        Assert.Equal(["made by: bench, slotted-line, 2026-11-30", "operator: J. Doe"], t.Provenance);
        Assert.Equal(SlotTableCsv.Sha256(Encoding.UTF8.GetBytes(text)), t.Sha256);
        var r = Assert.Single(t.Rows);
        Assert.Equal(5, r.Line);
        Assert.Equal(40 * 25.4e-6, r.Coupling, 15);    // 1 mil = 25.4 µm (NIST SP 811, 2008, App. B, exact)
        Assert.Equal(0.59 * 0.0254, r.Length, 15);      // 1 in = 25.4 mm exactly
        Assert.Equal(9.375e9, r.Frequency, 3);
        Assert.Equal(new Complex(0.02, 0.008), r.Value);
        Assert.Equal(SlotTableResponse.Admittance, t.Response);
    }

    [Fact]
    public void Scattering_columns_with_reference_planes_and_s21_are_read()
    {
        var t = Parse("offset_mm,length_mm,frequency_ghz,s11_re,s11_im,s21_re,s21_im,ref_plane_mm\n2,15,9.375,-0.03,0.01,0.97,0.01,10\n");
        var r = t.Rows[0];
        Assert.Equal(SlotTableResponse.Scattering, t.Response);
        Assert.Equal(new Complex(-0.03, 0.01), r.Value);
        Assert.Equal(new Complex(0.97, 0.01), r.S21);
        Assert.Equal(0.01, r.ReferencePlane, 15);
    }

    [Theory]
    [InlineData("offset,length_mm,frequency_ghz,g,b\n", 1, 1, "needs its unit")]
    [InlineData("offset_mm,length_mm,frequency_ghz,g,b,q\n", 1, 39, "unknown column 'q'")]
    [InlineData("offset_furlong,length_mm,frequency_ghz,g,b\n", 1, 1, "'furlong' is not a")]
    [InlineData("tilt_deg,length_mm,frequency_ghz,g,b\n", 1, 1, "needs an offset column")]
    [InlineData("offset_mm,length_mm,frequency_ghz,g,b,r,x\n", 1, 1, "one response only")]
    [InlineData("offset_mm,length_mm,frequency_ghz,g\n", 1, 1, "both g and b")]
    [InlineData("# c\noffset_mm,length_mm,frequency_ghz,g,b\n1,15,9.4,0.02\n", 3, 1, "4 cells")]
    [InlineData("offset_mm,length_mm,frequency_ghz,g,b\n1,15,9,4,0.02,0\n", 2, 1, "6 cells")]
    [InlineData("offset_mm,length_mm,frequency_ghz,g,b\n1,1 5,9.4,0.02,0\n", 2, 3, "'1 5' is not a number")]
    [InlineData("# only comments\n", 0, 0, "no header row")]
    public void Bad_tables_are_refused_with_line_column_and_what_to_write(string text, int line, int column, string message)
    {
        var e = Assert.Throws<SlotTableException>(() => Parse(text));
        Assert.Contains(message, e.Message);
        Assert.Equal(line, e.Line);
        Assert.Equal(column, e.Column);
    }

    [Fact]
    public void Edge_tables_take_a_cut_depth_and_inclined_series_tables_a_tilt_and_length()
    {
        var edge = Parse("tilt_deg,cut_depth_mm,frequency_ghz,g,b\n15,7.5,9.375,0.05,0.01\n", SlotTableGeometry.Edge);
        Assert.Equal(15 * Math.PI / 180, edge.Rows[0].Coupling, 15);
        Assert.Equal(7.5e-3, edge.Rows[0].CutDepth, 15);
        Assert.True(double.IsNaN(edge.Rows[0].Length));
        var series = Parse("tilt_deg,length_mm,frequency_ghz,r,x\n20,15.5,9.375,0.1,0.02\n", SlotTableGeometry.InclinedSeries);
        Assert.Equal(SlotTableResponse.Impedance, series.Response);
        Assert.Contains("belongs to edge slots", Assert.Throws<SlotTableException>(() => Parse("tilt_deg,cut_depth_mm,length_mm,frequency_ghz,g,b\n", SlotTableGeometry.InclinedSeries)).Message);
    }

    [Fact]
    public void Format_writes_what_parse_reads_back()
    {
        var y = new Complex(0.0201234567, -0.0080123456);
        string text = SlotTableCsv.Format(SlotTableGeometry.Edge, ["made by: test"], [(12.5 * Math.PI / 180, 7.123456e-3, 16.5e-3, 9.41e9, y)]);
        Assert.StartsWith("# made by: test\ntilt_deg,cut_depth_mm,length_mm,frequency_ghz,g,b\n", text);
        var t = Parse(text, SlotTableGeometry.Edge);
        var r = t.Rows[0];
        Assert.Equal(12.5 * Math.PI / 180, r.Coupling, 12);
        Assert.Equal(7.123456e-3, r.CutDepth, 12);
        Assert.Equal(16.5e-3, r.Length, 12);
        Assert.Equal(9.41e9, r.Frequency, 3);
        Assert.Equal(y.Real, r.Value.Real, 10);
        Assert.Equal(y.Imaginary, r.Value.Imaginary, 10);
        Assert.Equal(["made by: test"], t.Provenance);
    }
}
