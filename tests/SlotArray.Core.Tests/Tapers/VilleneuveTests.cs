using SlotArray.Core.Patterns;
using SlotArray.Core.Tapers;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Tapers;

/// <summary>Villeneuve n̄ against numpy values of Villeneuve 1984 [N].</summary>
public class VilleneuveTests
{
    private const string Ref = "Villeneuve 1984 [N]";

    [Theory]
    [InlineData(16, 4, -30, 1.015673)]
    [InlineData(20, 5, -30, 1.021202)]
    [InlineData(24, 6, -35, 1.015807)]
    [InlineData(32, 6, -30, 1.030764)]
    [InlineData(40, 7, -40, 1.019527)]
    public void Sigma_V_matches_the_reference(int n, int nbar, double sll, double sigma)
        => Check.Relative(sigma, Villeneuve.Sigma(n, sll, nbar), 1e-6, Ref);

    [Fact]
    public void Weights_sidelobe_and_efficiency_N16_nbar4_30dB_match_the_reference()
    {
        double[] expected = [0.249855, 0.321034, 0.444249, 0.591198, 0.736004, 0.860298, 0.951475, 1];
        var w = Villeneuve.Weights(16, -30, 4);
        for (int i = 0; i < 8; i++) { Check.Absolute(expected[i], w[i], 6e-7, Ref); Check.Absolute(expected[i], w[15 - i], 6e-7, Ref); }
        var p = ArrayFactor.Compute(ArrayGeometry.Uniform(16, 0.5), w, 2 * Math.PI, AngleGrid.VisibleInSine(8193));
        Check.Absolute(-30.15, PatternMetrics.Measure(p).PeakSidelobeDb!.Value, 0.006, Ref + ": −30.15 dB");
        Check.Absolute(0.85155, PatternMetrics.TaperEfficiency(w), 6e-6, Ref + ": 0.85155");
    }

    /// <summary>
    /// The discrete Taylor pattern for few elements: the peak sidelobe of the array factor, summed directly here over
    /// ψ ∈ [−π, π] (elements λ/2 apart), is the design level within 0.35 dB for N = 8, 10, 16 at −25 dB with the largest n̄
    /// the construction allows up to 5 (Villeneuve 1984: the near-in sidelobes sit at about the design level, slightly
    /// below). The sampled Taylor line source misses −25 dB at N = 8 (−24.06 dB), which is why the planar design uses this.
    /// </summary>
    [Theory]
    [InlineData(8, 3)]
    [InlineData(10, 4)]
    [InlineData(16, 5)]
    public void Few_elements_reach_the_design_level(int n, int nbar)
    {
        var w = Villeneuve.Weights(n, -25, nbar);
        const int m = 40001;
        var f = new double[m];
        for (int j = 0; j < m; j++)
        {
            double psi = -Math.PI + 2 * Math.PI * j / (m - 1);
            System.Numerics.Complex s = 0;
            for (int e = 0; e < n; e++) s += w[e] * System.Numerics.Complex.FromPolarCoordinates(1, psi * (e - 0.5 * (n - 1)));
            f[j] = s.Magnitude;
        }
        int top = (m - 1) / 2, r = top;
        while (r < m - 1 && f[r + 1] <= f[r]) r++;
        double side = f.Skip(r).Max();
        Check.Absolute(-25, 20 * Math.Log10(side / f[top]), 0.35, Ref + ": sidelobes at the design level");
    }

    [Fact]
    public void Zeros_of_the_pattern_are_where_they_were_placed()
    {
        // The weights' array factor must vanish at every placed zero ±ψ_p (Villeneuve 1984's construction).
        int n = 24;
        var w = Villeneuve.Weights(n, -35, 6);
        var z = ArrayGeometry.Uniform(n, 1.0);
        var zeros = Villeneuve.Zeros(n, -35, 6);
        var af = ArrayFactor.AtSines(z, ArrayFactor.ToComplex(w), 1.0, zeros.Concat(zeros.Select(x => -x)).ToArray());
        double peak = w.Sum();
        foreach (var v in af) Check.Absolute(0, v.Magnitude / peak, 1e-12, "Villeneuve 1984: zeros placed at ±ψ_p");
    }

    [Fact]
    public void Too_few_elements_for_nbar_is_refused_with_what_to_change()
    {
        var e = Assert.ThrowsAny<ArgumentException>(() => Villeneuve.Weights(8, -30, 4));
        Assert.Contains("smaller n̄", e.Message);
    }
}
