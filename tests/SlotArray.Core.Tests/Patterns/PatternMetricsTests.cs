using SlotArray.Core.Patterns;
using SlotArray.Tests.Shared;
using Complex = System.Numerics.Complex;

namespace SlotArray.Core.Tests.Patterns;

/// <summary>Metrics of uniform and difference patterns against closed forms.</summary>
public class PatternMetricsTests
{
    private const double Lambda = 1.0;
    private static readonly double K = 2 * Math.PI / Lambda;

    [Fact]
    public void Uniform_array_half_power_beamwidth_is_0_885893_wavelengths_over_length()
    {
        // N = 400 at λ/2: L = N d = 200 λ, large enough that the discrete array equals the line source to ~1e-5.
        int n = 400;
        var z = ArrayGeometry.Uniform(n, 0.5 * Lambda);
        var p = ArrayFactor.Compute(z, Enumerable.Repeat(1.0, n).ToArray(), K, AngleGrid.UniformInSine(-0.05, 0.05, 8001));
        var m = PatternMetrics.Measure(p);
        double l = n * 0.5 * Lambda;
        // Balanis 2005: HPBW = 0.885893 λ/L (rad, broadside, L ≫ λ).
        Check.Relative(2 * Math.Asin(0.885893 / 2 * Lambda / l), m.HalfPowerBeamwidth.Radians, 2e-5, "Balanis 2005");
        // Nulls of the uniform array at ψ = ±2π/N, i.e. sin θ = ±λ/(N d) (closed form, Balanis 2005 eq. 6-10, from memory).
        // The parabolic null refinement is good to a small fraction of a grid step (here 1.25e-5 in sin θ).
        Check.Relative(2 * Math.Asin(Lambda / l), m.NullToNullWidth.Radians, 2e-5, "uniform-array nulls ψ = 2π/N");
        // First sidelobe of the uniform line source −13.26 dB (Balanis 2005; 13.2615 dB = −20 log10 0.2172336, the peak of |sin x/x|).
        Check.Absolute(-13.2615, m.FirstSidelobeDb!.Value, 0.01, "uniform line source, Balanis 2005");
        Check.Absolute(-13.2615, m.PeakSidelobeDb!.Value, 0.01, "uniform line source, Balanis 2005");
        Check.Absolute(0, m.BeamDirection.Radians, 1e-9, "symmetric array");
    }

    [Fact]
    public void Uniform_array_integrated_sidelobe_ratio_matches_the_sinc_squared_main_lobe_fraction()
    {
        // Line source: main-lobe power fraction I = ∫_{−1}^{1} sinc²(πx) dx (total ∫ = 1 exactly, Parseval);
        // ISLR = 10 log10((1 − I)/I) ≈ −9.68 dB. I by Gauss–Kronrod here; the N = 400, λ/2 array is close to it.
        double inMain = MathNet.Numerics.Integrate.GaussKronrod(x => x == 0 ? 1 : Math.Pow(Math.Sin(Math.PI * x) / (Math.PI * x), 2), -1, 1, 1e-13, 20, 31);
        int n = 400;
        var p = ArrayFactor.Compute(ArrayGeometry.Uniform(n, 0.5), Enumerable.Repeat(1.0, n).ToArray(), K, AngleGrid.VisibleInSine(64001));
        Check.Absolute(10 * Math.Log10((1 - inMain) / inMain), PatternMetrics.Measure(p).IntegratedSidelobeRatioDb!.Value, 0.01,
            "∫ sinc² main-lobe fraction (Parseval), computed in the test");
    }

    [Fact]
    public void Small_uniform_array_beamwidth_solves_the_exact_array_factor_equation()
    {
        // |sin(Nψ/2)/(N sin(ψ/2))|² = 1/2 solved here by bisection (Balanis 2005), N = 8, d = λ/2.
        int n = 8;
        double lo = 1e-6, hi = 2 * Math.PI / n;
        for (int it = 0; it < 200; it++)
        {
            double mid = 0.5 * (lo + hi), af = Math.Sin(n * mid / 2) / (n * Math.Sin(mid / 2));
            if (af * af > 0.5) lo = mid; else hi = mid;
        }
        double expected = 2 * Math.Asin(lo / (K * 0.5 * Lambda));
        var p = ArrayFactor.Compute(ArrayGeometry.Uniform(n, 0.5), Enumerable.Repeat(1.0, n).ToArray(), K, AngleGrid.HalfSpaceInTheta(20001));
        Check.Relative(expected, PatternMetrics.Measure(p).HalfPowerBeamwidth.Radians, 1e-6, "exact uniform-array half-power equation");
    }

    [Fact]
    public void Peak_sidelobe_is_found_outside_the_walked_main_beam_even_when_far_from_it()
    {
        // Two elements 3 λ apart with unequal weights: the pattern 1 + 0.5 e^{j 6π u} has no true nulls; the walk
        // must stop at the first minimum and find the next lobe (equal to the main one in amplitude: 0 dB).
        var p = ArrayFactor.Compute([0.0, 3.0], new double[] { 1, 0.5 }, K, AngleGrid.UniformInSine(-0.4, 0.4, 4001));
        var m = PatternMetrics.Measure(p);
        Check.Absolute(0, m.PeakSidelobeDb!.Value, 1e-6, "|1 + 0.5 e^{jx}| is periodic: every lobe equals the main lobe");
        Check.Absolute(2 * Math.Asin(1 / 6.0), m.NullToNullWidth.Radians, 1e-5, "minima of |1 + 0.5 e^{j6πu}| at u = ±1/6");
    }

    [Fact]
    public void Difference_pattern_has_a_deep_null_and_the_analytic_slope()
    {
        // Odd real weights: F(θ) = Σ a_n e^{jkz_n sinθ} is j·odd, F(0) = 0, dF/dθ(0) = j k Σ a_n z_n (differentiation of the definition).
        int n = 16;
        var z = ArrayGeometry.Uniform(n, 0.5);
        var a = z.Select(x => (double)Math.Sign(x)).ToArray();
        var p = ArrayFactor.Compute(z, a, K, AngleGrid.HalfSpaceInTheta(16001));
        var m = DifferencePatternMetrics.Measure(p);
        Assert.True(m.NullDepthDb < -200, $"null depth {m.NullDepthDb} dB");
        double peak = Math.Sqrt(p.PeakPower);
        Check.Relative(K * a.Zip(z, (w, x) => w * x).Sum() / peak, m.NormalizedSlope, 1e-4, "dF/dθ at boresight = j k Σ a_n z_n");
        Check.Absolute(-m.DifferencePeakDirections.Left.Radians, m.DifferencePeakDirections.Right.Radians, 1e-9, "odd pattern, symmetric lobes");
        Assert.True(m.PeakSidelobeDb < -5, $"difference sidelobe {m.PeakSidelobeDb} dB");
    }

    [Fact]
    public void Taper_efficiency_is_one_for_uniform_and_matches_the_definition()
    {
        Check.Absolute(1, PatternMetrics.TaperEfficiency(new double[] { 2, 2, 2 }), 1e-15, "definition, Balanis 2005");
        // [1, 2, 1]: 16 / (3·6) = 0.8888… (hand calculation of the definition)
        Check.Relative(16.0 / 18.0, PatternMetrics.TaperEfficiency(new double[] { 1, 2, 1 }), 1e-15, "hand calculation");
        Check.Relative(16.0 / 18.0, PatternMetrics.TaperEfficiency(new Complex[] { Complex.ImaginaryOne, 2 * Complex.ImaginaryOne, Complex.ImaginaryOne }), 1e-15, "phase-independent");
    }
}
