using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Tolerance;
using SlotArray.Tests.Shared;
using Xunit.Abstractions;
using static SlotArray.Core.Tests.DesignTests.TestArrays;

namespace SlotArray.Core.Tests.ToleranceTests;

/// <summary>
/// The per-slot surrogate against direct solves of the moment-method slot model (WR-90, 1.27 mm wall, 9.375 GHz,
/// w = 1.5875 mm, x = 2 mm, L = 15.15 mm, near the model's resonance): the reference is the real model itself.
/// </summary>
public class SlotSurrogateTests(ITestOutputHelper output)
{
    private static readonly MomentMethodSlotModel Model = new(Wr90, Width);
    private static readonly SlotModelFactory Factory = (g, w) => new MomentMethodSlotModel(g, w);
    private const double X0 = 2e-3, L0 = 15.15e-3;

    [Fact]
    public void Surface_matches_direct_moment_method_solves_over_the_tolerance_range()
    {
        const double rx = 0.03e-3, rl = 0.05e-3;
        var s = new SlotSurrogate(Model, Factory, -X0, Length.FromMeters(L0), F0, rx, rl, 0, 0, 0);
        var y0 = Model.Admittance(X0, Length.FromMeters(L0), F0);
        Assert.Equal(y0, s.Nominal);                       // the centre is a node: exact
        Assert.Equal(y0, s.Admittance(0, 0, 0, 0, 0));
        double worst = 0;
        var r = new TrialRandom(5, 0);
        for (int i = 0; i < 10; i++)
        {
            double dx = rx * (2 * r.NextUniform() - 1), dl = rl * (2 * r.NextUniform() - 1);
            if (i == 0) (dx, dl) = (rx, rl);              // a corner, where interpolation is worst
            var direct = Model.Admittance(X0 + dx, Length.FromMeters(L0 + dl), F0);
            worst = Math.Max(worst, (s.Admittance(dx, dl, 0, 0, 0) - direct).Magnitude / y0.Magnitude);
        }
        output.WriteLine($"max |y_surrogate − y_direct| / |y0| = {worst:E2} over ±0.03 mm offset, ±0.05 mm length (5 × 5 nodes)");
        // A degree-4 interpolant of a function varying on the resonance scale (~1 mm of length) over ±0.05 mm:
        // (0.05/1)^5 ≈ 3e-7; 1e-5 leaves room for the moment method's own rounding.
        Assert.True(worst < 1e-5, $"surrogate error {worst:E2}");
        // Outside the rectangle the real model is used.
        Assert.Equal(Model.Admittance(X0 + 2 * rx, Length.FromMeters(L0), F0), s.Admittance(2 * rx, 0, 0, 0, 0));
    }

    [Fact]
    public void First_order_width_wall_and_guide_terms_match_direct_solves_at_the_edge_of_the_range()
    {
        const double rw = 0.02e-3, rt = 0.05e-3, ra = 0.05e-3;
        var s = new SlotSurrogate(Model, Factory, X0, Length.FromMeters(L0), F0, 0, 0, rw, rt, ra);
        var y0 = s.Nominal;
        Complex Direct(double dw, double dt, double da)
            => new MomentMethodSlotModel(Wr90 with { WallThickness = Wr90.WallThickness + Length.FromMeters(dt), BroadWall = Wr90.BroadWall + Length.FromMeters(da) },
                Width + Length.FromMeters(dw)).Admittance(X0, Length.FromMeters(L0), F0);
        var all = Direct(rw, rt, ra);
        double eAll = (s.Admittance(0, 0, rw, rt, ra) - all).Magnitude / y0.Magnitude;
        double change = (all - y0).Magnitude / y0.Magnitude;
        output.WriteLine($"w +0.02, t +0.05, a +0.05 mm together: |Δy|/|y0| = {change:E2}, first-order error {eAll:E2}");
        // The error of a first-order model is of second order: well below the change itself.
        Assert.True(eAll < 0.05 * change, $"first-order error {eAll:E2} vs change {change:E2}");
        Assert.True(change > 1e-3, "the three errors together move y measurably");
    }
}
