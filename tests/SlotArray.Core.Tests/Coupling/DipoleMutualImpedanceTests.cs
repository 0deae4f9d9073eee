using System.Numerics;
using SlotArray.Core.Coupling;
using SlotArray.Core.Quantities;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Coupling;

/// <summary>
/// Mutual and self impedance of thin dipoles: Carter 1932 induced-EMF values (numpy/scipy closed form and
/// quadrature, agreeing to 0.01 Ω), the classic textbook numbers, the thin half-wave self impedance, an
/// independent quadrature of the reaction integral, and reciprocity for unequal lengths.
/// </summary>
public class DipoleMutualImpedanceTests
{
    private const string Table = "Carter 1932 induced EMF, numpy/scipy [N] (η0), values to 0.01 Ω";
    private const double TableTolerance = 0.006;   // the table is rounded to 0.01 Ω
    private static readonly Frequency F = Frequency.FromGigahertz(1);
    private static Length Lambda(double fraction) => fraction * F.FreeSpaceWavelength;

    [Theory]
    [InlineData(0.100, 67.29, 7.53)]
    [InlineData(0.125, 64.14, -0.07)]
    [InlineData(0.250, 40.76, -28.33)]
    [InlineData(0.500, -12.52, -29.91)]
    [InlineData(0.700, -24.85, -0.25)]
    [InlineData(0.750, -22.48, 6.63)]
    [InlineData(1.000, 4.01, 17.73)]
    [InlineData(1.500, -1.89, -12.30)]
    [InlineData(2.000, 1.08, 9.36)]
    public void Side_by_side_half_wave_dipoles(double dOverLambda, double r, double x)
    {
        var z = DipoleMutualImpedance.Mutual(Lambda(dOverLambda), Length.Zero, Lambda(0.25), Lambda(0.25), F);
        Check.Absolute(r, z.Real, TableTolerance, Table);
        Check.Absolute(x, z.Imaginary, TableTolerance, Table);
        var textbook = DipoleMutualImpedance.SideBySideHalfWave(Lambda(dOverLambda), F);
        Check.Absolute(r, textbook.Real, TableTolerance, Table + ", textbook closed form (Balanis Sec. 8.6)");
        Check.Absolute(x, textbook.Imaginary, TableTolerance, Table + ", textbook closed form (Balanis Sec. 8.6)");
        // The general closed form and the textbook side-by-side formula are separate derivations: they must agree closely.
        Check.Absolute(textbook.Real, z.Real, 1e-10, "Balanis side-by-side closed form");
        Check.Absolute(textbook.Imaginary, z.Imaginary, 1e-10, "Balanis side-by-side closed form");
    }

    [Theory]
    [InlineData(0.50, 26.40, 20.15)]
    [InlineData(0.60, 14.66, -4.01)]
    [InlineData(0.75, 2.04, -7.97)]
    [InlineData(1.00, -4.12, -0.72)]
    [InlineData(1.25, -0.34, 2.54)]
    [InlineData(1.50, 1.73, 0.19)]
    [InlineData(2.00, -0.96, -0.08)]
    public void Collinear_half_wave_dipoles(double sOverLambda, double r, double x)
    {
        var z = DipoleMutualImpedance.Mutual(Length.Zero, Lambda(sOverLambda), Lambda(0.25), Lambda(0.25), F);
        Check.Absolute(r, z.Real, TableTolerance, Table);
        Check.Absolute(x, z.Imaginary, TableTolerance, Table);
    }

    [Theory]
    [InlineData(0.50, 0.50, -11.88, -7.84)]
    [InlineData(0.25, 0.50, 10.63, -12.52)]
    [InlineData(0.50, 0.25, -12.89, -22.13)]
    [InlineData(0.10, 0.70, 4.19, -8.49)]
    public void Echelon_half_wave_dipoles(double dOverLambda, double sOverLambda, double r, double x)
    {
        var z = DipoleMutualImpedance.Mutual(Lambda(dOverLambda), Lambda(sOverLambda), Lambda(0.25), Lambda(0.25), F);
        Check.Absolute(r, z.Real, TableTolerance, Table);
        Check.Absolute(x, z.Imaginary, TableTolerance, Table);
    }

    [Fact]
    public void Classic_textbook_values()
    {
        const string classic = "Kraus, Antennas; Balanis, Antenna Theory (from memory): −12.5 − j29.9 Ω and 26.4 + j20.2 Ω";
        var side = DipoleMutualImpedance.Mutual(Lambda(0.5), Length.Zero, Lambda(0.25), Lambda(0.25), F);
        Check.Absolute(-12.5, side.Real, 0.05, classic);
        Check.Absolute(-29.9, side.Imaginary, 0.05, classic);
        var collinear = DipoleMutualImpedance.Mutual(Length.Zero, Lambda(0.5), Lambda(0.25), Lambda(0.25), F);
        Check.Absolute(26.4, collinear.Real, 0.05, classic);
        Check.Absolute(20.2, collinear.Imaginary, 0.06, classic);
    }

