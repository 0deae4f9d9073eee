using System.Globalization;

namespace SlotArray.Reports.Tests;

// Touchstone File Format Specification rev. 1.1 (EIA/IBIS 2002): '!' comments, one option line
// "# <freq unit> <parameter> <format> R <n>", then one data line per frequency: f, Re S11, Im S11 for RI.
public class TouchstoneWriterTests
{
    [Fact]
    public void S1p_parses_with_the_stated_option_line_and_one_line_per_frequency()
    {
        var r = ReportFixture.Eight();
        var w = new StringWriter(CultureInfo.InvariantCulture);
        TouchstoneWriter.Write(r, w);
        string[] lines = w.ToString().Split('\n');
        Assert.Equal("", lines[^1]);                      // ends with a newline
        var body = lines[..^1];
        var options = body.Where(l => l.StartsWith('#')).ToList();
        // Normalised: a waveguide-calibrated analyser reports S11 against the guide's own impedance, so R is 1 (issue 13).
        Assert.Equal(["# Hz S RI R 1"], options);
        int optionAt = Array.IndexOf(body, options[0]);
        Assert.All(body[..optionAt], l => Assert.StartsWith("!", l));
        string comments = string.Join("\n", body[..optionAt]);
        Assert.Contains("normalised to the TE10 wave impedance", comments);
        Assert.Contains("reference plane is the feed port", comments);
        Assert.Contains("527.115 ohm", comments);   // Z_TE = η/√(1 − (fc/f)²) of WR-90 at 9.375 GHz (Pozar, "Microwave Engineering", 4th ed., 2012, §3.3, from memory), stated in the comment
        var data = body[(optionAt + 1)..];
        Assert.Equal(r.Sweep.Count, data.Length);
        double last = 0;
        for (int i = 0; i < data.Length; i++)
        {
            var f = data[i].Split(' ').Select(v => double.Parse(v, NumberStyles.Float, CultureInfo.InvariantCulture)).ToArray();
            Assert.Equal(3, f.Length);
            Assert.True(f[0] > last, "frequencies increase");
            last = f[0];
            Check.Absolute(r.Sweep[i].FrequencyHz, f[0], 0.0005, "frequency in Hz, 3 decimals");
            Check.Absolute(r.Sweep[i].S11.Real, f[1], 5e-10, "Re S11, 9 decimals");
            Check.Absolute(r.Sweep[i].S11.Imaginary, f[2], 5e-10, "Im S11, 9 decimals");
        }
    }
}
