using System.Numerics;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Tolerance;

/// <summary>
/// A complex function of two variables on a rectangle [−Rx, Rx] × [−Ry, Ry] (offsets from a centre), interpolated in
/// tensor-product Chebyshev points of the second kind by the barycentric formula. A zero half-width collapses that
/// variable to the single centre node. With an odd node count the centre (0, 0) is a node, where the interpolant
/// returns the sampled value exactly.
/// </summary>
/// <remarks>
/// Barycentric Lagrange interpolation in Chebyshev points x_j = cos(jπ/(n−1)) with weights w_j = (−1)^j, halved at
/// both ends: J.-P. Berrut and L. N. Trefethen, "Barycentric Lagrange interpolation", SIAM Review 46(3), 501–517, 2004,
/// eq. (5.4) and Sec. 5 (from memory). The interpolation error of an analytic function decays geometrically in n
/// (ibid., Sec. 6); the tolerance tests state the error measured against direct solves.
/// </remarks>
internal sealed class BarycentricSurface
{
    private readonly double[] nodesX, nodesY, weightsX, weightsY;
    private readonly Complex[] values;   // row-major [ix * ny + iy]

    /// <summary>Samples <paramref name="f"/>(dx, dy) at the nodes; <paramref name="nodes"/> per variable (odd, ≥ 3) unless its half-width is 0.</summary>
    /// <param name="halfWidthX">Rx ≥ 0.</param>
    /// <param name="halfWidthY">Ry ≥ 0.</param>
    /// <param name="nodes">Nodes per variable; odd so that the centre is a node; default 5.</param>
    /// <param name="f">The function, called once per node (in row-major order).</param>
    /// <param name="secondNodes">Nodes of the second variable (odd, ≥ 3) when it differs from <paramref name="nodes"/>; 0: the same.</param>
    public BarycentricSurface(double halfWidthX, double halfWidthY, int nodes, Func<double, double, Complex> f, int secondNodes = 0)
    {
        ArgumentNullException.ThrowIfNull(f);
        if (secondNodes == 0) secondNodes = nodes;
        if (nodes < 3 || nodes % 2 == 0 || secondNodes < 3 || secondNodes % 2 == 0)
            throw new ArgumentOutOfRangeException(nameof(nodes), nodes, "the node count must be odd and at least 3 so that the centre is a node");
        if (!(halfWidthX >= 0) || !(halfWidthY >= 0)) throw new ArgumentOutOfRangeException(nameof(halfWidthX), "the half-widths must be zero or positive");
        HalfWidthX = halfWidthX;
        HalfWidthY = halfWidthY;
        (nodesX, weightsX) = ChebyshevBarycentric.Nodes(halfWidthX, nodes);
        (nodesY, weightsY) = ChebyshevBarycentric.Nodes(halfWidthY, secondNodes);
        values = new Complex[nodesX.Length * nodesY.Length];
        for (int i = 0; i < nodesX.Length; i++)
            for (int j = 0; j < nodesY.Length; j++)
                values[i * nodesY.Length + j] = f(nodesX[i], nodesY[j]);
    }

    /// <summary>Half-width of the first variable's range.</summary>
    public double HalfWidthX { get; }

    /// <summary>Half-width of the second variable's range.</summary>
    public double HalfWidthY { get; }

    /// <summary>Number of samples taken.</summary>
    public int SampleCount => values.Length;

    /// <summary>The value at the centre (the sample there, exactly).</summary>
    public Complex Centre => values[(nodesX.Length / 2) * nodesY.Length + nodesY.Length / 2];

    /// <summary>True when (dx, dy) lies in the rectangle.</summary>
    public bool Contains(double dx, double dy) => Math.Abs(dx) <= HalfWidthX && Math.Abs(dy) <= HalfWidthY;

    /// <summary>The interpolant at (dx, dy); exact at the nodes. Outside the rectangle it extrapolates (callers check <see cref="Contains"/>).</summary>
    public Complex Evaluate(double dx, double dy)
    {
        Span<double> cx = stackalloc double[nodesX.Length];
        Span<double> cy = stackalloc double[nodesY.Length];
        ChebyshevBarycentric.Coefficients(nodesX, weightsX, dx, cx);
        ChebyshevBarycentric.Coefficients(nodesY, weightsY, dy, cy);
        double re = 0, im = 0;
        int ny = nodesY.Length;
        for (int i = 0; i < cx.Length; i++)
        {
            if (cx[i] == 0) continue;
            double rr = 0, ri = 0;
            for (int j = 0; j < ny; j++)
            {
                var v = values[i * ny + j];
                rr += cy[j] * v.Real;
                ri += cy[j] * v.Imaginary;
            }
            re += cx[i] * rr;
            im += cx[i] * ri;
        }
        return new Complex(re, im);
    }

}
