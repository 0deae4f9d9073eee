using SlotArray.Core.Quantities;
using SlotArray.Core.Safety;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Tests.Safety;

/// <summary>The cautions as data: the standard one always first; specific ones with their numbers (ICNIRP 2020 levels; power-handling derating, common practice).</summary>
public class SafetyCautionsTests
{
    [Fact]
    public void Every_summary_carries_the_standard_caution()
    {
        var only = SafetyCautions.For();
        Assert.Equal([SafetyCautions.Standard], only);
        foreach (string part in new[] { "can hurt", "keep out of the beam while transmitting", "Local regulations and licensed practice govern", "screening estimates, not a compliance assessment" })
            Assert.Contains(part, SafetyCautions.Standard.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_transmitter_adds_the_distances_the_near_field_caveat_and_the_margin()
    {
        var e = ExposureAssessment.Assess(12.5, 30, Frequency.FromGigahertz(9.41), Length.FromMeters(2.4), Length.FromMeters(0.15));
        var guide = RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium);
        var p = PowerHandling.Assess(guide, Frequency.FromGigahertz(9.41), vswr: 1.5, peakPower: 25e3);
        var c = SafetyCautions.For(e, p);
        Assert.Equal(SafetyCautions.Standard, c[0]);
        // Distances 9.97 m and 2.32 m: Friis 1946 [N] and sqrt(12.5e3/(4π·184.93)) (python3).
        Assert.Contains(c, w => w.Code == "exposure-general-public-whole-body" && w.Message.Contains("within 9.97 m on the beam axis", StringComparison.Ordinal));
        Assert.Contains(c, w => w.Code == "exposure-occupational-local" && w.Message.Contains("within 2.32 m", StringComparison.Ordinal)
            && w.Message.Contains("stays below this level", StringComparison.Ordinal));
        Assert.Contains(c, w => w.Code == "exposure-near-field" && w.Message.Contains("362 m", StringComparison.Ordinal));
        Assert.Contains(c, w => w.Code == "power-handling" && w.Message.Contains("margin", StringComparison.Ordinal));
        Assert.Equal(c, SafetyCautions.For(e, p));   // deterministic
    }

    [Fact]
    public void An_excessive_peak_power_says_what_to_change()
    {
        var guide = RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium);
        var p = PowerHandling.Assess(guide, Frequency.FromGigahertz(9.41), peakPower: 500e3);
        var w = Assert.Single(SafetyCautions.For(power: p), x => x.Code == "power-handling-exceeded");
        Assert.Contains("reduce the peak power", w.Message, StringComparison.Ordinal);
    }
}
