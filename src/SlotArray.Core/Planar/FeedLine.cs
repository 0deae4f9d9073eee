using System.Numerics;
using MathNet.Numerics.LinearAlgebra;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Planar;

/// <summary>
/// The feed guide as a line of series elements between two shorts (see <see cref="PlanarNetwork"/>): positions q along
/// the feed guide (aperture y), the input element and one coupling element per branch. Unknowns of element j are the
/// voltage just before it and the current through it.
/// </summary>
internal sealed class FeedLine
{
    private readonly double[] q;
    private readonly int[] branchOf;   // −1 for the input element
    private readonly int[] elementOfBranch;
    private readonly double left, right;

    private FeedLine(double[] q, int[] branchOf, double left, double right)
    {
        this.q = q;
        this.branchOf = branchOf;
        this.left = left;
        this.right = right;
        elementOfBranch = new int[branchOf.Count(b => b >= 0)];
        for (int j = 0; j < branchOf.Length; j++) if (branchOf[j] >= 0) elementOfBranch[branchOf[j]] = j;
        InputElement = Array.IndexOf(branchOf, -1);
    }

    /// <summary>Number of series elements (branches + the input).</summary>
    public int Count => q.Length;

    /// <summary>Index of the input element.</summary>
    public int InputElement { get; }

    /// <summary>Element index of branch b (0-based, design order).</summary>
    public int ElementOfBranch(int b) => elementOfBranch[b];

    /// <summary>Column of element j's current when the slot unknowns take the first n columns.</summary>
    public int CurrentColumn(int n, int j) => n + 2 * j + 1;

    private static int VoltageColumn(int n, int j) => n + 2 * j;

    /// <summary>The feed line of a design: end feed, input λg/2 (<see cref="PlanarDesign.FeedInputDistance"/>) before the first branch behind a short; centre feed, input at y = 0 between the middle branches.</summary>
    public static FeedLine Of(PlanarDesign design)
    {
        ArgumentNullException.ThrowIfNull(design);
        var ys = design.Branches.Select(b => b.Y).ToArray();
        double sd = design.FeedShortDistance.Meters;
        if (design.FeedPosition == FeedPosition.End)
        {
            double d0 = design.FeedInputDistance.Meters;
            var pos = new[] { 0.0 }.Concat(ys.Select(y => y - ys[0] + d0)).ToArray();
            var owner = new[] { -1 }.Concat(Enumerable.Range(0, ys.Length)).ToArray();
            return new FeedLine(pos, owner, 0, pos[^1] + sd);
        }
        if (ys.Any(y => Math.Abs(y) < 1e-12) || ys.Length % 2 != 0)
            throw new InfeasibleDesignException($"a centre-fed feed guide is fed between the middle two branches, but {ys.Length} branches are fed: use an even number of branches or feed.position: end");
        var list = ys.Select((y, b) => (Y: y, B: b)).Append((Y: 0.0, B: -1)).OrderBy(t => t.Y).ToArray();
        return new FeedLine(list.Select(t => t.Y).ToArray(), list.Select(t => t.B).ToArray(), ys[0] - sd, ys[^1] + sd);
    }

    /// <summary>
    /// Adds the feed's 2P equations in rows n … n + 2P − 1. The drop across a coupling element is added by
    /// <paramref name="addBranchDrop"/>(branch, row, coefficient) as coefficient × drop; the input's drop is I − 2.
    /// </summary>
    public void AddRows(Matrix<Complex> a, MathNet.Numerics.LinearAlgebra.Vector<Complex> rhs, int n, Complex gamma, Action<int, int, Complex> addBranchDrop)
    {
        int p = q.Length, row = n;
        void Drop(int j, int r, Complex coef)
        {
            if (branchOf[j] < 0) { a[r, CurrentColumn(n, j)] += coef; rhs[r] += 2 * coef; }
            else addBranchDrop(branchOf[j], r, coef);
        }
        var (c0, s0) = (Complex.Cosh(gamma * (q[0] - left)), Complex.Sinh(gamma * (q[0] - left)));
        a[row, VoltageColumn(n, 0)] += c0;
        a[row, CurrentColumn(n, 0)] += s0;
        row++;
        for (int j = 0; j + 1 < p; j++)
        {
            var (c, s) = (Complex.Cosh(gamma * (q[j + 1] - q[j])), Complex.Sinh(gamma * (q[j + 1] - q[j])));
            a[row, VoltageColumn(n, j + 1)] += 1;
            a[row, VoltageColumn(n, j)] -= c;
            Drop(j, row, c);
            a[row, CurrentColumn(n, j)] += s;
            row++;
            a[row, CurrentColumn(n, j + 1)] += 1;
            a[row, CurrentColumn(n, j)] -= c;
            a[row, VoltageColumn(n, j)] += s;
            Drop(j, row, -s);
            row++;
        }
        var (ce, se) = (Complex.Cosh(gamma * (right - q[p - 1])), Complex.Sinh(gamma * (right - q[p - 1])));
        a[row, VoltageColumn(n, p - 1)] += ce;
        Drop(p - 1, row, -ce);
        a[row, CurrentColumn(n, p - 1)] -= se;
    }
}
