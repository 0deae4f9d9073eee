namespace SlotArray.Core.Tolerance;

/// <summary>
/// Percentiles of one sample by selection instead of a full sort: the order statistics that
/// <see cref="SampleSummary.Percentile"/> reads from the sorted values, found by quickselect with a three-way partition
/// (C. A. R. Hoare, "Algorithm 65: Find", Comm. ACM 4(7), 321–322, 1961; the three-way partition of E. W. Dijkstra's
/// "Dutch national flag", <i>A Discipline of Programming</i>, 1976; both from memory). The k-th smallest value is unique,
/// so the percentiles are those of the sorted sample to the bit. Reorders the array it is given.
/// </summary>
internal sealed class OrderStatistics
{
    private readonly double[] values;
    private readonly Dictionary<int, double> found = [];
    private int settled;   // values[0..settled) are all ≤ every value from settled on

    /// <summary>Selects in <paramref name="values"/> (reordered in place; no NaN).</summary>
    public OrderStatistics(double[] values)
    {
        ArgumentNullException.ThrowIfNull(values);
        if (values.Length == 0) throw new ArgumentException("no values", nameof(values));
        this.values = values;
    }

    /// <summary>
    /// Percentile p ∈ [0, 1] by Hyndman and Fan's definition 7 (<see cref="SampleSummary.Percentile"/>); successive calls
    /// must ask for non-decreasing p.
    /// </summary>
    public double Percentile(double p)
    {
        if (!(p >= 0 && p <= 1)) throw new ArgumentOutOfRangeException(nameof(p), p, "the percentile must lie in [0, 1]");
        int n = values.Length;
        double h = (n - 1) * p;
        int lo = (int)Math.Floor(h);
        if (lo >= n - 1) return Select(n - 1);
        double a = Select(lo), b = Select(lo + 1);
        return a + (h - lo) * (b - a);
    }

    /// <summary>The k-th smallest value (0-based): a rank already found, or one above every rank found so far.</summary>
    private double Select(int k)
    {
        if (found.TryGetValue(k, out double known)) return known;
        if (k < settled) throw new InvalidOperationException("order statistics must be asked for in non-decreasing order");
        var a = values;
        int left = settled, right = a.Length - 1;
        while (left < right)
        {
            double x = a[left], y = a[(left + right) >> 1], z = a[right];
            double pivot = Math.Max(Math.Min(x, y), Math.Min(Math.Max(x, y), z));   // median of three
            // Three-way partition of [left, right]: [left, lt) < pivot, [lt, gt] = pivot, (gt, right] > pivot.
            int lt = left, i = left, gt = right;
            while (i <= gt)
            {
                double v = a[i];
                if (v < pivot) { a[i] = a[lt]; a[lt] = v; lt++; i++; }
                else if (v > pivot) { a[i] = a[gt]; a[gt] = v; gt--; }
                else i++;
            }
            if (k < lt) right = lt - 1;
            else if (k > gt) left = gt + 1;
            else break;
        }
        settled = k;
        found[k] = a[k];
        return a[k];
    }
}
