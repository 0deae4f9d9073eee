using System.Numerics;
using SlotArray.Core.Patterns;
using SlotArray.Core.Quantities;
using SlotArray.FullWave.Model;
using SlotArray.FullWave.Runs;
using SlotArray.FullWave.Slots;

namespace SlotArray.FullWave.Arrays;

/// <summary>Key figures of one array response (full-wave or predicted).</summary>
/// <param name="BestMatchHz">Frequency of the smallest |S11| in the band, Hz (parabolic refinement in dB).</param>
/// <param name="S11AtDesignDb">|S11| at the design frequency, dB.</param>
/// <param name="BeamDeg">Beam direction at the design frequency, deg from broadside (+ toward +z).</param>
/// <param name="PeakSidelobeDb">Peak sidelobe at the design frequency, dB (null if none).</param>
/// <param name="HpbwDeg">Half-power beamwidth at the design frequency, deg.</param>
internal sealed record ArrayFigures(double BestMatchHz, double S11AtDesignDb, double BeamDeg, double? PeakSidelobeDb, double HpbwDeg);

/// <summary>The full-wave response of the array: |S11| across the band and the principal-plane cut at the design frequency.</summary>
/// <param name="FrequenciesHz">Sweep frequencies, Hz.</param>
/// <param name="S11">S11 referred to the feed reference plane.</param>
/// <param name="SlotVoltages">Slot voltages at the design frequency (÷ the incident wave), cut-list order.</param>
/// <param name="PatternDeg">Pattern cut angles, deg.</param>
/// <param name="PatternDb">Pattern cut levels, dB (peak 0).</param>
/// <param name="Figures">Key figures.</param>
internal sealed record FullWaveArrayResult(IReadOnlyList<double> FrequenciesHz, IReadOnlyList<Complex> S11, IReadOnlyList<Complex> SlotVoltages,
    IReadOnlyList<double> PatternDeg, IReadOnlyList<double> PatternDb, ArrayFigures Figures);

/// <summary>
/// Builds the designed array exactly as its cut list gives it (every slot at its position, offset, length and
/// width, round or square ends; the end short of wall thickness at datum A, or a matched guide for a load; the
/// feed guide beyond the last slot with the excited TE10 port), runs it as one engine run, and reduces it:
/// S11 across the band (moved from the port to the feed reference plane with the lossless TE10 β) and the
/// principal-plane pattern from the full-wave slot voltages (each slot's E integrated across its centre on the outer
/// face) times the half-wave slot element pattern, as the design's own pattern is formed.
/// </summary>
internal sealed class ArrayVerification
{
    private ArrayVerification(DesignFolder design, TubeLayout layout, RunRequest run, double portZMm)
    {
        Design = design;
        Layout = layout;
        Run = run;
        PortZMm = portZMm;
    }

    /// <summary>The design read back.</summary>
    public DesignFolder Design { get; }

    /// <summary>The layout built.</summary>
    public TubeLayout Layout { get; }

    /// <summary>The one engine run.</summary>
    public RunRequest Run { get; }

    /// <summary>The port's measurement plane, mm from datum A.</summary>
    public double PortZMm { get; }

    /// <summary>Plans the run for a design folder; <paramref name="sweepPoints"/> frequencies across the band.</summary>
    /// <exception cref="NotSupportedException">A slot type, feed or termination this version does not build; the message says which.</exception>
    public static ArrayVerification Plan(DesignFolder d, MeshDensity density, int sweepPoints = 71)
    {
        if (d.SlotType != "longitudinal")
            throw new NotSupportedException($"verify builds longitudinal broad-wall slot arrays; this design's slots are {d.SlotType}");
        if (d.Termination is not ("short" or "load"))
            throw new NotSupportedException($"verify builds an end short or a matched load; this design's termination is '{d.Termination}'");
        double last = d.Slots.Max(s => s.PositionMm);
        if (double.IsNaN(d.FeedPositionMm) || d.FeedPositionMm < last - 0.01)
            throw new NotSupportedException("verify builds end-fed arrays (feed beyond the last slot); a centre feed is not built yet");
        var slots = d.Slots.Select(s => new PlacedSlot(new LongitudinalCut(s.OffsetMm, s.LengthMm, s.WidthMm, s.RoundEnds ? s.WidthMm : null), s.PositionMm)).ToList();
        double portZ = Math.Ceiling(d.FeedPositionMm + d.Slots.Max(s => s.LengthMm) / 2 + SlotCharacterisation.PortClearanceMm);
        var (f0, fc) = TubeModel.Pulse(d.Guide, d.DesignFrequencyHz, d.BandLowHz, d.BandHighHz);
        double? shortZ = d.Termination == "short" ? 0 : null;
        var layout = new TubeLayout(d.Guide, slots, true, shortZ, portZ, null, f0, fc, density, SlotVoltageProbes: true);
        var freqs = Enumerable.Range(0, sweepPoints).Select(i => d.BandLowHz + (d.BandHighHz - d.BandLowHz) * i / (sweepPoints - 1)).Append(d.DesignFrequencyHz)
            .Distinct().Order().ToList();
        var model = TubeModel.Build(layout, $"array {d.Name}: {d.Slots.Count} slots as the cut list gives them");
        return new ArrayVerification(d, layout, new RunRequest("array-" + Sanitize(d.Name), model, d.Guide.AMm * 1e-3, freqs), portZ);
    }

    private static string Sanitize(string s) => new(s.Select(c => char.IsLetterOrDigit(c) || c == '-' ? c : '_').ToArray());

