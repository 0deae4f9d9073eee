using SlotArray.Core.Coupling;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Coupling;

/// <summary>
/// Si and Ci against independent values: mpmath 1.3.0 si/ci at 30 digits (computed for this test, rounded to 17
/// digits), which agree with the 10-digit entries of Abramowitz &amp; Stegun Table 5.1 where remembered (from memory:
/// Si(1) = 0.9460830704, Ci(1) = 0.3374039229). Tolerance 1e-10 absolute.
/// </summary>
public class SineCosineIntegralsMpmathTests
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
        Check.Absolute(si, SineCosineIntegrals.Si(x), 1e-10, Mp);
        Check.Absolute(ci, SineCosineIntegrals.Ci(x), 1e-10, Mp);
        Check.Absolute(-si, SineCosineIntegrals.Si(-x), 1e-10, "Si is odd (A&S 5.2.19, from memory)");
    }

    [Fact]
    public void Remembered_table_values_of_Abramowitz_and_Stegun()
    {
        Check.Absolute(0.9460830704, SineCosineIntegrals.Si(1), 1e-10, "A&S Table 5.1, from memory");
        Check.Absolute(0.3374039229, SineCosineIntegrals.Ci(1), 1e-10, "A&S Table 5.1, from memory");
        Check.Absolute(Math.PI / 2, SineCosineIntegrals.Si(1e6), 1.1e-6, "Si(∞) = π/2; |Si(x) − π/2| ≤ 1/x");
    }

    [Fact]
    public void Ci_rejects_non_positive_arguments()
        => Assert.Throws<ArgumentOutOfRangeException>(() => SineCosineIntegrals.Ci(0));
}
