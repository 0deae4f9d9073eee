using SlotArray.Core.Quantities;
using SlotArray.Core.Safety;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Safety;

/// <summary>
/// The exposure screen of ICNIRP 2020 worked case: P_avg = 12.5 W, G = 30 dBi, 9.41 GHz, 2.4 m × 0.15 m.
/// Reference distances R = √(PG/(4πS_ref)) computed independently with python3 (math module) from the ICNIRP 2020 Table 6 levels.
/// </summary>
public class ExposureAssessmentTests
{
    private const string Py = "python3: sqrt(12.5e3/(4π S_ref)), S_ref from ICNIRP 2020 ";

    private static ExposureAssessment Case(Angle? rotating = null) => ExposureAssessment.Assess(12.5, 30, Frequency.FromGigahertz(9.41),
        Length.FromMeters(2.4), Length.FromMeters(0.15), rotatingBeamwidth: rotating);

    [Fact]
    public void Distances_to_the_four_reference_levels()
    {
        var e = Case();
        Assert.Equal(4, e.Distances.Count);
        double[] expected = [9.973557, 5.185987, 4.460310, 2.319244];   // GP whole body, GP local, occ. whole body, occ. local
        for (int i = 0; i < 4; i++)
            Check.Relative(expected[i], e.Distances[i].Stationary.Meters, 1e-6, Py);
        Check.Absolute(9.97, e.Distances[0].Stationary.Meters, 0.005, "Friis 1946 [N]: 10 W/m² at 9.97 m");
        Assert.All(e.Distances, d => Assert.True(d.InsideFarFieldDistance));
        Assert.All(e.Distances, d => Assert.Equal(d.Stationary, d.TimeAveraged));
    }

    [Fact]
    public void Near_field_caveat_and_bound_are_reported()
    {
        var e = Case();
        Check.Absolute(361.6, e.FarFieldDistance.Meters, 0.05, "FCC OET Bulletin 65 [N]");
        Check.Absolute(139, e.NearFieldBound, 0.5, "FCC OET Bulletin 65 [N]");
        Assert.Contains(e.Warnings, w => w.Code == "exposure-near-field");
        // 4P/A = 138.9 W/m² lies below only the occupational local level 184.93 W/m² (ICNIRP 2020 Table 6).
        Assert.Equal([false, false, false, true], e.Distances.Select(d => d.NearFieldBoundBelowLevel));
    }

    [Fact]
    public void Densities_at_the_default_distances_follow_the_far_field_formula()
    {
        var e = Case();
        var at10 = e.OnAxis.Single(o => o.Distance == Length.FromMeters(10));
        Check.Absolute(9.947, at10.FarField, 0.0005, "Friis 1946 [N]");
        Assert.Equal(FieldRegion.NearField, at10.Region);          // 10 m < D²/(4λ) = 45.2 m
        Assert.Equal(FieldRegion.Transition, e.OnAxis.Single(o => o.Distance == Length.FromMeters(100)).Region);  // 45.2 ≤ 100 < 108.5
        Assert.Equal(e.OnAxis.OrderBy(o => o.Distance.Meters), e.OnAxis);
    }

    [Fact]
    public void A_rotating_beam_reduces_the_time_averaged_distance_by_the_root_of_the_factor()
    {
        var e = Case(Angle.FromDegrees(1));
        Check.Relative(1 / 360.0, e.RotationFactor, 1e-12, "θ_3dB/360, common practice [C]");
        Check.Relative(0.5256526, e.Distances[0].TimeAveraged.Meters, 1e-6, "python3: sqrt(12.5e3/360/(4π·10))");
        Check.Relative(9.973557, e.Distances[0].Stationary.Meters, 1e-6, Py);
    }

    [Fact]
    public void Below_2_GHz_the_distances_are_omitted_with_a_warning()
    {
        var e = ExposureAssessment.Assess(10, 25, Frequency.FromGigahertz(1.3), Length.FromMeters(3), Length.FromMeters(0.2));
        Assert.Empty(e.Distances);
        Assert.Contains(e.Warnings, w => w.Code == "exposure-frequency-range");
    }
}
