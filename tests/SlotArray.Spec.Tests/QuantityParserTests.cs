using SlotArray.Spec;
using SlotArray.Tests.Shared;

namespace SlotArray.Spec.Tests;

/// <summary>Units of the spec: every accepted unit, with and without a space, and the errors for anything else.</summary>
public class QuantityParserTests
{
    // Unit factors are SI definitions (BIPM SI Brochure, 9th ed., 2019); the inch is exactly 25.4 mm
    // (1959 international yard and pound agreement); a mil is 1/1000 inch.
    [Theory]
    [InlineData("1.27 m", 1.27)]
    [InlineData("1.27 cm", 1.27e-2)]
    [InlineData("1.27 mm", 1.27e-3)]
    [InlineData("1.27 um", 1.27e-6)]
    [InlineData("1.27 µm", 1.27e-6)]
    [InlineData("0.9 in", 0.02286)]
    [InlineData("50 mil", 0.00127)]
    public void Lengths_in_every_unit_with_and_without_a_space(string text, double meters)
    {
        foreach (string t in new[] { text, text.Replace(" ", "") })
        {
            Assert.True(QuantityParser.TryParseLength(t, out var l, out string error), error);
            Check.Relative(meters, l.Meters, 1e-12, "SI prefixes; inch = 25.4 mm exactly");
        }
    }

    [Theory]
    [InlineData("9410000000 Hz", 9.41e9)]
    [InlineData("9410000 kHz", 9.41e9)]
    [InlineData("9410 MHz", 9.41e9)]
    [InlineData("9.41 GHz", 9.41e9)]
    [InlineData("9.41 ghz", 9.41e9)]
    public void Frequencies_in_every_unit_with_and_without_a_space(string text, double hertz)
    {
        foreach (string t in new[] { text, text.Replace(" ", "") })
        {
            Assert.True(QuantityParser.TryParseFrequency(t, out var f, out string error), error);
            Check.Relative(hertz, f.Hertz, 1e-12, "SI prefixes");
        }
    }

    [Fact]
    public void Angles_levels_percentages_powers_and_conductivities()
    {
        Assert.True(QuantityParser.TryParseAngle("15deg", out var a, out _));
        Check.Relative(15 * Math.PI / 180, a.Radians, 1e-12, "1 deg = π/180 rad by definition");
        Assert.True(QuantityParser.TryParseAngle("0.5 rad", out a, out _));
        Check.Relative(0.5, a.Radians, 1e-12, "identity");
        Assert.True(QuantityParser.TryParseDecibels("-26 dB", out double db, out _));
        Assert.Equal(-26, db);
        Assert.True(QuantityParser.TryParseDecibels("-26dB", out db, out _));
        Assert.Equal(-26, db);
        Assert.True(QuantityParser.TryParsePercent("5 %", out double p, out _));
        Check.Relative(0.05, p, 1e-12, "per cent = 1/100");
        Assert.True(QuantityParser.TryParsePercent("5%", out p, out _));
        Check.Relative(0.05, p, 1e-12, "per cent = 1/100");
        foreach (var (t, w) in new[] { ("20 W", 20.0), ("25 kW", 25e3), ("1.5MW", 1.5e6), ("5 mW", 5e-3) })
        {
            Assert.True(QuantityParser.TryParsePower(t, out double watts, out string e), e);
            Check.Relative(w, watts, 1e-12, "SI prefixes");
        }
        Assert.True(QuantityParser.TryParseConductivity("3.5e7 S/m", out double s, out _));
        Check.Relative(3.5e7, s, 1e-12, "identity");
        Assert.True(QuantityParser.TryParseGuideDistance("0.25 guide-wavelength", out var d, out _));
        Assert.Equal(0.25, d.GuideWavelengths);
        Assert.True(QuantityParser.TryParseGuideDistance("18.6 mm", out d, out _));
        Check.Relative(0.0186, d.Fixed!.Value.Meters, 1e-12, "SI prefixes");
    }

    [Theory]
    [InlineData("1.27 GHz", "a frequency")]
    [InlineData("1.27 dB", "a level in dB")]
    [InlineData("1.27 %", "a percentage")]
    [InlineData("1.27 kW", "a power")]
    [InlineData("1.27 deg", "an angle")]
    public void A_unit_of_the_wrong_kind_names_both_kinds(string text, string foundKind)
    {
        Assert.False(QuantityParser.TryParseLength(text, out _, out string error));
        Assert.StartsWith("needs a length such as '1.27 mm'", error);
        Assert.Contains(foundKind, error);
    }

    [Theory]
    [InlineData("1.27", "has no unit")]
    [InlineData("abc mm", "not a number")]
    [InlineData("1,27 mm", "not a known unit")]   // invariant culture: a comma is not a decimal separator
    [InlineData("1e400 mm", "finite")]
    [InlineData("1.27 furlong", "not a known unit")]
    [InlineData("", "needs a length")]
    public void Malformed_lengths_say_what_to_write(string text, string fragment)
    {
        Assert.False(QuantityParser.TryParseLength(text, out _, out string error));
        Assert.Contains(fragment, error);
        Assert.Contains("'1.27 mm'", error);
    }

    [Fact]
    public void Ambiguous_case_is_refused_so_milliwatt_is_never_read_as_megawatt()
    {
        Assert.False(QuantityParser.TryParsePower("5 mw", out _, out string error));
        Assert.Contains("not a known unit", error);
    }

    [Fact]
    public void Plain_numbers_reject_units()
    {
        Assert.True(QuantityParser.TryParseNumber("2.5", out double v, out _));
        Assert.Equal(2.5, v);
        Assert.False(QuantityParser.TryParseNumber("2.5 mm", out _, out string error));
        Assert.Contains("without a unit", error);
    }
}
