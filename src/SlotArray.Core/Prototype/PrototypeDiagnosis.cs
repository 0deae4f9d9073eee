using SlotArray.Core.Design;
using SlotArray.Core.Network;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Prototype;

/// <summary>What the fit made of a prototype's measurements.</summary>
/// <param name="Model">The plate's model (the design as cut, the fit's slot model, the mutual impedances at the fitted geometry).</param>
/// <param name="Errors">The fitted errors (uniform and per slot).</param>
/// <param name="Stages">Every stage in the order run, with its statistics and notes.</param>
/// <param name="Cuts">Per-cut excitation reconstructions (stage d).</param>
/// <param name="Slots">Per-slot geometry errors (stage e); empty without cuts.</param>
/// <param name="LengthScale">The uniform length error with its interval, or null without network data.</param>
/// <param name="ConductanceScale">The conductance scale with its interval, or null when not resolved.</param>
/// <param name="GuideWavelengthScale">The guide-wavelength error with its interval, or null when not resolved.</param>
internal sealed record PrototypeDiagnosis(PrototypeModel Model, PrototypeErrors Errors, IReadOnlyList<FitStage> Stages,
    IReadOnlyList<CutReconstruction> Cuts, IReadOnlyList<SlotGeometryError> Slots, FittedValue? LengthScale, FittedValue? ConductanceScale,
    FittedValue? GuideWavelengthScale)
{
    /// <summary>Every note of every stage, in order.</summary>
    public IEnumerable<string> Notes => Stages.SelectMany(s => s.Notes);
}

/// <summary>
/// The diagnosis of a prototype: refuses measurements of another design (<see cref="MeasurementCheck"/>), then fits the
/// design's own network model (<see cref="PrototypeModel"/>, coupled for offset slots) in the order the data resolve:
/// stages a–c on the S-parameters (<see cref="UniformErrorFit"/>), with the mutual impedances re-frozen at the result
/// and the adopted parameters refitted jointly; then from the pattern cuts the per-slot excitation errors (stage d,
/// <see cref="ExcitationReconstruction"/>) and the per-slot length and offset errors that explain them (stage e,
/// <see cref="SlotErrorFit"/>). With both kinds of data the S-parameters own the common part of the lengths: stage e
/// fits zero-mean length changes, the totals are split by their median (<see cref="SplitCommonLength"/>), the uniform
/// errors are refitted with the per-slot errors held, and stage e is repeated once, so that neither absorbs the other.
/// </summary>
internal static class PrototypeFit
{
    /// <summary>Runs the diagnosis.</summary>
    /// <param name="asCut">The design as cut.</param>
    /// <param name="slot">The design's slot model.</param>
    /// <param name="isTravellingWave">Whether the feed is a travelling wave.</param>
    /// <param name="data">The measurements.</param>
    /// <exception cref="MeasurementMismatchException">The measurements are not of this design.</exception>
    public static PrototypeDiagnosis Run(ArrayDesign asCut, IShuntSlotModel slot, bool isTravellingWave, PrototypeMeasurements data)
    {
        ArgumentNullException.ThrowIfNull(asCut);
        ArgumentNullException.ThrowIfNull(slot);
        MeasurementCheck.Check(asCut, isTravellingWave, data);
        var fitSlot = FitSlotModel(asCut, slot);
        var model = new PrototypeModel(asCut, fitSlot);
        return Run(model, data);
    }

    /// <summary>
    /// Chebyshev nodes in length of the fit's slot surfaces: 9 (5 in coupling, where the admittance is smoother). With 5,
    /// the surfaces' error in the moment-method admittance near resonance biased the fitted length error by +0.011 %
    /// (noise-free synthetic data of a 16-slot uniform WR-90 array, 0.6 % injected: 0.6107 %); with 9 it is −0.0001 %, as
    /// with the design's own slot model (0.5999 %).
    /// </summary>
    public const int SurfaceNodes = 9;

    /// <summary>The slot model a fit uses: surfaces around the slots as cut, interpolated in frequency.</summary>
    public static IShuntSlotModel FitSlotModel(ArrayDesign asCut, IShuntSlotModel slot)
    {
        ArgumentNullException.ThrowIfNull(asCut);
        var inner = slot is FrequencyInterpolatedSlotModel fi ? fi.Inner : slot;
        var surfaces = new SlotSurfaceModel(inner, [.. asCut.Slots.Select(s => (s.Coupling, s.Length))], 0.025, 0.1, SurfaceNodes);
        return new FrequencyInterpolatedSlotModel(surfaces, asCut.DesignFrequency, memoise: false);
    }

    /// <summary>
    /// Splits the slots' total length errors L_n s_L + ΔL_n into a common part and per-slot deviations with the common
    /// part the median of the relative totals (a robust location: a few slots cut wrong do not move it; P. J. Huber,
    /// <i>Robust Statistics</i>, Wiley 1981, Ch. 3, from memory). The totals, and so the model, are unchanged: the split
    /// only decides which part the uniform scale reports, since the S-parameters see the totals alone.
    /// </summary>
    public static PrototypeErrors SplitCommonLength(ArrayDesign asCut, PrototypeErrors errors)
    {
        ArgumentNullException.ThrowIfNull(asCut);
        ArgumentNullException.ThrowIfNull(errors);
        var rel = asCut.Slots.Select((s, i) => errors.LengthScale + errors.SlotLengthErrors[i] / s.Length.Meters).Order().ToArray();
        double median = rel.Length % 2 == 1 ? rel[rel.Length / 2] : 0.5 * (rel[rel.Length / 2 - 1] + rel[rel.Length / 2]);
        var dl = asCut.Slots.Select((s, i) => (errors.LengthScale + errors.SlotLengthErrors[i] / s.Length.Meters - median) * s.Length.Meters).ToArray();
        return errors with { LengthScale = median, SlotLengthErrors = dl };
    }

