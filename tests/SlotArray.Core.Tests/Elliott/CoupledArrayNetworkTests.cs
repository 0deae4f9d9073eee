using System.Numerics;
using SlotArray.Core.Coupling;
using SlotArray.Core.Design;
using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tests.DesignTests;
using SlotArray.Tests.Shared;
using static SlotArray.Core.Tests.DesignTests.TestArrays;

namespace SlotArray.Core.Tests.ElliottTests;

/// <summary>The coupled network: the uncoupled limit, power conservation, reciprocity, the isolated-slot design's detuning.</summary>
public class CoupledArrayNetworkTests
{
    private static readonly Frequency[] Band = [Frequency.FromGigahertz(9.0), Frequency.FromGigahertz(9.375), Frequency.FromGigahertz(9.7)];

    [Theory]
    [InlineData(FeedPosition.End)]
    [InlineData(FeedPosition.Centre)]
    public void With_zero_mutual_terms_it_reproduces_the_uncoupled_network(FeedPosition feed)
    {
        var slot = new StevensonTestSlot(Wr90, Width);
        var d = StandingWaveDesigner.Design(StickRequest.Of(Request(10, feed), slot, Taylor25Amplitudes)).Design;
        foreach (var f in Band)
        {
            var u = ArrayNetwork.Solve(d, slot, f);
            var c = CoupledArrayNetwork.Solve(d, slot, f, CoupledSlotImpedances.None);
            Check.Absolute(0, (c.S11 - u.S11).Magnitude, 1e-12, "ArrayNetwork (the same line, no coupling)");
            Check.Absolute(u.WallLoss, c.WallLoss, 1e-12, "ArrayNetwork");
            Check.Absolute(u.PeakModeVoltage, c.PeakModeVoltage, 1e-10, "ArrayNetwork");
            double gamma0 = ElliottDesignEquations.Gamma0(d.Guide, f);
            for (int i = 0; i < d.Count; i++)
            {
                Check.Absolute(0, (c.ModeVoltages[i] - u.ModeVoltages[i]).Magnitude, 1e-11, "ArrayNetwork");
                Check.Absolute(u.RadiatedPowers[i], c.RadiatedPowers[i], 1e-12, "ArrayNetwork");
                // Slot voltage without coupling: w = y V/f (Elliott 1983, (E1) with Y^a = Y).
                var s = d.Slots[i];
                double fn = ElliottDesignEquations.CouplingFunction(d.Guide, f, Length.FromMeters(s.Coupling), 0.5 * s.Length);
                Check.Absolute(0, (c.Excitations[i] - u.SlotAdmittances[i] * u.ModeVoltages[i] / (fn * Math.Sqrt(gamma0))).Magnitude, 1e-11, "(E1), Elliott 1983");
            }
        }
    }

    [Theory]
    [InlineData(FeedPosition.End)]
    [InlineData(FeedPosition.Centre)]
    public void Radiated_power_from_the_slot_voltages_balances_the_incident_power(FeedPosition feed)
    {
        // Energy conservation: P_rad = Re(w^H (D + M) w) (the slots' quadratic form, independent of the line solution)
        // plus wall loss plus |S11|² = 1.
        var slot = new StevensonTestSlot(Wr90, Width);
        var d = StandingWaveDesigner.Design(StickRequest.Of(Request(10, feed), slot, Taylor25Amplitudes)).Design;
        var model = CoupledSlotImpedances.HalfCosineCentreReferred;
        foreach (var f in Band)
        {
            var c = CoupledArrayNetwork.Solve(d, slot, f, model);
            double gamma0 = ElliottDesignEquations.Gamma0(d.Guide, f);
            var z = model(d.Slots.Select(s => new LongitudinalSlotPlacement(s.Position, Length.FromMeters(s.Coupling), 0.5 * s.Length)).ToList(), Width, f);
            var w = c.Excitations.Select(e => e * Math.Sqrt(gamma0)).ToArray();
            Complex q = 0;
            for (int i = 0; i < d.Count; i++)
            {
                var s = d.Slots[i];
                double fn = ElliottDesignEquations.CouplingFunction(d.Guide, f, Length.FromMeters(s.Coupling), 0.5 * s.Length);
                q += Complex.Conjugate(w[i]) * fn * fn / slot.Admittance(s.Coupling, s.Length, f) * w[i];
                for (int j = 0; j < d.Count; j++)
                    if (j != i) q += Complex.Conjugate(w[i]) * z[i, j] / (gamma0 * 73.0) * w[j];
            }
            // Powers in units of P_inc = ½|V+|² (NetworkSolution): P = 2 · ½ Re(Σ i* V) = Re(w^H (D + M) w).
            Check.Absolute(1, q.Real + c.WallLoss + c.ReflectedPower, 1e-9, "conservation of energy");
            Check.Absolute(q.Real, c.RadiatedPower, 1e-9, "conservation of energy (line side)");
        }
    }

    [Fact]
    public void The_slot_admittance_matrix_is_reciprocal_and_diagonal_without_coupling()
    {
        var slot = new StevensonTestSlot(Wr90, Width);
        var d = StandingWaveDesigner.Design(StickRequest.Of(Request(8, FeedPosition.Centre), slot, Uniform(8))).Design;
        var f = Frequency.FromGigahertz(9.5);
        var y = CoupledArrayNetwork.SlotAdmittanceMatrix(d, slot, f);
        for (int i = 0; i < 8; i++)
            for (int j = 0; j < 8; j++)
                Check.Absolute(0, (y[i, j] - y[j, i]).Magnitude, 1e-12 * y[i, i].Magnitude, "reciprocity (Lorentz)");
        Assert.True(y[0, 1].Magnitude > 1e-3 * y[0, 0].Magnitude, "coupling absent");
        var y0 = CoupledArrayNetwork.SlotAdmittanceMatrix(d, slot, f, CoupledSlotImpedances.None);
        for (int i = 0; i < 8; i++)
        {
            var s = d.Slots[i];
            Check.Absolute(0, (y0[i, i] - slot.Admittance(s.Coupling, s.Length, f)).Magnitude, 1e-14, "isolated slot admittance");
            Assert.Equal(Complex.Zero, y0[i, (i + 1) % 8]);
        }
    }

    [Fact]
    public void An_isolated_slot_design_of_six_uniform_slots_is_detuned_downward_by_coupling()
    {
        // Issue 8 cites an independent full-wave computation of a uniform 6-slot WR-90 array designed from isolated-slot
        // data: best match about 0.85 % below the design frequency, y_in ≈ 0.93 + j0.12 at it. Only the direction is
        // asserted (not tuned); this model gives about −1.05 % and 0.92 + j0.15 (lossless line, moment-method slot).
        var mom = new MomentMethodSlotModel(Wr90Lossless, Width);
        var d = StandingWaveDesigner.Design(StickRequest.Of(Request(6, guide: Wr90Lossless), mom, Uniform(6))).Design;
        var at = CoupledArrayNetwork.Solve(d, mom, F0);
        var yin = (1 - at.S11) / (1 + at.S11);
        Assert.True(yin.Real < 1 && yin.Imaginary > 0, $"y_in = {yin}");
        var best = CoupledArrayNetwork.BestMatch(d, mom, Frequency.FromGigahertz(9.2), Frequency.FromGigahertz(9.5), 16);
        double shift = best.Frequency.Hertz / F0.Hertz - 1;
        Assert.True(shift < -0.003 && shift > -0.02, $"best match shift {shift * 100:0.000} %");
    }
}
