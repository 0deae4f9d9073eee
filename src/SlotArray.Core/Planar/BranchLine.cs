using System.Numerics;

namespace SlotArray.Core.Planar;

/// <summary>
/// One centre-fed branch guide as a multiport at one frequency (normalised to its Z_TE): the open-circuit impedances
/// between its slot nodes (<see cref="Z"/>), from each node to its centre series port (<see cref="Zport"/>) and of the
/// port itself (<see cref="Zpp"/>). See <see cref="PlanarNetwork"/> for the formulas and their source.
/// </summary>
/// <param name="Z">Node-to-node impedances (stick order); zero between the two halves.</param>
/// <param name="Zport">Node-to-port transfer impedance (port current entering the left half's junction end).</param>
/// <param name="Zpp">Port self impedance, tanh γL_left + tanh γL_right.</param>
internal sealed record BranchLine(Complex[,] Z, Complex[] Zport, Complex Zpp)
{
    /// <summary>The branch's multiport at propagation constant γ (1/m) of its guide.</summary>
    public static BranchLine Of(PlanarBranch branch, Complex gamma)
    {
        ArgumentNullException.ThrowIfNull(branch);
        var d = branch.Stick;
        int n = d.Count;
        double lLeft = d.FeedPlane.Meters;
        double far = d.Slots[n - 1].Position.Meters + (d.FarTermination ?? throw new ArgumentException("a branch is a centre-fed stick with two shorts", nameof(branch))).Distance.Meters;
        double lRight = far - lLeft;
        var left = new bool[n];
        var pos = new double[n];
        for (int k = 0; k < n; k++)
        {
            double z = d.Slots[k].Position.Meters;
            left[k] = z < lLeft;
            pos[k] = left[k] ? z : far - z;   // from the half's own short
        }
        var zz = new Complex[n, n];
        var zp = new Complex[n];
        for (int k = 0; k < n; k++)
        {
            double len = left[k] ? lLeft : lRight;
            zp[k] = (left[k] ? 1 : -1) * Half(gamma, pos[k], len, len);
            for (int m = 0; m < n; m++)
                if (left[k] == left[m]) zz[k, m] = Half(gamma, pos[k], pos[m], len);
        }
        return new BranchLine(zz, zp, Complex.Tanh(gamma * lLeft) + Complex.Tanh(gamma * lRight));
    }

    /// <summary>Z(z1, z2) = sinh(γ z&lt;) cosh(γ(L − z&gt;))/cosh(γL) of a line shorted at 0 and open at L.</summary>
    private static Complex Half(Complex gamma, double z1, double z2, double length)
    {
        double lo = Math.Min(z1, z2), hi = Math.Max(z1, z2);
        return Complex.Sinh(gamma * lo) * Complex.Cosh(gamma * (length - hi)) / Complex.Cosh(gamma * length);
    }
}
