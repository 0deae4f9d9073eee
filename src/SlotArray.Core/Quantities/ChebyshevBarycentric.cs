namespace SlotArray.Core.Quantities;

/// <summary>
/// Barycentric Lagrange interpolation in Chebyshev points of the second kind, x_j = half·cos(jπ/(n−1)), with weights
/// w_j = (−1)^j halved at both ends: J.-P. Berrut and L. N. Trefethen, "Barycentric Lagrange interpolation", SIAM Review
/// 46(3), 501–517, 2004, eq. (5.4) and Sec. 5 (from memory). Shared by the tolerance surfaces
/// (<c>Tolerance.BarycentricSurface</c>) and the mutual impedances across a band (<c>Network.CouplingAcrossBand</c>).
/// </summary>
internal static class ChebyshevBarycentric
{
    /// <summary>The n Chebyshev points of the second kind on [−half, half] (0 exactly at the centre of an odd count) and their barycentric weights.</summary>
    public static (double[] X, double[] W) Nodes(double half, int n)
    {
        if (half == 0) return ([0.0], [1.0]);
        var x = new double[n];
        var w = new double[n];
        for (int j = 0; j < n; j++)
        {
            x[j] = 2 * j == n - 1 ? 0.0 : half * Math.Cos(j * Math.PI / (n - 1));
            w[j] = (j % 2 == 0 ? 1.0 : -1.0) * (j == 0 || j == n - 1 ? 0.5 : 1.0);
        }
        return (x, w);
    }

    /// <summary>Normalised barycentric coefficients ℓ_j(x) (Σ ℓ_j = 1); a Kronecker delta at a node.</summary>
    public static void Coefficients(double[] nodes, double[] weights, double x, Span<double> c)
    {
        if (nodes.Length == 1) { c[0] = 1; return; }
        for (int j = 0; j < nodes.Length; j++)
            if (x == nodes[j]) { c.Clear(); c[j] = 1; return; }
        double sum = 0;
        for (int j = 0; j < nodes.Length; j++) { c[j] = weights[j] / (x - nodes[j]); sum += c[j]; }
        for (int j = 0; j < nodes.Length; j++) c[j] /= sum;
    }
}
