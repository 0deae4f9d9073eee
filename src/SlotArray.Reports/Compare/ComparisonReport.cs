using System.Numerics;
using SlotArray.Core.Design;
using SlotArray.Core.Network;
using SlotArray.Core.Prototype;
using SlotArray.Core.Quantities;

namespace SlotArray.Reports.Compare;

/// <summary>A curve of S11 against frequency for the match overlays.</summary>
/// <param name="Label">Legend text.</param>
/// <param name="Frequencies">Hz.</param>
/// <param name="S11">Reflection at each frequency.</param>
internal sealed record S11Curve(string Label, IReadOnlyList<double> Frequencies, IReadOnlyList<Complex> S11);

/// <summary>A cut's curves for its overlay.</summary>
/// <param name="Title">Plot title.</param>
/// <param name="AnglesDeg">Angles, deg.</param>
/// <param name="Curves">(label, level dB relative to its own peak) pairs; the first is the measurement.</param>
internal sealed record CutOverlay(string Title, IReadOnlyList<double> AnglesDeg, IReadOnlyList<(string Label, double[] LevelsDb)> Curves);

/// <summary>Everything <c>compare</c> prints and writes, as plain data (SI inside).</summary>
/// <param name="Name">Array name.</param>
/// <param name="DesignFrequencyHz">f0.</param>
/// <param name="Inputs">What was read, shown back (units, reference resistance, plane...).</param>
/// <param name="Table">Measured vs predicted figures.</param>
/// <param name="MatchCurves">Measured, predicted, fitted, after trim, next plate.</param>
/// <param name="Cuts">One overlay per cut.</param>
/// <param name="Diagnosis">The fit.</param>
/// <param name="Trim">The trim plan.</param>
/// <param name="NextPlate">The next plate's analysis, or null when it could not be designed.</param>
/// <param name="NextPlateProblem">Why there is no next plate, or null.</param>
/// <param name="Notes">Remarks for the user (model used, coupling, unseen slots).</param>
internal sealed record ComparisonReport(string Name, double DesignFrequencyHz, IReadOnlyList<string> Inputs, IReadOnlyList<ComparisonRow> Table,
    IReadOnlyList<S11Curve> MatchCurves, IReadOnlyList<CutOverlay> Cuts, PrototypeDiagnosis Diagnosis, TrimPlan Trim, ArrayResult? NextPlate,
    string? NextPlateProblem, IReadOnlyList<string> Notes);

