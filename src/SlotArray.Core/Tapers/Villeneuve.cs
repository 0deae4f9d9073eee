namespace SlotArray.Core.Tapers;

/// <summary>
/// Villeneuve n̄ taper for discrete arrays (A. T. Villeneuve, "Taylor patterns for discrete arrays", IEEE Trans.
/// AP-32(10), 1089–1093, 1984): the first n̄ − 1 zeros of the N-element Dolph–Chebyshev
/// pattern are dilated by σ_V = (2πn̄/N)/ψ^C_{n̄}, the rest placed at the uniform array's zeros 2πp/N.
/// </summary>
internal static class Villeneuve
{
    /// <summary>σ_V = (2π n̄/N)/ψ^C_{n̄} (Villeneuve 1984).</summary>
    /// <param name="count">Number of elements.</param>
    /// <param name="sidelobeLevelDb">Design sidelobe level, negative dB.</param>
    /// <param name="nbar">n̄.</param>
    public static double Sigma(int count, double sidelobeLevelDb, int nbar)
        => 2 * Math.PI * nbar / count / DolphChebyshev.Zeros(count, sidelobeLevelDb)[nbar - 1];

    /// <summary>
    /// The zeros ψ_p, p = 1 … ⌊(N − 1)/2⌋ (each a pair ±ψ_p; for even N the pattern also has its single zero at ψ = π):
    /// σ_V ψ^C_p for p &lt; n̄, 2πp/N for p ≥ n̄ (Villeneuve 1984).
    /// </summary>
    /// <param name="count">Number of elements.</param>
    /// <param name="sidelobeLevelDb">Design sidelobe level, negative dB.</param>
    /// <param name="nbar">n̄.</param>
    public static double[] Zeros(int count, double sidelobeLevelDb, int nbar)
    {
        var cheb = DolphChebyshev.Zeros(count, sidelobeLevelDb);
        double sigma = 2 * Math.PI * nbar / count / cheb[nbar - 1];
        return Enumerable.Range(1, (count - 1) / 2).Select(p => p < nbar ? sigma * cheb[p - 1] : 2 * Math.PI * p / count).ToArray();
    }

    /// <summary>
    /// Weights from the pattern samples at ψ_q = 2πq/N, of which only q &lt; n̄ are non-zero:
    /// I_n = (1/N)[AF(0) + 2 Σ_{q=1}^{n̄−1} AF(2πq/N) cos(2πq x̃_n/N)], x̃_n = n − (N − 1)/2, with
    /// AF(ψ) ∝ Π_p (cos ψ − cos ψ_p) × cos(ψ/2) for even N ([D]), each factor divided by its value at ψ = 0.
    /// Normalised to max 1.
    /// </summary>
    /// <param name="count">Number of elements, 4 … 100,000.</param>
    /// <param name="sidelobeLevelDb">Design sidelobe level, negative dB, −13.3 … −100.</param>
    /// <param name="nbar">n̄, 2 … ⌊(N − 1)/2⌋.</param>
    public static double[] Weights(int count, double sidelobeLevelDb, int nbar)
    {
        TaperMath.CheckCount(count);
        TaperMath.CheckLevel(sidelobeLevelDb, 13.3, 100, "Villeneuve");
        TaperMath.CheckNbar(nbar, Math.Max(2, (count - 1) / 2), "Villeneuve", $"at most (N − 1)/2 for N = {count}: use a smaller n̄ or more elements");
        if ((count - 1) / 2 < nbar)
            throw new ArgumentOutOfRangeException(nameof(count), count, $"Villeneuve n̄ = {nbar} needs at least {2 * nbar + 1} elements: use more elements or a smaller n̄.");
        var zeros = Zeros(count, sidelobeLevelDb, nbar);
        var cosZ = zeros.Select(Math.Cos).ToArray();
        var af = new double[nbar];
        for (int q = 0; q < nbar; q++)
        {
            double psi = 2 * Math.PI * q / count, v = count % 2 == 0 ? Math.Cos(psi / 2) : 1, c = Math.Cos(psi);
            foreach (double cz in cosZ) v *= (c - cz) / (1 - cz);   // scaled by AF(0) factor by factor: no overflow at large N
            af[q] = v;
        }
        var w = new double[count];
        for (int n = 0; n < count; n++)
        {
            double xt = n - (count - 1) / 2.0, s = af[0];
            for (int q = 1; q < nbar; q++) s += 2 * af[q] * Math.Cos(2 * Math.PI * q * xt / count);
            w[n] = s;
        }
        return TaperMath.NormalizeToPeak(w);
    }
}
