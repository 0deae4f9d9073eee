using BenchmarkDotNet.Attributes;
using SlotArray.Core.Design;
using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;
using SlotArray.Core.Waveguides;

namespace SlotArray.Benchmarks;

/// <summary>
/// Elliott's coupled design of an end-fed standing-wave array of N longitudinal slots (issue 8 target: N = 64 ≤ 1 s), WR-90
/// aluminium at 9.375 GHz, Taylor 30 dB n̄ = 4, moment-method slot model. The slot model's resonant characterisation and
/// the spline surrogate are built in the setup (both are cached per model and frequency; the surrogate costs 182 direct
/// solves, about 0.2–0.7 s depending on the machine's load, once). Per iteration the cost is the N(N − 1)/2 mutual
/// impedances (half-cosine reaction, about 35 µs a pair on two threads) plus N two-dimensional Newton solves on the
/// surrogate (∝ N), so the design grows as N² for large N; the coupled analysis at one frequency is one dense LU of
/// size 3N (∝ N³, small at these N) plus N direct slot solves.
/// </summary>
[MemoryDiagnoser]
public class ElliottBenchmarks
{
    private static readonly Frequency F0 = Frequency.FromGigahertz(9.375);
    private static readonly Length Width = Length.FromMillimeters(1.5875);
    private MomentMethodSlotModel _slot = null!;
    private ArrayRequest _request = null!;
    private double[] _weights = [];
    private ArrayDesign _design = null!;

    /// <summary>Number of slots.</summary>
    [Params(16, 64)]
    public int N { get; set; }

    /// <summary>Builds the slot model, its characterisation and surrogate, and the request.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var guide = RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium);
        _slot = new MomentMethodSlotModel(guide, Width);
        _slot.Characterisation(F0);
        ElliottDesigner.SurrogateFor(_slot, F0);
        _request = new ArrayRequest("bench", F0, Frequency.FromGigahertz(9.2), Frequency.FromGigahertz(9.55), guide,
            new SlotRequest(SlotType.Longitudinal, N, Width, null, SlotModelKind.MomentMethod),
            new FeedRequest(FeedType.StandingWave, GuideDistance.InGuideWavelengths(0.5), FeedPosition.End, 0, GuideDistance.InGuideWavelengths(0.25)),
            new TaperRequest(TaperType.Taylor, -30, 4, -20, 2, null), CouplingMode.Mutual, null, Requirements.None, null);
        _weights = TaperSynthesis.Synthesize(_request.Taper, N).Weights.ToArray();
        _design = ElliottDesigner.Design(StickRequest.Of(_request, _slot, _weights)).Design;
    }

    /// <summary>The coupled design (isolated-slot start, iteration to 1e-4 mm, final check with direct solves).</summary>
    [Benchmark]
    public int CoupledDesign() => ElliottDesigner.Design(StickRequest.Of(_request, _slot, _weights)).Iterations.Count;

    /// <summary>The coupled analysis at the design frequency (mutual-impedance fill, one linear system, N direct slot solves).</summary>
    [Benchmark]
    public double CoupledAnalysisOneFrequency() => CoupledArrayNetwork.Solve(_design, _slot, F0).S11.Magnitude;
}
