namespace SlotArray.Core.Tapers;

/// <summary>
/// Cosine-to-a-power on a pedestal: g(p) = P + (1 − P) cos^q(πp/2), p = 2x/L ∈ [−1, 1], with the pedestal P the
/// amplitude at the aperture edge p = ±1 relative to the centre, given as an edge level in dB: P = 10^(edge/20).
/// Common practice, no primary source located (the family appears in the radar-antenna literature's tables of
/// aperture distributions, from memory). Sampled like the other line sources at the element centres with L = N d,
/// so the outermost element sits half a cell inside the edge and is slightly above P.
/// </summary>
internal static class CosinePedestal
{
    /// <summary>The distribution g(p) (not normalised; g(0) = 1, g(±1) = P).</summary>
    /// <param name="pedestal">P, 0 … 1.</param>
    /// <param name="exponent">q ≥ 1.</param>
    /// <param name="p">Normalised position, −1 … 1.</param>
    public static double Distribution(double pedestal, double exponent, double p)
        => pedestal + (1 - pedestal) * Math.Pow(Math.Max(0, Math.Cos(Math.PI * p / 2)), exponent);

    /// <summary>Weights sampled at p_n = 2(n − (N − 1)/2)/N; normalised to max 1.</summary>
    /// <param name="count">Number of elements, 2 … 100,000.</param>
    /// <param name="edgeLevelDb">Aperture-edge level, dB, −100 … 0 (0 gives uniform).</param>
    /// <param name="exponent">Exponent q, 1 … 20 (2: cosine-squared on a pedestal, the usual choice).</param>
    public static double[] Weights(int count, double edgeLevelDb, double exponent)
    {
        TaperMath.CheckCount(count);
        if (!(edgeLevelDb <= 0 && edgeLevelDb >= -100))
            throw new ArgumentOutOfRangeException(nameof(edgeLevelDb), edgeLevelDb, $"The cosine-pedestal edge level must be between −100 and 0 dB (e.g. −20); got {edgeLevelDb} dB.");
        if (!(exponent >= 1 && exponent <= 20))
            throw new ArgumentOutOfRangeException(nameof(exponent), exponent, $"The cosine-pedestal exponent q must be between 1 and 20 (2 is usual); got {exponent}.");
        double ped = Math.Pow(10, edgeLevelDb / 20);
        var w = new double[count];
        for (int n = 0; n < count; n++) w[n] = Distribution(ped, exponent, 2 * TaperMath.CellCentre(n, count));
        return TaperMath.NormalizeToPeak(w);
    }
}
