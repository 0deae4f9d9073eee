using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Slots;

/// <summary>Babinet/Booker, the thin-dipole self-impedance, the feed offset and the VSWR band of a slot in a ground plane.</summary>
public class GroundPlaneSlotTests
{
    private static readonly Frequency F = Frequency.FromGigahertz(9.375);

    [Fact]
    public void Babinet_worked_value_two_and_one_sided()
    {
        // Booker 1946, numpy [N], η = η0 = 376.730 Ω; quoted to 0.01 Ω.
        var zd = new Complex(73, 42.5);
        var two = Babinet.SlotImpedance(zd, oneSided: false);
        var one = Babinet.SlotImpedance(zd, oneSided: true);
        Check.Absolute(363.01, two.Real, 0.005, "Booker 1946");
        Check.Absolute(-211.34, two.Imaginary, 0.005, "Booker 1946");
        Check.Absolute(726.01, one.Real, 0.005, "Booker 1946");
        Check.Absolute(-422.68, one.Imaginary, 0.005, "Booker 1946");
        var classical = Babinet.SlotImpedance(zd, oneSided: false, eta: 120 * Math.PI);
        Check.Absolute(363.51, classical.Real, 0.005, "Booker 1946, η = 120π");
        Check.Absolute(-211.63, classical.Imaginary, 0.005, "Booker 1946, η = 120π");
    }

    [Fact]
    public void Thin_half_wave_dipole_self_impedance()
    {
        // Carter 1932 induced EMF [N]: 73.08 + j42.51 Ω; Orfanidis imped.m documentation 73.079 + j42.515 [S].
        // At L = λ/2 the radius term drops out (sin kL = 0), so any thin radius gives it.
        var z = GroundPlaneSlot.DipoleImpedance(0.5 * F.FreeSpaceWavelength, Length.FromMillimeters(0.001), F);
        Check.Absolute(73.079, z.Real, 0.0005, "Orfanidis, Electromagnetic Waves and Antennas, imped.m documentation [S]");
        Check.Absolute(42.515, z.Imaginary, 0.0005, "Orfanidis, Electromagnetic Waves and Antennas, imped.m documentation [S]");
    }

    [Theory]
    [InlineData(15.0, 1.5875, 60.85758916, 13.77261857, 60.78195138)]
    [InlineData(14.0, 1.0, 50.43124321, -24.08053695, 50.40644155)]
    public void Dipole_of_arbitrary_length_matches_an_independent_evaluation(double lengthMm, double widthMm, double r, double x, double rByIntegration)
    {
        // r, x: the Balanis (8-60a/b, 8-61a) closed form evaluated with mpmath 1.3.0 si/ci at 25 digits (implementation check).
        // rByIntegration: induced-EMF integral of Carter 1932 (E_z of a sinusoidal current at distance w/4),
        // by mpmath quad: an independent model; the resistance hardly depends on radius, so 0.2 % agreement.
        var z = GroundPlaneSlot.DipoleImpedance(Length.FromMillimeters(lengthMm), Length.FromMillimeters(widthMm / 4), F);
        Check.Relative(r, z.Real, 1e-8, "mpmath closed form");
        Check.Relative(x, z.Imaginary, 1e-8, "mpmath closed form");
        Check.Relative(rByIntegration, z.Real, 2e-3, "mpmath quad of the induced-EMF integral");
    }

    [Fact]
    public void Analysis_of_a_15_mm_slot_two_sided_with_50_ohm_feed()
    {
        var a = GroundPlaneSlot.Analyze(Length.FromMillimeters(15), Length.FromMillimeters(1.5875), F, 50, oneSided: false);
        // Reference: mpmath evaluation of the same dipole closed form and of η²/(4 Z_d) (see above), and
        // s = asin(√(50 sin²(kL/2)/R_c))/k of the transmission-line model.
        Check.Relative(554.61873847, a.SlotImpedanceTwoSided.Real, 1e-8, "mpmath: η0²/(4 Z_d)");
        Check.Relative(-125.51519776, a.SlotImpedanceTwoSided.Imaginary, 1e-8, "mpmath: η0²/(4 Z_d)");
        Check.Relative(1109.2374769, a.SlotImpedanceOneSided.Real, 1e-8, "mpmath: η0²/(2 Z_d)");
        Check.Relative(1.5445114227, a.FeedOffset.Millimeters, 1e-8, "mpmath: feed offset for 50 Ω");
        Check.Relative(50, a.FeedImpedance.Real, 1e-10, "residual: Re Z(s) = target");
        Check.Relative(14.496819210, a.ResonantLength.Millimeters, 1e-8, "mpmath bisection of X(L) = 0 in the closed form");
        Check.Relative(a.CentreImpedance.Real, a.SlotImpedanceTwoSided.Real, 0, "two-sided chosen");
    }

    [Fact]
    public void Half_wave_slot_feed_follows_R_centre_sin_squared()
    {
        // For L = λ/2 the model is R(s) = R_centre sin²(ks) (common practice, no source).
        var len = 0.5 * F.FreeSpaceWavelength;
        var a = GroundPlaneSlot.Analyze(len, Length.FromMillimeters(0.5), F, 50, oneSided: true);
        double k = F.FreeSpaceWavenumber;
        Check.Relative(50, a.CentreImpedance.Real * Math.Pow(Math.Sin(k * a.FeedOffset.Meters), 2), 1e-10, "R_centre sin²(ks) = 50 Ω");
        var atCentre = GroundPlaneSlot.FeedImpedance(len, Length.FromMillimeters(0.5), 0.5 * len, F, oneSided: true);
        Check.Relative(a.CentreImpedance.Real, atCentre.Real, 1e-12, "feed at the centre sees the centre impedance");
    }

    [Fact]
    public void Vswr_is_two_at_the_band_edges_and_below_inside()
    {
        var w = Length.FromMillimeters(1.5875);
        var len = GroundPlaneSlot.ResonantLength(w, F);
        var a = GroundPlaneSlot.Analyze(len, w, F, 50, oneSided: false);
        Assert.NotNull(a.BandLow);
        Assert.NotNull(a.BandHigh);
        double Vswr(Frequency f)
        {
            var z = GroundPlaneSlot.FeedImpedance(len, w, a.FeedOffset, f, oneSided: false);
            double g = ((z - 50) / (z + 50)).Magnitude;
            return (1 + g) / (1 - g);
        }
        Check.Absolute(2.0, Vswr(a.BandLow!.Value), 1e-5, "definition of the VSWR ≤ 2 band");
        Check.Absolute(2.0, Vswr(a.BandHigh!.Value), 1e-5, "definition of the VSWR ≤ 2 band");
        Check.Absolute(1.0, Vswr(F), 1e-6, "resonant slot fed at 50 Ω: matched");
        for (int i = 1; i < 10; i++)
            Assert.True(Vswr(Frequency.FromHertz(a.BandLow.Value.Hertz + i * (a.BandHigh.Value.Hertz - a.BandLow.Value.Hertz) / 10)) <= 2);
        Assert.True(a.FractionalBandwidth > 0.01 && a.FractionalBandwidth < 0.5, $"bandwidth {a.FractionalBandwidth:P2}");
    }

    [Fact]
    public void A_target_above_the_centre_resistance_is_infeasible()
    {
        var e = Assert.Throws<InfeasibleDesignException>(() =>
            GroundPlaneSlot.Analyze(Length.FromMillimeters(15), Length.FromMillimeters(1.5875), F, 2000, oneSided: false));
        Assert.Contains("554.62", e.Message);
    }
}
