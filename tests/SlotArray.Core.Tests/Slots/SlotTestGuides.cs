using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Tests.Slots;

/// <summary>The reference case of WR-90 reference case: WR-90, 9.375 GHz, 1/16 in slot; thin and 1.27 mm walls.</summary>
internal static class SlotTestGuides
{
    public static readonly Frequency F = Frequency.FromGigahertz(9.375);
    public static readonly Length Width = Length.FromMillimeters(1.5875);
    public static double Lambda => F.FreeSpaceWavelength.Meters;

    public static RectangularWaveguide Wr90(double wallMillimeters) =>
        RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(wallMillimeters), Metal.Copper);

    /// <summary>Thin-wall solver at the truncation of moment method after Stern & Elliott 1985, numpy (P = 5).</summary>
    public static readonly LongitudinalSlotMomentMethod ThinP5 = new(Wr90(0), Width, new MomentMethodOptions(BasisFunctions: 5, ExtrapolationBasisFunctions: 0));

    /// <summary>Thin-wall solver at the default (converged) truncation.</summary>
    public static readonly LongitudinalSlotMomentMethod Thin = new(Wr90(0), Width);

    /// <summary>1.27 mm wall at the default truncation.</summary>
    public static readonly LongitudinalSlotMomentMethod Thick = new(Wr90(1.27), Width);
}
