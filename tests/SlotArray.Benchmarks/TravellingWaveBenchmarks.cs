using BenchmarkDotNet.Attributes;
using SlotArray.Core.Design;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;
using SlotArray.Core.Waveguides;

namespace SlotArray.Benchmarks;

/// <summary>
/// Design and analysis of a 150-slot travelling-wave edge-slot array (issue 6: ≤ 2 s with a 401-point sweep): taper,
/// closed-form start, network refinement, the 401-point network sweep, the co- and cross-polar patterns, directivity
/// and gain at every point, and both VSWR band searches (<see cref="ArrayPipeline.Run"/>).
/// </summary>
[MemoryDiagnoser]
public class TravellingWaveBenchmarks
{
    private ArrayRequest request = null!;

    /// <summary>Number of sweep frequencies.</summary>
    [Params(401)]
    public int Points { get; set; }

    /// <summary>Builds the request: WR-90 aluminium, 150 edge slots at 0.45 λg, Taylor −30 dB n̄ 5, 5 % to the load.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var guide = RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium);
        request = new ArrayRequest("bench-tw", Frequency.FromGigahertz(9.41), Frequency.FromGigahertz(9.3), Frequency.FromGigahertz(9.5), guide,
            new SlotRequest(SlotType.Edge, 150, Length.FromMillimeters(1.6), null, SlotModelKind.Stevenson),
            new FeedRequest(FeedType.TravellingWave, GuideDistance.InGuideWavelengths(0.45), FeedPosition.End, 0.05, GuideDistance.InGuideWavelengths(0.25)),
            new TaperRequest(TaperType.Taylor, -30, 5, -20, 2, null), CouplingMode.None, null, Requirements.None, null);
    }

    /// <summary>The whole pipeline.</summary>
    [Benchmark]
    public double DesignAndAnalyse() => ArrayPipeline.Run(request, new AnalysisOptions(Points)).AtDesign.Gain;
}