    /// <summary>
    /// Per-slot errors are deviations from the uniform scales, which the S-parameters fix: the uncertainty of those scales
    /// enters each slot's error as L_n σ(s_L) for the length and, for the coupling, as the offset (or tilt) change δc whose
    /// admittance change best matches, in least squares, the change y σ(k_G)/k_G a conductance-scale error makes:
    /// δc = Re(y* ∂y/∂c)/|∂y/∂c|² σ(k_G)/k_G, with y and ∂y/∂c (central differences) from the slot model itself through
    /// the slot-admittance port at the slot as cut and the design frequency, so that it holds for whatever model or table
    /// the design used (offset or edge slot). Added in quadrature.
    /// </summary>
    private static IReadOnlyList<SlotGeometryError> WithCommonUncertainty(ArrayDesign asCut, IShuntSlotModel slot, IReadOnlyList<SlotGeometryError> slots,
        FittedValue? lengthScale, FittedValue? conductanceScale)
    {
        bool tilt = asCut.CouplingKind == SlotCouplingKind.Tilt;
        var f0 = asCut.DesignFrequency;
        return slots.Select((s, i) =>
        {
            var d = asCut.Slots[i];
            double sl = lengthScale is null ? 0 : d.Length.Meters * lengthScale.StandardError * 1e3;
            double rel = conductanceScale is null ? 0 : conductanceScale.StandardError / conductanceScale.Value;
            double sc = rel == 0 ? 0 : CouplingPerConductance(slot, d.Coupling, d.Length, f0) * rel * (tilt ? 180 / Math.PI : 1e3);
            return s with
            {
                Length = s.Length with { StandardError = Math.Sqrt(s.Length.StandardError * s.Length.StandardError + sl * sl) },
                Coupling = s.Coupling with { StandardError = Math.Sqrt(s.Coupling.StandardError * s.Coupling.StandardError + sc * sc) },
            };
        }).ToArray();
    }

    /// <summary>|δc| per unit relative admittance change, Re(y* ∂y/∂c)/|∂y/∂c|², from the slot model (central differences, step 10⁻³ |c|).</summary>
    internal static double CouplingPerConductance(IShuntSlotModel slot, double coupling, Length length, Frequency f)
    {
        double c = Math.Abs(coupling), h = 1e-3 * Math.Max(c, 1e-6);
        var y = slot.Admittance(c, length, f);
        var dy = (slot.Admittance(c + h, length, f) - slot.Admittance(c - h, length, f)) / (2 * h);
        double m2 = dy.Real * dy.Real + dy.Imaginary * dy.Imaginary;
        return m2 > 0 ? Math.Abs((System.Numerics.Complex.Conjugate(y) * dy).Real) / m2 : 0;
    }

    /// <summary>Runs the diagnosis on a prepared model (the benchmark's and the tests' entry).</summary>
    public static PrototypeDiagnosis Run(PrototypeModel model, PrototypeMeasurements data)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(data);
        var stages = new List<FitStage>();
        var errors = PrototypeErrors.None(model.AsCut.Count);
        var asked = (data.Network?.Frequencies ?? []).Concat(data.Cuts.Select(c => c.Frequency.Hertz)).ToArray();
        if (model.IsCoupled && asked.Distinct().Count() > CouplingAcrossBand.Nodes)
            model = model.WithCouplingBand(Frequency.FromHertz(asked.Min()), Frequency.FromHertz(asked.Max()));
        var network = data.Network is null ? null : new NetworkFitData(data.Network);
        var cuts = data.Cuts.Select(c => new CutFitData(c)).ToArray();
        IReadOnlyList<FitStage> uniform = [];
        int adoptedStages = 1;
        if (network is not null)
        {
            (errors, uniform) = UniformErrorFit.Run(model, network, errors);
            stages.AddRange(uniform);
            adoptedStages = Math.Max(1, uniform.Count(s => s.Adopted));
            model = model.RefreezeAt(errors);
            (errors, uniform) = UniformErrorFit.Run(model, network, errors, adoptedStages, lastOnly: true);
            stages.AddRange(uniform.Select(s => s with { Name = s.Name + " (mutual impedances at the fitted geometry)" }));
        }
        var recon = new List<CutReconstruction>();
        IReadOnlyList<SlotGeometryError> slots = [];
        if (cuts.Length > 0)
        {
            foreach (var c in cuts)
            {
                var r = ExcitationReconstruction.Run(model, errors, c);
                recon.Add(r);
                stages.Add(r.Stage);
            }
            FitStage st;
            var uniformOnly = errors;
            (errors, slots, st) = SlotErrorFit.Run(model, uniformOnly, cuts, zeroMeanLength: network is not null);
            stages.Add(st);
            if (network is not null)
            {
                errors = SplitCommonLength(model.AsCut, errors);
                model = model.RefreezeAt(errors);
                (var refit, uniform) = UniformErrorFit.Run(model, network, errors, adoptedStages, lastOnly: true);
                stages.AddRange(uniform.Select(s => s with { Name = s.Name + " (per-slot errors held)" }));
                (errors, slots, st) = SlotErrorFit.Run(model, refit, cuts, zeroMeanLength: true);
                stages.Add(st with { Name = st.Name + " (second pass)" });
            }
        }
        FittedValue? Pick(int i) => uniform.LastOrDefault(s => s.Adopted && s.Values.Count > i)?.Values[i];
        if (network is not null && slots.Count > 0) slots = WithCommonUncertainty(model.AsCut, model.Slot, slots, Pick(0), Pick(1));
        return new PrototypeDiagnosis(model, errors, stages, recon, slots, Pick(0), Pick(1), Pick(2));
    }
}
