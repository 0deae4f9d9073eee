using System.Numerics;

namespace SlotArray.Core.Tolerance;

/// <summary>A slot dimension a machinist controls.</summary>
public enum ToleranceQuantity
{
    /// <summary>Offset from the centreline (an error away from it counts positive); broad-wall slots.</summary>
    Offset,
    /// <summary>Slot length.</summary>
    Length,
    /// <summary>Slot centre along the guide (toward the feed end counts positive).</summary>
    Position,
    /// <summary>Slot width.</summary>
    Width,
    /// <summary>Tilt of an edge slot (an error away from the direction across the narrow wall counts positive), per degree.</summary>
    Tilt,
    /// <summary>Depth of cut of an edge slot into each broad wall (deeper counts positive).</summary>
    Depth,
}

/// <summary>How much one dimension of one slot moves the peak sidelobe and the match.</summary>
/// <param name="Slot">1-based slot number.</param>
/// <param name="Quantity">The dimension.</param>
/// <param name="DsllDbPerUnit">d(peak sidelobe, dB)/d(error) per <see cref="Unit"/> (mm, or degree for a tilt).</param>
/// <param name="Ds11DbPerUnit">d(20 log10 |S11| at the design frequency, dB)/d(error) per <see cref="Unit"/>. Near a perfect match |S11| has a zero and this derivative of its logarithm mostly reflects the step (the curvature of g); the Monte Carlo S11 percentiles are then the useful figure.</param>
public sealed record SlotSensitivity(int Slot, ToleranceQuantity Quantity, double DsllDbPerUnit, double Ds11DbPerUnit)
{
    /// <summary>The unit of the error: "deg" for a tilt, else "mm".</summary>
    public string Unit => Quantity == ToleranceQuantity.Tilt ? "deg" : "mm";
}

/// <summary>
/// Per-slot sensitivities of the nominal design by central differences, (F(q + h) − F(q − h))/(2h), each with the real
/// slot model (offset, tilt and length solved at the stepped dimension, width through the model at the stepped width)
/// and the full network and pattern analysis of <see cref="ToleranceMonteCarlo"/>. Broad-wall slots: offset, length,
/// position, width with h = 0.01 mm. Edge slots: tilt, length, position, width, depth, the tilt stepped by the angle that
/// moves the slot's end 0.01 mm (h_θ = 0.01 mm/(L/2)) and the length following tilt and depth as the cut path does
/// (<see cref="ArrayTrialModel"/>). Ranked by the sidelobe change over the step (so a tilt ranks by the effect of moving
/// its end 0.01 mm, the same cutter displacement as every other dimension; for broad-wall slots this is the order of
/// |dSLL|), then the S11 change over the step, then slot and quantity.
/// </summary>
internal static class ToleranceSensitivities
{
    /// <summary>The quantities of a design's slots, in report order.</summary>
    /// <param name="edgeSlots">Edge slots (tilt and depth) rather than broad-wall slots (offset).</param>
    public static IReadOnlyList<ToleranceQuantity> QuantitiesFor(bool edgeSlots) => edgeSlots
        ? [ToleranceQuantity.Tilt, ToleranceQuantity.Length, ToleranceQuantity.Position, ToleranceQuantity.Width, ToleranceQuantity.Depth]
        : [ToleranceQuantity.Offset, ToleranceQuantity.Length, ToleranceQuantity.Position, ToleranceQuantity.Width];

    /// <summary>Every slot's sensitivities (four for broad-wall slots, five for edge slots), ranked.</summary>
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
        var quantities = QuantitiesFor(model.EdgeSlots);
        var result = new SlotSensitivity[n * quantities.Count];
        var rankKey = new (double Sll, double S11)[result.Length];
        var tilts = model.Design.Slots.Select(x => x.Coupling).ToArray();
        Parallel.For(0, n, new ParallelOptions { MaxDegreeOfParallelism = options.Threads }, i =>
        {
            var s = model.Surrogates[i];
            var workspace = evaluator.NewWorkspace();
            double sign = Math.Sign(model.Design.Slots[i].Coupling);
            double hTilt = h / (s.Length / 2);
            for (int qi = 0; qi < quantities.Count; qi++)
            {
                var q = quantities[qi];
                TrialOutcome At(int step)
                {
                    var y = model.NominalAdmittances.ToArray();
                    var z = model.NominalPositions.ToArray();
                    double[]? t = null;
                    switch (q)
                    {
                        case ToleranceQuantity.Offset: y[i] = s.Direct(step * h, 0); break;
                        case ToleranceQuantity.Length: y[i] = s.Direct(0, step * h); break;
                        case ToleranceQuantity.Width: y[i] = step > 0 ? s.WidthPlus : s.WidthMinus; break;
                        case ToleranceQuantity.Tilt:
                            y[i] = s.Direct(step * hTilt, model.LengthPerTiltError(i) * step * hTilt);
                            t = (double[])tilts.Clone();
                            t[i] += sign * step * hTilt;
                            break;
                        case ToleranceQuantity.Depth: y[i] = s.Direct(0, model.LengthPerDepthError(i) * step * h); break;
                        default: z[i] += step * h; break;
                    }
                    return evaluator.Evaluate(model.Solve(y, z, 0, t), workspace, default);
                }
                var plus = At(+1);
                var minus = At(-1);
                double dSll = plus.PeakSidelobeDb - minus.PeakSidelobeDb, dS11 = plus.S11Db - minus.S11Db;
                double per = q == ToleranceQuantity.Tilt ? 2 * hTilt * 180 / Math.PI : 2 * h * 1e3;
                int k = i * quantities.Count + qi;
                result[k] = new SlotSensitivity(i + 1, q, dSll / per, dS11 / per);
                rankKey[k] = (Math.Abs(dSll), Math.Abs(dS11));
            }
        });
        return Enumerable.Range(0, result.Length).OrderByDescending(k => rankKey[k].Sll).ThenByDescending(k => rankKey[k].S11)
            .ThenBy(k => result[k].Slot).ThenBy(k => result[k].Quantity).Select(k => result[k]).ToArray();
    }
}
