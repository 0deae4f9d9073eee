using System.Numerics;

namespace SlotArray.Core.Tolerance;

/// <summary>A slot dimension a machinist controls.</summary>
public enum ToleranceQuantity
{
    /// <summary>Offset from the centreline (an error away from it counts positive).</summary>
    Offset,
    /// <summary>Slot length.</summary>
    Length,
    /// <summary>Slot centre along the guide (toward the feed end counts positive).</summary>
    Position,
    /// <summary>Slot width.</summary>
    Width,
}

/// <summary>How much one dimension of one slot moves the peak sidelobe and the match.</summary>
/// <param name="Slot">1-based slot number.</param>
/// <param name="Quantity">The dimension.</param>
/// <param name="DsllDbPerMm">d(peak sidelobe, dB)/d(error, mm).</param>
/// <param name="Ds11DbPerMm">d(20 log10 |S11| at the design frequency, dB)/d(error, mm). Near a perfect match |S11| has a zero and this derivative of its logarithm mostly reflects the step (the curvature of g); the Monte Carlo S11 percentiles are then the useful figure.</param>
public sealed record SlotSensitivity(int Slot, ToleranceQuantity Quantity, double DsllDbPerMm, double Ds11DbPerMm);

/// <summary>
/// Per-slot sensitivities of the nominal design by central differences, (F(q + h) − F(q − h))/(2h) with h = 0.01 mm,
/// each with the real slot model (offset and length solved at the stepped dimension, width through the model at the
/// stepped width) and the full network and pattern analysis of <see cref="ToleranceMonteCarlo"/>. Ranked by |dSLL|,
/// then |dS11|, then slot and quantity.
/// </summary>
public static class ToleranceSensitivities
{
    /// <summary>Every slot's four sensitivities, ranked.</summary>
    /// <param name="model">The array model (its surrogates hold the stepped-width admittances).</param>
    /// <param name="options">Grids and threads.</param>
    public static IReadOnlyList<SlotSensitivity> Compute(ArrayTrialModel model, ToleranceOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(model);
        options ??= ToleranceOptions.Default;
        options.Validate();
        var evaluator = new TrialEvaluator(model.Nominal, model.Frequency.FreeSpaceWavenumber, options with { EnvelopePoints = 0 });
        int n = model.NominalAdmittances.Count;
        const double h = SlotSurrogate.SensitivityStep;
        var quantities = Enum.GetValues<ToleranceQuantity>();
        var result = new SlotSensitivity[n * quantities.Length];
        Parallel.For(0, n, new ParallelOptions { MaxDegreeOfParallelism = options.Threads }, i =>
        {
            var s = model.Surrogates[i];
            var workspace = evaluator.NewWorkspace();
            double hc = h * model.CouplingPerOffsetError(i);
            foreach (var q in quantities)
            {
                TrialOutcome At(int sign)
                {
                    var y = model.NominalAdmittances.ToArray();
                    var z = model.NominalPositions.ToArray();
                    switch (q)
                    {
                        case ToleranceQuantity.Offset: y[i] = s.Direct(sign * hc, 0); break;
                        case ToleranceQuantity.Length: y[i] = s.Direct(0, sign * h); break;
                        case ToleranceQuantity.Width: y[i] = sign > 0 ? s.WidthPlus : s.WidthMinus; break;
                        default: z[i] += sign * h; break;
                    }
                    return evaluator.Evaluate(model.Solve(y, z, 0), workspace, default);
                }
                var plus = At(+1);
                var minus = At(-1);
                result[i * quantities.Length + (int)q] = new SlotSensitivity(i + 1, q,
                    (plus.PeakSidelobeDb - minus.PeakSidelobeDb) / (2 * h * 1e3), (plus.S11Db - minus.S11Db) / (2 * h * 1e3));
            }
        });
        return result.OrderByDescending(r => Math.Abs(r.DsllDbPerMm)).ThenByDescending(r => Math.Abs(r.Ds11DbPerMm))
            .ThenBy(r => r.Slot).ThenBy(r => r.Quantity).ToArray();
    }
}
