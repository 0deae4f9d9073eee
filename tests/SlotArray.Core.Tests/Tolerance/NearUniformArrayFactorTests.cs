using System.Numerics;
using SlotArray.Core.Patterns;
using SlotArray.Core.Tolerance;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.ToleranceTests;

/// <summary>The near-uniform series evaluation against the direct sum of the displaced positions (the same sum, evaluated independently).</summary>
public class NearUniformArrayFactorTests
{
    [Fact]
    public void Series_matches_the_direct_sum_of_displaced_elements()
    {
        const int n = 24;
        double k = 2 * Math.PI / 0.032, d = -0.0224;
        var p = Enumerable.Range(0, n).Select(i => 0.011 + i * d).ToArray();
        var r = new TrialRandom(3, 0);
        var a = Enumerable.Range(0, n).Select(_ => new Complex(0.5 + r.NextUniform(), r.NextUniform() - 0.5)).ToArray();
        var delta = Enumerable.Range(0, n).Select(_ => 3e-5 * (2 * r.NextUniform() - 1)).ToArray();
        var u = AngleGrid.HalfSpaceInTheta(1024).Sines.ToArray();
        var fast = new NearUniformArrayFactor(p, k, u).Evaluate(a, delta);
        var direct = ArrayFactor.AtSines(p.Select((z, i) => z + delta[i]).ToArray(), a, k, u);
        double peak = a.Sum(c => c.Magnitude);
        for (int j = 0; j < u.Length; j++)
            Check.Absolute(0, (fast[j] - direct[j]).Magnitude / peak, 1e-7, "direct sum Σ a_n e^{jk(p_n + δ_n)u} (ArrayFactor)");
        var zero = new NearUniformArrayFactor(p, k, u).Evaluate(a, new double[n]);
        var nominal = ArrayFactor.AtSines(p, a, k, u);
        for (int j = 0; j < u.Length; j++)
            Check.Absolute(0, (zero[j] - nominal[j]).Magnitude / peak, 1e-12, "direct sum at the nominal positions");
    }
}
