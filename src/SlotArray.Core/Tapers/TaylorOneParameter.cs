using MathNet.Numerics;
using MathNet.Numerics.Integration;

namespace SlotArray.Core.Tapers;

/// <summary>
/// Taylor one-parameter line source (T. T. Taylor, Hughes Aircraft Co. Tech. Memo. 324, 1953; R. C. Hansen,
/// <i>Phased Array Antennas</i>, Wiley): g(p) = I0(πB√(1 − p²)), p = 2x/L ∈ [−1, 1], pattern
/// sinh(π√(B² − u²))/(π√(B² − u²)); the sidelobes fall off like 1/u.
/// </summary>
internal static class TaylorOneParameter
{
    /// <summary>
    /// |sin x / x| at its first sidelobe, x = 4.493409457909064 (first positive root of tan x = x; Abramowitz &amp;
    /// Stegun Table 4.19, from memory; recomputed here to 16 digits): 0.2172336282112217 (−13.2615 dB).
    /// </summary>
    public const double UniformFirstSidelobe = 0.2172336282112217;

    /// <summary>
    /// B from the sidelobe level: SLL = 20 log10(sinh(πB)/(πB) / 0.2172336) (Taylor 1953), solved by Brent's method on (0, 20].
    /// </summary>
    /// <param name="sidelobeLevelDb">Design sidelobe level, negative dB, −13.3 … −150.</param>
    public static double B(double sidelobeLevelDb)
    {
        TaperMath.CheckLevel(sidelobeLevelDb, 13.3, 150, "Taylor one-parameter");
        double target = TaperMath.RatioFromLevel(sidelobeLevelDb) * UniformFirstSidelobe;
        return FindRoots.OfFunction(b => Math.Log(Math.Sinh(Math.PI * b) / (Math.PI * b)) - Math.Log(target), 1e-6, 20, 1e-13, 200);
    }

    /// <summary>The distribution g(p) = I0(πB√(1 − p²)), p = 2x/L (Taylor 1953), not normalised (g(±1) = 1).</summary>
    /// <param name="b">Taylor's B.</param>
    /// <param name="p">Normalised position, −1 … 1.</param>
    public static double Distribution(double b, double p) => SpecialFunctions.BesselI0(Math.PI * b * Math.Sqrt(Math.Max(0, 1 - p * p)));

    /// <summary>Weights sampled at the element centres with L = N d: p_n = 2(n − (N − 1)/2)/N; normalised to max 1.</summary>
    /// <param name="count">Number of elements, 2 … 100,000.</param>
    /// <param name="sidelobeLevelDb">Design sidelobe level, negative dB, −13.3 … −150.</param>
    public static double[] Weights(int count, double sidelobeLevelDb)
    {
        TaperMath.CheckCount(count);
        double b = B(sidelobeLevelDb);
        var w = new double[count];
        for (int n = 0; n < count; n++) w[n] = Distribution(b, 2 * TaperMath.CellCentre(n, count));
        return TaperMath.NormalizeToPeak(w);
    }

    /// <summary>
    /// Taper efficiency of the continuous source, |∫g dp|² / (2 ∫g² dp) over p ∈ [−1, 1] (the standard definition), by 64-point
    /// Gauss–Legendre quadrature.
    /// </summary>
    /// <param name="b">Taylor's B.</param>
    public static double ContinuousTaperEfficiency(double b)
    {
        double s = GaussLegendreRule.Integrate(p => Distribution(b, p), -1, 1, 64);
        double s2 = GaussLegendreRule.Integrate(p => Math.Pow(Distribution(b, p), 2), -1, 1, 64);
        return s * s / (2 * s2);
    }

    /// <summary>Edge illumination g(±1)/g(0) = 1/I0(πB), dB.</summary>
    /// <param name="b">Taylor's B.</param>
    public static double EdgeIlluminationDb(double b) => -20 * Math.Log10(SpecialFunctions.BesselI0(Math.PI * b));
}
