using System.Numerics;
using SlotArray.Core.Design;
using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;
using SlotArray.Core.Tests.DesignTests;
using SlotArray.Tests.Shared;
using static SlotArray.Core.Tests.DesignTests.TestArrays;

namespace SlotArray.Core.Tests.ElliottTests;

/// <summary>Elliott's design procedure with mutual coupling: the uncoupled limit, self-consistency, convergence, failures.</summary>
public class ElliottDesignerTests
{
    private static double[] Taylor(int n, double sll) =>
        TaperSynthesis.Synthesize(new TaperRequest(TaperType.Taylor, -sll, 4, -20, 2, null), n).Weights.ToArray();

    /// <summary>Slot-voltage errors (dB, deg) against the taper after the best complex scale (least squares).</summary>
    internal static (double Db, double Deg) TaperError(IReadOnlyList<Complex> e, IReadOnlyList<double> a)
    {
        Complex k = 0;
        for (int i = 0; i < a.Count; i++) k += e[i] * a[i];
        k /= a.Sum(v => v * v);
        double db = 0, deg = 0;
        for (int i = 0; i < a.Count; i++)
        {
            var r = e[i] / (k * a[i]);
            db = Math.Max(db, Math.Abs(20 * Math.Log10(r.Magnitude)));
            deg = Math.Max(deg, Math.Abs(r.Phase * 180 / Math.PI));
        }
        return (db, deg);
    }

    [Theory]
    [InlineData(FeedPosition.End)]
    [InlineData(FeedPosition.Centre)]
    public void Without_coupling_it_returns_the_isolated_slot_design(FeedPosition feed)
    {
        // Elliott 1983: with Z_mn = 0, (E2) gives Y^a = Y; for a slot with Stevenson's g_r = Γ0 f_r² and an
        // offset-independent resonant length (the test double) the targets f_n|a_n|/Σ f|a| equal a_n²/Σ a² (Elliott 1981, Ch. 8).
        var slot = new StevensonTestSlot(Wr90, Width);
        var request = Request(10, feed);
        var plain = StandingWaveDesigner.Design(StickRequest.Of(request, slot, Taylor25Amplitudes)).Design;
        var r = ElliottDesigner.Design(StickRequest.Of(request, slot, Taylor25Amplitudes), new ElliottOptions(Coupling: CoupledSlotImpedances.None));
        for (int i = 0; i < 10; i++)
        {
            Check.Absolute(plain.Slots[i].Coupling, r.Design.Slots[i].Coupling, 1e-9, "isolated-slot design, Elliott 1981, Ch. 8 (1e-6 mm)");
            Check.Absolute(plain.Slots[i].Length.Meters, r.Design.Slots[i].Length.Meters, 1e-9, "isolated-slot design (1e-6 mm)");
            Check.Relative(plain.Slots[i].Conductance, r.Design.Slots[i].Conductance, 1e-6, "g_n = a_n²/Σ a², Elliott 1981, Ch. 8");
        }
        Assert.True(r.Iterations.Count <= 2, $"{r.Iterations.Count} iterations for an uncoupled design");
    }

    [Theory]
    [InlineData(8, 20)]
    [InlineData(16, 30)]
    [InlineData(32, 40)]
    [InlineData(64, 25)]
    [InlineData(64, 40)]
    public void Converges_and_the_coupled_analysis_confirms_match_and_taper(int n, double sll)
    {
        // Issue 8 acceptance: S11 < −30 dB at f0 and slot voltages within 0.1 dB and 1° of the taper under the coupled
        // analysis (the same (E2) structure, Elliott 1983). Lossless line: equal mode voltages (Elliott 1983).
        var slot = new StevensonTestSlot(Wr90Lossless, Width, maximumCoupling: 6e-3);
        var a = Taylor(n, sll);
        var r = ElliottDesigner.Design(StickRequest.Of(Request(n, guide: Wr90Lossless), slot, a));
        var last = r.Iterations[^1];
        Assert.True(Math.Max(last.MaximumOffsetChange, last.MaximumLengthChange) < r.Tolerance);
        Assert.Equal(Enumerable.Range(1, r.Iterations.Count), r.Iterations.Select(i => i.Index));
        var s = CoupledArrayNetwork.Solve(r.Design, slot, F0);
        Assert.True(20 * Math.Log10(s.S11.Magnitude) < -30, $"S11 = {20 * Math.Log10(s.S11.Magnitude):0.0} dB");
        var (db, deg) = TaperError(s.Excitations, a);
        Assert.True(db < 0.1 && deg < 1, $"slot voltages off the taper by {db:0.000} dB, {deg:0.00}°");
        // The correction is real: the isolated-slot design is worse under the same analysis.
        var u = CoupledArrayNetwork.Solve(r.Uncoupled, slot, F0);
        Assert.True(u.S11.Magnitude > 3 * s.S11.Magnitude, $"uncoupled |S11| {u.S11.Magnitude:G3} vs coupled {s.S11.Magnitude:G3}");
    }

