using SlotArray.Core.Design;
using SlotArray.Core.Tapers;
using SlotArray.Core.Tests.DesignTests;
using SlotArray.Core.Tolerance;
using SlotArray.Core.Verdicts;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Verdicts;

/// <summary>Issue 11 / issue 19 item 4: one sidelobe-target rule for the requirement verdicts and the tolerance analysis.</summary>
public class SidelobeTargetTests
{
    /// <summary>
    /// Peak sidelobe of N real weights' array factor Σ a_n e^{jnψ} over a whole period of ψ, dB, by brute force on a
    /// grid of 200 001 points and outside the main lobe (from the first null either side): an independent computation
    /// of the quantity (C. A. Balanis, Antenna Theory, 3rd ed., Wiley 2005, eq. 6-10c for the uniform case).
    /// </summary>
    private static double BruteForcePeakSidelobeDb(IReadOnlyList<double> a)
    {
        const int m = 200_000;
        var p = new double[m + 1];
        for (int i = 0; i <= m; i++)
        {
            double psi = -Math.PI + 2 * Math.PI * i / m, re = 0, im = 0;
            for (int n = 0; n < a.Count; n++) { re += a[n] * Math.Cos(n * psi); im += a[n] * Math.Sin(n * psi); }
            p[i] = re * re + im * im;
        }
        int c = m / 2, l = c, r = c;
        while (l > 0 && p[l - 1] < p[l]) l--;
        while (r < m && p[r + 1] < p[r]) r++;
        double side = 0;
        for (int i = 0; i <= m; i++) if (i <= l || i >= r) side = Math.Max(side, p[i]);
        return 10 * Math.Log10(side / p[c]);
    }

    private static ArrayRequest Request(int count, TaperRequest taper, double? required = null) =>
        TestArrays.Request(count) with { Taper = taper, Requirements = new Requirements(required, null, null) };

    [Theory]
    [InlineData(4, -11.30)]
    [InlineData(8, -12.80)]
    [InlineData(16, -13.15)]
    [InlineData(32, -13.23)]
    public void Issue11_a_uniform_taper_is_held_to_its_own_N_element_level_not_the_line_source_13_26_dB(int n, double rounded)
    {
        var target = SidelobeTarget.Of(Request(n, TaperRequest.Uniform))!;
        Assert.Equal(SidelobeTargetOrigin.TaperOwnLevel, target.Origin);
        Check.Absolute(BruteForcePeakSidelobeDb(UniformTaper.Weights(n)), target.LevelDb, 0.002, "brute-force array factor, Balanis 2005 eq. 6-10c");
        Check.Absolute(rounded, target.LevelDb, 0.005, "|sin(Nψ/2)/(N sin(ψ/2))| first sidelobe, computed here with python3");
        Assert.True(target.LevelDb > -13.2615, "every finite uniform array has its first sidelobe above the sinc's -13.26 dB");
    }

    [Fact]
    public void Issue11_cosine_pedestal_and_given_tapers_get_the_same_target_in_the_verdicts_and_the_tolerance_analysis()
    {
        var cosine = new TaperRequest(TaperType.CosinePedestal, -13.26, 4, -20, 2, null);
        double[] given = [0.3, 0.7, 1, 1, 0.7, 0.3];
        var givenTaper = new TaperRequest(TaperType.Given, -13.26, 4, -20, 2, given);
        foreach (var (taper, n) in new[] { (cosine, 12), (givenTaper, 6) })
        {
            var request = Request(n, taper);
            var target = SidelobeTarget.Of(request)!;
            Assert.Equal(SidelobeTargetOrigin.TaperOwnLevel, target.Origin);
            Check.Absolute(BruteForcePeakSidelobeDb(TaperSynthesis.Synthesize(taper, n).Weights), target.LevelDb, 0.002, "brute-force array factor of the weights");
            Assert.Equal(target.LevelDb, ToleranceAnalysis.TargetDb(request));
            Assert.Equal(target, SidelobeTarget.Of(request, TaperSynthesis.Synthesize(taper, n)));
        }
    }

    [Fact]
    public void A_stated_requirement_wins_and_a_synthesised_family_keeps_its_design_level()
    {
        var cheb = new TaperRequest(TaperType.Chebyshev, -25, 4, -20, 2, null);
        Assert.Equal(new SidelobeTarget(-25, SidelobeTargetOrigin.TaperDesignLevel), SidelobeTarget.Of(Request(12, cheb)));
        Assert.Equal(new SidelobeTarget(-22, SidelobeTargetOrigin.Requirement), SidelobeTarget.Of(Request(12, cheb, -22)));
        Assert.Equal(-22, ToleranceAnalysis.TargetDb(Request(12, cheb, -22)));
        Assert.Equal(-25, ToleranceAnalysis.TargetDb(Request(12, cheb)));
    }

    [Fact]
    public void Two_uniform_elements_have_no_sidelobe_and_so_no_target()
    {
        // |cos(ψ/2)| falls from its peak to its only null at ψ = π: no sidelobe anywhere.
        Assert.Null(SidelobeTarget.Of(Request(2, TaperRequest.Uniform)));
        Assert.Equal(0, ToleranceAnalysis.TargetDb(Request(2, TaperRequest.Uniform)));
    }
}
