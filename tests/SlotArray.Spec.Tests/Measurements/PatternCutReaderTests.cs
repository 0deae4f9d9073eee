using SlotArray.Core.Quantities;
using SlotArray.Spec.Measurements;
using SlotArray.Tests.Shared;
using Xunit;

namespace SlotArray.Spec.Tests.Measurements;

/// <summary>Pattern-cut CSV (RFC 4180 fields; the format is the tool's own, documented in the README).</summary>
public class PatternCutReaderTests
{
    [Fact]
    public void Header_lines_and_named_columns_in_any_order_are_read()
    {
        string[] file = ["# frequency: 9.41 GHz", "# plane: guide-axis", "# polarisation: co", "phase_deg,angle_deg,level_db", "10,-10,-20", "0,0,0", "-10,10,-20.5"];
        var (cut, header) = PatternCutReader.Read(file, "cut.csv");
        Check.Absolute(9.41e9, cut.Frequency.Hertz, 1e-3, "the file's # frequency line");
        Check.Absolute(-10 * Math.PI / 180, cut.Angles[0], 1e-15, "angle column named angle_deg (degrees)");
        Check.Absolute(-20.5, cut.LevelsDb[2], 1e-15, "level column");
        Check.Absolute(-10 * Math.PI / 180, cut.PhasesRad![2], 1e-15, "phase column");
        Assert.Contains("from line 1", header.Frequency, StringComparison.Ordinal);
    }

    [Fact]
    public void Without_headers_the_columns_are_angle_level_and_the_options_fill_in()
    {
        var (cut, header) = PatternCutReader.Read(["-5,-3", "0,0", "5,-3.1"], "plain.csv", new CutDefaults(Frequency.FromGigahertz(9.3)));
        Assert.False(cut.HasPhase);
        Check.Absolute(9.3e9, cut.Frequency.Hertz, 1e-3, "--cut-frequency");
        Assert.Contains("--cut-frequency", header.Frequency, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(new[] { "-5,-3", "0,0", "5,-3" }, "nofreq.csv: no frequency")]
    [InlineData(new[] { "# frequency: 9.4 GHz", "-5,-3", "95,0", "5,-3" }, "nofreq.csv:3: angle 95 deg")]
    [InlineData(new[] { "# frequency: 9.4 GHz", "-5,-3", "-6,0", "5,-3" }, "nofreq.csv:3: angle -6 deg is not above the previous one")]
    [InlineData(new[] { "# frequency: 9.4 GHz", "# plane: E", "-5,-3", "0,0", "5,-3" }, "nofreq.csv:2: plane 'e'")]
    [InlineData(new[] { "# frequency: 9.4 GHz", "# polarisation: cross", "-5,-3", "0,0", "5,-3" }, "nofreq.csv:2: polarisation 'cross'")]
    [InlineData(new[] { "# frequency: 9.4 GHz", "-5,-3", "0,zero", "5,-3" }, "nofreq.csv:3: level 'zero' is not a number")]
    [InlineData(new[] { "# frequency: 9.4 parsecs", "-5,-3", "0,0", "5,-3" }, "nofreq.csv:1: frequency:")]
    public void Malformed_cuts_name_the_file_and_line(string[] lines, string message)
    {
        var e = Assert.Throws<MeasurementFormatException>(() => PatternCutReader.Read(lines, "nofreq.csv"));
        Assert.StartsWith(message, e.Message, StringComparison.Ordinal);
    }
}
