using System.Numerics;
using SlotArray.Core.Planar;

namespace SlotArray.Core.Tests.PlanarTests;

/// <summary>
/// The grating-lobe skirt criterion against the array factor summed directly here, F(u) = Σ w_n e^{j k n d u}
/// (C. A. Balanis, <i>Antenna Theory</i>, 4th ed., Wiley 2016, Sec. 6.3, Eq. (6-10) before normalisation, from memory).
/// </summary>
public class GratingLobeSkirtTests
{
    private const double Lambda = 1.0;   // m

    private static double DirectSum(IReadOnlyList<Complex> w, double d, double u)
    {
        Complex s = Complex.Zero;
        for (int n = 0; n < w.Count; n++) s += w[n] * Complex.FromPolarCoordinates(1, 2 * Math.PI / Lambda * n * d * u);
        return s.Magnitude;
    }

    /// <summary>
    /// The first null toward visible space of the grating lobes at u₀ ± λ/d, found by walking |F(u)| down from each lobe's peak
    /// toward u = 0 (direct sum); the one with the smaller |u|.
    /// </summary>
    private static double GratingInnerNull(IReadOnlyList<Complex> w, double d, double u0)
    {
        double Walk(int side)
        {
            double u = u0 + side * Lambda / d, step = 1e-5, prev = DirectSum(w, d, u);
            while (true)
            {
                double m = DirectSum(w, d, u - side * step);
                if (m > prev) return u;
                prev = m;
                u -= side * step;
            }
        }
        double up = Walk(+1), down = Walk(-1);
        return Math.Abs(up) <= Math.Abs(down) ? up : down;
    }

    private static Complex[] Taylorish(int n) =>
        [.. Enumerable.Range(0, n).Select(i => new Complex(0.3 + 0.7 * Math.Pow(Math.Cos(Math.PI * (i - 0.5 * (n - 1)) / n), 2), 0))];

    /// <summary>
    /// Equal weights at broadside: the largest spacing is λ(1 − 1/N), the first null of the grating lobe at λ/d − λ/(N d)
    /// (Balanis 2016, Sec. 6.3, nulls at ψ = ±2πn/N and grating maxima at ψ = ±2πm, from memory).
    /// </summary>
    [Theory]
    [InlineData(8, 0.85)]
    [InlineData(10, 0.95)]
    public void Uniform_weights_give_the_closed_form(int n, double d)
    {
        var w = Enumerable.Repeat(Complex.One, n).ToArray();
        var s = GratingLobeSkirt.Of(w, d, Lambda);
        Assert.Equal(Lambda * (1 - 1.0 / n), s.LargestSpacing, 3);
        Assert.Equal(Lambda / d - Lambda / (n * d), s.InnerNullU, 3);
        Assert.Equal(d > Lambda * (1 - 1.0 / n), s.ReachesVisibleSpace);
    }

    /// <summary>
    /// A tapered 8-element array (cosine on a pedestal), at broadside and scanned to u₀ = 0.15: the inner null of the grating lobe
    /// matches the direct sum within 1e-3 in u, and at the largest spacing the direct sum puts that null on the edge u = 1.
    /// </summary>
    [Theory]
    [InlineData(0.0)]
    [InlineData(0.15)]
    public void Tapered_and_scanned_arrays_match_the_direct_sum(double u0)
    {
        var a = Taylorish(8);
        double d = 0.9 / (1 + u0);
        Complex[] Steered(double dd) => [.. a.Select((x, n) => x * Complex.FromPolarCoordinates(1, -2 * Math.PI / Lambda * n * dd * u0))];
        var s = GratingLobeSkirt.Of(Steered(d), d, Lambda, u0);
        Assert.Equal(GratingInnerNull(Steered(d), d, u0), s.InnerNullU, 3);
        Assert.True(s.ReachesVisibleSpace);
        double dMax = s.LargestSpacing;
        Assert.InRange(dMax, 0.5, d);
        Assert.Equal(1.0, Math.Abs(GratingInnerNull(Steered(dMax), dMax, u0)), 3);
        Assert.False(GratingLobeSkirt.Of(Steered(0.99 * dMax), 0.99 * dMax, Lambda, u0).ReachesVisibleSpace);
        Assert.True(GratingLobeSkirt.Of(Steered(1.01 * dMax), 1.01 * dMax, Lambda, u0).ReachesVisibleSpace);
    }
}
