using System.Collections.Immutable;
using System.Numerics;
using MathNet.Numerics.Integration;
using SlotArray.Core.Patterns;

namespace SlotArray.Core.Tolerance;

/// <summary>What the pattern analysis finds in one trial.</summary>
/// <param name="PeakSidelobeDb">Peak sidelobe relative to the beam peak, dB (−300 when the cut has no sidelobe region).</param>
/// <param name="BeamDirection">θ of the beam peak, rad.</param>
/// <param name="S11Db">20 log10 |S11| at the design frequency, dB.</param>
/// <param name="Gain">Realised gain D × P_rad/P_inc, dimensionless.</param>
/// <param name="FloorPower">Error-pattern power averaged over the visible u, relative to the nominal beam peak (see <see cref="TrialEvaluator"/>).</param>
/// <param name="AmplitudeErrorSquares">Σ_n (ln|r_n|)² of the relative excitation errors r_n (common factor removed).</param>
/// <param name="PhaseErrorSquares">Σ_n (arg r_n)², rad².</param>
/// <param name="PositionPhaseSquares">Σ_n k² δz_n²/3: the position errors' mean-square phase k δz u over the visible u.</param>
internal readonly record struct TrialOutcome(double PeakSidelobeDb, double BeamDirection, double S11Db, double Gain, double FloorPower,
    double AmplitudeErrorSquares, double PhaseErrorSquares, double PositionPhaseSquares);

/// <summary>
/// The per-trial analysis at one frequency on fixed grids: array factor × the element pattern of the design's figures
/// (<see cref="Network.ArrayFigures"/>: the half-wave slot for broad-wall slots; for edge slots the co-polarised sources
/// e_n cos θ_n with a uniform element, and the cross-polarised power of e_n sin θ_n with the cos ψ element added to the
/// radiated power, D = 4|AF_co(θb)|²/(∫|AF_co|² du + ∫|AF_x|² cos²ψ du), the same directivity as the design's
/// 2 D_iso,co/(1 + P_x/P_co)) on the cut, the
/// Patterns library's metrics, the half-space directivity (the rule of <see cref="Directivity.HalfSpace(IReadOnlyList{double}, IReadOnlyList{Complex}, double, Func{double, double}, double)"/>
/// with its nodes and element values computed once), the realised gain, and the excitation-error statistics against
/// the nominal network. Same angle convention as <see cref="Network.ArrayFigures"/>: the pattern positions are −z_n.
/// </summary>
/// <remarks>
/// <para>Evaluation: the designs have equally spaced nominal slots, so the cut, the floor and the directivity's power
/// integral are summed about the nominal line with the slots' displacements as a convergent series
/// (<see cref="NearUniformArrayFactor"/>, <see cref="HalfSpacePowerKernel"/>: the same sums, no sine per element and angle);
/// a non-uniform nominal line falls back to the direct sums.</para>
/// <para>Error-pattern floor: with the trial's excitations scaled by the common factor r̄ = Σ e_t e_n* / Σ |e_n|² (least
/// squares, removing the overall gain and phase that do not change the pattern's shape), the error pattern is
/// ε(u) = Σ (e_t,n/r̄) e^{jkz′_n u} − Σ e_n e^{jkz_n u}; its power averaged uniformly over the visible u ∈ [−1, 1]
/// (midpoint rule), relative to the nominal |AF|² at the beam, is the mean sidelobe floor that the random-error theory
/// predicts as (σ_a² + σ_φ²)/(η_t N) (see <see cref="MonteCarloResult.AnalyticFloorDb"/>).</para>
/// </remarks>
internal sealed class TrialEvaluator
{
    private readonly double k;
    private readonly AngleGrid grid;
    private readonly double[] element, floorSines, quadSines, quadWeights;
    private readonly Func<double, double> elementOf;
    private readonly double[]? crossQuadWeights;
    private readonly HalfSpacePowerKernel? crossKernel;
    private readonly int envelopeStride;
    private readonly TrialNetwork nominal;
    private readonly double[] nominalPatternPositions;
    private readonly double nominalPeakPower;
    private readonly NearUniformArrayFactor? gridSum, floorSum;
    private readonly HalfSpacePowerKernel? powerKernel;
    private readonly Complex[]? nominalFloorField;

