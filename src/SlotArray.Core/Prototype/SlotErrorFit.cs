using System.Numerics;
using SlotArray.Core.Slots;

namespace SlotArray.Core.Prototype;

/// <summary>One slot's fitted length and coupling errors.</summary>
/// <param name="Slot">Slot number (1-based).</param>
/// <param name="Length">Length error, mm (positive: longer than cut).</param>
/// <param name="Coupling">Offset error, mm (positive: farther from the centreline), or tilt error, deg.</param>
/// <param name="Resolution">Mean diagonal of the resolution matrix for this slot's two errors (1 seen, 0 not).</param>
/// <param name="Correlation">Correlation of the slot's length and coupling errors.</param>
internal sealed record SlotGeometryError(int Slot, FittedValue Length, FittedValue Coupling, double Resolution, double Correlation);

/// <summary>
/// Stage e: the per-slot length and offset (or tilt) errors that explain the pattern cuts, fitted to all cuts at once
/// on the network model linearised about the fitted uniform errors: e(p) = e₀ + S p, with S = ∂e/∂p by forward
/// differences of the network (one solution per slot and error kind at each cut frequency), then the field of
/// <see cref="PrototypeModel.FieldBasis"/> with each cut's nuisance parameters. Regularised toward zero with a prior of
/// <see cref="PriorSigmaMm"/> (Tikhonov, Gaussian-prior form; see <see cref="ExcitationReconstruction"/>), on MathNet's
/// Levenberg–Marquardt minimiser. Parameters are in mm (and deg for tilts) inside the fit.
/// </summary>
internal static class SlotErrorFit
{
    /// <summary>Prior 1σ of each length and offset error: 0.3 mm (tilts: 3°).</summary>
    public const double PriorSigmaMm = 0.3;

    /// <summary>|Correlation| of a slot's length and coupling errors above which they are reported as inseparable.</summary>
    public const double InseparableCorrelation = 0.95;

    /// <summary>Fits the per-slot errors on top of <paramref name="errors"/> (whose own per-slot errors are the linearisation point).</summary>
    /// <param name="model">The plate's model.</param>
    /// <param name="errors">The linearisation point: the uniform errors and any per-slot errors already found.</param>
    /// <param name="cuts">The cuts.</param>
    /// <param name="zeroMeanLength">Whether the length and the coupling changes are each held to zero mean (pseudo-data
    /// Σ ΔL_n / N = 0 and Σ Δc_n / N = 0, ± 10⁻⁴ in fit units): with S-parameters measured, the common parts are the uniform
    /// length and conductance scales', which they resolve far better.</param>
    public static (PrototypeErrors Errors, IReadOnlyList<SlotGeometryError> Slots, FitStage Stage) Run(PrototypeModel model, PrototypeErrors errors,
        IReadOnlyList<CutFitData> cuts, bool zeroMeanLength = false)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(cuts);
        int n = model.AsCut.Count;
        bool tilt = model.AsCut.CouplingKind == SlotCouplingKind.Tilt;
        double unitC = tilt ? Math.PI / 180 : 1e-3;     // fit unit of the coupling error: deg or mm
        const double unitL = 1e-3;
        double hL = 0.02, hC = tilt ? 0.2 : 0.02;         // forward-difference steps in fit units
        var slot = model.SlotModel(errors);

        var lin = Linearise(model, errors, slot, cuts, (hL, hC), (unitL, unitC));

        int offset = 2 * n;
        var nuisanceAt = new int[cuts.Count];
        for (int c = 0; c < cuts.Count; c++) { nuisanceAt[c] = offset; offset += cuts[c].NuisanceCount; }
        int p = offset;
        int m = cuts.Sum(c => c.Observed.Length) + (zeroMeanLength ? 2 : 0);
        var observed = cuts.SelectMany(c => c.Observed).Concat(zeroMeanLength ? [0.0, 0.0] : []).ToArray();
        var sigma = cuts.SelectMany(c => c.Sigma).Concat(zeroMeanLength ? [1e-4, 1e-4] : []).ToArray();

