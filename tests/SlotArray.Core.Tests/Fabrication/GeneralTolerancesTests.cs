using SlotArray.Core.Fabrication;
using SlotArray.Core.Quantities;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Fabrication;

/// <summary>ISO 2768-1:1989 Table 1, classes f and m [M, Medium: values from memory].</summary>
public class GeneralTolerancesTests
{
    private const string Ref = "ISO 2768-1:1989 Table 1, classes f and m [M, Medium]";

    [Theory]
    [InlineData(3.0, 0.05, 0.1)]
    [InlineData(6.0, 0.05, 0.1)]      // upper edge inclusive
    [InlineData(15.0, 0.1, 0.2)]
    [InlineData(100.0, 0.15, 0.3)]
    [InlineData(300.0, 0.2, 0.5)]
    [InlineData(600.0, 0.3, 0.8)]
    [InlineData(1500.0, 0.5, 1.2)]
    public void Values_by_size_range(double sizeMm, double fine, double medium)
    {
        Check.Relative(fine, GeneralTolerances.For(Iso2768Class.Fine, Length.FromMillimeters(sizeMm))!.Value.Millimeters, 1e-12, Ref);
        Check.Relative(medium, GeneralTolerances.For(Iso2768Class.Medium, Length.FromMillimeters(sizeMm))!.Value.Millimeters, 1e-12, Ref);
    }

    [Fact]
    public void Outside_0_5_to_2000_mm_no_general_tolerance_is_given()
    {
        Assert.Null(GeneralTolerances.For(Iso2768Class.Fine, Length.FromMillimeters(0.3)));
        Assert.Null(GeneralTolerances.For(Iso2768Class.Medium, Length.FromMillimeters(2500)));
        Assert.Equal(12, GeneralTolerances.Rows.Count);
        Check.Relative(0.025, GeneralTolerances.PrecisionMilling.Millimeters, 1e-12, "common practice, no source [C]");
    }
}
