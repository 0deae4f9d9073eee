using SlotArray.Core.Coupling;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Coupling;

/// <summary>
/// Half-cosine-current mutual impedance: at kh = π/2 the half-cosine is the sinusoid, so the result must equal the
/// induced-EMF closed form and Carter 1932 induced-EMF values computed with numpy [N]; reciprocity for unequal lengths.
/// </summary>
public class CosineCurrentMutualImpedanceTests
{
    private const double K = 2 * Math.PI;   // lengths below in wavelengths

    [Theory]
    [InlineData(0.50, 0.00, -12.52, -29.91)]
    [InlineData(0.25, 0.50, 10.63, -12.52)]
    [InlineData(0.10, 0.70, 4.19, -8.49)]
    [InlineData(0.00, 0.75, 2.04, -7.97)]
    public void Half_wave_equals_the_sinusoidal_closed_form_and_the_tables(double d, double s, double r, double x)
    {
        var z = CosineCurrentMutualImpedance.MutualElectrical(K * d, K * s, K * 0.25, K * 0.25);
        Check.Absolute(r, z.Real, 0.006, "Carter 1932 induced EMF, numpy [N]");
        Check.Absolute(x, z.Imaginary, 0.006, "Carter 1932 induced EMF, numpy [N]");
        var closed = DipoleMutualImpedance.MutualElectrical(K * d, K * s, K * 0.25, K * 0.25);
        Check.Absolute(closed.Real, z.Real, 1e-12 * closed.Magnitude, "induced-EMF closed form (cos(πz/2h) = sin(k(h − |z|)) at kh = π/2)");
        Check.Absolute(closed.Imaginary, z.Imaginary, 1e-12 * closed.Magnitude, "induced-EMF closed form");
    }

    [Fact]
    public void Reciprocity_for_unequal_lengths_and_close_pairs_are_rejected()
    {
        var z21 = CosineCurrentMutualImpedance.MutualElectrical(K * 0.12, K * 0.7, K * 0.22, K * 0.24);
        var z12 = CosineCurrentMutualImpedance.MutualElectrical(K * 0.12, -K * 0.7, K * 0.24, K * 0.22);
        Check.Absolute(z21.Real, z12.Real, 1e-12 * z21.Magnitude, "reciprocity Z12 = Z21");
        Check.Absolute(z21.Imaginary, z12.Imaginary, 1e-12 * z21.Magnitude, "reciprocity Z12 = Z21");
        Assert.Throws<ArgumentOutOfRangeException>(() => CosineCurrentMutualImpedance.MutualElectrical(0, K * 0.5, K * 0.25, K * 0.25));
    }

    /// <summary>
    /// The adaptive rule (6 points a half from a quarter wavelength, 4 from one wavelength, 16 closer) gives the 16-point
    /// value to 1e-8 of its size up to one wavelength and to 1e-5 beyond, over separations, staggers and the slot
    /// half-lengths a design meets (0.22 … 0.26 λ); at the half-wave length it also meets the induced-EMF closed form
    /// (Carter 1932) to the same tolerances.
    /// </summary>
    [Theory]
    [InlineData(0.25, 0.0, 0.22, 0.26)]
    [InlineData(0.0, 0.76, 0.24, 0.25)]
    [InlineData(0.75, 0.70, 0.23, 0.25)]
    [InlineData(1.5, 2.1, 0.26, 0.22)]
    [InlineData(0.0, 2.1, 0.25, 0.25)]
    [InlineData(1.0, 0.0, 0.23, 0.25)]
    [InlineData(3.0, 3.5, 0.23, 0.25)]
    [InlineData(10, 7.0, 0.25, 0.25)]
    public void Adaptive_rule_gives_the_full_rule_value(double d, double s, double h1, double h2)
    {
        var full = CosineCurrentMutualImpedance.MutualElectrical(K * d, K * s, K * h1, K * h2);
        var fast = CosineCurrentMutualImpedance.AdaptiveElectrical(K * d, K * s, K * h1, K * h2);
        double gap = Math.Max(0, s - h1 - h2), tolerance = Math.Sqrt(d * d + gap * gap) >= 1 ? 1e-5 : 1e-8;
        Check.Absolute(0, (fast - full).Magnitude, tolerance * full.Magnitude, "16-point Gauss–Legendre value");
        if (h1 == 0.25 && h2 == 0.25)
        {
            var closed = DipoleMutualImpedance.MutualElectrical(K * d, K * s, K * h1, K * h2);
            Check.Absolute(0, (fast - closed).Magnitude, tolerance * closed.Magnitude, "induced-EMF closed form (Carter 1932)");
        }
    }
}
