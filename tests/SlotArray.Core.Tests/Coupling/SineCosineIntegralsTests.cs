using SlotArray.Core.Coupling;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Coupling;

/// <summary>
/// Si, Ci, Cin and the auxiliary functions against their power series (Abramowitz and Stegun 5.2.14, 5.2.16),
/// their asymptotic expansions (A&amp;S 5.2.34–5.2.35) and tabulated values (A&amp;S Table 5.1).
/// </summary>
public class SineCosineIntegralsTests
{
    private const string Series = "A&S 5.2.14 / 5.2.16 power series, summed in the test";
    private const string Asymptotic = "A&S 5.2.34–5.2.35 asymptotic expansions, summed in the test to the smallest term";

    // A&S Table 5.1 (from memory); the same digits were reproduced with mpmath 1.3 si/ci while writing this test.
    [Theory]
    [InlineData(0.5, 0.493107418043067, -0.177784078806613)]
    [InlineData(1.0, 0.946083070367183, 0.337403922900968)]
    [InlineData(2.0, 1.605412976802695, 0.422980828774865)]
    [InlineData(3.0, 1.848652527999468, 0.119629786008000)]
    [InlineData(5.0, 1.549931244944674, -0.190029749656644)]
    [InlineData(10.0, 1.658347594218874, -0.045456433004455)]
    [InlineData(20.0, 1.548241701043440, 0.044419820845353)]
    public void Tabulated_values(double x, double si, double ci)
    {
        var (s, c) = SineCosineIntegrals.SiCi(x);
        Check.Absolute(si, s, 1e-14, "A&S Table 5.1 (from memory), 15 digits");
        Check.Absolute(ci, c, 1e-14, "A&S Table 5.1 (from memory), 15 digits");
        Check.Absolute(si, SineCosineIntegrals.Si(x), 1e-14, "A&S Table 5.1 (from memory)");
        Check.Absolute(ci, SineCosineIntegrals.Ci(x), 1e-14, "A&S Table 5.1 (from memory)");
    }

    [Fact]
    public void Si_of_pi_is_the_Wilbraham_Gibbs_integral()
        => Check.Relative(1.851937051982466, SineCosineIntegrals.Si(Math.PI), 1e-14,
            "Si(π) = 1.8519370519824661 (Wilbraham–Gibbs constant, from memory)");

    [Fact]
    public void Cin_of_two_pi_gives_the_half_wave_dipole_resistance()
    {
        // Cin(2π) = 2.4376 is the classic number behind R = 30 Cin(2π) ≈ 73.1 Ω (Kraus, Antennas; Balanis Sec. 4.6; from memory);
        // 2.43765339305722 with mpmath 1.3.
        Check.Relative(2.43765339305722, SineCosineIntegrals.Cin(2 * Math.PI), 1e-13, "Cin(2π), Kraus/Balanis (from memory) and mpmath");
    }

    [Theory]
    [InlineData(0.01)]
    [InlineData(0.3)]
    [InlineData(1.7)]
    [InlineData(1.999999)]
    [InlineData(3.999999)]
    [InlineData(4.000001)]
    [InlineData(4.125)]
    [InlineData(4.12500001)]
    [InlineData(2.000001)]
    [InlineData(2.5)]
    [InlineData(3.3)]
    [InlineData(4.7)]
    [InlineData(6.0)]
    [InlineData(8.0)]
    public void Agree_with_the_power_series(double x)
    {
        // The series is summed here in decimal (28 digits), so it is exact to double precision even at x = 8,
        // where the terms reach 10³ and a double sum would lose 3 digits. For x > 2 the code uses the continued fraction.
        var (si, cin) = SeriesInDecimal(x);
        var (s, c) = SineCosineIntegrals.SiCi(x);
        Check.Absolute(si, s, 1e-14, Series);
        Check.Absolute(SineCosineIntegrals.EulerGamma + Math.Log(x) - cin, c, 1e-14, Series);
        Check.Relative(cin, SineCosineIntegrals.Cin(x), 1e-13, Series);
    }

