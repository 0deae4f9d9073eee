using System.Numerics;
using MathNet.Numerics.LinearAlgebra;

namespace SlotArray.Core.Prototype;

/// <summary>One slot's excitation error reconstructed from a cut.</summary>
/// <param name="Slot">Slot number (1-based).</param>
/// <param name="AmplitudeDb">Amplitude error 20 log10 |1 + δ| with its interval (dB).</param>
/// <param name="PhaseDeg">Phase error arg(1 + δ) with its interval (deg).</param>
/// <param name="AmplitudeResolution">Diagonal of the resolution matrix for Re δ: 1 fully seen by the data, 0 set by the regularisation alone.</param>
/// <param name="PhaseResolution">The same for Im δ.</param>
internal sealed record SlotExcitationError(int Slot, FittedValue AmplitudeDb, FittedValue PhaseDeg, double AmplitudeResolution, double PhaseResolution)
{
    /// <summary>Resolution below which a slot counts as not seen: 0.5 (the regularisation decides more than the data).</summary>
    public const double SeenThreshold = 0.5;

    /// <summary>Whether the data see this slot's amplitude.</summary>
    public bool AmplitudeSeen => AmplitudeResolution >= SeenThreshold;

    /// <summary>Whether the data see this slot's phase.</summary>
    public bool PhaseSeen => PhaseResolution >= SeenThreshold;
}

/// <summary>The excitation errors reconstructed from one cut.</summary>
/// <param name="Cut">The cut.</param>
/// <param name="Slots">Per-slot errors, in slot order.</param>
/// <param name="Stage">The fit's statistics (residual, condition number, notes on unseen slots).</param>
/// <param name="PredictedField">The fitted plate's field at the cut's angles before the per-slot errors (nuisance applied), for the overlay.</param>
internal sealed record CutReconstruction(MeasuredCut Cut, IReadOnlyList<SlotExcitationError> Slots, FitStage Stage, IReadOnlyList<Complex> PredictedField);

/// <summary>
/// Stage d: per-slot excitation errors from a pattern cut, e_n = e_n^model (1 + δ_n), by Tikhonov-regularised least
/// squares (A. N. Tikhonov and V. Y. Arsenin, <i>Solutions of Ill-Posed Problems</i>, Winston 1977; in the Gaussian-prior
/// form of W. Menke, <i>Geophysical Data Analysis</i>, 3rd ed., 2012, Sec. 4.4, from memory) with a prior of
/// <see cref="PriorSigma"/> on each Re δ and Im δ, on MathNet's Levenberg–Marquardt minimiser (the field is linear in δ
/// with phase; the dB level is not). Reports the condition number of the data Jacobian in δ and, per slot, the diagonal of
/// the model resolution matrix R = (JᵀJ + Λ)⁻¹JᵀJ (Menke, Sec. 4.7): slots with R &lt; 0.5 are those the data cannot see.
/// </summary>
internal static class ExcitationReconstruction
{
    /// <summary>Prior 1σ of Re δ and Im δ: 0.3 (30 % in amplitude, about 17° in phase).</summary>
    public const double PriorSigma = 0.3;