/// <summary>Builds the <see cref="ComparisonReport"/> from the design, the measurements, the diagnosis and the fixes.</summary>
internal static class ComparisonReportBuilder
{
    /// <summary>Builds the report.</summary>
    /// <param name="design">The design as cut (the pipeline's result from the design folder's spec).</param>
    /// <param name="data">The measurements.</param>
    /// <param name="inputs">Lines describing what was read.</param>
    /// <param name="diagnosis">The fit.</param>
    /// <param name="trim">The trim plan.</param>
    /// <param name="next">The next plate, or null.</param>
    /// <param name="nextProblem">Why there is no next plate, or null.</param>
    public static ComparisonReport Build(ArrayResult design, PrototypeMeasurements data, IReadOnlyList<string> inputs, PrototypeDiagnosis diagnosis,
        TrimPlan trim, ArrayResult? next, string? nextProblem)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(data);
        ArgumentNullException.ThrowIfNull(diagnosis);
        ArgumentNullException.ThrowIfNull(trim);
        var d = design.Design;
        var f0 = d.DesignFrequency;
        bool coupledDesign = design.Procedure is ElliottProcedure or CoupledTravellingWaveProcedure;
        var analysis = ArrayPipeline.AnalysisModel(design.Request, d, design.SlotModel, AnalysisOptions.Default);
        NetworkSolution Predict(Frequency f) => coupledDesign ? CoupledArrayNetwork.Solve(d, analysis, f) : ArrayNetwork.Solve(d, analysis, f);
        var model = diagnosis.Model;
        var rows = new List<ComparisonRow>();
        var curves = new List<S11Curve>();
        var notes = new List<string>();
        if (data.Network is { } net)
        {
            var f = net.Frequencies;
            var predicted = new Complex[f.Count];
            var fitted = new Complex[f.Count];
            var trimmed = new Complex[f.Count];
            var design2 = model.Apply(diagnosis.Errors);
            var slot2 = model.SlotModel(diagnosis.Errors);
            var design3 = model.Apply(trim.After);
            var slot3 = model.SlotModel(trim.After);
            Parallel.For(0, f.Count, new ParallelOptions { MaxDegreeOfParallelism = 2 }, i =>
            {
                var fi = Frequency.FromHertz(f[i]);
                predicted[i] = Predict(fi).S11;
                fitted[i] = model.Solve(design2, slot2, fi).S11;
                trimmed[i] = model.Solve(design3, slot3, fi).S11;
            });
            curves.Add(new S11Curve("measured", f, net.S11));
            curves.Add(new S11Curve(coupledDesign ? "predicted (design, coupled)" : "predicted (design, isolated slots)", f, predicted));
            curves.Add(new S11Curve("fitted model of the plate", f, fitted));
            curves.Add(new S11Curve("after the trims (predicted)", f, trimmed));
            if (next is not null)
            {
                var pts = next.Sweep.Points;
                curves.Add(new S11Curve("next plate (predicted)", pts.Select(p => p.Frequency.Hertz).ToArray(), pts.Select(p => p.S11).ToArray()));
            }
            rows.Add(new ComparisonRow("best-match frequency (GHz)", ResponseComparison.BestMatch(f, net.S11) * 1e-9, ResponseComparison.BestMatch(f, predicted) * 1e-9));
            rows.Add(new ComparisonRow($"|S11| at {f0} (dB)", Db(ResponseComparison.At(f, net.S11, f0.Hertz)), Db(design.Sweep.AtDesign.S11)));
            double fittedBest = ResponseComparison.BestMatch(f, fitted);
            notes.Add(FormattableString.Invariant(
                $"fitted model of the plate: best match at {fittedBest * 1e-9:0.0000} GHz ({(fittedBest / f0.Hertz - 1) * 100:+0.000;-0.000} % from f0), the diagnosed frequency offset"));
            if (!coupledDesign && d.CouplingKind == Core.Slots.SlotCouplingKind.Offset)
            {
                var coupled = PrototypeErrors.None(d.Count);
                var asCut = Enumerable.Range(0, f.Count).Select(i => model.Solve(coupled, Frequency.FromHertz(f[i])).S11).ToArray();
                notes.Add(FormattableString.Invariant(
                    $"the design was made without mutual coupling; the coupled model of the same plate (the fit's starting point) predicts its best match at {ResponseComparison.BestMatch(f, asCut) * 1e-9:0.0000} GHz and |S11| {Db(model.Solve(coupled, f0).S11):0.0} dB at {f0}"));
            }
        }
        var overlays = new List<CutOverlay>();
        for (int c = 0; c < data.Cuts.Count; c++)
        {
            var cut = data.Cuts[c];
            var predictedCut = Predict(cut.Frequency);
            var pred = ResponseComparison.PredictedLevels(d, predictedCut.Excitations, cut.Frequency, cut.Angles);
            var fitDesign = model.Apply(diagnosis.Errors);
            var fitted = ResponseComparison.PredictedLevels(fitDesign, model.Solve(fitDesign, model.SlotModel(diagnosis.Errors), cut.Frequency).Excitations, cut.Frequency, cut.Angles);
            var trimDesign = model.Apply(trim.After);
            var afterTrim = ResponseComparison.PredictedLevels(trimDesign, model.Solve(trimDesign, model.SlotModel(trim.After), cut.Frequency).Excitations, cut.Frequency, cut.Angles);
            double peak = cut.LevelsDb.Max();
            var measured = cut.LevelsDb.Select(v => v - peak).ToArray();
            var mf = ResponseComparison.Figures(cut.Angles, measured);
            var pf = ResponseComparison.Figures(cut.Angles, pred);
            string at = $"cut {c + 1} ({cut.Source}, {cut.Frequency})";
            rows.Add(new ComparisonRow($"{at}: beam direction (deg)", mf.Beam, pf.Beam));
            rows.Add(new ComparisonRow($"{at}: HPBW (deg)", mf.Hpbw, pf.Hpbw));
            rows.Add(new ComparisonRow($"{at}: peak sidelobe (dB)", mf.PeakSidelobe, pf.PeakSidelobe));
            overlays.Add(new CutOverlay($"{design.Request.Name}: cut {c + 1} at {cut.Frequency} ({cut.Source})", cut.Angles.Select(t => t * 180 / Math.PI).ToArray(),
                [("measured", measured), (coupledDesign ? "predicted (design, coupled)" : "predicted (design, isolated slots)", pred), ("fitted model of the plate", fitted), ("after the trims (predicted)", afterTrim)]));
        }
        notes.Add(model.IsCoupled
            ? "fitted model: the design's own network with mutual coupling (coupled network), whatever coupling the design was made with"
            : "fitted model: the design's own network of isolated slots (no coupled model exists here for edge slots)");
        notes.AddRange(diagnosis.Notes.Distinct());
        return new ComparisonReport(design.Request.Name, f0.Hertz, inputs, rows, curves, overlays, diagnosis, trim, next, nextProblem, notes);
    }

    private static double Db(Complex z) => 20 * Math.Log10(Math.Max(z.Magnitude, 1e-15));
}
