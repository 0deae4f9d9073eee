using SlotArray.Core.Marine;
using SlotArray.Core.Quantities;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Marine;

/// <summary>The polarisation filter: cutoff attenuation of the plate gap, the wanted polarisation's loss, the automatic depth.</summary>
public class CrossPolarFilterTests
{
    private const double C = 299_792_458.0;

    [Fact]
    public void Attenuation_per_mm_is_the_parallel_plate_cutoff_formula()
    {
        // Closed-form example computed here: a 10 mm clear gap (10.5 mm pitch, 0.5 mm plates) at 10 GHz.
        // TE1 of a parallel-plate guide: k_c = π/g, below cutoff α = √(k_c² − k²) Np/m (D. M. Pozar, Microwave Engineering,
        // 4th ed., Wiley 2012, §3.1); 20 log10(e) dB per neper.
        var filter = new CrossPolarFilter(Length.FromMillimeters(10.5), Length.FromMillimeters(20), Length.FromMillimeters(0.5));
        var f = Frequency.FromGigahertz(10);
        double kc = Math.PI / 0.010, k = 2 * Math.PI * 10e9 / C;
        double alpha = Math.Sqrt(kc * kc - k * k);
        Check.Relative(alpha, filter.AttenuationNeperPerMeter(f), 1e-12, "Pozar 2012 §3.1: α = √((π/g)² − k²), evaluated here");
        Check.Relative(20 / Math.Log(10) * alpha * 1e-3, filter.AttenuationDbPerMillimeter(f), 1e-12, "dB per mm = 20 log10(e) α / 1000");
        Check.Absolute(2.0328, filter.AttenuationDbPerMillimeter(f), 5e-4, "2.0328 dB/mm for g = 10 mm at 10 GHz, worked here by hand");
        Check.Relative(20 * filter.AttenuationDbPerMillimeter(f), filter.CrossPolarAttenuationDb(f), 1e-12, "20 mm deep: 20 times the per-mm figure");
        Check.Relative(C / (2 * 0.010), filter.CutoffTe1.Hertz, 1e-12, "TE1 cutoff c/(2g) (Pozar 2012 §3.1)");
        // Above cutoff the plates pass the field: no attenuation.
        Assert.Equal(0, filter.AttenuationNeperPerMeter(Frequency.FromGigahertz(16)));
    }

    [Fact]
    public void The_wanted_polarisation_loss_is_that_of_a_line_section()
    {
        // TEM between the plates: a line section of relative impedance r = g/s and length D between matched lines;
        // |T|² = 1 / (1 + ¼ (r − 1/r)² sin² kD) (lossless line section from its ABCD matrix, Pozar 2012 §4.4, Table 4.1).
        var f = Frequency.FromGigahertz(9.41);
        double lambda = C / f.Hertz;
        var quarter = new CrossPolarFilter(Length.FromMillimeters(10), Length.FromMeters(lambda / 4), Length.FromMillimeters(1));
        double r = 0.9, m = 0.25 * (r - 1 / r) * (r - 1 / r);
        Check.Relative(10 * Math.Log10(1 + m), quarter.WantedLossDb(f), 1e-9, "quarter-wave section of r = 0.9: |T|² = 1/(1 + ¼(r − 1/r)²)");
        var half = quarter with { Depth = Length.FromMeters(lambda / 2) };
        Check.Absolute(0, half.WantedLossDb(f), 1e-12, "a half-wave section is transparent (sin kD = 0)");
        var thin = quarter with { Thickness = Length.FromMillimeters(0) };
        Check.Absolute(0, thin.WantedLossDb(f), 1e-12, "plates of zero thickness: no step, no loss");
    }

    [Fact]
    public void The_automatic_depth_meets_the_requirement_with_its_margin_and_half_a_millimetre_less_does_not()
    {
        var top = Frequency.FromGigahertz(9.5);
        var t = CrossPolarFilterDesign.DefaultThickness;
        var spacing = CrossPolarFilterDesign.AutoSpacing(top, t, Length.FromMillimeters(20));
        // 0.35 λ clear gap at 9.5 GHz (11.04 mm) plus 0.5 mm = 11.54 mm: 20 mm slots need two plates per spacing, 10 mm.
        Check.Absolute(10, spacing.Millimeters, 1e-12, "d / ceil(d / (0.35 λ + t)) at 9.5 GHz (computed here)");
        (Frequency, double)[] bare = [(Frequency.FromGigahertz(9.3), -18.29), (Frequency.FromGigahertz(9.41), -18.33), (top, -18.5)];
        var depth = CrossPolarFilterDesign.AutoDepth(spacing, t, bare, -25, CrossPolarFilterDesign.MarginDb);
        foreach (var (f, db) in bare)
        {
            var filter = new CrossPolarFilter(spacing, depth, t);
            Assert.True(db - filter.CrossPolarAttenuationDb(f) <= -25 - CrossPolarFilterDesign.MarginDb,
                $"{f}: {db} dB bare, {filter.CrossPolarAttenuationDb(f):0.###} dB of attenuation");
        }
        var shallower = new CrossPolarFilter(spacing, depth - Length.FromMillimeters(0.5), t);
        Assert.Contains(bare, p => p.Item2 - shallower.CrossPolarAttenuationDb(p.Item1) > -25 - CrossPolarFilterDesign.MarginDb);
        // A pitch that lets the cross-polarised field through is refused, naming the pitch to use.
        var e = Assert.Throws<InfeasibleDesignException>(() => CrossPolarFilterDesign.AutoDepth(Length.FromMillimeters(17), t, bare, -25, 3));
        Assert.Contains("use a pitch below", e.Message);
    }
}