    [Fact]
    public void Thin_half_wave_dipole_self_impedance()
    {
        const string orfanidis = "73.079 + j42.515 Ω, Orfanidis imped.m documentation [S]";
        var z = DipoleMutualImpedance.Self(Lambda(0.25), Lambda(1e-6), F);
        Check.Absolute(73.079, z.Real, 0.001, orfanidis);
        Check.Absolute(42.515, z.Imaginary, 0.001, orfanidis);
        Check.Absolute(73.08, z.Real, TableTolerance, Table);
        Check.Absolute(42.51, z.Imaginary, TableTolerance, Table);
        // Radiation resistance of the half-wave dipole, (η/4π) Cin(2π) (Balanis Sec. 4.6, from memory).
        Check.Relative(PhysicalConstants.Eta0 / (4 * Math.PI) * SineCosineIntegrals.Cin(2 * Math.PI), z.Real, 1e-9, "(η/4π) Cin(2π), Balanis Sec. 4.6");
    }

    [Theory]
    [InlineData(0.30)]
    [InlineData(0.50)]
    [InlineData(0.75)]
    [InlineData(1.25)]
    [InlineData(1.50)]
    public void Self_resistance_of_other_lengths_matches_the_textbook_closed_form(double lengthOverLambda)
    {
        // R_r = (η/2π){C + ln(kl) − Ci(kl) + ½ sin kl [Si(2kl) − 2Si(kl)] + ½ cos kl [C + ln(kl/2) + Ci(2kl) − 2Ci(kl)]},
        // l = full length, referred to the current maximum (Balanis, Antenna Theory, 3rd ed., eq. 4-70, from memory).
        double kl = 2 * Math.PI * lengthOverLambda, c = SineCosineIntegrals.EulerGamma;
        double r = PhysicalConstants.Eta0 / (2 * Math.PI) * (c + Math.Log(kl) - SineCosineIntegrals.Ci(kl)
            + 0.5 * Math.Sin(kl) * (SineCosineIntegrals.Si(2 * kl) - 2 * SineCosineIntegrals.Si(kl))
            + 0.5 * Math.Cos(kl) * (c + Math.Log(kl / 2) + SineCosineIntegrals.Ci(2 * kl) - 2 * SineCosineIntegrals.Ci(kl)));
        var z = DipoleMutualImpedance.Self(Lambda(lengthOverLambda / 2), Lambda(1e-6), F);
        Check.Relative(r, z.Real, 1e-8, "Balanis eq. 4-70 radiation resistance (from memory)");
    }

    [Theory]
    [InlineData(0.07, 0.70, 0.23, 0.25)]
    [InlineData(0.20, 0.30, 0.20, 0.30)]
    [InlineData(0.00, 0.60, 0.22, 0.26)]
    [InlineData(0.00, 0.48, 0.22, 0.26)]
    [InlineData(0.30, 0.00, 0.15, 0.35)]
    [InlineData(0.06, 50.0, 0.24, 0.235)]
    [InlineData(0.01, 0.00, 0.25, 0.25)]
    public void Closed_form_agrees_with_quadrature_of_the_reaction_integral(double d, double s, double h1, double h2)
    {
        double k = 2 * Math.PI;
        var expected = ReactionQuadrature.Mutual(k * d, k * s, k * h1, k * h2);
        var z = DipoleMutualImpedance.MutualElectrical(k * d, k * s, k * h1, k * h2);
        double tol = 1e-8 * Math.Max(1, expected.Magnitude);
        Check.Absolute(expected.Real, z.Real, tol, "Gauss–Legendre quadrature of the induced-EMF integral (Balanis Sec. 8.6)");
        Check.Absolute(expected.Imaginary, z.Imaginary, tol, "Gauss–Legendre quadrature of the induced-EMF integral (Balanis Sec. 8.6)");
    }

    [Theory]
    [InlineData(0.05, 0.70, 0.22, 0.26)]
    [InlineData(0.00, 0.60, 0.20, 0.31)]
    [InlineData(0.40, 0.10, 0.10, 0.40)]
    [InlineData(0.02, 7.00, 0.23, 0.24)]
    public void Reciprocity_holds_for_unequal_lengths(double d, double s, double h1, double h2)
    {
        // Z12 = Z21 (Carter 1932; reaction theorem). The closed form is not symmetric term by term in (h1, h2).
        double k = 2 * Math.PI;
        var z21 = DipoleMutualImpedance.MutualElectrical(k * d, k * s, k * h1, k * h2);
        var z12 = DipoleMutualImpedance.MutualElectrical(k * d, -k * s, k * h2, k * h1);
        Check.Absolute(z21.Real, z12.Real, 1e-10 * z21.Magnitude, "reciprocity Z12 = Z21");
        Check.Absolute(z21.Imaginary, z12.Imaginary, 1e-10 * z21.Magnitude, "reciprocity Z12 = Z21");
    }

    [Fact]
    public void Overlapping_collinear_dipoles_are_rejected()
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() =>
            DipoleMutualImpedance.Mutual(Length.Zero, Lambda(0.4), Lambda(0.25), Lambda(0.25), F));
        Assert.Contains("overlap", e.Message);
    }
}
