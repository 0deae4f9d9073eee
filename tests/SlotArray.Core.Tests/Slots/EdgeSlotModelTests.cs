using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Slots;

/// <summary>The first-order edge-slot model behind <see cref="IShuntSlotModel"/>: geometry, response shape, limits.</summary>
public class EdgeSlotModelTests
{
    private static readonly Frequency F = Frequency.FromGigahertz(9.375);
    private static readonly Metal Cu = new("copper", 5.8e7, "test");
    private static EdgeSlot Model(double wallMm) => EdgeSlot.Create(
        RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(wallMm), Cu), Length.FromMillimeters(1.5875));

    /// <summary>
    /// The five moment-method admittances of moment method after Stern & Elliott 1985 (WR-90, 9.375 GHz, x = 2 mm, thin wall),
    /// with L_r = 0.45654 λ and g_r = 0.09183 (numpy [N]). Q_s must be their least-squares fit.
    /// </summary>
    private static readonly (double LengthOverLambda, Complex Y)[] MomValues =
    [
        (0.42, new Complex(0.03967, 0.04526)),
        (0.44, new Complex(0.07468, 0.03539)),
        (0.4565, new Complex(0.09183, 0.00011)),
        (0.47, new Complex(0.08260, -0.02835)),
        (0.50, new Complex(0.04697, -0.04712)),
    ];

    private static double FitResidual(double q) => MomValues.Sum(v =>
    {
        double rho = v.LengthOverLambda / 0.45654;
        var model = 0.09183 / new Complex(1, q * (rho - 1 / rho));
        return Math.Pow((v.Y - model).Magnitude, 2);
    });

    [Fact]
    public void Series_resonance_Q_is_the_least_squares_fit_to_the_moment_method_values()
    {
        // Golden-section search for the minimiser, independent of the model code.
        double lo = 1, hi = 40, phi = (Math.Sqrt(5) - 1) / 2;
        while (hi - lo > 1e-7)
        {
            double m1 = hi - phi * (hi - lo), m2 = lo + phi * (hi - lo);
            if (FitResidual(m1) < FitResidual(m2)) hi = m2; else lo = m1;
        }
        double qFit = 0.5 * (lo + hi);
        Check.Absolute(qFit, EdgeSlot.SeriesResonanceQ, 5e-4, "least-squares fit to moment method after Stern & Elliott 1985 [N]");
        double rms = Math.Sqrt(FitResidual(EdgeSlot.SeriesResonanceQ) / MomValues.Length);
        Assert.True(rms < 0.0039, $"rms complex residual {rms:G4} should be the 0.0038 stated in the doc comment");
        Assert.True(rms > 0.0037, $"rms complex residual {rms:G4} should be the 0.0038 stated in the doc comment");
    }

    [Fact]
    public void Susceptance_is_positive_below_resonance_and_negative_above()
    {
        // Sign convention of moment method after Stern & Elliott 1985: series-resonant branch in shunt.
        var m = Model(0.5);
        double th = Angle.FromDegrees(15).Radians;
        var lr = m.Resonance(th, F).ResonantLength;
        foreach (double ratio in new[] { 0.90, 0.95, 0.99 })
            Assert.True(m.Admittance(th, ratio * lr, F).Imaginary > 0, $"Im y should be > 0 at L/L_r = {ratio}");
        foreach (double ratio in new[] { 1.01, 1.05, 1.10 })
            Assert.True(m.Admittance(th, ratio * lr, F).Imaginary < 0, $"Im y should be < 0 at L/L_r = {ratio}");
        var atResonance = m.Admittance(th, lr, F);
        Check.Absolute(0.0, atResonance.Imaginary, 1e-15, "h(1) = 1");
        Check.Absolute(0.10395, atResonance.Real, 0.5e-5, "edge-slot formula (Stevenson 1948; Silver 1949): g(15°) = 0.10395");
    }

    [Fact]
    public void Admittance_is_even_in_tilt_with_non_negative_conductance()
    {
        var m = Model(0.5);
        var lr = m.ResonantLength(F);
        for (double deg = -30; deg <= 30; deg += 2.5)
            for (double ratio = 0.8; ratio <= 1.2; ratio += 0.05)
            {
                var plus = m.Admittance(Angle.FromDegrees(deg).Radians, ratio * lr, F);
                var minus = m.Admittance(Angle.FromDegrees(-deg).Radians, ratio * lr, F);
                Check.Absolute(plus.Magnitude, minus.Magnitude, 1e-15, "y(θ) = y(−θ) in magnitude (g depends on sin²θ)");
                Assert.True(plus.Real >= 0, $"Re y < 0 at θ = {deg}°, L/L_r = {ratio}");
            }
    }

    [Theory]
    [InlineData(0.5, 5)]
    [InlineData(0.5, 15)]
    [InlineData(0.0, 25)]
    [InlineData(0.8, -20)]
    public void Cut_depth_geometry_round_trips(double wallMm, double degrees)
    {
        var m = Model(wallMm);
        var tilt = Angle.FromDegrees(degrees);
        var depth = m.ResonantCutDepth(tilt, F);
        var developed = m.DevelopedLength(tilt, depth);
        Check.Relative(m.ResonantLength(F).Meters, developed.Meters, 1e-14, "depth → developed length gives the resonant length");
        Check.Relative(depth.Meters, m.CutDepth(tilt, developed).Meters, 1e-12, "developed length → depth");
        // Hand value, inner-aperture path: b/cos θ + 2(D − t) = 0.95 λ/2 with λ = 31.97786 mm (WR-90 reference case).
        double expected = wallMm + (0.95 * 31.97786 / 2 - 10.16 / Math.Cos(tilt.Radians)) / 2;
        Check.Absolute(expected, depth.Millimeters, 1e-5, "first-order geometry by hand, λ from WR-90 reference case");
    }

    [Fact]
    public void A_standard_wall_gives_a_cut_deeper_than_the_wall()
    {
        // WR-90, 1.27 mm walls, 15°: 10.16/cos 15° = 10.518 mm across the inside height, so
        // D = 1.27 + (15.190 − 10.518)/2 = 3.606 mm from the outer narrow-wall face (hand computation, inner-aperture path).
        var m = Model(1.27);
        var depth = m.ResonantCutDepth(Angle.FromDegrees(15), F);
        Check.Absolute(1.27 + (0.95 * 31.97786 / 2 - 10.16 / Math.Cos(15 * Math.PI / 180)) / 2, depth.Millimeters, 1e-6, "first-order geometry by hand");
        Assert.True(depth.Millimeters > 1.27);
        Assert.DoesNotContain(m.Warnings(Angle.FromDegrees(15).Radians, F), w => w.Code == "edge-slot-cut-too-shallow");
    }

    [Fact]
    public void A_slot_too_short_to_cross_the_inside_height_is_infeasible_and_says_so()
    {
        // A tall custom guide
        // (b = 20 mm) at 9.375 GHz: 15.19 mm < 20 mm, so no resonant cut exists.
        var tall = RectangularWaveguide.Create(Length.FromMillimeters(40), Length.FromMillimeters(20), Length.FromMillimeters(1.27), Metal.Aluminium);
        var m = EdgeSlot.Create(tall, Length.FromMillimeters(1.6));
        Assert.Contains(m.Warnings(Angle.FromDegrees(15).Radians, F), w => w.Code == "edge-slot-cut-too-shallow");
        var e = Assert.Throws<InfeasibleDesignException>(() => m.ResonantCutDepth(Angle.FromDegrees(15), F));
        Assert.Contains("inside height", e.Message);
    }

    [Fact]
    public void Every_output_carries_the_approximate_model_warning()
    {
        var m = Model(0.5);
        for (double deg = -30; deg <= 30; deg += 10)
            Assert.Contains(m.Warnings(Angle.FromDegrees(deg).Radians, F), w => w.Code == EdgeSlot.ApproximateWarningCode
                && w.Message == "edge-slot cut depth from a first-order geometric model; verify by measurement or full-wave analysis");
    }

    [Fact]
    public void Implements_the_shunt_slot_interface_with_tilt_coupling()
    {
        IShuntSlotModel m = Model(0.5);
        Assert.Equal(SlotCouplingKind.Tilt, m.CouplingKind);
        Check.Relative(Math.PI / 6, m.MaximumCoupling, 1e-15, "30° tilt limit");
        Check.Absolute(0.37129, m.MaximumConductance(F), 0.5e-5, "edge-slot formula (Stevenson 1948; Silver 1949): g(30°)");
        var r = m.ForConductance(0.10, F);
        Check.Absolute(14.701, r.Coupling * 180 / Math.PI, 0.5e-3, "edge-slot formula (Stevenson 1948; Silver 1949) inverse: g = 0.10 → 14.701°");
        Check.Relative(0.10, m.Resonance(r.Coupling, F).Conductance, 1e-10, "ForConductance → Resonance round trip");
        Check.Relative(0.95 * 31.97786e-3 / 2, r.ResonantLength.Meters, 1e-6, "κ λ/2 with λ of WR-90 reference case");
        Assert.Throws<InfeasibleDesignException>(() => m.ForConductance(0.4, F));
        Assert.Throws<ArgumentOutOfRangeException>(() => m.Admittance(Angle.FromDegrees(31).Radians, r.ResonantLength, F));
    }
}