    public TrialEvaluator(TrialNetwork nominal, double wavenumber, ToleranceOptions options)
    {
        this.nominal = nominal;
        k = wavenumber;
        // An odd count puts broadside on a sample: an even grid straddles a symmetric beam with two equal samples,
        // and the metrics would count the second as a sidelobe.
        grid = AngleGrid.HalfSpaceInTheta(options.PatternPoints | 1);
        bool edge = nominal.CrossExcitations is not null;
        var e = edge ? CrossPolarPattern.EdgeSlotCoPolarElement : ElementPatterns.HalfWaveSlotHPlane;
        var ex = CrossPolarPattern.EdgeSlotCrossPolarElement;
        elementOf = e;
        element = grid.Theta.Select(e).ToArray();
        envelopeStride = options.EnvelopePoints == 0 ? 0 : Math.Max(1, options.PatternPoints / options.EnvelopePoints);
        int m = options.FloorPoints;
        floorSines = Enumerable.Range(0, m).Select(j => -1 + (2 * j + 1.0) / m).ToArray();
        for (int j = 0; j < m / 2; j++) floorSines[m - 1 - j] = -floorSines[j];   // exactly mirrored

        double span = nominal.Positions.Max() - nominal.Positions.Min();
        int panels = Math.Max(8, (int)Math.Ceiling(k * span / Math.PI) + 8);
        var rule = new GaussLegendreRule(-1, 1, 16);
        quadSines = new double[panels * rule.Order];
        quadWeights = new double[quadSines.Length];
        crossQuadWeights = edge ? new double[quadSines.Length] : null;
        double h = 2.0 / panels;
        for (int p = 0; p < panels; p++)
            for (int q = 0; q < rule.Order; q++)
            {
                int i = p * rule.Order + q;
                quadSines[i] = -1 + h * (p + 0.5 * (rule.Abscissas[q] + 1));
                double el = e(Math.Asin(quadSines[i]));
                quadWeights[i] = 0.5 * h * rule.Weights[q] * el * el;
                if (crossQuadWeights is not null)
                {
                    double xl = ex(Math.Asin(quadSines[i]));
                    crossQuadWeights[i] = 0.5 * h * rule.Weights[q] * xl * xl;
                }
            }
        nominalPatternPositions = nominal.Positions.Select(z => -z).ToArray();
        if (IsEquallySpaced(nominalPatternPositions))
        {
            gridSum = new NearUniformArrayFactor(nominalPatternPositions, k, grid.Sines.ToArray());
            floorSum = new NearUniformArrayFactor(nominalPatternPositions, k, floorSines);
            powerKernel = new HalfSpacePowerKernel(nominalPatternPositions, k, e);
            if (edge) crossKernel = new HalfSpacePowerKernel(nominalPatternPositions, k, ex);
            nominalFloorField = floorSum.Evaluate(nominal.Excitations, new double[nominal.Excitations.Length]);
        }
        var (nominalBeam, _) = PatternOf(nominalPatternPositions, nominal.Excitations, new double[nominal.Excitations.Length], NewWorkspace());
        var af0 = ArrayFactor.AtSines(nominalPatternPositions, nominal.Excitations, k, [Math.Sin(nominalBeam)])[0];
        nominalPeakPower = af0.Real * af0.Real + af0.Imaginary * af0.Imaginary;
        double sumSquares = nominal.Excitations.Sum(c => c.Real * c.Real + c.Imaginary * c.Imaginary);
        TaperEfficiency = nominalPeakPower / (nominal.Excitations.Length * sumSquares);
        EnvelopeAngles = envelopeStride == 0 ? [] : Enumerable.Range(0, grid.Count).Where(i => i % envelopeStride == 0).Select(i => grid.Theta[i]).ToArray();
    }

    /// <summary>θ of the envelope samples, rad.</summary>
    public double[] EnvelopeAngles { get; }

    /// <summary>
    /// Taper efficiency toward the nominal beam, η_t = |AF(u_b)|²/(N Σ|e_n|²): the standard |Σ e_n|²/(N Σ|e_n|²)
    /// (the standard definition) for a broadside beam, and the same with the phase progression of a squinted beam removed.
    /// </summary>
    public double TaperEfficiency { get; }

