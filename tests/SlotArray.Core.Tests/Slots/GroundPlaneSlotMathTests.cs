using SlotArray.Core.Slots;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Slots;

/// <summary>
/// Si and Ci against independent values: mpmath 1.3.0 si/ci at 30 digits (computed for this test, rounded to 17
/// digits), which agree with the 10-digit entries of Abramowitz &amp; Stegun Table 5.1 where remembered (from memory:
/// Si(1) = 0.9460830704, Ci(1) = 0.3374039229). Tolerance 1e-10 absolute, as required; the three evaluation branches
/// are also checked against each other where their ranges meet.
/// </summary>
public class GroundPlaneSlotMathTests
{
    private const string Mp = "mpmath 1.3.0 si/ci, 30 digits";

    [Theory]
    [InlineData(0.5, 0.49310741804306669, -0.1777840788066129)]
    [InlineData(1.0, 0.94608307036718301, 0.33740392290096813)]
    [InlineData(2.0, 1.6054129768026948, 0.422980828774865)]
    [InlineData(3.0, 1.8486525279994683, 0.11962978600800033)]
    [InlineData(Math.PI, 1.8519370519824662, 0.073667912046425486)]
    [InlineData(4.0, 1.7582031389490531, -0.14098169788693041)]
    [InlineData(5.0, 1.5499312449446741, -0.19002974965664388)]
    [InlineData(2 * Math.PI, 1.4181515761326285, -0.022560661746346068)]
    [InlineData(10.0, 1.658347594218874, -0.045456433004455373)]
    [InlineData(20.0, 1.5482417010434398, 0.044419820845353317)]
    [InlineData(30.0, 1.5667565400303511, -0.033032417282071144)]
    [InlineData(50.0, 1.5516170724859359, -0.0056283863241163054)]
    [InlineData(100.0, 1.5622254668890563, -0.0051488251426104921)]
    public void Si_and_Ci_match_independent_values(double x, double si, double ci)
    {
        Check.Absolute(si, GroundPlaneSlotMath.Si(x), 1e-10, Mp);
        Check.Absolute(ci, GroundPlaneSlotMath.Ci(x), 1e-10, Mp);
        Check.Absolute(-si, GroundPlaneSlotMath.Si(-x), 1e-10, "Si is odd (A&S 5.2.19, from memory)");
    }

    [Fact]
    public void Remembered_table_values_of_Abramowitz_and_Stegun()
    {
        Check.Absolute(0.9460830704, GroundPlaneSlotMath.Si(1), 1e-10, "A&S Table 5.1, from memory");
        Check.Absolute(0.3374039229, GroundPlaneSlotMath.Ci(1), 1e-10, "A&S Table 5.1, from memory");
        Check.Absolute(Math.PI / 2, GroundPlaneSlotMath.Si(1e6), 1.1e-6, "Si(∞) = π/2; |Si(x) − π/2| ≤ 1/x");
    }

    [Theory]
    [InlineData(2.5)]
    [InlineData(3.0)]
    [InlineData(3.5)]
    public void Series_and_continued_fraction_agree_where_they_meet(double x)
    {
        var cf = GroundPlaneSlotMath.SiCiContinuedFraction(x);
        Check.Absolute(GroundPlaneSlotMath.SiSeries(x), cf.Si, 1e-13, "A&S 5.2.14 series vs 5.1.22 continued fraction");
        Check.Absolute(GroundPlaneSlotMath.CiSeries(x), cf.Ci, 1e-13, "A&S 5.2.16 series vs 5.1.22 continued fraction");
    }

    [Theory]
    [InlineData(30.0)]
    [InlineData(40.0)]
    [InlineData(60.0)]
    public void Continued_fraction_and_asymptotic_forms_agree_where_they_meet(double x)
    {
        var cf = GroundPlaneSlotMath.SiCiContinuedFraction(x);
        var asym = GroundPlaneSlotMath.SiCiAsymptotic(x);
        Check.Absolute(asym.Si, cf.Si, 1e-13, "A&S 5.2.8/5.2.34 asymptotic vs 5.1.22 continued fraction");
        Check.Absolute(asym.Ci, cf.Ci, 1e-13, "A&S 5.2.9/5.2.35 asymptotic vs 5.1.22 continued fraction");
    }

    [Fact]
    public void Ci_rejects_non_positive_arguments()
        => Assert.Throws<ArgumentOutOfRangeException>(() => GroundPlaneSlotMath.Ci(0));
}
