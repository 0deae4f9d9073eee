using SlotArray.Core.Design;
using SlotArray.Core.Tapers;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.TravellingWave;

/// <summary>Closed-form conductances of a matched-load array (Elliott 1981, Ch. 8).</summary>
public class TravellingWaveConductancesTests
{
    private const string Source = "Elliott 1981, Ch. 8 [N] (Taylor 30 dB, n̄ = 4, N = 16, scipy sampled, lossless), given to 5 decimals";

    /// <summary>P_n = (1 − P_L) a_n²/Σ a², feed first (the reference numbers slots from the feed; the taper is symmetric).</summary>
    private static double[] Powers(double loadFraction)
    {
        var a = TaylorLineSource.Weights(16, -30, 4);
        double s = a.Sum(x => x * x);
        return a.Select(x => (1 - loadFraction) * x * x / s).ToArray();
    }

    [Fact]
    public void Small_g_conductances_match_the_reference_with_5_percent_to_the_load()
    {
        double[] expected = [0.00783, 0.01287, 0.02472, 0.04465, 0.07228, 0.10635, 0.14546, 0.18794,
            0.23143, 0.27274, 0.30681, 0.32425, 0.31024, 0.25531, 0.18092, 0.13542];
        var b = TravellingWaveConductances.FromFeed(Powers(0.05), TravellingWaveConductanceForm.SmallConductance);
        for (int i = 0; i < 16; i++) Check.Absolute(expected[i], b.Conductances[i], 5.1e-6, Source);
        Check.Absolute(0.05, b.PowerPastLastSlot, 1e-12, "Σ P_n = 1 − P_L: the load receives P_L (definition)");
    }

    [Fact]
    public void Small_g_conductances_match_the_reference_with_10_percent_to_the_load()
    {
        double[] expected = [0.00742, 0.01219, 0.02339, 0.04219, 0.06813, 0.09980, 0.13551, 0.17307,
            0.20929, 0.23973, 0.25797, 0.25469, 0.22094, 0.16098, 0.10125, 0.06907];
        var b = TravellingWaveConductances.FromFeed(Powers(0.10), TravellingWaveConductanceForm.SmallConductance);
        for (int i = 0; i < 16; i++) Check.Absolute(expected[i], b.Conductances[i], 5.1e-6, Source);
    }

    [Fact]
    public void Single_shunt_conductances_match_the_reference_with_10_percent_to_the_load()
    {
        double[] expected = [0.00747, 0.01234, 0.02395, 0.04408, 0.07327, 0.11146, 0.15873, 0.21495,
            0.27913, 0.34865, 0.41634, 0.46233, 0.44773, 0.35125, 0.23056, 0.16575];
        var b = TravellingWaveConductances.FromFeed(Powers(0.10), TravellingWaveConductanceForm.SingleShunt);
        for (int i = 0; i < 16; i++) Check.Absolute(expected[i], b.Conductances[i], 5.1e-6, Source);
        Check.Absolute(0.04476, b.PowerPastLastSlot, 5.1e-6, "Elliott 1981, Ch. 8 [N]: power left for the load 0.04476 after booking reflections as lost");
        Check.Absolute(1, b.PowerPastLastSlot + b.ReflectedPower + Powers(0.10).Sum(), 1e-12, "lossless: radiated + reflected + load = 1");
    }

    [Fact]
    public void Single_shunt_form_fails_at_slot_13_with_5_percent_to_the_load()
    {
        // Elliott 1981, Ch. 8 [N]: the single-shunt form fails at slot 13 (p = 0.607 > 0.5).
        var e = Assert.Throws<InfeasibleDesignException>(() =>
            TravellingWaveConductances.FromFeed(Powers(0.05), TravellingWaveConductanceForm.SingleShunt));
        Assert.Contains("slot 13", e.Message);
        Assert.Contains("p = 0.607", e.Message);
        Assert.Contains("leave more power for the load", e.Message);
    }

    [Theory]
    [InlineData(1e-6)]
    [InlineData(0.01)]
    [InlineData(0.2)]
    [InlineData(0.45)]
    [InlineData(0.5)]
    public void Single_shunt_inversion_round_trips_the_absorbed_fraction(double p)
    {
        // p = 4g/(2 + g)² (Elliott 1981, Ch. 8 [D]: |Γ|² + |τ|² + p = 1 for Γ = −g/(2 + g), τ = 2/(2 + g)).
        double g = TravellingWaveConductances.SingleShuntConductance(p);
        Check.Relative(p, TravellingWaveConductances.AbsorbedFraction(g), 1e-12, "p(g(p)) = p");
        double tau = 2 / (2 + g), gamma = g / (2 + g);
        Check.Absolute(1, p + tau * tau + gamma * gamma, 1e-12, "power balance of a shunt conductance between matched lines");
        Assert.True(g <= 2 + 1e-12, "the root taken is g ≤ 2");
    }

    [Fact]
    public void Single_shunt_inversion_refuses_more_than_half_the_arriving_power()
    {
        // Elliott 1981, Ch. 8: p = 0.607 must raise an error.
        var e = Assert.Throws<InfeasibleDesignException>(() => TravellingWaveConductances.SingleShuntConductance(0.607));
        Assert.Contains("0.607", e.Message);
        Check.Absolute(2, TravellingWaveConductances.SingleShuntConductance(0.5), 1e-12, "Elliott 1981, Ch. 8: p = 0.5 at g = 2");
    }

    [Fact]
    public void Line_loss_reduces_the_power_arriving_at_each_slot_by_the_section_transmission()
    {
        // Elliott 1981, Ch. 8: multiply the available power by e^(−2αd) per section. Two slots, small-g form.
        double t = Math.Exp(-2 * 0.0132497 * 0.021);   // α of WR-90 copper at 9.375 GHz (Pozar 2012 eq. 3.96, numpy [N]), d = 21 mm
        var b = TravellingWaveConductances.FromFeed([0.2, 0.3], TravellingWaveConductanceForm.SmallConductance, t);
        Check.Relative(0.2, b.Conductances[0], 1e-14, "g_1 = P_1/1");
        Check.Relative(0.3 / (0.8 * t), b.Conductances[1], 1e-14, "g_2 = P_2/((1 − P_1) e^(−2αd))");
        Check.Relative((0.8 * t) - 0.3, b.PowerPastLastSlot, 1e-14, "what is left after slot 2");
        Check.Relative(0.8 * (1 - t), b.WallLoss, 1e-12, "wall loss of the one section");
    }
}
