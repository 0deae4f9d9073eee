using System.Numerics;
using MathNet.Numerics.Optimization;
using SlotArray.Core.Coupling;
using SlotArray.Core.Quantities;
using SlotArray.Core.Slots;
using SlotArray.Core.Stick;

namespace SlotArray.Core.Network;

/// <summary>
/// The fitted calibration of the exterior mutual coupling: the complex factor κ on every mutual impedance of
/// <see cref="CoupledSlotImpedances.HalfCosineCentreReferred"/> that brings the coupled network of the design as cut
/// closest to a full-wave (or measured) S11, and the misfit with κ = 1 and with κ.
/// </summary>
/// <param name="Scale">κ (absolute: the factor on the infinite-ground-plane model, whatever the design was made with).</param>
/// <param name="RmsBefore">RMS |S11,model − S11,measured| over the sweep with κ = 1.</param>
/// <param name="RmsAfter">The same with κ.</param>
/// <param name="RmsUncoupled">The same with no mutual coupling at all (κ = 0).</param>
internal sealed record ExteriorCouplingFit(Complex Scale, double RmsBefore, double RmsAfter, double RmsUncoupled);

/// <summary>
/// Fits <see cref="ExteriorCouplingFit.Scale"/>: the self admittances stay those of the design's slot model (a full-wave
/// slot table makes them the engine's own), the geometry stays as cut, and only the two real numbers Re κ, Im κ move, by
/// MathNet's Nelder–Mead simplex on Σ|S11,model(κ) − S11,measured|² (J. A. Nelder and R. Mead, "A simplex method for
/// function minimization", Computer Journal 7, 308–313, 1965). Fitted to the run of one design and used for the next
/// design of the same slots in the same tube, it carries what the infinite-plane exterior leaves out (the narrow face's
/// edges and side walls, and any coupling through the guide's higher-order modes, which the equations do not hold
/// separately); it is a calibration, not a model of those effects.
/// </summary>
internal static class ExteriorCouplingCalibration
{
    /// <summary>Fits κ for a design of offset slots against an S11 sweep referred to the design's feed plane.</summary>
    /// <param name="design">The design as cut (offset slots).</param>
    /// <param name="slot">Its slot model (self admittances).</param>
    /// <param name="frequenciesHz">Sweep frequencies, Hz.</param>
    /// <param name="s11">Measured S11 at those frequencies.</param>
    public static ExteriorCouplingFit Fit(ArrayDesign design, IShuntSlotModel slot, IReadOnlyList<double> frequenciesHz, IReadOnlyList<Complex> s11)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(slot);
        ArgumentNullException.ThrowIfNull(frequenciesHz);
        ArgumentNullException.ThrowIfNull(s11);
        if (design.CouplingKind != SlotCouplingKind.Offset)
            throw new ArgumentException("the exterior coupling calibration is for longitudinal (offset) slots", nameof(design));
        if (frequenciesHz.Count != s11.Count || s11.Count < 3)
            throw new ArgumentException("give at least three frequencies, one S11 each", nameof(s11));
        var plain = design with { MutualCouplingScale = Complex.One };
        var f = frequenciesHz.Select(Frequency.FromHertz).ToArray();
        var y = f.Select(fk => (IReadOnlyList<Complex>)design.Slots.Select(s => slot.Admittance(s.Coupling, s.Length, fk)).ToArray()).ToArray();
        var z = f.Select(fk => CoupledArrayNetwork.MutualImpedances(plain, fk)).ToArray();
        double Misfit(Complex k)
        {
            double sum = 0;
            for (int i = 0; i < f.Length; i++)
            {
                var e = CoupledArrayNetwork.Solve(plain, y[i], z[i].Times(k), f[i]).S11 - s11[i];
                sum += e.Real * e.Real + e.Imaginary * e.Imaginary;
            }
            return sum / f.Length;
        }
        var objective = ObjectiveFunction.Value(p => Misfit(new Complex(p[0], p[1])));
        var start = MathNet.Numerics.LinearAlgebra.Vector<double>.Build.Dense([1.0, 0.0]);
        var step = MathNet.Numerics.LinearAlgebra.Vector<double>.Build.Dense([0.2, 0.2]);
        var best = new NelderMeadSimplex(1e-12, 2000).FindMinimum(objective, start, step).MinimizingPoint;
        var scale = new Complex(best[0], best[1]);
        return new ExteriorCouplingFit(scale, Math.Sqrt(Misfit(Complex.One)), Math.Sqrt(Misfit(scale)), Math.Sqrt(Misfit(Complex.Zero)));
    }
}
