using BenchmarkDotNet.Attributes;
using SlotArray.Core.Design;
using SlotArray.Core.Prototype;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;
using SlotArray.Core.Tapers;
using SlotArray.Core.Waveguides;

namespace SlotArray.Benchmarks;

/// <summary>
/// The prototype diagnosis (issue 16 target: a 64-slot fit from one S11 file and two cuts ≤ 1 s): an end-fed standing-wave
/// array of N longitudinal slots in WR-90 at 9.375 GHz, Taylor 30 dB n̄ = 4, moment-method slot model; synthetic data
/// (201-point S11 over ±2.5 %, two cuts with phase at 0.5°) with +0.6 % length error, conductance × 1.1 and two slots
/// 0.1 mm long. The setup builds the design, the data and the fit's slot surfaces (one warm-up fit, so the benchmark times
/// the fit itself, not the moment-method solves behind the surfaces, which are cached per model). Per fit: stages a–c
/// once and then the adopted parameters jointly twice, on 31 frequencies (coupled network, one N × N LU per frequency), the mutual impedances filled at 7
/// frequencies per geometry and interpolated between them (CouplingAcrossBand; N(N − 1)/2 pairs a fill), stage d per cut
/// and stage e twice (2N + 1 network solutions per cut frequency for the sensitivities; Jacobians in closed form).
/// </summary>
[MemoryDiagnoser]
public class PrototypeFitBenchmarks
{
    private static readonly Frequency F0 = Frequency.FromGigahertz(9.375);
    private static readonly Length Width = Length.FromMillimeters(1.5875);
    private PrototypeModel _model = null!;
    private PrototypeMeasurements _data = null!;

    /// <summary>Number of slots.</summary>
    [Params(16, 64)]
    public int N { get; set; }

    /// <summary>Designs the array, synthesises the measurements, warms the fit's slot surfaces.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var guide = RectangularWaveguide.FromStandard(WaveguideCatalogue.Find("WR-90")!, Length.FromMillimeters(1.27), Metal.Aluminium);
        var slot = new MomentMethodSlotModel(guide, Width);
        var request = new ArrayRequest("bench", F0, Frequency.FromGigahertz(9.2), Frequency.FromGigahertz(9.55), guide,
            new SlotRequest(SlotType.Longitudinal, N, Width, null, SlotModelKind.MomentMethod),
            new FeedRequest(FeedType.StandingWave, GuideDistance.InGuideWavelengths(0.5), FeedPosition.End, 0, GuideDistance.InGuideWavelengths(0.25)),
            new TaperRequest(TaperType.Taylor, -30, 4, -20, 2, null), CouplingMode.None, null, Requirements.None, null);
        var weights = TaperSynthesis.Synthesize(request.Taper, N).Weights.ToArray();
        var design = StandingWaveDesigner.Design(StickRequest.Of(request, slot, weights)).Design;
        var analysis = ArrayPipeline.AnalysisModel(request, design, slot, AnalysisOptions.Default);
        var dl = new double[N];
        dl[N / 4] = 0.1e-3;
        dl[3 * N / 4] = 0.1e-3;
        var truth = PrototypeErrors.None(N) with { LengthScale = 0.006, ConductanceScale = 1.1, SlotLengthErrors = dl };
        _data = SyntheticMeasurements.Generate(new PrototypeModel(design, analysis), truth, Frequency.FromHertz(F0.Hertz * 0.975),
            Frequency.FromHertz(F0.Hertz * 1.025), 201, [F0, Frequency.FromGigahertz(9.30)], 0.5, 0.05, 0.5, seed: 1);
        _model = new PrototypeModel(design, PrototypeFit.FitSlotModel(design, slot));
        PrototypeFit.Run(_model, _data);
    }

    /// <summary>The whole diagnosis from one S11 file and two cuts.</summary>
    [Benchmark]
    public double Fit() => PrototypeFit.Run(_model, _data).Errors.LengthScale;
}
