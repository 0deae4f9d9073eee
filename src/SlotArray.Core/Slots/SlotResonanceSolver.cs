using MathNet.Numerics.RootFinding;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Slots;

/// <summary>
/// The one solver every slot source shares: the resonant length of a slot (the length where Im y = 0) and the coupling
/// (offset or tilt) whose resonant conductance is a given g. Both are roots found by Brent's method (R. P. Brent,
/// <i>Algorithms for Minimization without Derivatives</i>, Prentice-Hall 1973, ch. 4; MathNet.Numerics' implementation).
/// </summary>
/// <remarks>
/// A shunt slot's susceptance falls through zero at resonance: Im y &gt; 0 for a slot shorter than resonance and
/// Im y &lt; 0 for a longer one (a series-resonant branch in shunt; R. S. Elliott, <i>Antenna Theory and Design</i>,
/// Prentice-Hall 1981, ch. 8, measured Y/G0 curves). The bracket must show that sign change.
/// </remarks>
internal static class SlotResonanceSolver
{
    /// <summary>
    /// The resonant length: the root of Im y(L) between the first bracket that shows the sign change, [0.44λ, 0.52λ], else
    /// [0.36λ, 0.62λ] (λ the wavelength the caller scales lengths by), to 1e-7 λ.
    /// Throws <see cref="ConvergenceException"/> when neither bracket holds a resonance.
    /// </summary>
    /// <param name="susceptance">Im y as a function of the full length L (m).</param>
    /// <param name="wavelength">The wavelength λ (m) that sets the brackets and the accuracy.</param>
    /// <param name="what">The slot, for the message (e.g. "the longitudinal slot at offset 2 mm").</param>
    /// <param name="f">The frequency, for the message.</param>
    /// <param name="shortest">Shortest length the model takes (m), e.g. just above twice the width for a narrow-slot model;
    /// each bracket starts there when it is longer than the bracket's own start. A bracket that then closes is
    /// <see cref="InfeasibleDesignException"/> (the slot is too wide for the model).</param>
    /// <param name="advice">What to change when no resonance is found (appended to the message), or null.</param>
    public static double ResonantLength(Func<double, double> susceptance, double wavelength, string what, Frequency f, double shortest = 0,
        string? advice = null)
    {
        ArgumentNullException.ThrowIfNull(susceptance);
        double lam = wavelength;
        double lo = Math.Max(0.44 * lam, shortest), hi = 0.52 * lam;
        double flo = lo < hi ? susceptance(lo) : double.NaN, fhi = lo < hi ? susceptance(hi) : double.NaN;
        if (!(flo > 0 && fhi < 0))
        {
            lo = Math.Max(0.36 * lam, shortest);
            hi = 0.62 * lam;
            if (lo >= hi)
                throw new InfeasibleDesignException(FormattableString.Invariant(
                    $"{what} is too wide for the narrow-slot model at {f}: it needs the length (about half a wavelength, here at most {hi * 1e3:0.##} mm) to exceed twice the width; use slots narrower than {hi / 2 * 1e3:0.##} mm"));
            flo = susceptance(lo);
            fhi = susceptance(hi);
        }
        if (!(flo > 0 && fhi < 0))
            throw new ConvergenceException(FormattableString.Invariant(
                $"no resonance (Im y = 0) of {what} between {lo * 1e3:0.##} and {hi * 1e3:0.##} mm at {f}{(advice is null ? "" : ": " + advice)}"), 2, Math.Min(Math.Abs(flo), Math.Abs(fhi)));
        return ResonantLength(susceptance, lo, hi, 1e-7 * lam, what);
    }

    /// <summary>
    /// The resonant length inside a bracket [<paramref name="low"/>, <paramref name="high"/>] where Im y changes sign, to
    /// <paramref name="accuracy"/> (m). Throws <see cref="ConvergenceException"/> when the search fails.
    /// </summary>
    /// <param name="susceptance">Im y as a function of the full length L (m).</param>
    /// <param name="low">Shorter end of the bracket (m).</param>
    /// <param name="high">Longer end of the bracket (m).</param>
    /// <param name="accuracy">Absolute accuracy of the root (m).</param>
    /// <param name="what">The slot, for the message.</param>
    public static double ResonantLength(Func<double, double> susceptance, double low, double high, double accuracy, string what)
    {
        ArgumentNullException.ThrowIfNull(susceptance);
        if (!Brent.TryFindRoot(susceptance, low, high, accuracy, 100, out double root))
            throw new ConvergenceException($"resonance search of {what} failed", 100, double.NaN);
        return root;
    }

    /// <summary>
    /// The coupling c in [<paramref name="low"/>, <paramref name="high"/>] whose resonant conductance g_r(c) equals
    /// <paramref name="conductance"/> (g_r increasing in c), to 1e-12 (m or rad); <paramref name="high"/> itself when the
    /// conductance is g_r(high) exactly. The caller checks that the conductance lies in range first.
    /// </summary>
    /// <param name="resonantConductance">g_r as a function of the coupling.</param>
    /// <param name="conductance">The wanted g.</param>
    /// <param name="low">Smallest coupling searched.</param>
    /// <param name="high">Largest coupling searched.</param>
    public static double CouplingForConductance(Func<double, double> resonantConductance, double conductance, double low, double high)
    {
        ArgumentNullException.ThrowIfNull(resonantConductance);
        return Brent.FindRoot(v => resonantConductance(v) - conductance, low, high, 1e-12, 200);
    }
}
