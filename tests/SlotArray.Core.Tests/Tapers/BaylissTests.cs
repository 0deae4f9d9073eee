using SlotArray.Core.Patterns;
using SlotArray.Core.Tapers;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Tapers;

/// <summary>Bayliss difference taper against numpy values [N] and Bayliss's pattern F(u).</summary>
public class BaylissTests
{
    private const string Ref = "Bayliss 1968 [N]";

    [Fact]
    public void Parameters_at_30_dB_match_the_reference()
    {
        var d = Bayliss.Parameters(-30, 6);
        Check.Relative(1.6412609, d.A, 1e-7, Ref);
        double[] xi = [2.0708612, 2.6275393, 3.4314404, 4.3275777];
        for (int i = 0; i < 4; i++) Check.Relative(xi[i], d.Xi[i], 1e-7, Ref);
        Check.Relative(0.7988378, d.P0, 1e-6, Ref);
        Check.Relative(1.044944, d.Sigma, 1e-6, Ref);
        double[] b = [1, 0.603705, -0.032896, 0.010781, -0.002528, -0.000105];
        for (int m = 0; m < 6; m++) Check.Absolute(b[m], d.Coefficients[m], 6e-7, Ref + " (normalised B_m, (m + ½)² factor)");
    }

    /// <summary>Bayliss 1968 pattern F(u) = πu cos(πu) Π(1 − (u/(σz_n))²)/Π_{n=0}^{n̄−1}(1 − (u/(n + ½))²).</summary>
    private static double F(Bayliss.Design d, double u)
    {
        double f = Math.PI * u * Math.Cos(Math.PI * u);
        for (int n = 1; n < d.Coefficients.Length; n++) f *= 1 - Math.Pow(u / (d.Sigma * d.Zeros[n - 1]), 2);
        for (int n = 0; n < d.Coefficients.Length; n++) f /= 1 - Math.Pow(u / (n + 0.5), 2);
        return f;
    }

    [Fact]
    public void Long_sampled_array_reproduces_Bayliss_pattern_shape()
    {
        // With the (m + ½)² factor the sampled aperture's pattern is proportional to F(u); the (m − ½)² variant is
        // not (Bayliss 1968 pitfall). N = 400 at λ/2: u = (L/λ) sin θ = 200 sin θ.
        int n = 400;
        var d = Bayliss.Parameters(-30, 6);
        var w = Bayliss.Weights(n, -30, 6);
        double[] us = [0.3, 0.8, 1.7, 2.9, 4.2];
        var af = ArrayFactor.AtSines(ArrayGeometry.Uniform(n, 0.5), ArrayFactor.ToComplex(w), 2 * Math.PI, us.Select(u => u / 200).ToArray());
        double ratio0 = af[0].Magnitude / Math.Abs(F(d, us[0]));
        for (int i = 1; i < us.Length; i++)
            Check.Relative(ratio0, af[i].Magnitude / Math.Abs(F(d, us[i])), 2e-3, "Bayliss 1968 F(u)");
    }

    [Theory]
    [InlineData(16)]
    [InlineData(33)]
    [InlineData(64)]
    public void Taper_is_odd_with_a_deep_boresight_null(int n)
    {
        var w = Bayliss.Weights(n, -30, 5);
        for (int i = 0; i < n; i++) Check.Absolute(-w[n - 1 - i], w[i], 1e-15, "odd distribution, Bayliss 1968");
        var p = ArrayFactor.Compute(ArrayGeometry.Uniform(n, 0.5), w, 2 * Math.PI, AngleGrid.VisibleInSine(32 * n + 1));
        var m = DifferencePatternMetrics.Measure(p);
        Assert.True(m.NullDepthDb < -250, $"null depth {m.NullDepthDb} dB");
        Check.Absolute(-m.DifferencePeakDirections.Left.Radians, m.DifferencePeakDirections.Right.Radians, 1e-9, "odd pattern");
        // Continuous Bayliss 30/5 reaches −30.32 dB (numpy [N]); the sampled array is within 1 dB of it for these N (measured).
        Check.Absolute(-30.32, m.PeakSidelobeDb!.Value, 1.0, Ref + ": continuous 30/5 → −30.32 dB");
    }

    [Fact]
    public void Level_outside_the_fits_is_refused_or_warned()
    {
        Assert.ThrowsAny<ArgumentException>(() => Bayliss.Weights(32, -10, 4));
        var r = TaperSynthesis.Synthesize(new(TaperType.Bayliss, -50, 8, -20, 2, null), 64);
        Assert.Contains(r.Warnings, w => w.Code == "bayliss-fit-range");
    }
}
