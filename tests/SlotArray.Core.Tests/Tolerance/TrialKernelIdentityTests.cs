using System.Numerics;
using SlotArray.Core.Patterns;
using SlotArray.Core.Tolerance;

namespace SlotArray.Core.Tests.ToleranceTests;

/// <summary>
/// The vectorised trial kernels are the same arithmetic as the scalar loops they replaced (issue 12: results stay
/// bit-identical where the method is unchanged). The references below are those loops, kept here verbatim: the pairwise
/// complex sum of the half-space power, and the refinement of every local maximum of a cut.
/// </summary>
public class TrialKernelIdentityTests
{
    [Theory]
    [InlineData(64, 2.5e-5)]
    [InlineData(13, 4e-5)]
    [InlineData(3, 1e-6)]
    public void Half_space_power_equals_the_scalar_pairwise_sum_to_the_bit(int n, double tolerance)
    {
        double k = 2 * Math.PI / 0.0319, d = -0.0223;
        var p = Enumerable.Range(0, n).Select(i => -0.0112 + i * d).ToArray();
        var kernel = new HalfSpacePowerKernel(p, k, ElementPatterns.HalfWaveSlotHPlane);
        var scratch = kernel.NewScratch();
        for (int trial = 0; trial < 20; trial++)
        {
            var r = new TrialRandom(17, trial);
            var a = Enumerable.Range(0, n).Select(_ => new Complex(0.2 + r.NextUniform(), r.NextUniform() - 0.5)).ToArray();
            var delta = Enumerable.Range(0, n).Select(_ => tolerance * (2 * r.NextUniform() - 1)).ToArray();
            Assert.True(kernel.TryPower(a, delta, out double fast, scratch));
            double reference = ScalarPower(p, k, a, delta);
            Assert.Equal(BitConverter.DoubleToInt64Bits(reference), BitConverter.DoubleToInt64Bits(fast));
        }
    }

    /// <summary>The scalar loop of the earlier HalfSpacePowerKernel.TryPower, on a kernel integrated the same way.</summary>
    private static double ScalarPower(double[] positions, double k, Complex[] a, double[] offsets)
    {
        const int maxOrder = 6;
        int n = positions.Length;
        double d = n > 1 ? (positions[^1] - positions[0]) / (n - 1) : 0;
        double span = Math.Abs(positions[^1] - positions[0]);
        int panels = Math.Max(8, (int)Math.Ceiling(k * span / Math.PI) + 8);
        var rule = new MathNet.Numerics.Integration.GaussLegendreRule(-1, 1, 16);
        double h = 2.0 / panels;
        var kernel = new Complex[maxOrder + 1, 2 * n - 1];
        for (int pp = 0; pp < panels; pp++)
            for (int q = 0; q < rule.Order; q++)
            {
                double u = -1 + h * (pp + 0.5 * (rule.Abscissas[q] + 1));
                double e = ElementPatterns.HalfWaveSlotHPlane(Math.Asin(u));
                double w = 0.5 * h * rule.Weights[q] * e * e;
                var jku = new Complex(0, k * u);
                for (int lag = -(n - 1); lag <= n - 1; lag++)
                {
                    Complex t = w * Complex.FromPolarCoordinates(1, k * lag * d * u);
                    for (int o = 0; o <= maxOrder; o++)
                    {
                        kernel[o, lag + n - 1] += t;
                        t *= jku / (o + 1);
                    }
                }
            }
        double x = offsets.Max(Math.Abs) * 2 * k;
        int order = 0;
        double term = x;
        while (term > 1e-12 && order < maxOrder) { order++; term *= x / (order + 1); }
        double sum = 0;
        for (int m = 0; m < n; m++)
        {
            sum += (a[m].Real * a[m].Real + a[m].Imaginary * a[m].Imaginary) * kernel[0, n - 1].Real;
            for (int i = 0; i < m; i++)
            {
                int lag = m - i + n - 1;
                double delta = offsets[m] - offsets[i];
                Complex kk = kernel[order, lag];
                for (int q = order - 1; q >= 0; q--) kk = kk * delta + kernel[q, lag];
                sum += 2 * (a[m] * Complex.Conjugate(a[i]) * kk).Real;
            }
        }
        return sum;
    }

    [Fact]
    public void Skipping_lobes_that_cannot_win_leaves_the_peak_sidelobe_unchanged_to_the_bit()
    {
        // Random tapered arrays with errors on the half-space grid: the highest refined local maximum outside the main
        // beam, found by refining every one of them (the earlier loop), against PatternMetrics.BeamAndPeakSidelobe.
        var grid = AngleGrid.HalfSpaceInTheta(2049);
        double k = 2 * Math.PI / 0.0319, d = -0.0223;
        for (int trial = 0; trial < 40; trial++)
        {
            var r = new TrialRandom(23, trial);
            int n = 8 + (int)(r.NextUniform() * 60);
            var p = Enumerable.Range(0, n).Select(i => i * d).ToArray();
            var a = Enumerable.Range(0, n).Select(i => new Complex(Math.Sin(Math.PI * (i + 0.5) / n) + 0.05 * r.NextUniform(), 0.05 * (r.NextUniform() - 0.5))).ToArray();
            var af = ArrayFactor.AtSines(p, a, k, grid.Sines.AsSpan());
            var power = af.Select(f => f.Real * f.Real + f.Imaginary * f.Imaginary).ToArray();
            var th = grid.Theta;
            var pw = System.Collections.Immutable.ImmutableArray.Create(power);
            var (_, psl) = PatternMetrics.BeamAndPeakSidelobe(th, pw, power.Max());

            int i0 = Array.IndexOf(power, power.Max());
            var (_, peak) = LobeSearch.RefineMaximum(th, pw, i0);
            int iL = LobeSearch.DescendTo(pw, i0, -1), iR = LobeSearch.DescendTo(pw, i0, +1);
            double? best = null;
            for (int i = 0; i < power.Length; i++)
            {
                bool max = (i == 0 || power[i] >= power[i - 1]) && (i == power.Length - 1 || power[i] >= power[i + 1]);
                if (!max || (i >= iL && i <= iR)) continue;
                var (_, v) = LobeSearch.RefineMaximum(th, pw, i);
                if (best is null || v > best) best = v;
            }
            Assert.Equal(best is null ? null : LobeSearch.Db(best.Value / peak), psl);
        }
    }
}
