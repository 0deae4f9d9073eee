using MathNet.Numerics.Interpolation;

namespace SlotArray.Core.Slots.Tables;

/// <summary>
/// A smooth curve through tabulated points that keeps their monotonicity: MathNet.Numerics' piecewise cubic Hermite
/// interpolant (<c>CubicSpline.InterpolatePchipSorted</c>; the monotone construction of F. N. Fritsch and R. E. Carlson,
/// "Monotone piecewise cubic interpolation", SIAM J. Numer. Anal. 17(2), 238–246, 1980, from memory), a straight line
/// through two points, a constant for one. Outside the points it is held at the end value (no extrapolation).
/// </summary>
internal sealed class MonotoneCurve
{
    private readonly double[] _x, _y;
    private readonly IInterpolation? _curve;

    /// <summary>The curve through (x_i, y_i); x strictly increasing, at least one point.</summary>
    public MonotoneCurve(double[] x, double[] y)
    {
        _x = x;
        _y = y;
        _curve = x.Length switch
        {
            1 => null,
            2 => LinearSpline.InterpolateSorted(x, y),
            _ => CubicSpline.InterpolatePchipSorted(x, y),
        };
    }

    /// <summary>Smallest x.</summary>
    public double Low => _x[0];

    /// <summary>Largest x.</summary>
    public double High => _x[^1];

    /// <summary>The value at x, held at the end values outside [<see cref="Low"/>, <see cref="High"/>].</summary>
    public double At(double x) =>
        _curve is null || x <= _x[0] ? _y[0] : x >= _x[^1] ? _y[^1] : _curve.Interpolate(x);

    /// <summary>The value at x without holding the ends (the interpolant's own continuation; used inside the range).</summary>
    public double Raw(double x) => _curve is null ? _y[0] : _curve.Interpolate(x);

    /// <summary>
    /// Leave-one-out residuals at the interior points: each interior point predicted by the curve through the others,
    /// minus its value (empty with fewer than three points).
    /// </summary>
    public static IEnumerable<(int Index, double Residual)> LeaveOneOut(double[] x, double[] y)
    {
        for (int i = 1; i < x.Length - 1; i++)
        {
            var xs = x.Where((_, j) => j != i).ToArray();
            var ys = y.Where((_, j) => j != i).ToArray();
            yield return (i, new MonotoneCurve(xs, ys).At(x[i]) - y[i]);
        }
    }
}
