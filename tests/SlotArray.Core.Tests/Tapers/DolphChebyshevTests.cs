using SlotArray.Core.Design;
using SlotArray.Core.Patterns;
using SlotArray.Core.Tapers;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Tapers;

/// <summary>Dolph–Chebyshev weights against scipy.signal.windows.chebwin and numpy values of Dolph 1946 [N].</summary>
public class DolphChebyshevTests
{
    private const string Scipy = "scipy 1.10.1 scipy.signal.windows.chebwin(N, SLL)/max, computed for this test";

    public static TheoryData<int, double, double[]> ScipyRows => new()
    {
        { 8, -30, [0.262216491191539, 0.5187470541275423, 0.8119600672627046, 1.0] },
        { 9, -30, [0.2527491306769835, 0.4589498841687883, 0.7193798058444372, 0.9229274496459854, 1.0] },
        { 10, -25, [0.3949714846396566, 0.505632033176951, 0.7213976119738668, 0.8993422421687735, 1.0] },
        { 16, -30, [0.2909888712577754, 0.317296191540354, 0.4556889386318103, 0.6017560064550695, 0.7423868457545089, 0.8636596967204223, 0.9527891528168595, 1.0] },
        { 20, -35, [0.1934486571436476, 0.2180414484964328, 0.3215196289781804, 0.4389193616115504, 0.5636403985471762, 0.687452759833364, 0.801289391894341, 0.8962045479521804, 0.9643737606649302, 1.0] },
        { 30, -25, [0.7673976121237562, 0.3339858325355489, 0.3991458212378245, 0.466815744254949, 0.5357614889310272] },
        { 100, -30, [1.0, 0.1734913884570678, 0.1880849699692084, 0.2031675010044839, 0.2187201875899468] },
    };

    [Theory]
    [MemberData(nameof(ScipyRows))]
    public void Weights_equal_scipy_chebwin(int n, double sll, double[] expected)
    {
        var w = DolphChebyshev.Weights(n, sll);
        for (int i = 0; i < expected.Length; i++)
        {
            Check.Absolute(expected[i], w[i], 1e-12, Scipy);
            Check.Absolute(expected[i], w[n - 1 - i], 1e-12, Scipy + " (symmetric)");
        }
    }

    [Theory]
    [InlineData(8, -30, 1.180659)]
    [InlineData(9, -30, 1.137377)]
    [InlineData(10, -25, 1.079736)]
    public void X0_matches_the_reference(int n, double sll, double x0) => Check.Relative(x0, DolphChebyshev.X0(n, sll), 1e-6, "Dolph 1946, numpy [N]");

    [Theory]
    [InlineData(10, -25, 0.90480)]
    [InlineData(20, -30, 0.86748)]
    public void Taper_efficiency_matches_the_reference(int n, double sll, double eta)
        => Check.Absolute(eta, PatternMetrics.TaperEfficiency(DolphChebyshev.Weights(n, sll)), 6e-6, "Dolph 1946, numpy [N]");

    [Theory]
    [InlineData(1001, -30)]
    [InlineData(2048, -40)]
    [InlineData(3000, -25)]
    public void Fft_weights_equal_the_direct_dft_at_large_N(int n, double sll)
    {
        var fft = DolphChebyshev.Weights(n, sll);
        var dft = DolphChebyshev.WeightsByDirectDft(n, sll);
        double worst = fft.Zip(dft, (a, b) => Math.Abs(a - b)).Max();
        Assert.True(worst < 1e-9, $"largest difference {worst:G3}");
    }

    public static TheoryData<int, double> Grid()
    {
        var d = new TheoryData<int, double>();
        foreach (int n in new[] { 5, 8, 13, 16, 31, 64, 100, 200 })
            foreach (double s in new[] { -20.0, -25, -30, -35, -40, -45 })
                d.Add(n, s);
        return d;
    }

    [Theory]
    [MemberData(nameof(Grid))]
    public void Sidelobes_are_equal_ripple_at_the_design_level(int n, double sll)
    {
        // Dolph 1946: every sidelobe of T_{N−1}(x0 cos(ψ/2)) has height 1/R. Checked over a full period of ψ
        // (d = λ/2), 16 samples per lobe, each local maximum refined by a parabola in dB.
        var w = DolphChebyshev.Weights(n, sll);
        var p = ArrayFactor.Compute(ArrayGeometry.Uniform(n, 0.5), w, 2 * Math.PI, AngleGrid.VisibleInSine(32 * n + 1));
        var m = PatternMetrics.Measure(p);
        Check.Absolute(sll, m.PeakSidelobeDb!.Value, 0.01, "Dolph 1946: equal ripple at 1/R");
        var pw = p.Power;
        int i0 = pw.IndexOf(p.PeakPower), iL = LobeSearch.DescendTo(pw, i0, -1), iR = LobeSearch.DescendTo(pw, i0, +1);
        for (int i = 1; i < pw.Length - 1; i++)
        {
            if (i >= iL && i <= iR || pw[i] < pw[i - 1] || pw[i] < pw[i + 1]) continue;
            double db = LobeSearch.Db(LobeSearch.RefineMaximum(p.Theta, pw, i).Power / p.PeakPower);
            Check.Absolute(sll, db, 0.01, $"Dolph 1946: every sidelobe at 1/R (lobe at index {i})");
        }
        // Exact half-power beamwidth (Dolph 1946 [D]): ψ_h = 2 acos(cosh(acosh(R/√2)/(N − 1))/x0).
        double r = Math.Pow(10, -sll / 20), x0 = DolphChebyshev.X0(n, sll);
        double psiH = 2 * Math.Acos(Math.Cosh(Math.Acosh(r / Math.Sqrt(2)) / (n - 1)) / x0);
        Check.Relative(2 * Math.Asin(psiH / Math.PI), m.HalfPowerBeamwidth.Radians, 2e-4, "Dolph 1946 exact HPBW");
    }

    [Fact]
    public void Edge_spike_is_warned_for_long_arrays_only()
    {
        var req = new TaperRequest(TaperType.Chebyshev, -25, 4, -20, 2, null);
        Assert.Contains(TaperSynthesis.Synthesize(req, 30).Warnings, w => w.Code == "chebyshev-edge-spike");
        Assert.DoesNotContain(TaperSynthesis.Synthesize(req with { SidelobeLevelDb = -30 }, 16).Warnings, w => w.Code == "chebyshev-edge-spike");
    }
}
