using System.Numerics;

namespace SlotArray.Core.Network;

/// <summary>
/// LU factorisation with partial pivoting of a dense complex matrix, and the solution of A x = b from it: the
/// Crout/Doolittle "jki" form of Golub and Van Loan (G. H. Golub and C. F. Van Loan, <i>Matrix Computations</i>, 4th ed.,
/// Johns Hopkins 2013, Sec. 3.4, from memory), with the pivot of largest modulus in each column. It performs exactly the
/// arithmetic of MathNet.Numerics' managed complex LU and its factored solve, element by element and in the same order
/// (a test holds the factors and the solution to MathNet's bit for bit), so that the coupled network solves give the same
/// numbers as before; it is faster because the real and imaginary parts are kept in separate column-major arrays and each
/// column step updates the rows below the diagonal several at a time with <see cref="Vector{T}"/> (the per-element
/// operations and their order unchanged, no fused multiply–add).
/// </summary>
internal sealed class ComplexLu
{
    private readonly int order;
    private readonly double[] re, im;   // the factors, column-major: L below the diagonal (unit diagonal), U on and above
    private readonly int[] pivots;

    private ComplexLu(int order, double[] re, double[] im, int[] pivots)
    {
        this.order = order;
        this.re = re;
        this.im = im;
        this.pivots = pivots;
    }

    /// <summary>Factorises the n × n matrix given column-major (element (i, j) at j n + i); the input is not changed.</summary>
    /// <param name="columnMajor">The matrix, n² values.</param>
    /// <param name="n">Its order (&gt; 0).</param>
    public static ComplexLu Factor(ReadOnlySpan<Complex> columnMajor, int n)
    {
        if (n <= 0) throw new ArgumentOutOfRangeException(nameof(n), n, "the matrix order must be positive");
        if (columnMajor.Length != n * n) throw new ArgumentException($"{columnMajor.Length} values for a {n} × {n} matrix", nameof(columnMajor));
        var re = new double[n * n];
        var im = new double[n * n];
        for (int i = 0; i < re.Length; i++) { re[i] = columnMajor[i].Real; im[i] = columnMajor[i].Imaginary; }
        var pivots = new int[n];
        for (int i = 0; i < n; i++) pivots[i] = i;
        var colRe = new double[n];
        var colIm = new double[n];
        var sRe = new double[n];
        var sIm = new double[n];
        for (int j = 0; j < n; j++)
        {
            int at = j * n;
            Array.Copy(re, at, colRe, 0, n);
            Array.Copy(im, at, colIm, 0, n);
            Array.Clear(sRe);
            Array.Clear(sIm);
            // s_i = Σ_{k < min(i, j)} L_ik c_k, each sum taken in ascending k as in the row-by-row form; c_k is final once
            // every k' < k has been added into s_k, so k can be the outer loop and the rows i > k the inner, vector loop.
            for (int k = 0; k < j; k++)
            {
                colRe[k] -= sRe[k];
                colIm[k] -= sIm[k];
                double cr = colRe[k], ci = colIm[k];
                AddProducts(re.AsSpan(k * n + k + 1, n - k - 1), im.AsSpan(k * n + k + 1, n - k - 1), cr, ci,
                    sRe.AsSpan(k + 1), sIm.AsSpan(k + 1));
            }
            for (int i = j; i < n; i++) { colRe[i] -= sRe[i]; colIm[i] -= sIm[i]; }
            Array.Copy(colRe, 0, re, at, n);
            Array.Copy(colIm, 0, im, at, n);

            int p = j;
            double largest = Complex.Abs(new Complex(re[at + j], im[at + j]));
            for (int i = j + 1; i < n; i++)
            {
                double modulus = Complex.Abs(new Complex(re[at + i], im[at + i]));
                if (modulus > largest) { p = i; largest = modulus; }
            }
            if (p != j)
            {
                for (int k = 0; k < n; k++)
                {
                    int kp = k * n + p, kj = k * n + j;
                    (re[kp], re[kj]) = (re[kj], re[kp]);
                    (im[kp], im[kj]) = (im[kj], im[kp]);
                }
                pivots[j] = p;
            }
            var diagonal = new Complex(re[at + j], im[at + j]);
            if (diagonal != Complex.Zero)
                for (int i = j + 1; i < n; i++)
                {
                    var q = new Complex(re[at + i], im[at + i]) / diagonal;
                    re[at + i] = q.Real;
                    im[at + i] = q.Imaginary;
                }
        }
        return new ComplexLu(n, re, im, pivots);
    }

    /// <summary>s_i += l_i c for each i, with the complex product (l_r c_r − l_i c_i, l_i c_r + l_r c_i) as <see cref="Complex"/> forms it.</summary>
    private static void AddProducts(ReadOnlySpan<double> lRe, ReadOnlySpan<double> lIm, double cr, double ci, Span<double> sRe, Span<double> sIm)
    {
        int count = lRe.Length, i = 0;
        if (Vector.IsHardwareAccelerated && count >= Vector<double>.Count)
        {
            var vcr = new Vector<double>(cr);
            var vci = new Vector<double>(ci);
            for (; i <= count - Vector<double>.Count; i += Vector<double>.Count)
            {
                var lr = new Vector<double>(lRe[i..]);
                var li = new Vector<double>(lIm[i..]);
                var pr = lr * vcr - li * vci;
                var pi = li * vcr + lr * vci;
                (new Vector<double>(sRe[i..]) + pr).CopyTo(sRe[i..]);
                (new Vector<double>(sIm[i..]) + pi).CopyTo(sIm[i..]);
            }
        }
        for (; i < count; i++)
        {
            double pr = lRe[i] * cr - lIm[i] * ci;
            double pi = lIm[i] * cr + lRe[i] * ci;
            sRe[i] += pr;
            sIm[i] += pi;
        }
    }

    /// <summary>Solves A x = b for one right-hand side.</summary>
    /// <param name="b">The right-hand side, n values.</param>
    public Complex[] Solve(ReadOnlySpan<Complex> b)
    {
        if (b.Length != order) throw new ArgumentException($"{b.Length} values for a system of order {order}", nameof(b));
        var x = b.ToArray();
        for (int i = 0; i < order; i++)
            if (pivots[i] != i) (x[pivots[i]], x[i]) = (x[i], x[pivots[i]]);
        for (int k = 0; k < order; k++)
        {
            var xk = x[k];
            for (int i = k + 1; i < order; i++) x[i] -= xk * new Complex(re[k * order + i], im[k * order + i]);
        }
        for (int k = order - 1; k >= 0; k--)
        {
            x[k] /= new Complex(re[k * order + k], im[k * order + k]);
            var xk = x[k];
            for (int i = 0; i < k; i++) x[i] -= xk * new Complex(re[k * order + i], im[k * order + i]);
        }
        return x;
    }
}
