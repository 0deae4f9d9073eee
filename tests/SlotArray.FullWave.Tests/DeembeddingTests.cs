using System.Numerics;
using SlotArray.FullWave.Slots;
using SlotArray.Tests.Shared;

namespace SlotArray.FullWave.Tests;

/// <summary>The slot-plane de-embedding against closed forms of a shunt admittance between two line sections.</summary>
public sealed class DeembeddingTests
{
    [Theory]
    [InlineData(0.2, 0.0, 1.1)]
    [InlineData(0.05, 0.3, 2.0)]
    [InlineData(1.0, -0.7, 0.4)]
    public void A_shunt_admittance_between_two_line_sections_comes_back_from_the_port_planes(double g, double b, double betaD)
    {
        // A shunt y on a matched line: S11 = −y/(2 + y), S21 = 2/(2 + y) (Pozar 2012, Table 4.2, from memory).
        var y = new Complex(g, b);
        var s11 = -y / (2 + y);
        var s21 = 2 / (2 + y);
        // Two line sections of electrical length βd each side: S11,m = S11 e^{−2jβd}, S21,m = S21 e^{−2jβd} (Pozar 2012, eq. 4.66).
        var line = Complex.Exp(new Complex(0, -2 * betaD));
        var (s11p, s21p) = SlotPlaneDeembedding.ToSlotPlane(s11 * line, s21 * line, Complex.Zero, line);
        var back = SlotPlaneDeembedding.ShuntAdmittance(s11p);
        Check.Absolute(g, back.Real, 1e-12, "closed-form shunt two-port, Pozar 2012 Table 4.2");
        Check.Absolute(b, back.Imaginary, 1e-12, "closed-form shunt two-port, Pozar 2012 Table 4.2");
        Check.Absolute(0, SlotPlaneDeembedding.ShuntResidual(s11p, s21p), 1e-12, "a pure shunt: 1 + S11 = S21");
    }

    [Fact]
    public void A_series_element_is_not_taken_for_a_shunt()
    {
        // A series z: S11 = z/(2 + z), S21 = 2/(2 + z) (Pozar 2012, Table 4.2): 1 + S11 − S21 = 2z/(2+z) ≠ 0.
        var z = new Complex(0.3, 0.2);
        double residual = SlotPlaneDeembedding.ShuntResidual(z / (2 + z), 2 / (2 + z));
        Check.Absolute((2 * z / (2 + z)).Magnitude, residual, 1e-12, "series two-port, Pozar 2012 Table 4.2");
    }
}
