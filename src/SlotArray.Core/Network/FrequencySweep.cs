using SlotArray.Core.Quantities;

namespace SlotArray.Core.Network;

/// <summary>
/// The array's network over a frequency grid, plus the solution at the design frequency itself.
/// </summary>
/// <param name="DesignFrequency">The design frequency.</param>
/// <param name="AtDesign">The solution at the design frequency.</param>
/// <param name="Points">Solutions on the grid, in ascending frequency.</param>
internal sealed record FrequencySweep(Frequency DesignFrequency, NetworkSolution AtDesign, IReadOnlyList<NetworkSolution> Points)
{
    /// <summary>
    /// The band around the design frequency with VSWR ≤ <paramref name="vswrLimit"/>, from the grid: each edge lies
    /// where |S11| crosses (VSWR − 1)/(VSWR + 1), interpolated linearly in |S11| between the two grid points (or
    /// between the design frequency and the nearest grid point) that straddle it; an edge at the end of the grid is
    /// marked limited. Null when the VSWR at the design frequency exceeds the limit.
    /// </summary>
    /// <param name="vswrLimit">VSWR limit, &gt; 1.</param>
    public MatchBand? Band(double vswrLimit)
    {
        if (!(vswrLimit > 1)) throw new ArgumentOutOfRangeException(nameof(vswrLimit), vswrLimit, "the VSWR limit must exceed 1");
        double limit = ArrayNetwork.ReflectionOf(vswrLimit);
        if (AtDesign.S11.Magnitude > limit) return null;
        double f0 = DesignFrequency.Hertz;
        var above = Points.Where(p => p.Frequency.Hertz > f0).ToList();
        var below = Points.Where(p => p.Frequency.Hertz < f0).Reverse().ToList();
        var (hi, hiLimited) = Edge(above, limit);
        var (lo, loLimited) = Edge(below, limit);
        return new MatchBand(vswrLimit, Frequency.FromHertz(lo), Frequency.FromHertz(hi), loLimited, hiLimited, DesignFrequency);
    }

    private (double Edge, bool Limited) Edge(List<NetworkSolution> outward, double limit)
    {
        double f = DesignFrequency.Hertz, m = AtDesign.S11.Magnitude;
        foreach (var p in outward)
        {
            double mp = p.S11.Magnitude;
            if (mp > limit)
                return (f + (limit - m) / (mp - m) * (p.Frequency.Hertz - f), false);
            f = p.Frequency.Hertz;
            m = mp;
        }
        return (f, true);
    }
}
