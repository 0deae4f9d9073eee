using System.Collections.Immutable;
using SlotArray.Core.Quantities;

namespace SlotArray.Core.Patterns;

/// <summary>
/// Figures of merit of a sum (single-beam) pattern, measured on its grid. All levels are relative to the beam
/// peak, dB (negative). The main beam runs from the peak down to the first minimum on each side (found by walking,
/// not inside a fixed window), so the metrics hold for any taper; everything outside is sidelobe region.
/// </summary>
/// <param name="BeamDirection">Direction of the peak (parabolic refinement in dB).</param>
/// <param name="HalfPowerBeamwidth">Full width between the −3.0103 dB points (linear interpolation in dB); NaN if a side stays above half power to the grid end.</param>
/// <param name="NullToNullWidth">Width between the first minima either side of the peak (parabolic refinement in power); NaN if the beam reaches a grid end.</param>
/// <param name="FirstSidelobeDb">The higher of the two lobes adjacent to the main beam, dB; null if there is none on the grid.</param>
/// <param name="PeakSidelobeDb">The highest point of the sidelobe region (local maxima refined; partial lobes at the grid ends count by their end sample), dB; null if there is no sidelobe region.</param>
/// <param name="PeakSidelobeDirection">Where the peak sidelobe is; null with it.</param>
/// <param name="IntegratedSidelobeRatioDb">10 log10(∫_sidelobes |F|² du / ∫_main |F|² du), u = sin θ, trapezoidal on the grid; null if there is no sidelobe region.</param>
internal sealed record PatternMetrics(
    Angle BeamDirection,
    Angle HalfPowerBeamwidth,
    Angle NullToNullWidth,
    double? FirstSidelobeDb,
    double? PeakSidelobeDb,
    Angle? PeakSidelobeDirection,
    double? IntegratedSidelobeRatioDb)
{
    /// <summary>Measures a sum pattern. The grid should resolve the lobes (≳ 8 points per lobe for 0.01 dB on the peaks).</summary>
    /// <param name="pattern">The sampled pattern; its peak must be positive.</param>
    public static PatternMetrics Measure(Pattern pattern)
    {
        ArgumentNullException.ThrowIfNull(pattern);
        if (!(pattern.PeakPower > 0)) throw new ArgumentException("The pattern is zero everywhere: check the excitations.", nameof(pattern));
        var th = pattern.Theta;
        var p = pattern.Power;
        int i0 = p.IndexOf(pattern.PeakPower);
        var (beam, peak) = LobeSearch.RefineMaximum(th, p, i0);
        double hLeft = LobeSearch.Crossing(th, p, i0, -1, 0.5 * peak), hRight = LobeSearch.Crossing(th, p, i0, +1, 0.5 * peak);
        int iL = LobeSearch.DescendTo(p, i0, -1), iR = LobeSearch.DescendTo(p, i0, +1);
        double nnw = LobeSearch.AtEnd(p, iL) || LobeSearch.AtEnd(p, iR)
            ? double.NaN
            : LobeSearch.RefineMinimum(th, p, iR) - LobeSearch.RefineMinimum(th, p, iL);

        double? first = null;
        foreach (var (edge, dir) in new[] { (iL, -1), (iR, +1) })
        {
            if (LobeSearch.AtEnd(p, edge)) continue;
            var (_, pw) = LobeSearch.RefineMaximum(th, p, LobeSearch.AscendTo(p, edge, dir));
            first = Math.Max(first ?? double.MinValue, pw);
        }

        var (psl, pslDir) = PeakSidelobe(th, p, iL, iR);

        double? islr = null;
        if (iL > 0 || iR < p.Length - 1)
        {
            var u = pattern.Grid.Sines;
            double side = LobeSearch.IntegrateInSine(u, p, 0, iL) + LobeSearch.IntegrateInSine(u, p, iR, p.Length - 1);
            double main = LobeSearch.IntegrateInSine(u, p, iL, iR);
            islr = side > 0 ? 10 * Math.Log10(side / main) : null;
        }

        return new PatternMetrics(
            Angle.FromRadians(beam),
            Angle.FromRadians(hRight - hLeft),
            Angle.FromRadians(nnw),
            first is null ? null : LobeSearch.Db(first.Value / peak),
            psl is null ? null : LobeSearch.Db(psl.Value / peak),
            pslDir is null ? null : Angle.FromRadians(pslDir.Value),
            islr);
    }

    /// <summary>
    /// The beam direction (rad) and the peak sidelobe (dB) of <see cref="Measure"/> alone, by the same steps (same values
    /// to the bit), for loops that need no other figure (the tolerance trials).
    /// </summary>
    internal static (double BeamDirection, double? PeakSidelobeDb) BeamAndPeakSidelobe(Pattern pattern)
        => BeamAndPeakSidelobe(pattern.Theta, pattern.Power, pattern.PeakPower);

    /// <summary><see cref="BeamAndPeakSidelobe(Pattern)"/> of a power cut <paramref name="p"/> at the angles <paramref name="th"/> whose largest value is <paramref name="peakPower"/>.</summary>
    internal static (double BeamDirection, double? PeakSidelobeDb) BeamAndPeakSidelobe(ImmutableArray<double> th, ImmutableArray<double> p, double peakPower)
    {
        if (!(peakPower > 0)) throw new ArgumentException("The pattern is zero everywhere: check the excitations.", nameof(p));
        int i0 = p.IndexOf(peakPower);
        var (beam, peak) = LobeSearch.RefineMaximum(th, p, i0);
        int iL = LobeSearch.DescendTo(p, i0, -1), iR = LobeSearch.DescendTo(p, i0, +1);
        var (psl, _) = PeakSidelobe(th, p, iL, iR);
        return (beam, psl is null ? null : LobeSearch.Db(psl.Value / peak));
    }

    /// <summary>The highest refined local maximum outside the main beam [iL, iR] and its direction; nulls when there is none.</summary>
    private static (double? Power, double? Direction) PeakSidelobe(ImmutableArray<double> th, ImmutableArray<double> p, int iL, int iR)
    {
        double? psl = null, pslDir = null;
        void Consider(int i)
        {
            if (psl is { } best && LobeSearch.RefinedBelow(th, p, i, best)) return;   // cannot win: same result, no logarithms
            var (t, pw) = LobeSearch.RefineMaximum(th, p, i);
            if (psl is null || pw > psl) { psl = pw; pslDir = t; }
        }
        for (int i = 0; i < iL; i++)
            if ((i == 0 || p[i] >= p[i - 1]) && p[i] >= p[i + 1]) Consider(i);
        for (int i = iR + 1; i < p.Length; i++)
            if (p[i] >= p[i - 1] && (i == p.Length - 1 || p[i] >= p[i + 1])) Consider(i);
        return (psl, pslDir);
    }

    /// <summary>
    /// Taper efficiency of a discrete aperture, η_t = |Σ a_n|² / (N Σ |a_n|²) (the standard definition, e.g. R. C. Hansen, <i>Phased Array Antennas</i>, Wiley 1998, from memory;
    /// 1 for uniform excitation, less for any taper).
    /// </summary>
    /// <param name="weights">Element excitations (real).</param>
    public static double TaperEfficiency(IReadOnlyList<double> weights)
        => TaperEfficiency(ArrayFactor.ToComplex(weights));

    /// <summary>Taper efficiency |Σ a_n|² / (N Σ |a_n|²) of complex excitations (see the real overload).</summary>
    /// <param name="excitations">Element excitations.</param>
    public static double TaperEfficiency(IReadOnlyList<System.Numerics.Complex> excitations)
    {
        ArgumentNullException.ThrowIfNull(excitations);
        if (excitations.Count == 0) throw new ArgumentException("No excitations given.", nameof(excitations));
        System.Numerics.Complex sum = 0;
        double power = 0;
        foreach (var a in excitations) { sum += a; power += a.Real * a.Real + a.Imaginary * a.Imaginary; }
        if (!(power > 0)) throw new ArgumentException("All excitations are zero.", nameof(excitations));
        return (sum.Real * sum.Real + sum.Imaginary * sum.Imaginary) / (excitations.Count * power);
    }
}
