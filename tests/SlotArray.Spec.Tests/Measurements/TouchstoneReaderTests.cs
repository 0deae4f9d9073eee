using System.Numerics;
using SlotArray.Spec.Measurements;
using SlotArray.Tests.Shared;
using Xunit;

namespace SlotArray.Spec.Tests.Measurements;

/// <summary>
/// Touchstone parsing. The files are written after the examples of the Touchstone File Format Specification, Version
/// 2.0 (IBIS Open Forum, 2009), from memory: its one-port S (MA, MHz) and Z examples, its two-port example with noise
/// parameters, and its version 2 keywords. Expected values are the numbers in each file converted by hand: polar to
/// rectangular, dB to magnitude, and S = (z − 1)/(z + 1) for a normalised one-port impedance (D. M. Pozar, Microwave
/// Engineering, 4th ed., 2012, eq. 2.35, from memory).
/// </summary>
public class TouchstoneReaderTests
{
    private static Complex Polar(double mag, double deg) => Complex.FromPolarCoordinates(mag, deg * Math.PI / 180);

    private static void Same(Complex expected, Complex actual, string source)
    {
        Check.Absolute(expected.Real, actual.Real, 1e-12, source);
        Check.Absolute(expected.Imaginary, actual.Imaginary, 1e-12, source);
    }

    [Fact]
    public void Version_1_one_port_S_in_magnitude_angle_and_MHz()
    {
        string[] file = ["!1-port S-parameter file, single frequency point", "# MHz S MA R 50", "!freq magS11 angS11", "2.000 0.894 -12.136"];
        var (n, h) = TouchstoneReader.Read(file, "example1.s1p");
        Check.Absolute(2e6, n.Frequencies[0], 1e-6, "Touchstone 2.0 spec, one-port example (MHz)");
        Same(Polar(0.894, -12.136), n.S11[0], "Touchstone 2.0 spec, one-port example");
        Assert.Equal(1, n.PortCount);
        Assert.Contains("MHz", h.Describe(), StringComparison.Ordinal);
        Assert.Contains("reference resistance 50", h.Describe(), StringComparison.Ordinal);
    }

    [Fact]
    public void Version_1_Z_data_are_normalised_to_R_and_converted_to_S()
    {
        string[] file = ["!1-port Z-parameter file, multiple frequency points", "# MHz Z MA R 75", "!freq magZ11 angZ11", "100 0.99 -4", "200 0.80 -22", "300 0.707 -45"];
        var (n, h) = TouchstoneReader.Read(file, "example2.s1p");
        var z = Polar(0.80, -22);
        Same((z - 1) / (z + 1), n.S11[1], "S = (z − 1)/(z + 1), Pozar eq. 2.35");
        Assert.Equal("75", h.ReferenceResistances[0].ToString(System.Globalization.CultureInfo.InvariantCulture));
    }

    [Fact]
    public void Default_options_are_GHz_S_MA_R_50_and_DB_RI_and_Hz_are_read()
    {
        var (a, ha) = TouchstoneReader.Read(["1.5 0.5 90"], "defaults.s1p");
        Check.Absolute(1.5e9, a.Frequencies[0], 1e-3, "Touchstone 2.0 spec: default unit GHz");
        Same(Polar(0.5, 90), a.S11[0], "default format MA");
        Assert.Equal(50, ha.ReferenceResistances[0]);
        var (b, _) = TouchstoneReader.Read(["# hz s db r 50", "9410000000 -20 45"], "db.s1p");
        Same(Polar(0.1, 45), b.S11[0], "DB: 20 log10 |S| = -20 dB");
        var (c, _) = TouchstoneReader.Read(["# khz S RI", "9410000 0.1 -0.2 ! trailing comment"], "ri.s1p");
        Same(new Complex(0.1, -0.2), c.S11[0], "RI");
        Check.Absolute(9.41e9, c.Frequencies[0], 1e-3, "kHz");
    }

