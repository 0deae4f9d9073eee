using System.Numerics;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Stick;

/// <summary>How a line of slots is terminated beyond its outermost slot.</summary>
internal enum TerminationKind
{
    /// <summary>A short-circuit plate (end wall) at <see cref="Termination.Distance"/> beyond the outermost slot centre.</summary>
    Short,
    /// <summary>A matched load (reflectionless, y = 1), as in travelling-wave arrays.</summary>
    MatchedLoad,
    /// <summary>An arbitrary normalised load admittance y_L = Y_L/G0.</summary>
    Admittance,
}

/// <summary>
/// The termination of a line of slots: its kind, its distance from the outermost slot centre to the termination
/// plane (for a short, the plate's inner face), and for <see cref="TerminationKind.Admittance"/> the normalised load
/// admittance y_L = Y_L/G0 (G0 = 1/Z_TE). A short is y_L → ∞, a matched load y_L = 1, an open end y_L = 0.
/// </summary>
/// <param name="Kind">Short, matched load or general admittance.</param>
/// <param name="Distance">Outermost slot centre to the termination plane, ≥ 0.</param>
/// <param name="LoadAdmittance">Normalised load admittance; used only for <see cref="TerminationKind.Admittance"/>.</param>
internal sealed record Termination(TerminationKind Kind, Length Distance, Complex LoadAdmittance)
{
    /// <summary>A short-circuit plate at the given distance beyond the outermost slot centre.</summary>
    public static Termination ShortAt(Length distance) => Create(TerminationKind.Short, distance, Complex.Zero);

    /// <summary>A matched load at the given distance beyond the outermost slot centre.</summary>
    public static Termination MatchedLoadAt(Length distance) => Create(TerminationKind.MatchedLoad, distance, Complex.One);

    /// <summary>A load of normalised admittance y_L (finite, Re y_L ≥ 0) at the given distance beyond the outermost slot centre.</summary>
    public static Termination LoadAt(Length distance, Complex loadAdmittance)
    {
        if (!double.IsFinite(loadAdmittance.Real) || !double.IsFinite(loadAdmittance.Imaginary) || loadAdmittance.Real < 0)
            throw new ArgumentOutOfRangeException(nameof(loadAdmittance), loadAdmittance.ToString(),
                "the load admittance must be finite with a non-negative real part (a passive load)");
        return Create(TerminationKind.Admittance, distance, loadAdmittance);
    }

    private static Termination Create(TerminationKind kind, Length distance, Complex y)
    {
        if (!double.IsFinite(distance.Meters) || distance.Meters < 0)
            throw new ArgumentOutOfRangeException(nameof(distance), distance.ToString(), "the termination distance must be zero or positive");
        return new Termination(kind, distance, y);
    }
}
