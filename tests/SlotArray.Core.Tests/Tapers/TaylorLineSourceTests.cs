using SlotArray.Core.Patterns;
using SlotArray.Core.Tapers;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Tapers;

/// <summary>Taylor n̄ line source against Taylor 1955 (numpy) and scipy.signal.windows.taylor.</summary>
public class TaylorLineSourceTests
{
    private const string Ref = "Taylor 1955 [N]";

    [Theory]
    [InlineData(-20, 0.952772)]
    [InlineData(-25, 1.136553)]
    [InlineData(-30, 1.319959)]
    [InlineData(-35, 1.503248)]
    [InlineData(-40, 1.686499)]
    [InlineData(-45, 1.869738)]
    public void Taylor_A_matches_the_reference(double sll, double a) => Check.Relative(a, TaylorLineSource.A(sll), 1e-6, Ref);

    [Theory]
    [InlineData(-20, 3, 1.121327, 0.95349)]
    [InlineData(-20, 4, 1.102729, 0.96055)]
    [InlineData(-25, 4, 1.086982, 0.90528)]
    [InlineData(-25, 5, 1.077282, 0.91050)]
    [InlineData(-30, 4, 1.069339, 0.85339)]
    [InlineData(-30, 5, 1.066190, 0.85526)]
    [InlineData(-30, 6, 1.060788, 0.85856)]
    [InlineData(-35, 5, 1.053864, 0.80798)]
    [InlineData(-35, 7, 1.049229, 0.81088)]
    [InlineData(-40, 6, 1.042977, 0.76743)]
    [InlineData(-40, 8, 1.040680, 0.76885)]
    public void Sigma_and_continuous_taper_efficiency_match_the_table(double sll, int nbar, double sigma, double efficiency)
    {
        var d = TaylorLineSource.Parameters(sll, nbar);
        Check.Relative(sigma, d.Sigma, 1e-6, Ref + " table");
        Check.Absolute(efficiency, d.ContinuousTaperEfficiency, 6e-6, Ref + " table");
    }

    [Fact]
    public void Zeros_and_coefficients_at_30_dB_match_the_reference()
    {
        var d6 = TaylorLineSource.Parameters(-30, 6);
        double[] z6 = [1.497287, 2.119531, 2.998916, 3.968012, 4.974665], f6 = [0.286634, -0.014213, -0.000106, 0.002781, -0.001964];
        for (int i = 0; i < 5; i++) { Check.Absolute(z6[i], d6.Zeros[i], 6e-7, Ref); Check.Absolute(f6[i], d6.Coefficients[i], 6e-7, Ref); }
        var d4 = TaylorLineSource.Parameters(-30, 4);
        double[] z4 = [1.509358, 2.136617, 3.023091], f4 = [0.292656, -0.015784, 0.002181];
        for (int i = 0; i < 3; i++) { Check.Absolute(z4[i], d4.Zeros[i], 6e-7, Ref); Check.Absolute(f4[i], d4.Coefficients[i], 6e-7, Ref); }
    }

    /// <summary>scipy 1.10.1: scipy.signal.windows.taylor(16, 4, 30, norm=False) / max (computed for this test).</summary>
    public static readonly double[] Scipy16 =
        [0.2538818382676843, 0.324244411374622, 0.4463443880694455, 0.5924332184988346, 0.736783576349914, 0.8608073088571035, 0.9517025248152619, 1.0];

    [Fact]
    public void Sampled_weights_N16_nbar4_30dB_equal_scipy_taylor()
    {
        var w = TaylorLineSource.Weights(16, -30, 4);
        for (int i = 0; i < 8; i++)
        {
            Check.Absolute(Scipy16[i], w[i], 1e-12, "scipy.signal.windows.taylor(16, 4, 30, norm=False)/max, scipy 1.10.1");
            Check.Absolute(Scipy16[i], w[15 - i], 1e-12, "symmetric");
        }
        // Un-normalised values of Taylor 1955: 0.393143 … 1.548528.
        Check.Relative(0.393143 / 1.548528, w[0], 1e-6, Ref);
        var p = ArrayFactor.Compute(ArrayGeometry.Uniform(16, 0.5), w, 2 * Math.PI, AngleGrid.VisibleInSine(8193));
        Check.Absolute(-30.05, PatternMetrics.Measure(p).PeakSidelobeDb!.Value, 0.006, "Taylor 1955 sampled (scipy), numpy [N]: −30.05 dB");
        Check.Relative(0.85339, PatternMetrics.TaperEfficiency(w), 6e-6, "Taylor 1955 sampled, numpy [N]: 0.85339");
    }

    [Theory]
    [InlineData(-30, 2, -25.7)]
    [InlineData(-40, 4, -38.9)]
    public void Too_small_nbar_misses_the_level_and_is_warned(double sll, int nbar, double reached)
    {
        var d = TaylorLineSource.Parameters(sll, nbar);
        Check.Absolute(reached, TaylorLineSource.ContinuousPeakSidelobeDb(d), 0.06, Ref + " (n̄ too small)");
        var r = TaperSynthesis.Synthesize(new(TaperType.Taylor, sll, nbar, -20, 2, null), 32);
        Assert.Contains(r.Warnings, w => w.Code == "nbar-too-small");
    }

    [Theory]
    [InlineData(-20, 3)]
    [InlineData(-25, 5)]
    [InlineData(-30, 7)]
    [InlineData(-35, 9)]
    [InlineData(-40, 11)]
    [InlineData(-45, 14)]
    public void Largest_monotonic_nbar_matches_the_reference(double sll, int largest)
    {
        // Taylor 1955: largest n̄ with a monotonic distribution 3, 5, 7, 9, 11, 14 (close to 4A²).
        Assert.True(TaylorLineSource.IsMonotonic(TaylorLineSource.Parameters(sll, largest)));
        Assert.False(TaylorLineSource.IsMonotonic(TaylorLineSource.Parameters(sll, largest + 1)));
        var r = TaperSynthesis.Synthesize(new(TaperType.Taylor, sll, largest + 1, -20, 2, null), 64);
        Assert.Contains(r.Warnings, w => w.Code == "nbar-edge-rise");
        Assert.DoesNotContain(TaperSynthesis.Synthesize(new(TaperType.Taylor, sll, largest, -20, 2, null), 64).Warnings, w => w.Code == "nbar-edge-rise");
    }

    [Theory]
    [InlineData(10, 24.039)]
    [InlineData(20, 47.861)]
    public void Slot_array_directivity_with_Taylor_30_4_matches_the_reference(int n, double d)
    {
        var w = TaylorLineSource.Weights(n, -30, 4);
        double dir = Directivity.HalfSpace(ArrayGeometry.Uniform(n, 0.69959), w, 2 * Math.PI, ElementPatterns.HalfWaveSlotHPlane);
        Check.Absolute(d, dir, 6e-4, "IEEE Std 145-2013 directivity (scipy-sampled Taylor 30/4, slot element, half-space)");
    }

    [Fact]
    public void Bad_parameters_say_what_to_change()
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => TaylorLineSource.Weights(16, 30, 4));
        Assert.Contains("negative dB", e.Message);
        e = Assert.Throws<ArgumentOutOfRangeException>(() => TaylorLineSource.Weights(16, -30, 1));
        Assert.Contains("n̄ must be between 2", e.Message);
    }
}
