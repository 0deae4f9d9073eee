using System.Numerics;
using MathNet.Numerics.Integration;

namespace SlotArray.Core.Tests.Coupling;

/// <summary>
/// An independent reference for the closed-form mutual impedance: the induced-EMF reaction integral
/// Z21 = (jη/4π) ∫ [e^(−jkR1)/R1 + e^(−jkR2)/R2 − 2 cos(kh1) e^(−jkr)/r] sin(k(h2 − |z − s|)) dz
/// (Carter 1932; Balanis, Antenna Theory, 3rd ed., Sec. 8.6, from memory), integrated by
/// composite Gauss–Legendre (MathNet's rule) on panels graded toward the near-singular points of the kernel.
/// Written straight from the field formula, sharing no code with the closed form. Electrical units (k = 1).
/// </summary>
internal static class ReactionQuadrature
{
    private static readonly GaussLegendreRule Rule = new(-1, 1, 20);

    public static Complex Mutual(double d, double s, double h1, double h2, double eta = 376.730313461770655)
    {
        double a = s - h2, b = s + h2;
        // Break points: the current's kink at s and the projections of the three source points.
        var cuts = new List<double> { a, b, s };
        foreach (var p in new[] { -h1, 0.0, h1 })
            if (p > a && p < b) cuts.Add(p);
        cuts.Sort();
        var sum = Complex.Zero;
        for (int i = 0; i + 1 < cuts.Count; i++)
            sum += Graded(z => Integrand(z, d, s, h1, h2), cuts[i], cuts[i + 1], Math.Max(d, 1e-9));
        return Complex.ImaginaryOne * eta / (4 * Math.PI) * sum;
    }

    private static Complex Integrand(double z, double d, double s, double h1, double h2)
    {
        double r1 = Math.Sqrt(d * d + (z - h1) * (z - h1)), r2 = Math.Sqrt(d * d + (z + h1) * (z + h1)), r = Math.Sqrt(d * d + z * z);
        Complex k = Complex.FromPolarCoordinates(1 / r1, -r1) + Complex.FromPolarCoordinates(1 / r2, -r2)
            - 2 * Math.Cos(h1) * Complex.FromPolarCoordinates(1 / r, -r);
        return k * Math.Sin(h2 - Math.Abs(z - s));
    }

    /// <summary>Panels geometrically graded toward both ends (scale d) so that the 1/R peaks are resolved.</summary>
    private static Complex Graded(Func<double, Complex> f, double lo, double hi, double scale)
    {
        var edges = new List<double> { lo, hi };
        double mid = 0.5 * (lo + hi);
        for (double t = scale * 0.25; t < 0.5 * (hi - lo); t *= 2)
        {
            edges.Add(lo + t);
            edges.Add(hi - t);
        }
        edges.Add(mid);
        edges.Sort();
        var sum = Complex.Zero;
        for (int i = 0; i + 1 < edges.Count; i++)
        {
            double x0 = edges[i], x1 = edges[i + 1];
            if (x1 <= x0) continue;
            // Long panels are subdivided so each holds at most half a wavelength of phase (π rad).
            int pieces = Math.Max(1, (int)Math.Ceiling((x1 - x0) / Math.PI));
            double w = (x1 - x0) / pieces;
            for (int p = 0; p < pieces; p++)
            {
                double c = x0 + (p + 0.5) * w, half = 0.5 * w;
                for (int q = 0; q < Rule.Order; q++)
                    sum += Rule.GetWeight(q) * half * f(c + half * Rule.GetAbscissa(q));
            }
        }
        return sum;
    }
}
