using SlotArray.Core.Waveguides;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Waveguides;

/// <summary>The catalogue against EIA RS-261-B inside dimensions (inches), (via the RF Cafe waveguide chart).</summary>
public class WaveguideCatalogueTests
{
    [Theory]
    [InlineData("WR-650", "R14", 6.500, 3.250)]
    [InlineData("WR-284", "R32", 2.840, 1.340)]
    [InlineData("WR-187", "R48", 1.872, 0.872)]
    [InlineData("WR-90", "R100", 0.900, 0.400)]
    [InlineData("WR-42", "R220", 0.420, 0.170)]
    [InlineData("WR-28", "R320", 0.280, 0.140)]
    public void Dimensions_are_the_standard_inches_times_25_4(string eia, string iec, double aIn, double bIn)
    {
        var g = WaveguideCatalogue.Find(eia)!;
        Assert.Equal(iec, g.Iec);
        Assert.Equal(aIn * 25.4, g.BroadWall.Millimeters, 12);
        Assert.Equal(bIn * 25.4, g.NarrowWall.Millimeters, 12);
        Assert.Same(g, WaveguideCatalogue.Find(iec));
    }

    [Fact]
    public void Wr90_is_22_86_by_10_16_mm_and_names_are_lenient()
    {
        var g = WaveguideCatalogue.Find("wr90")!;
        Assert.Equal(22.86, g.BroadWall.Millimeters, 10);
        Assert.Equal(10.16, g.NarrowWall.Millimeters, 10);
        Assert.Null(WaveguideCatalogue.Find("WR-91"));
    }

    [Fact]
    public void Every_recommended_band_lies_inside_the_single_mode_band()
    {
        foreach (var s in WaveguideCatalogue.All)
        {
            var g = RectangularWaveguide.FromStandard(s, Core.Quantities.Length.Zero, Metal.Copper);
            Assert.True(s.BandLow > g.CutoffTe10, s.Designation);
            Assert.True(s.BandHigh <= g.SingleModeBand.High, s.Designation);
            // Cutoff column of EIA RS-261-B to its 3 decimals (GHz).
        }
        Check.Absolute(2.078, WaveguideCatalogue.Find("WR-284")!.CutoffTe10.Gigahertz, 0.0005, "c/(2a) of the EIA RS-261-B size, RF Cafe chart cutoff column");
        Check.Absolute(21.077, WaveguideCatalogue.Find("WR-28")!.CutoffTe10.Gigahertz, 0.0005, "c/(2a) of the EIA RS-261-B size, RF Cafe chart cutoff column");
    }
}
