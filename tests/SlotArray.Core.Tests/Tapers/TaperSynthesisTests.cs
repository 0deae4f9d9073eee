using SlotArray.Core.Design;
using SlotArray.Core.Patterns;
using SlotArray.Core.Tapers;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Tapers;

/// <summary>The facade: every type, normalisation, symmetry, validation messages.</summary>
public class TaperSynthesisTests
{
    public static TheoryData<TaperType> AllTypes() => new(Enum.GetValues<TaperType>());

    private static TaperRequest Request(TaperType t, int n) => new(t, -30, 4, -20, 2,
        t == TaperType.Given ? Enumerable.Range(0, n).Select(i => 1.0 + Math.Min(i, n - 1 - i)).ToArray() : null);

    [Theory]
    [MemberData(nameof(AllTypes))]
    public void Every_type_gives_weights_with_peak_magnitude_one(TaperType t)
    {
        foreach (int n in new[] { 9, 16 })
        {
            var r = TaperSynthesis.Synthesize(Request(t, n), n);
            Assert.Equal(n, r.Count);
            Check.Absolute(1, r.Weights.Max(Math.Abs), 1e-15, "normalisation max |a| = 1");
            Assert.False(string.IsNullOrWhiteSpace(r.Method));
            Assert.Equal(t == TaperType.Bayliss, r.IsDifference);
        }
    }

    [Theory]
    [MemberData(nameof(AllTypes))]
    public void Symmetric_tapers_give_symmetric_patterns(TaperType t)
    {
        if (t == TaperType.Bayliss) return;  // odd taper: covered by BaylissTests
        int n = 15;
        var r = TaperSynthesis.Synthesize(Request(t, n), n);
        for (int i = 0; i < n; i++) Check.Absolute(r.Weights[n - 1 - i], r.Weights[i], 1e-14, "symmetric distribution");
        var p = ArrayFactor.Compute(ArrayGeometry.Uniform(n, 0.5), r.Weights, 2 * Math.PI, AngleGrid.HalfSpaceInTheta(721));
        for (int i = 0; i < p.Power.Length; i++)
            Check.Absolute(p.Power[p.Power.Length - 1 - i] / p.PeakPower, p.Power[i] / p.PeakPower, 1e-12, "real symmetric weights: |F(θ)| = |F(−θ)|");
    }

    [Fact]
    public void Cosine_pedestal_has_the_edge_level_at_the_aperture_edge()
    {
        // g(±1) = P = 10^(edge/20) by definition; the outer element at p = ±(N−1)/N sits half a cell inside.
        Check.Relative(0.1, CosinePedestal.Distribution(0.1, 2, 1), 1e-12, "definition (common practice)");
        var w = CosinePedestal.Weights(20, -20, 2);
        static double G(double p) => 0.1 + 0.9 * Math.Pow(Math.Cos(Math.PI * p / 2), 2);
        // Outer element at p = 19/20, normalised by the centre elements at p = 1/20 (even N).
        Check.Relative(G(19.0 / 20) / G(1.0 / 20), w[0], 1e-12, "cos² on a 0.1 pedestal at the outer element");
        Assert.Throws<ArgumentOutOfRangeException>(() => CosinePedestal.Weights(20, 5, 2));
        Assert.Throws<ArgumentOutOfRangeException>(() => CosinePedestal.Weights(20, -20, 0.5));
    }

    [Fact]
    public void Given_weights_keep_their_signs_and_are_checked()
    {
        var r = TaperSynthesis.Synthesize(new TaperRequest(TaperType.Given, -30, 4, -20, 2, [-2, 1, 4]), 3);
        Assert.Equal([-0.5, 0.25, 1], r.Weights.ToArray());
        var e = Assert.Throws<ArgumentException>(() => TaperSynthesis.Synthesize(new TaperRequest(TaperType.Given, -30, 4, -20, 2, [1, 2]), 3));
        Assert.Contains("one weight per element", e.Message);
        Assert.Throws<ArgumentException>(() => TaperSynthesis.Synthesize(new TaperRequest(TaperType.Given, -30, 4, -20, 2, [0, 0, 0]), 3));
    }

    [Fact]
    public void Good_designs_carry_no_warnings()
    {
        Assert.Empty(TaperSynthesis.Synthesize(new TaperRequest(TaperType.Taylor, -30, 4, -20, 2, null), 16).Warnings);
        Assert.Empty(TaperSynthesis.Synthesize(new TaperRequest(TaperType.Villeneuve, -30, 4, -20, 2, null), 16).Warnings);
        Assert.Empty(TaperSynthesis.Synthesize(new TaperRequest(TaperType.Chebyshev, -30, 4, -20, 2, null), 16).Warnings);
    }

    [Fact]
    public void Sampled_Taylor_at_small_N_is_warned_when_it_misses_the_level()
    {
        // N = 10, 30 dB, n̄ = 4: the sampled taper reaches only about −29.24 dB (measured in NbarGridTests: +0.76 dB).
        var r = TaperSynthesis.Synthesize(new TaperRequest(TaperType.Taylor, -30, 4, -20, 2, null), 10);
        var w = Assert.Single(r.Warnings);
        Assert.Equal("nbar-too-small", w.Code);
        Assert.Contains("Villeneuve", w.Message);
    }

    [Fact]
    public void Villeneuve_with_large_nbar_warns_of_the_edge_rise()
    {
        // 20 dB: 4A² = 3.6 (Taylor 1955); n̄ = 8 makes the distribution rise toward the ends.
        var r = TaperSynthesis.Synthesize(new TaperRequest(TaperType.Villeneuve, -20, 8, -20, 2, null), 40);
        Assert.Contains(r.Warnings, x => x.Code == "nbar-edge-rise");
    }

    [Fact]
    public void Element_count_is_validated()
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => TaperSynthesis.Synthesize(TaperRequest.Uniform, 1));
        Assert.Contains("between 2 and 100,000", e.Message);
    }
}