    [Theory]
    [InlineData(1e-8)]
    [InlineData(1e-3)]
    public void Cin_keeps_relative_accuracy_for_small_arguments(double x)
        => Check.Relative(x * x / 4 - Math.Pow(x, 4) / 96, SineCosineIntegrals.Cin(x), 1e-14, "A&S 5.2.16, first two terms x²/4 − x⁴/96");

    [Theory]
    [InlineData(40.0)]
    [InlineData(50.0)]
    [InlineData(100.0)]
    [InlineData(63.99)]
    [InlineData(64.0)]
    [InlineData(1e3)]
    [InlineData(1e4)]
    [InlineData(1e6)]
    public void Agree_with_the_asymptotic_expansions(double x)
    {
        var (f, g) = AsymptoticFG(x);
        var (ff, gg) = SineCosineIntegrals.Auxiliary(x);
        Check.Relative(f, ff, 1e-12, Asymptotic);
        Check.Relative(g, gg, 1e-12, Asymptotic);
        // Si = π/2 − f cos x − g sin x, Ci = f sin x − g cos x (A&S 5.2.8–5.2.9).
        double si = Math.PI / 2 - f * Math.Cos(x) - g * Math.Sin(x), ci = f * Math.Sin(x) - g * Math.Cos(x);
        var (s, c) = SineCosineIntegrals.SiCi(x);
        Check.Absolute(si, s, 1e-15, Asymptotic);
        Check.Absolute(ci, c, 1e-12 / x, Asymptotic);
    }

    [Fact]
    public void E1_of_an_imaginary_argument_matches_its_definition()
    {
        foreach (var x in new[] { 0.7, 2.0, 2.1, 9.0, 400.0 })
        {
            var (s, c) = SineCosineIntegrals.SiCi(x);
            var e1 = SineCosineIntegrals.E1OfImaginary(x);
            Check.Absolute(-c, e1.Real, 1e-15, "A&S 5.2.23: E1(ix) = −Ci(x) + i(Si(x) − π/2)");
            Check.Absolute(s - Math.PI / 2, e1.Imaginary, 1e-15, "A&S 5.2.23");
        }
    }

    [Fact]
    public void Si_is_odd_and_Ci_rejects_non_positive_arguments()
    {
        Assert.Equal(-SineCosineIntegrals.Si(3.7), SineCosineIntegrals.Si(-3.7));
        Assert.Equal(0.0, SineCosineIntegrals.Si(0));
        Assert.Throws<ArgumentOutOfRangeException>(() => SineCosineIntegrals.Ci(0));
        Assert.Throws<ArgumentOutOfRangeException>(() => SineCosineIntegrals.Ci(-1));
        Assert.Throws<ArgumentOutOfRangeException>(() => SineCosineIntegrals.Ci(double.NaN));
    }

    private static (double Si, double Cin) SeriesInDecimal(double xd)
    {
        decimal x = (decimal)xd, x2 = x * x, term = x, si = x, cinTerm = 1, cin = 0;
        for (int n = 1; n < 60; n++)
        {
            term *= -x2 / ((2 * n) * (2 * n + 1));
            si += term / (2 * n + 1);
            cinTerm *= -x2 / ((2 * n - 1) * (2 * n));
            cin -= cinTerm / (2 * n);
        }
        return ((double)si, (double)cin);
    }

    private static (double F, double G) AsymptoticFG(double x)
    {
        // f ~ (1/x) Σ (−1)ⁿ (2n)!/x^(2n), g ~ (1/x²) Σ (−1)ⁿ (2n+1)!/x^(2n); stop at the smallest term.
        double inv2 = 1 / (x * x), tf = 1, tg = 1, f = 1, g = 1;
        for (int n = 1; n < 200; n++)
        {
            double nf = -tf * (2 * n - 1) * (2 * n) * inv2, ng = -tg * (2 * n) * (2 * n + 1) * inv2;
            if (Math.Abs(nf) >= Math.Abs(tf) || Math.Abs(ng) >= Math.Abs(tg) || Math.Abs(nf) < 1e-18) break;
            tf = nf; tg = ng; f += tf; g += tg;
        }
        return (f / x, g * inv2);
    }
}
