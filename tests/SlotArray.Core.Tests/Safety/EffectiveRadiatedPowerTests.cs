using SlotArray.Core.Safety;
using SlotArray.Tests.Shared;

namespace SlotArray.Core.Tests.Safety;

public class EffectiveRadiatedPowerTests
{
    // EIRP = P G (IEEE Std 145-2013 definition, from memory). 25 kW into 30 dBi (gain 1000) is 25 MW, 73.98 dBW.
    [Fact]
    public void Eirp_is_power_times_linear_gain()
    {
        Check.Relative(25e6, EffectiveRadiatedPower.Watts(25e3, 30), 1e-12, "EIRP = P G, 25 kW × 1000");
        Check.Absolute(10 * Math.Log10(25e3) + 30, EffectiveRadiatedPower.DecibelWatts(25e3, 30), 1e-12, "10 log10 P + G");
        // S = EIRP/(4π R²) is the far-field power density on the axis, the same as PowerDensity.FarFieldOnAxis
        Check.Relative(PowerDensity.FarFieldOnAxis(12.5, 30, Quantities.Length.FromMeters(2)), EffectiveRadiatedPower.Watts(12.5, 30) / (4 * Math.PI * 4), 1e-12, "S = P G/(4π R²), closed form");
        Assert.Throws<ArgumentOutOfRangeException>(() => EffectiveRadiatedPower.Watts(-1, 10));
    }
}
