using System.Numerics;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots.Tables;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Slots.Tables;

/// <summary>
/// The S-parameter conversions of a slot table against closed forms of transmission-line theory, derived here without
/// the two-port formulas the code uses: the reflection coefficient of a load on a matched line,
/// Γ = (Z_L − Z0)/(Z_L + Z0) (D. M. Pozar, <i>Microwave Engineering</i>, 4th ed., Wiley 2012, eq. 2.35), and its
/// transformation along the line, Γ(ℓ) = Γ(0) e^(−2jβℓ) (Pozar 2012, eq. 2.42).
/// </summary>
public class SlotTableConversionTests
{
    private static readonly Complex[] Elements = [new(1, 0), new(0.09183, 0.00011), new(0.03967, 0.04526), new(0.04697, -0.04712), new(0.5, -2)];

    [Fact]
    public void Shunt_admittance_from_s11_inverts_the_reflection_of_a_shunt_element_on_a_matched_line()
    {
        foreach (var y in Elements)
        {
            // A shunt y across a matched line: the load seen is y_L = 1 + y (normalised), Γ = (1 − y_L)/(1 + y_L).
            var gamma = (1 - (1 + y)) / (1 + (1 + y));
            var back = SlotTableConversion.ShuntAdmittanceFromS11(gamma);
            Check.Absolute(0, (back - y).Magnitude, 1e-12 * (1 + y.Magnitude), "Pozar 2012 eq. 2.35 with y_L = 1 + y");
        }
        // y = 1 (G = G0): Γ = −1/3, S21 = 1 + Γ = 2/3 (closed form).
        var (s11, s21) = SlotTableConversion.ShuntScattering(1);
        Check.Absolute(-1.0 / 3, s11.Real, 1e-15, "Γ = −y/(2 + y) at y = 1");
        Check.Absolute(2.0 / 3, s21.Real, 1e-15, "S21 = 1 + Γ for a shunt element");
    }

    [Fact]
    public void Series_impedance_from_s11_inverts_the_reflection_of_a_series_element_on_a_matched_line()
    {
        foreach (var z in Elements)
        {
            var gamma = ((1 + z) - 1) / ((1 + z) + 1);   // z_L = 1 + z
            Check.Absolute(0, (SlotTableConversion.SeriesImpedanceFromS11(gamma) - z).Magnitude, 1e-12 * (1 + z.Magnitude), "Pozar 2012 eq. 2.35 with z_L = 1 + z");
        }
    }

    [Fact]
    public void Reference_planes_beyond_the_slot_are_moved_back_to_its_centre()
    {
        var g = SlotTestGuides.Wr90(1.27);
        var f = Frequency.FromGigahertz(9.375);
        double lg = g.GuideWavelength(f).Meters;
        var y = new Complex(0.0738, 0.0214);
        var gamma0 = -y / (2 + y);
        foreach (double d in new[] { lg / 8, lg / 4, 0.37 * lg, 12.7e-3 })
        {
            // The planes lie d beyond the slot on either side: Γ seen there is Γ(0) e^(−2jβd) (Pozar 2012 eq. 2.42).
            var atPlanes = gamma0 * Complex.FromPolarCoordinates(1, -2 * g.PhaseConstant(f) * d);
            var row = new SlotTableRow(2, 2e-3, 15e-3, double.NaN, f.Hertz, atPlanes, null, d);
            var table = new SlotTable("s.csv", new string('0', 64), [], SlotTableGeometry.Longitudinal, SlotTableResponse.Scattering, [row]);
            Check.Absolute(0, (SlotTableConversion.ElementValue(table, row, g) - y).Magnitude, 1e-12, "Pozar 2012 eq. 2.42, planes moved back by d");
        }
        // A quarter guide wavelength flips the sign of Γ.
        Check.Absolute(0, (SlotTableConversion.ToSlotCentre(-gamma0, g, f, lg / 4) - gamma0).Magnitude, 1e-12, "e^(2jβ λg/4) = −1");
    }

    [Fact]
    public void A_pure_shunt_element_has_zero_asymmetry_and_an_impedance_table_is_inverted()
    {
        var g = SlotTestGuides.Wr90(1.27);
        var y = new Complex(0.0738, 0.0214);
        var (s11, s21) = SlotTableConversion.ShuntScattering(y);
        var row = new SlotTableRow(2, 2e-3, 15e-3, double.NaN, 9.375e9, s11, s21);
        var table = new SlotTable("s.csv", new string('0', 64), [], SlotTableGeometry.Longitudinal, SlotTableResponse.Scattering, [row]);
        Check.Absolute(0, SlotTableConversion.ElementAsymmetry(table, row, g)!.Value, 1e-15, "S21 = 1 + S11 for a shunt element (Pozar 2012 Table 4.2)");
        var zRow = row with { Value = 1 / y, S21 = null };
        var zTable = table with { Response = SlotTableResponse.Impedance };
        Check.Absolute(0, (SlotTableConversion.ElementValue(zTable, zRow, g) - y).Magnitude, 1e-15, "y = 1/z of the same shunt branch");
    }
}
