using System.Numerics;
using SlotArray.Core.Design;
using SlotArray.Core.Fabrication;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.FullWave.Model;
using SlotArray.FullWave.Runs;

namespace SlotArray.FullWave.Slots;

/// <summary>One geometry to characterise: the coupling value (offset mm or tilt deg), the table's length (rectangular-equivalent, or developed for an edge slot), and the cut.</summary>
/// <param name="Coupling">Offset, mm (longitudinal) or tilt, degrees (edge); ≥ 0.</param>
/// <param name="LengthMm">Rectangular-equivalent length (longitudinal) or developed length (edge), mm.</param>
/// <param name="Cut">The cut the engine builds.</param>
internal sealed record SlotSample(double Coupling, double LengthMm, SlotCut Cut)
{
    /// <summary>Edge slots: the cut depth, mm; else null.</summary>
    public double? CutDepthMm => (Cut as EdgeCut)?.CutDepthMm;
}

/// <summary>The de-embedded admittance of one sample at one frequency.</summary>
/// <param name="Sample">The geometry.</param>
/// <param name="FrequencyHz">Frequency, Hz.</param>
/// <param name="Admittance">y = Y/G0 at the slot's centre plane.</param>
/// <param name="ShuntResidual">|1 + S11 − S21| at the slot plane (0 for a pure shunt element).</param>
internal sealed record SlotSampleResult(SlotSample Sample, double FrequencyHz, Complex Admittance, double ShuntResidual);

/// <summary>
/// Plans and reduces a full-wave characterisation of the spec's slot: the couplings (offsets or tilts) the
/// design needs, with lengths around the built-in model's resonance at each, each as a two-port run in a bare
/// tube (ports λg-ish away on either side, guide ends matched), plus one plain-tube calibration run on the same
/// mesh; then de-embeds every run to the slot plane (<see cref="SlotPlaneDeembedding"/>).
/// </summary>
internal sealed class SlotCharacterisation
{
    /// <summary>Distance from the slot's end to each port's measurement plane, mm: TE20 and TE01 fields of the slot decay by e⁻⁴ or more over it at X band (α = √(k_c² − k²), Pozar 2012, eq. 3.84, from memory).</summary>
    public const double PortClearanceMm = 25;

    private SlotCharacterisation(ArrayRequest request, GuideSection guide, IReadOnlyList<SlotSample> samples, IReadOnlyList<double> frequenciesHz,
        MeshDensity density, double portZMm)
    {
        Request = request;
        Guide = guide;
        Samples = samples;
        FrequenciesHz = frequenciesHz;
        Density = density;
        PortZMm = portZMm;
    }

    /// <summary>The spec.</summary>
    public ArrayRequest Request { get; }

    /// <summary>The guide, mm.</summary>
    public GuideSection Guide { get; }

    /// <summary>The geometries.</summary>
    public IReadOnlyList<SlotSample> Samples { get; }

    /// <summary>The table's frequencies, Hz.</summary>
    public IReadOnlyList<double> FrequenciesHz { get; }

    /// <summary>Mesh density.</summary>
    public MeshDensity Density { get; }

    /// <summary>Port measurement planes at ±this, mm.</summary>
    public double PortZMm { get; }

    /// <summary>Whether the samples are edge slots.</summary>
    public bool IsEdge => Request.Slots.Type == SlotType.Edge;

