using SlotArray.Core.Quantities;
using SlotArray.Core.Safety;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Safety;

/// <summary>
/// ICNIRP 2020 reference levels against numpy check values [N] (computed from
/// 55/f_G^0.177 and 275/f_G^0.177, ICNIRP, Health Physics 118(5):483–524, 2020, Table 6) and the Table 5 and Table 6
/// constants. The check values have two decimals, so the tolerance is half a unit in the last digit.
/// </summary>
public class Icnirp2020Tests
{
    private const string Ref = "ICNIRP 2020 Table 6, numpy [N]";

    [Theory]
    [InlineData(9.41, 36.99, 184.93)]
    [InlineData(9.375, 37.01, 185.05)]
    [InlineData(35.0, 29.31, 146.57)]
    [InlineData(3.05, 40.0, 200.0)]    // >2–6 GHz row: the f^−0.177 law applies above 6 GHz only
    public void Local_levels_match_the_sheet(double ghz, double generalPublic, double occupational)
    {
        var f = Frequency.FromGigahertz(ghz);
        Check.Absolute(generalPublic, Icnirp2020.Local(f, ExposureTier.GeneralPublic).PowerDensity, 0.005, Ref);
        Check.Absolute(occupational, Icnirp2020.Local(f, ExposureTier.Occupational).PowerDensity, 0.005, Ref);
    }

    [Theory]
    [InlineData(3.05)]
    [InlineData(9.41)]
    [InlineData(300)]
    public void Whole_body_levels_are_10_and_50_W_per_m2(double ghz)
    {
        var f = Frequency.FromGigahertz(ghz);
        var gp = Icnirp2020.WholeBody(f, ExposureTier.GeneralPublic);
        var occ = Icnirp2020.WholeBody(f, ExposureTier.Occupational);
        Check.Relative(10, gp.PowerDensity, 1e-12, "ICNIRP 2020 Table 5 [M, High]");
        Check.Relative(50, occ.PowerDensity, 1e-12, "ICNIRP 2020 Table 5 [M, High]");
        Assert.Equal(1800, gp.AveragingTimeSeconds);
        Assert.Equal("[M, High]", gp.Provenance);
    }

    [Fact]
    public void Local_rows_join_at_6_GHz_and_300_GHz_and_carry_their_tags()
    {
        // 55/6^0.177 = 40.4 just above 6 GHz: close to the 40 W/m² of the row below, as the guideline intends.
        var above6 = Icnirp2020.Local(Frequency.FromGigahertz(6.0001), ExposureTier.GeneralPublic);
        Check.Relative(55 / Math.Pow(6.0001, 0.177), above6.PowerDensity, 1e-12, "ICNIRP 2020 Table 6, >6 GHz row");
        Assert.Equal("Table 6, >6–300 GHz", above6.Table);
        Assert.StartsWith("[S:", above6.Provenance, StringComparison.Ordinal);
        Check.Relative(100, Icnirp2020.Local(Frequency.FromGigahertz(300), ExposureTier.Occupational).PowerDensity, 1e-12,
            "ICNIRP 2020 Table 6, 300 GHz row ");
        Assert.Equal(360, above6.AveragingTimeSeconds);
    }

    [Theory]
    [InlineData(1.5)]
    [InlineData(301)]
    public void Outside_2_to_300_GHz_the_tables_are_not_held(double ghz)
    {
        var f = Frequency.FromGigahertz(ghz);
        Assert.False(Icnirp2020.Covers(f));
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => Icnirp2020.Local(f, ExposureTier.GeneralPublic));
        Assert.Contains("2–300 GHz", e.Message, StringComparison.Ordinal);
    }
}

/// <summary>The comparison levels of IEEE C95.1-2019 ([M]; tags carried with the values).</summary>
public class ComparisonLevelsTests
{
    [Fact]
    public void Ieee_and_fcc_levels_as_the_sheet_lists_them()
    {
        var f = Frequency.FromGigahertz(9.41);
        Check.Absolute(36.99, IeeeC95_1_2019.Local(f, ExposureTier.GeneralPublic).PowerDensity, 0.005, "IEEE C95.1-2019 [M, Medium]: 55 f_G^−0.177");
        Check.Relative(50, IeeeC95_1_2019.WholeBody(f, ExposureTier.Occupational).PowerDensity, 1e-12, "IEEE C95.1-2019 [M, Medium]");
        Assert.Contains("verify", IeeeC95_1_2019.WholeBody(f, ExposureTier.Occupational).Provenance, StringComparison.Ordinal);
        var fcc = Fcc47Cfr1310.MaximumPermissibleExposure(f, ExposureTier.GeneralPublic);
        Check.Relative(10, fcc.PowerDensity, 1e-12, "FCC 47 CFR §1.1310 [M, High]: 1 mW/cm²");
        Assert.Equal(1800, fcc.AveragingTimeSeconds);
        Assert.Throws<ArgumentOutOfRangeException>(() => IeeeC95_1_2019.Local(Frequency.FromGigahertz(5), ExposureTier.GeneralPublic));
        Assert.Throws<ArgumentOutOfRangeException>(() => Fcc47Cfr1310.MaximumPermissibleExposure(Frequency.FromGigahertz(120), ExposureTier.Occupational));
    }
}
