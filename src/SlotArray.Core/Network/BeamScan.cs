namespace SlotArray.Core.Network;

/// <summary>How fast the main beam moves with frequency, fitted over a sweep.</summary>
internal static class BeamScan
{
    /// <summary>
    /// The least-squares slope of the beam direction against frequency over <paramref name="points"/> (ordinary least
    /// squares, slope = Σ(f − f̄)(θ − θ̄)/Σ(f − f̄)²), in degrees per 100 MHz; NaN with fewer than 2 points or a single frequency.
    /// </summary>
    /// <param name="points">The figures at each sweep frequency.</param>
    public static double DegreesPer100MHz(IReadOnlyList<FrequencyFigures> points)
    {
        ArgumentNullException.ThrowIfNull(points);
        if (points.Count < 2) return double.NaN;
        double mf = points.Average(p => p.Frequency.Hertz), mb = points.Average(p => p.Metrics.BeamDirection.Degrees);
        double sxy = points.Sum(p => (p.Frequency.Hertz - mf) * (p.Metrics.BeamDirection.Degrees - mb));
        double sxx = points.Sum(p => (p.Frequency.Hertz - mf) * (p.Frequency.Hertz - mf));
        return sxx > 0 ? sxy / sxx * 1e8 : double.NaN;
    }
}
