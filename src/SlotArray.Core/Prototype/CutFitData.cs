using System.Numerics;

namespace SlotArray.Core.Prototype;

/// <summary>
/// A pattern cut as fit data. With phase: Re and Im of the measured field 10^(L/20) e^{jφ}, each with 1σ =
/// 0.01 (|E| + 0.01 max|E|) (noise proportional to the level, as a receiver's dB and degree noise gives, with a floor);
/// without phase: the level in dB at the angles within 40 dB of the peak, 1σ = 0.1 dB. Either way the fit rescales the
/// assumed noise by what its residual shows (<see cref="WeightedFit"/>), so only the shape of σ matters.
/// </summary>
internal sealed class CutFitData
{
    /// <summary>Dynamic range used of an amplitude-only cut: 40 dB.</summary>
    public const double AmplitudeRangeDb = 40;

    /// <summary>Builds the data of one cut.</summary>
    public CutFitData(MeasuredCut cut)
    {
        ArgumentNullException.ThrowIfNull(cut);
        Cut = cut;
        double peak = cut.LevelsDb.Max();
        var idx = new List<int>();
        for (int i = 0; i < cut.Angles.Count; i++)
            if (cut.HasPhase || cut.LevelsDb[i] >= peak - AmplitudeRangeDb) idx.Add(i);
        Indices = idx;
        Angles = idx.Select(i => cut.Angles[i]).ToArray();
        if (cut.HasPhase)
        {
            var e = idx.Select(i => Complex.FromPolarCoordinates(Math.Pow(10, cut.LevelsDb[i] / 20), cut.PhasesRad![i])).ToArray();
            double max = e.Max(z => z.Magnitude);
            Observed = e.SelectMany(z => new[] { z.Real, z.Imaginary }).ToArray();
            Sigma = e.SelectMany(z => { double s = 0.01 * (z.Magnitude + 0.01 * max); return new[] { s, s }; }).ToArray();
            Measured = e;
        }
        else
        {
            Observed = idx.Select(i => cut.LevelsDb[i]).ToArray();
            Sigma = idx.Select(_ => 0.1).ToArray();
            Measured = idx.Select(i => (Complex)Math.Pow(10, cut.LevelsDb[i] / 20)).ToArray();
        }
    }

    /// <summary>The cut.</summary>
    public MeasuredCut Cut { get; }

    /// <summary>Indices of the angles used.</summary>
    public IReadOnlyList<int> Indices { get; }

    /// <summary>The angles used, rad.</summary>
    public double[] Angles { get; }

    /// <summary>The measured field at those angles (real magnitudes for an amplitude-only cut).</summary>
    public Complex[] Measured { get; }

    /// <summary>The data vector.</summary>
    public double[] Observed { get; }

    /// <summary>1σ of each datum.</summary>
    public double[] Sigma { get; }

    /// <summary>Number of nuisance parameters: scale, phase and rotation-centre offset with phase; scale alone without.</summary>
    public int NuisanceCount => Cut.HasPhase ? 3 : 1;

    /// <summary>
    /// The data vector of a model field F(θ) with the nuisance parameters ν: with phase e^{ν0 + j(ν1 + k ν2 sin θ)} F
    /// (ν2 the rotation centre's offset along the guide axis, m); without, 20 log10 |F| + ν0 (dB).
    /// </summary>
    public double[] Data(IReadOnlyList<Complex> field, ReadOnlySpan<double> nuisance)
    {
        double k = Cut.Frequency.FreeSpaceWavenumber;
        if (Cut.HasPhase)
        {
            var y = new double[2 * field.Count];
            for (int a = 0; a < field.Count; a++)
            {
                var z = Complex.Exp(new Complex(nuisance[0], nuisance[1] + k * nuisance[2] * Math.Sin(Angles[a]))) * field[a];
                y[2 * a] = z.Real;
                y[2 * a + 1] = z.Imaginary;
            }
            return y;
        }
        var d = new double[field.Count];
        for (int a = 0; a < field.Count; a++) d[a] = 20 * Math.Log10(Math.Max(field[a].Magnitude, 1e-12)) + nuisance[0];
        return d;
    }

    /// <summary>
    /// The derivative of <see cref="Data"/> along a change dF of the model field, the nuisance held: with phase the
    /// field's transform applied to dF; without, (20/ln 10) Re(F* dF)/|F|² (dB).
    /// </summary>
    public void DataDerivative(IReadOnlyList<Complex> field, IReadOnlyList<Complex> change, ReadOnlySpan<double> nuisance, Span<double> into)
    {
        double k = Cut.Frequency.FreeSpaceWavenumber;
        for (int a = 0; a < field.Count; a++)
        {
            if (Cut.HasPhase)
            {
                var z = Complex.Exp(new Complex(nuisance[0], nuisance[1] + k * nuisance[2] * Math.Sin(Angles[a]))) * change[a];
                into[2 * a] = z.Real;
                into[2 * a + 1] = z.Imaginary;
            }
            else
            {
                double m2 = field[a].Real * field[a].Real + field[a].Imaginary * field[a].Imaginary;
                into[a] = field[a].Magnitude > 1e-12 ? 20 / Math.Log(10) * (Complex.Conjugate(field[a]) * change[a]).Real / m2 : 0;
            }
        }
    }

    /// <summary>Central-difference derivatives of <see cref="Data"/> with respect to each nuisance parameter, as columns
    /// <paramref name="column"/>… of <paramref name="into"/> from row <paramref name="row"/>.</summary>
    public void NuisanceDerivatives(IReadOnlyList<Complex> field, ReadOnlySpan<double> nuisance, double[,] into, int row, int column)
    {
        var steps = NuisanceSteps;
        var v = nuisance.ToArray();
        for (int q = 0; q < NuisanceCount; q++)
        {
            double keep = v[q];
            v[q] = keep + steps[q];
            var plus = Data(field, v);
            v[q] = keep - steps[q];
            var minus = Data(field, v);
            v[q] = keep;
            for (int i = 0; i < plus.Length; i++) into[row + i, column + q] = (plus[i] - minus[i]) / (2 * steps[q]);
        }
    }

    /// <summary>Starting nuisance parameters that line a model field up with the measurement at the measured peak.</summary>
    public double[] StartNuisance(IReadOnlyList<Complex> field)
    {
        int peak = 0;
        for (int a = 1; a < Measured.Length; a++) if (Measured[a].Magnitude > Measured[peak].Magnitude) peak = a;
        var ratio = Measured[peak] / (field[peak] == Complex.Zero ? Complex.One : field[peak]);
        return Cut.HasPhase ? [Math.Log(ratio.Magnitude), ratio.Phase, 0] : [20 * Math.Log10(ratio.Magnitude)];
    }

    /// <summary>Central-difference steps of the nuisance parameters.</summary>
    public double[] NuisanceSteps => Cut.HasPhase ? [1e-4, 1e-4, 1e-5] : [1e-3];
}
