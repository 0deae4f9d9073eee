using SlotArray.Core.Tolerance;

namespace SlotArray.Core.Tests.ToleranceTests;

/// <summary>
/// Percentiles by selection against the same percentiles read from a fully sorted copy (Array.Sort, the .NET library's
/// introsort: an independent ordering), on samples with many ties, as the envelope's clamped −300 dB values have.
/// </summary>
public class OrderStatisticsTests
{
    [Theory]
    [InlineData(1, 0)]
    [InlineData(2, 1)]
    [InlineData(101, 2)]
    [InlineData(10_000, 3)]
    public void Selection_gives_the_percentiles_of_the_sorted_sample_to_the_bit(int count, int seed)
    {
        var r = new TrialRandom(seed, 0);
        var values = new double[count];
        for (int i = 0; i < count; i++)
        {
            double u = r.NextUniform();
            values[i] = u < 0.2 ? -300 : u < 0.3 ? 1.5 : Math.Round(100 * r.NextNormal()) / 7;   // ties at both ends and inside
        }
        var sorted = values.ToArray();
        Array.Sort(sorted);
        var select = new OrderStatistics(values.ToArray());
        foreach (double p in new[] { 0, 0.05, 0.05, 0.5, 0.9, 0.95, 0.99, 1 })
            Assert.Equal(SampleSummary.Percentile(sorted, p), select.Percentile(p));
    }

    [Fact]
    public void A_lower_percentile_after_a_higher_one_is_refused()
    {
        var select = new OrderStatistics([3.0, 1.0, 2.0, 5.0]);
        Assert.Equal(5.0, select.Percentile(1));
        Assert.Throws<InvalidOperationException>(() => select.Percentile(0.5));
    }
}
