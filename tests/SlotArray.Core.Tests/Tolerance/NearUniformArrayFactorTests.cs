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

    [Theory]
    [InlineData(64, true)]    // the half-space grid: mirrored in u, the recurrences run on one half
    [InlineData(64, false)]   // an unsymmetric cut: every point on its own
    [InlineData(7, true)]
    public void Sixty_four_elements_match_the_direct_sum_to_rounding_on_mirrored_and_unsymmetric_grids(int n, bool mirrored)
    {
        // Goertzel's recurrence loses a few N² ulps near φ = 0 and π (Gentleman 1969): 1e-11 of Σ|a_n| bounds it for N = 64.
        double k = 2 * Math.PI / 0.0319, d = -0.0223;
        var p = Enumerable.Range(0, n).Select(i => -0.0112 + i * d).ToArray();
        var r = new TrialRandom(5, 1);
        var a = Enumerable.Range(0, n).Select(_ => new Complex(0.2 + r.NextUniform(), 0.1 * (r.NextUniform() - 0.5))).ToArray();
        var grid = mirrored ? AngleGrid.HalfSpaceInTheta(2049) : AngleGrid.UniformInTheta(-1.2, 1.5, 2000);
        var u = grid.Sines.ToArray();
        var zero = new NearUniformArrayFactor(p, k, u).Evaluate(a, new double[n]);
        var direct = ArrayFactor.AtSines(p, a, k, u);
        double peak = a.Sum(c => c.Magnitude);
        for (int j = 0; j < u.Length; j++)
            Check.Absolute(0, (zero[j] - direct[j]).Magnitude / peak, 1e-11, "direct sum Σ a_n e^{jk p_n u} (ArrayFactor)");
    }
}

/// <summary>Each trial's gain against the Patterns library's half-space directivity of the displaced elements.</summary>
public class TrialGainTests
{
    [Fact]
    public void Trial_gain_equals_the_half_space_directivity_of_the_displaced_slots_times_the_radiated_power()
    {
        var (design, slot) = ToleranceTestArrays.Designed(ToleranceTestArrays.Tapered(32));
        var options = new ToleranceOptions(EnvelopePoints: 0);
        var model = ArrayTrialModel.Build(design, slot, ToleranceTestArrays.Factory, ToleranceTestArrays.Typical(), options);
        var evaluator = new TrialEvaluator(model.Nominal, model.Frequency.FreeSpaceWavenumber, options);
        for (int i = 0; i < 10; i++)
        {
            var r = new TrialRandom(9, i);
            var t = model.Trial(ref r);
            var o = evaluator.Evaluate(t);
            var pos = t.Positions.Select(z => -z).ToArray();
            double d = Directivity.HalfSpace(pos, t.Excitations, model.Frequency.FreeSpaceWavenumber, ElementPatterns.HalfWaveSlotHPlane, o.BeamDirection);
            Check.Relative(d * t.RadiatedPower, o.Gain, 1e-9, "Directivity.HalfSpace (composite Gauss–Legendre) of the displaced positions");
        }
    }
}