    /// <summary>Reduces the run's outcome to the full-wave response and its figures.</summary>
    public FullWaveArrayResult Reduce(RunOutcome outcome)
    {
        var d = Design;
        double a = d.Guide.AMm * 1e-3, shift = (PortZMm - d.FeedPositionMm) * 1e-3;
        var pts = outcome.Response.Points;
        var s11 = pts.Select(p => p.S11 * Complex.Exp(new Complex(0, 2 * Results.PortWaves.Te10PhaseConstant(p.FrequencyHz, a) * shift))).ToList();
        var freqs = pts.Select(p => p.FrequencyHz).ToList();
        int k0 = freqs.IndexOf(d.DesignFrequencyHz);
        var volts = pts[k0].Probes;
        var (deg, db, metrics) = PatternOf(d, volts);
        double best = BestMatch(freqs, s11.Select(s => Db(s.Magnitude)).ToList());
        var fig = new ArrayFigures(best, Db(s11[k0].Magnitude), metrics.BeamDirection.Degrees, metrics.PeakSidelobeDb, metrics.HalfPowerBeamwidth.Degrees);
        return new FullWaveArrayResult(freqs, s11, volts, deg, db, fig);
    }

    /// <summary>The predicted figures from design.json, measured the same way (best match from its sweep).</summary>
    public ArrayFigures PredictedFigures()
    {
        var d = Design;
        var f = d.Predicted.Select(p => p.FrequencyHz).ToList();
        var s = d.Predicted.Select(p => p.S11Db).ToList();
        int k0 = f.Select((x, i) => (Math.Abs(x - d.DesignFrequencyHz), i)).Min().i;
        return new ArrayFigures(BestMatch(f, s), s[k0], d.PredictedBeamDeg, d.PredictedPeakSidelobeDb, d.PredictedHpbwDeg);
    }

    /// <summary>
    /// The principal-plane cut from slot voltages: array factor of the voltages at the slot positions times the
    /// half-wave slot's H-plane element pattern (<see cref="ElementPatterns.HalfWaveSlotHPlane"/>), on the design's own angle grid.
    /// </summary>
    internal static (IReadOnlyList<double> Deg, IReadOnlyList<double> Db, PatternMetrics Metrics) PatternOf(DesignFolder d, IReadOnlyList<Complex> volts)
    {
        var positions = d.Slots.Select(s => s.PositionMm * 1e-3).ToList();
        var grid = AngleGrid.UniformInTheta(-Math.PI / 2, Math.PI / 2, 1801);
        var pattern = ArrayFactor.Compute(positions, volts, Frequency.FromHertz(d.DesignFrequencyHz).FreeSpaceWavenumber, grid, ElementPatterns.HalfWaveSlotHPlane);
        var db = pattern.RelativeDecibels(-100);
        return (grid.Theta.Select(t => t * 180 / Math.PI).ToList(), db, PatternMetrics.Measure(pattern));
    }

    /// <summary>The minimum of a sampled dB curve, refined by a parabola through the three samples around it.</summary>
    internal static double BestMatch(IReadOnlyList<double> f, IReadOnlyList<double> db)
    {
        int i = 0;
        for (int k = 1; k < db.Count; k++) if (db[k] < db[i]) i = k;
        if (i == 0 || i == db.Count - 1) return f[i];
        double x0 = f[i - 1], x1 = f[i], x2 = f[i + 1], y0 = db[i - 1], y1 = db[i], y2 = db[i + 1];
        double den = (x0 - x1) * (x0 - x2) * (x1 - x2);
        double A = (x2 * (y1 - y0) + x1 * (y0 - y2) + x0 * (y2 - y1)) / den;
        double B = (x2 * x2 * (y0 - y1) + x1 * x1 * (y2 - y0) + x0 * x0 * (y1 - y2)) / den;
        return A > 0 ? Math.Clamp(-B / (2 * A), x0, x2) : x1;
    }

    private static double Db(double magnitude) => 20 * Math.Log10(Math.Max(magnitude, 1e-15));

    /// <summary>
    /// A rough run-time estimate, seconds: cells × time steps ÷ throughput. Time step: the Courant limit of the smallest
    /// cell of each axis, Δt = 1/(c √(Δx⁻² + Δy⁻² + Δz⁻²)) (A. Taflove and S. C. Hagness, <i>Computational
    /// Electrodynamics</i>, 3rd ed., Artech House 2005, eq. 4.92, from memory). Duration: the pulse and its ring-down,
    /// 1 + 0.3 N pulse lengths for N slots (6-slot coarse runs here stopped after 2.6–2.8 pulse lengths, 2026-12-05);
    /// throughput from earlier runs in the store, else the caller's assumption.
    /// </summary>
    public double EstimateSeconds(double cellsPerSecondPerThread, int threads)
    {
        var m = Run.Model;
        double Smallest(IReadOnlyList<double> l) => l.Zip(l.Skip(1), (a, b) => b - a).Min() * 1e-3;
        double inv2 = new[] { m.Mesh.X, m.Mesh.Y, m.Mesh.Z }.Sum(l => 1 / Math.Pow(Smallest(l), 2));
        double dt = 1 / (PhysicalConstants.SpeedOfLight * Math.Sqrt(inv2));
        double pulse = 2 * 9 / (2 * Math.PI * m.HalfBandwidthHz); // the engine's Gaussian: 9/(2π fc) either side of its peak (from memory)
        double steps = pulse / dt * (1 + 0.3 * Design.Slots.Count);
        return m.Mesh.Cells * steps / (cellsPerSecondPerThread * Math.Max(1, threads) * 0.7);
    }
}
