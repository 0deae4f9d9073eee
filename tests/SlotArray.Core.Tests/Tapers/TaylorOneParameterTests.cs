using SlotArray.Core.Tapers;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Tapers;

/// <summary>Taylor one-parameter against Taylor 1953 (numpy).</summary>
public class TaylorOneParameterTests
{
    private const string Ref = "Taylor 1953 table [N]";

    [Theory]
    [InlineData(-20, 0.73860, 0.93295, -9.17)]
    [InlineData(-25, 1.02292, 0.86260, -15.29)]
    [InlineData(-30, 1.27615, 0.80143, -21.13)]
    [InlineData(-35, 1.51363, 0.75088, -26.81)]
    [InlineData(-40, 1.74148, 0.70899, -32.38)]
    public void B_efficiency_and_edge_illumination_match_the_table(double sll, double b, double eta, double edge)
    {
        double bb = TaylorOneParameter.B(sll);
        Check.Absolute(b, bb, 6e-6, Ref);
        Check.Absolute(eta, TaylorOneParameter.ContinuousTaperEfficiency(bb), 6e-6, Ref);
        Check.Absolute(edge, TaylorOneParameter.EdgeIlluminationDb(bb), 0.006, Ref);
    }

    [Fact]
    public void Uniform_first_sidelobe_constant_is_the_sinc_maximum()
    {
        // max of |sin x / x| beyond π, at the first root of tan x = x (found here by bisection, independent of the constant).
        double lo = 4.4, hi = 4.6;
        for (int i = 0; i < 200; i++) { double m = 0.5 * (lo + hi); if (Math.Tan(m) - m < 0) lo = m; else hi = m; }
        Check.Relative(Math.Abs(Math.Sin(lo) / lo), TaylorOneParameter.UniformFirstSidelobe, 1e-14, "root of tan x = x");
        Check.Absolute(-13.2615, 20 * Math.Log10(TaylorOneParameter.UniformFirstSidelobe), 5e-5, "Taylor 1953: 13.2615 dB");
    }
}
