using MathNet.Numerics;
using MathNet.Numerics.Integration;
using System.Numerics;
using SlotArray.Core.Design;
using SlotArray.Core.Patterns;
using SlotArray.Core.Planar;
using SlotArray.Core.Quantities;
using SlotArray.Core.Tapers;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.PlanarTests;

/// <summary>Hansen's circular Taylor distribution (R. C. Hansen, IRE Trans. AP-8, 23–26, 1960).</summary>
public class CircularTaylorTests
{
    /// <summary>
    /// The zeros of J1: j_{1,1} = 3.8317060, j_{1,2} = 7.0155867, j_{1,5} = 16.4706301 (M. Abramowitz and I. A. Stegun,
    /// <i>Handbook of Mathematical Functions</i>, 1964, Table 9.5, from memory), divided by π.
    /// </summary>
    [Theory]
    [InlineData(1, 3.8317060)]
    [InlineData(2, 7.0155867)]
    [InlineData(5, 16.4706301)]
    public void Uniform_zeros_are_those_of_J1(int n, double j1n)
        => Check.Relative(j1n / Math.PI, CircularTaylor.UniformZero(n), 2e-8, "Abramowitz & Stegun 1964 Table 9.5");

    /// <summary>
    /// The distribution's Hankel transform is the closed-form pattern: F(u) ∝ ∫₀¹ g(p) J0(πup) p dp (the far field of a
    /// circularly symmetric aperture, e.g. Hansen 1998 Sec. 3.2, from memory), computed here by Gauss–Legendre
    /// quadrature of the distribution and compared with the product formula at many u. This checks the coefficients.
    /// </summary>
    [Theory]
    [InlineData(-25, 4)]
    [InlineData(-30, 5)]
    [InlineData(-40, 8)]
    public void Distribution_transforms_to_the_pattern(double sll, int nbar)
    {
        var d = CircularTaylor.Parameters(sll, nbar);
        double Transform(double u) => GaussLegendreRule.Integrate(p => d.Distribution(p) * SpecialFunctions.BesselJ(0, Math.PI * u * p) * p, 0, 1, 256);
        double f0 = Transform(0);
        for (double u = 0.1; u < 12; u += 0.37)
            Check.Absolute(d.Pattern(u), Transform(u) / f0, 2e-9, "Hankel transform of the distribution (Hansen 1960)");
    }

    /// <summary>
    /// The defining properties (Hansen 1960; same construction as Taylor 1955): no sidelobe above the design level, the
    /// highest one below it by a margin that shrinks as n̄ grows (the uniform circular aperture's u^(−3/2) envelope beyond
    /// n̄ pulls the inner lobes down: −21.2 dB for a −20 dB, n̄ = 3 design, −30.1 dB for −30 dB, n̄ = 12; computed here
    /// and, independently, with scipy's J1 and its zeros [N]); and the half-power width is σ times that of the ideal pattern
    /// cosh(π√(A² − u²)) (Taylor's beam-broadening rule, Taylor 1955, which Hansen's table uses, from memory) within 2 % (the rule is approximate for small n̄: 1.8 % at n̄ = 3).
    /// Hansen's printed table itself was not at hand to compare digits with.
    /// </summary>
    [Theory]
    [InlineData(-20, 3, -21.18)]
    [InlineData(-25, 4, -25.74)]
    [InlineData(-30, 5, -30.53)]
    [InlineData(-30, 12, -30.11)]
    [InlineData(-40, 8, -40.28)]
    public void Sidelobes_and_beamwidth_are_those_of_the_design(double sll, int nbar, double scipyPeak)
    {
        var d = CircularTaylor.Parameters(sll, nbar);
        double psl = CircularTaylor.PeakSidelobeDb(d);
        Assert.True(psl <= sll + 0.01, $"a sidelobe at {psl:0.00} dB is above the design level {sll} dB");
        Check.Absolute(scipyPeak, psl, 0.01, "Hansen 1960 pattern evaluated with scipy.special.j1 and jn_zeros [N]");
        double a = d.A, r = Math.Cosh(Math.PI * a);
        double uh = Math.Sqrt(a * a - Math.Pow(Math.Acosh(r / Math.Sqrt(2)) / Math.PI, 2));
        Check.Relative(2 * d.Sigma * uh, CircularTaylor.HalfPowerWidthU(d), 0.02, "Taylor 1955 beam broadening σ × ideal");
    }

    /// <summary>
    /// Sampled on a dense circular grid (d = λ/2, radius 10λ), the array's principal-plane sidelobes are within 1 dB of the
    /// continuous design (sampling a continuous distribution finely reproduces its pattern near the beam, Hansen 1998, from memory).
    /// </summary>
    [Fact]
    public void Sampled_on_a_circular_grid_it_keeps_its_sidelobes()
    {
        var layout = PlanarLayout.Create(40, 40, Length.FromMeters(0.5), Length.FromMeters(0.5), PlanarOutline.Circle);
        var (w, _, _) = ApertureTaper.CircularTaylor(-30, 5).Weights(layout);
        var af = new PlanarArrayFactor(layout.Slots.Select(s => s.X).ToArray(), layout.Slots.Select(s => s.Y).ToArray(),
            w.Select(a => new Complex(a, 0)).ToArray(), 2 * Math.PI);
        var grid = AngleGrid.UniformInTheta(-Math.PI / 2, Math.PI / 2, 4001);
        var e = PatternMetrics.Measure(af.Cut(Math.PI / 2, grid));
        Check.Absolute(-30, e.PeakSidelobeDb!.Value, 1.0, "Hansen 1960 design level, sampled");
    }
}
