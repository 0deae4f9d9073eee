using System.Numerics;
using SlotArray.Core.Coupling;
using SlotArray.Core.Quantities;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Coupling;

/// <summary>
/// Babinet–Booker maps (Booker 1946, numpy worked values [N]) and the slot coupling matrix: geometry mapping,
/// symmetry, diagonal, determinism across thread counts, and the one-sided admittance factor 2/η².
/// </summary>
public class SlotMutualCouplingTests
{
    private static readonly Frequency F0 = Frequency.FromGigahertz(9.375);
    private static readonly Length Width = Length.FromMillimeters(1.5875);

    [Fact]
    public void Babinet_worked_values()
    {
        const string source = "Booker 1946, numpy [N], Z_d = 73 + j42.5 Ω, η0";
        var zd = new Complex(73, 42.5);
        var zs = SlotMutualCoupling.TwoSidedSlotImpedance(zd);
        Check.Absolute(363.01, zs.Real, 0.006, source);
        Check.Absolute(-211.34, zs.Imaginary, 0.006, source);
        var y = SlotMutualCoupling.OneSidedSlotAdmittance(zd);
        Check.Relative(1.02871e-3, y.Real, 5e-6, source);
        Check.Relative(0.59890e-3, y.Imaginary, 1e-5, source);
        var thin = SlotMutualCoupling.TwoSidedSlotImpedance(new Complex(73.079, 42.511));
        Check.Absolute(362.77, thin.Real, 0.006, source + " (thin-wire Z_d)");
        Check.Absolute(-211.02, thin.Imaginary, 0.006, source + " (thin-wire Z_d)");
        Check.Relative(0.25 * Width.Meters, StripEquivalentRadius.Of(Width).Meters, 1e-15, "Butler 1982: equivalent radius w/4");
    }

    private static LongitudinalSlotPlacement[] Array(int n)
    {
        // Standing-wave layout: λg/2 spacing (WR-90 at 9.375 GHz: 22.37144 mm, Pozar 2012 Sec. 3.3, numpy [N]),
        // alternating offsets, slightly different lengths.
        var slots = new LongitudinalSlotPlacement[n];
        for (int i = 0; i < n; i++)
            slots[i] = new LongitudinalSlotPlacement(Length.FromMillimeters(11.1857 + 22.3714 * i),
                Length.FromMillimeters((i % 2 == 0 ? 1 : -1) * (1.5 + 0.1 * i)), Length.FromMillimeters(7.25 + 0.02 * i));
        return slots;
    }

    [Fact]
    public void Matrix_entries_are_the_equivalent_dipole_impedances()
    {
        var slots = Array(6);
        var z = SlotMutualCoupling.EquivalentDipoleImpedances(slots, Width, F0);
        Assert.Equal(6, z.Count);
        for (int m = 0; m < 6; m++)
            for (int n = 0; n < 6; n++)
            {
                Assert.Equal(z[m, n], z[n, m]);
                var expected = m == n
                    ? DipoleMutualImpedance.Self(slots[m].HalfLength, StripEquivalentRadius.Of(Width), F0)
                    : DipoleMutualImpedance.Mutual(Length.FromMeters(Math.Abs(slots[m].Offset.Meters - slots[n].Offset.Meters)),
                        slots[n].Position - slots[m].Position, slots[m].HalfLength, slots[n].HalfLength, F0);
                Check.Absolute(expected.Real, z[m, n].Real, 1e-9, "d = |x_m − x_n|, s = z_n − z_m (Carter 1932 induced EMF)");
                Check.Absolute(expected.Imaginary, z[m, n].Imaginary, 1e-9, "d = |x_m − x_n|, s = z_n − z_m (Carter 1932 induced EMF)");
            }
        // Neighbours at λg/2 ≈ 0.7 λ, nearly collinear: of the order of the collinear table value at 0.75 λ, 2.04 − j7.97 Ω.
        Assert.InRange(z[0, 1].Magnitude, 3, 15);
    }

    [Fact]
    public void Fill_is_identical_on_one_and_two_threads()
    {
        var slots = Array(37);
        var one = SlotMutualCoupling.EquivalentDipoleImpedances(slots, Width, F0, maxDegreeOfParallelism: 1);
        var two = SlotMutualCoupling.EquivalentDipoleImpedances(slots, Width, F0, maxDegreeOfParallelism: 2);
        Assert.Equal(one.ToArray(), two.ToArray());
    }

    [Fact]
    public void One_sided_admittances_are_2_Z_over_eta_squared()
    {
        var slots = Array(4);
        var z = SlotMutualCoupling.EquivalentDipoleImpedances(slots, Width, F0);
        var y = SlotMutualCoupling.OneSidedAdmittances(slots, Width, F0);
        double factor = 2 / (PhysicalConstants.Eta0 * PhysicalConstants.Eta0);
        for (int m = 0; m < 4; m++)
            for (int n = 0; n < 4; n++)
                Check.Relative((factor * z[m, n]).Magnitude, y[m, n].Magnitude, 1e-15, "Booker 1946: Y_mn = 2 Z_mn/η²");
    }

    [Fact]
    public void Overlapping_slots_are_named_in_the_error()
    {
        var slots = new[]
        {
            new LongitudinalSlotPlacement(Length.FromMillimeters(0), Length.FromMillimeters(2), Length.FromMillimeters(7.3)),
            new LongitudinalSlotPlacement(Length.FromMillimeters(30), Length.FromMillimeters(-2), Length.FromMillimeters(7.3)),
            new LongitudinalSlotPlacement(Length.FromMillimeters(10), Length.FromMillimeters(2), Length.FromMillimeters(7.3)),
        };
        var e = Assert.Throws<ArgumentException>(() => SlotMutualCoupling.EquivalentDipoleImpedances(slots, Width, F0));
        Assert.Contains("slots 1 and 3", e.Message);
    }

    [Fact]
    public void Side_by_side_slots_that_do_not_touch_are_accepted()
    {
        // Offsets ±2 mm at the same z: 4 mm apart laterally, more than the 1.5875 mm width, so the slots do not intersect.
        var slots = new[]
        {
            new LongitudinalSlotPlacement(Length.Zero, Length.FromMillimeters(2), Length.FromMillimeters(7.3)),
            new LongitudinalSlotPlacement(Length.Zero, Length.FromMillimeters(-2), Length.FromMillimeters(7.3)),
        };
        var z = SlotMutualCoupling.EquivalentDipoleImpedances(slots, Width, F0);
        var expected = DipoleMutualImpedance.Mutual(Length.FromMillimeters(4), Length.Zero, Length.FromMillimeters(7.3), Length.FromMillimeters(7.3), F0);
        Check.Absolute(expected.Real, z[0, 1].Real, 1e-12, "d = 2|x| for opposite offsets (Carter 1932 induced EMF)");
        Check.Absolute(expected.Imaginary, z[0, 1].Imaginary, 1e-12, "d = 2|x| for opposite offsets (Carter 1932 induced EMF)");
    }
}
