using SlotArray.Core.Slots;
using SlotArray.Tests.Shared;
using static SlotArray.Core.Tests.Slots.SlotTestGuides;

namespace SlotArray.Core.Tests.Slots;

/// <summary>Stevenson's longitudinal-slot conductance (Stevenson, J. Appl. Phys. 19, 24–38, 1948) against numpy values of the same formula [N].</summary>
public class StevensonLongitudinalSlotTests
{
    private const string Ref = "Stevenson 1948 with R_d = 73 Ω, numpy [N]";

    [Fact]
    public void Coefficient_for_wr90_at_9_375_GHz_is_1_237057()
        => Check.Relative(1.237057, StevensonLongitudinalSlot.Coefficient(Wr90(0), F), 1e-6, Ref);

    [Theory]
    [InlineData(0.5, 0.00583)]
    [InlineData(1.0, 0.02322)]
    [InlineData(1.5, 0.05183)]
    [InlineData(2.0, 0.09112)]
    [InlineData(2.54, 0.14471)] // Stevenson 1948
    [InlineData(3.0, 0.19862)]
    [InlineData(4.0, 0.33765)]
    [InlineData(5.0, 0.49776)]
    public void Conductance_matches_the_table(double offsetMm, double g)
        => Check.Absolute(g, StevensonLongitudinalSlot.Conductance(Wr90(0), offsetMm * 1e-3, F), 5e-6, Ref + ", ±½ in the last quoted digit");

    [Theory]
    [InlineData(0.05, 1.4729)]
    [InlineData(0.10, 2.0978)] // Stevenson 1948
    [InlineData(0.20, 3.0110)]
    public void Inverse_gives_the_tabulated_offset(double g, double offsetMm)
        => Check.Absolute(offsetMm, StevensonLongitudinalSlot.Offset(Wr90(0), g, F) * 1e3, 1e-4, Ref);

    [Fact]
    public void Conductance_above_the_largest_usable_offset_is_infeasible_and_the_message_states_the_maximum()
    {
        double gMax = StevensonLongitudinalSlot.MaximumConductance(Wr90(0), F);
        // a/4: g = 1.237057 sin²(π/4) = 0.61853 (closed form from the coefficient of Stevenson 1948).
        Check.Relative(1.237057 / 2, gMax, 1e-6, Ref);
        var e = Assert.Throws<InfeasibleDesignException>(() => StevensonLongitudinalSlot.Offset(Wr90(0), 0.7, F));
        Assert.Contains("0.6185", e.Message);
        Assert.Contains("5.715 mm", e.Message);
    }

    [Fact]
    public void Warnings_flag_thick_walls_and_large_offsets_as_data()
    {
        Assert.Empty(StevensonLongitudinalSlot.Warnings(Wr90(0), 2e-3, F));
        var w = StevensonLongitudinalSlot.Warnings(Wr90(1.27), 6e-3, F);
        Assert.Contains(w, x => x.Code == "stevenson-thin-wall");
        Assert.Contains(w, x => x.Code == "stevenson-offset-range");
    }
}