    /// <summary>
    /// Plans the characterisation: <paramref name="couplingCount"/> offsets (tilts) spanning the design's range
    /// (±10 %, at least ±20 % around a single value), and <paramref name="lengthCount"/> lengths from 0.96 to 1.04
    /// of the built-in model's resonant length at each, at <paramref name="frequencyCount"/> frequencies across the band.
    /// </summary>
    /// <param name="request">The spec (longitudinal or edge slots).</param>
    /// <param name="designCouplings">The couplings the design needs: |offset| (m) or |tilt| (rad).</param>
    /// <param name="density">Mesh density.</param>
    /// <param name="couplingCount">Offsets (tilts) to run, ≥ 1.</param>
    /// <param name="lengthCount">Lengths per offset, ≥ 1 (3 or more for a table the design can read).</param>
    /// <param name="frequencyCount">Frequencies in the table, ≥ 1 (the design frequency is always one).</param>
    public static SlotCharacterisation Plan(ArrayRequest request, IReadOnlyList<double> designCouplings, MeshDensity density, int couplingCount = 3,
        int lengthCount = 5, int frequencyCount = 5)
    {
        if (request.Slots.Type == SlotType.InclinedSeries)
            throw new ArgumentException("characterise builds longitudinal and edge slots; an inclined series slot is not built yet", nameof(request));
        if (couplingCount < 1 || lengthCount < 1 || frequencyCount < 1) throw new ArgumentOutOfRangeException(nameof(couplingCount), "counts must be at least 1");
        var g = request.Guide;
        var guide = new GuideSection(g.BroadWall.Millimeters, g.NarrowWall.Millimeters, g.WallThickness.Millimeters);
        double lo = designCouplings.Min(Math.Abs), hi = designCouplings.Max(Math.Abs);
        if (hi < lo * 1.2) { double m = 0.5 * (lo + hi); lo = m / 1.2; hi = m * 1.2; }
        else { lo *= 0.9; hi *= 1.1; }
        var couplings = couplingCount == 1 ? new[] { 0.5 * (lo + hi) } : Enumerable.Range(0, couplingCount).Select(i => lo + (hi - lo) * i / (couplingCount - 1)).ToArray();
        var ratios = lengthCount == 1 ? new[] { 1.0 } : Enumerable.Range(0, lengthCount).Select(i => 0.96 + 0.08 * i / (lengthCount - 1)).ToArray();
        var f0 = request.DesignFrequency;
        var model = ArrayPipeline.SlotModelFor(request);
        var samples = new List<SlotSample>();
        double width = request.Slots.Width.Millimeters;
        double? cutter = request.Slots.Cutter?.Millimeters;
        foreach (double c in couplings)
        {
            double lr = model.Resonance(c, f0).ResonantLength.Millimeters;
            foreach (double r in ratios)
            {
                double len = Math.Round(lr * r, 4);
                if (request.Slots.Type == SlotType.Edge)
                {
                    var edge = EdgeSlot.Create(request.Guide, request.Slots.Width);
                    var tilt = Angle.FromRadians(c);
                    double depth = Math.Round(edge.CutDepth(tilt, Length.FromMillimeters(len)).Millimeters, 4);
                    double developed = edge.DevelopedLength(tilt, Length.FromMillimeters(depth)).Millimeters;
                    samples.Add(new SlotSample(Math.Round(tilt.Degrees, 4), developed, new EdgeCut(Math.Round(tilt.Degrees, 4), depth, width)));
                }
                else
                {
                    double offset = Math.Round(c * 1e3, 4);
                    double overall = request.Slots.Cutter is null ? len
                        : RoundEndedSlot.OverallLength(Length.FromMillimeters(len), request.Slots.Width, request.Slots.Cutter).Millimeters;
                    samples.Add(new SlotSample(offset, len, new LongitudinalCut(offset, overall, width, cutter)));
                }
            }
        }
        var freqs = new SortedSet<double> { f0.Hertz };
        for (int i = 0; i < frequencyCount && frequencyCount > 1; i++)
            freqs.Add(Math.Round(request.BandLow.Hertz + (request.BandHigh.Hertz - request.BandLow.Hertz) * i / (frequencyCount - 1)));
        double longest = samples.Max(s => s.Cut is LongitudinalCut l ? l.OverallLengthMm : (g.NarrowWall.Millimeters + 2 * g.WallThickness.Millimeters));
        double portZ = Math.Ceiling(longest / 2 + PortClearanceMm);
        return new SlotCharacterisation(request, guide, samples, freqs.ToList(), density, portZ);
    }

    /// <summary>The layout of one sample's run (or, with null, of the calibration run on the first sample's mesh).</summary>
    public TubeLayout Layout(SlotSample? sample)
    {
        var (f0, fc) = TubeModel.Pulse(Guide, Request.DesignFrequency.Hertz, Request.BandLow.Hertz, Request.BandHigh.Hertz);
        var s = sample ?? Samples[0];
        return new TubeLayout(Guide, [new PlacedSlot(s.Cut, 0)], CutSlots: sample is not null, ShortZMm: null, Port1ZMm: -PortZMm, Port2ZMm: PortZMm,
            f0, fc, Density, SlotVoltageProbes: false);
    }

    /// <summary>
    /// The runs: one per sample, and one calibration per sample mesh (a plain tube meshed exactly as the sample,
    /// so the numerical phase constant cancels). Calibration runs come first in the list, one per sample, then the
    /// samples in order.
    /// </summary>
    public IReadOnlyList<RunRequest> Runs()
    {
        double a = Guide.AMm * 1e-3;
        var list = new List<RunRequest>();
        foreach (var s in Samples) list.Add(new RunRequest("cal-" + Label(s), TubeModel.Build(Layout(s) with { CutSlots = false }, $"plain-tube calibration for {Label(s)}"), a, FrequenciesHz));
        foreach (var s in Samples) list.Add(new RunRequest(Label(s), TubeModel.Build(Layout(s), $"single slot {Label(s)}"), a, FrequenciesHz));
        return list;
    }

    /// <summary>A readable label: <c>x2.7480-l15.2450</c> (offset, length mm) or <c>t20.0000-d3.4600</c> (tilt deg, depth mm).</summary>
    public static string Label(SlotSample s) => s.Cut switch
    {
        EdgeCut e => FormattableString.Invariant($"t{e.TiltDeg:0.0000}-d{e.CutDepthMm:0.0000}"),
        _ => FormattableString.Invariant($"x{s.Coupling:0.0000}-l{s.LengthMm:0.0000}"),
    };

    /// <summary>De-embeds the outcomes of <see cref="Runs"/> (same order) to one result per sample and frequency.</summary>
    public IReadOnlyList<SlotSampleResult> Reduce(IReadOnlyList<RunOutcome> outcomes)
    {
        int n = Samples.Count;
        if (outcomes.Count != 2 * n) throw new ArgumentException($"expected {2 * n} outcomes, got {outcomes.Count}", nameof(outcomes));
        var results = new List<SlotSampleResult>();
        for (int i = 0; i < n; i++)
        {
            var cal = outcomes[i].Response.Points;
            var meas = outcomes[n + i].Response.Points;
            for (int k = 0; k < FrequenciesHz.Count; k++)
            {
                var (s11, s21) = SlotPlaneDeembedding.ToSlotPlane(meas[k].S11, meas[k].S21, cal[k].S11, cal[k].S21);
                results.Add(new SlotSampleResult(Samples[i], FrequenciesHz[k], SlotPlaneDeembedding.ShuntAdmittance(s11), SlotPlaneDeembedding.ShuntResidual(s11, s21)));
            }
        }
        return results;
    }
}