        double[] Model(double[] v)
        {
            var y = new double[m];
            int at = 0;
            for (int c = 0; c < cuts.Count; c++)
            {
                var (e0, s, basis, _) = lin[c];
                var e = (Complex[])e0.Clone();
                for (int j = 0; j < 2 * n; j++)
                    if (v[j] != 0) for (int i = 0; i < n; i++) e[i] += s[j][i] * v[j];
                var field = new Complex[cuts[c].Angles.Length];
                for (int a = 0; a < field.Length; a++)
                {
                    var sum = Complex.Zero;
                    for (int i = 0; i < n; i++) sum += basis[a, i] * e[i];
                    field[a] = sum;
                }
                var d = cuts[c].Data(field, v.AsSpan(nuisanceAt[c], cuts[c].NuisanceCount));
                d.CopyTo(y, at);
                at += d.Length;
            }
            if (zeroMeanLength) { y[at] = v.Take(n).Average(); y[at + 1] = v.Skip(n).Take(n).Average(); }
            return y;
        }

        var start = new double[p];
        for (int c = 0; c < cuts.Count; c++)
        {
            var field = new Complex[cuts[c].Angles.Length];
            var (e0, _, basis, _) = lin[c];
            for (int a = 0; a < field.Length; a++) { var sum = Complex.Zero; for (int i = 0; i < n; i++) sum += basis[a, i] * e0[i]; field[a] = sum; }
            cuts[c].StartNuisance(field).CopyTo(start, nuisanceAt[c]);
        }
        string cu = tilt ? "deg" : "mm";
        var names = Enumerable.Range(1, n).Select(i => $"slot {i} length error (mm)")
            .Concat(Enumerable.Range(1, n).Select(i => $"slot {i} {(tilt ? "tilt" : "offset")} error ({cu})"))
            .Concat(Enumerable.Range(offset - (p - 2 * n), p - 2 * n).Select(i => $"cut nuisance {i - 2 * n + 1}")).ToArray();
        var steps = Enumerable.Repeat(1e-3, 2 * n).Concat(cuts.SelectMany(c => c.NuisanceSteps)).ToArray();
        var reg = Enumerable.Repeat(1 / PriorSigmaMm, n).Concat(Enumerable.Repeat(1 / (tilt ? 10 * PriorSigmaMm : PriorSigmaMm), n))
            .Concat(new double[p - 2 * n]).ToArray();
        var fit = WeightedFit.Fit(names, Model, observed, sigma, start, steps, reg, jacobian: v => Jacobian(v, lin, cuts, nuisanceAt, m, zeroMeanLength));