    /// <summary>Reconstructs the excitation errors of the plate modelled by <paramref name="model"/> with <paramref name="errors"/>.</summary>
    public static CutReconstruction Run(PrototypeModel model, PrototypeErrors errors, CutFitData data)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(data);
        var design = model.Apply(errors);
        var sol = model.Solve(design, model.SlotModel(errors), data.Cut.Frequency);
        var basis = PrototypeModel.FieldBasis(design, data.Cut.Frequency, data.Angles);
        int n = design.Count, q = data.NuisanceCount, a = data.Angles.Length;
        var e0 = sol.Excitations.ToArray();
        Complex[] FieldOf(ReadOnlySpan<double> p)
        {
            var f = new Complex[a];
            for (int i = 0; i < a; i++)
            {
                var s = Complex.Zero;
                for (int j = 0; j < n; j++) s += basis[i, j] * e0[j] * new Complex(1 + p[j], p[n + j]);
                f[i] = s;
            }
            return f;
        }
        var nominal = FieldOf(new double[2 * n]);
        var start = new double[2 * n].Concat(data.StartNuisance(nominal)).ToArray();
        var names = Enumerable.Range(1, n).Select(i => $"slot {i} Re δ").Concat(Enumerable.Range(1, n).Select(i => $"slot {i} Im δ"))
            .Concat(new[] { "scale", "phase", "rotation-centre offset" }.Take(q)).ToArray();
        var steps = Enumerable.Repeat(1e-4, 2 * n).Concat(data.NuisanceSteps).ToArray();
        var reg = Enumerable.Repeat(1 / PriorSigma, 2 * n).Concat(new double[q]).ToArray();
        // The field is linear in δ: its Jacobian columns are B_an e0_n (Re δ_n) and j B_an e0_n (Im δ_n), each O(angles).
        double[,] Jacobian(double[] p)
        {
            var field = FieldOf(p);
            var rows = data.Observed.Length;
            var jac = new double[rows, 2 * n + q];
            var column = new Complex[a];
            var d = new double[rows];
            for (int j = 0; j < 2 * n; j++)
            {
                int slot = j % n;
                var unit = j < n ? e0[slot] : Complex.ImaginaryOne * e0[slot];
                for (int i = 0; i < a; i++) column[i] = basis[i, slot] * unit;
                data.DataDerivative(field, column, p.AsSpan(2 * n), d);
                for (int i = 0; i < rows; i++) jac[i, j] = d[i];
            }
            data.NuisanceDerivatives(field, p.AsSpan(2 * n), jac, 0, 2 * n);
            return jac;
        }
        var fit = WeightedFit.Fit(names, p => data.Data(FieldOf(p), p.AsSpan(2 * n)), data.Observed, data.Sigma, start, steps, reg,
            jacobian: Jacobian);

        // Resolution and condition number of the δ block.
        var jd = fit.Jacobian.SubMatrix(0, fit.Jacobian.RowCount, 0, 2 * n);
        var resolution = fit.Resolution;
        double cond = WeightedFit.ConditionNumber(jd, fit.Normal.SubMatrix(0, 2 * n, 0, 2 * n));

        var slots = new SlotExcitationError[n];
        var unseen = new List<int>();
        for (int j = 0; j < n; j++)
        {
            var re = fit.Values[j];
            var im = fit.Values[n + j];
            var z = new Complex(1 + re.Value, im.Value);
            double mag = Math.Max(z.Magnitude, 1e-6);
            var amp = new FittedValue($"slot {j + 1} amplitude error (dB)", 20 * Math.Log10(mag), 20 / Math.Log(10) * re.StandardError / mag);
            var ph = new FittedValue($"slot {j + 1} phase error (deg)", z.Phase * 180 / Math.PI, im.StandardError / mag * 180 / Math.PI);
            slots[j] = new SlotExcitationError(j + 1, amp, ph, resolution[j, j], resolution[n + j, n + j]);
            if (!slots[j].AmplitudeSeen && !slots[j].PhaseSeen) unseen.Add(j + 1);
        }
        var notes = new List<string>();
        if (unseen.Count > 0)
            notes.Add($"the cut cannot see slot{(unseen.Count > 1 ? "s" : "")} {string.Join(", ", unseen)} (resolution < {SlotExcitationError.SeenThreshold}): their errors are the prior's (zero), not measured");
        if (!data.Cut.HasPhase) notes.Add("amplitude-only cut: the phase errors are poorly determined (a cut with phase resolves them)");
        var nuisance = fit.Values.Skip(2 * n).Select(v => v.Value).ToArray();
        var predicted = data.Cut.HasPhase ? Combine(data.Data(nominal, nuisance)) : data.Data(nominal, nuisance).Select(d => (Complex)Math.Pow(10, d / 20)).ToArray();
        var stage = new FitStage($"d: slot excitations from {data.Cut.Source}", fit.Values, fit.ResidualRms, fit.NoiseScale, cond, fit.Converged, notes);
        return new CutReconstruction(data.Cut, slots, stage, predicted);
    }

    private static Complex[] Combine(double[] reIm)
    {
        var z = new Complex[reIm.Length / 2];
        for (int i = 0; i < z.Length; i++) z[i] = new Complex(reIm[2 * i], reIm[2 * i + 1]);
        return z;
    }
}
