using SlotArray.Core.Tapers;
using Xunit.Abstractions;

namespace SlotArray.Core.Tests.Tapers;

/// <summary>
/// Achieved peak sidelobe of the n̄ tapers over a grid of N, level (20 … 45 dB) and n̄ in the practical range
/// (common practice [C]: ⌈2A² + ½⌉ … round(4A²), and ≤ (N − 1)/2), measured on the array factor over a full period
/// of ψ (d = λ/2), compared with the design level and with the peak sidelobe of the continuous Taylor pattern of the
/// same level and n̄. Measured here (this code, 193 cases for N ≥ 16):
/// <list type="bullet">
/// <item>Villeneuve: never above the design (max +0.00 dB); within −0.01 … +0.16 dB of the continuous Taylor pattern; below
/// the design by up to 0.63 dB where the continuous Taylor pattern itself is (20 dB, n̄ = 3: −20.63 dB; 25 dB,
/// n̄ = 4), so issue 3's "within 0.3 dB of the design" holds only where the Taylor pattern reaches its design.</item>
/// <item>sampled Taylor: −0.63 … +0.75 dB of the design; +0.75 needs n̄ close to N/2 (N = 16, 40 dB, n̄ = 7); with
/// n̄ ≤ N/3 it is −0.63 … +0.25 dB, inside the ±0.6 dB found for the sampled Taylor taper by an independent numpy grid [N] (110 cases) on the high
/// side; the −0.63 dB low side is the continuous Taylor pattern's own (20 dB, n̄ = 3), not sampling.</item>
/// <item>small N (5 … 14): Villeneuve −0.46 … +0.05 dB, sampled Taylor −0.37 … +0.76 dB.</item>
/// </list>
/// The bounds asserted below are these measured figures rounded up by 0.02 dB.
/// </summary>
public class NbarGridTests(ITestOutputHelper output)
{
    private static readonly int[] Counts = [16, 20, 24, 32, 50, 64, 100, 150, 200];
    private static readonly int[] SmallCounts = [5, 6, 8, 10, 12, 14];
    private static readonly double[] Levels = [-20, -25, -30, -35, -40, -45];

    private sealed record Case(int N, double Sll, int Nbar, double Achieved, double Continuous);

    private static List<Case> Run(int[] counts, Func<int, double, int, double[]> taper, Func<int, int> maxNbar)
    {
        var cases = new List<Case>();
        foreach (int n in counts)
            foreach (double s in Levels)
            {
                double a2 = Math.Pow(TaylorLineSource.A(s), 2);
                for (int nbar = Math.Max(2, (int)Math.Ceiling(2 * a2 + 0.5)); nbar <= (int)Math.Round(4 * a2) && nbar <= maxNbar(n); nbar++)
                {
                    double achieved = TaperSynthesis.MeasuredPeakSidelobeDb(taper(n, s, nbar), false);
                    double cont = TaylorLineSource.ContinuousPeakSidelobeDb(TaylorLineSource.Parameters(s, nbar));
                    cases.Add(new Case(n, s, nbar, achieved, cont));
                }
            }
        return cases;
    }

    private (double Lo, double Hi) Range(List<Case> cases, Func<Case, double> f, string what)
    {
        double lo = cases.Min(f), hi = cases.Max(f);
        output.WriteLine($"{what}: {cases.Count} cases, {lo:+0.000;-0.000} … {hi:+0.000;-0.000} dB");
        return (lo, hi);
    }

    [Fact]
    public void Villeneuve_never_exceeds_the_design_and_follows_the_continuous_Taylor_level_for_N_at_least_16()
    {
        var cases = Run(Counts, Villeneuve.Weights, n => (n - 1) / 2);
        Assert.True(cases.Count > 150);
        var (lo, hi) = Range(cases, c => c.Achieved - c.Sll, "Villeneuve − design");
        Assert.InRange(hi, -0.65, 0.02);
        Assert.InRange(lo, -0.65, 0.02);
        (lo, hi) = Range(cases, c => c.Achieved - c.Continuous, "Villeneuve − continuous Taylor");
        Assert.InRange(lo, -0.3, 0.3);
        Assert.InRange(hi, -0.3, 0.3);
        var reached = cases.Where(c => Math.Abs(c.Continuous - c.Sll) <= 0.3).ToList();
        (lo, hi) = Range(reached, c => c.Achieved - c.Sll, "Villeneuve − design where the Taylor pattern reaches it within 0.3 dB");
        Assert.InRange(lo, -0.3, 0.3);
        Assert.InRange(hi, -0.3, 0.3);
    }

    [Fact]
    public void Sampled_Taylor_departs_from_the_design_level_within_the_measured_bound_for_N_at_least_16()
    {
        var all = Run(Counts, TaylorLineSource.Weights, n => (n - 1) / 2);
        var (lo, hi) = Range(all, c => c.Achieved - c.Sll, "sampled Taylor − design, n̄ ≤ (N − 1)/2");
        Assert.InRange(lo, -0.65, 0.77);
        Assert.InRange(hi, -0.65, 0.77);
        var suitable = Run(Counts, TaylorLineSource.Weights, n => n / 3);
        Assert.True(suitable.Count > 150);
        (lo, hi) = Range(suitable, c => c.Achieved - c.Sll, "sampled Taylor − design, n̄ ≤ N/3");
        Assert.InRange(lo, -0.65, 0.27);
        Assert.InRange(hi, -0.65, 0.27);
    }

    [Fact]
    public void Small_arrays_stay_within_their_measured_departures()
    {
        var v = Run(SmallCounts, (n, s, nb) => Villeneuve.Weights(n, s, nb), n => (n - 1) / 2);
        var (lo, hi) = Range(v, c => c.Achieved - c.Sll, "Villeneuve − design, N 5…14");
        Assert.InRange(lo, -0.48, 0.07);
        Assert.InRange(hi, -0.48, 0.07);
        var t = Run(SmallCounts, TaylorLineSource.Weights, n => (n - 1) / 2);
        (lo, hi) = Range(t, c => c.Achieved - c.Sll, "sampled Taylor − design, N 5…14");
        Assert.InRange(lo, -0.39, 0.78);
        Assert.InRange(hi, -0.39, 0.78);
    }
}
