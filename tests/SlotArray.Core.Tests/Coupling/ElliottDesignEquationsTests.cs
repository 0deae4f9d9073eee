using System.Numerics;
using SlotArray.Core.Coupling;
using SlotArray.Core.Quantities;
using SlotArray.Core.Waveguides;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Coupling;

/// <summary>
/// Elliott's coupling function, Γ0 and (E2) (structure from Elliott and Kurtz 1978 and
/// Elliott 1983, constants calibrated there against Stevenson 1948), checked against Stevenson's conductance
/// (Stevenson 1948 [N]), the closed-form limits of f and the uncoupled limit of (E2).
/// </summary>
public class ElliottDesignEquationsTests
{
    private static readonly RectangularWaveguide Wr90 =
        RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), new Metal("copper", 5.8e7, "test"));
    private static readonly Frequency F0 = Frequency.FromGigahertz(9.375);
    private static readonly double K = F0.FreeSpaceWavenumber;
    private static Length ResonantLikeHalfLength => Length.FromMeters(Math.PI / 2 / K);   // kl = π/2

    [Fact]
    public void Gamma0_for_WR90_at_9_375_GHz()
        => Check.Relative(1.57688, ElliottDesignEquations.Gamma0(Wr90, F0), 5e-6, "Elliott 1983 calibrated on Stevenson 1948, numpy [N]: Γ0 = 1.57688");

    [Theory]
    [InlineData(1.0, 0.02322)]
    [InlineData(2.54, 0.14471)]
    [InlineData(5.0, 0.49776)]
    public void Gamma0_times_f_squared_at_kl_half_pi_is_Stevensons_conductance(double offsetMm, double g)
    {
        // Γ0 f_r² must reproduce Stevenson's g = 2.09 (a/b)(λg/λ) cos²(πλ/2λg) sin²(πx/a) (Stevenson 1948, numpy [N]).
        double f = ElliottDesignEquations.CouplingFunction(Wr90, F0, Length.FromMillimeters(offsetMm), ResonantLikeHalfLength);
        Check.Relative(g, ElliottDesignEquations.Gamma0(Wr90, F0) * f * f, 2e-4, "Stevenson 1948 (R_d = 73 Ω), numpy [N]");
    }

    [Theory]
    [InlineData(0.5)]
    [InlineData(2.0)]
    [InlineData(-3.0)]
    public void Both_forms_equal_the_resonant_closed_form_at_kl_half_pi(double offsetMm)
    {
        // f_r = cos(πλ/(2λg)) (2a/λ)² sin(πx/a), Elliott 1983; cos²(πλ/2λg) = 0.187743 for WR-90 at 9.375 GHz (Stevenson 1948, numpy [N]).
        double lambda = F0.FreeSpaceWavelength.Meters, lg = Wr90.GuideWavelength(F0).Meters, a = Wr90.BroadWall.Meters;
        double fr = Math.Cos(Math.PI * lambda / (2 * lg)) * Math.Pow(2 * a / lambda, 2) * Math.Sin(Math.PI * offsetMm * 1e-3 / a);
        Check.Absolute(0.187743, Math.Pow(Math.Cos(Math.PI * lambda / (2 * lg)), 2), 5e-7, "Stevenson 1948 [N]");
        var x = Length.FromMillimeters(offsetMm);
        Check.Relative(fr, ElliottDesignEquations.CouplingFunction(Wr90, F0, x, ResonantLikeHalfLength), 1e-13, "Elliott 1983 f_r");
        Check.Relative(fr, ElliottDesignEquations.CouplingFunctionDipoleForm(Wr90, F0, x, ResonantLikeHalfLength), 1e-13, "Elliott 1983: the forms agree at kl = π/2");
    }

    [Fact]
    public void Coupling_function_limits()
    {
        var x = Length.FromMillimeters(2);
        double s = Math.Sin(Math.PI * 2e-3 / Wr90.BroadWall.Meters);
        // Zero on the centre line, odd in the offset.
        Assert.Equal(0.0, ElliottDesignEquations.CouplingFunction(Wr90, F0, Length.Zero, ResonantLikeHalfLength));
        Assert.Equal(-ElliottDesignEquations.CouplingFunction(Wr90, F0, x, ResonantLikeHalfLength),
            ElliottDesignEquations.CouplingFunction(Wr90, F0, Length.FromMillimeters(-2), ResonantLikeHalfLength));
        // Short slots: q cos βl/(q² − b²) → 1/q = 2kl/π (cosine form), (cos βl − cos kl)/((1 − b²) sin kl) → kl/2 (dipole form).
        double kl = 1e-4;
        var tiny = Length.FromMeters(kl / K);
        Check.Relative(2 * kl / Math.PI * s, ElliottDesignEquations.CouplingFunction(Wr90, F0, x, tiny), 1e-6, "limit l → 0 of Elliott 1983 (cosine form)");
        Check.Relative(kl / 2 * s, ElliottDesignEquations.CouplingFunctionDipoleForm(Wr90, F0, x, tiny), 1e-6, "limit l → 0 of Elliott 1983 (dipole form)");
        // The removable point βl = π/2 is continuous: value there = q (kl)²/π · sin(πx/a).
        double beta = Wr90.PhaseConstant(F0), l0 = Math.PI / (2 * beta), q = Math.PI / (2 * K * l0);
        double atPoint = ElliottDesignEquations.CouplingFunction(Wr90, F0, x, Length.FromMeters(l0));
        Check.Relative(q * Math.Pow(K * l0, 2) / Math.PI * s, atPoint, 1e-12, "limit βl → π/2 of Elliott 1983 (cos t/(π²/4 − t²) → 1/π)");
        double near = ElliottDesignEquations.CouplingFunction(Wr90, F0, x, Length.FromMeters(l0 * (1 + 1e-6)));
        Check.Relative(atPoint, near, 1e-5, "continuity through βl = π/2");
        Assert.Throws<ArgumentOutOfRangeException>(() =>
            ElliottDesignEquations.CouplingFunctionDipoleForm(Wr90, F0, x, Length.FromMeters(Math.PI / K)));
    }

    [Fact]
    public void Without_coupling_E2_returns_exactly_the_isolated_admittances()
    {
        // Elliott 1983: with Z_mn = 0, Y_n^a = Y_n.
        var y = new[] { new Complex(0.05, 0.012), new Complex(0.11, -0.03), new Complex(0.0731, 1e-5), new Complex(0.2, 0.0) };
        var f = new[] { 0.3, -0.45, 0.52, -0.61 };
        var v = new[] { new Complex(0.4, 0), new Complex(-1, 0), new Complex(0.9, 0.1), new Complex(-0.3, 0) };
        var ya = ElliottDesignEquations.ActiveAdmittances(y, f, v, CouplingMatrix.Zero(4), ElliottDesignEquations.Gamma0(Wr90, F0));
        for (int i = 0; i < y.Length; i++) Assert.Equal(y[i], ya[i]);
    }

    [Fact]
    public void With_coupling_E2_matches_its_published_form_with_the_eta_S_constant()
    {
        // (E2) as written, f²/[f²/y + (4π² a³ b/(η_S λ³ λg)) Σ (V_m/V_n) Z_mn] — the equivalent constant of
        // Elliott 1983 (η_S = 120π), not the Γ0 R_d product the code uses.
        var y = new[] { new Complex(0.09, 0.01), new Complex(0.12, -0.02), new Complex(0.1, 0.0) };
        var f = new[] { 0.41, -0.47, 0.44 };
        var v = new[] { new Complex(0.7, 0), new Complex(-1, 0.05), new Complex(0.8, 0) };
        var z = new Complex[3, 3];
        z[0, 1] = z[1, 0] = new Complex(-24.85, -0.25);
        z[0, 2] = z[2, 0] = new Complex(4.01, 17.73);
        z[1, 2] = z[2, 1] = new Complex(26.4, 20.15);
        var ya = ElliottDesignEquations.ActiveAdmittances(y, f, v, CouplingMatrix.FromArray(z), ElliottDesignEquations.Gamma0(Wr90, F0));
        double lambda = F0.FreeSpaceWavelength.Meters, lg = Wr90.GuideWavelength(F0).Meters, a = Wr90.BroadWall.Meters, b = Wr90.NarrowWall.Meters;
        double c = 4 * Math.PI * Math.PI * a * a * a * b / (120 * Math.PI * lambda * lambda * lambda * lg);
        for (int n = 0; n < 3; n++)
        {
            var sum = Complex.Zero;
            for (int m = 0; m < 3; m++) if (m != n) sum += v[m] / v[n] * z[n, m];
            var expected = f[n] * f[n] / (f[n] * f[n] / y[n] + c * sum);
            Check.Absolute(expected.Real, ya[n].Real, 1e-12, "(E2), Elliott 1983, η_S form of the constant");
            Check.Absolute(expected.Imaginary, ya[n].Imaginary, 1e-12, "(E2), Elliott 1983, η_S form of the constant");
            Assert.NotEqual(y[n], ya[n]);
        }
    }

    [Fact]
    public void E2_rejects_a_slot_on_the_centre_line_and_a_zero_slot_voltage()
    {
        var y = new[] { new Complex(0.1, 0), new Complex(0.1, 0) };
        var zero = CouplingMatrix.Zero(2);
        var e = Assert.Throws<ArgumentException>(() => ElliottDesignEquations.ActiveAdmittances(y, new[] { 0.4, 0.0 }, new[] { Complex.One, Complex.One }, zero, 1.5));
        Assert.Contains("slot 2", e.Message);
        e = Assert.Throws<ArgumentException>(() => ElliottDesignEquations.ActiveAdmittances(y, new[] { 0.4, 0.4 }, new[] { Complex.Zero, Complex.One }, zero, 1.5));
        Assert.Contains("slot 1", e.Message);
        Assert.Throws<ArgumentException>(() => ElliottDesignEquations.ActiveAdmittances(y, new[] { 0.4 }, new[] { Complex.One, Complex.One }, zero, 1.5));
    }
}
