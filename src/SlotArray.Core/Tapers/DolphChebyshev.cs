using MathNet.Numerics.IntegralTransforms;
using Complex = System.Numerics.Complex;

namespace SlotArray.Core.Tapers;

/// <summary>
/// Dolph–Chebyshev taper: the narrowest beam for a given equal-ripple sidelobe level (C. L. Dolph, "A current
/// distribution for broadside arrays which optimizes the relationship between beam width and side-lobe level",
/// Proc. IRE 34, 335–348, 1946). Pattern AF(ψ) = T_{N−1}(x0 cos(ψ/2)), x0 = cosh(acosh(R)/(N − 1))
/// (Dolph 1946).
/// </summary>
internal static class DolphChebyshev
{
    /// <summary>x0 = cosh(acosh(R)/(N − 1)), the argument that maps the main-beam peak to T_{N−1}(x0) = R (Dolph 1946).</summary>
    /// <param name="count">Number of elements, ≥ 2.</param>
    /// <param name="sidelobeLevelDb">Design sidelobe level, negative dB.</param>
    public static double X0(int count, double sidelobeLevelDb)
        => Math.Cosh(Math.Acosh(TaperMath.RatioFromLevel(sidelobeLevelDb)) / (count - 1));

    /// <summary>
    /// The Chebyshev array factor AF(ψ) = T_{N−1}(x0 cos(ψ/2)) with ψ = k d sin θ (peak R at ψ = 0, sidelobes ±1).
    /// </summary>
    /// <param name="count">Number of elements.</param>
    /// <param name="x0">x0 from <see cref="X0"/>.</param>
    /// <param name="psi">Inter-element phase ψ, rad.</param>
    public static double ArrayFactor(int count, double x0, double psi) => TaperMath.ChebyshevT(count - 1, x0 * Math.Cos(psi / 2));

    /// <summary>
    /// Pattern zeros ψ_p = 2 acos(cos((2p − 1)π/(2(N − 1)))/x0), p = 1 … N − 1, increasing (Dolph 1946).
    /// </summary>
    /// <param name="count">Number of elements, ≥ 2.</param>
    /// <param name="sidelobeLevelDb">Design sidelobe level, negative dB.</param>
    public static double[] Zeros(int count, double sidelobeLevelDb)
    {
        double x0 = X0(count, sidelobeLevelDb);
        return Enumerable.Range(1, count - 1)
            .Select(p => 2 * Math.Acos(Math.Cos((2 * p - 1) * Math.PI / (2.0 * (count - 1))) / x0)).ToArray();
    }

    /// <summary>
    /// Exact weights for any N: sample the pattern at ψ_q = 2πq/N and invert the DFT,
    /// I_n = (1/N) Σ_q AF(ψ_q) e^{−j x̃_n ψ_q}, x̃_n = n − (N − 1)/2 (derived here [D]). The sum is one FFT
    /// of b_q = AF(ψ_q) e^{jπq(N−1)/N} (MathNet Fourier, Bluestein for N not a power of two), O(N log N).
    /// Normalised to max |I| = 1; equal to scipy.signal.windows.chebwin to rounding.
    /// </summary>
    /// <param name="count">Number of elements, 2 … 100,000.</param>
    /// <param name="sidelobeLevelDb">Design sidelobe level, negative dB, −1 … −300.</param>
    public static double[] Weights(int count, double sidelobeLevelDb)
    {
        TaperMath.CheckCount(count);
        TaperMath.CheckLevel(sidelobeLevelDb, 1, 300, "Dolph–Chebyshev");
        double x0 = X0(count, sidelobeLevelDb);
        var b = new Complex[count];
        for (int q = 0; q < count; q++)
        {
            double psi = 2 * Math.PI * q / count;
            b[q] = ArrayFactor(count, x0, psi) * Complex.FromPolarCoordinates(1, Math.PI * q * (count - 1) / count);
        }
        Fourier.Forward(b, FourierOptions.Matlab);     // e^{−j2πqn/N}, unscaled
        var w = new double[count];
        for (int n = 0; n < count; n++) w[n] = b[n].Real;
        for (int n = 0; n < count / 2; n++)           // the exact weights are symmetric: remove rounding asymmetry
            w[n] = w[count - 1 - n] = 0.5 * (w[n] + w[count - 1 - n]);
        return TaperMath.NormalizeToPeak(w);
    }

    /// <summary>
    /// The same weights by the direct O(N²) DFT of <see cref="Weights"/>, summed with the cosine form
    /// I_n = (1/N) Σ_q AF(ψ_q) cos(x̃_n ψ_q) (the pattern is real and even). The reference for the FFT path.
    /// </summary>
    /// <param name="count">Number of elements.</param>
    /// <param name="sidelobeLevelDb">Design sidelobe level, negative dB.</param>
    public static double[] WeightsByDirectDft(int count, double sidelobeLevelDb)
    {
        TaperMath.CheckCount(count);
        TaperMath.CheckLevel(sidelobeLevelDb, 1, 300, "Dolph–Chebyshev");
        double x0 = X0(count, sidelobeLevelDb);
        var af = new double[count];
        for (int q = 0; q < count; q++) af[q] = ArrayFactor(count, x0, 2 * Math.PI * q / count);
        var w = new double[count];
        for (int n = 0; n < count; n++)
        {
            double xt = n - (count - 1) / 2.0, s = 0;
            for (int q = 0; q < count; q++) s += af[q] * Math.Cos(xt * 2 * Math.PI * q / count);
            w[n] = s / count;
        }
        return TaperMath.NormalizeToPeak(w);
    }
}
