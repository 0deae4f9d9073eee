namespace SlotArray.Core.Tolerance;

/// <summary>Mean and percentiles of one figure over the trials.</summary>
/// <param name="Mean">Arithmetic mean.</param>
/// <param name="P50">Median.</param>
/// <param name="P90">90th percentile.</param>
/// <param name="P95">95th percentile.</param>
/// <param name="P99">99th percentile.</param>
/// <param name="Minimum">Smallest value.</param>
/// <param name="Maximum">Largest value.</param>
public sealed record SampleSummary(double Mean, double P50, double P90, double P95, double P99, double Minimum, double Maximum)
{
    /// <summary>
    /// Summarises the values (in trial order; the mean is summed in that order, so it is reproducible to the bit).
    /// Percentiles by linear interpolation between order statistics, Q(p) = x_(⌊h⌋) + (h − ⌊h⌋)(x_(⌊h⌋+1) − x_(⌊h⌋)),
    /// h = (n − 1)p on the sorted values (0-based): definition 7 of R. J. Hyndman and Y. Fan, "Sample quantiles in
    /// statistical packages", The American Statistician 50(4), 361–365, 1996 (from memory; the default of R and numpy).
    /// </summary>
    /// <param name="values">At least one finite value.</param>
    public static SampleSummary Of(IReadOnlyList<double> values)
    {
        ArgumentNullException.ThrowIfNull(values);
        if (values.Count == 0) throw new ArgumentException("no values to summarise", nameof(values));
        double sum = 0;
        for (int i = 0; i < values.Count; i++) sum += values[i];
        var sorted = values.ToArray();
        Array.Sort(sorted);
        return new SampleSummary(sum / sorted.Length, Percentile(sorted, 0.50), Percentile(sorted, 0.90), Percentile(sorted, 0.95),
            Percentile(sorted, 0.99), sorted[0], sorted[^1]);
    }

    /// <summary>Percentile p ∈ [0, 1] of sorted values (Hyndman and Fan definition 7, see <see cref="Of"/>).</summary>
    public static double Percentile(IReadOnlyList<double> sorted, double p)
    {
        ArgumentNullException.ThrowIfNull(sorted);
        if (sorted.Count == 0) throw new ArgumentException("no values", nameof(sorted));
        if (!(p >= 0 && p <= 1)) throw new ArgumentOutOfRangeException(nameof(p), p, "the percentile must lie in [0, 1]");
        double h = (sorted.Count - 1) * p;
        int lo = (int)Math.Floor(h);
        if (lo >= sorted.Count - 1) return sorted[^1];
        return sorted[lo] + (h - lo) * (sorted[lo + 1] - sorted[lo]);
    }
}
