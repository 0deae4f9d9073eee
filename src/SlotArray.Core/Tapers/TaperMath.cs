namespace SlotArray.Core.Tapers;

/// <summary>Shared pieces of the taper methods: level conversions, normalisation, the Chebyshev polynomial, validation.</summary>
internal static class TaperMath
{
    /// <summary>Main-lobe-to-sidelobe voltage ratio R = 10^(SLL/20) from a level given as a negative dB value.</summary>
    public static double RatioFromLevel(double sidelobeLevelDb) => Math.Pow(10, -sidelobeLevelDb / 20);

    /// <summary>Element position in units of the aperture length L = N d: x_n/L = (n − (N − 1)/2)/N (the sampling of Taylor 1955 that scipy.signal.windows.taylor uses).</summary>
    public static double CellCentre(int n, int count) => (n - (count - 1) / 2.0) / count;

    /// <summary>
    /// Highest local maximum of |F(u)| over [start, stop], dB (20 log10, F normalised to F(0) = 1): sampled at step h,
    /// each sampled maximum refined by a parabola through its two neighbours. Used for the continuous Taylor patterns.
    /// </summary>
    /// <param name="pattern">F(u).</param>
    /// <param name="start">First u (e.g. the first moved zero).</param>
    /// <param name="stop">Last u.</param>
    /// <param name="h">Sampling step.</param>
    public static double ContinuousPeakSidelobeDb(Func<double, double> pattern, double start, double stop, double h)
    {
        double best = 0;
        double prev2 = Math.Abs(pattern(start)), prev = Math.Abs(pattern(start + h));
        for (double u = start + 2 * h; u <= stop; u += h)
        {
            double cur = Math.Abs(pattern(u));
            if (prev >= prev2 && prev >= cur)
            {
                double denom = prev2 - 2 * prev + cur;
                double t = denom != 0 ? 0.5 * (prev2 - cur) / denom : 0;
                best = Math.Max(best, Math.Abs(pattern(u - h + t * h)));
            }
            prev2 = prev;
            prev = cur;
        }
        return 20 * Math.Log10(best);
    }

    /// <summary>Divides by the largest magnitude so that max |a| = 1.</summary>
    public static double[] NormalizeToPeak(double[] a)
    {
        double peak = 0;
        foreach (double v in a) peak = Math.Max(peak, Math.Abs(v));
        if (!(peak > 0) || double.IsInfinity(peak)) throw new ArgumentException("The weights are all zero or not finite.");
        for (int i = 0; i < a.Length; i++) a[i] /= peak;
        return a;
    }

    /// <summary>
    /// Chebyshev polynomial of the first kind: cos(n acos x) for |x| ≤ 1, cosh(n acosh x) for x &gt; 1 and
    /// (−1)^n cosh(n acosh(−x)) for x &lt; −1 (Abramowitz &amp; Stegun 22.3.15, from memory).
    /// </summary>
    public static double ChebyshevT(int n, double x)
    {
        if (Math.Abs(x) <= 1) return Math.Cos(n * Math.Acos(x));
        double v = Math.Cosh(n * Math.Acosh(Math.Abs(x)));
        return x > 0 || n % 2 == 0 ? v : -v;
    }

    /// <summary>Throws unless 2 ≤ count ≤ 100,000.</summary>
    public static void CheckCount(int count)
    {
        if (count is < 2 or > 100_000)
            throw new ArgumentOutOfRangeException(nameof(count), count, $"A taper needs between 2 and 100,000 elements; {count} were asked for.");
    }

    /// <summary>Throws unless the design sidelobe level is a negative dB value in [−maximum, −minimum].</summary>
    public static void CheckLevel(double sidelobeLevelDb, double minimum, double maximum, string method)
    {
        if (!(sidelobeLevelDb <= -minimum && sidelobeLevelDb >= -maximum))
            throw new ArgumentOutOfRangeException(nameof(sidelobeLevelDb), sidelobeLevelDb,
                $"The {method} sidelobe level must be a negative dB value between −{maximum} and −{minimum} dB (e.g. −30); got {sidelobeLevelDb} dB.");
    }

    /// <summary>Throws unless 2 ≤ n̄ ≤ maximum.</summary>
    public static void CheckNbar(int nbar, int maximum, string method, string why)
    {
        if (nbar < 2 || nbar > maximum)
            throw new ArgumentOutOfRangeException(nameof(nbar), nbar, $"The {method} n̄ must be between 2 and {maximum} ({why}); got {nbar}.");
    }
}
