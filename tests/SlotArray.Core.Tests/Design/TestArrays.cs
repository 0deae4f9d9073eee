using SlotArray.Core.Design;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;
using SlotArray.Core.Waveguides;

namespace SlotArray.Core.Tests.DesignTests;

/// <summary>Requests and guides shared by the designer and network tests (WR-90 at 9.375 GHz, the reference case of the check values).</summary>
internal static class TestArrays
{
    public static readonly Frequency F0 = Frequency.FromGigahertz(9.375);
    public static readonly Length Width = Length.FromMillimeters(1.5875);

    /// <summary>WR-90 in aluminium (σ = 3.77e7 S/m), 1.27 mm wall.</summary>
    public static RectangularWaveguide Wr90 { get; } =
        RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium);

    /// <summary>WR-90 with walls so good that the line is lossless to ~1e-12 (α ≈ 1e-13 Np/m).</summary>
    public static RectangularWaveguide Wr90Lossless { get; } = Wr90 with { Conductivity = 1e36, MetalName = "ideal" };

    public static ArrayRequest Request(int count, FeedPosition position = FeedPosition.End, RectangularWaveguide? guide = null,
        double spacing = 0.5, double shortDistance = 0.25)
        => new("test", F0, Frequency.FromGigahertz(9.2), Frequency.FromGigahertz(9.55), guide ?? Wr90,
            new SlotRequest(SlotType.Longitudinal, count, Width, null, SlotModelKind.Stevenson),
            new FeedRequest(FeedType.StandingWave, GuideDistance.InGuideWavelengths(spacing), position, 0,
                GuideDistance.InGuideWavelengths(shortDistance)),
            TaperRequest.Uniform, CouplingMode.None, null, Requirements.None, null);

    public static double[] Uniform(int n) => Enumerable.Repeat(1.0, n).ToArray();

    /// <summary>
    /// Taylor 25 dB, n̄ = 4, N = 10 conductances g ∝ a² (Elliott 1981, Ch. 8) of the scipy sampled weights, numpy [N];
    /// the amplitudes are their square roots, used as given weights.
    /// </summary>
    public static readonly double[] Taylor25Conductances = [0.02777, 0.04856, 0.09372, 0.14795, 0.18201, 0.18201, 0.14795, 0.09372, 0.04856, 0.02777];

    public static double[] Taylor25Amplitudes => Taylor25Conductances.Select(Math.Sqrt).ToArray();
}
