using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;

namespace SlotArray.Core.Patterns;

/// <summary>
/// Sine and cosine of four doubles at once, for the array-factor direct sum. Cody–Waite reduction by π/2 with the
/// two-part constant of fdlibm (Sun Microsystems, e_rem_pio2.c: pio2_1, pio2_1t), then the fdlibm kernel polynomials
/// on |r| ≤ π/4 (k_sin.c S1…S6, k_cos.c C1…C6; Sun's freely distributable fdlibm 5.3, 1993). Accurate to a few ulp
/// for |x| ≲ 1e5 rad (q·pio2_1 stays exact while |q| &lt; 2^20), far beyond any array's k·z·sin θ.
/// </summary>
internal static class VectorTrig
{
    private const double TwoOverPi = 6.36619772367581382433e-01;
    private const double Pio2Hi = 1.57079632673412561417e+00;
    private const double Pio2Lo = 6.07710050650619224932e-11;
    private const double S1 = -1.66666666666666324348e-01, S2 = 8.33333333332248946124e-03, S3 = -1.98412698298579493134e-04,
        S4 = 2.75573137070700676789e-06, S5 = -2.50507602534068634195e-08, S6 = 1.58969099521155010221e-10;
    private const double C1 = 4.16666666666666019037e-02, C2 = -1.38888888888741095749e-03, C3 = 2.48015872894767294178e-05,
        C4 = -2.75573143513906633035e-07, C5 = 2.08757232129817482790e-09, C6 = -1.13596475577881948265e-11;

    /// <summary>(sin x, cos x) lane by lane.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static (Vector256<double> Sin, Vector256<double> Cos) SinCos(Vector256<double> x)
    {
        var q = Vector256.Floor(x * Vector256.Create(TwoOverPi) + Vector256.Create(0.5));
        var r = x - q * Vector256.Create(Pio2Hi) - q * Vector256.Create(Pio2Lo);
        var z = r * r;
        var ps = Vector256.Create(S5) + z * Vector256.Create(S6);
        ps = Vector256.Create(S4) + z * ps;
        ps = Vector256.Create(S3) + z * ps;
        ps = Vector256.Create(S2) + z * ps;
        ps = Vector256.Create(S1) + z * ps;
        var s = r + r * z * ps;
        var pc = Vector256.Create(C5) + z * Vector256.Create(C6);
        pc = Vector256.Create(C4) + z * pc;
        pc = Vector256.Create(C3) + z * pc;
        pc = Vector256.Create(C2) + z * pc;
        pc = Vector256.Create(C1) + z * pc;
        var c = Vector256.Create(1.0) - Vector256.Create(0.5) * z + z * z * pc;
        // quadrant m = q mod 4 ∈ {0, 1, 2, 3}
        var m = q - Vector256.Create(4.0) * Vector256.Floor(q * Vector256.Create(0.25));
        var odd = Vector256.Equals(m, Vector256.Create(1.0)) | Vector256.Equals(m, Vector256.Create(3.0));
        var sinBase = Vector256.ConditionalSelect(odd, c, s);
        var cosBase = Vector256.ConditionalSelect(odd, s, c);
        var negSin = Vector256.GreaterThanOrEqual(m, Vector256.Create(2.0));
        var negCos = Vector256.Equals(m, Vector256.Create(1.0)) | Vector256.Equals(m, Vector256.Create(2.0));
        var sign = Vector256.Create(-0.0);
        return (sinBase ^ (negSin & sign), cosBase ^ (negCos & sign));
    }

    /// <summary>
    /// (sin x, cos x) lane by lane, eight at once: the same operations in the same order as the four-lane
    /// <see cref="SinCos(Vector256{double})"/>, so each lane's result is bit for bit that of the four-lane kernel (no
    /// multiply-add is fused in either). A copy, not one generic kernel: the interface over both vector widths
    /// (ISimdVector) is not public in .NET 10.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static (Vector512<double> Sin, Vector512<double> Cos) SinCos(Vector512<double> x)
    {
        var q = Vector512.Floor(x * Vector512.Create(TwoOverPi) + Vector512.Create(0.5));
        var r = x - q * Vector512.Create(Pio2Hi) - q * Vector512.Create(Pio2Lo);
        var z = r * r;
        var ps = Vector512.Create(S5) + z * Vector512.Create(S6);
        ps = Vector512.Create(S4) + z * ps;
        ps = Vector512.Create(S3) + z * ps;
        ps = Vector512.Create(S2) + z * ps;
        ps = Vector512.Create(S1) + z * ps;
        var s = r + r * z * ps;
        var pc = Vector512.Create(C5) + z * Vector512.Create(C6);
        pc = Vector512.Create(C4) + z * pc;
        pc = Vector512.Create(C3) + z * pc;
        pc = Vector512.Create(C2) + z * pc;
        pc = Vector512.Create(C1) + z * pc;
        var c = Vector512.Create(1.0) - Vector512.Create(0.5) * z + z * z * pc;
        var m = q - Vector512.Create(4.0) * Vector512.Floor(q * Vector512.Create(0.25));
        var odd = Vector512.Equals(m, Vector512.Create(1.0)) | Vector512.Equals(m, Vector512.Create(3.0));
        var sinBase = Vector512.ConditionalSelect(odd, c, s);
        var cosBase = Vector512.ConditionalSelect(odd, s, c);
        var negSin = Vector512.GreaterThanOrEqual(m, Vector512.Create(2.0));
        var negCos = Vector512.Equals(m, Vector512.Create(1.0)) | Vector512.Equals(m, Vector512.Create(2.0));
        var sign = Vector512.Create(-0.0);
        return (sinBase ^ (negSin & sign), cosBase ^ (negCos & sign));
    }
}