        return Results(fit, errors, n, tilt, unitL, unitC);
    }

    /// <summary>
    /// ∂data/∂v of the linearised model: the field is linear in the slot errors, its column for error j being B S_j
    /// (O(angles) each once B S is formed); the nuisance columns by central differences; the zero-mean rows 1/N.
    /// </summary>
    private static double[,] Jacobian(double[] v, (Complex[] E0, Complex[][] S, Complex[,] Basis, Complex[][] W)[] lin, IReadOnlyList<CutFitData> cuts,
        int[] nuisanceAt, int m, bool zeroMeanLength)
    {
        int n = lin[0].E0.Length;
        var jac = new double[m, v.Length];
        int row = 0;
        for (int c = 0; c < cuts.Count; c++)
        {
            var (e0, s, basis, w) = lin[c];
            int angles = cuts[c].Angles.Length, rows = cuts[c].Observed.Length;
            var e = (Complex[])e0.Clone();
            for (int j = 0; j < 2 * n; j++)
                if (v[j] != 0) for (int i = 0; i < n; i++) e[i] += s[j][i] * v[j];
            var field = new Complex[angles];
            var d = new double[rows];
            for (int a = 0; a < angles; a++) { var sum = Complex.Zero; for (int i = 0; i < n; i++) sum += basis[a, i] * e[i]; field[a] = sum; }
            var nuisance = v.AsSpan(nuisanceAt[c], cuts[c].NuisanceCount);
            for (int j = 0; j < 2 * n; j++)
            {
                cuts[c].DataDerivative(field, w[j], nuisance, d);
                for (int i = 0; i < rows; i++) jac[row + i, j] = d[i];
            }
            cuts[c].NuisanceDerivatives(field, nuisance, jac, row, nuisanceAt[c]);
            row += rows;
        }
        if (zeroMeanLength)
            for (int j = 0; j < n; j++) { jac[row, j] = 1.0 / n; jac[row + 1, n + j] = 1.0 / n; }
        return jac;
    }

    /// <summary>
    /// The linearisation at each cut's frequency: the excitations e0 at <paramref name="errors"/>, their forward-difference
    /// derivatives S (per fit unit) with respect to each slot's length error and then each slot's coupling error, the
    /// cut's field basis B and the field derivatives W_j = B S_j.
    /// </summary>
    private static (Complex[] E0, Complex[][] S, Complex[,] Basis, Complex[][] W)[] Linearise(PrototypeModel model, PrototypeErrors errors, IShuntSlotModel slot,
        IReadOnlyList<CutFitData> cuts, (double Length, double Coupling) steps, (double Length, double Coupling) units)
    {
        int n = model.AsCut.Count;
        double hL = steps.Length, hC = steps.Coupling, unitL = units.Length, unitC = units.Coupling;
        return cuts.Select(c =>
        {
            var f = c.Cut.Frequency;
            var e0 = model.Solve(model.Apply(errors), slot, f).Excitations.ToArray();
            var s = new Complex[2 * n][];
            Parallel.For(0, 2 * n, new ParallelOptions { MaxDegreeOfParallelism = 2 }, j =>
            {
                var dl = errors.SlotLengthErrors.ToArray();
                var dc = errors.SlotCouplingErrors.ToArray();
                if (j < n) dl[j] += hL * unitL; else dc[j - n] += hC * unitC;
                var ej = model.Solve(model.Apply(errors with { SlotLengthErrors = dl, SlotCouplingErrors = dc }), slot, f).Excitations;
                var col = new Complex[n];
                double h = j < n ? hL : hC;
                for (int i = 0; i < n; i++) col[i] = (ej[i] - e0[i]) / h;
                s[j] = col;
            });
            var basis = PrototypeModel.FieldBasis(model.Apply(errors), f, c.Angles);
            var w = s.Select(col =>
            {
                var field = new Complex[c.Angles.Length];
                for (int a = 0; a < field.Length; a++) { var sum = Complex.Zero; for (int i = 0; i < n; i++) sum += basis[a, i] * col[i]; field[a] = sum; }
                return field;
            }).ToArray();
            return (E0: e0, S: s, Basis: basis, W: w);
        }).ToArray();
    }

    /// <summary>The fitted per-slot errors (totals over the linearisation point), their resolution and correlation, the notes and the stage.</summary>
    private static (PrototypeErrors Errors, IReadOnlyList<SlotGeometryError> Slots, FitStage Stage) Results(WeightedFitResult fit,
        PrototypeErrors errors, int n, bool tilt, double unitL, double unitC)
    {
        var resolution = fit.Resolution;
        var slots = new SlotGeometryError[n];
        var notes = new List<string>();
        var unseen = new List<int>();
        var dlOut = errors.SlotLengthErrors.ToArray();
        var dcOut = errors.SlotCouplingErrors.ToArray();
        for (int i = 0; i < n; i++)
        {
            var l = fit.Values[i];
            var c = fit.Values[n + i];
            double r = fit.Correlation[i, n + i];
            double res = 0.5 * (resolution[i, i] + resolution[n + i, n + i]);
            var totalL = l with { Value = l.Value + errors.SlotLengthErrors[i] / unitL };
            var totalC = c with { Value = c.Value + errors.SlotCouplingErrors[i] / unitC };
            slots[i] = new SlotGeometryError(i + 1, totalL, totalC, res, r);
            dlOut[i] += l.Value * unitL;
            dcOut[i] += c.Value * unitC;
            if (res < SlotExcitationError.SeenThreshold) unseen.Add(i + 1);
            if (Math.Abs(r) > InseparableCorrelation)
                notes.Add(FormattableString.Invariant($"slot {i + 1}: the data cannot separate its length error from its {(tilt ? "tilt" : "offset")} error (correlation {r:0.000})"));
        }
        if (unseen.Count > 0)
            notes.Add($"the cuts cannot see the geometry of slot{(unseen.Count > 1 ? "s" : "")} {string.Join(", ", unseen)} (resolution < {SlotExcitationError.SeenThreshold}): their errors are the prior's (zero), not measured");
        var stage = new FitStage("e: per-slot length and " + (tilt ? "tilt" : "offset") + " errors from the cuts", fit.Values.Take(2 * n).ToArray(),
            fit.ResidualRms, fit.NoiseScale, fit.ConditionNumber, fit.Converged, notes);
        return (errors with { SlotLengthErrors = dlOut, SlotCouplingErrors = dcOut }, slots, stage);
    }
}