    [Fact]
    public void Version_1_two_port_order_is_11_21_12_22_and_noise_data_are_skipped()
    {
        string[] file =
        [
            "!2-port S-parameter file, three frequency points, with noise parameters",
            "# GHz S MA R 50",
            "1.000 0.3926 -150.0 2.4030 96.4 0.0612 33.3 0.6114 -61.3",
            "2.000 0.3000 -165.4 2.1300 75.1 0.0736 27.8 0.5560 -82.6",
            "10.000 0.3848 -174.3 1.5510 62.4 0.1006 30.6 0.5045 -95.4",
            "!noise parameters",
            "4 .7 .64 69 .38",
            "18 2.7 .46 -33 .40",
        ];
        var (n, _) = TouchstoneReader.Read(file, "amp.s2p");
        Assert.Equal(3, n.Frequencies.Count);
        Same(Polar(2.1300, 75.1), n.S21![1], "Touchstone 2.0 spec: version 1 two-port order N11 N21 N12 N22");
        Assert.Equal(2, n.PortCount);
    }

    [Fact]
    public void Version_2_keywords_two_port_data_order_references_and_information_are_read()
    {
        string[] file =
        [
            "[Version] 2.0",
            "# GHz S RI R 50",
            "[Number of Ports] 2",
            "[Two-Port Data Order] 12_21",
            "[Number of Frequencies] 2",
            "[Reference] 50",
            "75",
            "[Begin Information]",
            "anything at all 1 2 3",
            "[End Information]",
            "[Network Data]",
            "9.0 0.1 0.0 0.01 0.0",
            "    0.9 0.1 0.2 0.0",
            "9.5 0.2 0.0 0.02 0.0 0.8 0.2 0.3 0.0",
            "[End]",
        ];
        var (n, h) = TouchstoneReader.Read(file, "v2.ts");
        Assert.Equal("2.0", h.Version);
        Same(new Complex(0.9, 0.1), n.S21![0], "Touchstone 2.0 spec: [Two-Port Data Order] 12_21 gives N11 N12 N21 N22; data may wrap");
        Same(new Complex(0.8, 0.2), n.S21[1], "12_21 order");
        Assert.Equal([50.0, 75.0], h.ReferenceResistances);
    }

    [Fact]
    public void Version_2_Z_data_are_in_ohms()
    {
        string[] file = ["[Version] 2.0", "# GHz Z RI R 50", "[Number of Ports] 1", "[Number of Frequencies] 1", "[Network Data]", "9.41 75 0"];
        var (n, _) = TouchstoneReader.Read(file, "z.ts");
        Same(new Complex(0.2, 0), n.S11[0], "(75 − 50)/(75 + 50), Pozar eq. 2.35");
    }

    [Theory]
    [InlineData("bad-number.s1p", new[] { "# GHz S MA", "9.4 0.5 x" }, "bad-number.s1p:2: 'x' is not a number")]
    [InlineData("decreasing.s1p", new[] { "# GHz S MA", "9.4 0.5 1", "9.3 0.5 1" }, "decreasing.s1p:3: frequency 9.3 is not above the previous one")]
    [InlineData("short.s2p", new[] { "# GHz S MA", "9.4 0.5 1 0.1 2" }, "short.s2p:2: incomplete data at the end")]
    [InlineData("option.s1p", new[] { "# GHz S XY", "9.4 0.5 1" }, "option.s1p:1: option 'XY' is not a Touchstone option")]
    [InlineData("h.s2p", new[] { "# GHz H MA", "9.4 0.5 1 0 0 0 0 0 0" }, "h.s2p:1: H-parameters")]
    [InlineData("noext.txt", new[] { "9.4 0.5 1" }, "noext.txt: a version 1 Touchstone file takes its port count from its extension")]
    [InlineData("v2.ts", new[] { "[Version] 2.0", "# GHz S MA", "[Number of Ports] 1", "[Number of Frequencies] 2", "[Network Data]", "9.4 0.5 1" }, "v2.ts: [Number of Frequencies] says 2, the data hold 1")]
    public void Malformed_files_name_the_file_and_line(string name, string[] lines, string message)
    {
        var e = Assert.Throws<MeasurementFormatException>(() => TouchstoneReader.Read(lines, name));
        Assert.StartsWith(message, e.Message, StringComparison.Ordinal);
    }
}
