using System.Numerics;
using SlotArray.Core.Design;
using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Stick;
using SlotArray.Tests.Shared;
using static SlotArray.Core.Tests.DesignTests.TestArrays;

namespace SlotArray.Core.Tests.Network;

/// <summary>The line engine against closed forms of transmission-line theory (single elements, one section).</summary>
public class LineNetworkTests
{
    private static NetworkSolution One(Complex y, Termination t, double feedBeyond = 0, bool lossless = true)
        => new LineNetwork(lossless ? Wr90Lossless : Wr90, [t.Distance.Meters], t, null, t.Distance.Meters + feedBeyond)
            .Solve(F0, [y], [1.0]);

    [Fact]
    public void A_shunt_conductance_on_a_matched_line_absorbs_4g_over_2_plus_g_squared()
    {
        // single shunt on a matched line, from Γ = −g/(2 + g) (Pozar 2012, Sec. 4.x circuit theory) [D]: absorbed 4g/(2+g)², reflected g²/(2+g)², transmitted 4/(2+g)²; Γ = −g/(2+g)
        // (y_in = 1 + g; Pozar 2012 Sec. 2.3, from memory).
        const string src = "shunt conductance on a matched line [D]";
        double g = 0.3;
        var s = One(g, Termination.MatchedLoadAt(Length.Zero));
        Check.Absolute(4 * g / ((2 + g) * (2 + g)), s.RadiatedPowers[0], 1e-12, src);
        Check.Absolute(g * g / ((2 + g) * (2 + g)), s.ReflectedPower, 1e-12, src);
        Check.Absolute(4 / ((2 + g) * (2 + g)), s.LoadPower, 1e-12, src);
        Check.Absolute(-g / (2 + g), s.S11.Real, 1e-12, src);
        Check.Absolute(0, s.S11.Imaginary, 1e-12, src);
    }

    [Fact]
    public void A_matched_line_delivers_exp_minus_2_alpha_L_and_loses_the_rest_in_its_walls()
    {
        // P(z) = P0 e^{−2αz} on a matched lossy line (Pozar 2012 Sec. 2.7, from memory); α from the guide (Pozar eq. 3.96).
        const string src = "Pozar 2012 Sec. 2.7: matched lossy line";
        var length = Length.FromMeters(1.5);
        var s = One(Complex.Zero, Termination.MatchedLoadAt(length), lossless: false);
        double expected = Math.Exp(-2 * Wr90.ConductorAttenuation(F0) * length.Meters);
        Check.Relative(expected, s.LoadPower, 1e-12, src);
        Check.Relative(1 - expected, s.WallLoss, 1e-9, src);
        Check.Absolute(0, s.S11.Magnitude, 1e-15, src + ": no reflection from a matched load");
    }

    [Fact]
    public void A_short_a_quarter_guide_wavelength_behind_a_slot_is_an_open_circuit()
    {
        // Shorted λg/4 stub: y = −j cot(βλg/4) = 0 (Pozar 2012 Sec. 2.3, from memory), so y_in = g and Γ = (1 − g)/(1 + g).
        double g = 0.4;
        var s = One(g, Termination.ShortAt(0.25 * Wr90.GuideWavelength(F0)));
        Check.Absolute((1 - g) / (1 + g), s.S11.Real, 1e-12, "Pozar 2012 Sec. 2.3: shorted quarter-wave stub");
        Check.Absolute(0, s.S11.Imaginary, 1e-12, "Pozar 2012 Sec. 2.3: shorted quarter-wave stub");
        Check.Absolute(1 - s.ReflectedPower, s.RadiatedPowers[0], 1e-12, "lossless: all accepted power is radiated");
    }

    [Fact]
    public void A_load_behind_a_quarter_wave_section_is_inverted_and_behind_a_half_wave_section_repeated()
    {
        // Quarter-wave inverter y → 1/y_L and half-wave repetition (Pozar 2012 Sec. 2.5, from memory).
        var yl = new Complex(0.3, 0.4);
        var lg = Wr90.GuideWavelength(F0);
        Complex Gamma(Complex y) => (1 - y) / (1 + y);
        var quarter = One(Complex.Zero, Termination.LoadAt(0.25 * lg, yl));
        var half = One(Complex.Zero, Termination.LoadAt(0.5 * lg, yl));
        Assert.True((quarter.S11 - Gamma(1 / yl)).Magnitude < 1e-12, $"quarter wave: {quarter.S11} vs {Gamma(1 / yl)}");
        Assert.True((half.S11 - Gamma(yl)).Magnitude < 1e-12, $"half wave: {half.S11} vs {Gamma(yl)}");
        Check.Absolute(1 - half.ReflectedPower, half.LoadPower, 1e-12, "lossless line: accepted power reaches the load");
    }

    [Fact]
    public void The_standing_wave_peak_on_the_feed_section_is_one_plus_the_reflection_magnitude()
    {
        // |V|max = |V+|(1 + |Γ|) on a lossless line (Pozar 2012 Sec. 2.3, from memory). g = 3 behind a shorted λg/4 stub:
        // Γ = (1 − 3)/(1 + 3) = −0.5; the feed plane 0.6 λg beyond the slot so the section holds a full standing-wave period.
        var lg = Wr90.GuideWavelength(F0);
        var t = Termination.ShortAt(0.25 * lg);
        var s = new LineNetwork(Wr90Lossless, [t.Distance.Meters], t, null, t.Distance.Meters + 0.6 * lg.Meters).Solve(F0, [3.0], [1.0]);
        Check.Absolute(0.5, s.S11.Magnitude, 1e-12, "Γ = (1 − y)/(1 + y)");
        Check.Absolute(1.5, s.PeakModeVoltage, 1e-12, "Pozar 2012 Sec. 2.3: |V|max = 1 + |Γ|");
        // The voltage minimum 1 − |Γ| sits at the slot (y real > 1), so the maximum is λg/4 beyond it.
        Check.Absolute(t.Distance.Meters + 0.25 * lg.Meters, s.PeakPosition.Meters, 1e-9, "maximum a quarter guide wavelength from the minimum");
    }
}
