namespace SlotArray.Core.Prototype;

/// <summary>
/// Stages a–c of the diagnosis on the network data, in the order the data resolve them: (a) a uniform slot-length
/// scale (the frequency offset), (b) with a uniform conductance scale, (c) with a guide-wavelength error. Each stage is
/// a weighted least-squares fit (<see cref="WeightedFit"/>) of the design's own network model
/// (<see cref="PrototypeModel"/>) started from the previous stage; a stage whose new parameter the data cannot
/// separate from an earlier one (|correlation| &gt; <see cref="InseparableCorrelation"/>) is reported and not adopted.
/// </summary>
internal static class UniformErrorFit
{
    /// <summary>|Correlation| above which two parameters are reported as inseparable: 0.95.</summary>
    public const double InseparableCorrelation = 0.95;

    /// <summary>Names of the three parameters, in stage order.</summary>
    public static readonly IReadOnlyList<string> Names =
        ["uniform slot-length error (fraction)", "conductance scale (factor)", "guide-wavelength error (fraction)"];

    /// <summary>Runs the stages from <paramref name="start"/> (its per-slot errors are held).</summary>
    /// <param name="model">The plate's model.</param>
    /// <param name="data">The network data.</param>
    /// <param name="start">Starting errors; the per-slot errors are held fixed.</param>
    /// <param name="stages">How many stages to run (1–3).</param>
    /// <param name="lastOnly">Run only the last of those stages (all its parameters jointly) from <paramref name="start"/>:
    /// a refit whose earlier stages have already been run, adopted and checked for separability, and whose start is
    /// close to the solution, so that the stepwise warm starts are not needed (if that joint fit is not adopted, the stages
    /// are run one by one as without it).</param>
    public static (PrototypeErrors Errors, IReadOnlyList<FitStage> Stages) Run(PrototypeModel model, NetworkFitData data, PrototypeErrors start, int stages = 3,
        bool lastOnly = false)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(data);
        ArgumentNullException.ThrowIfNull(start);
        var list = new List<FitStage>();
        var current = start;
        string[] labels = ["a: uniform slot-length scale", "b: + uniform conductance scale", "c: + guide-wavelength error"];
        double[] steps = [1e-4, 1e-3, 1e-4];
        int last = Math.Clamp(stages, 1, 3);
        for (int stage = lastOnly ? last : 1; stage <= last; stage++)
        {
            int p = stage;
            var begin = current;
            PrototypeErrors Of(double[] v) => begin with
            {
                LengthScale = v[0],
                ConductanceScale = p > 1 ? v[1] : begin.ConductanceScale,
                GuideWavelengthScale = p > 2 ? v[2] : begin.GuideWavelengthScale,
            };
            double[] x0 = [begin.LengthScale, begin.ConductanceScale, begin.GuideWavelengthScale];
            var fit = WeightedFit.Fit(Names.Take(p).ToArray(), v => data.Predict(model, Of(v)), data.Observed, data.Sigma,
                x0.Take(p).ToArray(), steps.Take(p).ToArray());
            var notes = new List<string>();
            bool adopted = fit.Converged;
            if (!fit.Converged) notes.Add("the minimiser stopped on its iteration limit; the stage is not adopted");
            for (int j = 0; j < p - 1; j++)
            {
                double r = fit.Correlation[p - 1, j];
                if (Math.Abs(r) > InseparableCorrelation)
                {
                    notes.Add(FormattableString.Invariant(
                        $"the data cannot separate the {Names[p - 1]} from the {Names[j]} (correlation {r:0.000}): the {Names[p - 1]} is held at its nominal value; a pattern cut or a wider sweep would separate them"));
                    adopted = false;
                }
            }
            list.Add(new FitStage(labels[stage - 1], fit.Values, fit.ResidualRms, fit.NoiseScale, fit.ConditionNumber, adopted, notes));
            if (adopted) current = Of(fit.Values.Select(v => v.Value).ToArray());
            else break;
        }
        // A joint refit that does not converge or separate falls back to the stepwise stages.
        if (lastOnly && !list[^1].Adopted) return Run(model, data, start, stages);
        return (current, list);
    }
}