    [Fact]
    public void A_moment_method_design_is_self_consistent()
    {
        // The moment-method slot through the spline surrogate; checked with direct solves in the coupled analysis.
        var mom = new MomentMethodSlotModel(Wr90Lossless, Width);
        var a = Uniform(6);
        var r = ElliottDesigner.Design(StickRequest.Of(Request(6, guide: Wr90Lossless), mom, a));
        Assert.True(r.SurrogateError < 5e-3, $"surrogate error {r.SurrogateError:G3}");
        var s = CoupledArrayNetwork.Solve(r.Design, mom, F0);
        Assert.True(20 * Math.Log10(s.S11.Magnitude) < -30, $"S11 = {20 * Math.Log10(s.S11.Magnitude):0.0} dB");
        var (db, deg) = TaperError(s.Excitations, a);
        Assert.True(db < 0.1 && deg < 1, $"slot voltages off the taper by {db:0.000} dB, {deg:0.00}°");
        // Symmetric array, symmetric design (common practice, no source: a uniform end-fed standing-wave array is mirror symmetric).
        for (int i = 0; i < 3; i++)
            Check.Absolute(-r.Design.Slots[i].Coupling, r.Design.Slots[5 - i].Coupling, 1e-8, "mirror symmetry of the layout");
    }

    [Fact]
    public void The_surrogate_matches_direct_moment_method_solves_between_its_nodes()
    {
        var mom = new MomentMethodSlotModel(Wr90Lossless, Width);
        var s = new ElliottSlotSurrogate(mom, F0);
        foreach (var (x, u) in new[] { (0.7e-3, 0.97), (2.1e-3, 1.01), (3.3e-3, 1.05), (4.9e-3, 0.93) })
        {
            double l = s.ResonantLength(x) * u;
            var direct = mom.Admittance(x, Length.FromMeters(l), F0);
            Check.Absolute(0, (s.Admittance(x, l) - direct).Magnitude / direct.Magnitude, 5e-3, "direct moment-method solve (moment method after Stern & Elliott 1985)");
        }
    }

    [Fact]
    public void An_iteration_that_does_not_meet_the_tolerance_fails_naming_the_slot()
    {
        var slot = new StevensonTestSlot(Wr90, Width);
        var e = Assert.Throws<ConvergenceException>(() =>
            ElliottDesigner.Design(StickRequest.Of(Request(10), slot, Taylor25Amplitudes), new ElliottOptions(MaximumIterations: 1)));
        Assert.Contains("slot ", e.Message);
        Assert.True(e.Residual > 1e-7);
    }

    [Fact]
    public void A_request_the_coupled_slots_cannot_meet_is_infeasible_and_says_which_slot()
    {
        // Uniform 6: the isolated design needs |x| = 2.75 mm class offsets; coupling raises them (inner slots most).
        var probe = new StevensonTestSlot(Wr90, Width);
        double x0 = Math.Abs(StandingWaveDesigner.Design(StickRequest.Of(Request(6), probe, Uniform(6))).Design.Slots[0].Coupling);
        var slot = new StevensonTestSlot(Wr90, Width, maximumCoupling: 1.002 * x0);
        var e = Assert.Throws<InfeasibleDesignException>(() => ElliottDesigner.Design(StickRequest.Of(Request(6), slot, Uniform(6))));
        Assert.Contains("slot ", e.Message);
    }
}
