using SlotArray.Core.Quantities;
using SlotArray.Core.Safety;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Safety;

/// <summary>
/// Far-field and near-field power density against numpy values [N] (computed from
/// S = PG/(4πR²), 2D²/λ and the OET-65 forms). Tolerance: half a unit in the last quoted digit.
/// </summary>
public class PowerDensityTests
{
    private const string Ref81 = "Friis 1946, numpy [N], worked example (12.5 W, 30 dBi)";
    private const string Ref84 = "FCC OET Bulletin 65, numpy [N] (2.4 m array at 9.41 GHz)";

    [Theory]
    [InlineData(2, 248.7, 0.05)]
    [InlineData(5, 39.79, 0.005)]
    [InlineData(10, 9.947, 0.0005)]
    [InlineData(20, 2.487, 0.0005)]
    public void Far_field_density_on_axis(double metres, double expected, double halfUnit)
        => Check.Absolute(expected, PowerDensity.FarFieldOnAxis(12.5, 30, Length.FromMeters(metres)), halfUnit, Ref81);

    [Fact]
    public void Ten_W_per_m2_is_reached_at_9_97_m_and_the_inverse_round_trips()
    {
        var r = PowerDensity.DistanceToLevel(12.5, 30, 10);
        Check.Absolute(9.97, r.Meters, 0.005, Ref81);
        Check.Relative(10, PowerDensity.FarFieldOnAxis(12.5, 30, r), 1e-12, "closed-form inverse of S = PG/(4πR²)");
    }

    [Fact]
    public void Far_field_distance_and_OET65_boundaries_of_a_2_4_m_array()
    {
        var f = Frequency.FromGigahertz(9.41);
        var d = Length.FromMeters(2.4);
        Check.Absolute(361.6, PowerDensity.FarFieldDistance(d, f).Meters, 0.05, Ref84);
        Check.Absolute(45.2, PowerDensity.NearFieldBoundary(d, f).Meters, 0.05, Ref84);
        Check.Absolute(108.5, PowerDensity.FarFieldStart(d, f).Meters, 0.05, Ref84);
    }

    [Fact]
    public void OET65_near_field_bound_for_12_5_W_on_2_4_m_by_0_15_m()
        => Check.Absolute(139, PowerDensity.NearFieldUpperBound(12.5, Length.FromMeters(2.4), Length.FromMeters(0.15)), 0.5,
            "FCC OET Bulletin 65 [N]: S_max ≈ 4P/A = 139 W/m²");

    [Fact]
    public void A_1_degree_rotating_beam_averages_by_1_over_360()
    {
        Check.Absolute(0.00278, PowerDensity.RotationFactor(Angle.FromDegrees(1)), 5e-6, "common practice, no source [C]: 1/360 = 0.00278");
        Assert.Throws<ArgumentOutOfRangeException>(() => PowerDensity.RotationFactor(Angle.FromDegrees(0)));
    }

    [Fact]
    public void Bad_inputs_are_refused_by_name()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => PowerDensity.FarFieldOnAxis(-1, 30, Length.FromMeters(1)));
        Assert.Throws<ArgumentOutOfRangeException>(() => PowerDensity.FarFieldOnAxis(1, 30, Length.Zero));
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => PowerDensity.DistanceToLevel(1, 30, 0));
        Assert.Equal("powerDensity", e.ParamName);
    }
}