    private static bool IsEquallySpaced(double[] p)
    {
        if (p.Length < 2) return false;
        double d = (p[^1] - p[0]) / (p.Length - 1), tol = 1e-12 * Math.Abs(p[^1] - p[0]);
        for (int i = 0; i < p.Length; i++) if (Math.Abs(p[i] - (p[0] + i * d)) > tol) return false;
        return d != 0;
    }

    /// <summary>Working arrays for <see cref="Evaluate(TrialNetwork, Workspace, Span{float})"/>: one per thread, reused from trial to trial.</summary>
    public Workspace NewWorkspace() => new(this);

    /// <summary>
    /// The beam direction (rad) and peak sidelobe (dB) of the cut (<see cref="PatternMetrics"/>'s rule) for excitations at the
    /// pattern positions <paramref name="patternPositions"/> = nominal + <paramref name="offsets"/>; the cut's power is left
    /// in <see cref="Workspace.Power"/>.
    /// </summary>
    private (double Beam, double? PeakSidelobeDb) PatternOf(double[] patternPositions, ReadOnlySpan<Complex> excitations, double[] offsets, Workspace w)
    {
        if (gridSum is not null) gridSum.Evaluate(excitations, offsets, w.FieldRe, w.FieldIm, w.GridScratch!);
        else
        {
            var af = ArrayFactor.AtSines(patternPositions, excitations.ToArray(), k, grid.Sines.AsSpan());
            for (int i = 0; i < af.Length; i++) { w.FieldRe[i] = af[i].Real; w.FieldIm[i] = af[i].Imaginary; }
        }
        double peak = 0;
        for (int i = 0; i < w.Power.Length; i++)
        {
            double fr = w.FieldRe[i] * element[i], fi = w.FieldIm[i] * element[i];
            double p = fr * fr + fi * fi;
            w.Power[i] = p;
            if (p > peak) peak = p;
        }
        w.PeakPower = peak;
        // The workspace's power array is read only during this call: wrapping it without a copy is safe here.
        return PatternMetrics.BeamAndPeakSidelobe(grid.Theta, System.Runtime.InteropServices.ImmutableCollectionsMarshal.AsImmutableArray(w.Power), peak);
    }

    /// <summary>∫ |E·AF|² du over the half-space by the kernel (displaced equally spaced slots) or the quadrature directly.</summary>
    private double RadiatedPower(HalfSpacePowerKernel? kernel, double[] weights, double[] pos, Complex[] excitations, double[] offsets, Workspace w)
    {
        if (kernel is not null && kernel.TryPower(excitations, offsets, out double integral, w.KernelScratch!)) return integral;
        var afq = ArrayFactor.AtSines(pos, excitations, k, quadSines);
        integral = 0;
        for (int i = 0; i < afq.Length; i++) integral += weights[i] * (afq[i].Real * afq[i].Real + afq[i].Imaginary * afq[i].Imaginary);
        return integral;
    }

    /// <summary>One trial's figures (allocates its own workspace; no envelope).</summary>
    public TrialOutcome Evaluate(TrialNetwork t) => Evaluate(t, NewWorkspace(), default);

    /// <summary>
    /// One trial's figures; the cut's envelope samples (dB relative to its peak) go to <paramref name="envelope"/> when it is
    /// not empty (length <see cref="EnvelopeAngles"/>).
    /// </summary>
    public TrialOutcome Evaluate(TrialNetwork t, Workspace w, Span<float> envelope)
    {
        int n = t.Positions.Length;
        var pos = w.Positions;
        var offsets = w.Offsets;
        for (int i = 0; i < n; i++)
        {
            pos[i] = -t.Positions[i];
            offsets[i] = pos[i] - nominalPatternPositions[i];
        }
        var (beam, peakSidelobeDb) = PatternOf(pos, t.Excitations, offsets, w);

        // Half-space directivity D = 4 |E·AF|²(θb) / ∫ |E·AF|² du (Directivity.HalfSpace, same rule).
        var afBeam = ArrayFactor.AtSines(pos, t.Excitations, k, [Math.Sin(beam)])[0];
        double eb = elementOf(beam);
        double integral = RadiatedPower(powerKernel, quadWeights, pos, t.Excitations, offsets, w);
        if (t.CrossExcitations is { } cross) integral += RadiatedPower(crossKernel, crossQuadWeights!, pos, cross, offsets, w);
        double directivity = 4 * eb * eb * (afBeam.Real * afBeam.Real + afBeam.Imaginary * afBeam.Imaginary) / integral;

        // Excitation errors against the nominal, common factor removed.
        Complex num = 0;
        double den = 0;
        for (int i = 0; i < n; i++)
        {
            num += t.Excitations[i] * Complex.Conjugate(nominal.Excitations[i]);
            den += nominal.Excitations[i].Real * nominal.Excitations[i].Real + nominal.Excitations[i].Imaginary * nominal.Excitations[i].Imaginary;
        }
        Complex common = num / den;
        double amp2 = 0, phase2 = 0, pos2 = 0;
        var scaled = w.Scaled;
        for (int i = 0; i < n; i++)
        {
            Complex r = t.Excitations[i] / (common * nominal.Excitations[i]);
            double la = Math.Log(r.Magnitude), ph = r.Phase;
            amp2 += la * la;
            phase2 += ph * ph;
            double dz = t.Positions[i] - nominal.Positions[i];
            pos2 += k * k * dz * dz / 3;
            scaled[i] = t.Excitations[i] / common;
        }
        double floor = 0;
        if (floorSum is not null)
        {
            floorSum.Evaluate(scaled, offsets, w.FloorRe, w.FloorIm, w.FloorScratch!);
            for (int j = 0; j < w.FloorRe.Length; j++)
            {
                double er = w.FloorRe[j] - nominalFloorField![j].Real, ei = w.FloorIm[j] - nominalFloorField[j].Imaginary;
                floor += er * er + ei * ei;
            }
        }
        else
        {
            var both = new double[2 * n];
            var diff = new Complex[2 * n];
            for (int i = 0; i < n; i++)
            {
                both[i] = pos[i];
                diff[i] = scaled[i];
                both[n + i] = nominalPatternPositions[i];
                diff[n + i] = -nominal.Excitations[i];
            }
            foreach (var v in ArrayFactor.AtSines(both, diff, k, floorSines)) floor += v.Real * v.Real + v.Imaginary * v.Imaginary;
        }
        floor /= floorSines.Length * nominalPeakPower;

        if (!envelope.IsEmpty)
        {
            double peak = w.PeakPower;
            for (int j = 0; j < envelope.Length; j++)
            {
                double p = w.Power[j * envelopeStride];
                envelope[j] = (float)(p > 0 ? Math.Max(-300, 10 * Math.Log10(p / peak)) : -300);
            }
        }
        double s11 = t.S11.Magnitude;
        return new TrialOutcome(peakSidelobeDb ?? -300, beam, s11 > 0 ? 20 * Math.Log10(s11) : -300,
            directivity * t.RadiatedPower, floor, amp2, phase2, pos2);
    }

    /// <summary>The per-thread working arrays of one evaluator.</summary>
    internal sealed class Workspace
    {
        internal Workspace(TrialEvaluator e)
        {
            int n = e.nominalPatternPositions.Length, m = e.grid.Count;
            Positions = new double[n]; Offsets = new double[n]; Scaled = new Complex[n];
            FieldRe = new double[m]; FieldIm = new double[m]; Power = new double[m];
            FloorRe = new double[e.floorSines.Length]; FloorIm = new double[e.floorSines.Length];
            GridScratch = e.gridSum?.NewScratch();
            FloorScratch = e.floorSum?.NewScratch();
            KernelScratch = e.powerKernel?.NewScratch();
        }

        internal double[] Positions { get; }
        internal double[] Offsets { get; }
        internal Complex[] Scaled { get; }
        internal double[] FieldRe { get; }
        internal double[] FieldIm { get; }
        internal double[] Power { get; }
        internal double PeakPower { get; set; }
        internal double[] FloorRe { get; }
        internal double[] FloorIm { get; }
        internal NearUniformArrayFactor.Scratch? GridScratch { get; }
        internal NearUniformArrayFactor.Scratch? FloorScratch { get; }
        internal HalfSpacePowerKernel.Scratch? KernelScratch { get; }
    }
}
